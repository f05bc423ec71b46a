#include "plots/plotgrid.hpp"

#include <QPainter>
#include <QPen>

namespace beamwarden::gui {

PlotGrid::PlotGrid(QColor gridColour, QColor axisColour, QGraphicsItem* parent)
    : QGraphicsItem(parent), m_gridColour(gridColour), m_axisColour(axisColour)
{
}

void PlotGrid::setLines(std::vector<QLineF> grid, std::vector<QLineF> axes)
{
    if (grid == m_grid && axes == m_axes)
        return;
    QRectF bounds;
    for (const auto* lines : {&grid, &axes}) {
        for (const QLineF& line : *lines)
            bounds = bounds.united(QRectF(line.p1(), line.p2()).normalized().adjusted(-1, -1, 1, 1));
    }
    prepareGeometryChange();
    m_grid = std::move(grid);
    m_axes = std::move(axes);
    m_bounds = bounds;
    update();
}

QRectF PlotGrid::boundingRect() const
{
    return m_bounds;
}

void PlotGrid::paint(QPainter* painter, const QStyleOptionGraphicsItem* /*option*/, QWidget* /*widget*/)
{
    painter->save();
    painter->setRenderHint(QPainter::Antialiasing, false);
    // Width 1 scales with an export, as the curves do.
    painter->setPen(QPen(m_gridColour, 1.0));
    painter->drawLines(m_grid.data(), static_cast<int>(m_grid.size()));
    painter->setPen(QPen(m_axisColour, 1.0));
    painter->drawLines(m_axes.data(), static_cast<int>(m_axes.size()));
    painter->restore();
}

} // namespace beamwarden::gui
