#pragma once
// A rule set as data: the MPE rows of one edition and the few pulse-train rules in which editions differ.
// The evaluator (mpe.hpp) has no edition-specific control flow beyond these fields.
#include "beamwarden/limits/types.hpp"

#include <cstdint>
#include <span>
#include <string_view>

namespace beamwarden::limits {

// Bit set of the wavelength-dependent factors that multiply a row (C5 is never a row factor: it belongs to rule 3).
enum FactorBit : std::uint8_t {
    kNoFactor = 0,
    kC2 = 1U << 0U,
    kC3 = 1U << 1U,
    kC4 = 1U << 2U,
    kC6 = 1U << 3U,
    kC7 = 1U << 4U,
    kC1 = 1U << 5U, // the row's formula is C1 = 5.6e3 t^0.25 (already in coefficient and exponent): report its value
    kT1 = 1U << 6U, // report the UV T1 of 302.5-315 nm, where C1 governs up to T1 and C2 beyond
};

// One row of an MPE table: a wavelength band x a duration band -> a limit. Bands are closed at both ends; where two
// rows meet, both apply and the lower governs (the breakpoint convention of exposure-limits.md section 0.2).
struct LimitRow {
    std::string_view id; // stable, e.g. "2007.eye.400-700.ns-18us"
    Target target;
    Effect effect;
    double lambdaFrom_nm;
    double lambdaTo_nm;
    double durationFrom_s;
    double durationTo_s;
    SourceSize source;
    FormulaKind kind;
    double coefficient; // k, in J/m^2 (H kinds) or W/m^2 (E kind)
    double exponent;    // p of the power laws, 0 otherwise
    std::uint8_t factors;
    RowStatus status;
    std::string_view formula; // as printed for a person, e.g. "H = 18 t^0.75 C6 J/m^2"
    std::string_view source_; // where the value comes from, e.g. "IEC 60825-1:2007 Table A.1 (verified, BGI 832)"
};

// Pulses closer together than Ti are grouped (exposure-limits.md section 2.3).
struct TiRow {
    double lambdaFrom_nm;
    double lambdaTo_nm;
    double ti_s;
    RowStatus status;
};

enum class AlphaMaxRule : std::uint8_t { Constant100mrad, TimeDependent2014 };
enum class C7Rule : std::uint8_t { Iec2007, Iec2014 };
// Which limits rule 3 (repeated pulses) reduces.
enum class Rule3Scope : std::uint8_t { EyeThermal400nmTo1mm, RetinalThermal400To1400nm };
// When pulses within Ti are grouped.
enum class GroupingRule : std::uint8_t { OnlyPulsesLongerThan1ns, BothReadingsBelow1ns };

struct RuleSet {
    RuleSetId id;
    std::string_view name;  // "iec60825-1:2014"
    std::string_view title; // "IEC 60825-1:2014 (ICNIRP 2013 basis)"
    std::string_view validityNote;
    std::span<const LimitRow> rows;
    std::span<const TiRow> ti;
    AlphaMaxRule alphaMax;
    C7Rule c7;
    Rule3Scope rule3Scope;
    GroupingRule grouping;
    // Above 1400 nm, N for rule 3 is counted over at most this time (0: no separate cap).
    double rule3CountCapAbove1400nm_s;
    // Whether the C5 option (conservative / edition) exists for this set.
    bool hasC5Options;
};

[[nodiscard]] const RuleSet& ruleSet(RuleSetId id);

} // namespace beamwarden::limits
