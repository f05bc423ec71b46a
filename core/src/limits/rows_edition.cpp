// Retinal thermal rows below 10 s, where the editions differ, and the Ti tables (exposure-limits.md sections 2.3,
// 3.1, 4.1, 4.4). 2014 rows are reconstructed (evidence in exposure-limits.md section 4.9).
#include "rows.hpp"

#include <array>

namespace beamwarden::limits::rows {

namespace {

using enum Target;
using enum Effect;
using enum SourceSize;
using enum FormulaKind;
using enum RowStatus;

constexpr auto kRetinal2007 = std::to_array<LimitRow>({
    {"eye.400-700.sub-10ps", Eye, RetinalThermal, 400, 700, 0, 1e-11, Any, ConstantH, 1.5e-4, 0, kC6, Verified,
     "H = 1.5e-4 C6 J/m^2", "IEC 60825-1:2007 Annex A, eye t < 10 s (verified in L1, BGI 832)"},
    {"eye.400-700.10ps-1ns", Eye, RetinalThermal, 400, 700, 1e-11, 1e-9, Any, PowerLawH, 2.7e4, 0.75, kC6, Verified,
     "H = 2.7e4 t^0.75 C6 J/m^2", "IEC 60825-1:2007 Annex A, eye t < 10 s (verified in L1, BGI 832)"},
    {"eye.400-700.1ns-18us", Eye, RetinalThermal, 400, 700, 1e-9, 1.8e-5, Any, ConstantH, 5e-3, 0, kC6, Verified,
     "H = 5e-3 C6 J/m^2", "IEC 60825-1:2007 Annex A, eye t < 10 s (verified in L1, BGI 832)"},
    {"eye.400-700.18us-10s", Eye, RetinalThermal, 400, 700, 1.8e-5, 10, Any, PowerLawH, 18, 0.75, kC6, Verified,
     "H = 18 t^0.75 C6 J/m^2", "IEC 60825-1:2007 Annex A, eye t < 10 s (verified in L1, BGI 832)"},
    {"eye.700-1050.sub-10ps", Eye, RetinalThermal, 700, 1050, 0, 1e-11, Any, ConstantH, 1.5e-4, 0, kC4 | kC6, Verified,
     "H = 1.5e-4 C4 C6 J/m^2", "IEC 60825-1:2007 Annex A, eye t < 10 s (verified in L1, BGI 832)"},
    {"eye.700-1050.10ps-1ns", Eye, RetinalThermal, 700, 1050, 1e-11, 1e-9, Any, PowerLawH, 2.7e4, 0.75, kC4 | kC6,
     Verified, "H = 2.7e4 t^0.75 C4 C6 J/m^2", "IEC 60825-1:2007 Annex A, eye t < 10 s (verified in L1, BGI 832)"},
    {"eye.700-1050.1ns-18us", Eye, RetinalThermal, 700, 1050, 1e-9, 1.8e-5, Any, ConstantH, 5e-3, 0, kC4 | kC6,
     Verified, "H = 5e-3 C4 C6 J/m^2", "IEC 60825-1:2007 Annex A, eye t < 10 s (verified in L1, BGI 832)"},
    {"eye.700-1050.18us-10s", Eye, RetinalThermal, 700, 1050, 1.8e-5, 10, Any, PowerLawH, 18, 0.75, kC4 | kC6, Verified,
     "H = 18 t^0.75 C4 C6 J/m^2", "IEC 60825-1:2007 Annex A, eye t < 10 s (verified in L1, BGI 832)"},
    {"eye.1050-1400.sub-10ps", Eye, RetinalThermal, 1050, 1400, 0, 1e-11, Any, ConstantH, 1.5e-3, 0, kC6 | kC7,
     Verified, "H = 1.5e-3 C6 C7 J/m^2", "IEC 60825-1:2007 Annex A, eye t < 10 s (verified in L1, BGI 832)"},
    {"eye.1050-1400.10ps-1ns", Eye, RetinalThermal, 1050, 1400, 1e-11, 1e-9, Any, PowerLawH, 2.7e5, 0.75, kC6 | kC7,
     Verified, "H = 2.7e5 t^0.75 C6 C7 J/m^2", "IEC 60825-1:2007 Annex A, eye t < 10 s (verified in L1, BGI 832)"},
    {"eye.1050-1400.1ns-50us", Eye, RetinalThermal, 1050, 1400, 1e-9, 5e-5, Any, ConstantH, 5e-2, 0, kC6 | kC7,
     Verified, "H = 5e-2 C6 C7 J/m^2", "IEC 60825-1:2007 Annex A, eye t < 10 s (verified in L1, BGI 832)"},
    {"eye.1050-1400.50us-10s", Eye, RetinalThermal, 1050, 1400, 5e-5, 10, Any, PowerLawH, 90, 0.75, kC6 | kC7, Verified,
     "H = 90 t^0.75 C6 C7 J/m^2", "IEC 60825-1:2007 Annex A, eye t < 10 s (verified in L1, BGI 832)"},
});

constexpr auto kRetinal2014 = std::to_array<LimitRow>({
    {"eye.400-700.sub-10ps", Eye, RetinalThermal, 400, 700, 0, 1e-11, Any, ConstantH, 1e-3, 0, kC6, Reconstructed,
     "H = 1e-3 C6 J/m^2", "IEC 60825-1:2014 Annex A, eye t < 10 s; reconstructed (exposure-limits.md 4.9)"},
    {"eye.400-700.10ps-5us", Eye, RetinalThermal, 400, 700, 1e-11, 5e-6, Any, ConstantH, 2e-3, 0, kC6, Reconstructed,
     "H = 2e-3 C6 J/m^2", "IEC 60825-1:2014 Annex A, eye t < 10 s; reconstructed (exposure-limits.md 4.9)"},
    {"eye.400-700.5us-10s", Eye, RetinalThermal, 400, 700, 5e-6, 10, Any, PowerLawH, 18, 0.75, kC6, Reconstructed,
     "H = 18 t^0.75 C6 J/m^2", "IEC 60825-1:2014 Annex A, eye t < 10 s; reconstructed"},
    {"eye.700-1050.sub-10ps", Eye, RetinalThermal, 700, 1050, 0, 1e-11, Any, ConstantH, 1e-3, 0, kC4 | kC6,
     Reconstructed, "H = 1e-3 C4 C6 J/m^2", "IEC 60825-1:2014 Annex A, eye t < 10 s; reconstructed"},
    {"eye.700-1050.10ps-5us", Eye, RetinalThermal, 700, 1050, 1e-11, 5e-6, Any, ConstantH, 2e-3, 0, kC4 | kC6,
     Reconstructed, "H = 2e-3 C4 C6 J/m^2", "IEC 60825-1:2014 Annex A, eye t < 10 s; reconstructed"},
    {"eye.700-1050.5us-10s", Eye, RetinalThermal, 700, 1050, 5e-6, 10, Any, PowerLawH, 18, 0.75, kC4 | kC6,
     Reconstructed, "H = 18 t^0.75 C4 C6 J/m^2", "IEC 60825-1:2014 Annex A, eye t < 10 s; reconstructed"},
    {"eye.1050-1400.sub-10ps", Eye, RetinalThermal, 1050, 1400, 0, 1e-11, Any, ConstantH, 1e-2, 0, kC6 | kC7,
     Reconstructed, "H = 1e-2 C6 C7 J/m^2", "IEC 60825-1:2014 Annex A, eye t < 10 s; reconstructed"},
    {"eye.1050-1400.10ps-13us", Eye, RetinalThermal, 1050, 1400, 1e-11, 1.3e-5, Any, ConstantH, 2e-2, 0, kC6 | kC7,
     Reconstructed, "H = 2e-2 C6 C7 J/m^2", "IEC 60825-1:2014 Annex A, eye t < 10 s; reconstructed"},
    {"eye.1050-1400.13us-10s", Eye, RetinalThermal, 1050, 1400, 1.3e-5, 10, Any, PowerLawH, 90, 0.75, kC6 | kC7,
     Reconstructed, "H = 90 t^0.75 C6 C7 J/m^2", "IEC 60825-1:2014 Annex A, eye t < 10 s; reconstructed"},
});

// ICNIRP advises the skin MPE as a corneal limit in 1250-1400 nm (L10, verified); applied as a second eye limit.
constexpr auto kCorneal2014 = std::to_array<LimitRow>({
    {"eye.1250-1400.cornea.sub-ns", Eye, CornealSkinLimit, 1250, 1400, 0, 1e-9, Any, ConstantE, 2e11, 0, kC4,
     Reconstructed, "E = 2e11 C4 W/m^2 (skin MPE at the cornea)",
     "ICNIRP advice (L10); IEC 60825-1:2014 wording not verified"},
    {"eye.1250-1400.cornea.1ns-100ns", Eye, CornealSkinLimit, 1250, 1400, 1e-9, 1e-7, Any, ConstantH, 200, 0, kC4,
     Reconstructed, "H = 200 C4 J/m^2 (skin MPE at the cornea)",
     "ICNIRP advice (L10); IEC 60825-1:2014 wording not verified"},
    {"eye.1250-1400.cornea.100ns-10s", Eye, CornealSkinLimit, 1250, 1400, 1e-7, 10, Any, PowerLawH, 1.1e4, 0.25, kC4,
     Reconstructed, "H = 1.1e4 C4 t^0.25 J/m^2 (skin MPE at the cornea)",
     "ICNIRP advice (L10); IEC 60825-1:2014 wording not verified"},
    {"eye.1250-1400.cornea.10s-30ks", Eye, CornealSkinLimit, 1250, 1400, 10, 3e4, Any, ConstantE, 2000, 0, kC4,
     Reconstructed, "E = 2000 C4 W/m^2 (skin MPE at the cornea)",
     "ICNIRP advice (L10); IEC 60825-1:2014 wording not verified"},
});

constexpr auto kTi2007 = std::to_array<TiRow>({
    {400, 1050, 18e-6, Verified},
    {1050, 1400, 50e-6, Verified},
    {1400, 1500, 1e-3, Reconstructed},
    {1500, 1800, 10, Reconstructed},
    {1800, 2600, 1e-3, Reconstructed},
    {2600, 1e6, 100e-9, Reconstructed},
});

constexpr auto kTi2014 = std::to_array<TiRow>({
    {400, 1050, 5e-6, Reconstructed},
    {1050, 1400, 13e-6, Reconstructed},
    {1400, 1500, 1e-3, Reconstructed},
    {1500, 1800, 10, Reconstructed},
    {1800, 2600, 1e-3, Reconstructed},
    {2600, 1e6, 100e-9, Reconstructed},
});

} // namespace

std::span<const LimitRow> retinalShort2007()
{
    return kRetinal2007;
}

std::span<const LimitRow> retinalShort2014()
{
    return kRetinal2014;
}

std::span<const LimitRow> cornealSkinLimit2014()
{
    return kCorneal2014;
}

std::span<const TiRow> ti2007()
{
    return kTi2007;
}

std::span<const TiRow> ti2014()
{
    return kTi2014;
}

} // namespace beamwarden::limits::rows
