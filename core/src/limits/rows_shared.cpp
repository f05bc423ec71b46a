// Rows shared by iec60825-1:2007 and iec60825-1:2014. Statuses are those of the 2007 basis (exposure-limits.md
// sections 3.1, 3.2, 3.4); sources: L1 = BGI 832 reproduction of the DIN EN 60825-1 tables (ICNIRP 2000 basis),
// L25 = DGUV Information 203-042 Table A6.1. A first band starting at 0 s covers pulses shorter than the tables'
// shortest duration (1e-13 s): the evaluator flags such pulses as below the table.
#include "rows.hpp"

#include <array>

namespace beamwarden::limits::rows {

namespace {

using enum Target;
using enum Effect;
using enum SourceSize;
using enum FormulaKind;
using enum RowStatus;

constexpr double kFar = 3e4; // the longest exposure duration any row covers, 30 000 s

constexpr auto kSharedEye = std::to_array<LimitRow>({
    // 180-302.5 nm: cornea and lens, photochemical dose
    {"eye.180-302.5.sub-ns", Eye, UvPhotochemical, 180, 302.5, 0, 1e-9, Any, ConstantE, 3e10, 0, kNoFactor, Verified,
     "E = 3e10 W/m^2", "IEC 60825-1:2007 Annex A, eye t < 10 s (verified in L1, BGI 832)"},
    {"eye.180-302.5.1ns-10s", Eye, UvPhotochemical, 180, 302.5, 1e-9, 10, Any, ConstantH, 30, 0, kNoFactor, Verified,
     "H = 30 J/m^2", "IEC 60825-1:2007 Annex A, eye t < 10 s (verified in L1, BGI 832)"},
    {"eye.180-302.5.10s-30ks", Eye, UvPhotochemical, 180, 302.5, 10, kFar, Any, ConstantH, 30, 0, kNoFactor,
     Reconstructed, "H = 30 J/m^2 (dose over the exposure)",
     "IEC 60825-1:2007 Annex A, eye t >= 10 s, continued row; DGUV L25"},
    // 302.5-315 nm: thermal C1 and photochemical C2 both apply; C1 governs up to T1, C2 beyond
    {"eye.302.5-315.sub-ns", Eye, UvThermal, 302.5, 315, 0, 1e-9, Any, ConstantE, 3e10, 0, kNoFactor, Verified,
     "E = 3e10 W/m^2", "IEC 60825-1:2007 Annex A, eye t < 10 s (verified in L1, BGI 832)"},
    {"eye.302.5-315.C1", Eye, UvThermal, 302.5, 315, 1e-9, 10, Any, PowerLawH, 5.6e3, 0.25, kC1 | kT1, Verified,
     "H = C1 = 5.6e3 t^0.25 J/m^2 (t <= T1)", "IEC 60825-1:2007 Annex A, eye t < 10 s (verified in L1, BGI 832)"},
    {"eye.302.5-315.C2", Eye, UvPhotochemical, 302.5, 315, 1e-9, kFar, Any, ConstantH, 1, 0, kC2 | kT1, Reconstructed,
     "H = C2 = 10^(0.2(lambda-295)) J/m^2 (t > T1)", "IEC 60825-1:2007 Annex A, eye; C2 formula reconstructed"},
    // 315-400 nm
    {"eye.315-400.sub-ns", Eye, UvThermal, 315, 400, 0, 1e-9, Any, ConstantE, 3e10, 0, kNoFactor, Verified,
     "E = 3e10 W/m^2", "IEC 60825-1:2007 Annex A, eye t < 10 s (verified in L1, BGI 832)"},
    {"eye.315-400.C1", Eye, UvThermal, 315, 400, 1e-9, 10, Any, PowerLawH, 5.6e3, 0.25, kC1, Verified,
     "H = C1 = 5.6e3 t^0.25 J/m^2", "IEC 60825-1:2007 Annex A, eye t < 10 s (verified in L1, BGI 832)"},
    {"eye.315-400.10s-1000s", Eye, UvPhotochemical, 315, 400, 10, 1e3, Any, ConstantH, 1e4, 0, kNoFactor, Reconstructed,
     "H = 1e4 J/m^2", "IEC 60825-1:2007 Annex A, eye t >= 10 s; reconstructed (C1(10 s) = 9958)"},
    {"eye.315-400.1000s-30ks", Eye, UvPhotochemical, 315, 400, 1e3, kFar, Any, ConstantE, 10, 0, kNoFactor,
     Reconstructed, "E = 10 W/m^2", "IEC 60825-1:2007 Annex A, eye t >= 10 s; reconstructed (1e4 J/m^2 / 1e3 s)"},
    // 400-600 nm: retinal photochemical, t >= 10 s (no C6; field of view gamma_ph)
    {"eye.400-600.photochemical.10s-100s", Eye, RetinalPhotochemical, 400, 600, 10, 100, Any, ConstantH, 100, 0, kC3,
     Reconstructed, "H = 100 C3 J/m^2 (within gamma_ph)",
     "IEC 60825-1:2007 Annex A, eye t >= 10 s; crossover 10 C3 s verified-EU"},
    {"eye.400-600.photochemical.100s-30ks", Eye, RetinalPhotochemical, 400, 600, 100, kFar, Any, ConstantE, 1, 0, kC3,
     Reconstructed, "E = C3 W/m^2 (within gamma_ph)", "IEC 60825-1:2007 Annex A, eye t >= 10 s; reconstructed"},
    // 400-1400 nm: retinal thermal, t >= 10 s
    {"eye.400-700.thermal.10s-30ks.small", Eye, RetinalThermal, 400, 700, 10, kFar, Small, ConstantE, 10, 0, kNoFactor,
     Reconstructed, "E = 10 W/m^2", "IEC 60825-1:2007 Annex A, eye t >= 10 s; DGUV simplified value 10 W/m^2 (L25)"},
    {"eye.400-700.thermal.10s-30ks.extended", Eye, RetinalThermal, 400, 700, 10, kFar, Extended, PowerLawUntilT2, 18,
     0.75, kC6, Reconstructed, "H = 18 C6 t^0.75 J/m^2 to T2, then E = 18 C6 T2^-0.25 W/m^2",
     "IEC 60825-1:2007 Annex A, eye t >= 10 s; reconstructed"},
    {"eye.700-1050.thermal.10s-30ks.small", Eye, RetinalThermal, 700, 1050, 10, kFar, Small, ConstantE, 10, 0, kC4,
     Reconstructed, "E = 10 C4 W/m^2", "IEC 60825-1:2007 Annex A, eye t >= 10 s; reconstructed"},
    {"eye.700-1050.thermal.10s-30ks.extended", Eye, RetinalThermal, 700, 1050, 10, kFar, Extended, PowerLawUntilT2, 18,
     0.75, kC4 | kC6, Reconstructed, "H = 18 C4 C6 t^0.75 J/m^2 to T2, then E = 18 C4 C6 T2^-0.25 W/m^2",
     "IEC 60825-1:2007 Annex A, eye t >= 10 s; reconstructed"},
    {"eye.1050-1400.thermal.10s-30ks.small", Eye, RetinalThermal, 1050, 1400, 10, kFar, Small, ConstantE, 10, 0,
     kC4 | kC7, Reconstructed, "E = 10 C4 C7 W/m^2", "IEC 60825-1:2007 Annex A, eye t >= 10 s; reconstructed"},
    {"eye.1050-1400.thermal.10s-30ks.extended", Eye, RetinalThermal, 1050, 1400, 10, kFar, Extended, PowerLawUntilT2,
     90, 0.75, kC6 | kC7, Reconstructed, "H = 90 C6 C7 t^0.75 J/m^2 to T2, then E = 90 C6 C7 T2^-0.25 W/m^2",
     "IEC 60825-1:2007 Annex A, eye t >= 10 s; reconstructed"},
    // 1400 nm - 1 mm: cornea
    {"eye.1400-1500.sub-ns", Eye, CornealThermal, 1400, 1500, 0, 1e-9, Any, ConstantE, 1e12, 0, kNoFactor, Verified,
     "E = 1e12 W/m^2", "IEC 60825-1:2007 Annex A, eye t < 10 s (verified in L1, BGI 832)"},
    {"eye.1400-1500.1ns-1ms", Eye, CornealThermal, 1400, 1500, 1e-9, 1e-3, Any, ConstantH, 1e3, 0, kNoFactor, Verified,
     "H = 1e3 J/m^2", "IEC 60825-1:2007 Annex A, eye t < 10 s (verified in L1, BGI 832)"},
    {"eye.1400-1500.1ms-10s", Eye, CornealThermal, 1400, 1500, 1e-3, 10, Any, PowerLawH, 5.6e3, 0.25, kNoFactor,
     Verified, "H = 5.6e3 t^0.25 J/m^2", "IEC 60825-1:2007 Annex A, eye t < 10 s (verified in L1, BGI 832)"},
    {"eye.1400-1500.10s-30ks", Eye, CornealThermal, 1400, 1500, 10, kFar, Any, ConstantE, 1e3, 0, kNoFactor,
     Reconstructed, "E = 1000 W/m^2",
     "IEC 60825-1:2007 Annex A, eye t >= 10 s; DGUV simplified value 1000 W/m^2 (L25)"},
    {"eye.1500-1800.sub-ns", Eye, CornealThermal, 1500, 1800, 0, 1e-9, Any, ConstantE, 1e13, 0, kNoFactor, Verified,
     "E = 1e13 W/m^2", "IEC 60825-1:2007 Annex A, eye t < 10 s (verified in L1, BGI 832)"},
    {"eye.1500-1800.1ns-10s", Eye, CornealThermal, 1500, 1800, 1e-9, 10, Any, ConstantH, 1e4, 0, kNoFactor, Verified,
     "H = 1e4 J/m^2", "IEC 60825-1:2007 Annex A, eye t < 10 s (verified in L1, BGI 832)"},
    {"eye.1500-1800.10s-30ks", Eye, CornealThermal, 1500, 1800, 10, kFar, Any, ConstantE, 1e3, 0, kNoFactor,
     Reconstructed, "E = 1000 W/m^2", "IEC 60825-1:2007 Annex A, eye t >= 10 s; DGUV simplified value (L25)"},
    {"eye.1800-2600.sub-ns", Eye, CornealThermal, 1800, 2600, 0, 1e-9, Any, ConstantE, 1e12, 0, kNoFactor, Verified,
     "E = 1e12 W/m^2", "IEC 60825-1:2007 Annex A, eye t < 10 s (verified in L1, BGI 832)"},
    {"eye.1800-2600.1ns-1ms", Eye, CornealThermal, 1800, 2600, 1e-9, 1e-3, Any, ConstantH, 1e3, 0, kNoFactor, Verified,
     "H = 1e3 J/m^2", "IEC 60825-1:2007 Annex A, eye t < 10 s (verified in L1, BGI 832)"},
    {"eye.1800-2600.1ms-10s", Eye, CornealThermal, 1800, 2600, 1e-3, 10, Any, PowerLawH, 5.6e3, 0.25, kNoFactor,
     Verified, "H = 5.6e3 t^0.25 J/m^2", "IEC 60825-1:2007 Annex A, eye t < 10 s (verified in L1, BGI 832)"},
    {"eye.1800-2600.10s-30ks", Eye, CornealThermal, 1800, 2600, 10, kFar, Any, ConstantE, 1e3, 0, kNoFactor,
     Reconstructed, "E = 1000 W/m^2", "IEC 60825-1:2007 Annex A, eye t >= 10 s; DGUV simplified value (L25)"},
    {"eye.2600-1e6.sub-ns", Eye, CornealThermal, 2600, 1e6, 0, 1e-9, Any, ConstantE, 1e11, 0, kNoFactor, Verified,
     "E = 1e11 W/m^2", "IEC 60825-1:2007 Annex A, eye t < 10 s (verified in L1, BGI 832)"},
    {"eye.2600-1e6.1ns-100ns", Eye, CornealThermal, 2600, 1e6, 1e-9, 1e-7, Any, ConstantH, 100, 0, kNoFactor,
     Reconstructed, "H = 100 J/m^2",
     "IEC 60825-1:2007 Annex A, eye t < 10 s, row cut off in L1; continuity 1e11 x 1 ns"},
    {"eye.2600-1e6.100ns-10s", Eye, CornealThermal, 2600, 1e6, 1e-7, 10, Any, PowerLawH, 5.6e3, 0.25, kNoFactor,
     Reconstructed, "H = 5.6e3 t^0.25 J/m^2", "IEC 60825-1:2007 Annex A, eye t < 10 s, row cut off in L1; continuity"},
    {"eye.2600-1e6.10s-30ks", Eye, CornealThermal, 2600, 1e6, 10, kFar, Any, ConstantE, 1e3, 0, kNoFactor,
     Reconstructed, "E = 1000 W/m^2", "IEC 60825-1:2007 Annex A, eye t >= 10 s; DGUV simplified value (L25)"},
});

// Skin, both sets (exposure-limits.md section 3.4): rules 1 and 2 only.
constexpr auto kSharedSkin = std::to_array<LimitRow>({
    {"skin.180-302.5.sub-ns", Skin, Effect::SkinLimit, 180, 302.5, 0, 1e-9, Any, ConstantE, 3e10, 0, kNoFactor,
     Reconstructed, "E = 3e10 W/m^2", "IEC 60825-1:2007 Annex A, skin; reconstructed"},
    {"skin.180-302.5.1ns-30ks", Skin, Effect::SkinLimit, 180, 302.5, 1e-9, kFar, Any, ConstantH, 30, 0, kNoFactor,
     Reconstructed, "H = 30 J/m^2", "IEC 60825-1:2007 Annex A, skin; reconstructed"},
    {"skin.302.5-315.sub-ns", Skin, Effect::SkinLimit, 302.5, 315, 0, 1e-9, Any, ConstantE, 3e10, 0, kNoFactor,
     Reconstructed, "E = 3e10 W/m^2", "IEC 60825-1:2007 Annex A, skin; reconstructed"},
    {"skin.302.5-315.C1", Skin, Effect::SkinLimit, 302.5, 315, 1e-9, 10, Any, PowerLawH, 5.6e3, 0.25, kC1 | kT1,
     Reconstructed, "H = C1 = 5.6e3 t^0.25 J/m^2 (t <= T1)", "IEC 60825-1:2007 Annex A, skin; reconstructed"},
    {"skin.302.5-315.C2", Skin, Effect::SkinLimit, 302.5, 315, 1e-9, kFar, Any, ConstantH, 1, 0, kC2 | kT1,
     Reconstructed, "H = C2 J/m^2 (t > T1)", "IEC 60825-1:2007 Annex A, skin; reconstructed"},
    {"skin.315-400.sub-ns", Skin, Effect::SkinLimit, 315, 400, 0, 1e-9, Any, ConstantE, 3e10, 0, kNoFactor,
     Reconstructed, "E = 3e10 W/m^2", "IEC 60825-1:2007 Annex A, skin; reconstructed"},
    {"skin.315-400.C1", Skin, Effect::SkinLimit, 315, 400, 1e-9, 10, Any, PowerLawH, 5.6e3, 0.25, kC1, Reconstructed,
     "H = C1 = 5.6e3 t^0.25 J/m^2", "IEC 60825-1:2007 Annex A, skin; reconstructed"},
    {"skin.315-400.10s-1000s", Skin, Effect::SkinLimit, 315, 400, 10, 1e3, Any, ConstantH, 1e4, 0, kNoFactor,
     Reconstructed, "H = 1e4 J/m^2", "IEC 60825-1:2007 Annex A, skin; reconstructed"},
    {"skin.315-400.1000s-30ks", Skin, Effect::SkinLimit, 315, 400, 1e3, kFar, Any, ConstantE, 10, 0, kNoFactor,
     Reconstructed, "E = 10 W/m^2", "IEC 60825-1:2007 Annex A, skin; reconstructed"},
    {"skin.400-700.sub-ns", Skin, Effect::SkinLimit, 400, 700, 0, 1e-9, Any, ConstantE, 2e11, 0, kNoFactor, Secondary,
     "E = 2e11 W/m^2", "IEC 60825-1:2007 Annex A, skin; secondary (ANSI form 2e-2 C_A J/cm^2)"},
    {"skin.400-700.1ns-100ns", Skin, Effect::SkinLimit, 400, 700, 1e-9, 1e-7, Any, ConstantH, 200, 0, kNoFactor,
     Secondary, "H = 200 J/m^2", "IEC 60825-1:2007 Annex A, skin; secondary"},
    {"skin.400-700.100ns-10s", Skin, Effect::SkinLimit, 400, 700, 1e-7, 10, Any, PowerLawH, 1.1e4, 0.25, kNoFactor,
     Secondary, "H = 1.1e4 t^0.25 J/m^2", "IEC 60825-1:2007 Annex A, skin; secondary (ANSI 1.1 C_A t^0.25 J/cm^2)"},
    {"skin.400-700.10s-30ks", Skin, Effect::SkinLimit, 400, 700, 10, kFar, Any, ConstantE, 2000, 0, kNoFactor,
     Secondary, "E = 2000 W/m^2", "IEC 60825-1:2007 Annex A, skin; secondary (HeNe skin 200 mW/cm^2)"},
    {"skin.700-1400.sub-ns", Skin, Effect::SkinLimit, 700, 1400, 0, 1e-9, Any, ConstantE, 2e11, 0, kC4, Secondary,
     "E = 2e11 C4 W/m^2", "IEC 60825-1:2007 Annex A, skin; secondary"},
    {"skin.700-1400.1ns-100ns", Skin, Effect::SkinLimit, 700, 1400, 1e-9, 1e-7, Any, ConstantH, 200, 0, kC4, Secondary,
     "H = 200 C4 J/m^2", "IEC 60825-1:2007 Annex A, skin; secondary"},
    {"skin.700-1400.100ns-10s", Skin, Effect::SkinLimit, 700, 1400, 1e-7, 10, Any, PowerLawH, 1.1e4, 0.25, kC4,
     Secondary, "H = 1.1e4 C4 t^0.25 J/m^2", "IEC 60825-1:2007 Annex A, skin; secondary"},
    {"skin.700-1400.10s-30ks", Skin, Effect::SkinLimit, 700, 1400, 10, kFar, Any, ConstantE, 2000, 0, kC4, Secondary,
     "E = 2000 C4 W/m^2", "IEC 60825-1:2007 Annex A, skin; secondary"},
    {"skin.1400-1500.sub-ns", Skin, Effect::SkinLimit, 1400, 1500, 0, 1e-9, Any, ConstantE, 1e12, 0, kNoFactor,
     Reconstructed, "E = 1e12 W/m^2", "IEC 60825-1:2007 Annex A, skin; reconstructed"},
    {"skin.1400-1500.1ns-1ms", Skin, Effect::SkinLimit, 1400, 1500, 1e-9, 1e-3, Any, ConstantH, 1e3, 0, kNoFactor,
     Reconstructed, "H = 1e3 J/m^2", "IEC 60825-1:2007 Annex A, skin; reconstructed"},
    {"skin.1400-1500.1ms-10s", Skin, Effect::SkinLimit, 1400, 1500, 1e-3, 10, Any, PowerLawH, 5.6e3, 0.25, kNoFactor,
     Reconstructed, "H = 5.6e3 t^0.25 J/m^2", "IEC 60825-1:2007 Annex A, skin; reconstructed"},
    {"skin.1400-1500.10s-30ks", Skin, Effect::SkinLimit, 1400, 1500, 10, kFar, Any, ConstantE, 1e3, 0, kNoFactor,
     Reconstructed, "E = 1000 W/m^2", "IEC 60825-1:2007 Annex A, skin; reconstructed"},
    {"skin.1500-1800.sub-ns", Skin, Effect::SkinLimit, 1500, 1800, 0, 1e-9, Any, ConstantE, 1e13, 0, kNoFactor,
     Reconstructed, "E = 1e13 W/m^2", "IEC 60825-1:2007 Annex A, skin; reconstructed"},
    {"skin.1500-1800.1ns-10s", Skin, Effect::SkinLimit, 1500, 1800, 1e-9, 10, Any, ConstantH, 1e4, 0, kNoFactor,
     Reconstructed, "H = 1e4 J/m^2", "IEC 60825-1:2007 Annex A, skin; reconstructed"},
    {"skin.1500-1800.10s-30ks", Skin, Effect::SkinLimit, 1500, 1800, 10, kFar, Any, ConstantE, 1e3, 0, kNoFactor,
     Reconstructed, "E = 1000 W/m^2", "IEC 60825-1:2007 Annex A, skin; reconstructed"},
    {"skin.1800-2600.sub-ns", Skin, Effect::SkinLimit, 1800, 2600, 0, 1e-9, Any, ConstantE, 1e12, 0, kNoFactor,
     Reconstructed, "E = 1e12 W/m^2", "IEC 60825-1:2007 Annex A, skin; reconstructed"},
    {"skin.1800-2600.1ns-1ms", Skin, Effect::SkinLimit, 1800, 2600, 1e-9, 1e-3, Any, ConstantH, 1e3, 0, kNoFactor,
     Reconstructed, "H = 1e3 J/m^2", "IEC 60825-1:2007 Annex A, skin; reconstructed"},
    {"skin.1800-2600.1ms-10s", Skin, Effect::SkinLimit, 1800, 2600, 1e-3, 10, Any, PowerLawH, 5.6e3, 0.25, kNoFactor,
     Reconstructed, "H = 5.6e3 t^0.25 J/m^2", "IEC 60825-1:2007 Annex A, skin; reconstructed"},
    {"skin.1800-2600.10s-30ks", Skin, Effect::SkinLimit, 1800, 2600, 10, kFar, Any, ConstantE, 1e3, 0, kNoFactor,
     Reconstructed, "E = 1000 W/m^2", "IEC 60825-1:2007 Annex A, skin; reconstructed"},
    {"skin.2600-1e6.sub-ns", Skin, Effect::SkinLimit, 2600, 1e6, 0, 1e-9, Any, ConstantE, 1e11, 0, kNoFactor,
     Reconstructed, "E = 1e11 W/m^2", "IEC 60825-1:2007 Annex A, skin; reconstructed"},
    {"skin.2600-1e6.1ns-100ns", Skin, Effect::SkinLimit, 2600, 1e6, 1e-9, 1e-7, Any, ConstantH, 100, 0, kNoFactor,
     Reconstructed, "H = 100 J/m^2", "IEC 60825-1:2007 Annex A, skin; reconstructed"},
    {"skin.2600-1e6.100ns-10s", Skin, Effect::SkinLimit, 2600, 1e6, 1e-7, 10, Any, PowerLawH, 5.6e3, 0.25, kNoFactor,
     Reconstructed, "H = 5.6e3 t^0.25 J/m^2", "IEC 60825-1:2007 Annex A, skin; reconstructed"},
    {"skin.2600-1e6.10s-30ks", Skin, Effect::SkinLimit, 2600, 1e6, 10, kFar, Any, ConstantE, 1e3, 0, kNoFactor,
     Reconstructed, "E = 1000 W/m^2", "IEC 60825-1:2007 Annex A, skin; reconstructed"},
    // Applies only when the irradiated skin area A_s is given and at least 0.01 m^2 (continuous with 1000 W/m^2).
    {"skin.1400-1e6.large-area", Skin, Effect::SkinLimit, 1400, 1e6, 10, kFar, Any, AreaScaledE, 10, 0, kNoFactor,
     Reconstructed, "E = 10 / A_s W/m^2 for 0.01-0.1 m^2, 100 W/m^2 above 0.1 m^2",
     "IEC 60825-1:2007 Annex A, skin, large areas; reconstructed (ANSI: 10 mW/cm^2 above 1000 cm^2)"},
});

} // namespace

std::span<const LimitRow> sharedEye()
{
    return kSharedEye;
}

std::span<const LimitRow> sharedSkin()
{
    return kSharedSkin;
}

} // namespace beamwarden::limits::rows
