#pragma once
// Measuring and drawing text for the sheet. The sheet is laid out in its own unit (a tenth of a point) with fonts
// sized in that unit and design metrics, so a page breaks at the same place on screen, paper and PDF.
#include <QColor>
#include <QFont>
#include <QPointF>
#include <QString>

#include <vector>

class QPainter;

namespace beamwarden::sheet {

inline constexpr double kUnitsPerPoint = 10.0;

[[nodiscard]] constexpr double pt(double points)
{
    return points * kUnitsPerPoint;
}
[[nodiscard]] constexpr double mm(double millimetres)
{
    return millimetres * 72.0 / 25.4 * kUnitsPerPoint;
}

// The sheet's sans-serif face at `points` size.
[[nodiscard]] QFont sheetFont(double points, QFont::Weight weight = QFont::Normal, bool italic = false);

// One paragraph: wrapped at word boundaries (anywhere inside a word too long for the width), never cut.
struct Text {
    QString text;
    QFont font;
    QColor colour;
    Qt::Alignment align = Qt::AlignLeft;
    int boldPrefix = 0; // characters at the start set in bold (e.g. "Caution:")
};

[[nodiscard]] double textHeight(const Text& text, double width);
// Draws with its top-left at `topLeft`; returns the height used.
double drawText(QPainter& painter, const Text& text, QPointF topLeft, double width);
// The width of the text on one line, unwrapped.
[[nodiscard]] double naturalWidth(const Text& text);

// A table cell: paragraphs stacked top to bottom.
using Cell = std::vector<Text>;

[[nodiscard]] double cellHeight(const Cell& cell, double width);
void drawCell(QPainter& painter, const Cell& cell, QPointF topLeft, double width);

} // namespace beamwarden::sheet
