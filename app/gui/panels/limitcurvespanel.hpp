#pragma once
// The Limit curves panel: for one output and exposure case of an assessed laser, MPE against exposure duration,
// required OD with each eyewear item's OD against wavelength, and exposure against distance with the NOHD. It only
// displays: the engines compute every figure, and nothing derived is kept beyond what the charts draw.
#include "beamwarden/assessment/assessment.hpp"

#include <QWidget>

#include <array>
#include <vector>

class QButtonGroup;
class QGridLayout;
class QLabel;
class QStackedWidget;
class QToolButton;

namespace beamwarden::gui {

class ChartWidget;

class LimitCurvesPanel : public QWidget {
    Q_OBJECT
public:
    explicit LimitCurvesPanel(QWidget* parent = nullptr);
    // Shows the curves of one output (and one of its exposure cases) of an assessed laser; `shelf` is the eyewear
    // shelf, whose OD curves are drawn over the required OD. Indices out of range show an empty state.
    void showAssessment(const assessment::LaserAssessment& assessment, const std::vector<model::EyewearItem>& shelf,
                        int outputIndex, int caseIndex);
    void clear();                                                        // empty state with a short sentence
    [[nodiscard]] int chartCount() const;                                // 3
    [[nodiscard]] bool exportChart(int chartIndex, const QString& path); // .png or .svg by suffix

private:
    enum class View { All, Mpe, Od, Distance };

    void showEmpty(const QString& sentence);
    void setView(View view);
    void exportWithDialog(int chartIndex);
    [[nodiscard]] QString chartName(int chartIndex) const;

    QLabel* m_caption = nullptr;
    QLabel* m_details = nullptr;
    QButtonGroup* m_views = nullptr;
    QToolButton* m_export = nullptr;
    QStackedWidget* m_stack = nullptr;
    QLabel* m_empty = nullptr;
    QGridLayout* m_grid = nullptr;
    std::array<ChartWidget*, 3> m_charts{};
    bool m_showing = false;
};

} // namespace beamwarden::gui
