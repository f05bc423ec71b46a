// Bursts: groups of pulses at a high rate repeated at a lower rate (exposure-limits.md section 6.1 item 4, burst
// counting reconstructed). Hand calculations from the formulas of sections 3.1, 3.5, 4.1 and 4.6 are written out
// beside each check ("computed"); tolerance relative 1e-6 (the same arithmetic, no rounding).
#include "beamwarden/limits/mpe.hpp"

#include <catch2/catch.hpp>

#include <cmath>

using namespace beamwarden::limits;
using namespace beamwarden::units;

namespace {

// 1064 nm, 10 ns pulses at 1 MHz in bursts of 5, bursts at 10 Hz, 10 s exposure, small source.
MpeRequest burstTrain(RuleChoice rules)
{
    MpeRequest request;
    request.wavelength = Wavelength::fromSi(1064e-9);
    request.duration = Duration::fromSi(10e-9);
    request.train = PulseTrain{Frequency::fromSi(1e6), Duration::fromSi(10.0), Burst{5, Frequency::fromSi(10.0)}};
    request.rules = rules;
    return request;
}

} // namespace

TEST_CASE("A burst train under IEC 60825-1:2007 groups each burst within Ti", "[limits][burst]")
{
    const auto result = evaluateMpe(burstTrain(RuleChoice::Iec60825_1_2007));
    REQUIRE(result.has_value());
    const TrainOutcome& train = *result->governing().train;
    // computed: Ti = 50 us (2007, 1050-1400 nm, verified L1); the burst lasts 4/1 MHz + 10 ns = 4.01 us < Ti, so a
    // burst is one group of 5 pulses.
    CHECK(train.ti.seconds() == Approx(50e-6).epsilon(1e-9));
    // Rule 1: MPE(10 ns) = 5e-2 J/m^2 per pulse; the group: MPE(50 us) = 5e-2 (lower adjoining row at the
    // breakpoint, 90 (5e-5)^0.75 = 5.351e-2 above) / 5 = 1e-2 J/m^2.
    CHECK(train.singlePulse.perPulse.si() == Approx(1e-2).epsilon(1e-6));
    CHECK(train.singlePulse.groupSize == Approx(5.0));
    // Rule 2: over one burst MPE(4.01 us) / 5 = 5e-2 / 5 = 1e-2; over 10 s: 500 J/m^2 (10 C4 C7 W/m^2 x 10 s) over
    // 5 x 100 pulses = 1 J/m^2. The burst governs.
    CHECK(train.average.perPulse.si() == Approx(1e-2).epsilon(1e-6));
    CHECK(train.average.overBurst);
    CHECK(train.pulsesInExposure == Approx(500.0));
    // Rule 3: N = 100 bursts in min(T, T2 = 10 s), each counted once; C5 = 100^-0.25; MPE(Ti)/5 = 1e-2.
    const double expected = 1e-2 * std::pow(100.0, -0.25);
    CHECK(train.repeated.pulsesCounted == Approx(100.0));
    CHECK(train.repeated.perPulse.si() == Approx(expected).epsilon(1e-6));
    CHECK(train.governingRule == PulseRule::PulseTrain);
    CHECK(result->perPulse().si() == Approx(expected).epsilon(1e-6));
}

TEST_CASE("A burst train under strictest: the 2014 Ti of 13 us governs", "[limits][burst]")
{
    const auto result = evaluateMpe(burstTrain(RuleChoice::Strictest));
    REQUIRE(result.has_value());
    // computed: 2014 (reconstructed rows): Ti = 13 us; group MPE(13 us) = 90 (1.3e-5)^0.75 = 1.950e-2 (the lower
    // adjoining row; 2e-2 below) over 5 pulses; C5 = 100^-0.25 (conservative); 1.233e-3 J/m^2 per pulse, below
    // the 2007 figure 1e-2 x 100^-0.25 = 3.162e-3.
    const double expected2014 = 90.0 * std::pow(1.3e-5, 0.75) / 5.0 * std::pow(100.0, -0.25);
    CHECK(result->governing().set == RuleSetId::Iec60825_1_2014);
    CHECK(result->perPulse().si() == Approx(expected2014).epsilon(1e-6));
    CHECK(result->restsOnReconstructedRow());
}

TEST_CASE("Bursts that overlap the next burst are refused", "[limits][burst]")
{
    MpeRequest request = burstTrain(RuleChoice::Strictest);
    request.train->burst = Burst{2'000'000, Frequency::fromSi(10.0)}; // 2 s of pulses every 0.1 s: impossible
    const auto result = evaluateMpe(request);
    REQUIRE_FALSE(result.has_value());
    CHECK(result.error().field == "burst-count");
}
