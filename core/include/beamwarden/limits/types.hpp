#pragma once
// The vocabulary of the exposure-limit engine: targets, rule sets, effects, formula kinds and row statuses.
#include "beamwarden/error.hpp"

#include <cstdint>
#include <string_view>

namespace beamwarden::limits {

enum class Target : std::uint8_t { Eye, Skin };

// An implemented rule set (one edition's tables and pulse rules).
enum class RuleSetId : std::uint8_t { Iec60825_1_2007, Iec60825_1_2014 };
inline constexpr int kRuleSetCount = 2;

// What the user chooses: one rule set, or the strictest of all implemented sets (the default).
enum class RuleChoice : std::uint8_t { Strictest, Iec60825_1_2014, Iec60825_1_2007 };

// The 2014 repeated-pulse factor: conservative C5 = N^-0.25 (default) or the candidate edition reading.
enum class C5Option : std::uint8_t { Conservative, Edition };

// How well a row's value is known (exposure-limits.md section 0.1). Ordered from strongest to weakest.
enum class RowStatus : std::uint8_t { Verified, VerifiedEu, Secondary, Computed, Reconstructed };

// The biological effect a limit protects against; limits of different effects are all applied, the lowest governs.
enum class Effect : std::uint8_t {
    UvPhotochemical,      // cornea and lens, 180-400 nm: dose limits
    UvThermal,            // cornea, 302.5-400 nm: the C1 limits
    RetinalThermal,       // 400-1400 nm
    RetinalPhotochemical, // 400-600 nm, t >= 10 s
    CornealThermal,       // 1400 nm - 1 mm
    CornealSkinLimit,     // 2014, 1250-1400 nm: the skin MPE applied as a second eye limit
    SkinLimit,
};

// The form of a row's limit.
enum class FormulaKind : std::uint8_t {
    ConstantH,       // H = k * factors (J/m^2)
    ConstantE,       // E = k * factors (W/m^2), H = E * t
    PowerLawH,       // H = k * t^p * factors
    PowerLawUntilT2, // H = k * min(t, T2)^p * max(1, t / T2) * factors: k t^p up to T2, then constant E
    AreaScaledE,     // E = k / min(A_s, 0.1 m^2), for irradiated skin areas A_s >= 0.01 m^2 (large-area skin limit)
};

// Which apparent sources a row is for.
enum class SourceSize : std::uint8_t { Any, Small, Extended };

// The three pulse-train rules, in the order ties are reported.
enum class PulseRule : std::uint8_t { SinglePulse, AveragePower, PulseTrain };

// Correction factors and times that can appear in a row or a provenance.
enum class Factor : std::uint8_t { C1, C2, C3, C4, C5, C6, C7, T1, T2 };

// Stable identifiers used in JSON and files.
[[nodiscard]] std::string_view toString(Target target);
[[nodiscard]] std::string_view toString(RuleSetId set);
[[nodiscard]] std::string_view toString(RuleChoice choice);
[[nodiscard]] std::string_view toString(C5Option option);
[[nodiscard]] std::string_view toString(RowStatus status);
[[nodiscard]] std::string_view toString(Effect effect);
[[nodiscard]] std::string_view toString(PulseRule rule);
[[nodiscard]] std::string_view toString(Factor factor);

// The inverses of toString for what users type (CLI flags, settings); errors name the field and the choices.
[[nodiscard]] Result<Target> parseTarget(std::string_view text);
[[nodiscard]] Result<RuleChoice> parseRuleChoice(std::string_view text);
[[nodiscard]] Result<C5Option> parseC5Option(std::string_view text);

// Human words for an effect, e.g. "retinal thermal".
[[nodiscard]] std::string_view describe(Effect effect);
// A rule set's full name, e.g. "IEC 60825-1:2014 (ICNIRP 2013 basis)".
[[nodiscard]] std::string_view fullName(RuleSetId set);

} // namespace beamwarden::limits
