#include "odplot.hpp"

#include "sheetpalette.hpp"
#include "sheettext.hpp"
#include "sheettr.hpp"

#include <QPainter>
#include <QPainterPath>

#include <algorithm>
#include <cmath>

namespace beamwarden::sheet {

namespace {

// Ticks at round wavelengths: 1, 2 and 5 times powers of ten, or a finer set when that leaves fewer than three
// inside a narrow range; only powers of ten when the range spans many decades.
std::vector<double> wavelengthTicks(double from_nm, double to_nm)
{
    const double decades = std::log10(to_nm / from_nm);
    const std::vector<std::vector<double>> sets =
        decades > 2.5 ? std::vector<std::vector<double>>{{1.0}}
                      : std::vector<std::vector<double>>{{1.0, 2.0, 5.0},
                                                         {1.0, 1.5, 2.0, 3.0, 5.0, 7.0},
                                                         {1.0, 1.2, 1.5, 2.0, 2.5, 3.0, 4.0, 5.0, 6.0, 7.0, 8.0, 9.0}};
    std::vector<double> ticks;
    for (const std::vector<double>& mantissas : sets) {
        ticks.clear();
        for (int e = static_cast<int>(std::floor(std::log10(from_nm)));
             e <= static_cast<int>(std::ceil(std::log10(to_nm))); ++e) {
            for (const double m : mantissas) {
                const double v = m * std::pow(10.0, e);
                if (v >= from_nm && v <= to_nm)
                    ticks.push_back(v);
            }
        }
        if (ticks.size() >= 3)
            break;
    }
    return ticks;
}

void drawDiamond(QPainter& painter, QPointF centre, double r)
{
    const QPointF points[] = {{centre.x(), centre.y() - r},
                              {centre.x() + r, centre.y()},
                              {centre.x(), centre.y() + r},
                              {centre.x() - r, centre.y()}};
    painter.drawPolygon(points, 4);
}

struct LegendEntry {
    QString text;
    bool required = false;
    int curve = -1; // index of the eyewear curve it explains
};

// Legend below the axes, one entry per line so long item names wrap rather than run into each other.
std::vector<LegendEntry> legendEntries(const PlotData& plot)
{
    std::vector<LegendEntry> legend{{Sheet::tr("required OD, per band (diamond)"), true, -1}};
    for (std::size_t i = 0; i < plot.eyewear.size(); ++i)
        legend.push_back(
            {(i == 0 ? Sheet::tr("%1 (solid line)") : Sheet::tr("%1 (dashed line)")).arg(plot.eyewear[i].label), false,
             static_cast<int>(i)});
    if (plot.eyewear.empty())
        legend.push_back({Sheet::tr("no eyewear to compare"), false, -1});
    if (!plot.eyewearNote.isEmpty())
        legend.push_back({plot.eyewearNote, false, -1});
    return legend;
}

} // namespace

double odPlotOverhead(const PlotData& plot, double width)
{
    const QFont tickFont = sheetFont(7);
    const QFont labelFont = sheetFont(7.5);
    double legendHeight = 0.0;
    for (const LegendEntry& e : legendEntries(plot))
        legendHeight += textHeight(Text{e.text, labelFont, palette::kInk}, width - pt(22)) + pt(1);
    const double xLabelHeight = textHeight(Text{QStringLiteral("0"), tickFont, palette::kInk}, pt(40));
    const double axisTitleHeight = textHeight(Text{QStringLiteral("0"), labelFont, palette::kInk}, pt(40));
    return pt(6) + xLabelHeight + axisTitleHeight + pt(4) + pt(6) + legendHeight;
}

void paintOdPlot(QPainter& painter, const PlotData& plot, const SheetFormat& format, const QRectF& area)
{
    const QFont tickFont = sheetFont(7);
    const QFont labelFont = sheetFont(7.5);
    const bool micrometres = plot.to_nm > 10000.0;

    const std::vector<LegendEntry> legend = legendEntries(plot);
    const double legendTextX = pt(22);
    const double xLabelHeight = textHeight(Text{QStringLiteral("0"), tickFont, palette::kInk}, pt(40));
    const double axisTitleHeight = textHeight(Text{QStringLiteral("0"), labelFont, palette::kInk}, pt(40));

    const double axisLeft = area.left() + pt(24);
    const double axisRight = area.right() - pt(6);
    const double axisTop = area.top() + pt(6);
    const double axisBottom = area.top() + area.height() - odPlotOverhead(plot, area.width()) + pt(6);
    if (axisBottom - axisTop < pt(30) || axisRight - axisLeft < pt(60))
        return;

    double maxOd = 3.0;
    for (const PlotBand& b : plot.required)
        maxOd = std::max(maxOd, b.od);
    for (const PlotCurve& c : plot.eyewear) {
        for (const QPointF& p : c.points) {
            if (std::isfinite(p.y()))
                maxOd = std::max(maxOd, p.y());
        }
    }
    maxOd = std::min(std::ceil(maxOd + 0.5), 20.0);
    const double logFrom = std::log10(plot.from_nm);
    const double logTo = std::log10(plot.to_nm);
    auto xAt = [&](double nm) {
        return axisLeft + (std::log10(nm) - logFrom) / (logTo - logFrom) * (axisRight - axisLeft);
    };
    auto yAt = [&](double od) { return axisBottom - std::clamp(od, 0.0, maxOd) / maxOd * (axisBottom - axisTop); };

    painter.save();
    // Grid and OD labels.
    // As many OD labels as fit without touching: steps of 1, 2 or 5.
    const double room = (axisBottom - axisTop) / (xLabelHeight * 1.4);
    const int odStep = maxOd <= room ? 1 : maxOd <= 2 * room ? 2 : 5;
    for (int od = 0; od <= static_cast<int>(maxOd); od += odStep) {
        const double y = yAt(od);
        painter.setPen(QPen(od == 0 ? palette::kInk : palette::kRule, pt(od == 0 ? 0.8 : 0.4)));
        painter.drawLine(QPointF(axisLeft, y), QPointF(axisRight, y));
        const Text label{QString::number(od), tickFont, palette::kInk, Qt::AlignRight};
        drawText(painter, label, QPointF(area.left(), y - xLabelHeight / 2), pt(20));
    }
    painter.setPen(QPen(palette::kInk, pt(0.8)));
    painter.drawLine(QPointF(axisLeft, axisTop), QPointF(axisLeft, axisBottom));
    // Wavelength ticks.
    for (const double tick : wavelengthTicks(plot.from_nm, plot.to_nm)) {
        const double x = xAt(tick);
        painter.setPen(QPen(palette::kRule, pt(0.4)));
        painter.drawLine(QPointF(x, axisTop), QPointF(x, axisBottom));
        const double value = micrometres ? tick / 1000.0 : tick;
        const QString text = format.number(value, value < 10.0 && std::abs(value - std::round(value)) > 1e-9 ? 1 : 0);
        drawText(painter, Text{text, tickFont, palette::kInk, Qt::AlignHCenter},
                 QPointF(x - pt(20), axisBottom + pt(2)), pt(40));
    }
    const QString axisTitle =
        micrometres ? Sheet::tr("wavelength (\u00b5m, log scale)") : Sheet::tr("wavelength (nm, log scale)");
    drawText(painter, Text{axisTitle, labelFont, palette::kInk, Qt::AlignHCenter},
             QPointF(axisLeft, axisBottom + pt(2) + xLabelHeight + pt(1)), axisRight - axisLeft);

    // Eyewear: a stepped line, broken where the item is not rated.
    painter.setClipRect(QRectF(QPointF(axisLeft, axisTop - pt(2)), QPointF(axisRight, axisBottom + pt(1))));
    for (std::size_t i = 0; i < plot.eyewear.size(); ++i) {
        QPen pen(palette::kBlue, pt(1.6));
        if (i > 0)
            pen.setDashPattern({4.0, 2.5});
        painter.setPen(pen);
        QPainterPath path;
        bool drawing = false;
        const std::vector<QPointF>& points = plot.eyewear[i].points;
        for (std::size_t k = 0; k < points.size(); ++k) {
            const QPointF& p = points[k];
            if (!std::isfinite(p.y())) {
                drawing = false;
                continue;
            }
            const QPointF at(xAt(p.x()), yAt(p.y()));
            if (!drawing) {
                path.moveTo(at);
                drawing = true;
            } else {
                // Hold the previous OD until this wavelength: the data are steps, not slopes.
                path.lineTo(QPointF(at.x(), path.currentPosition().y()));
                path.lineTo(at);
            }
        }
        painter.setBrush(Qt::NoBrush);
        painter.drawPath(path);
    }
    // Required OD: a stem and a diamond per band (a bar across a band that has width), the value beside it.
    std::vector<QRectF> labels;
    for (const PlotBand& b : plot.required) {
        const double x0 = xAt(b.from_nm);
        const double x1 = xAt(b.to_nm);
        const double xm = (x0 + x1) / 2;
        const double y = yAt(b.od);
        painter.setPen(QPen(palette::kVermillion, pt(1.0)));
        painter.drawLine(QPointF(xm, axisBottom), QPointF(xm, y));
        if (x1 - x0 > pt(2)) {
            painter.setPen(QPen(palette::kVermillion, pt(2.2)));
            painter.drawLine(QPointF(x0, y), QPointF(x1, y));
        }
        painter.setPen(QPen(palette::kInk, pt(0.5)));
        painter.setBrush(palette::kVermillion);
        drawDiamond(painter, QPointF(xm, y), pt(3.4));
        const Text value{format.number(b.od, 1), sheetFont(7, QFont::Bold), palette::kInk};
        const double w = naturalWidth(value) + pt(1);
        QRectF rect(xm + pt(4), y - xLabelHeight - pt(1), w, xLabelHeight);
        if (rect.right() > axisRight)
            rect.moveRight(xm - pt(4));
        if (rect.top() < axisTop - pt(2))
            rect.moveTop(y + pt(2));
        if (std::none_of(labels.begin(), labels.end(), [&](const QRectF& r) { return r.intersects(rect); })) {
            painter.setClipping(false);
            drawText(painter, value, rect.topLeft(), rect.width());
            labels.push_back(rect);
        }
    }
    painter.setClipping(false);

    // Legend.
    double ly = axisBottom + pt(2) + xLabelHeight + pt(1) + axisTitleHeight + pt(6);
    for (const LegendEntry& e : legend) {
        const Text text{e.text, labelFont, palette::kInk};
        const double h = textHeight(text, area.width() - legendTextX);
        const double cy = ly + std::min(h, axisTitleHeight) / 2;
        const double sx = area.left() + pt(3);
        if (e.required) {
            painter.setPen(QPen(palette::kInk, pt(0.5)));
            painter.setBrush(palette::kVermillion);
            drawDiamond(painter, QPointF(sx + pt(8), cy), pt(3.4));
        } else if (e.curve >= 0) {
            QPen pen(palette::kBlue, pt(1.6));
            if (e.curve > 0)
                pen.setDashPattern({4.0, 2.5});
            painter.setPen(pen);
            painter.drawLine(QPointF(sx, cy), QPointF(sx + pt(16), cy));
        }
        drawText(painter, text, QPointF(area.left() + legendTextX, ly), area.width() - legendTextX);
        ly += h + pt(1);
    }
    painter.restore();
}

} // namespace beamwarden::sheet
