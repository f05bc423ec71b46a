#pragma once
// EN 207 protection levels (hazard-and-eyewear.md section 6): what level n withstands per mode and wavelength, the
// level a source requires at the eyewear (DGUV 203-042 procedure, section 6.3) and the marking it implies.
#include "beamwarden/eyewear/marking.hpp"
#include "beamwarden/hazard/hazard.hpp"

#include <array>
#include <optional>
#include <string>
#include <vector>

namespace beamwarden::eyewear {

inline constexpr int kExceedsLb10 = 11; // a required "level" above LB10: no EN 207 eyewear is adequate

// The power density (D; M outside 315-1400 nm, W/m^2) or energy density (I, R; M at 315-1400 nm, J/m^2) that level
// n (1..10) withstands at lambda (EN 207:2017 via Wikipedia "EN 207", section 6.2 table).
[[nodiscard]] double levelValue(Mode mode, double lambda_nm, int level);
// The smallest level whose value is at least `density` (a level's value is its maximum); at least 1;
// kExceedsLb10 if no level suffices.
[[nodiscard]] int requiredLevelFor(Mode mode, double lambda_nm, double density);
// The pulsed mode for a pulse duration: I (> 1 us to 0.25 s), R (> 1 ns to 1 us), M (< 1 ns); a duration exactly
// on a boundary belongs to both (the caller takes the higher level).
[[nodiscard]] std::vector<Mode> pulsedModesFor(double pulseDuration_s);

// The level one output requires of eyewear at one wavelength, per mode, with how it was reached.
struct ModeRequirement {
    Mode mode = Mode::D;
    int level = 0;      // 1..10, or kExceedsLb10
    double density = 0; // the (corrected) density compared with the table
    std::string basis;  // in words: E = P/A63, H' = H N^(1/4) with N = ..., Ti of which set
};

struct LevelRequirement {
    double lambda_nm = 0;
    std::vector<ModeRequirement> modes;         // D always; plus I, R or M for pulsed sources
    bool beamDiameterCorrectionMissing = false; // DGUV 203-042 5.2 applies but is not implemented
    bool checkEn207Text = false;                // M at 315-400 nm (DGUV: EN 207 applies the M column from 400 nm)
    std::vector<std::string> notes;

    [[nodiscard]] int levelFor(Mode mode) const; // 0 if the mode is not required
};

// The EN 207 requirement of an output at the eyewear position given by the request's exposure case (distance and
// geometry), for every spectral sample (one requirement per sample). Under `strictest` the Ti of each rule set is
// used and the higher level governs (section 6.4).
[[nodiscard]] Result<std::vector<LevelRequirement>> requiredLevels(const hazard::HazardRequest& request);

// The marking a purchase must have to meet the requirements, e.g. "1064 D LB4 + R LB7" (wavelength range spanning the
// samples, each mode at the highest level required anywhere in it); none if a level beyond LB10 is needed.
[[nodiscard]] std::optional<En207Marking> impliedMarking(const std::vector<LevelRequirement>& requirements);

} // namespace beamwarden::eyewear
