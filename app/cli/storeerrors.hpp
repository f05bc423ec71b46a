#pragma once
// How the lab verbs report a store error: refused input (exit 2) names the field; a failure while working (exit 1)
// says what SQLite or the file system reported.
#include "beamwarden/error.hpp"

#include <string_view>

namespace beamwarden::cli {

int reportStoreError(std::string_view verb, const InputError& error);

} // namespace beamwarden::cli
