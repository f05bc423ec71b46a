#pragma once
// A lab file: one lab's records in SQLite (WAL journal, foreign keys on, every change in one transaction). The store
// refuses files it cannot trust before writing to them, keeps approved assessments read-only, and marks them out of
// date when their laser changes.
#include "beamwarden/error.hpp"
#include "beamwarden/model/records.hpp"
#include "beamwarden/store/labcontents.hpp"

#include <cstdint>
#include <filesystem>
#include <span>
#include <string>
#include <string_view>
#include <vector>

struct sqlite3;

namespace beamwarden::store {

// The lab file's schema version, written to PRAGMA user_version. Raise it with every schema change and add the
// migration from the previous version (migration.hpp); files with a higher version are refused.
inline constexpr int kSchemaVersion = 1;
// PRAGMA application_id of every lab file: "BwLb" as four ASCII bytes, so `file` and a hex dump can tell it apart.
inline constexpr std::int32_t kApplicationId = 0x42774c62;
// The field of an error raised while working (disk full, I/O error, file locked by another program) rather than
// a refusal of the input; the CLI exits 1 for these and 2 for everything else.
inline constexpr std::string_view kStorageField = "storage";

// The outcome of a lab file check: every problem found, one line each.
struct CheckReport {
    int schemaVersion = 0;
    std::vector<std::string> problems;

    [[nodiscard]] bool sound() const { return problems.empty(); }
};

// Checks a lab file without writing to it: SQLite header, application id, schema version, integrity_check,
// foreign_key_check, the expected tables and triggers, and the status rules. An error only when the file cannot be
// read at all or is not SQLite.
[[nodiscard]] Result<CheckReport> checkLabFile(const std::filesystem::path& path);

// One open lab file. A LabStore is used by one thread at a time; another thread or process opens its own, and SQLite's
// locking (with a busy timeout) orders their writes.
class LabStore {
public:
    // A new lab file holding `lab` and its rooms; refuses a path that exists.
    [[nodiscard]] static Result<LabStore> create(const std::filesystem::path& path, const model::Lab& lab);
    // A new lab file holding everything in `contents`, written in one transaction; on any error the new file is
    // removed again. Record ids in `contents` are kept when non-zero.
    [[nodiscard]] static Result<LabStore> create(const std::filesystem::path& path, const LabContents& contents);
    // Opens an existing lab file. Refuses, without writing to it, a file that is not SQLite, not a lab file, made by
    // a newer Beamwarden or damaged. An older schema is copied to "<file>.v<N>.backup" and then migrated. Damage in
    // the history (assessments, sign-offs) is found before the first write that touches it, which is then refused:
    // opening reads only the records, so its time does not grow with the years of history.
    [[nodiscard]] static Result<LabStore> open(const std::filesystem::path& path);

    LabStore(LabStore&& other) noexcept;
    LabStore& operator=(LabStore&& other) noexcept;
    LabStore(const LabStore&) = delete;
    LabStore& operator=(const LabStore&) = delete;
    ~LabStore();

    [[nodiscard]] const std::filesystem::path& path() const { return m_path; }

    [[nodiscard]] Result<model::Lab> lab();
    // Name, LSO, notes and rooms (matched by name, so lasers keep their room); a room still in use stays.
    [[nodiscard]] Result<void> saveLab(const model::Lab& lab);

    // Lasers in the order they were added, each with its outputs, spectra and exposure cases.
    [[nodiscard]] Result<std::vector<model::Laser>> lasers();
    [[nodiscard]] Result<model::Laser> laser(model::RecordId id);
    // Inserts (id 0) or updates by id, replacing the outputs and cases; an output or case keeps its id when given.
    // Saving a laser identical to the stored one writes nothing, so approved assessments stay current.
    [[nodiscard]] Result<model::RecordId> saveLaser(const model::Laser& laser);
    // Several lasers in one transaction: all are saved or none.
    [[nodiscard]] Result<std::vector<model::RecordId>> saveLasers(std::span<const model::Laser> lasers);
    // Refused while the laser has approved or withdrawn assessments: those are kept as records.
    [[nodiscard]] Result<void> removeLaser(model::RecordId id);

    [[nodiscard]] Result<std::vector<model::EyewearItem>> eyewear();
    [[nodiscard]] Result<model::EyewearItem> eyewearItem(model::RecordId id);
    [[nodiscard]] Result<model::RecordId> saveEyewear(const model::EyewearItem& item);
    // Several items in one transaction: all are saved or none.
    [[nodiscard]] Result<std::vector<model::RecordId>> saveEyewear(std::span<const model::EyewearItem> items);
    [[nodiscard]] Result<void> removeEyewear(model::RecordId id);

    // A laser's assessments, oldest first, each with its sign-offs.
    [[nodiscard]] Result<std::vector<model::Assessment>> assessments(model::RecordId laserId);
    [[nodiscard]] Result<model::Assessment> assessment(model::RecordId id);
    // Inserts (id 0, status draft) or updates the content of a draft or in-review assessment. The status, the
    // out-of-date mark and the sign-offs are the store's: they change only through signOff() and laser edits, so
    // `status` must match the stored one and `outOfDate` and `signOffs` are not read. Empty created/updated times
    // are filled with the current UTC time.
    [[nodiscard]] Result<model::RecordId> saveAssessment(const model::Assessment& assessment);
    // Appends a sign-off and moves the assessment's status from `signOff.from` (which must be the current status)
    // to `signOff.to`, if model::isAllowedTransition allows it. An empty `when` is filled with the current UTC time.
    [[nodiscard]] Result<model::RecordId> signOff(model::RecordId assessmentId, const model::SignOff& signOff);

    // Everything in the file, for export.
    [[nodiscard]] Result<LabContents> contents();
    // The lab, its lasers and its eyewear from one snapshot, without the assessments: what the desktop application
    // keeps in memory, reading a laser's history when it is shown (years of stored results would not fit).
    [[nodiscard]] Result<LabContents> records();

    // A consistent copy of the open file at `outPath` (SQLite's online backup); refuses an existing path.
    [[nodiscard]] Result<void> backup(const std::filesystem::path& outPath);
    [[nodiscard]] Result<CheckReport> check();

private:
    LabStore(sqlite3* db, std::filesystem::path path, bool historyChecked);
    // Opening checks every table but the history (assessments, sign-offs), whose size grows for years; this checks
    // the history once, before the first write that can change it.
    [[nodiscard]] Result<void> requireSoundHistory();

    sqlite3* m_db = nullptr;
    std::filesystem::path m_path;
    bool m_historyChecked = false;
};

} // namespace beamwarden::store
