// Several wavelengths: OD per band and the ratio sum over lines that add (hazard-and-eyewear.md section 1.4;
// exposure-limits.md section 6.2: 400-1400 nm lines add for the eye). The hand sums use visible light at 0.25 s,
// where every wavelength has the same MPE, 25.46 W/m2 (check-values.md P10: "visible ... t = 0.25 s"; P3 and C36 use
// it at 488 nm and 651 nm).
#include <catch2/catch.hpp>

#include <cmath>
#include <numbers>
#include <string>

#include "beamwarden/hazard/hazard.hpp"
#include "beamwarden/units.hpp"

using namespace beamwarden;
using namespace beamwarden::units::literals;
using hazard::HazardRequest;
using hazard::HazardResult;

namespace {

constexpr double kVisibleMpe = 25.46; // W/m2, check-values.md P10 (visible, 0.25 s)

// 1 W CW in a 10 mm beam, eye at the exit, 0.25 s: the beam is wider than the 7 mm aperture, so every sample's
// exposure is its share of P / A_beam (hazard-and-eyewear.md section 1.3).
HazardRequest oneWatt(model::Spectrum spectrum)
{
    HazardRequest request;
    request.emission.spectrum = std::move(spectrum);
    request.emission.averagePower = 1_W;
    request.beam.diameter = 10_mm;
    request.beam.divergence = 1_mrad;
    request.exposureCase.exposure = 0.25_s;
    return request;
}

HazardResult evaluated(const HazardRequest& request)
{
    const auto result = hazard::evaluateHazard(request);
    INFO((result ? std::string{"accepted"} : result.error().message()));
    REQUIRE(result.has_value());
    return *result;
}

model::Spectrum accepted(const Result<model::Spectrum>& spectrum)
{
    INFO((spectrum ? std::string{"accepted"} : spectrum.error().message()));
    REQUIRE(spectrum.has_value());
    return *spectrum;
}

void checkBandsAndSum(const HazardResult& r)
{
    REQUIRE_FALSE(r.bands.empty());
    double bandSum = 0.0;
    for (const hazard::BandOd& band : r.bands) {
        INFO("band " << band.from.nanometres() << " - " << band.to.nanometres() << " nm");
        CHECK(band.requiredOd >= 0.0);
        CHECK(std::isfinite(band.requiredOd));
        CHECK(band.to >= band.from);
        bandSum += band.ratio;
    }
    double lineSum = 0.0;
    for (const hazard::LineResult& line : r.lines)
        lineSum += line.ratio;
    // every line lies in 400-1400 nm, one additive group (exposure-limits.md section 6.2): the combined ratio is the
    // sum of the line ratios, and the bands share it out (hazard.hpp: BandOd.ratio of the band's own lines)
    CHECK(r.combinedRatio == Approx(lineSum).epsilon(1e-9));
    CHECK(bandSum == Approx(lineSum).epsilon(1e-9));
    CHECK(r.requiredOd >= 0.0);
    CHECK(r.displayedOd >= r.requiredOd);
}

} // namespace

TEST_CASE("hazard spectrum: a Gaussian band in the visible sums like one line", "[hazard][spectrum]")
{
    // 550 nm, 20 nm FWHM, sampled over 520-580 nm: all at 25.46 W/m2 (0.25 s). Hand sum (computed):
    //   sum_i f_i X / MPE = X / MPE with sum f_i = 1 (spectrum.hpp), X = 1 W / (pi (10 mm)^2 / 4) = 12 732 W/m2,
    //   12 732 / 25.46 = 500.1 -> OD_req = log10(500.1) = 2.699 -> displayed 2.7
    const model::Spectrum band = accepted(model::gaussianBand(550_nm, 20_nm));
    REQUIRE(band.samples.size() > 1);
    double shares = 0.0;
    for (const model::SpectralSample& s : band.samples)
        shares += s.powerFraction;
    CHECK(shares == Approx(1.0).epsilon(1e-9)); // spectrum.hpp: the samples add up to 1
    const HazardResult r = evaluated(oneWatt(band));
    REQUIRE(r.lines.size() == band.samples.size());
    for (const hazard::LineResult& line : r.lines)
        CHECK(line.limit == Approx(kVisibleMpe).epsilon(1e-3)); // check-values.md P10 (tolerance 1e-3)
    checkBandsAndSum(r);
    CHECK(r.exposureAtPoint == Approx(12732.0).epsilon(1e-3)); // computed above; tolerance 1e-3
    CHECK(r.combinedRatio == Approx(500.1).epsilon(1e-3));     // computed above; tolerance 1e-3
    CHECK(r.requiredOd == Approx(2.699).epsilon(1e-3));        // computed above; tolerance 1e-3
    CHECK(r.displayedOd == Approx(2.7).margin(1e-9));          // computed above; exact
}

TEST_CASE("hazard spectrum: two visible lines add their ratios", "[hazard][spectrum]")
{
    // 488 nm with 0.3 of the power and 632.8 nm with 0.7, both 25.46 W/m2 at 0.25 s. Hand sum (computed):
    //   0.3 x 12 732 / 25.46 + 0.7 x 12 732 / 25.46 = 150.03 + 350.07 = 500.1 -> OD_req 2.699
    const model::Spectrum two = accepted(model::lines({model::SpectralSample{488_nm, 0.3, units::Wavelength{}},
                                                       model::SpectralSample{632.8_nm, 0.7, units::Wavelength{}}}));
    const HazardResult r = evaluated(oneWatt(two));
    REQUIRE(r.lines.size() == 2);
    CHECK(r.lines[0].ratio == Approx(150.03).epsilon(1e-3)); // computed above; tolerance 1e-3
    CHECK(r.lines[1].ratio == Approx(350.07).epsilon(1e-3)); // computed above; tolerance 1e-3
    CHECK(r.combinedRatio == Approx(500.1).epsilon(1e-3));   // computed above; tolerance 1e-3
    CHECK(r.requiredOd == Approx(2.699).epsilon(1e-3));      // computed above; tolerance 1e-3
    checkBandsAndSum(r);
    // hazard-and-eyewear.md section 1.4: OD is given per line; lines are kept apart
    CHECK(r.bands.size() == 2);
}

TEST_CASE("hazard spectrum: the sum exceeds each line alone", "[hazard][spectrum]")
{
    // the same 1 W split over two additive lines needs more attenuation than either line's own share: with ratios
    // 150.03 and 350.07 (hand sum above), each single-line OD would be log10(ratio) < log10(500.1) (computed)
    const model::Spectrum two = accepted(model::lines({model::SpectralSample{488_nm, 0.3, units::Wavelength{}},
                                                       model::SpectralSample{632.8_nm, 0.7, units::Wavelength{}}}));
    const HazardResult r = evaluated(oneWatt(two));
    for (const hazard::LineResult& line : r.lines)
        CHECK(r.requiredOd > std::log10(line.ratio));
}

TEST_CASE("hazard spectrum: bands of a wide band are never negative", "[hazard][spectrum]")
{
    // a weak, wide near-infrared band: OD_req >= 0 in every band, 0 where the exposure is below the MPE
    // (hazard-and-eyewear.md section 1.1; check-values.md K26)
    for (const double watts : {1e-6, 1e-3, 1.0}) {
        INFO("P = " << watts << " W");
        HazardRequest request = oneWatt(accepted(model::gaussianBand(800_nm, 60_nm)));
        request.emission.averagePower = units::Power::fromSi(watts);
        request.exposureCase.exposure = 10_s;
        const HazardResult r = evaluated(request);
        checkBandsAndSum(r);
    }
}
