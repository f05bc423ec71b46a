#pragma once
// Early return for Result values inside the lab import's readers, which check dozens of fields in a row: the
// error of the first failed step goes back to the caller unchanged. Used only in core/src/store.
#include "beamwarden/error.hpp"

#include <utility>

// Declares `target` as the value of the Result `expression`, or returns its error.
#define BW_TRY(target, expression)                                                                                     \
    auto target##Result = (expression);                                                                                \
    if (!target##Result)                                                                                               \
        return std::unexpected(target##Result.error());                                                                \
    auto target = std::move(*target##Result)

// Returns the error of the Result<void> `expression`, if any.
#define BW_CHECK(expression)                                                                                           \
    if (auto checked = (expression); !checked)                                                                         \
    return std::unexpected(checked.error())

namespace beamwarden::store {

// A parse*() refusal re-labelled with the JSON path of the field it came from.
template <typename T>
Result<T> parsedAs(Result<T> parsed, const std::string& path)
{
    if (!parsed)
        return fail(path, parsed.error().value, parsed.error().allowed);
    return parsed;
}

} // namespace beamwarden::store
