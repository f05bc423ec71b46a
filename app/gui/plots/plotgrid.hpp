#pragma once
// The grid, axis lines and tick marks of a chart, drawn as one item without antialiasing. The plotting library
// draws each of these lines as its own antialiased item, which cost more to paint than the curves (a chart is
// repainted on every edit); axis-parallel hairlines are as sharp without antialiasing.
#include <QColor>
#include <QGraphicsItem>
#include <QLineF>

#include <vector>

namespace beamwarden::gui {

class PlotGrid : public QGraphicsItem {
public:
    PlotGrid(QColor gridColour, QColor axisColour, QGraphicsItem* parent);

    // The lines in the parent's coordinates: the grid (e.g. from the top to the bottom of the plot area at each
    // tick), and the axes with their tick marks.
    void setLines(std::vector<QLineF> grid, std::vector<QLineF> axes);

    [[nodiscard]] QRectF boundingRect() const override;
    void paint(QPainter* painter, const QStyleOptionGraphicsItem* option, QWidget* widget) override;

private:
    QColor m_gridColour;
    QColor m_axisColour;
    std::vector<QLineF> m_grid;
    std::vector<QLineF> m_axes;
    QRectF m_bounds;
};

} // namespace beamwarden::gui
