// The leanest eyewear for a laser (selection.hpp): a single item that covers every output, best visible
// transmittance first; pairs only when no single item covers; purchase markings when nothing on the shelf does.
// The laser has two CW outputs (requirements through requirementsFor):
//   "fundamental": 1064 nm, 100 mW, d63 = 2 mm, 10 s (check-values.md C34 set-up: OD_req 1.716; E = 3.183e4 W/m2
//                  -> D LB4 by hazard-and-eyewear.md §6.2, our arithmetic)
//   "green":       532 nm, 50 mW, d63 = 2 mm (E = 0.05 / (pi (1 mm)^2) = 1.592e4 W/m2 -> D LB4, our arithmetic)
// An item marked D LB5 at a line promises OD >= 5 and withstands LB4, so it covers that line's output.
#include <catch2/catch.hpp>

#include <algorithm>
#include <string>
#include <vector>

#include "beamwarden/eyewear/selection.hpp"
#include "beamwarden/units.hpp"

using namespace beamwarden;
using namespace beamwarden::eyewear;
using namespace beamwarden::units::literals;

namespace {

model::Output cwOutput(const std::string& name, units::Wavelength wavelength, units::Power power,
                       units::Duration exposure)
{
    model::Output output;
    output.name = name;
    output.emission.spectrum = model::singleLine(wavelength);
    output.emission.averagePower = power;
    output.beam.diameter = 2_mm;
    output.beam.divergence = units::Angle::fromSi(0.0);
    model::NamedExposureCase exposureCase;
    exposureCase.name = "intrabeam at the exit";
    exposureCase.exposureCase.exposure = exposure;
    output.exposureCases.push_back(exposureCase);
    return output;
}

std::vector<OutputRequirement> laserOutputs()
{
    model::Laser laser;
    laser.name = "two-colour test laser";
    laser.outputs.push_back(cwOutput("fundamental", 1064_nm, 100_mW, 10_s));
    laser.outputs.push_back(cwOutput("green", 532_nm, 50_mW, units::Duration{}));
    const auto result = requirementsFor(laser, limits::RuleChoice::Strictest, limits::C5Option::Conservative);
    INFO((result ? std::string{"accepted"} : result.error().message()));
    REQUIRE(result.has_value());
    REQUIRE(result->size() == 2);
    return *result;
}

ParsedEyewear item(const std::string& name, std::vector<std::string> en207, double transmittance)
{
    model::EyewearItem raw;
    raw.name = name;
    raw.en207Markings = std::move(en207);
    raw.visibleTransmittance = transmittance;
    const auto parsed = parseEyewear(raw);
    INFO((parsed ? std::string{"accepted"} : parsed.error().message()));
    REQUIRE(parsed.has_value());
    return *parsed;
}

// An entry names the output (it may add the exposure case, e.g. "green (intrabeam at the exit)").
bool contains(const std::vector<std::string>& names, const std::string& name)
{
    return std::any_of(names.begin(), names.end(),
                       [&](const std::string& entry) { return entry.find(name) != std::string::npos; });
}

} // namespace

TEST_CASE("eyewear selection: the laser's requirements", "[eyewear][selection]")
{
    const std::vector<OutputRequirement> outputs = laserOutputs();
    CHECK(outputs[0].outputName == "fundamental");
    CHECK(outputs[1].outputName == "green");
    // check-values.md C34: OD_req 1.716 (computed from verified formulas; relative 1e-3)
    CHECK(outputs[0].hazard.requiredOd == Approx(1.716).epsilon(1e-3));
    // hazard-and-eyewear.md §6.2 inverse, our arithmetic (see the file comment): D LB4 for both (exact)
    REQUIRE(outputs[0].levels.size() == 1);
    REQUIRE(outputs[1].levels.size() == 1);
    CHECK(outputs[0].levels[0].levelFor(Mode::D) == 4);
    CHECK(outputs[1].levels[0].levelFor(Mode::D) == 4);
}

TEST_CASE("eyewear selection: one item covers every output and is picked", "[eyewear][selection]")
{
    const std::vector<ParsedEyewear> shelf = {item("IR goggle", {"1064 D LB5"}, 0.6),
                                              item("green goggle", {"532 D LB5"}, 0.5),
                                              item("two-line goggle", {"532/1064 D LB5"}, 0.3)};
    const Selection s = leanestEyewear(shelf, laserOutputs());
    REQUIRE(s.checks.size() == 3);
    CHECK(s.checks[2].verdict == Verdict::Covers);
    CHECK(s.checks[0].verdict == Verdict::FallsShort); // no rating at 532 nm
    CHECK(s.checks[1].verdict == Verdict::FallsShort); // no rating at 1064 nm
    REQUIRE(s.singles.size() == 1);
    CHECK(s.singles[0].items == std::vector<std::size_t>{2});
    CHECK(s.singles[0].visibleTransmittance == Approx(0.3).epsilon(1e-12));
    REQUIRE(s.singles[0].outputsCovered.size() == 1);
    CHECK(contains(s.singles[0].outputsCovered[0], "fundamental"));
    CHECK(contains(s.singles[0].outputsCovered[0], "green"));
    // pairs only when no single item covers (selection.hpp)
    CHECK(s.pairs.empty());
    CHECK(s.purchaseMarkings.empty());
}

TEST_CASE("eyewear selection: best visible transmittance first", "[eyewear][selection]")
{
    const std::vector<ParsedEyewear> shelf = {item("dark", {"532/1064 D LB5"}, 0.2),
                                              item("IR only", {"1064 D LB5"}, 0.9),
                                              item("clear", {"532/1064 D LB6"}, 0.5)};
    const Selection s = leanestEyewear(shelf, laserOutputs());
    REQUIRE(s.singles.size() == 2);
    CHECK(s.singles[0].items == std::vector<std::size_t>{2});
    CHECK(s.singles[1].items == std::vector<std::size_t>{0});
    CHECK(s.singles[0].visibleTransmittance >= s.singles[1].visibleTransmittance);
}

TEST_CASE("eyewear selection: two items that only cover together make a pair", "[eyewear][selection]")
{
    const std::vector<ParsedEyewear> shelf = {item("IR goggle", {"1064 D LB5"}, 0.6),
                                              item("green goggle", {"532 D LB5"}, 0.5),
                                              item("CO2 goggle", {"10600 D LB5"}, 0.9)};
    const Selection s = leanestEyewear(shelf, laserOutputs());
    CHECK(s.singles.empty());
    REQUIRE(s.pairs.size() == 1);
    std::vector<std::size_t> pair = s.pairs[0].items;
    std::sort(pair.begin(), pair.end());
    CHECK(pair == std::vector<std::size_t>{0, 1});
    // selection.hpp: the lower of the pair's transmittances
    CHECK(s.pairs[0].visibleTransmittance == Approx(0.5).epsilon(1e-12));
    // per item, the outputs it covers
    REQUIRE(s.pairs[0].outputsCovered.size() == 2);
    for (std::size_t k = 0; k < 2; ++k) {
        const std::string expected = s.pairs[0].items[k] == 0 ? "fundamental" : "green";
        CHECK(contains(s.pairs[0].outputsCovered[k], expected));
    }
    CHECK(s.purchaseMarkings.empty());
}

TEST_CASE("eyewear selection: nothing covers, the purchase markings are given", "[eyewear][selection]")
{
    const std::vector<ParsedEyewear> shelf = {item("CO2 goggle", {"10600 D LB5"}, 0.9),
                                              item("weak IR goggle", {"1064 D LB2"}, 0.8)};
    const Selection s = leanestEyewear(shelf, laserOutputs());
    CHECK(s.singles.empty());
    CHECK(s.pairs.empty());
    // selection.hpp: one line per output
    REQUIRE(s.purchaseMarkings.size() == 2);
    bool mentions1064 = false;
    bool mentions532 = false;
    for (const std::string& line : s.purchaseMarkings) {
        INFO(line);
        // D LB4 is required at each line (file comment)
        CHECK(line.find("LB4") != std::string::npos);
        mentions1064 = mentions1064 || line.find("1064") != std::string::npos;
        mentions532 = mentions532 || line.find("532") != std::string::npos;
    }
    CHECK(mentions1064);
    CHECK(mentions532);
}

TEST_CASE("eyewear selection: a large shelf lists the ten brightest pairs and counts the rest", "[eyewear][selection]")
{
    // 12 IR goggles x 12 green goggles: 144 pairs cover together (selection.cpp keeps kMaxPairs = 10).
    std::vector<ParsedEyewear> shelf;
    for (int i = 0; i < 12; ++i) {
        shelf.push_back(item("IR goggle " + std::to_string(i), {"1064 D LB5"}, 0.30 + 0.01 * i));
        shelf.push_back(item("green goggle " + std::to_string(i), {"532 D LB5"}, 0.50 + 0.01 * i));
    }
    const Selection s = leanestEyewear(shelf, laserOutputs());
    CHECK(s.singles.empty());
    REQUIRE(s.pairs.size() == 10);
    // The brightest pair is limited by the brightest IR goggle (0.41), and the list runs brightest first.
    CHECK(s.pairs.front().visibleTransmittance == Approx(0.41).epsilon(1e-12));
    for (std::size_t k = 1; k < s.pairs.size(); ++k)
        CHECK(s.pairs[k - 1].visibleTransmittance >= s.pairs[k].visibleTransmittance);
    // Every listed pair is one IR and one green goggle.
    for (const Choice& pair : s.pairs) {
        REQUIRE(pair.items.size() == 2);
        CHECK(shelf[pair.items[0]].item.name.substr(0, 2) != shelf[pair.items[1]].item.name.substr(0, 2));
    }
    REQUIRE_FALSE(s.notes.empty());
    CHECK(s.notes.back().find("144 pairs") != std::string::npos);
}
