#include "beamwarden/eyewear/odtable.hpp"

#include <charconv>
#include <cmath>
#include <fmt/core.h>
#include <fstream>
#include <sstream>

namespace beamwarden::eyewear {

namespace {

bool number(std::string_view text, double& value)
{
    while (!text.empty() && text.front() == ' ')
        text.remove_prefix(1);
    while (!text.empty() && (text.back() == ' ' || text.back() == '\r'))
        text.remove_suffix(1);
    if (text.ends_with("nm"))
        text.remove_suffix(2);
    const auto [end, ec] = std::from_chars(text.data(), text.data() + text.size(), value);
    return ec == std::errc{} && end == text.data() + text.size() && std::isfinite(value);
}

} // namespace

Result<std::vector<model::OdRow>> parseOdTable(std::string_view text, const std::string& origin)
{
    std::vector<model::OdRow> rows;
    std::size_t lineNumber = 0;
    std::size_t start = 0;
    while (start < text.size()) {
        const auto end = text.find('\n', start);
        std::string line(text.substr(start, end == std::string_view::npos ? std::string_view::npos : end - start));
        start = end == std::string_view::npos ? text.size() : end + 1;
        ++lineNumber;
        if (const auto hash = line.find('#'); hash != std::string::npos)
            line.resize(hash);
        if (line.find_first_not_of(" \t\r") == std::string::npos)
            continue;
        for (char& c : line) {
            if (c == ',' || c == '\t' || c == ':')
                c = ' ';
        }
        // "740-1100 >=7" or "740 1100 7"
        std::string from;
        std::string to;
        std::string od;
        std::istringstream fields(line);
        std::string first;
        fields >> first;
        if (const auto dash = first.find('-'); dash != std::string::npos) {
            from = first.substr(0, dash);
            to = first.substr(dash + 1);
        } else {
            from = first;
            fields >> to;
        }
        fields >> od;
        bool atLeast = false;
        if (od.starts_with(">=")) {
            atLeast = true;
            od = od.substr(2);
        }
        std::string extra;
        fields >> extra;
        model::OdRow row;
        double lo = 0.0;
        double hi = 0.0;
        double value = 0.0;
        if (!number(from, lo) || !number(to, hi) || !number(od, value) || !extra.empty() || lo < 180.0 || hi > 1e6 ||
            hi < lo || value < 0.0 || value > model::kMaxOpticalDensity)
            return fail(fmt::format("{} line {}", origin, lineNumber), line,
                        fmt::format("FROM-TO OD in nm, e.g. '740-1100 7' (180 nm to 1 mm, OD 0 to {})",
                                    model::kMaxOpticalDensity));
        row.from = units::Wavelength::fromSi(lo * 1e-9);
        row.to = units::Wavelength::fromSi(hi * 1e-9);
        row.od = value;
        row.atLeast = atLeast;
        rows.push_back(row);
    }
    return rows;
}

std::string formatOdTable(const std::vector<model::OdRow>& rows)
{
    std::string out;
    for (const model::OdRow& row : rows)
        out += fmt::format("{:g}-{:g} {}{:g}\n", row.from.nanometres(), row.to.nanometres(), row.atLeast ? ">=" : "",
                           row.od);
    return out;
}

Result<std::vector<model::OdRow>> readOdTable(const std::string& path)
{
    std::ifstream file(path, std::ios::binary);
    if (!file)
        return fail("od-table", path, "a readable text file");
    std::stringstream text;
    text << file.rdbuf();
    return parseOdTable(text.str(), path);
}

} // namespace beamwarden::eyewear
