// Does an eyewear item protect against an output? OD provided against OD required at every wavelength of the output,
// and EN 207 levels against the levels required (hazard-and-eyewear.md sections 1.2, 6.3, 6.6; check-values.md K26).
// Conventions under test: an LB n marking promises OD >= n over its range; a wavelength no row or marking covers gives
// OD 0 (falls short, "wavelength range"); no OD table and no marking gives `cannot tell`; OD data without an EN 207
// marking gives at best `cannot tell`; a level below the requirement falls short ("damage level").
#include <catch2/catch.hpp>

#include <algorithm>
#include <cmath>
#include <numbers>
#include <string>
#include <vector>

#include "beamwarden/eyewear/protection.hpp"
#include "beamwarden/units.hpp"

using namespace beamwarden;
using namespace beamwarden::eyewear;
using namespace beamwarden::units::literals;
using hazard::HazardRequest;

namespace {

constexpr double kComputed = 1e-3; // check-values.md section 0

ParsedEyewear shelfItem(std::vector<std::string> en207, std::vector<model::OdRow> table = {})
{
    model::EyewearItem raw;
    raw.name = "test item";
    raw.en207Markings = std::move(en207);
    raw.spectralOd = std::move(table);
    const auto parsed = parseEyewear(raw);
    INFO((parsed ? std::string{"accepted"} : parsed.error().message()));
    REQUIRE(parsed.has_value());
    return *parsed;
}

model::OdRow odRow(double from_nm, double to_nm, double od)
{
    model::OdRow row;
    row.from = units::Wavelength::fromSi(from_nm * 1e-9);
    row.to = units::Wavelength::fromSi(to_nm * 1e-9);
    row.od = od;
    return row;
}

OutputRequirement requirement(const HazardRequest& request, const std::string& name = "output")
{
    const auto result = requirementFor(request, name, "at the exit");
    INFO((result ? std::string{"accepted"} : result.error().message()));
    REQUIRE(result.has_value());
    return *result;
}

bool anyReasonMentions(const OutputCheck& check, const std::string& words)
{
    for (const std::string& r : check.reasons) {
        if (r.find(words) != std::string::npos)
            return true;
    }
    return false;
}

// check-values.md C34 set-up: 1064 nm CW, 100 mW, d63 = 2 mm, t = 10 s, eye at the exit.
HazardRequest c34()
{
    HazardRequest request;
    request.emission.spectrum = model::singleLine(1064_nm);
    request.emission.averagePower = 100_mW;
    request.beam.diameter = 2_mm;
    request.beam.divergence = units::Angle::fromSi(0.0);
    request.exposureCase.exposure = 10_s;
    return request;
}

// check-values.md C40 / C35 set-up: 1064 nm, 100 mJ, 10 ns, 10 Hz, d63 = 6 mm, T = 10 s, eye at the exit.
HazardRequest c40()
{
    HazardRequest request;
    request.emission.spectrum = model::singleLine(1064_nm);
    request.emission.pulsed = true;
    request.emission.pulseEnergy = 100_mJ;
    request.emission.pulseDuration = 10_ns;
    request.emission.prf = 10_Hz;
    request.beam.diameter = 6_mm;
    request.beam.divergence = units::Angle::fromSi(0.0);
    request.exposureCase.exposure = 10_s;
    return request;
}

// The brief's femtosecond amplifier: 800 nm, 35 fs, 1 kHz, 4 mJ, 10 mm, 0.5 mrad, Gaussian band 27 nm FWHM.
HazardRequest amplifier()
{
    HazardRequest request;
    const auto band = model::gaussianBand(800_nm, 27_nm);
    REQUIRE(band.has_value());
    request.emission.spectrum = *band;
    request.emission.pulsed = true;
    request.emission.pulseEnergy = 4_mJ;
    request.emission.pulseDuration = 35_fs;
    request.emission.prf = 1_kHz;
    request.beam.diameter = 10_mm;
    request.beam.divergence = 0.5_mrad;
    return request;
}

} // namespace

TEST_CASE("eyewear protection: verdict words", "[eyewear][protection]")
{
    // protection.hpp contract and the brief: "covers", "cannot tell", "falls short"
    CHECK(toString(Verdict::Covers) == "covers");
    CHECK(toString(Verdict::CannotTell) == "cannot tell");
    CHECK(toString(Verdict::FallsShort) == "falls short");
}

TEST_CASE("eyewear protection: provided OD from markings and table rows", "[eyewear][protection]")
{
    // convention: an LB n marking promises OD >= n over its range (hazard-and-eyewear.md §6.2 "level n also requires
    // tau <= 10^-n")
    const ParsedEyewear marked = shelfItem({"740-1100 D LB7"});
    const ProvidedOd inside = providedOd(marked, 800.0);
    CHECK(inside.rated);
    CHECK(inside.od == Approx(7.0).epsilon(1e-12));
    CHECK_FALSE(inside.source.empty());
    // convention: a wavelength no row or marking covers gives OD 0, not rated
    const ProvidedOd outside = providedOd(marked, 1200.0);
    CHECK_FALSE(outside.rated);
    CHECK(outside.od == 0.0);
    // the highest of table rows and markings covering the wavelength (protection.hpp contract)
    const ParsedEyewear both = shelfItem({"740-1100 D LB7"}, {odRow(700, 1100, 5)});
    CHECK(providedOd(both, 800.0).od == Approx(7.0).epsilon(1e-12));
    CHECK(providedOd(both, 720.0).od == Approx(5.0).epsilon(1e-12));
    CHECK(providedOd(both, 720.0).rated);
    const ParsedEyewear table = shelfItem({}, {odRow(700, 1100, 9)});
    CHECK(providedOd(table, 800.0).od == Approx(9.0).epsilon(1e-12));
}

TEST_CASE("eyewear protection: parseEyewear refuses a marking that does not parse", "[eyewear][protection]")
{
    model::EyewearItem item;
    item.name = "Goggle G7";
    item.en207Markings = {"1064 DD LB7"};
    const auto parsed = parseEyewear(item);
    REQUIRE_FALSE(parsed.has_value());
    // protection.hpp contract: the error names the item and the part that failed
    const std::string message = parsed.error().message();
    INFO(message);
    CHECK(message.find("Goggle G7") != std::string::npos);
    CHECK(message.find("DD") != std::string::npos);
}

TEST_CASE("eyewear protection: a CW source needs mode D only", "[eyewear][protection]")
{
    const OutputRequirement req = requirement(c34());
    REQUIRE(req.levels.size() == 1);
    // hazard-and-eyewear.md §6.3: D for every CW laser; no pulse mode for CW
    CHECK(req.levels[0].modes.size() == 1);
    CHECK(req.levels[0].modes[0].mode == Mode::D);
    // §6.2 inverse: E = 0.1 W / (pi (1 mm)^2) = 3.183e4 W/m2 -> D LB4 (our arithmetic; exact level number)
    CHECK(req.levels[0].levelFor(Mode::D) == 4);
    const OutputCheck check = checkOutput(shelfItem({"1064 D LB5"}), req);
    CHECK(check.requiredLevels[static_cast<std::size_t>(Mode::D)] == 4);
    CHECK(check.requiredLevels[static_cast<std::size_t>(Mode::I)] == 0);
    CHECK(check.requiredLevels[static_cast<std::size_t>(Mode::R)] == 0);
    CHECK(check.requiredLevels[static_cast<std::size_t>(Mode::M)] == 0);
    // D LB5 >= LB4, OD 5 >= 1.716, P < 10 W, E < 1e5 W/m2: covers
    CHECK(check.verdict == Verdict::Covers);
    // an item marked in R only does not cover D, which every source requires (§6.3)
    const OutputCheck onlyR = checkOutput(shelfItem({"1064 R LB10"}), req);
    CHECK(onlyR.verdict == Verdict::FallsShort);
    CHECK(anyReasonMentions(onlyR, "damage level"));
}

TEST_CASE("eyewear protection: margin in OD for a single line", "[eyewear][protection]")
{
    const OutputCheck check = checkOutput(shelfItem({"1064 D LB5"}), requirement(c34()));
    // check-values.md C34: OD_req 1.716 (computed from verified formulas; relative 1e-3)
    CHECK(check.requiredOd == Approx(1.716).epsilon(kComputed));
    // LB5 promises OD >= 5 (convention)
    CHECK(check.providedOd == Approx(5.0).epsilon(1e-12));
    CHECK(check.worstWavelength_nm == Approx(1064.0).epsilon(1e-9));
    // hand check: one line, residual ratio = ratio 10^-OD_provided, so margin = OD_provided - OD_req
    // = 5 - 1.716 = 3.284 (check-values.md C34; absolute 2e-3 from C34's 1e-3 relative tolerance)
    CHECK(check.marginOd == Approx(5.0 - 1.716).margin(2e-3));
    CHECK(check.marginOd == Approx(check.providedOd - check.requiredOd).margin(1e-9));
    CHECK(check.verdict == Verdict::Covers);
}

TEST_CASE("eyewear protection: an insufficient level falls short on the damage level", "[eyewear][protection]")
{
    const OutputRequirement req = requirement(c40());
    // check-values.md C40: D LB4, R LB7 (exact level numbers)
    const OutputCheck check = checkOutput(shelfItem({"1064 D LB6 + R LB6"}), req);
    CHECK(check.requiredLevels[static_cast<std::size_t>(Mode::D)] == 4);
    CHECK(check.requiredLevels[static_cast<std::size_t>(Mode::R)] == 7);
    // check-values.md C35: OD_req 5.614 under `strictest` at T = 10 s, default aperture convention (computed from
    // reconstructed formulas; relative 1e-3): LB6's OD 6 is enough, the R level is not
    CHECK(check.requiredOd == Approx(5.614).epsilon(kComputed));
    CHECK(check.providedOd >= check.requiredOd);
    CHECK(check.verdict == Verdict::FallsShort);
    CHECK(anyReasonMentions(check, "damage level"));
    // with R LB7 the same item covers (check-values.md C40 levels)
    CHECK(checkOutput(shelfItem({"1064 D LB6 + R LB7"}), req).verdict == Verdict::Covers);
}

TEST_CASE("eyewear protection: an item with no data cannot tell", "[eyewear][protection]")
{
    const ParsedEyewear empty = shelfItem({});
    CHECK_FALSE(empty.hasOdData());
    const OutputCheck check = checkOutput(empty, requirement(c34()));
    CHECK(check.verdict == Verdict::CannotTell);
    CHECK_FALSE(check.reasons.empty());
}

TEST_CASE("eyewear protection: an OD table without EN 207 marking cannot tell", "[eyewear][protection]")
{
    // convention: damage resistance unknown without an EN 207 marking, however high the OD
    const ParsedEyewear table = shelfItem({}, {odRow(190, 11000, 10)});
    CHECK(table.hasOdData());
    for (const HazardRequest& request : {c34(), c40()}) {
        const OutputCheck check = checkOutput(table, requirement(request));
        CHECK(check.verdict == Verdict::CannotTell);
        CHECK(check.providedOd == Approx(10.0).epsilon(1e-12));
        CHECK_FALSE(check.reasons.empty());
    }
}

TEST_CASE("eyewear protection: femtosecond amplifier against a narrow and a wide item", "[eyewear][protection]")
{
    const OutputRequirement req = requirement(amplifier(), "amplifier");
    REQUIRE(req.levels.size() > 1); // one requirement per spectral sample
    // Our arithmetic from hazard-and-eyewear.md §6.3/§6.4 at the exit (d63 = 10 mm, A63 = 7.854e-5 m2):
    // D: E = 4 W / A63 = 5.093e4 W/m2 -> LB4; M: H = 4 mJ / A63 = 50.93 J/m2, N(5 s) = 5000,
    // H' = 50.93 x 5000^(1/4) = 428.3 J/m2 -> ceil(log10(428.3/1.5) + 4) = ceil(6.46) = LB7
    const double a63 = std::numbers::pi * 0.01 * 0.01 / 4.0;
    const double hCorrected = 4e-3 / a63 * std::pow(5000.0, 0.25);
    CHECK(hCorrected == Approx(428.3).epsilon(kComputed));
    // convention: a broadband output holds every wavelength of its band to the whole output's density
    for (const LevelRequirement& sample : req.levels) {
        INFO("sample at " << sample.lambda_nm << " nm");
        CHECK(sample.levelFor(Mode::D) == 4);
        CHECK(sample.levelFor(Mode::M) == 7);
        CHECK(sample.levelFor(Mode::I) == 0);
        CHECK(sample.levelFor(Mode::R) == 0);
        CHECK_FALSE(sample.beamDiameterCorrectionMissing); // 4 W, 5.1e4 W/m2 (§6.6)
        for (const ModeRequirement& m : sample.modes) {
            if (m.mode == Mode::M)
                CHECK(m.density == Approx(hCorrected).epsilon(kComputed));
            if (m.mode == Mode::D)
                CHECK(m.density == Approx(4.0 / a63).epsilon(kComputed));
        }
    }
    // model::gaussianBand samples +-1.5 FWHM = 759.5-840.5 nm (spectrum.hpp): beyond 820 nm on the narrow item
    double longest = 0;
    for (const LevelRequirement& sample : req.levels)
        longest = std::max(longest, sample.lambda_nm);
    CHECK(longest > 820.0);

    SECTION("rated 740-820 nm: falls short at the band edge")
    {
        const OutputCheck check = checkOutput(shelfItem({"740 - 820 D LB7 + M LB8"}), req);
        CHECK(check.verdict == Verdict::FallsShort);
        CHECK(anyReasonMentions(check, "wavelength range"));
        CHECK(check.worstWavelength_nm > 820.0);
        CHECK(check.providedOd == 0.0);
    }
    SECTION("rated 700-1100 nm with enough levels: covers")
    {
        const OutputCheck check = checkOutput(shelfItem({"700 - 1100 D LB7 + M LB8"}), req);
        INFO("reasons: " << (check.reasons.empty() ? std::string{} : check.reasons.front()));
        CHECK(check.verdict == Verdict::Covers);
        CHECK(check.marginOd >= 0.0);
        CHECK(check.providedOd >= check.requiredOd);
    }
    SECTION("rated 700-1100 nm one M level short: falls short")
    {
        const OutputCheck check = checkOutput(shelfItem({"700 - 1100 D LB7 + M LB6"}), req);
        CHECK(check.verdict == Verdict::FallsShort);
        CHECK(anyReasonMentions(check, "damage level"));
    }
}

TEST_CASE("eyewear protection: K26 requirements round up, scale numbers round down", "[eyewear][protection]")
{
    // check-values.md K26: a displayed requirement never falls below the exact OD_req (hazard-and-eyewear.md §1.2)
    for (double od = 0.0; od < 12.0; od += 0.0137) {
        INFO("OD " << od);
        CHECK(hazard::roundOdUp(od) >= od);
        CHECK(hazard::roundOdUp(od) - od < 0.1 + 1e-9);
    }
    // hazard-and-eyewear.md §1.2: 3.17 -> 3.2; check-values.md C39: 4.52 -> 4.6 (exact after rounding)
    CHECK(hazard::roundOdUp(3.17) == Approx(3.2).margin(1e-9));
    CHECK(hazard::roundOdUp(4.52) == Approx(4.6).margin(1e-9));
    // check-values.md K26: a filter's scale number int(-log10 tau) never exceeds -log10 tau; no API gives the scale
    // number, so this is our own arithmetic of the definition (§1.2, N = int(-log10 tau))
    for (double tau = 1e-12; tau < 1.0; tau *= 1.7) {
        const double od = -std::log10(tau);
        const int scale = static_cast<int>(od);
        CHECK(static_cast<double>(scale) <= od);
        // tau = 10^-OD (K26 definition)
        CHECK(std::pow(10.0, -od) == Approx(tau).epsilon(1e-12));
    }
    // check-values.md C39 via K26: tau = 3e-5 -> -log10 tau = 4.52 -> scale number 4
    CHECK(-std::log10(3e-5) == Approx(4.52).epsilon(kComputed));
    CHECK(static_cast<int>(-std::log10(3e-5)) == 4);
    // check-values.md K26: OD_req >= 0; a 1 uW CW line at 1064 nm stays far below the MPE (50 W/m2 at 10 s, C34's
    // MPE; 1e-6 W / A7 = 0.026 W/m2, our arithmetic), so the requirement is 0, and the check reports no deficit
    HazardRequest weak = c34();
    weak.emission.averagePower = units::Power::fromSi(1e-6);
    const OutputRequirement req = requirement(weak);
    CHECK(req.hazard.requiredOd == 0.0);
    const OutputCheck check = checkOutput(shelfItem({"1064 D LB1"}), req);
    CHECK(check.requiredOd >= 0.0);
    CHECK(check.marginOd >= 0.0);
    CHECK(hazard::roundOdUp(check.requiredOd) >= check.requiredOd);
    // the displayed requirement of every case above is at least the exact one (K26)
    for (const HazardRequest& request : {c34(), c40(), amplifier()}) {
        const OutputRequirement r = requirement(request);
        CHECK(r.hazard.requiredOd >= 0.0);
        CHECK(r.hazard.displayedOd >= r.hazard.requiredOd);
    }
}

TEST_CASE("eyewear protection: checkAll over a laser's outputs takes the worst", "[eyewear][protection]")
{
    const std::vector<OutputRequirement> outputs = {requirement(c34(), "fundamental"), requirement(c40(), "pulsed")};
    // covers c34 (D LB4 needed) and c40 (D LB4 + R LB7 needed): both outputs
    const ProtectionCheck good = checkAll(shelfItem({"1064 D LB6 + R LB7"}), outputs);
    REQUIRE(good.outputs.size() == 2);
    CHECK(good.verdict == Verdict::Covers);
    // R LB6 falls short on the pulsed output only: the laser's verdict is the worst
    const ProtectionCheck bad = checkAll(shelfItem({"1064 D LB6 + R LB6"}), outputs);
    REQUIRE(bad.outputs.size() == 2);
    CHECK(bad.outputs[0].verdict == Verdict::Covers);
    CHECK(bad.outputs[1].verdict == Verdict::FallsShort);
    CHECK(bad.verdict == Verdict::FallsShort);
    CHECK(bad.marginOd <= bad.outputs[0].marginOd);
    CHECK(bad.marginOd <= bad.outputs[1].marginOd);
}
