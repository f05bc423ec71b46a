#pragma once
// Beamwarden's one chart widget: the only place that knows the plotting library (style.md point 10). It draws a
// ChartContent with readable logarithmic ticks, named curves, marked points and labels, and exports what it shows
// as PNG or SVG.
#include "plots/chartcontent.hpp"

#include <QWidget>

#include <functional>
#include <vector>

QT_BEGIN_NAMESPACE
class QAbstractAxis;
class QAbstractSeries;
class QChart;
class QChartView;
class QGraphicsRectItem;
class QPainter;
class QXYSeries;
QT_END_NAMESPACE

namespace beamwarden::gui {

class ChartWidget : public QWidget {
    Q_OBJECT
public:
    explicit ChartWidget(QWidget* parent = nullptr);
    ~ChartWidget() override;

    // Replaces whatever is shown.
    void setContent(const ChartContent& content);
    void clear();

    [[nodiscard]] QString title() const { return m_title; }
    // The drawn series: curves first, then markers, in the order of the content. Points come back in data units,
    // without the breaks (a broken curve gives the points of all its pieces).
    [[nodiscard]] int seriesCount() const { return static_cast<int>(m_drawn.size()); }
    [[nodiscard]] QString seriesName(int index) const;
    [[nodiscard]] std::vector<QPointF> seriesPoints(int index) const;
    [[nodiscard]] QStringList labelTexts() const;

    // Writes the chart at the size shown, but at least 1000 x 620 (PNG at twice that in pixels): PNG or SVG, chosen
    // by the suffix of `path`. False if the suffix is neither or the file cannot be written.
    [[nodiscard]] bool exportTo(const QString& path);

private:
    struct Drawn {
        QString name;
        std::vector<QXYSeries*> pieces;
    };
    struct PlacedLabel {
        QPointF at; // chart coordinates (log10 on a log axis)
        LabelPlacement placement = LabelPlacement::Above;
        QGraphicsRectItem* box = nullptr;
    };
    struct AxisState {
        ChartAxis spec;
        QAbstractAxis* axis = nullptr;
        int step = 0; // decades between labels, log axes
    };

    [[nodiscard]] QPointF toChart(QPointF value) const;
    [[nodiscard]] QPointF fromChart(QPointF chart) const;
    [[nodiscard]] QAbstractAxis* makeAxis(AxisState& state, Qt::Orientation orientation);
    void attach(QXYSeries* series);
    void addCurve(const ChartCurve& curve);
    void addMarker(const ChartMarker& marker);
    void addGuide(const ChartGuide& guide);
    void addLabel(const ChartLabel& label);
    void addDecadeGrid();
    void updateDecadeLabels();
    void updateLogAxis(AxisState& state, double extentPx, double pxPerLabel);
    void placeLabels();
    void renderAt(QSize size, const std::function<void(QPainter&)>& begin);

    QChart* m_chart = nullptr;
    QChartView* m_view = nullptr;
    QString m_title;
    AxisState m_x;
    AxisState m_y;
    std::vector<Drawn> m_drawn;
    std::vector<PlacedLabel> m_labels;
    QAbstractSeries* m_anchor = nullptr; // any series on the axes, for mapping data to pixels
};

} // namespace beamwarden::gui
