#pragma once
// The small glue every fuzz target shares: the input as text, and a broken promise turned into a crash, so libFuzzer
// keeps the input that broke it exactly as it keeps one that crashed.
#include <cstddef>
#include <cstdint>
#include <cstdio>
#include <cstdlib>
#include <span>
#include <string>
#include <string_view>

namespace fuzzsupport {

inline std::string_view text(const std::uint8_t* data, std::size_t size)
{
    return {reinterpret_cast<const char*>(data), size};
}

inline std::span<const std::uint8_t> bytes(const std::uint8_t* data, std::size_t size)
{
    return {data, size};
}

inline void require(const std::string& brokenPromise)
{
    if (brokenPromise.empty())
        return;
    std::fprintf(stderr, "broken promise: %s\n", brokenPromise.c_str());
    std::abort();
}

} // namespace fuzzsupport
