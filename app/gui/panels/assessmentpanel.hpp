#pragma once
// The Assessment panel: the live results for the selected laser, per output and exposure case, the eyewear that
// covers it and why others fall short, and the provenance of the selected figure in words.
#include "beamwarden/assessment/assessment.hpp"

#include <QColor>
#include <QWidget>

#include <vector>

class QLabel;
class QTextBrowser;
class QTreeView;
class QTreeWidget;

namespace beamwarden::gui {

class VerdictListModel;

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
    void setSummaryColour(const QColor& colour);

    // What the provenance needs: the outputs' figures (the eyewear checks of a large shelf are kept by the caller).
    std::vector<assessment::OutputAssessment> m_outputs;
    QLabel* m_title = nullptr;
    QTextBrowser* m_summary = nullptr;
    QString m_summaryHtml;  // what m_summary shows
    QColor m_summaryColour; // invalid: the panel's text colour
    QTreeWidget* m_results = nullptr;
    VerdictListModel* m_eyewearModel = nullptr;
    QTreeView* m_eyewear = nullptr;
    QTextBrowser* m_provenance = nullptr;
    QString m_provenanceHtml; // what m_provenance shows
};

// Text for a hazard distance ("29.27 km", "0 m (below the MPE at the exit)", "no finite distance").
[[nodiscard]] QString distanceText(const hazard::HazardDistance& distance);
// An exposure or MPE value in its unit ("23.77 µJ/m² per pulse", "10 W/m²").
[[nodiscard]] QString exposureText(double value, bool perPulse);

} // namespace beamwarden::gui
