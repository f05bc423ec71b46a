// ChartWidget's quick path: content of the same shape as what is shown (an edited laser's curves, say) is moved into
// the existing series, axes and labels. Rebuilding them makes the library create and lay out its items afresh:
// on the Limit curves panel that was most of an edit's time.
#include "plots/chartwidget.hpp"

#include "plots/plotgrid.hpp"

#include <QCategoryAxis>
#include <QChart>
#include <QGraphicsRectItem>
#include <QGraphicsSimpleTextItem>
#include <QXYSeries>

#include <cmath>

namespace beamwarden::gui {

namespace {

bool isFinitePoint(QPointF p)
{
    return std::isfinite(p.x()) && std::isfinite(p.y());
}

} // namespace

QPointF ChartWidget::toChart(QPointF value, const ChartAxis& x, const ChartAxis& y)
{
    return {x.scale == AxisScale::Log10 ? std::log10(value.x()) : value.x(),
            y.scale == AxisScale::Log10 ? std::log10(value.y()) : value.y()};
}

std::vector<QList<QPointF>> ChartWidget::piecesOf(const ChartCurve& curve, const ChartAxis& x, const ChartAxis& y)
{
    std::vector<QList<QPointF>> runs(1);
    for (const QPointF& p : curve.points) {
        const QPointF c = isFinitePoint(p) ? toChart(p, x, y) : QPointF(std::nan(""), 0);
        if (isFinitePoint(c)) {
            runs.back().append(c);
        } else if (!runs.back().isEmpty()) {
            runs.emplace_back();
        }
    }
    if (runs.back().isEmpty())
        runs.pop_back();
    return runs;
}

ChartWidget::Shape ChartWidget::shapeOf(const ChartContent& content)
{
    const auto axisShape = [](const ChartAxis& spec) {
        Shape::Axis axis{spec.scale, spec.ticks, spec.title, 0, 0};
        if (spec.scale == AxisScale::Log10) { // the decades decide the tick labels
            axis.firstDecade = static_cast<int>(std::ceil(std::log10(spec.min) - 1e-9));
            axis.lastDecade = static_cast<int>(std::floor(std::log10(spec.max) + 1e-9));
        }
        return axis;
    };
    Shape shape;
    shape.x = axisShape(content.x);
    shape.y = axisShape(content.y);
    for (const ChartCurve& c : content.curves)
        shape.curves.push_back(
            Shape::Curve{c.name, c.colour, c.width, c.style, c.filled, piecesOf(c, content.x, content.y).size()});
    for (const ChartMarker& m : content.markers)
        shape.markers.push_back(Shape::Marker{m.name, m.colour, m.shape});
    for (const ChartGuide& g : content.guides)
        shape.guides.push_back(g.colour);
    for (const ChartLabel& l : content.labels) // addLabel() leaves out a label without a place
        shape.labels += isFinitePoint(l.at) ? 1 : 0;
    return shape;
}

void ChartWidget::refresh(const ChartContent& content)
{
    setTitles(content);
    m_x.spec = content.x;
    m_y.spec = content.y;
    setAxisRange(m_x, Qt::Horizontal);
    setAxisRange(m_y, Qt::Vertical);

    const double y0 = m_y.spec.scale == AxisScale::Log10 ? std::log10(m_y.spec.min) : m_y.spec.min;
    const double y1 = m_y.spec.scale == AxisScale::Log10 ? std::log10(m_y.spec.max) : m_y.spec.max;

    // m_drawn holds the curves, then the markers, in content order (as rebuild() adds them).
    for (std::size_t i = 0; i < content.curves.size() && i < m_drawn.size(); ++i) {
        const std::vector<QList<QPointF>> pieces = piecesOf(content.curves[i], m_x.spec, m_y.spec);
        std::vector<QXYSeries*>& drawn = m_drawn[i].pieces;
        for (std::size_t k = 0; k < pieces.size() && k < drawn.size(); ++k)
            drawn[k]->replace(pieces[k]);
    }
    for (std::size_t i = 0; i < content.markers.size(); ++i) {
        const std::size_t at = content.curves.size() + i;
        if (at >= m_drawn.size() || m_drawn[at].pieces.empty())
            continue;
        const QPointF p = content.markers[i].point;
        m_drawn[at].pieces.front()->replace(isFinitePoint(p) ? QList<QPointF>{toChart(p)} : QList<QPointF>{});
    }
    for (std::size_t i = 0; i < content.guides.size() && i < m_guides.size(); ++i) {
        const double x = m_x.spec.scale == AxisScale::Log10 ? std::log10(content.guides[i].x) : content.guides[i].x;
        m_guides[i]->replace(QList<QPointF>{QPointF(x, y0), QPointF(x, y1)});
    }

    // Labels keep their boxes; text, colour and anchor are new.
    std::size_t label = 0;
    for (const ChartLabel& l : content.labels) {
        if (!isFinitePoint(l.at) || label >= m_labels.size())
            continue;
        PlacedLabel& placed = m_labels[label++];
        placed.at = toChart(l.at);
        placed.placement = l.placement;
        for (QGraphicsItem* child : placed.box->childItems()) {
            if (auto* text = qgraphicsitem_cast<QGraphicsSimpleTextItem*>(child)) {
                text->setText(l.text);
                text->setBrush(l.colour);
                const QRectF bounds = text->boundingRect();
                placed.box->setRect(0, 0, bounds.width() + 6, bounds.height() + 2);
            }
        }
    }
    updateDecadeLabels();
    placeLabels();
    updateGrid();
}

void ChartWidget::updateGrid()
{
    const QRectF area = m_chart->plotArea();
    if (m_x.axis == nullptr || m_y.axis == nullptr || area.isEmpty()) {
        m_gridItem->setLines({}, {});
        return;
    }
    constexpr double kTick = 5; // px, outward, as the library drew them
    // The values (in chart coordinates) that get a line, and where they fall in the plot area.
    const auto ticks = [](const AxisState& state, double& lo, double& hi) {
        const ChartAxis& spec = state.spec;
        const bool log = spec.scale == AxisScale::Log10;
        lo = log ? std::log10(spec.min) : spec.min;
        hi = log ? std::log10(spec.max) : spec.max;
        std::vector<double> at;
        const double step = log ? 1.0 : state.interval;
        if (!(step > 0) || !(hi > lo))
            return at;
        // As the library places dynamic ticks: from the anchor (0) in whole steps, within the range.
        for (double k = std::ceil(lo / step - 1e-9); k * step <= hi + 1e-9 * (hi - lo); k += 1)
            at.push_back(k * step);
        return at;
    };
    double x0 = 0;
    double x1 = 0;
    double y0 = 0;
    double y1 = 0;
    std::vector<QLineF> grid;
    std::vector<QLineF> axes{QLineF(area.bottomLeft(), area.bottomRight()), QLineF(area.bottomLeft(), area.topLeft())};
    for (const double x : ticks(m_x, x0, x1)) {
        const double px = area.left() + (x - x0) / (x1 - x0) * area.width();
        grid.emplace_back(px, area.top(), px, area.bottom());
        axes.emplace_back(px, area.bottom(), px, area.bottom() + kTick);
    }
    for (const double y : ticks(m_y, y0, y1)) {
        const double py = area.bottom() - (y - y0) / (y1 - y0) * area.height();
        grid.emplace_back(area.left(), py, area.right(), py);
        axes.emplace_back(area.left() - kTick, py, area.left(), py);
    }
    m_gridItem->setLines(std::move(grid), std::move(axes));
}

} // namespace beamwarden::gui
