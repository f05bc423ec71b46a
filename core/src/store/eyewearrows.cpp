#include "store/eyewearrows.hpp"

#include "store/recordcheck.hpp"
#include "store/sqlite.hpp"

namespace beamwarden::store {

namespace {

using model::RecordId;

constexpr std::string_view kEn207 = "en207";
constexpr std::string_view kEn208 = "en208";

// The OD table and markings of every item come from two statements prepared once by the caller: preparing them
// per item doubled the time of reading a shelf of thousands.
struct DetailReaders {
    Statement od;
    Statement markings;
};

Result<DetailReaders> prepareDetailReaders(sqlite3* db)
{
    auto od = Statement::prepare(
        db, "SELECT from_m, to_m, od, at_least FROM eyewear_od WHERE eyewear_id = ?1 ORDER BY position");
    auto markings =
        Statement::prepare(db, "SELECT kind, text FROM eyewear_marking WHERE eyewear_id = ?1 ORDER BY kind, position");
    if (!od)
        return std::unexpected(od.error());
    if (!markings)
        return std::unexpected(markings.error());
    return DetailReaders{std::move(*od), std::move(*markings)};
}

Result<void> readDetails(DetailReaders& readers, model::EyewearItem& item)
{
    Statement& od = readers.od;
    od.bind(1, item.id);
    for (;;) {
        auto row = od.step();
        if (!row)
            return std::unexpected(row.error());
        if (!*row)
            break;
        item.spectralOd.push_back(model::OdRow{units::Wavelength::fromSi(od.real(0)),
                                               units::Wavelength::fromSi(od.real(1)), od.real(2), od.integer(3) != 0});
    }
    od.reset();
    Statement& markings = readers.markings;
    markings.bind(1, item.id);
    for (;;) {
        auto row = markings.step();
        if (!row)
            return std::unexpected(row.error());
        if (!*row)
            break;
        (markings.text(0) == kEn207 ? item.en207Markings : item.en208Markings).push_back(markings.text(1));
    }
    markings.reset();
    return {};
}

Result<void> insertDetails(sqlite3* db, RecordId id, const model::EyewearItem& item, std::string_view path)
{
    auto od = Statement::prepare(
        db,
        "INSERT INTO eyewear_od (eyewear_id, position, from_m, to_m, od, at_least) VALUES (?1, ?2, ?3, ?4, ?5, ?6)");
    if (!od)
        return std::unexpected(od.error());
    for (std::size_t i = 0; i < item.spectralOd.size(); ++i) {
        const model::OdRow& row = item.spectralOd[i];
        od->bind(1, id).bind(2, static_cast<std::int64_t>(i)).bind(3, row.from.si()).bind(4, row.to.si());
        od->bind(5, row.od).bind(6, row.atLeast);
        if (auto done = od->run(indexPath(path, "spectral_od", i)); !done)
            return done;
    }
    auto marking = Statement::prepare(
        db, "INSERT INTO eyewear_marking (eyewear_id, kind, position, text) VALUES (?1, ?2, ?3, ?4)");
    if (!marking)
        return std::unexpected(marking.error());
    for (const auto& [kind, texts] : {std::pair{kEn207, &item.en207Markings}, std::pair{kEn208, &item.en208Markings}}) {
        for (std::size_t i = 0; i < texts->size(); ++i) {
            marking->bind(1, id).bind(2, kind).bind(3, static_cast<std::int64_t>(i)).bind(4, (*texts)[i]);
            if (auto done = marking->run(indexPath(path, kind, i)); !done)
                return done;
        }
    }
    return {};
}

Result<void> requireUniqueName(sqlite3* db, const std::string& name, RecordId id, std::string_view path)
{
    auto select = Statement::prepare(db, "SELECT count(*) FROM eyewear WHERE name = ?1 AND id <> ?2");
    if (!select)
        return std::unexpected(select.error());
    select->bind(1, name).bind(2, id);
    auto row = select->step();
    if (!row)
        return std::unexpected(row.error());
    if (select->integer(0) > 0)
        return fail(joinPath(path, "name"), name, "a name no other eyewear item of the lab has");
    return {};
}

} // namespace

Result<std::vector<model::EyewearItem>> readEyewear(sqlite3* db, std::optional<model::RecordId> only)
{
    auto select = Statement::prepare(db, R"sql(
        SELECT id, name, description, visible_transmittance, count, location, last_inspection, notes
        FROM eyewear WHERE ?1 IS NULL OR id = ?1 ORDER BY id)sql");
    if (!select)
        return std::unexpected(select.error());
    if (only)
        select->bind(1, *only);
    std::vector<model::EyewearItem> items;
    for (;;) {
        auto row = select->step();
        if (!row)
            return std::unexpected(row.error());
        if (!*row)
            break;
        model::EyewearItem item;
        item.id = select->integer(0);
        item.name = select->text(1);
        item.description = select->text(2);
        item.visibleTransmittance = select->real(3);
        item.count = static_cast<int>(select->integer(4));
        item.location = select->text(5);
        item.lastInspection = select->text(6);
        item.notes = select->text(7);
        items.push_back(std::move(item));
    }
    auto readers = prepareDetailReaders(db);
    if (!readers)
        return std::unexpected(readers.error());
    for (model::EyewearItem& item : items) {
        if (auto details = readDetails(*readers, item); !details)
            return std::unexpected(details.error());
    }
    return items;
}

Result<model::RecordId> writeEyewear(sqlite3* db, const model::EyewearItem& item, bool keepId, std::string_view path)
{
    if (auto valid = validateEyewear(item, path); !valid)
        return std::unexpected(valid.error());
    const bool update = item.id != 0 && !keepId;
    if (auto unique = requireUniqueName(db, item.name, update ? item.id : 0, path); !unique)
        return std::unexpected(unique.error());
    auto write = Statement::prepare(
        db, update ? "UPDATE eyewear SET name = ?2, description = ?3, visible_transmittance = ?4, count = ?5, "
                     "location = ?6, last_inspection = ?7, notes = ?8 WHERE id = ?1"
                   : "INSERT INTO eyewear (id, name, description, visible_transmittance, count, location, "
                     "last_inspection, notes) VALUES (?1, ?2, ?3, ?4, ?5, ?6, ?7, ?8)");
    if (!write)
        return std::unexpected(write.error());
    if (item.id != 0)
        write->bind(1, item.id);
    else
        write->bindNull(1);
    write->bind(2, item.name).bind(3, item.description).bind(4, item.visibleTransmittance).bind(5, item.count);
    write->bind(6, item.location).bind(7, item.lastInspection).bind(8, item.notes);
    if (auto done = write->run(path.empty() ? "eyewear" : path); !done)
        return std::unexpected(done.error());
    if (update && changedRows(db) == 0)
        return fail(joinPath(path, "id"), std::to_string(item.id),
                    "the id of a stored eyewear item, or 0 for a new one");
    const RecordId id = update ? item.id : lastInsertId(db);
    if (update) {
        auto clear = Statement::prepare(db, "DELETE FROM eyewear_od WHERE eyewear_id = ?1");
        auto clearMarkings = Statement::prepare(db, "DELETE FROM eyewear_marking WHERE eyewear_id = ?1");
        if (!clear)
            return std::unexpected(clear.error());
        if (!clearMarkings)
            return std::unexpected(clearMarkings.error());
        if (auto done = clear->bind(1, id).run(path); !done)
            return std::unexpected(done.error());
        if (auto done = clearMarkings->bind(1, id).run(path); !done)
            return std::unexpected(done.error());
    }
    if (auto done = insertDetails(db, id, item, path); !done)
        return std::unexpected(done.error());
    return id;
}

Result<void> deleteEyewear(sqlite3* db, model::RecordId id)
{
    auto remove = Statement::prepare(db, "DELETE FROM eyewear WHERE id = ?1");
    if (!remove)
        return std::unexpected(remove.error());
    if (auto done = remove->bind(1, id).run("eyewear"); !done)
        return done;
    if (changedRows(db) == 0)
        return fail("eyewear", std::to_string(id), "the id of a stored eyewear item");
    return {};
}

} // namespace beamwarden::store
