// An MpeMemo only saves work: with it, evaluateMpe must give the very same results as without (mpememo.hpp).
// Source: computed (a property of the memo, no published figure is involved).
#include <catch2/catch.hpp>

#include "beamwarden/limits/mpememo.hpp"
#include "beamwarden/units.hpp"

using namespace beamwarden;
using namespace beamwarden::limits;

namespace {

MpeRequest femtosecondTrain(double lambda_nm, double alpha_rad)
{
    MpeRequest request;
    request.wavelength = units::Wavelength::fromSi(lambda_nm * 1e-9);
    request.duration = units::Duration::fromSi(35e-15);
    request.train = PulseTrain{units::Frequency::fromSi(1e3), units::Duration::fromSi(100.0), {}};
    request.sourceAngle = units::Angle::fromSi(alpha_rad);
    return request;
}

} // namespace

TEST_CASE("A remembered MPE is the same as a fresh one, and a pause bypasses the memo", "[limits][memo]")
{
    const MpeRequest a = femtosecondTrain(800.0, 0.0);
    const MpeRequest b = femtosecondTrain(800.0, 0.02); // differs only in the source angle
    const auto freshA = evaluateMpe(a);
    const auto freshB = evaluateMpe(b);
    REQUIRE(freshA.has_value());
    REQUIRE(freshB.has_value());
    REQUIRE(MpeMemo::active() == nullptr);
    {
        const MpeMemo memo;
        REQUIRE(MpeMemo::active() == &memo);
        const auto first = evaluateMpe(a);
        const auto again = evaluateMpe(a);
        const auto other = evaluateMpe(b);
        CHECK(memo.size() == 2);
        CHECK(memo.hits() == 1);
        REQUIRE(again.has_value());
        REQUIRE(other.has_value());
        // Bit for bit: every set's figures and the terms they rest on.
        REQUIRE(again->setCount == freshA->setCount);
        for (std::size_t i = 0; i < freshA->setCount; ++i) {
            const SetOutcome& x = again->sets[i];
            const SetOutcome& y = freshA->sets[i];
            CHECK(x.limit.si() == y.limit.si());
            CHECK(x.weakestStatus == y.weakestStatus);
            REQUIRE(x.single.count == y.single.count);
            for (std::size_t t = 0; t < y.single.count; ++t) {
                CHECK(x.single.terms[t].row == y.single.terms[t].row);
                CHECK(x.single.terms[t].wholeSource.si() == y.single.terms[t].wholeSource.si());
            }
            REQUIRE(x.train.has_value() == y.train.has_value());
            CHECK(x.train->perPulse.si() == y.train->perPulse.si());
            CHECK(x.train->governingRule == y.train->governingRule);
        }
        CHECK(again->perPulse().si() == freshA->perPulse().si());
        CHECK(other->perPulse().si() == freshB->perPulse().si());
        CHECK(other->perPulse().si() != again->perPulse().si()); // the extended source was not answered from memory
        {
            const MpeMemo::Pause pause;
            CHECK(MpeMemo::active() == nullptr);
            const auto paused = evaluateMpe(femtosecondTrain(810.0, 0.0));
            REQUIRE(paused.has_value());
        }
        CHECK(MpeMemo::active() == &memo);
        CHECK(memo.size() == 2); // nothing remembered during the pause
        // A refusal is remembered as a refusal.
        MpeRequest bad = a;
        bad.wavelength = units::Wavelength::fromSi(100e-9);
        CHECK_FALSE(evaluateMpe(bad).has_value());
        CHECK_FALSE(evaluateMpe(bad).has_value());
        CHECK(memo.hits() == 2);
    }
    CHECK(MpeMemo::active() == nullptr);
}
