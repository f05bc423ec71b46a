#pragma once
// Reading an eyewear's spectral OD table from a text file: one row per line, "FROM-TO OD" or "FROM,TO,OD" in nm,
// an optional ">=" before the OD; '#' starts a comment.
#include "beamwarden/error.hpp"
#include "beamwarden/model/records.hpp"

#include <string>
#include <vector>

namespace beamwarden::cli {

[[nodiscard]] Result<std::vector<model::OdRow>> readOdTable(const std::string& path);
[[nodiscard]] Result<std::vector<model::OdRow>> parseOdTable(std::string_view text, const std::string& origin);

} // namespace beamwarden::cli
