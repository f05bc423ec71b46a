#pragma once
// A small RFC 4180 reader: comma-separated fields, double-quoted fields with "" for a quote and line breaks inside,
// LF or CRLF line ends, an optional UTF-8 byte-order mark (spreadsheets on Windows write one).
#include "beamwarden/error.hpp"

#include <string>
#include <string_view>
#include <vector>

namespace beamwarden::store {

struct CsvRecord {
    std::size_t line = 0; // where the record starts, from 1
    std::vector<std::string> fields;
};

// Every non-blank record; unquoted fields are trimmed of surrounding spaces, quoted ones kept as written.
[[nodiscard]] Result<std::vector<CsvRecord>> parseCsv(std::string_view text);

} // namespace beamwarden::store
