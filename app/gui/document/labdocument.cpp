#include "document/labdocument.hpp"

#include "document/commands.hpp"

#include <algorithm>

namespace beamwarden::gui {

namespace {

QString fromStd(const std::string& s)
{
    return QString::fromStdString(s);
}

bool inRange(int index, std::size_t size)
{
    return index >= 0 && static_cast<std::size_t>(index) < size;
}

} // namespace

Result<std::unique_ptr<LabDocument>> LabDocument::open(const QString& path)
{
    auto store = store::LabStore::open(path.toStdString());
    if (!store)
        return std::unexpected(store.error());
    auto contents = store->records();
    if (!contents)
        return std::unexpected(contents.error());
    return std::unique_ptr<LabDocument>(new LabDocument(std::move(*store), std::move(*contents)));
}

LabDocument::LabDocument(store::LabStore store, store::LabContents contents)
    : m_store(std::move(store)), m_contents(std::move(contents))
{
}

QString LabDocument::filePath() const
{
    return QString::fromStdString(m_store.path().string());
}

const std::vector<model::Assessment>& LabDocument::assessments(model::RecordId laserId)
{
    if (laserId == m_historyLaser)
        return m_history;
    m_historyLaser = 0;
    m_history.clear();
    auto read = m_store.assessments(laserId);
    if (!read) {
        reportFailure(read.error());
        return m_history;
    }
    m_history = std::move(*read);
    m_historyLaser = laserId;
    return m_history;
}

void LabDocument::refreshHistoryAfterLaserChange(model::RecordId laserId)
{
    if (laserId != m_historyLaser)
        return; // read afresh when it is next asked for
    // Only an approved assessment that is still current can be marked out of date by a change.
    const bool markable = std::any_of(m_history.begin(), m_history.end(), [](const model::Assessment& a) {
        return a.status == model::AssessmentStatus::Approved && !a.outOfDate;
    });
    if (!markable)
        return;
    m_historyLaser = 0;
    (void)assessments(laserId);
    Q_EMIT assessmentsChanged(laserId);
}

void LabDocument::updateCachedAssessment(model::RecordId assessmentId)
{
    auto stored = m_store.assessment(assessmentId);
    if (!stored) {
        m_historyLaser = 0; // read again when asked for
        m_history.clear();
        return;
    }
    if (stored->laserId == m_historyLaser) {
        const auto existing = std::find_if(m_history.begin(), m_history.end(),
                                           [&](const model::Assessment& a) { return a.id == assessmentId; });
        if (existing != m_history.end())
            *existing = *stored;
        else
            m_history.push_back(*stored);
    }
    Q_EMIT assessmentsChanged(stored->laserId);
}

bool LabDocument::reportFailure(const InputError& error)
{
    Q_EMIT storeFailed(fromStd(error.message()));
    return false;
}

void LabDocument::editLaser(int index, const model::Laser& updated, const QString& description, int mergeKey)
{
    if (inRange(index, m_contents.lasers.size()))
        m_undo.push(new EditLaserCommand(this, index, m_contents.lasers[static_cast<std::size_t>(index)], updated,
                                         description, mergeKey));
}

void LabDocument::addLaser(const model::Laser& laser)
{
    m_undo.push(new InsertLaserCommand(this, static_cast<int>(m_contents.lasers.size()), laser));
}

void LabDocument::removeLaser(int index)
{
    if (inRange(index, m_contents.lasers.size()))
        m_undo.push(new RemoveLaserCommand(this, index, m_contents.lasers[static_cast<std::size_t>(index)]));
}

void LabDocument::editEyewear(int index, const model::EyewearItem& updated, const QString& description, int mergeKey)
{
    if (inRange(index, m_contents.eyewear.size()))
        m_undo.push(new EditEyewearCommand(this, index, m_contents.eyewear[static_cast<std::size_t>(index)], updated,
                                           description, mergeKey));
}

void LabDocument::addEyewear(const model::EyewearItem& item)
{
    m_undo.push(new InsertEyewearCommand(this, static_cast<int>(m_contents.eyewear.size()), item));
}

void LabDocument::removeEyewear(int index)
{
    if (inRange(index, m_contents.eyewear.size()))
        m_undo.push(new RemoveEyewearCommand(this, index, m_contents.eyewear[static_cast<std::size_t>(index)]));
}

Result<model::RecordId> LabDocument::saveAssessment(const model::Assessment& assessment)
{
    auto id = m_store.saveAssessment(assessment);
    if (!id)
        return id;
    updateCachedAssessment(*id);
    return id;
}

Result<void> LabDocument::signOff(model::RecordId assessmentId, const model::SignOff& signOff)
{
    auto done = m_store.signOff(assessmentId, signOff);
    if (!done)
        return std::unexpected(done.error());
    updateCachedAssessment(assessmentId);
    return {};
}

bool LabDocument::applyLaser(int index, const model::Laser& laser)
{
    if (!inRange(index, m_contents.lasers.size()))
        return false;
    auto id = m_store.saveLaser(laser);
    if (!id)
        return reportFailure(id.error());
    auto stored = m_store.laser(*id);
    if (!stored)
        return reportFailure(stored.error());
    m_contents.lasers[static_cast<std::size_t>(index)] = *stored;
    refreshHistoryAfterLaserChange(*id);
    Q_EMIT laserChanged(index);
    return true;
}

bool LabDocument::insertLaserAt(int index, const model::Laser& laser)
{
    model::Laser fresh = laser;
    auto id = m_store.saveLaser(fresh);
    if (!id)
        return reportFailure(id.error());
    auto stored = m_store.laser(*id);
    if (!stored)
        return reportFailure(stored.error());
    const auto at = std::min<std::size_t>(static_cast<std::size_t>(std::max(index, 0)), m_contents.lasers.size());
    m_contents.lasers.insert(m_contents.lasers.begin() + static_cast<std::ptrdiff_t>(at), *stored);
    Q_EMIT lasersReset();
    return true;
}

bool LabDocument::removeLaserAt(int index)
{
    if (!inRange(index, m_contents.lasers.size()))
        return false;
    const model::RecordId id = m_contents.lasers[static_cast<std::size_t>(index)].id;
    auto done = m_store.removeLaser(id);
    if (!done)
        return reportFailure(done.error());
    if (id == m_historyLaser) {
        m_historyLaser = 0;
        m_history.clear();
    }
    m_contents.lasers.erase(m_contents.lasers.begin() + index);
    Q_EMIT lasersReset();
    return true;
}

bool LabDocument::applyEyewear(int index, const model::EyewearItem& item)
{
    if (!inRange(index, m_contents.eyewear.size()))
        return false;
    auto id = m_store.saveEyewear(item);
    if (!id)
        return reportFailure(id.error());
    auto stored = m_store.eyewearItem(*id);
    if (!stored)
        return reportFailure(stored.error());
    m_contents.eyewear[static_cast<std::size_t>(index)] = *stored;
    Q_EMIT eyewearChanged();
    return true;
}

bool LabDocument::insertEyewearAt(int index, const model::EyewearItem& item)
{
    auto id = m_store.saveEyewear(item);
    if (!id)
        return reportFailure(id.error());
    auto stored = m_store.eyewearItem(*id);
    if (!stored)
        return reportFailure(stored.error());
    const auto at = std::min<std::size_t>(static_cast<std::size_t>(std::max(index, 0)), m_contents.eyewear.size());
    m_contents.eyewear.insert(m_contents.eyewear.begin() + static_cast<std::ptrdiff_t>(at), *stored);
    Q_EMIT eyewearChanged();
    return true;
}

bool LabDocument::removeEyewearAt(int index)
{
    if (!inRange(index, m_contents.eyewear.size()))
        return false;
    auto done = m_store.removeEyewear(m_contents.eyewear[static_cast<std::size_t>(index)].id);
    if (!done)
        return reportFailure(done.error());
    m_contents.eyewear.erase(m_contents.eyewear.begin() + index);
    Q_EMIT eyewearChanged();
    return true;
}

} // namespace beamwarden::gui
