#include "storeerrors.hpp"

#include "beamwarden/store/labstore.hpp"
#include "verbs.hpp"

#include <fmt/core.h>

#include <cstdio>

namespace beamwarden::cli {

int reportStoreError(std::string_view verb, const InputError& error)
{
    if (error.field == store::kStorageField) {
        fmt::print(stderr, "beamwarden-cli {}: failed while working: {}\n", verb, error.value);
        return kExitFailed;
    }
    fmt::print(stderr, "beamwarden-cli {}: {}\n", verb, error.message());
    return kExitBadInput;
}

} // namespace beamwarden::cli
