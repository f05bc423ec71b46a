// The single-quantity ranges of a record (model/ranges.hpp) and the exact quoting of refused values (issue 10): the
// ends are inclusive or exclusive as the words say, NaN and infinities are refused, the refusal quotes every digit
// of the value, and no real laboratory source is refused.
#include <catch2/catch.hpp>

#include "beamwarden/model/emission.hpp"
#include "beamwarden/model/ranges.hpp"
#include "beamwarden/units.hpp"

#include <cmath>
#include <limits>
#include <string>

using namespace beamwarden;
using namespace beamwarden::units::literals;
using model::Quantity;

namespace {

bool accepted(Quantity quantity, double si)
{
    return model::checkRange(quantity, si, "field").has_value();
}

std::string refusedValue(Quantity quantity, double si)
{
    auto checked = model::checkRange(quantity, si, "field");
    REQUIRE_FALSE(checked.has_value());
    CHECK(checked.error().field == "field");
    return checked.error().value;
}

} // namespace

TEST_CASE("ranges: each end is where the words put it", "[model][ranges]")
{
    // ranges.hpp: power above 0, at most 1 GW
    CHECK_FALSE(accepted(Quantity::AveragePower, 0.0));
    CHECK(accepted(Quantity::AveragePower, 1e-15));
    CHECK(accepted(Quantity::AveragePower, 1e9));
    CHECK_FALSE(accepted(Quantity::AveragePower, std::nextafter(1e9, 2e9)));
    // the rule sets' span, both ends included (IEC 60825-1: 180 nm to 1 mm)
    CHECK(accepted(Quantity::Wavelength, 180e-9));
    CHECK(accepted(Quantity::Wavelength, 1e-3));
    CHECK_FALSE(accepted(Quantity::Wavelength, std::nextafter(180e-9, 0.0)));
    CHECK_FALSE(accepted(Quantity::Wavelength, std::nextafter(1e-3, 1.0)));
    // exposure: above 0, at most the tables' 30000 s (IEC 60825-1 Table A.1 ends at 3e4 s)
    CHECK_FALSE(accepted(Quantity::Exposure, 0.0));
    CHECK(accepted(Quantity::Exposure, 3e4));
    CHECK_FALSE(accepted(Quantity::Exposure, 30001.0));
    // divergence and distance start at 0 inclusive (collimated; at the exit)
    CHECK(accepted(Quantity::Divergence, 0.0));
    CHECK(accepted(Quantity::Distance, 0.0));
    CHECK_FALSE(accepted(Quantity::Distance, -1e-9));
    for (const Quantity q :
         {Quantity::Wavelength, Quantity::AveragePower, Quantity::PulseEnergy, Quantity::PulseDuration, Quantity::Prf,
          Quantity::BeamDiameter, Quantity::Divergence, Quantity::Exposure, Quantity::Distance}) {
        CHECK_FALSE(accepted(q, std::numeric_limits<double>::quiet_NaN()));
        CHECK_FALSE(accepted(q, std::numeric_limits<double>::infinity()));
        CHECK_FALSE(accepted(q, -std::numeric_limits<double>::infinity()));
        CHECK_FALSE(model::allowedRange(q).empty());
    }
}

TEST_CASE("ranges: a refusal quotes the value with every digit it has", "[model][ranges][format]")
{
    // a rounded quote ("1 mm", "30000 s") would read as inside the range the message names
    CHECK(refusedValue(Quantity::Wavelength, 1.0001e-3) == "1.0001 mm");
    CHECK(refusedValue(Quantity::Exposure, 30001.0) == "30001 s");
    CHECK(refusedValue(Quantity::AveragePower, 1.0000001e9) == "1.0000001 GW");
    // computed: 0.1 + 0.2 is the double 0.30000000000000004, which needs 17 digits to read back
    CHECK(units::exactDigits(0.1 + 0.2) == 17);
    CHECK(units::exactDigits(0.3) == 1);
    CHECK(units::formatExact(units::Duration::fromSi(30000.5)) == "30000.5 s");
    const auto back = units::parseWavelength(units::formatExact(units::Wavelength::fromSi(1.0001e-3)));
    REQUIRE(back.has_value());
    CHECK(back->si() == 1.0001e-3); // exact: the quote reads back as the same double
}

TEST_CASE("ranges: real sources pass, slips do not", "[model][ranges][emission]")
{
    // from memory: petawatt-class amplifiers give about 30 J in 25 fs (peak ~1.2e15 W) at about 1 Hz
    model::Emission pw;
    pw.spectrum = model::singleLine(800_nm);
    pw.pulsed = true;
    pw.pulseEnergy = units::Energy::fromSi(30.0);
    pw.pulseDuration = units::Duration::fromSi(25e-15);
    pw.prf = units::Frequency::fromSi(1.0);
    auto done = model::completeAndValidate(pw);
    INFO((done ? std::string("accepted") : done.error().message()));
    REQUIRE(done.has_value());
    CHECK(done->averagePower.si() == Approx(30.0).epsilon(1e-12)); // computed: 30 J x 1 Hz

    // from memory: a 100 kW industrial fibre laser, CW
    model::Emission cw;
    cw.spectrum = model::singleLine(1070_nm);
    cw.averagePower = units::Power::fromSi(1e5);
    CHECK(model::completeAndValidate(cw).has_value());

    cw.averagePower = units::Power::fromSi(1e300);
    auto absurd = model::completeAndValidate(cw);
    REQUIRE_FALSE(absurd.has_value());
    CHECK(absurd.error().field == "power");
    CHECK(absurd.error().value == "1e300 W");
    CHECK(absurd.error().allowed == "a power above 0 W and at most 1 GW");

    // 1 J in 1e-30 s would be a peak of 1e30 W (computed), beyond kMaxPeakPower_W
    pw.pulseEnergy = units::Energy::fromSi(1.0);
    pw.pulseDuration = units::Duration::fromSi(1e-30);
    auto peak = model::completeAndValidate(pw);
    REQUIRE_FALSE(peak.has_value());
    CHECK(peak.error().field == "duration");

    // a mean power whose pulse energy at the rate would exceed 1e8 J: 1 GW at 1 mHz is 1e12 J per pulse (computed)
    model::Emission slow;
    slow.spectrum = model::singleLine(1064_nm);
    slow.pulsed = true;
    slow.averagePower = units::Power::fromSi(1e9);
    slow.pulseDuration = units::Duration::fromSi(1e-8);
    slow.prf = units::Frequency::fromSi(1e-3);
    auto slowed = model::completeAndValidate(slow);
    REQUIRE_FALSE(slowed.has_value());
    CHECK(slowed.error().field == "power");
}
