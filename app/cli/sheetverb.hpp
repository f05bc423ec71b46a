#pragma once
// beamwarden-cli sheet: a laser's hazard sheet from a lab file, as PDF, rendered offscreen (no display needed).
#include <string>
#include <vector>

namespace beamwarden::cli {

int runSheet(const std::vector<std::string>& args);

} // namespace beamwarden::cli
