#pragma once
// Typed, path-aware reading of one JSON object for the lab import: every refusal names the field by its path
// (e.g. "lasers[2].outputs[0].beam.diameter_m"), and keys nobody read are refused, so a typo is never ignored.
#include "beamwarden/error.hpp"

#include <nlohmann/json.hpp>

#include <optional>
#include <set>
#include <string>
#include <string_view>

namespace beamwarden::store {

class JsonFields {
public:
    [[nodiscard]] static Result<JsonFields> of(const nlohmann::json& value, std::string path);

    [[nodiscard]] const std::string& path() const { return m_path; }
    [[nodiscard]] std::string pathOf(std::string_view key) const;

    // Without a fallback the key is required.
    [[nodiscard]] Result<std::string> text(std::string_view key, std::optional<std::string> fallback = {});
    [[nodiscard]] Result<double> number(std::string_view key, std::optional<double> fallback = {});
    [[nodiscard]] Result<int> integer(std::string_view key, std::optional<int> fallback = {});
    [[nodiscard]] Result<bool> flag(std::string_view key, std::optional<bool> fallback = {});
    // A list (empty when the key is absent and not required) and an optional object (nullptr when absent).
    [[nodiscard]] Result<const nlohmann::json*> list(std::string_view key, bool required = false);
    [[nodiscard]] Result<const nlohmann::json*> object(std::string_view key, bool required = false);
    [[nodiscard]] Result<std::vector<std::string>> texts(std::string_view key);

    // Refuses the first key none of the readers above asked for.
    [[nodiscard]] Result<void> noOtherKeys() const;

private:
    JsonFields(const nlohmann::json& value, std::string path) : m_value(&value), m_path(std::move(path)) {}
    [[nodiscard]] const nlohmann::json* find(std::string_view key);

    const nlohmann::json* m_value;
    std::string m_path;
    std::set<std::string, std::less<>> m_read;
};

// A short rendering of a JSON value for an error message.
[[nodiscard]] std::string shortDump(const nlohmann::json& value);

} // namespace beamwarden::store
