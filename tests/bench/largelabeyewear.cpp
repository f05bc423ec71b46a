// The large lab's eyewear shelf: filter families for the lab's lasers, each with EN 207 (or EN 208) markings as
// printed and an OD table, mostly "at least" values from the label, some measured; a few old unmarked items.
#include "largelabparts.hpp"

#include <fmt/core.h>

#include <array>
#include <cmath>

namespace beamwarden::bench {

namespace {

struct OdBand {
    double from_nm;
    double to_nm;
    double od;
};

struct Family {
    const char* description;
    std::vector<const char*> en207;
    std::vector<const char*> en208;
    std::vector<OdBand> od;
    int weight;
};

// Markings in the forms EN 207 and EN 208 print; each LB n promises OD >= n over its wavelengths.
const std::vector<Family>& families()
{
    static const std::vector<Family> all = {
        {"absorbing glass, blue-green, for Ti:sapphire", {"740-1100 D LB7 + IR LB8 + M LB8"}, {}, {{740, 1100, 7}}, 14},
        {"absorbing glass, older stock, for Ti:sapphire", {"700-820 D LB5 + IR LB6 + M LB6"}, {}, {{700, 820, 6}}, 4},
        {"polycarbonate with dielectric coating, for doubled Nd:YAG",
         {"190-534 D LB5 + IR LB6", "1040-1100 D LB6 + IR LB7"},
         {},
         {{190, 534, 6}, {1040, 1100, 7}},
         10},
        {"absorbing glass, for Nd:YAG", {"1064 D LB7 + IR LB8"}, {}, {{1030, 1090, 8}}, 8},
        {"UV-absorbing polycarbonate over-glasses", {"190-400 D LB5 + IR LB5 + M LB5"}, {}, {{190, 400, 5}}, 8},
        {"orange polycarbonate, for green beams", {"532 D LB4 + IR LB5"}, {}, {{500, 550, 5}}, 8},
        {"yellow polycarbonate, for violet and blue diodes", {"400-460 D LB4 + IR LB4"}, {}, {{400, 460, 4}}, 6},
        {"blue-green polycarbonate, for red diodes", {"630-690 D LB3 + IR LB4"}, {}, {{620, 700, 4}}, 5},
        {"absorbing glass, for near-infrared diodes", {"780-1000 D LB5 + IR LB5"}, {}, {{780, 1000, 5}}, 8},
        {"dielectric filter, for ytterbium ultrafast lasers",
         {"1020-1070 D LB6 + IR LB7 + M LB7", "515 D LB4 + IR LB5 + M LB5"},
         {},
         {{1000, 1100, 7}, {505, 525, 5}},
         8},
        {"absorbing glass, for erbium and telecom lasers", {"1500-1600 D LB5 + IR LB5"}, {}, {{1400, 1700, 5}}, 4},
        {"grey absorbing glass, for parametric amplifiers",
         {"1100-2600 D LB4 + IR LB5 + M LB5"},
         {},
         {{1100, 2600, 5}},
         5},
        {"clear polycarbonate, for CO2", {"10600 D LB5 + I LB6"}, {}, {{9000, 11000, 6}}, 3},
        {"red-attenuating alignment glasses", {}, {"1 W 2x10^-4 J 632-640 RB3"}, {{630, 645, 3}}, 3},
        {"green-attenuating alignment glasses", {}, {"0.1 W 2x10^-5 J 532 RB2"}, {{525, 540, 2}}, 2},
    };
    return all;
}

const Family& drawFamily(Random& r)
{
    int total = 0;
    for (const Family& f : families())
        total += f.weight;
    int at = r.index(total);
    for (const Family& f : families()) {
        if (at < f.weight)
            return f;
        at -= f.weight;
    }
    return families().front();
}

constexpr std::array kPlaces{"door cabinet", "rack by the door", "drawer under the bench", "wall hooks",
                             "interlock lobby"};

} // namespace

model::EyewearItem makeEyewear(Random& random, int number, const std::vector<model::Room>& rooms)
{
    model::EyewearItem item;
    item.location = fmt::format("{} {}", random.pick(rooms).name,
                                kPlaces.at(static_cast<std::size_t>(random.index(kPlaces.size()))));
    item.count = 1 + random.index(12);
    item.lastInspection =
        fmt::format("{}-{:02}-{:02}", 2019 + random.index(8), 1 + random.index(12), 1 + random.index(28));
    if (random.chance(0.02)) { // found in a drawer, label worn off
        item.name = fmt::format("Goggle {:05}", number);
        item.description = "unlabelled goggle";
        item.notes = "No legible marking; keep out of use until identified.";
        return item;
    }
    const Family& family = drawFamily(random);
    const bool alignment = !family.en208.empty();
    item.name = fmt::format("{} {:05}",
                            alignment            ? "Alignment glasses"
                            : random.chance(0.2) ? "Spectacles"
                                                 : "Goggle",
                            number);
    item.description = family.description;
    for (const char* m : family.en207)
        item.en207Markings.emplace_back(m);
    for (const char* m : family.en208)
        item.en208Markings.emplace_back(m);
    const bool measured = random.chance(0.15); // a test report's values rather than the label's
    for (const OdBand& band : family.od) {
        const double od = measured ? std::round((band.od + random.uniform(0.1, 1.5)) * 10) / 10 : band.od;
        item.spectralOd.push_back(model::OdRow{units::Wavelength::fromSi(band.from_nm * 1e-9),
                                               units::Wavelength::fromSi(band.to_nm * 1e-9), od, !measured});
    }
    item.visibleTransmittance = alignment ? random.uniform(0.2, 0.4) : random.uniform(0.05, 0.75);
    return item;
}

} // namespace beamwarden::bench
