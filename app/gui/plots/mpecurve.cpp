// The MPE chart: eye (the rule choice, and each rule set alone) and skin against exposure duration, with the
// current point marked.
#include "plots/curvesampling.hpp"
#include "plots/limitcurvecontent.hpp"
#include "widgets/palette.hpp"

#include "beamwarden/limits/mpe.hpp"
#include "beamwarden/units.hpp"

#include <algorithm>
#include <array>
#include <cmath>

namespace beamwarden::gui {

using curves::kNaN;
using curves::text;

namespace {

constexpr double kLongest_s = 3e4; // the engines' longest exposure

// A rule set's short name ("IEC 60825-1:2014"): core's full name without the bracketed basis.
QString shortName(limits::RuleSetId set)
{
    const QString full = text(limits::fullName(set));
    const qsizetype bracket = full.indexOf(QStringLiteral(" ("));
    return bracket > 0 ? full.left(bracket) : full;
}

QString ruleWords(limits::PulseRule rule)
{
    switch (rule) {
    case limits::PulseRule::SinglePulse:
        return LimitCurveContent::tr("single-pulse rule");
    case limits::PulseRule::AveragePower:
        return LimitCurveContent::tr("average-power rule");
    case limits::PulseRule::PulseTrain:
        return LimitCurveContent::tr("repeated-pulse rule");
    }
    return {};
}

QString sourceWords(units::Angle alpha)
{
    if (alpha.milliradians() <= 1.5)
        return LimitCurveContent::tr("small source");
    return LimitCurveContent::tr("apparent source %1").arg(text(units::format(alpha, 3)));
}

struct SampledMpe {
    double main = kNaN;                               // the figure under the assessment's rule choice
    bool reconstructed = false;                       // some figure here rests on a reconstructed row
    std::array<double, limits::kRuleSetCount> sets{}; // each rule set alone
};

// Single exposure of duration t at the case's wavelength and apparent source: MPE as H (J/m²).
SampledMpe sampleEye(const hazard::HazardResult& eye, const assessment::AssessmentOptions& options, double t)
{
    SampledMpe out;
    out.sets.fill(kNaN);
    limits::MpeRequest request;
    request.wavelength = eye.lines.at(eye.governingLine).sample.wavelength;
    request.target = limits::Target::Eye;
    request.duration = units::Duration::fromSi(t);
    request.sourceAngle = eye.sourceAngleAtPoint;
    request.rules = limits::RuleChoice::Strictest; // every set at once; the choice picks the main curve below
    request.c5 = options.c5;
    const auto result = limits::evaluateMpe(request);
    if (!result)
        return out; // outside what the tables cover: a gap, never an invented value
    for (const limits::SetOutcome& set : result->allSets()) {
        const auto index = static_cast<std::size_t>(set.set);
        out.sets.at(index) = set.limit.joulesPerSquareMetre();
        const bool chosen =
            (options.rules == limits::RuleChoice::Iec60825_1_2007 && set.set == limits::RuleSetId::Iec60825_1_2007) ||
            (options.rules == limits::RuleChoice::Iec60825_1_2014 && set.set == limits::RuleSetId::Iec60825_1_2014);
        if (chosen)
            out.main = set.limit.joulesPerSquareMetre();
        out.reconstructed = out.reconstructed || set.weakestStatus == limits::RowStatus::Reconstructed;
    }
    if (options.rules == limits::RuleChoice::Strictest)
        out.main = result->governing().limit.joulesPerSquareMetre();
    return out;
}

double sampleSkin(const hazard::HazardResult& eye, const assessment::AssessmentOptions& options, double t)
{
    limits::MpeRequest request;
    request.wavelength = eye.lines.at(eye.governingLine).sample.wavelength;
    request.target = limits::Target::Skin;
    request.duration = units::Duration::fromSi(t);
    request.rules = options.rules;
    request.c5 = options.c5;
    const auto result = limits::evaluateMpe(request);
    return result ? result->radiantExposure().joulesPerSquareMetre() : kNaN;
}

} // namespace

std::vector<double> LimitCurveContent::mpeDurations(const hazard::HazardResult& eye)
{
    const model::Emission& emission = eye.request.emission;
    const bool subHundredFs = emission.pulsed && emission.pulseDuration.seconds() < 1e-13;
    std::vector<double> durations = curves::logSpaced(subHundredFs ? 1e-14 : 1e-13, kLongest_s, curves::kCurvePoints);
    if (emission.pulsed)
        durations.push_back(emission.pulseDuration.seconds());
    durations.push_back(eye.basis.duration.seconds());
    std::sort(durations.begin(), durations.end());
    durations.erase(std::unique(durations.begin(), durations.end()), durations.end());
    return durations;
}

ChartContent LimitCurveContent::mpeAgainstDuration(const assessment::CaseAssessment& exposureCase,
                                                   const assessment::AssessmentOptions& options)
{
    const hazard::HazardResult& eye = exposureCase.eye;
    ChartContent content;
    if (eye.lines.empty())
        return content;
    const model::Emission& emission = eye.request.emission;
    const units::Wavelength wavelength = eye.lines.at(eye.governingLine).sample.wavelength;

    ChartCurve main{options.rules == limits::RuleChoice::Strictest
                        ? tr("Eye, strictest")
                        : tr("Eye, %1").arg(shortName(eye.lines.at(eye.governingLine).mpe.governing().set)),
                    palette::kBlue,
                    3.0,
                    LineStyle::Solid,
                    false,
                    {}};
    std::array<ChartCurve, limits::kRuleSetCount> sets;
    const std::array<QColor, limits::kRuleSetCount> setColours = {palette::kSkyBlue, palette::kBluishGreen};
    const std::array<LineStyle, limits::kRuleSetCount> setStyles = {LineStyle::Dashed, LineStyle::DashDot};
    for (std::size_t i = 0; i < sets.size(); ++i)
        sets.at(i) = ChartCurve{tr("Eye, %1 only").arg(shortName(static_cast<limits::RuleSetId>(i))),
                                setColours.at(i),
                                1.4,
                                setStyles.at(i),
                                false,
                                {}};
    ChartCurve skin{tr("Skin"), palette::kOrange, 2.4, LineStyle::Solid, false, {}};

    std::vector<double> all;
    bool reconstructed = false;
    for (const double t : mpeDurations(eye)) {
        const SampledMpe h = sampleEye(eye, options, t);
        reconstructed = reconstructed || h.reconstructed;
        main.points.emplace_back(t, h.main);
        for (std::size_t i = 0; i < sets.size(); ++i)
            sets.at(i).points.emplace_back(t, h.sets.at(i));
        const double s = sampleSkin(eye, options, t);
        skin.points.emplace_back(t, s);
        all.insert(all.end(), {h.main, h.sets[0], h.sets[1], s});
    }

    // The current point: for pulses the one-pulse MPE at the pulse duration (on the curve) and the train's
    // per-pulse figure after every rule; for CW the MPE at the exposure basis.
    const hazard::LineResult& governing = eye.lines.at(eye.governingLine);
    if (emission.pulsed) {
        const double tp = emission.pulseDuration.seconds();
        const double single = sampleEye(eye, options, tp).main;
        const double perPulse = governing.mpe.perPulse().joulesPerSquareMetre();
        const QString pulse = text(units::format(emission.pulseDuration, 3));
        content.markers.push_back(ChartMarker{tr("One pulse, %1").arg(pulse), palette::kVermillion, MarkerShape::Circle,
                                              QPointF(tp, single)});
        content.markers.push_back(ChartMarker{tr("Per pulse in the train (%1)").arg(ruleWords(eye.governingRule)),
                                              palette::kReddishPurple, MarkerShape::Diamond, QPointF(tp, perPulse)});
        const bool close = std::abs(std::log10(single / perPulse)) < 0.6;
        content.labels.push_back(
            ChartLabel{tr("one pulse: %1").arg(text(units::format(units::RadiantExposure::fromSi(single), 4))),
                       palette::kVermillion, QPointF(tp, single), LabelPlacement::Above});
        content.labels.push_back(ChartLabel{
            tr("per pulse in the train: %1").arg(text(units::format(units::RadiantExposure::fromSi(perPulse), 4))),
            palette::kReddishPurple, QPointF(tp, perPulse),
            close || perPulse < single ? LabelPlacement::Below : LabelPlacement::Above});
        all.push_back(perPulse);
    } else {
        const double t = eye.basis.duration.seconds();
        const double h = sampleEye(eye, options, t).main;
        const QString basis = text(units::format(eye.basis.duration, 3));
        content.markers.push_back(
            ChartMarker{tr("Exposure basis %1").arg(basis), palette::kVermillion, MarkerShape::Circle, QPointF(t, h)});
        content.labels.push_back(
            ChartLabel{tr("%1: %2").arg(basis, text(units::format(units::RadiantExposure::fromSi(h), 4))),
                       palette::kVermillion, QPointF(t, h), LabelPlacement::Above});
    }

    // Words at the right-hand ends, so the curves are told apart without their colours.
    if (!main.points.empty())
        content.labels.push_back(ChartLabel{tr("eye"), palette::kBlue, main.points.back(), LabelPlacement::Below});
    if (!skin.points.empty())
        content.labels.push_back(ChartLabel{tr("skin"), palette::kOrange, skin.points.back(), LabelPlacement::Above});

    const auto [ylo, yhi] = curves::decadeRange(all);
    content.title = emission.spectrum.isSingleLine()
                        ? tr("MPE against exposure duration at %1").arg(text(units::format(wavelength, 4)))
                        : tr("MPE against exposure duration at %1, the band's governing wavelength")
                              .arg(text(units::format(wavelength, 4)));
    content.subtitle = tr("Curves for single exposures, %1.").arg(sourceWords(eye.sourceAngleAtPoint));
    if (emission.pulsed)
        content.subtitle +=
            QChar(u' ') + tr("Marks: %1 pulses at %2 over the %3 exposure basis.")
                              .arg(text(units::format(emission.pulseDuration, 3)), text(units::format(emission.prf, 3)),
                                   text(units::format(eye.basis.duration, 3)));
    if (reconstructed)
        content.subtitle += QChar(u' ') + tr("Parts rest on reconstructed table rows: check them against the "
                                             "standard.");
    content.x = ChartAxis{tr("Exposure duration"),
                          AxisScale::Log10,
                          TickStyle::Duration,
                          main.points.empty() ? 1e-13 : main.points.front().x(),
                          kLongest_s,
                          0};
    content.y = ChartAxis{tr("MPE as H (J/m²)"), AxisScale::Log10, TickStyle::PowerOfTen, ylo, yhi, 0};
    content.curves.push_back(std::move(main));
    for (ChartCurve& set : sets)
        content.curves.push_back(std::move(set));
    content.curves.push_back(std::move(skin));
    return content;
}

} // namespace beamwarden::gui
