#include "beamwarden/store/eyewearcsv.hpp"

#include "store/csv.hpp"
#include "store/recordcheck.hpp"
#include "store/textfile.hpp"

#include <fmt/core.h>

#include <algorithm>
#include <array>
#include <charconv>
#include <map>
#include <optional>
#include <set>

namespace beamwarden::store {

namespace {

constexpr std::array<std::string_view, 10> kColumns{
    "name",  "description", "od_table",        "en207", "en208", "visible_transmittance",
    "count", "location",    "last_inspection", "notes"};

std::string cellName(std::size_t row, std::string_view column, std::size_t line)
{
    return fmt::format("row {}, column {} (line {})", row, column, line);
}

std::string trimmed(std::string_view text)
{
    const auto first = text.find_first_not_of(" \t");
    if (first == std::string_view::npos)
        return {};
    const auto last = text.find_last_not_of(" \t");
    return std::string(text.substr(first, last - first + 1));
}

std::vector<std::string> splitList(std::string_view text)
{
    std::vector<std::string> parts;
    std::size_t start = 0;
    while (start <= text.size()) {
        const auto end = std::min(text.find(';', start), text.size());
        if (std::string part = trimmed(text.substr(start, end - start)); !part.empty())
            parts.push_back(std::move(part));
        start = end + 1;
    }
    return parts;
}

std::optional<double> parseNumber(std::string_view text)
{
    const std::string clean = trimmed(text);
    double value = 0;
    const auto [end, ec] = std::from_chars(clean.data(), clean.data() + clean.size(), value);
    if (clean.empty() || ec != std::errc{} || end != clean.data() + clean.size())
        return std::nullopt;
    return value;
}

// Nanometres to metres by division, which is correctly rounded, so "1064" gives the same double as 1064_nm.
units::Wavelength fromNanometres(double nm)
{
    return units::Wavelength::fromSi(nm / 1e9);
}

// "740-1100:7;1100-1300:5": wavelength bands in nm with the OD printed for each ("7" is an at-least value as makers
// print it; "=6.2" a measured one). A single wavelength "1064:7" stands for a band of zero width.
Result<std::vector<model::OdRow>> parseOdTable(std::string_view text, const std::string& cell)
{
    std::vector<model::OdRow> rows;
    const std::string allowed =
        fmt::format("bands in nm (180 to 1000000) with an OD (0 to {}) each, e.g. 740-1100:7;1100-1300:=5.2",
                    model::kMaxOpticalDensity);
    for (const std::string& entry : splitList(text)) {
        const auto colon = entry.find(':');
        if (colon == std::string::npos)
            return fail(cell, entry, allowed);
        const std::string band = trimmed(std::string_view(entry).substr(0, colon));
        std::string od = trimmed(std::string_view(entry).substr(colon + 1));
        model::OdRow row;
        if (od.starts_with('=')) {
            row.atLeast = false;
            od.erase(0, 1);
        }
        const auto dash = band.find('-', 1); // from 1: a leading minus belongs to the number, and is refused later
        const auto from = parseNumber(band.substr(0, dash));
        const auto to = dash == std::string::npos ? from : parseNumber(band.substr(dash + 1));
        const auto value = parseNumber(od);
        // Ranges checked here in the cell's own units, so the refusal quotes the entry as written (in nm), not
        // the record check's metres; written so that NaN fails too.
        if (!from || !to || !value || !(*from >= 180.0 && *from <= *to && *to <= 1e6) ||
            !(*value >= 0.0 && *value <= model::kMaxOpticalDensity))
            return fail(cell, entry, allowed);
        row.from = fromNanometres(*from);
        row.to = fromNanometres(*to);
        row.od = *value;
        rows.push_back(row);
    }
    return rows;
}

// "0.35" or "35%"; empty means not known (0).
Result<double> parseTransmittance(std::string_view text, const std::string& cell)
{
    std::string clean = trimmed(text);
    if (clean.empty())
        return 0.0;
    const bool percent = clean.ends_with('%');
    if (percent)
        clean.pop_back();
    const auto value = parseNumber(clean);
    if (!value)
        return fail(cell, std::string(text), "a share from 0 to 1, or a percentage such as 35%");
    return percent ? *value / 100.0 : *value;
}

Result<int> parseCount(std::string_view text, const std::string& cell)
{
    const std::string clean = trimmed(text);
    if (clean.empty())
        return 1;
    int value = 0;
    const auto [end, ec] = std::from_chars(clean.data(), clean.data() + clean.size(), value);
    if (ec != std::errc{} || end != clean.data() + clean.size())
        return fail(cell, std::string(text), "a whole number of 0 or more");
    return value;
}

// The column a validateEyewear() path belongs to: "spectral_od[2].to_m" -> od_table, "en207[0]" -> en207.
std::string_view columnOf(std::string_view field)
{
    const auto end = field.find_first_of(".[");
    const std::string_view key = field.substr(0, end);
    return key == "spectral_od" ? std::string_view("od_table") : key;
}

using ColumnIndex = std::map<std::string_view, std::size_t>;

Result<ColumnIndex> readHeader(const CsvRecord& header)
{
    ColumnIndex columns;
    for (std::size_t i = 0; i < header.fields.size(); ++i) {
        std::string name = trimmed(header.fields[i]);
        std::transform(name.begin(), name.end(), name.begin(),
                       [](unsigned char c) { return static_cast<char>(c >= 'A' && c <= 'Z' ? c - 'A' + 'a' : c); });
        const auto known = std::find(kColumns.begin(), kColumns.end(), name);
        if (known == kColumns.end())
            return fail(fmt::format("header, column {} (line {})", i + 1, header.line), header.fields[i],
                        "one of name, description, od_table, en207, en208, visible_transmittance, count, location, "
                        "last_inspection, notes");
        if (!columns.emplace(*known, i).second)
            return fail(fmt::format("header, column {} (line {})", i + 1, header.line), header.fields[i],
                        "each column once");
    }
    if (!columns.contains("name"))
        return fail(fmt::format("header (line {})", header.line), "", "a 'name' column");
    return columns;
}

Result<model::EyewearItem> readRow(const CsvRecord& record, const ColumnIndex& columns, std::size_t row)
{
    if (record.fields.size() != columns.size())
        return fail(fmt::format("row {} (line {})", row, record.line), fmt::format("{} fields", record.fields.size()),
                    fmt::format("{} fields, one per header column", columns.size()));
    const auto cell = [&](std::string_view column) -> std::string {
        const auto found = columns.find(column);
        return found == columns.end() ? std::string{} : record.fields[found->second];
    };
    const auto name = [&](std::string_view column) { return cellName(row, column, record.line); };

    model::EyewearItem item;
    item.name = trimmed(cell("name"));
    item.description = cell("description");
    auto od = parseOdTable(cell("od_table"), name("od_table"));
    if (!od)
        return std::unexpected(od.error());
    item.spectralOd = std::move(*od);
    item.en207Markings = splitList(cell("en207"));
    item.en208Markings = splitList(cell("en208"));
    auto transmittance = parseTransmittance(cell("visible_transmittance"), name("visible_transmittance"));
    if (!transmittance)
        return std::unexpected(transmittance.error());
    item.visibleTransmittance = *transmittance;
    auto count = parseCount(cell("count"), name("count"));
    if (!count)
        return std::unexpected(count.error());
    item.count = *count;
    item.location = cell("location");
    item.lastInspection = trimmed(cell("last_inspection"));
    item.notes = cell("notes");
    if (auto valid = validateEyewear(item, ""); !valid)
        return fail(name(columnOf(valid.error().field)), valid.error().value, valid.error().allowed);
    return item;
}

} // namespace

Result<std::vector<model::EyewearItem>> parseEyewearCsv(std::string_view text)
{
    auto records = parseCsv(text);
    if (!records)
        return std::unexpected(records.error());
    if (records->empty())
        return fail("header", "", "a header row naming the columns, then one row per item");
    auto columns = readHeader(records->front());
    if (!columns)
        return std::unexpected(columns.error());
    std::vector<model::EyewearItem> items;
    std::set<std::string> names;
    for (std::size_t i = 1; i < records->size(); ++i) {
        const CsvRecord& record = (*records)[i];
        auto item = readRow(record, *columns, i);
        if (!item)
            return std::unexpected(item.error());
        if (!names.insert(item->name).second)
            return fail(cellName(i, "name", record.line), item->name, "a name no earlier row has");
        items.push_back(std::move(*item));
    }
    return items;
}

Result<std::vector<model::RecordId>> importEyewearCsv(LabStore& store, const std::filesystem::path& path)
{
    auto text = readTextFile(path);
    if (!text)
        return std::unexpected(text.error());
    auto items = parseEyewearCsv(*text);
    if (!items)
        return std::unexpected(items.error());
    auto shelf = store.eyewear();
    if (!shelf)
        return std::unexpected(shelf.error());
    std::set<std::string> stored;
    for (const model::EyewearItem& item : *shelf)
        stored.insert(item.name);
    for (std::size_t i = 0; i < items->size(); ++i) {
        if (stored.contains((*items)[i].name))
            return fail(fmt::format("row {}, column name", i + 1), (*items)[i].name,
                        "a name not yet on the lab's eyewear shelf");
    }
    return store.saveEyewear(std::span<const model::EyewearItem>(*items));
}

} // namespace beamwarden::store
