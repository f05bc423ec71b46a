#include "store/assessmentrows.hpp"

#include "store/isotime.hpp"
#include "store/recordcheck.hpp"
#include "store/sqlite.hpp"

namespace beamwarden::store {

namespace {

using model::AssessmentStatus;
using model::RecordId;

Result<AssessmentStatus> storedStatus(const std::string& text)
{
    auto status = model::parseAssessmentStatus(text);
    if (!status)
        return fail("lab file", text, "a stored status this program knows");
    return *status;
}

Result<std::vector<model::SignOff>> readSignOffs(Statement& select, RecordId assessmentId)
{
    std::vector<model::SignOff> signOffs;
    select.bind(1, assessmentId);
    for (;;) {
        auto row = select.step();
        if (!row)
            return std::unexpected(row.error());
        if (!*row)
            break;
        auto from = storedStatus(select.text(3));
        auto to = storedStatus(select.text(4));
        if (!from)
            return std::unexpected(from.error());
        if (!to)
            return std::unexpected(to.error());
        signOffs.push_back(
            model::SignOff{select.integer(0), select.text(1), select.text(2), *from, *to, select.text(5)});
    }
    select.reset();
    return signOffs;
}

constexpr std::string_view kSelectStatus = "SELECT status FROM assessment WHERE id = ?1";
constexpr std::string_view kLaserExists = "SELECT count(*) FROM laser WHERE id = ?1";
constexpr std::string_view kInsertDraft = R"sql(
        INSERT INTO assessment (id, laser_id, title, rule_set, program_version, author, created, updated, status,
                                out_of_date, input_snapshot, results)
        VALUES (?1, ?2, ?3, ?4, ?5, ?6, ?7, ?8, 'draft', 0, ?9, ?10))sql";
constexpr std::string_view kInsertSignOff = R"sql(
        INSERT INTO sign_off (assessment_id, who, signed_at, from_status, to_status, comment)
        VALUES (?1, ?2, ?3, ?4, ?5, ?6))sql";
constexpr std::string_view kMarkOutOfDate = "UPDATE assessment SET out_of_date = 1 WHERE id = ?1";

// The helpers below take prepared statements, so that AssessmentInserter can prepare each once; every helper
// leaves its statement reset for the next use.

Result<std::optional<AssessmentStatus>> currentStatus(Statement& select, RecordId id)
{
    select.bind(1, id);
    auto row = select.step();
    if (!row)
        return std::unexpected(row.error());
    std::optional<AssessmentStatus> found;
    if (*row) {
        auto status = storedStatus(select.text(0));
        if (!status)
            return std::unexpected(status.error());
        found = *status;
    }
    select.reset();
    return found;
}

Result<void> requireLaser(Statement& select, RecordId laserId, std::string_view path)
{
    select.bind(1, laserId);
    auto row = select.step();
    if (!row)
        return std::unexpected(row.error());
    const bool stored = *row && select.integer(0) > 0;
    select.reset();
    if (!stored)
        return fail(joinPath(path, "laser"), std::to_string(laserId), "the id of a stored laser");
    return {};
}

std::string orNow(const std::string& time)
{
    return time.empty() ? utcNow() : time;
}

Result<RecordId> insertDraft(sqlite3* db, Statement& insert, const model::Assessment& a, RecordId id,
                             std::string_view path)
{
    if (id != 0)
        insert.bind(1, id);
    else
        insert.bindNull(1);
    insert.bind(2, a.laserId).bind(3, a.title).bind(4, a.ruleSet).bind(5, a.programVersion).bind(6, a.author);
    insert.bind(7, orNow(a.created)).bind(8, orNow(a.updated)).bind(9, a.inputSnapshot).bind(10, a.results);
    if (auto done = insert.run(path.empty() ? "assessment" : path); !done)
        return std::unexpected(done.error());
    return lastInsertId(db);
}

Result<model::RecordId> insertSignOffWith(sqlite3* db, Statement& status, Statement& insert,
                                          model::RecordId assessmentId, const model::SignOff& signOff,
                                          std::string_view path)
{
    if (auto valid = validateSignOff(signOff, path); !valid)
        return std::unexpected(valid.error());
    auto stored = currentStatus(status, assessmentId);
    if (!stored)
        return std::unexpected(stored.error());
    if (!*stored)
        return fail("assessment", std::to_string(assessmentId), "the id of a stored assessment");
    if (signOff.from != **stored)
        return fail(joinPath(path, "from"), std::string(model::toString(signOff.from)),
                    "the assessment's current status '" + std::string(model::toString(**stored)) + "'");
    if (!model::isAllowedTransition(signOff.from, signOff.to))
        return fail(joinPath(path, "to"), std::string(model::toString(signOff.to)),
                    "an allowed move: draft -> in review -> approved, in review -> draft, or to withdrawn");
    insert.bind(1, assessmentId).bind(2, signOff.who).bind(3, orNow(signOff.when));
    insert.bind(4, model::toString(signOff.from)).bind(5, model::toString(signOff.to)).bind(6, signOff.comment);
    if (auto done = insert.run(path.empty() ? "sign-off" : path); !done)
        return std::unexpected(done.error());
    return lastInsertId(db);
}

} // namespace

Result<std::vector<model::Assessment>> readAssessments(sqlite3* db, AssessmentFilter filter)
{
    auto select = Statement::prepare(db, R"sql(
        SELECT id, laser_id, title, rule_set, program_version, author, created, updated, status, out_of_date,
               input_snapshot, results
        FROM assessment WHERE (?1 IS NULL OR laser_id = ?1) AND (?2 IS NULL OR id = ?2) ORDER BY id)sql");
    auto signOffs = Statement::prepare(db, R"sql(
        SELECT id, who, signed_at, from_status, to_status, comment FROM sign_off WHERE assessment_id = ?1
        ORDER BY id)sql");
    if (!select)
        return std::unexpected(select.error());
    if (!signOffs)
        return std::unexpected(signOffs.error());
    if (filter.laserId)
        select->bind(1, *filter.laserId);
    if (filter.id)
        select->bind(2, *filter.id);
    std::vector<model::Assessment> assessments;
    for (;;) {
        auto row = select->step();
        if (!row)
            return std::unexpected(row.error());
        if (!*row)
            break;
        model::Assessment a;
        a.id = select->integer(0);
        a.laserId = select->integer(1);
        a.title = select->text(2);
        a.ruleSet = select->text(3);
        a.programVersion = select->text(4);
        a.author = select->text(5);
        a.created = select->text(6);
        a.updated = select->text(7);
        auto status = storedStatus(select->text(8));
        if (!status)
            return std::unexpected(status.error());
        a.status = *status;
        a.outOfDate = select->integer(9) != 0;
        a.inputSnapshot = select->text(10);
        a.results = select->text(11);
        assessments.push_back(std::move(a));
    }
    for (model::Assessment& a : assessments) {
        auto history = readSignOffs(*signOffs, a.id);
        if (!history)
            return std::unexpected(history.error());
        a.signOffs = std::move(*history);
    }
    return assessments;
}

Result<model::RecordId> saveAssessmentRow(sqlite3* db, const model::Assessment& a, std::string_view path)
{
    if (auto valid = validateAssessment(a, path); !valid)
        return std::unexpected(valid.error());
    auto laserExists = Statement::prepare(db, kLaserExists);
    if (!laserExists)
        return std::unexpected(laserExists.error());
    if (auto laser = requireLaser(*laserExists, a.laserId, path); !laser)
        return std::unexpected(laser.error());
    if (a.id == 0) {
        if (a.status != AssessmentStatus::Draft)
            return fail(joinPath(path, "status"), std::string(model::toString(a.status)),
                        "draft for a new assessment; the status moves by sign-off");
        auto insert = Statement::prepare(db, kInsertDraft);
        if (!insert)
            return std::unexpected(insert.error());
        return insertDraft(db, *insert, a, 0, path);
    }
    auto select = Statement::prepare(db, kSelectStatus);
    if (!select)
        return std::unexpected(select.error());
    auto stored = currentStatus(*select, a.id);
    if (!stored)
        return std::unexpected(stored.error());
    if (!*stored)
        return fail(joinPath(path, "id"), std::to_string(a.id), "the id of a stored assessment, or 0 for a new one");
    if (**stored == AssessmentStatus::Approved || **stored == AssessmentStatus::Withdrawn)
        return fail(joinPath(path, "status"), std::string(model::toString(**stored)),
                    "a draft or in-review assessment; an approved or withdrawn one is read-only, start a new draft");
    if (a.status != **stored)
        return fail(joinPath(path, "status"), std::string(model::toString(a.status)),
                    "the stored status '" + std::string(model::toString(**stored)) + "'; it moves by sign-off");
    auto update = Statement::prepare(db, R"sql(
        UPDATE assessment SET laser_id = ?2, title = ?3, rule_set = ?4, program_version = ?5, author = ?6,
                              created = ?7, updated = ?8, input_snapshot = ?9, results = ?10
        WHERE id = ?1)sql");
    if (!update)
        return std::unexpected(update.error());
    update->bind(1, a.id).bind(2, a.laserId).bind(3, a.title).bind(4, a.ruleSet).bind(5, a.programVersion);
    update->bind(6, a.author).bind(7, orNow(a.created)).bind(8, orNow(a.updated)).bind(9, a.inputSnapshot);
    update->bind(10, a.results);
    if (auto done = update->run(path.empty() ? "assessment" : path); !done)
        return std::unexpected(done.error());
    return a.id;
}

Result<model::RecordId> insertSignOff(sqlite3* db, model::RecordId assessmentId, const model::SignOff& signOff,
                                      std::string_view path)
{
    auto status = Statement::prepare(db, kSelectStatus);
    auto insert = Statement::prepare(db, kInsertSignOff);
    if (!status)
        return std::unexpected(status.error());
    if (!insert)
        return std::unexpected(insert.error());
    return insertSignOffWith(db, *status, *insert, assessmentId, signOff, path);
}

AssessmentInserter::AssessmentInserter(sqlite3* db, Statement laserExists, Statement status, Statement insert,
                                       Statement signOff, Statement markOutOfDate)
    : m_db(db), m_laserExists(std::move(laserExists)), m_status(std::move(status)), m_insert(std::move(insert)),
      m_signOff(std::move(signOff)), m_markOutOfDate(std::move(markOutOfDate))
{
}

Result<AssessmentInserter> AssessmentInserter::prepare(sqlite3* db)
{
    auto laserExists = Statement::prepare(db, kLaserExists);
    auto status = Statement::prepare(db, kSelectStatus);
    auto insert = Statement::prepare(db, kInsertDraft);
    auto signOff = Statement::prepare(db, kInsertSignOff);
    auto markOutOfDate = Statement::prepare(db, kMarkOutOfDate);
    for (const auto* prepared : {&laserExists, &status, &insert, &signOff, &markOutOfDate}) {
        if (!*prepared)
            return std::unexpected(prepared->error());
    }
    return AssessmentInserter(db, std::move(*laserExists), std::move(*status), std::move(*insert), std::move(*signOff),
                              std::move(*markOutOfDate));
}

Result<model::RecordId> AssessmentInserter::insertWithHistory(const model::Assessment& a, std::string_view path)
{
    if (auto valid = validateAssessment(a, path); !valid)
        return std::unexpected(valid.error());
    if (auto laser = requireLaser(m_laserExists, a.laserId, path); !laser)
        return std::unexpected(laser.error());
    auto id = insertDraft(m_db, m_insert, a, a.id, path);
    if (!id)
        return id;
    for (std::size_t i = 0; i < a.signOffs.size(); ++i) {
        if (auto done =
                insertSignOffWith(m_db, m_status, m_signOff, *id, a.signOffs[i], indexPath(path, "sign_offs", i));
            !done)
            return std::unexpected(done.error());
    }
    auto status = currentStatus(m_status, *id);
    if (!status)
        return std::unexpected(status.error());
    if (*status != a.status)
        return fail(joinPath(path, "status"), std::string(model::toString(a.status)),
                    "the status its last sign-off leaves ('" + std::string(model::toString(**status)) + "')");
    if (a.outOfDate) {
        if (auto done = m_markOutOfDate.bind(1, *id).run(joinPath(path, "out_of_date")); !done)
            return std::unexpected(done.error());
    }
    return id;
}

} // namespace beamwarden::store
