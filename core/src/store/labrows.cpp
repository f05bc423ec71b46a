#include "store/labrows.hpp"

#include "store/recordcheck.hpp"
#include "store/sqlite.hpp"

#include <set>

namespace beamwarden::store {

namespace {

Result<void> writeRooms(sqlite3* db, const std::vector<model::Room>& rooms)
{
    // An upsert by name keeps a room's id, and so every laser's room, when rooms are reordered or described anew.
    auto upsert = Statement::prepare(db, R"sql(
        INSERT INTO room (position, name, description) VALUES (?1, ?2, ?3)
        ON CONFLICT (name) DO UPDATE SET position = excluded.position, description = excluded.description)sql");
    if (!upsert)
        return std::unexpected(upsert.error());
    for (std::size_t i = 0; i < rooms.size(); ++i) {
        upsert->bind(1, static_cast<std::int64_t>(i)).bind(2, rooms[i].name).bind(3, rooms[i].description);
        if (auto done = upsert->run(indexPath("lab", "rooms", i)); !done)
            return done;
    }
    return {};
}

} // namespace

Result<model::Lab> readLab(sqlite3* db)
{
    auto select = Statement::prepare(db, "SELECT id, name, lso_name, notes FROM lab WHERE id = 1");
    if (!select)
        return std::unexpected(select.error());
    auto row = select->step();
    if (!row)
        return std::unexpected(row.error());
    if (!*row)
        return fail("lab file", "", "a lab file that holds its lab record");
    model::Lab lab{select->integer(0), select->text(1), select->text(2), select->text(3), {}};
    auto rooms = Statement::prepare(db, "SELECT id, name, description FROM room ORDER BY position, id");
    if (!rooms)
        return std::unexpected(rooms.error());
    for (;;) {
        auto next = rooms->step();
        if (!next)
            return std::unexpected(next.error());
        if (!*next)
            break;
        lab.rooms.push_back(model::Room{rooms->integer(0), rooms->text(1), rooms->text(2)});
    }
    return lab;
}

Result<void> insertLab(sqlite3* db, const model::Lab& lab)
{
    if (auto valid = validateLab(lab, "lab"); !valid)
        return valid;
    auto insert = Statement::prepare(db, "INSERT INTO lab (id, name, lso_name, notes) VALUES (1, ?1, ?2, ?3)");
    if (!insert)
        return std::unexpected(insert.error());
    if (auto done = insert->bind(1, lab.name).bind(2, lab.lsoName).bind(3, lab.notes).run("lab"); !done)
        return done;
    return writeRooms(db, lab.rooms);
}

Result<void> updateLab(sqlite3* db, const model::Lab& lab)
{
    if (auto valid = validateLab(lab, "lab"); !valid)
        return valid;
    auto update = Statement::prepare(db, "UPDATE lab SET name = ?1, lso_name = ?2, notes = ?3 WHERE id = 1");
    if (!update)
        return std::unexpected(update.error());
    if (auto done = update->bind(1, lab.name).bind(2, lab.lsoName).bind(3, lab.notes).run("lab"); !done)
        return done;
    auto stored = readLab(db);
    if (!stored)
        return std::unexpected(stored.error());
    std::set<std::string> kept;
    for (const model::Room& room : lab.rooms)
        kept.insert(room.name);
    auto inUse = Statement::prepare(db, "SELECT count(*) FROM laser WHERE room_id = ?1");
    auto remove = Statement::prepare(db, "DELETE FROM room WHERE id = ?1");
    if (!inUse)
        return std::unexpected(inUse.error());
    if (!remove)
        return std::unexpected(remove.error());
    for (const model::Room& room : stored->rooms) {
        if (kept.contains(room.name))
            continue;
        inUse->bind(1, room.id);
        auto row = inUse->step();
        if (!row)
            return std::unexpected(row.error());
        const bool used = inUse->integer(0) > 0;
        inUse->reset();
        if (used)
            return fail("lab.rooms", room.name, "the rooms lasers are in; move those lasers first");
        if (auto done = remove->bind(1, room.id).run("lab.rooms"); !done)
            return done;
    }
    return writeRooms(db, lab.rooms);
}

} // namespace beamwarden::store
