#pragma once
// The leanest eyewear for a laser: the items (or pairs of items, for different tasks) that cover every output, with
// the best visible transmittance; where none does, the marking a purchase must have.
#include "beamwarden/eyewear/protection.hpp"

#include <optional>
#include <string>
#include <vector>

namespace beamwarden::eyewear {

struct Choice {
    std::vector<std::size_t> items;                       // indices into the shelf: one item, or a pair
    double visibleTransmittance = 0;                      // the lower of the pair's (0 = not known)
    std::vector<std::vector<std::string>> outputsCovered; // per item, the outputs it covers
};

struct Selection {
    std::vector<ProtectionCheck> checks;       // per shelf item
    std::vector<Choice> singles;               // items that cover every output, best transmittance first
    std::vector<Choice> pairs;                 // only when no single item covers
    std::vector<std::string> purchaseMarkings; // when nothing on the shelf covers: one line per output
    std::vector<std::string> notes;
};

[[nodiscard]] Selection leanestEyewear(const std::vector<ParsedEyewear>& shelf,
                                       const std::vector<OutputRequirement>& outputs);

} // namespace beamwarden::eyewear
