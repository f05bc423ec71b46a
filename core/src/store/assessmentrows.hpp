#pragma once
// Assessments and their sign-offs, to and from the lab file's rows, with the status rules checked before the
// triggers see them (so the refusal names the field). The callers hold the transaction.
#include "beamwarden/error.hpp"
#include "beamwarden/model/records.hpp"
#include "store/sqlite.hpp"

#include <optional>
#include <string_view>
#include <vector>

struct sqlite3;

namespace beamwarden::store {

struct AssessmentFilter {
    std::optional<model::RecordId> laserId;
    std::optional<model::RecordId> id;
};

// Matching assessments in id order, each with its sign-offs in the order they were made.
[[nodiscard]] Result<std::vector<model::Assessment>> readAssessments(sqlite3* db, AssessmentFilter filter);

// Inserts (id 0; the status must be draft) or updates a draft or in-review assessment's content.
[[nodiscard]] Result<model::RecordId> saveAssessmentRow(sqlite3* db, const model::Assessment& assessment,
                                                        std::string_view path);

[[nodiscard]] Result<model::RecordId> insertSignOff(sqlite3* db, model::RecordId assessmentId,
                                                    const model::SignOff& signOff, std::string_view path);

// Many assessments into a fresh file (create, import) with statements prepared once: preparing an INSERT into
// sign_off compiles its triggers, which costs more than running it, and a large lab has hundreds of thousands.
// Used inside the caller's transaction; not reused after an error.
class AssessmentInserter {
public:
    [[nodiscard]] static Result<AssessmentInserter> prepare(sqlite3* db);

    // Inserts the assessment under its id as a draft, replays its sign-offs, then sets the out-of-date mark, so
    // the triggers check the whole history.
    [[nodiscard]] Result<model::RecordId> insertWithHistory(const model::Assessment& assessment, std::string_view path);

private:
    AssessmentInserter(sqlite3* db, Statement laserExists, Statement status, Statement insert, Statement signOff,
                       Statement markOutOfDate);

    sqlite3* m_db;
    Statement m_laserExists;
    Statement m_status;
    Statement m_insert;
    Statement m_signOff;
    Statement m_markOutOfDate;
};

} // namespace beamwarden::store
