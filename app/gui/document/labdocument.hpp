#pragma once
// The open lab: its records in memory, the lab file behind them, and the undo stack. Every edit goes through a
// command (commands.hpp) which calls the apply* functions; each apply writes the lab file first and changes memory
// only when the write succeeded, so what is shown is what is stored.
#include "beamwarden/model/records.hpp"
#include "beamwarden/store/labcontents.hpp"
#include "beamwarden/store/labstore.hpp"

#include <QObject>
#include <QString>
#include <QUndoStack>

#include <memory>
#include <optional>
#include <vector>

namespace beamwarden::gui {

class LabDocument : public QObject {
    Q_OBJECT
public:
    // Opens a lab file (refused files give the store's message).
    [[nodiscard]] static Result<std::unique_ptr<LabDocument>> open(const QString& path);

    [[nodiscard]] const model::Lab& lab() const { return m_contents.lab; }
    [[nodiscard]] const std::vector<model::Laser>& lasers() const { return m_contents.lasers; }
    [[nodiscard]] const std::vector<model::EyewearItem>& eyewear() const { return m_contents.eyewear; }
    // A laser's assessments, oldest first, read from the file when another laser's were last asked for: a site's
    // file holds years of them with their stored results, far more than the views show at once. Empty (and
    // storeFailed emitted) when the file cannot be read.
    [[nodiscard]] const std::vector<model::Assessment>& assessments(model::RecordId laserId);
    [[nodiscard]] QString filePath() const;
    [[nodiscard]] QUndoStack* undoStack() { return &m_undo; }
    [[nodiscard]] store::LabStore& store() { return m_store; }

    // User edits: each pushes one undoable command. `mergeKey` >= 0 merges successive edits of one field.
    void editLaser(int index, const model::Laser& updated, const QString& description, int mergeKey = -1);
    void addLaser(const model::Laser& laser);
    void removeLaser(int index);
    void editEyewear(int index, const model::EyewearItem& updated, const QString& description, int mergeKey = -1);
    void addEyewear(const model::EyewearItem& item);
    void removeEyewear(int index);
    // Not undoable: sign-offs and saved assessments are the record's history.
    [[nodiscard]] Result<model::RecordId> saveAssessment(const model::Assessment& assessment);
    [[nodiscard]] Result<void> signOff(model::RecordId assessmentId, const model::SignOff& signOff);

    // Used by the commands only. Return false (and emit storeFailed) when the lab file refused the change.
    bool applyLaser(int index, const model::Laser& laser);
    bool insertLaserAt(int index, const model::Laser& laser);
    bool removeLaserAt(int index);
    bool applyEyewear(int index, const model::EyewearItem& item);
    bool insertEyewearAt(int index, const model::EyewearItem& item);
    bool removeEyewearAt(int index);

Q_SIGNALS:
    void lasersReset();
    void laserChanged(int index);
    void eyewearChanged();
    void assessmentsChanged(model::RecordId laserId);
    void storeFailed(const QString& message);

private:
    LabDocument(store::LabStore store, store::LabContents contents);
    bool reportFailure(const InputError& error);
    // After a laser's change: read its history again if it may have changed (the file marks approved assessments
    // out of date) and say so.
    void refreshHistoryAfterLaserChange(model::RecordId laserId);
    void updateCachedAssessment(model::RecordId assessmentId);

    store::LabStore m_store;
    store::LabContents m_contents;      // lab, lasers, eyewear; no assessments (see assessments())
    model::RecordId m_historyLaser = 0; // whose assessments m_history holds; 0: none
    std::vector<model::Assessment> m_history;
    QUndoStack m_undo;
};

} // namespace beamwarden::gui
