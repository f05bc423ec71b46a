#include "store/csv.hpp"

namespace beamwarden::store {

namespace {

constexpr std::string_view kByteOrderMark = "\xEF\xBB\xBF";

std::string trimmed(std::string_view text)
{
    const auto first = text.find_first_not_of(" \t");
    if (first == std::string_view::npos)
        return {};
    const auto last = text.find_last_not_of(" \t");
    return std::string(text.substr(first, last - first + 1));
}

bool isBlank(const CsvRecord& record)
{
    return record.fields.size() == 1 && record.fields.front().empty();
}

} // namespace

Result<std::vector<CsvRecord>> parseCsv(std::string_view text)
{
    if (text.starts_with(kByteOrderMark))
        text.remove_prefix(kByteOrderMark.size());
    std::vector<CsvRecord> records;
    CsvRecord record{1, {}};
    std::size_t line = 1;
    std::size_t i = 0;
    const auto endRecord = [&] {
        if (!isBlank(record))
            records.push_back(std::move(record));
        record = CsvRecord{line, {}};
    };
    while (i <= text.size()) {
        // One field per pass, starting at text[i].
        std::string field;
        if (i < text.size() && text[i] == '"') {
            const std::size_t startLine = line;
            ++i;
            for (;;) {
                if (i >= text.size())
                    return fail("line " + std::to_string(startLine), "\"" + field.substr(0, 20),
                                "a quoted field closed by a second quote");
                if (text[i] == '"') {
                    if (i + 1 < text.size() && text[i + 1] == '"') {
                        field += '"';
                        i += 2;
                        continue;
                    }
                    ++i;
                    break;
                }
                if (text[i] == '\n')
                    ++line;
                field += text[i++];
            }
        } else {
            const std::size_t end = text.find_first_of(",\r\n", i);
            const std::size_t stop = end == std::string_view::npos ? text.size() : end;
            field = trimmed(text.substr(i, stop - i));
            i = stop;
        }
        record.fields.push_back(std::move(field));
        if (i >= text.size()) {
            endRecord();
            break;
        }
        if (text[i] == ',') {
            ++i;
            continue;
        }
        if (text[i] == '\r' && i + 1 < text.size() && text[i + 1] == '\n')
            ++i;
        if (text[i] == '\n' || text[i] == '\r') {
            ++i;
            ++line;
            endRecord();
            if (i == text.size())
                break;
            continue;
        }
        // Only a quoted field can stop before a separator: something follows its closing quote.
        return fail("line " + std::to_string(line), std::string(text.substr(i, 20)),
                    "a comma or line end after a closing quote");
    }
    return records;
}

} // namespace beamwarden::store
