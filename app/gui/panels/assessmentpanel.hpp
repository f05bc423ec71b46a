#pragma once
// The Assessment panel: the live results for the selected laser, per output and exposure case, the eyewear that
// covers it and why others fall short, and the provenance of the selected figure in words.
#include "beamwarden/assessment/assessment.hpp"

#include <QWidget>

#include <optional>

class QLabel;
class QTextBrowser;
class QTreeWidget;

namespace beamwarden::gui {

class AssessmentPanel : public QWidget {
    Q_OBJECT
public:
    explicit AssessmentPanel(QWidget* parent = nullptr);

    void showAssessment(const assessment::LaserAssessment& assessment);
    void showRefusal(const QString& laserName, const QString& message); // the engines refused the input
    void clear();
    [[nodiscard]] int resultRowCount() const; // output + case rows shown (for tests)

private:
    void showProvenance();

    std::optional<assessment::LaserAssessment> m_assessment;
    QLabel* m_title = nullptr;
    QLabel* m_summary = nullptr;
    QTreeWidget* m_results = nullptr;
    QTreeWidget* m_eyewear = nullptr;
    QTextBrowser* m_provenance = nullptr;
};

// Text for a hazard distance ("29.27 km", "0 m (below the MPE at the exit)", "no finite distance").
[[nodiscard]] QString distanceText(const hazard::HazardDistance& distance);
// An exposure or MPE value in its unit ("23.77 µJ/m² per pulse", "10 W/m²").
[[nodiscard]] QString exposureText(double value, bool perPulse);

} // namespace beamwarden::gui
