#pragma once
// Everything a lab file holds, as plain values: what a lab export carries and what an import writes in one go.
#include "beamwarden/model/records.hpp"

#include <vector>

namespace beamwarden::store {

struct LabContents {
    model::Lab lab;
    std::vector<model::Laser> lasers;
    std::vector<model::EyewearItem> eyewear;
    // Each assessment's laserId is the id of one of `lasers`; its status follows from its sign-offs.
    std::vector<model::Assessment> assessments;
};

} // namespace beamwarden::store
