#pragma once
// Shared helpers for the store tests: a private temporary folder, sample records covering every field, raw SQL on a
// lab file (to show the file itself refuses what the API refuses), and file bytes for "left unchanged" checks.
#include "beamwarden/model/records.hpp"

#include <filesystem>
#include <string>

namespace storetest {

// A fresh folder under the system's temporary directory, removed with everything in it when the test ends.
class TempDir {
public:
    TempDir();
    TempDir(const TempDir&) = delete;
    TempDir& operator=(const TempDir&) = delete;
    ~TempDir();

    [[nodiscard]] const std::filesystem::path& path() const { return m_path; }
    [[nodiscard]] std::filesystem::path operator/(const std::string& name) const { return m_path / name; }

private:
    std::filesystem::path m_path;
};

[[nodiscard]] std::string fileBytes(const std::filesystem::path& path);
void writeBytes(const std::filesystem::path& path, const std::string& bytes);

// Runs SQL on the file through a plain SQLite connection (foreign keys on, as LabStore has them). Returns the
// error text, or an empty string when it succeeded.
[[nodiscard]] std::string rawSql(const std::filesystem::path& path, const std::string& sql);
// The first column of the first row as text.
[[nodiscard]] std::string rawQuery(const std::filesystem::path& path, const std::string& sql);

[[nodiscard]] beamwarden::model::Lab sampleLab();
// A pulsed laser with a sampled band, a second pulsed output in bursts and one exposure case of every viewing kind.
[[nodiscard]] beamwarden::model::Laser pulsedLaser(const std::string& name = "Amplifier A1");
// A CW laser with one line and one intrabeam case.
[[nodiscard]] beamwarden::model::Laser cwLaser(const std::string& name = "Teaching laser H1");
[[nodiscard]] beamwarden::model::EyewearItem sampleEyewear(const std::string& name = "Goggle G1");
[[nodiscard]] beamwarden::model::Assessment draftAssessment(beamwarden::model::RecordId laserId);

// Field-by-field comparisons (Catch CHECKs), written out so that a field the store forgets shows up by name.
// Ids are compared only where `withIds` says so.
void checkSameLaser(const beamwarden::model::Laser& a, const beamwarden::model::Laser& b, bool withIds = false);
void checkSameEyewear(const beamwarden::model::EyewearItem& a, const beamwarden::model::EyewearItem& b);
void checkSameAssessment(const beamwarden::model::Assessment& a, const beamwarden::model::Assessment& b);

} // namespace storetest
