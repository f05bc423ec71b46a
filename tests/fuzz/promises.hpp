#pragma once
// What each text input promises beyond "does not crash", written once so that the libFuzzer targets in tests/fuzz
// and the seed replay in tests/core/regression_fuzz_test.cpp check the same things. Each function feeds one input
// to one parser and returns the broken promise in words, or an empty string when every promise held. A refusal is
// never a broken promise: refusing is what a parser should do with most fuzzed bytes.
#include "beamwarden/eyewear/en208.hpp"
#include "beamwarden/eyewear/marking.hpp"
#include "beamwarden/eyewear/odtable.hpp"
#include "beamwarden/hazard/hazard.hpp"
#include "beamwarden/store/eyewearcsv.hpp"
#include "beamwarden/store/labexport.hpp"
#include "beamwarden/units.hpp"

#include <cmath>
#include <cstdint>
#include <span>
#include <string>
#include <string_view>

namespace fuzzpromise {

namespace detail {

// An accepted quantity is finite and not negative (units.hpp: "a non-negative decimal number"), and what format()
// prints for it parses back (units.hpp: "The output always parses back with the matching parse*()"), near the value
// to the printed precision: half a unit in the last printed digit, relative (computed from the rounding rule).
template <typename Q>
std::string quantity(std::string_view text, beamwarden::Result<Q> (*parse)(std::string_view, std::string_view))
{
    const auto value = parse(text, "field");
    if (!value)
        return {};
    const double si = value->si();
    if (!std::isfinite(si) || si < 0.0)
        return "accepted a value that is not finite or is negative";
    for (const int digits : {1, 4, 17}) {
        const std::string printed = beamwarden::units::format(*value, digits);
        const auto back = parse(printed, "field");
        if (!back)
            return "format(" + std::to_string(digits) + ") printed '" + printed +
                   "', which parse refuses: " + back.error().message();
        const double tolerance = (digits == 17 ? 1e-14 : 0.51 * std::pow(10.0, 1 - digits)) * si;
        if (!(std::abs(back->si() - si) <= tolerance))
            return "format(" + std::to_string(digits) + ") printed '" + printed +
                   "', which reads back as a different value";
    }
    return {};
}

} // namespace detail

// The first byte picks the quantity, the rest is the text: the digits '0' to '9' pick wavelength, duration, energy,
// power, radiant exposure, irradiance, angle, frequency, length and area, so a seed file reads "3 20 W" for 20 W.
inline std::string units(std::span<const std::uint8_t> bytes)
{
    using namespace beamwarden::units;
    if (bytes.empty())
        return {};
    const std::string_view text(reinterpret_cast<const char*>(bytes.data()) + 1, bytes.size() - 1);
    switch ((bytes.front() + 2U) % 10U) { // '0' is 48
    case 0:
        return detail::quantity<Wavelength>(text, parseWavelength);
    case 1:
        return detail::quantity<Duration>(text, parseDuration);
    case 2:
        return detail::quantity<Energy>(text, parseEnergy);
    case 3:
        return detail::quantity<Power>(text, parsePower);
    case 4:
        return detail::quantity<RadiantExposure>(text, parseRadiantExposure);
    case 5:
        return detail::quantity<Irradiance>(text, parseIrradiance);
    case 6:
        return detail::quantity<Angle>(text, parseAngle);
    case 7:
        return detail::quantity<Frequency>(text, parseFrequency);
    case 8:
        return detail::quantity<Length>(text, parseLength);
    default:
        return detail::quantity<Area>(text, parseArea);
    }
}

// marking.hpp: format() "parses back to the same content". Wavelengths print as the shortest decimal that reads back
// as the same double, so the content compared is the terms' modes, levels, Y flags and wavelength spans exactly, and
// printing the re-read marking gives the same text.
inline std::string en207(std::string_view text)
{
    using namespace beamwarden::eyewear;
    const auto marking = parseEn207(text);
    if (!marking)
        return {};
    const std::string printed = format(*marking);
    const auto back = parseEn207(printed);
    if (!back)
        return "format() printed '" + printed + "', which parseEn207 refuses: " + back.error().message();
    if (back->terms.size() != marking->terms.size())
        return "format() printed '" + printed + "', which reads back with another number of terms";
    for (std::size_t i = 0; i < marking->terms.size(); ++i) {
        const MarkingTerm& a = marking->terms[i];
        const MarkingTerm& b = back->terms[i];
        if (a.modes != b.modes || a.level != b.level || a.notTestedAtLowRates != b.notTestedAtLowRates ||
            a.wavelengths.size() != b.wavelengths.size())
            return "format() printed '" + printed + "', which reads back as another marking";
        for (std::size_t k = 0; k < a.wavelengths.size(); ++k) {
            if (a.wavelengths[k].from_nm != b.wavelengths[k].from_nm ||
                a.wavelengths[k].to_nm != b.wavelengths[k].to_nm)
                return "format() printed '" + printed + "', which reads back with other wavelengths";
        }
    }
    if (format(*back) != printed)
        return "format() of the re-read marking differs: '" + printed + "' then '" + format(*back) + "'";
    return {};
}

// en208.hpp gives format() beside parseEn208(); what it prints must read back, and print the same again.
inline std::string en208(std::string_view text)
{
    using namespace beamwarden::eyewear;
    const auto marking = parseEn208(text);
    if (!marking)
        return {};
    if (marking->level < 1 || marking->level > 5 || marking->wavelengths.empty())
        return "accepted a marking without a level RB1 to RB5 or without a wavelength";
    const std::string printed = format(*marking);
    const auto back = parseEn208(printed);
    if (!back)
        return "format() printed '" + printed + "', which parseEn208 refuses: " + back.error().message();
    if (back->level != marking->level || back->wavelengths.size() != marking->wavelengths.size())
        return "format() printed '" + printed + "', which reads back as another marking";
    if (format(*back) != printed)
        return "format() of the re-read marking differs: '" + printed + "' then '" + format(*back) + "'";
    return {};
}

// odtable.cpp accepts 180 nm to 1 mm and OD 0 to 20 (its own refusal text); formatOdTable() writes "the same form".
inline std::string odTable(std::string_view text)
{
    using namespace beamwarden::eyewear;
    const auto rows = parseOdTable(text, "fuzz");
    if (!rows)
        return {};
    for (const beamwarden::model::OdRow& row : *rows) {
        const double from = row.from.nanometres();
        const double to = row.to.nanometres();
        if (!(from >= 180.0 * (1 - 1e-12) && to <= 1e6 * (1 + 1e-12) && from <= to && row.od >= 0.0 && row.od <= 20.0))
            return "accepted a row outside 180 nm to 1 mm or OD 0 to 20";
    }
    const std::string printed = formatOdTable(*rows);
    const auto back = parseOdTable(printed, "fuzz");
    if (!back)
        return "formatOdTable() printed '" + printed + "', which parseOdTable refuses: " + back.error().message();
    if (back->size() != rows->size())
        return "formatOdTable() printed '" + printed + "', which reads back with another number of rows";
    return {};
}

// labexport.hpp: "Export -> import -> export gives the same bytes".
inline std::string labExport(std::string_view text)
{
    using namespace beamwarden::store;
    const auto contents = parseLabExport(text);
    if (!contents)
        return {};
    const std::string exported = toLabExport(*contents);
    const auto again = parseLabExport(exported);
    if (!again)
        return "the export of an accepted import is refused: " + again.error().message();
    if (toLabExport(*again) != exported)
        return "export, import, export does not give the same bytes";
    return {};
}

// An item the CSV import accepts is one the lab export can carry and read back unchanged (both hold the same lab's
// records; the export replaces bytes that are not UTF-8, so such text must not get in).
inline std::string eyewearCsv(std::string_view text)
{
    using namespace beamwarden::store;
    const auto items = parseEyewearCsv(text);
    if (!items)
        return {};
    LabContents contents;
    contents.lab.name = "Fuzz lab";
    contents.eyewear = *items;
    for (std::size_t i = 0; i < contents.eyewear.size(); ++i)
        contents.eyewear[i].id = static_cast<beamwarden::model::RecordId>(i + 1);
    const std::string exported = toLabExport(contents);
    const auto back = parseLabExport(exported);
    if (!back)
        return "items the CSV import accepts are refused by the lab export: " + back.error().message();
    if (back->eyewear.size() != items->size())
        return "the lab export of the CSV items reads back with another number of items";
    for (std::size_t i = 0; i < items->size(); ++i) {
        if (back->eyewear[i].name != (*items)[i].name || back->eyewear[i].notes != (*items)[i].notes)
            return "the lab export changes the text of a CSV item (row " + std::to_string(i + 1) + ")";
    }
    return {};
}

// hazard.hpp: no figure of an accepted evaluation may be NaN (an unbounded NOHD is a kind, not a number); the exact
// OD is never negative and the displayed one never below it (check-values.md K26).
inline std::string hazardResult(const beamwarden::hazard::HazardResult& r)
{
    std::string bad;
    const auto number = [&](double value, const char* what) {
        if (bad.empty() && std::isnan(value))
            bad = std::string(what) + " is NaN";
    };
    number(r.basis.duration.si(), "the exposure basis");
    for (const beamwarden::hazard::LineResult& line : r.lines) {
        number(line.exposure, "a line's exposure");
        number(line.limit, "a line's MPE");
        number(line.ratio, "a line's exposure/MPE");
        for (const beamwarden::limits::SetOutcome& set : line.mpe.allSets())
            number(set.limit.si(), "a rule set's MPE");
    }
    number(r.exposureAtPoint, "the exposure at the worst point");
    number(r.limit, "the MPE");
    number(r.combinedRatio, "the combined exposure/MPE");
    number(r.requiredOd, "the required OD");
    number(r.displayedOd, "the displayed OD");
    for (const beamwarden::hazard::RuleOd& rule : r.perRule) {
        number(rule.od, "a pulse rule's OD");
        number(rule.perPulseLimit, "a pulse rule's per-pulse MPE");
    }
    for (const beamwarden::hazard::BandOd& band : r.bands) {
        number(band.ratio, "a band's exposure/MPE");
        number(band.requiredOd, "a band's OD");
    }
    number(r.nohd.value.si(), "the NOHD");
    number(r.nohd.linear.si(), "the linear NOHD");
    number(r.nohd.quadrature.si(), "the quadrature NOHD");
    number(r.nohd.smallSource.si(), "the small-source NOHD");
    number(r.pointDistance.si(), "the worst point's distance");
    number(r.sourceAngleAtPoint.si(), "the source angle at the worst point");
    number(r.aperture.si(), "the aperture");
    if (!bad.empty())
        return bad;
    if (r.requiredOd < 0.0 || r.displayedOd < r.requiredOd)
        return "the required OD is negative or displayed below its exact value";
    return {};
}

} // namespace fuzzpromise
