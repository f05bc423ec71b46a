#pragma once
// What a chart shows, in plain values: axes, named curves, marked points, vertical guides and text labels, all in
// data units. Panels fill one of these; ChartWidget draws it. Nothing here depends on the plotting library.
#include "plots/decadeticks.hpp"

#include <QColor>
#include <QPointF>
#include <QString>

#include <cstdint>
#include <vector>

namespace beamwarden::gui {

enum class AxisScale : std::uint8_t { Linear, Log10 };

struct ChartAxis {
    QString title; // in words, with the unit
    AxisScale scale = AxisScale::Linear;
    TickStyle ticks = TickStyle::Plain;
    double min = 0; // data units; > 0 on a log axis
    double max = 1;
    double tickInterval = 0; // linear axes: 0 picks a round interval
};

enum class LineStyle : std::uint8_t { Solid, Dashed, Dotted, DashDot, DashDotDot };

struct ChartCurve {
    QString name; // legend text; empty keeps the curve out of the legend
    QColor colour;
    double width = 2.0;
    LineStyle style = LineStyle::Solid;
    bool filled = false; // fills down to y = 0 (linear y axes only)
    // Data units. A NaN coordinate breaks the line: nothing is drawn across it (data that does not exist there).
    std::vector<QPointF> points;
};

enum class MarkerShape : std::uint8_t { Circle, Diamond, Square };

struct ChartMarker {
    QString name; // legend text
    QColor colour;
    MarkerShape shape = MarkerShape::Circle;
    QPointF point;
};

// A vertical line across the whole plot at x, e.g. a hazard distance.
struct ChartGuide {
    QColor colour;
    double x = 0;
};

enum class LabelPlacement : std::uint8_t { Above, Below };

// Text anchored at a data point; kept inside the plot area (it flips to the left near the right edge).
struct ChartLabel {
    QString text;
    QColor colour;
    QPointF at;
    LabelPlacement placement = LabelPlacement::Above;
};

struct ChartContent {
    QString title;
    QString subtitle; // one short line under the title, or empty
    ChartAxis x;
    ChartAxis y;
    std::vector<ChartCurve> curves;
    std::vector<ChartMarker> markers;
    std::vector<ChartGuide> guides;
    std::vector<ChartLabel> labels;
};

} // namespace beamwarden::gui
