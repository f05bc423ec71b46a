#include "store/fileguard.hpp"

#include "beamwarden/model/records.hpp"
#include "store/schema.hpp"
#include "store/sqlite.hpp"

#include <fmt/core.h>

#include <algorithm>
#include <array>
#include <fstream>
#include <set>
#include <vector>

namespace beamwarden::store {

namespace {

constexpr std::string_view kSqliteHeader{"SQLite format 3\0", 16};

InputError refusal(const std::filesystem::path& path, std::string allowed)
{
    return InputError{"lab file", path.string(), std::move(allowed)};
}

std::string versionText(std::int64_t version)
{
    return fmt::format("schema version {}", version);
}

// The tables that grow for as long as a lab is used: years of assessments with their stored results reach hundreds
// of megabytes, and checking them on every open would make opening as slow as reading the whole history. Opening
// checks every other table; these are checked before the first write that can touch them and by every full check.
constexpr std::array<std::string_view, 2> kHistoryTables{"assessment", "sign_off"};

// integrity_check reports "ok" or up to 100 lines of damage; a badly damaged file fails the pragma itself. With a
// table, only that table and its indexes are checked.
void checkIntegrity(sqlite3* db, CheckReport& report, std::string_view table = {})
{
    auto statement = Statement::prepare(db, table.empty() ? std::string("PRAGMA integrity_check")
                                                          : fmt::format("PRAGMA integrity_check(\"{}\")", table));
    if (!statement) {
        report.problems.push_back("damaged: " + statement.error().value);
        return;
    }
    for (;;) {
        auto row = statement->step();
        if (!row) {
            report.problems.push_back("damaged: " + row.error().value);
            return;
        }
        if (!*row)
            return;
        const std::string line = statement->text(0);
        if (line != "ok")
            report.problems.push_back("damaged: " + line);
    }
}

// Every table but the history, each with its indexes: what opening a file and listing its records reads.
void checkRecordsIntegrity(sqlite3* db, CheckReport& report)
{
    auto statement = Statement::prepare(db, "SELECT name FROM sqlite_schema WHERE type = 'table' ORDER BY name");
    if (!statement) {
        report.problems.push_back("damaged: " + statement.error().value);
        return;
    }
    std::vector<std::string> tables;
    for (;;) {
        auto row = statement->step();
        if (!row) {
            report.problems.push_back("damaged: " + row.error().value);
            return;
        }
        if (!*row)
            break;
        std::string name = statement->text(0);
        if (std::find(kHistoryTables.begin(), kHistoryTables.end(), name) == kHistoryTables.end())
            tables.push_back(std::move(name));
    }
    for (const std::string& table : tables) {
        checkIntegrity(db, report, table);
        if (!report.sound())
            return;
    }
}

void checkForeignKeys(sqlite3* db, CheckReport& report)
{
    auto statement = Statement::prepare(db, "PRAGMA foreign_key_check");
    if (!statement) {
        report.problems.push_back("foreign keys could not be checked: " + statement.error().value);
        return;
    }
    while (true) {
        auto row = statement->step();
        if (!row) {
            report.problems.push_back("foreign keys could not be checked: " + row.error().value);
            return;
        }
        if (!*row)
            return;
        report.problems.push_back(fmt::format("a {} row (rowid {}) refers to a missing {} record", statement->text(0),
                                              statement->integer(1), statement->text(2)));
    }
}

void checkSchemaObjects(sqlite3* db, CheckReport& report)
{
    auto statement = Statement::prepare(db, "SELECT name FROM sqlite_schema WHERE type IN ('table', 'trigger')");
    if (!statement) {
        report.problems.push_back("schema could not be read: " + statement.error().value);
        return;
    }
    std::set<std::string, std::less<>> present;
    while (true) {
        auto row = statement->step();
        if (!row || !*row)
            break;
        present.insert(statement->text(0));
    }
    for (const std::string_view name : expectedSchemaObjects()) {
        if (!present.contains(name))
            report.problems.push_back(fmt::format("the schema lacks '{}'", name));
    }
}

// The stored moves must be exactly the program's, or a trigger would allow what the program refuses.
void checkStatusMoves(sqlite3* db, CheckReport& report)
{
    using model::AssessmentStatus;
    constexpr std::array kStatuses{AssessmentStatus::Draft, AssessmentStatus::InReview, AssessmentStatus::Approved,
                                   AssessmentStatus::Withdrawn};
    auto statement =
        Statement::prepare(db, "SELECT count(*) FROM status_move WHERE from_status = ?1 AND to_status = ?2");
    if (!statement)
        return;
    for (const auto from : kStatuses) {
        for (const auto to : kStatuses) {
            statement->bind(1, model::toString(from)).bind(2, model::toString(to));
            auto row = statement->step();
            const bool stored = row && *row && statement->integer(0) > 0;
            statement->reset();
            if (stored != model::isAllowedTransition(from, to))
                report.problems.push_back(fmt::format("the status move '{}' -> '{}' is {} in the file",
                                                      model::toString(from), model::toString(to),
                                                      stored ? "allowed" : "missing"));
        }
    }
}

// An assessment's status is where its last sign-off left it (a draft without sign-offs).
void checkStatusHistory(sqlite3* db, CheckReport& report)
{
    auto statement = Statement::prepare(db, R"sql(
        SELECT a.id, a.status, a.out_of_date,
               coalesce((SELECT s.to_status FROM sign_off s WHERE s.assessment_id = a.id ORDER BY s.id DESC LIMIT 1),
                        'draft')
        FROM assessment a ORDER BY a.id)sql");
    if (!statement)
        return;
    while (true) {
        auto row = statement->step();
        if (!row || !*row)
            break;
        const std::string status = statement->text(1);
        if (status != statement->text(3))
            report.problems.push_back(fmt::format("assessment {} is '{}' but its last sign-off left it '{}'",
                                                  statement->integer(0), status, statement->text(3)));
        if (statement->integer(2) != 0 && status != "approved" && status != "withdrawn")
            report.problems.push_back(
                fmt::format("assessment {} is marked out of date but was never approved", statement->integer(0)));
    }
}

} // namespace

Result<void> requireSqliteFile(const std::filesystem::path& path)
{
    std::error_code error;
    const auto status = std::filesystem::status(path, error);
    if (error || !std::filesystem::exists(status))
        return std::unexpected(refusal(path, "an existing lab file (no file at that path)"));
    if (!std::filesystem::is_regular_file(status))
        return std::unexpected(refusal(path, "a lab file (this path is not a regular file)"));
    std::ifstream in(path, std::ios::binary);
    std::array<char, 16> header{};
    in.read(header.data(), header.size());
    if (!in || std::string_view(header.data(), header.size()) != kSqliteHeader)
        return std::unexpected(refusal(path, "a Beamwarden lab file (this file is not an SQLite database)"));
    return {};
}

Result<int> admitLabFile(const std::filesystem::path& path)
{
    if (auto sqlite = requireSqliteFile(path); !sqlite)
        return std::unexpected(sqlite.error());
    auto connection = Connection::open(path, OpenMode::ReadOnly);
    if (!connection)
        return std::unexpected(connection.error());
    sqlite3* db = connection->handle();
    auto applicationId = queryInteger(db, "PRAGMA application_id");
    if (!applicationId)
        return std::unexpected(refusal(path, "an undamaged lab file (" + applicationId.error().value + ")"));
    if (*applicationId != kApplicationId)
        return std::unexpected(
            refusal(path, "a Beamwarden lab file (this SQLite database belongs to another program)"));
    auto version = queryInteger(db, "PRAGMA user_version");
    if (!version)
        return std::unexpected(refusal(path, "an undamaged lab file (" + version.error().value + ")"));
    if (*version > kSchemaVersion)
        return std::unexpected(refusal(
            path, fmt::format("a lab file of schema version {} or older; this one has {} and was written by a newer "
                              "Beamwarden, so open it with that version",
                              kSchemaVersion, versionText(*version))));
    if (*version < 1)
        return std::unexpected(refusal(path, "a complete lab file (this one has no schema version)"));
    // A file about to be migrated is read and rewritten whole, so all of it is checked first.
    CheckReport integrity;
    if (*version < kSchemaVersion)
        checkIntegrity(db, integrity);
    else
        checkRecordsIntegrity(db, integrity);
    if (!integrity.sound())
        return std::unexpected(
            refusal(path, "an undamaged lab file (" + integrity.problems.front() + "); restore it from a backup"));
    return static_cast<int>(*version);
}

Result<void> checkHistoryIntegrity(sqlite3* db, const std::filesystem::path& path)
{
    CheckReport integrity;
    for (const std::string_view table : kHistoryTables) {
        checkIntegrity(db, integrity, table);
        if (!integrity.sound())
            return std::unexpected(
                refusal(path, "an undamaged lab file (" + integrity.problems.front() + "); restore it from a backup"));
    }
    return {};
}

void runChecks(sqlite3* db, CheckReport& report)
{
    auto applicationId = queryInteger(db, "PRAGMA application_id");
    if (!applicationId) {
        report.problems.push_back("damaged: " + applicationId.error().value);
        return;
    }
    if (*applicationId != kApplicationId)
        report.problems.push_back("not a Beamwarden lab file (another program's SQLite database)");
    auto version = queryInteger(db, "PRAGMA user_version");
    report.schemaVersion = version ? static_cast<int>(*version) : 0;
    if (report.schemaVersion > kSchemaVersion)
        report.problems.push_back(
            fmt::format("{} is newer than this program's {}", versionText(report.schemaVersion), kSchemaVersion));
    else if (report.schemaVersion < 1)
        report.problems.push_back("no schema version");
    checkIntegrity(db, report);
    if (!report.sound())
        return; // the remaining checks read tables that a damaged or foreign file may not have
    checkForeignKeys(db, report);
    if (report.schemaVersion == kSchemaVersion) {
        checkSchemaObjects(db, report);
        if (report.sound()) {
            checkStatusMoves(db, report);
            checkStatusHistory(db, report);
        }
    }
}

Result<CheckReport> checkLabFile(const std::filesystem::path& path)
{
    if (auto sqlite = requireSqliteFile(path); !sqlite)
        return std::unexpected(sqlite.error());
    auto connection = Connection::open(path, OpenMode::ReadOnly);
    if (!connection)
        return std::unexpected(connection.error());
    CheckReport report;
    runChecks(connection->handle(), report);
    return report;
}

} // namespace beamwarden::store
