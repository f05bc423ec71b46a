// LabStore's record operations: each write is one transaction, each read one snapshot.
#include "beamwarden/store/labstore.hpp"

#include "store/assessmentrows.hpp"
#include "store/eyewearrows.hpp"
#include "store/labrows.hpp"
#include "store/laserrows.hpp"
#include "store/recordcheck.hpp"
#include "store/sqlite.hpp"

namespace beamwarden::store {

namespace {

// Runs `work` in one write transaction and commits only if it succeeded.
template <typename Work>
auto inTransaction(sqlite3* db, Work&& work) -> decltype(work())
{
    auto transaction = Transaction::begin(db);
    if (!transaction)
        return std::unexpected(transaction.error());
    auto result = work();
    if (!result)
        return result;
    if (auto committed = transaction->commit(); !committed)
        return std::unexpected(committed.error());
    return result;
}

template <typename T>
Result<T> single(Result<std::vector<T>> found, std::string_view what, model::RecordId id)
{
    if (!found)
        return std::unexpected(found.error());
    if (found->empty())
        return fail(std::string(what), std::to_string(id), "the id of a stored " + std::string(what));
    return std::move(found->front());
}

} // namespace

Result<model::Lab> LabStore::lab()
{
    auto snapshot = Transaction::beginRead(m_db);
    if (!snapshot)
        return std::unexpected(snapshot.error());
    return readLab(m_db);
}

Result<void> LabStore::saveLab(const model::Lab& lab)
{
    return inTransaction(m_db, [&] { return updateLab(m_db, lab); });
}

Result<std::vector<model::Laser>> LabStore::lasers()
{
    auto snapshot = Transaction::beginRead(m_db);
    if (!snapshot)
        return std::unexpected(snapshot.error());
    return readLasers(m_db);
}

Result<model::Laser> LabStore::laser(model::RecordId id)
{
    auto snapshot = Transaction::beginRead(m_db);
    if (!snapshot)
        return std::unexpected(snapshot.error());
    return single(readLasers(m_db, id), "laser", id);
}

Result<model::RecordId> LabStore::saveLaser(const model::Laser& laser)
{
    // A laser's change marks its approved assessments out of date (triggers), so it writes into the history.
    if (auto sound = requireSoundHistory(); !sound)
        return std::unexpected(sound.error());
    return inTransaction(m_db, [&] { return writeLaser(m_db, laser, LaserWrite::Save, ""); });
}

Result<std::vector<model::RecordId>> LabStore::saveLasers(std::span<const model::Laser> lasers)
{
    if (auto sound = requireSoundHistory(); !sound)
        return std::unexpected(sound.error());
    return inTransaction(m_db, [&]() -> Result<std::vector<model::RecordId>> {
        std::vector<model::RecordId> ids;
        for (std::size_t i = 0; i < lasers.size(); ++i) {
            auto id = writeLaser(m_db, lasers[i], LaserWrite::Save, indexPath("", "lasers", i));
            if (!id)
                return std::unexpected(id.error());
            ids.push_back(*id);
        }
        return ids;
    });
}

Result<void> LabStore::removeLaser(model::RecordId id)
{
    if (auto sound = requireSoundHistory(); !sound)
        return sound;
    return inTransaction(m_db, [&] { return deleteLaser(m_db, id); });
}

Result<std::vector<model::EyewearItem>> LabStore::eyewear()
{
    auto snapshot = Transaction::beginRead(m_db);
    if (!snapshot)
        return std::unexpected(snapshot.error());
    return readEyewear(m_db);
}

Result<model::EyewearItem> LabStore::eyewearItem(model::RecordId id)
{
    auto snapshot = Transaction::beginRead(m_db);
    if (!snapshot)
        return std::unexpected(snapshot.error());
    return single(readEyewear(m_db, id), "eyewear item", id);
}

Result<model::RecordId> LabStore::saveEyewear(const model::EyewearItem& item)
{
    return inTransaction(m_db, [&] { return writeEyewear(m_db, item, false, ""); });
}

Result<std::vector<model::RecordId>> LabStore::saveEyewear(std::span<const model::EyewearItem> items)
{
    return inTransaction(m_db, [&]() -> Result<std::vector<model::RecordId>> {
        std::vector<model::RecordId> ids;
        for (std::size_t i = 0; i < items.size(); ++i) {
            auto id = writeEyewear(m_db, items[i], false, indexPath("", "eyewear", i));
            if (!id)
                return std::unexpected(id.error());
            ids.push_back(*id);
        }
        return ids;
    });
}

Result<void> LabStore::removeEyewear(model::RecordId id)
{
    return inTransaction(m_db, [&] { return deleteEyewear(m_db, id); });
}

Result<std::vector<model::Assessment>> LabStore::assessments(model::RecordId laserId)
{
    auto snapshot = Transaction::beginRead(m_db);
    if (!snapshot)
        return std::unexpected(snapshot.error());
    return readAssessments(m_db, AssessmentFilter{laserId, {}});
}

Result<model::Assessment> LabStore::assessment(model::RecordId id)
{
    auto snapshot = Transaction::beginRead(m_db);
    if (!snapshot)
        return std::unexpected(snapshot.error());
    return single(readAssessments(m_db, AssessmentFilter{{}, id}), "assessment", id);
}

Result<model::RecordId> LabStore::saveAssessment(const model::Assessment& assessment)
{
    if (auto sound = requireSoundHistory(); !sound)
        return std::unexpected(sound.error());
    return inTransaction(m_db, [&] { return saveAssessmentRow(m_db, assessment, ""); });
}

Result<model::RecordId> LabStore::signOff(model::RecordId assessmentId, const model::SignOff& signOff)
{
    if (auto sound = requireSoundHistory(); !sound)
        return std::unexpected(sound.error());
    return inTransaction(m_db, [&] { return insertSignOff(m_db, assessmentId, signOff, "sign_off"); });
}

Result<LabContents> LabStore::contents()
{
    auto snapshot = Transaction::beginRead(m_db);
    if (!snapshot)
        return std::unexpected(snapshot.error());
    LabContents contents;
    auto lab = readLab(m_db);
    auto lasers = readLasers(m_db);
    auto eyewear = readEyewear(m_db);
    auto assessments = readAssessments(m_db, {});
    if (!lab)
        return std::unexpected(lab.error());
    if (!lasers)
        return std::unexpected(lasers.error());
    if (!eyewear)
        return std::unexpected(eyewear.error());
    if (!assessments)
        return std::unexpected(assessments.error());
    return LabContents{std::move(*lab), std::move(*lasers), std::move(*eyewear), std::move(*assessments)};
}

Result<LabContents> LabStore::records()
{
    auto snapshot = Transaction::beginRead(m_db);
    if (!snapshot)
        return std::unexpected(snapshot.error());
    auto lab = readLab(m_db);
    auto lasers = readLasers(m_db);
    auto eyewear = readEyewear(m_db);
    if (!lab)
        return std::unexpected(lab.error());
    if (!lasers)
        return std::unexpected(lasers.error());
    if (!eyewear)
        return std::unexpected(eyewear.error());
    return LabContents{std::move(*lab), std::move(*lasers), std::move(*eyewear), {}};
}

} // namespace beamwarden::store
