#include "store/jsonfields.hpp"

#include "store/recordcheck.hpp"

#include <cmath>
#include <limits>

namespace beamwarden::store {

namespace {

constexpr std::size_t kDumpLength = 40;

std::unexpected<InputError> missing(const std::string& path, std::string_view kind)
{
    return fail(path, "", std::string(kind) + " (required)");
}

} // namespace

std::string shortDump(const nlohmann::json& value)
{
    std::string text = value.is_string() ? value.get<std::string>() : value.dump();
    if (text.size() > kDumpLength)
        text = text.substr(0, kDumpLength) + "...";
    return text;
}

Result<JsonFields> JsonFields::of(const nlohmann::json& value, std::string path)
{
    if (!value.is_object())
        return fail(path.empty() ? "document" : path, shortDump(value), "an object { ... }");
    return JsonFields(value, std::move(path));
}

std::string JsonFields::pathOf(std::string_view key) const
{
    return joinPath(m_path, key);
}

const nlohmann::json* JsonFields::find(std::string_view key)
{
    m_read.insert(std::string(key));
    const auto found = m_value->find(key);
    return found == m_value->end() ? nullptr : &*found;
}

Result<std::string> JsonFields::text(std::string_view key, std::optional<std::string> fallback)
{
    const nlohmann::json* value = find(key);
    if (value == nullptr) {
        if (!fallback)
            return missing(pathOf(key), "text");
        return *fallback;
    }
    if (!value->is_string())
        return fail(pathOf(key), shortDump(*value), "text in quotes");
    return value->get<std::string>();
}

Result<double> JsonFields::number(std::string_view key, std::optional<double> fallback)
{
    const nlohmann::json* value = find(key);
    if (value == nullptr) {
        if (!fallback)
            return missing(pathOf(key), "a number");
        return *fallback;
    }
    if (!value->is_number())
        return fail(pathOf(key), shortDump(*value), "a number in the unit the key names");
    return value->get<double>();
}

Result<int> JsonFields::integer(std::string_view key, std::optional<int> fallback)
{
    const nlohmann::json* value = find(key);
    if (value == nullptr) {
        if (!fallback)
            return missing(pathOf(key), "a whole number");
        return *fallback;
    }
    if (value->is_number_integer()) {
        const auto n = value->get<std::int64_t>();
        if (n >= std::numeric_limits<int>::min() && n <= std::numeric_limits<int>::max())
            return static_cast<int>(n);
    }
    return fail(pathOf(key), shortDump(*value), "a whole number");
}

Result<bool> JsonFields::flag(std::string_view key, std::optional<bool> fallback)
{
    const nlohmann::json* value = find(key);
    if (value == nullptr) {
        if (!fallback)
            return missing(pathOf(key), "true or false");
        return *fallback;
    }
    if (!value->is_boolean())
        return fail(pathOf(key), shortDump(*value), "true or false");
    return value->get<bool>();
}

Result<const nlohmann::json*> JsonFields::list(std::string_view key, bool required)
{
    static const nlohmann::json empty = nlohmann::json::array();
    const nlohmann::json* value = find(key);
    if (value == nullptr) {
        if (required)
            return missing(pathOf(key), "a list [ ... ]");
        return &empty;
    }
    if (!value->is_array())
        return fail(pathOf(key), shortDump(*value), "a list [ ... ]");
    return value;
}

Result<const nlohmann::json*> JsonFields::object(std::string_view key, bool required)
{
    const nlohmann::json* value = find(key);
    if (value == nullptr) {
        if (required)
            return missing(pathOf(key), "an object { ... }");
        return static_cast<const nlohmann::json*>(nullptr);
    }
    if (!value->is_object())
        return fail(pathOf(key), shortDump(*value), "an object { ... }");
    return value;
}

Result<std::vector<std::string>> JsonFields::texts(std::string_view key)
{
    auto items = list(key);
    if (!items)
        return std::unexpected(items.error());
    std::vector<std::string> result;
    for (std::size_t i = 0; i < (*items)->size(); ++i) {
        const nlohmann::json& item = (**items)[i];
        if (!item.is_string())
            return fail(indexPath(m_path, key, i), shortDump(item), "text in quotes");
        result.push_back(item.get<std::string>());
    }
    return result;
}

Result<void> JsonFields::noOtherKeys() const
{
    for (const auto& [key, value] : m_value->items()) {
        if (!m_read.contains(key))
            return fail(pathOf(key), shortDump(value), "only the keys docs/lab-export.md lists for this object");
    }
    return {};
}

} // namespace beamwarden::store
