#include "sheettext.hpp"

#include <QPainter>
#include <QTextLayout>

#include <cmath>

namespace beamwarden::sheet {

namespace {

// Lays `text` out into `layout` at `width`; returns the height.
double layOut(QTextLayout& layout, const Text& text, double width)
{
    QTextOption option(text.align);
    option.setWrapMode(QTextOption::WrapAtWordBoundaryOrAnywhere);
    option.setUseDesignMetrics(true);
    layout.setTextOption(option);
    if (text.boldPrefix > 0) {
        QTextLayout::FormatRange bold;
        bold.start = 0;
        bold.length = text.boldPrefix;
        bold.format.setFontWeight(QFont::Bold);
        layout.setFormats({bold});
    }
    layout.beginLayout();
    double y = 0.0;
    for (QTextLine line = layout.createLine(); line.isValid(); line = layout.createLine()) {
        line.setLeadingIncluded(true);
        line.setLineWidth(width);
        line.setPosition(QPointF(0.0, y));
        y += line.height();
    }
    layout.endLayout();
    return y;
}

} // namespace

QFont sheetFont(double points, QFont::Weight weight, bool italic)
{
    QFont font;
    font.setFamilies({QStringLiteral("DejaVu Sans"), QStringLiteral("Noto Sans"), QStringLiteral("Liberation Sans"),
                      QStringLiteral("Arial")});
    font.setStyleHint(QFont::SansSerif);
    font.setPixelSize(static_cast<int>(std::lround(pt(points))));
    font.setWeight(weight);
    font.setItalic(italic);
    font.setHintingPreference(QFont::PreferNoHinting);
    // Latin text needs no shaping; without it there are no ligatures, so "fi" stays two letters in the PDF's text
    // and a search for "figure" or "officer" finds the words.
    font.setStyleStrategy(QFont::PreferNoShaping);
    return font;
}

double textHeight(const Text& text, double width)
{
    if (text.text.isEmpty())
        return 0.0;
    QTextLayout layout(text.text, text.font);
    return layOut(layout, text, width);
}

double drawText(QPainter& painter, const Text& text, QPointF topLeft, double width)
{
    if (text.text.isEmpty())
        return 0.0;
    QTextLayout layout(text.text, text.font);
    const double height = layOut(layout, text, width);
    painter.save();
    painter.setPen(text.colour);
    layout.draw(&painter, topLeft);
    painter.restore();
    return height;
}

double naturalWidth(const Text& text)
{
    QTextLayout layout(text.text, text.font);
    QTextOption option;
    option.setWrapMode(QTextOption::NoWrap);
    option.setUseDesignMetrics(true);
    layout.setTextOption(option);
    layout.beginLayout();
    QTextLine line = layout.createLine();
    double width = 0.0;
    if (line.isValid()) {
        line.setNumColumns(static_cast<int>(text.text.size()));
        width = line.naturalTextWidth();
    }
    layout.endLayout();
    return width;
}

double cellHeight(const Cell& cell, double width)
{
    double height = 0.0;
    for (const Text& t : cell)
        height += textHeight(t, width);
    return height;
}

void drawCell(QPainter& painter, const Cell& cell, QPointF topLeft, double width)
{
    double y = topLeft.y();
    for (const Text& t : cell)
        y += drawText(painter, t, QPointF(topLeft.x(), y), width);
}

} // namespace beamwarden::sheet
