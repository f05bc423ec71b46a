// EN 207 levels and the DGUV 203-042 procedure for choosing them (hazard-and-eyewear.md sections 6.2-6.6).
#include "beamwarden/eyewear/levels.hpp"

#include "beamwarden/hazard/geometry.hpp"
#include "beamwarden/limits/factors.hpp"

#include <algorithm>
#include <array>
#include <cmath>
#include <deque>
#include <fmt/core.h>
#include <numbers>

namespace beamwarden::eyewear {

namespace {

enum class Column { Uv, VisibleNir, Infrared };

Column columnFor(double lambda_nm)
{
    if (lambda_nm <= 315.0)
        return Column::Uv;
    if (lambda_nm <= 1400.0)
        return Column::VisibleNir;
    return Column::Infrared;
}

double pow10(int exponent)
{
    return std::pow(10.0, exponent);
}

// N of the repetition correction: pulses in 5 s, or Ti groups in 5 s when pulses are closer than Ti (DGUV 203-042
// 5.3 a and b); 0 when no correction applies.
struct Repetition {
    double correction = 1.0; // N^(1/4)
    double groupSize = 1.0;  // pulses summed within Ti
    std::string basis;
};

Repetition repetition(const model::Emission& e, double lambda_nm, double ti, std::string_view setName)
{
    Repetition rep;
    const double rate = e.pulsesPerSecond();
    if (lambda_nm < 400.0 || e.pulseDuration.seconds() >= 0.25 || rate <= 1.0) {
        rep.basis = "no repetition correction (below 400 nm, pulses of 0.25 s or more, or at most 1 Hz)";
        return rep;
    }
    const double period = 1.0 / e.prf.hertz();
    if (ti <= 0.0 || period > ti) {
        const double n = 5.0 * rate;
        rep.correction = std::pow(n, 0.25);
        rep.basis = fmt::format("H' = H N^(1/4), N = {:.4g} pulses in 5 s", n);
        return rep;
    }
    double groupsIn5s = 5.0 / ti;
    rep.groupSize = e.prf.hertz() * ti;
    if (e.burst) {
        const double span = (e.burst->pulsesPerBurst - 1) / e.prf.hertz() + e.pulseDuration.seconds();
        rep.groupSize = std::min<double>(e.burst->pulsesPerBurst, std::ceil(e.prf.hertz() * ti * (1.0 - 1e-12)));
        groupsIn5s = 5.0 * e.burst->burstRate.hertz() * (span < ti ? 1.0 : std::ceil(span / ti));
    }
    rep.correction = std::pow(groupsIn5s, 0.25);
    rep.basis = fmt::format("pulses within Ti = {} ({}) summed: {:.4g} per group; H' = H N'^(1/4), N' = {:.4g} "
                            "groups in 5 s",
                            units::format(units::Duration::fromSi(ti)), setName, rep.groupSize, groupsIn5s);
    return rep;
}

std::vector<limits::RuleSetId> setsOf(limits::RuleChoice choice)
{
    switch (choice) {
    case limits::RuleChoice::Iec60825_1_2007:
        return {limits::RuleSetId::Iec60825_1_2007};
    case limits::RuleChoice::Iec60825_1_2014:
        return {limits::RuleSetId::Iec60825_1_2014};
    case limits::RuleChoice::Strictest:
        break;
    }
    return {limits::RuleSetId::Iec60825_1_2007, limits::RuleSetId::Iec60825_1_2014};
}

void keepHigher(std::vector<ModeRequirement>& modes, ModeRequirement candidate)
{
    for (ModeRequirement& m : modes) {
        if (m.mode == candidate.mode) {
            if (candidate.level > m.level || (candidate.level == m.level && candidate.density > m.density))
                m = std::move(candidate);
            return;
        }
    }
    modes.push_back(std::move(candidate));
}

} // namespace

double levelValue(Mode mode, double lambda_nm, int n)
{
    const Column column = columnFor(lambda_nm);
    switch (mode) {
    case Mode::D:
        return column == Column::Uv ? pow10(n - 3) : column == Column::VisibleNir ? pow10(n + 1) : pow10(n + 3);
    case Mode::I:
    case Mode::R:
        return column == Column::Uv           ? 3.0 * pow10(n + 1)
               : column == Column::VisibleNir ? 5.0 * pow10(n - 3)
                                              : pow10(n + 2);
    case Mode::M:
        return column == Column::Uv           ? 3.0 * pow10(n + 10)
               : column == Column::VisibleNir ? 1.5 * pow10(n - 4)
                                              : pow10(n + 11);
    }
    return 0.0;
}

int requiredLevelFor(Mode mode, double lambda_nm, double density)
{
    // The table's values for LB1 ... LB10 by mode and column, computed once (this runs for every spectral sample).
    static const auto kTable = [] {
        std::array<std::array<std::array<double, 10>, 3>, kModeCount> table{};
        constexpr std::array<double, 3> kColumnWavelength{300.0, 1000.0, 2000.0}; // one inside each column
        for (int m = 0; m < kModeCount; ++m)
            for (std::size_t column = 0; column < 3; ++column)
                for (int n = 1; n <= 10; ++n)
                    table[static_cast<std::size_t>(m)][column][static_cast<std::size_t>(n - 1)] =
                        levelValue(static_cast<Mode>(m), kColumnWavelength[column], n);
        return table;
    }();
    const auto& values = kTable[static_cast<std::size_t>(mode)][static_cast<std::size_t>(columnFor(lambda_nm))];
    // A level's value is its maximum: a density equal to it (within rounding) still belongs to it.
    for (int n = 1; n <= 10; ++n) {
        if (density <= values[static_cast<std::size_t>(n - 1)] * (1.0 + 1e-12))
            return n;
    }
    return kExceedsLb10;
}

std::vector<Mode> pulsedModesFor(double t)
{
    // I: > 1 us to 0.25 s; R: > 1 ns to 1 us; M: < 1 ns. Exactly 1 us or 1 ns belongs to both neighbours.
    std::vector<Mode> modes;
    if (t >= 1e-6 && t <= 0.25)
        modes.push_back(Mode::I);
    if (t >= 1e-9 && t <= 1e-6)
        modes.push_back(Mode::R);
    if (t <= 1e-9)
        modes.push_back(Mode::M);
    return modes;
}

int LevelRequirement::levelFor(Mode mode) const
{
    for (const ModeRequirement& m : modes) {
        if (m.mode == mode)
            return m.level;
    }
    return 0;
}

Result<std::vector<LevelRequirement>> requiredLevels(const hazard::HazardRequest& raw)
{
    auto emission = model::completeAndValidate(raw.emission);
    if (!emission)
        return std::unexpected(emission.error());
    auto beam = model::validate(raw.beam);
    if (!beam)
        return std::unexpected(beam.error());
    auto exposureCase = model::validate(raw.exposureCase);
    if (!exposureCase)
        return std::unexpected(exposureCase.error());
    const model::Emission& e = *emission;

    // EN 207 densities use the 1/e diameter at the eyewear and no aperture averaging: E = P/A63, H = Q/A63. A filter
    // is not worn at a fibre end or in a focus: there the eyewear is taken at least 100 mm away (the distance from
    // which IEC 60825-1 assesses the eye at 302.5-4000 nm, BGV B2 notes, exposure-limits.md section 2.4).
    double position = exposureCase->distance.si();
    if (exposureCase->viewing == model::Viewing::Fibre)
        position = std::max(position, 0.1);
    if (exposureCase->viewing == model::Viewing::Lens)
        position = std::max(position, exposureCase->focalLength.si() + 0.1);
    const hazard::PointGeometry point = hazard::geometryAt(*exposureCase, *beam, position);
    const double d63 = std::max(point.d63_m, 1e-9);
    const double perWatt = point.pointSource ? point.powerFactor * point.pointIrradiancePerWatt
                                             : point.powerFactor / (std::numbers::pi * d63 * d63 / 4.0);
    const double meanIrradiance = e.averagePower.si() * perWatt;

    // The words behind each density are the same for every sample of a band (the density is the whole output's; Ti
    // changes only at a few band edges), so each is written once, not once per sample.
    const std::string meanBasis =
        fmt::format("E = P/A63 = {} from the mean power", units::format(units::Irradiance::fromSi(meanIrradiance)));
    std::string peakBasis;
    // repetition() depends on the wavelength only through Ti and whether it lies below 400 nm.
    struct RepetitionWords {
        limits::RuleSetId set;
        double ti;
        bool below400;
        Repetition repetition;
        std::string basis;
    };
    std::deque<RepetitionWords> repetitions; // references stay valid as it grows
    const double pulseH = e.pulseEnergy.si() * perWatt;
    auto repetitionFor = [&](const limits::RuleSet& set, double lambda_nm) -> const RepetitionWords& {
        const double ti = limits::factors::ti(set, lambda_nm);
        const bool below400 = lambda_nm < 400.0;
        for (const RepetitionWords& known : repetitions) {
            if (known.set == set.id && known.ti == ti && known.below400 == below400)
                return known;
        }
        Repetition rep = repetition(e, lambda_nm, ti, set.name);
        std::string basis =
            fmt::format("H = Q/A63 = {}; {}", units::format(units::RadiantExposure::fromSi(pulseH)), rep.basis);
        repetitions.push_back(RepetitionWords{set.id, ti, below400, std::move(rep), std::move(basis)});
        return repetitions.back();
    };

    std::vector<LevelRequirement> out;
    out.reserve(e.spectrum.samples.size());
    for (const model::SpectralSample& sample : e.spectrum.samples) {
        LevelRequirement req;
        req.lambda_nm = sample.wavelength.nanometres();
        // Damage is done by the whole beam: each wavelength of a band is held to the output's full density
        // (never to its share), so spreading a spectrum over samples cannot lower a level.
        const double eMean = meanIrradiance;
        req.modes.push_back(
            ModeRequirement{Mode::D, requiredLevelFor(Mode::D, req.lambda_nm, eMean), eMean, meanBasis});
        if (e.pulsed) {
            const double h = pulseH;
            for (const Mode mode : pulsedModesFor(e.pulseDuration.seconds())) {
                const bool peakPower = mode == Mode::M && columnFor(req.lambda_nm) != Column::VisibleNir;
                if (peakPower) {
                    const double ep = h / e.pulseDuration.seconds();
                    if (peakBasis.empty())
                        peakBasis = fmt::format("peak power density E_p = Q/(t A63) = {}",
                                                units::format(units::Irradiance::fromSi(ep)));
                    keepHigher(req.modes,
                               ModeRequirement{mode, requiredLevelFor(mode, req.lambda_nm, ep), ep, peakBasis});
                    continue;
                }
                for (const limits::RuleSetId id : setsOf(raw.rules)) {
                    const RepetitionWords& rep = repetitionFor(limits::ruleSet(id), req.lambda_nm);
                    const double corrected = h * rep.repetition.groupSize * rep.repetition.correction;
                    keepHigher(req.modes, ModeRequirement{mode, requiredLevelFor(mode, req.lambda_nm, corrected),
                                                          corrected, rep.basis});
                }
            }
        }
        // DGUV 203-042 5.2: large beams can burn through filters chosen from the table; the factor F(d63) is not
        // known here, so the level is a lower bound (hazard-and-eyewear.md section 6.6).
        if (!point.pointSource && req.lambda_nm >= 315.0 && d63 > 1e-3 &&
            (e.averagePower.si() > 10.0 || meanIrradiance > 1e5)) {
            req.beamDiameterCorrectionMissing = true;
            req.notes.emplace_back("beam-diameter correction of DGUV 203-042 5.2 not applied (P > 10 W or "
                                   "E > 1e5 W/m^2 with d63 > 1 mm): the levels are lower bounds");
        }
        if (req.lambda_nm > 315.0 && req.lambda_nm < 400.0 && req.levelFor(Mode::M) > 0) {
            req.checkEn207Text = true;
            req.notes.emplace_back("mode M at 315-400 nm: computed with the 315-1400 nm column; check the EN 207 "
                                   "text (DGUV notes EN 207 applies it from 400 nm)");
        }
        out.push_back(std::move(req));
    }
    return out;
}

std::optional<En207Marking> impliedMarking(const std::vector<LevelRequirement>& requirements)
{
    if (requirements.empty())
        return std::nullopt;
    double lo = requirements.front().lambda_nm;
    double hi = lo;
    std::array<int, kModeCount> level{};
    for (const LevelRequirement& r : requirements) {
        lo = std::min(lo, r.lambda_nm);
        hi = std::max(hi, r.lambda_nm);
        for (const ModeRequirement& m : r.modes)
            level[static_cast<std::size_t>(m.mode)] = std::max(level[static_cast<std::size_t>(m.mode)], m.level);
    }
    En207Marking marking;
    const WavelengthSpan span{std::floor(lo), std::ceil(hi)};
    for (int m = 0; m < kModeCount; ++m) {
        const int n = level[static_cast<std::size_t>(m)];
        if (n == 0)
            continue;
        if (n > 10)
            return std::nullopt;
        // Modes at the same level share one term ("DI LB5").
        auto same = std::find_if(marking.terms.begin(), marking.terms.end(),
                                 [&](const MarkingTerm& t) { return t.level == n; });
        if (same != marking.terms.end()) {
            same->modes = static_cast<std::uint8_t>(same->modes | (1U << static_cast<unsigned>(m)));
            continue;
        }
        marking.terms.push_back(
            MarkingTerm{{span}, static_cast<std::uint8_t>(1U << static_cast<unsigned>(m)), n, false});
    }
    return marking;
}

} // namespace beamwarden::eyewear
