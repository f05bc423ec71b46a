#pragma once
// Correction factors, times and angles of the IEC 60825-1 MPE tables (exposure-limits.md section 2).
// Wavelengths in nm, durations in s, angles in rad unless a name says otherwise.
#include "beamwarden/limits/ruleset.hpp"

namespace beamwarden::limits::factors {

inline constexpr double kAlphaMin_rad = 1.5e-3;

[[nodiscard]] double c2(double lambda_nm);              // 10^(0.2(lambda-295)), 302.5-315 nm
[[nodiscard]] double t1(double lambda_nm);              // UV T1 = 10^(0.8(lambda-295)) 1e-15 s, 302.5-315 nm
[[nodiscard]] double c3(double lambda_nm);              // 1 (400-450), 10^(0.02(lambda-450)) (450-600)
[[nodiscard]] double c4(double lambda_nm);              // 1 (<700), 10^(0.002(lambda-700)) (700-1050), 5 (1050-1400)
[[nodiscard]] double c7(C7Rule rule, double lambda_nm); // 1 / 10^(0.018(lambda-1150)) / 8 [+ 10^(0.04(lambda-1250))]
[[nodiscard]] double t2(double alpha_rad);              // 10 s ... 100 s with alpha
[[nodiscard]] double alphaMax(AlphaMaxRule rule, double duration_s); // 100 mrad, or 2014's time-dependent form
[[nodiscard]] double c6(double alpha_rad, double alphaMax_rad);      // 1, alpha/alpha_min, alpha_max/alpha_min
// Whole-source C6 for a uniform disc of angle alpha: C6, or alpha^2/(alpha_min alpha_max) beyond alpha_max.
[[nodiscard]] double c6WholeSource(double alpha_rad, double alphaMax_rad);
[[nodiscard]] double gammaPh(double duration_s);               // photochemical acceptance angle: 11 mrad ... 110 mrad
[[nodiscard]] double ti(const RuleSet& set, double lambda_nm); // 0 where no Ti applies (below 400 nm)
// Limiting aperture diameter in m (exposure-limits.md section 2.4, the column "Beamwarden uses").
[[nodiscard]] double apertureDiameter(Target target, double lambda_nm, double duration_s);

// C5 under the candidate 2014 reading (exposure-limits.md section 4.6), alpha_max at the pulse or group duration.
[[nodiscard]] double c5Edition(double n, double alpha_rad, double alphaMax_rad);
// C5 = N^-0.25 (2007, and 2014 conservative).
[[nodiscard]] double c5Conservative(double n);

} // namespace beamwarden::limits::factors
