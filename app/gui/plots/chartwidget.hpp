#pragma once
// Beamwarden's one chart widget: the only place that knows the plotting library (style.md point 10). It draws a
// ChartContent with readable logarithmic ticks, named curves, marked points and labels, and exports what it shows
// as PNG or SVG.
#include "plots/chartcontent.hpp"

#include <QColor>
#include <QList>
#include <QPointF>
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

class PlotGrid;

class ChartWidget : public QWidget {
    Q_OBJECT
public:
    explicit ChartWidget(QWidget* parent = nullptr);
    ~ChartWidget() override;

    // Replaces whatever is shown. Content of the same shape as the last (the same axes, curves, markers, guides
    // and labels, with other numbers) is moved into the chart's existing items.
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
        int step = 0;        // decades between labels, log axes
        double interval = 0; // between ticks, linear axes
    };
    // What decides which items a content needs. A rebuild makes the library lay out axes, legend and texts afresh,
    // which costs several times a whole repaint; an edit usually changes only numbers.
    struct Shape {
        struct Axis {
            AxisScale scale = AxisScale::Linear;
            TickStyle ticks = TickStyle::Plain;
            QString title;
            int firstDecade = 0; // log axes: the decades that get grid lines
            int lastDecade = 0;
            friend bool operator==(const Axis&, const Axis&) = default;
        };
        struct Curve {
            QString name;
            QColor colour;
            double width = 0;
            LineStyle style = LineStyle::Solid;
            bool filled = false;
            std::size_t pieces = 0;
            friend bool operator==(const Curve&, const Curve&) = default;
        };
        struct Marker {
            QString name;
            QColor colour;
            MarkerShape shape = MarkerShape::Circle;
            friend bool operator==(const Marker&, const Marker&) = default;
        };
        Axis x;
        Axis y;
        std::vector<Curve> curves;
        std::vector<Marker> markers;
        std::vector<QColor> guides;
        std::size_t labels = 0;
        friend bool operator==(const Shape&, const Shape&) = default;
    };

    [[nodiscard]] static Shape shapeOf(const ChartContent& content);
    // Data units to chart coordinates: log10 on a log axis.
    [[nodiscard]] static QPointF toChart(QPointF value, const ChartAxis& x, const ChartAxis& y);
    // The finite runs of a curve in chart coordinates: a NaN breaks it into separately drawn pieces.
    [[nodiscard]] static std::vector<QList<QPointF>> piecesOf(const ChartCurve& curve, const ChartAxis& x,
                                                              const ChartAxis& y);
    void rebuild(const ChartContent& content);
    void refresh(const ChartContent& content); // same shape: new numbers into the existing items
    void setTitles(const ChartContent& content);
    void setAxisRange(AxisState& state, Qt::Orientation orientation);
    [[nodiscard]] QPointF toChart(QPointF value) const;
    [[nodiscard]] QPointF fromChart(QPointF chart) const;
    [[nodiscard]] QAbstractAxis* makeAxis(AxisState& state, Qt::Orientation orientation);
    void attach(QXYSeries* series);
    void addCurve(const ChartCurve& curve);
    void addMarker(const ChartMarker& marker);
    void addGuide(const ChartGuide& guide);
    void addLabel(const ChartLabel& label);
    void updateGrid(); // a line at every tick of a linear axis and every decade of a log axis
    void updateDecadeLabels();
    void updateLogAxis(AxisState& state, double extentPx, double pxPerLabel);
    void placeLabels();
    void renderAt(QSize size, const std::function<void(QPainter&)>& begin);

    QChart* m_chart = nullptr;
    QChartView* m_view = nullptr;
    PlotGrid* m_gridItem = nullptr;
    QString m_title;
    AxisState m_x;
    AxisState m_y;
    std::vector<Drawn> m_drawn;
    std::vector<QXYSeries*> m_guides; // in content order
    std::vector<PlacedLabel> m_labels;
    Shape m_shape;
    bool m_hasContent = false;
    QAbstractSeries* m_anchor = nullptr; // any series on the axes, for mapping data to pixels
};

} // namespace beamwarden::gui
