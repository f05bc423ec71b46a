#pragma once
// The History panel: the selected laser's assessments with their status and sign-offs; recording the current
// results as a new draft; moving an assessment along draft -> in review -> approved (or withdrawn) with a name and a
// comment. Approved assessments are read-only and marked when the laser changed after approval.
#include "beamwarden/assessment/assessment.hpp"

#include <QWidget>

#include <optional>

class QLabel;
class QPushButton;
class QTreeWidget;

namespace beamwarden::gui {

class LabDocument;

class HistoryPanel : public QWidget {
    Q_OBJECT
public:
    explicit HistoryPanel(QWidget* parent = nullptr);
    void setDocument(LabDocument* document);
    // `current` (or null) is the caller's, kept alive until the next call.
    void setLaser(int index, const assessment::LaserAssessment* current);
    [[nodiscard]] int assessmentCount() const;

private:
    void reload();
    void recordCurrent();
    void signOffSelected();

    LabDocument* m_document = nullptr;
    int m_laser = -1;
    const assessment::LaserAssessment* m_current = nullptr;
    QLabel* m_title = nullptr;
    QTreeWidget* m_list = nullptr;
    QPushButton* m_record = nullptr;
    QPushButton* m_signOff = nullptr;
};

} // namespace beamwarden::gui
