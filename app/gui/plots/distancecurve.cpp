// The distance chart: on-axis exposure from the worst point outward, the MPE, and the NOHD.
#include "plots/curvesampling.hpp"
#include "plots/limitcurvecontent.hpp"
#include "widgets/palette.hpp"

#include "beamwarden/hazard/geometry.hpp"
#include "beamwarden/limits/additivity.hpp"
#include "beamwarden/units.hpp"

#include <algorithm>
#include <cmath>

namespace beamwarden::gui {

using curves::kNaN;
using curves::text;

namespace {

QString viewingWords(model::Viewing viewing)
{
    switch (viewing) {
    case model::Viewing::Direct:
        return LimitCurveContent::tr("Intrabeam viewing");
    case model::Viewing::Lens:
        return LimitCurveContent::tr("Behind a lens");
    case model::Viewing::Fibre:
        return LimitCurveContent::tr("From a fibre end");
    case model::Viewing::Diffuse:
        return LimitCurveContent::tr("Diffuse reflection");
    case model::Viewing::Specular:
        return LimitCurveContent::tr("Mirror-like reflection");
    case model::Viewing::Aided:
        return LimitCurveContent::tr("Through magnifying optics");
    }
    return {};
}

QString viewingOrigin(model::Viewing viewing)
{
    switch (viewing) {
    case model::Viewing::Lens:
        return LimitCurveContent::tr("Distance from the lens");
    case model::Viewing::Diffuse:
    case model::Viewing::Specular:
        return LimitCurveContent::tr("Distance from the reflecting surface");
    case model::Viewing::Direct:
    case model::Viewing::Fibre:
    case model::Viewing::Aided:
        break;
    }
    return LimitCurveContent::tr("Distance from the exit");
}

} // namespace

ChartContent LimitCurveContent::exposureAgainstDistance(const assessment::CaseAssessment& exposureCase)
{
    const hazard::HazardResult& eye = exposureCase.eye;
    const hazard::HazardRequest& request = eye.request;
    const model::Emission& emission = request.emission;
    const model::Viewing viewing = request.exposureCase.viewing;
    ChartContent content;
    const double quantity = emission.pulsed ? emission.pulseEnergy.joules() : emission.averagePower.watts();
    // The output as one line: exposure / combined ratio is the MPE it crosses at the NOHD (the same for one line).
    const double mpe =
        eye.combinedRatio > 0 && eye.exposureAtPoint > 0 ? eye.exposureAtPoint / eye.combinedRatio : eye.limit;
    const double start = eye.pointDistance.metres() > 0 ? eye.pointDistance.metres() : 0.01;
    const double nohd = eye.nohd.value.metres();
    double from = start;
    double to = start * 1000;
    QString verdict;
    switch (eye.nohd.kind) {
    case hazard::DistanceKind::Finite:
        from = std::min(start, nohd / 3);
        to = std::max(nohd * 5, from * 100);
        content.title = tr("Exposure against distance: NOHD %1").arg(text(units::format(eye.nohd.value, 3)));
        break;
    case hazard::DistanceKind::Zero:
        to = std::max(10.0, start * 1000);
        content.title = tr("Exposure against distance: NOHD 0");
        verdict = tr("Below the MPE everywhere.");
        break;
    case hazard::DistanceKind::Unbounded:
        to = std::max(1e7, start * 100);
        content.title = tr("Exposure against distance: NOHD unbounded");
        verdict = tr("Above the MPE at every distance.");
        break;
    }
    from = std::pow(10.0, std::floor(std::log10(from) + 1e-9));
    to = std::pow(10.0, std::ceil(std::log10(to) - 1e-9));

    ChartCurve exposure{emission.pulsed ? tr("On-axis exposure per pulse") : tr("On-axis irradiance"),
                        palette::kBlue,
                        2.6,
                        LineStyle::Solid,
                        false,
                        {}};
    std::vector<double> all{mpe};
    const std::vector<double> distances = curves::logSpaced(from, to, curves::kCurvePoints);
    for (const double r : distances) {
        const double value = quantity * hazard::peakPerWatt(request.exposureCase, request.beam, r);
        exposure.points.emplace_back(r, std::isfinite(value) && value > 0 ? value : kNaN);
        all.push_back(value);
    }

    const QString unit = emission.pulsed ? QStringLiteral("J/m²") : QStringLiteral("W/m²");
    const QString mpeText = text(units::formatSi(mpe, unit.toStdString(), 4));
    ChartCurve limit{{}, palette::kVermillion, 2.0, LineStyle::Dashed, false, {}};
    if (viewing == model::Viewing::Diffuse) {
        // The lit spot looks smaller from farther away, so C6 and with it the MPE fall with distance: drawn as the
        // engine gives it at each distance (the NOHD search uses the same figures), not as one line.
        limit.name = tr("MPE at each distance (worst point: %1)").arg(mpeText);
        for (std::size_t i = 0; i < distances.size(); i += 2) {
            const double alpha = hazard::geometryAt(request.exposureCase, request.beam, distances[i]).sourceAngle_rad;
            std::vector<limits::LineRatio> shares;
            for (const hazard::LineResult& line : eye.lines) {
                limits::MpeRequest at = line.mpe.request;
                at.sourceAngle = units::Angle::fromSi(alpha);
                const auto result = limits::evaluateMpe(at);
                if (!result) {
                    shares.clear();
                    break;
                }
                const double l = emission.pulsed ? result->perPulse().si() : result->irradiance().si();
                shares.push_back(limits::LineRatio{line.sample.wavelength, line.sample.powerFraction / l});
            }
            const double inverse =
                shares.empty() ? 0.0 : limits::combineLines(limits::Target::Eye, shares).governingSum;
            limit.points.emplace_back(distances[i], inverse > 0 ? 1.0 / inverse : kNaN);
            all.push_back(inverse > 0 ? 1.0 / inverse : kNaN);
        }
    } else {
        limit.name = eye.lines.size() > 1 ? tr("MPE, lines combined: %1").arg(mpeText) : tr("MPE: %1").arg(mpeText);
        limit.points = {QPointF(from, mpe), QPointF(to, mpe)};
    }
    content.labels.push_back(ChartLabel{tr("MPE"), palette::kVermillion, limit.points.front(), LabelPlacement::Below});

    auto [ylo, yhi] = curves::decadeRange(all, 3);
    if (eye.nohd.kind == hazard::DistanceKind::Finite) {
        content.guides.push_back(ChartGuide{palette::kInk, nohd});
        content.labels.push_back(ChartLabel{tr("NOHD %1").arg(text(units::format(eye.nohd.value, 3))), palette::kInk,
                                            QPointF(nohd, yhi), LabelPlacement::Below});
    }
    const QString point = eye.pointDistance.metres() > 0
                              ? tr("worst point at %1").arg(text(units::format(eye.pointDistance, 3)))
                              : tr("worst point at 0 m, drawn from 1 cm");
    content.subtitle = tr("%1, %2; MPE for a %3 exposure.")
                           .arg(viewingWords(viewing), point, text(units::format(eye.basis.duration, 3)));
    if (!verdict.isEmpty())
        content.subtitle += QChar(u' ') + verdict;
    content.x = ChartAxis{viewingOrigin(viewing), AxisScale::Log10, TickStyle::Distance, from, to, 0};
    content.y = ChartAxis{emission.pulsed ? tr("H per pulse (J/m²)") : tr("Irradiance E (W/m²)"),
                          AxisScale::Log10,
                          TickStyle::PowerOfTen,
                          ylo,
                          yhi,
                          0};
    content.curves.push_back(std::move(exposure));
    content.curves.push_back(std::move(limit));
    return content;
}

} // namespace beamwarden::gui
