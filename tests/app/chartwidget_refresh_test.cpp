// ChartWidget moves content of the same shape into the items it has (an edit's new numbers) and rebuilds for any
// other: both must show exactly the content given. The numbers are the test's own inputs (computed), read back.
#include "plots/chartwidget.hpp"

#include <catch2/catch.hpp>

#include <cmath>

using namespace beamwarden::gui;

namespace {

ChartContent content(double scale, int curves, const QString& title)
{
    ChartContent c;
    c.title = title;
    c.x = ChartAxis{QStringLiteral("Duration"), AxisScale::Log10, TickStyle::Duration, 1e-9, 1e3 * scale, 0};
    c.y = ChartAxis{QStringLiteral("Value"), AxisScale::Linear, TickStyle::Plain, 0, 10 * scale, 0};
    for (int k = 0; k < curves; ++k) {
        ChartCurve curve{QStringLiteral("curve %1").arg(k), Qt::blue, 2.0, LineStyle::Solid, false, {}};
        for (int i = 0; i < 5; ++i)
            curve.points.emplace_back(std::pow(10.0, i - 8), (i + k) * scale);
        c.curves.push_back(curve);
    }
    c.markers.push_back(ChartMarker{QStringLiteral("mark"), Qt::red, MarkerShape::Circle, QPointF(1e-6, 2 * scale)});
    c.labels.push_back(
        ChartLabel{QStringLiteral("label %1").arg(scale), Qt::black, QPointF(1e-7, scale), LabelPlacement::Above});
    return c;
}

void checkShows(const ChartWidget& chart, const ChartContent& c)
{
    CHECK(chart.title() == c.title);
    REQUIRE(chart.seriesCount() == static_cast<int>(c.curves.size() + c.markers.size()));
    for (std::size_t k = 0; k < c.curves.size(); ++k) {
        const std::vector<QPointF> shown = chart.seriesPoints(static_cast<int>(k));
        REQUIRE(shown.size() == c.curves[k].points.size());
        for (std::size_t i = 0; i < shown.size(); ++i) {
            CHECK(shown[i].x() == Approx(c.curves[k].points[i].x()).epsilon(1e-12)); // exact up to log10 and back
            CHECK(shown[i].y() == Approx(c.curves[k].points[i].y()).epsilon(1e-12));
        }
    }
    const std::vector<QPointF> mark = chart.seriesPoints(static_cast<int>(c.curves.size()));
    REQUIRE(mark.size() == 1);
    CHECK(mark.front().y() == Approx(c.markers.front().point.y()));
    CHECK(chart.labelTexts() == QStringList{c.labels.front().text});
}

} // namespace

TEST_CASE("ChartWidget: new numbers of the same shape replace the old ones", "[gui][curves]")
{
    ChartWidget chart;
    chart.resize(600, 400);
    const ChartContent first = content(1, 2, QStringLiteral("first"));
    chart.setContent(first);
    checkShows(chart, first);

    const ChartContent second = content(3, 2, QStringLiteral("second")); // same shape, other numbers and title
    chart.setContent(second);
    checkShows(chart, second);

    const ChartContent wider = content(2, 3, QStringLiteral("third")); // one curve more: another shape
    chart.setContent(wider);
    checkShows(chart, wider);

    chart.clear();
    CHECK(chart.seriesCount() == 0);
    chart.setContent(first); // after a clear, built afresh
    checkShows(chart, first);
}
