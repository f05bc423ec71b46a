// The Limit curves panel draws three charts for an assessed output from the engines' own figures, exports them and
// falls back to an empty state. Lasers and eyewear here are invented.
#include "beamwarden/assessment/assessment.hpp"
#include "beamwarden/limits/mpe.hpp"
#include "panels/limitcurvespanel.hpp"
#include "plots/chartwidget.hpp"
#include "plots/decadeticks.hpp"

#include <catch2/catch.hpp>

#include <QFileInfo>
#include <QLabel>
#include <QTemporaryDir>

#include <cmath>

using namespace beamwarden;
using namespace beamwarden::units::literals;
using beamwarden::gui::ChartWidget;
using beamwarden::gui::LimitCurvesPanel;

namespace {

model::Laser amplifier()
{
    model::Output output;
    output.name = "fundamental";
    output.emission.spectrum = model::singleLine(800_nm);
    output.emission.pulsed = true;
    output.emission.pulseEnergy = 4_mJ;
    output.emission.pulseDuration = 35_fs;
    output.emission.prf = 1_kHz;
    output.beam.diameter = 10_mm;
    output.beam.divergence = 0.5_mrad;
    model::NamedExposureCase intrabeam;
    intrabeam.name = "intrabeam at the exit";
    output.exposureCases.push_back(intrabeam);
    model::Laser laser;
    laser.name = "Test amplifier X1";
    laser.outputs.push_back(output);
    return laser;
}

model::Laser heliumNeon()
{
    model::Output output;
    output.name = "red line";
    output.emission.spectrum = model::singleLine(632.8_nm);
    output.emission.averagePower = 4_mW;
    output.beam.diameter = 0.8_mm;
    output.beam.divergence = 1.2_mrad;
    model::NamedExposureCase glance;
    glance.name = "accidental glance";
    glance.exposureCase.exposure = 0.25_s; // the aversion response, so the curve carries the C1 point exactly
    output.exposureCases.push_back(glance);
    model::Laser laser;
    laser.name = "Test HeNe X2";
    laser.outputs.push_back(output);
    return laser;
}

std::vector<model::EyewearItem> shelf()
{
    model::EyewearItem goggle;
    goggle.name = "Goggle X1";
    goggle.spectralOd.push_back(model::OdRow{740_nm, 1100_nm, 7.0, true});
    model::EyewearItem spectacles;
    spectacles.name = "Spectacles X2";
    spectacles.en207Markings.push_back("620-660 D LB3");
    return {goggle, spectacles};
}

ChartWidget* chart(LimitCurvesPanel& panel, int index)
{
    return panel.findChild<ChartWidget*>(QStringLiteral("limitCurvesChart%1").arg(index));
}

assessment::LaserAssessment assessed(const model::Laser& laser)
{
    auto result = assessment::assessLaser(laser, shelf());
    REQUIRE(result.has_value());
    return *result;
}

} // namespace

TEST_CASE("limitcurves: Decade ticks read as durations, distances and powers of ten", "[gui][curves]")
{
    using gui::TickStyle;
    CHECK(gui::decadeLabel(-15, TickStyle::Duration) == QStringLiteral("1 fs"));
    CHECK(gui::decadeLabel(-13, TickStyle::Duration) == QStringLiteral("100 fs"));
    CHECK(gui::decadeLabel(-6, TickStyle::Duration) == QStringLiteral("1 µs"));
    CHECK(gui::decadeLabel(0, TickStyle::Duration) == QStringLiteral("1 s"));
    CHECK(gui::decadeLabel(4, TickStyle::Duration) == QStringLiteral("10 ks"));
    CHECK(gui::decadeLabel(-2, TickStyle::Distance) == QStringLiteral("1 cm"));
    CHECK(gui::decadeLabel(2, TickStyle::Distance) == QStringLiteral("100 m"));
    CHECK(gui::decadeLabel(4, TickStyle::Distance) == QStringLiteral("10 km"));
    CHECK(gui::decadeLabel(-3, TickStyle::PowerOfTen) == QStringLiteral("10⁻³"));
    CHECK(gui::decadeLabel(12, TickStyle::PowerOfTen) == QStringLiteral("10¹²"));
    CHECK(gui::decadeStep(18, 20, TickStyle::Duration) == 1);
    CHECK(gui::decadeStep(18, 9, TickStyle::Duration) == 3);
}

TEST_CASE("limitcurves: A pulsed output fills all three charts", "[gui][curves]")
{
    const auto result = assessed(amplifier());
    LimitCurvesPanel panel;
    panel.resize(1200, 760);
    panel.showAssessment(result, shelf(), 0, 0);
    REQUIRE(panel.chartCount() == 3);

    for (int i = 0; i < panel.chartCount(); ++i) {
        ChartWidget* c = chart(panel, i);
        REQUIRE(c != nullptr);
        CHECK_FALSE(c->title().isEmpty());
        REQUIRE(c->seriesCount() > 0);
        CHECK(c->seriesPoints(0).size() > 1);
    }

    // MPE chart: eye (the rule choice), each rule set, skin, then the two marks of the current point.
    ChartWidget* mpe = chart(panel, 0);
    REQUIRE(mpe->seriesCount() == 6);
    CHECK(mpe->seriesPoints(0).size() >= 200);
    CHECK(mpe->seriesPoints(0).front().x() == Approx(1e-14)); // sub-100 fs source: from 10 fs
    CHECK(mpe->seriesName(3) == QStringLiteral("Skin"));
    const auto single = mpe->seriesPoints(4);
    const auto train = mpe->seriesPoints(5);
    REQUIRE(single.size() == 1);
    REQUIRE(train.size() == 1);
    CHECK(single.front().x() == Approx(35e-15));
    // computed: the train's per-pulse mark is the hazard engine's limit for the governing line.
    const auto& eye = result.outputs[0].cases[0].eye;
    CHECK(train.front().y() == Approx(eye.limit).epsilon(1e-9));
    CHECK(train.front().y() <= single.front().y());

    // OD chart: the required band and the goggle that rates 800 nm; the spectacles rate nothing there.
    ChartWidget* od = chart(panel, 1);
    REQUIRE(od->seriesCount() == 2);
    CHECK(od->seriesName(0) == QStringLiteral("Required OD"));
    CHECK(od->seriesName(1).startsWith(QStringLiteral("Goggle X1")));
    double required = 0;
    for (const QPointF& p : od->seriesPoints(0))
        required = std::max(required, p.y());
    CHECK(required == Approx(eye.bands.front().requiredOd).epsilon(1e-9)); // computed: the engine's band OD

    // Distance chart: the NOHD label carries the engine's distance.
    ChartWidget* distance = chart(panel, 2);
    REQUIRE(eye.nohd.kind == hazard::DistanceKind::Finite);
    CHECK(distance->title().contains(QStringLiteral("NOHD")));
    CHECK(distance->labelTexts().contains(
        QStringLiteral("NOHD %1").arg(QString::fromStdString(units::format(eye.nohd.value, 3)))));
}

TEST_CASE("limitcurves: The MPE curve of a HeNe line passes through the engine's figure at 0.25 s", "[gui][curves]")
{
    const auto result = assessed(heliumNeon());
    LimitCurvesPanel panel;
    panel.showAssessment(result, shelf(), 0, 0);
    ChartWidget* mpe = chart(panel, 0);
    REQUIRE(mpe != nullptr);
    const auto points = mpe->seriesPoints(0);
    const auto at = std::find_if(points.begin(), points.end(), [](QPointF p) { return p.x() == 0.25; });
    REQUIRE(at != points.end());
    CHECK(at->y() == Approx(6.364).margin(1e-3)); // check-values.md C1: 632.8 nm, 0.25 s, 6.364 J/m²

    limits::MpeRequest request;
    request.wavelength = 632.8_nm;
    request.duration = 0.25_s;
    const auto engine = limits::evaluateMpe(request);
    REQUIRE(engine.has_value());
    CHECK(at->y() == Approx(engine->radiantExposure().joulesPerSquareMetre()).epsilon(1e-12)); // computed

    // CW: one mark, at the exposure basis.
    REQUIRE(mpe->seriesCount() == 5);
    const auto mark = mpe->seriesPoints(4);
    REQUIRE(mark.size() == 1);
    CHECK(mark.front().x() == 0.25);
}

TEST_CASE("limitcurves: Charts export as PNG and SVG", "[gui][curves]")
{
    const auto result = assessed(heliumNeon());
    LimitCurvesPanel panel;
    panel.showAssessment(result, shelf(), 0, 0);
    QTemporaryDir dir;
    REQUIRE(dir.isValid());
    for (int i = 0; i < panel.chartCount(); ++i) {
        const QString png = dir.filePath(QStringLiteral("chart%1.png").arg(i));
        const QString svg = dir.filePath(QStringLiteral("chart%1.svg").arg(i));
        CHECK(panel.exportChart(i, png));
        CHECK(panel.exportChart(i, svg));
        CHECK(QFileInfo(png).size() > 10000);
        CHECK(QFileInfo(svg).size() > 10000);
    }
    CHECK_FALSE(panel.exportChart(0, dir.filePath(QStringLiteral("chart.bmp"))));
    CHECK_FALSE(panel.exportChart(3, dir.filePath(QStringLiteral("chart.png"))));
}

TEST_CASE("limitcurves: The panel shows an empty state when nothing or nothing valid is selected", "[gui][curves]")
{
    const auto result = assessed(heliumNeon());
    LimitCurvesPanel panel;
    panel.resize(1200, 760);
    panel.show();
    const auto* empty = panel.findChild<QLabel*>(QStringLiteral("limitCurvesEmpty"));
    REQUIRE(empty != nullptr);
    CHECK(empty->isVisible());

    panel.showAssessment(result, shelf(), 0, 0);
    CHECK_FALSE(empty->isVisible());
    CHECK(chart(panel, 0)->isVisible());

    panel.clear();
    CHECK(empty->isVisible());
    CHECK_FALSE(empty->text().isEmpty());
    CHECK(chart(panel, 0)->seriesCount() == 0);
    CHECK_FALSE(panel.exportChart(0, QStringLiteral("unused.png")));

    panel.showAssessment(result, shelf(), 0, 5);
    CHECK(empty->isVisible());
    panel.showAssessment(result, shelf(), 2, 0);
    CHECK(empty->isVisible());
}
