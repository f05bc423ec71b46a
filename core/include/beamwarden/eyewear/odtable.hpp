#pragma once
// Reading an eyewear's spectral OD table from a text file: one row per line, "FROM-TO OD" or "FROM,TO,OD" in nm,
// an optional ">=" before the OD; '#' starts a comment.
#include "beamwarden/error.hpp"
#include "beamwarden/model/records.hpp"

#include <string>
#include <vector>

namespace beamwarden::eyewear {

[[nodiscard]] Result<std::vector<model::OdRow>> readOdTable(const std::string& path);
// `origin` names the source in errors ("file.txt", "OD table").
[[nodiscard]] Result<std::vector<model::OdRow>> parseOdTable(std::string_view text, const std::string& origin);
// The rows as text in the same form, one per line ("740-1100 >=7").
[[nodiscard]] std::string formatOdTable(const std::vector<model::OdRow>& rows);

} // namespace beamwarden::eyewear
