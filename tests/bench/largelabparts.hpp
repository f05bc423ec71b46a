#pragma once
// The pieces of the large lab (largelab.hpp): a random source that gives the same numbers on every platform, and
// one maker per kind of record.
#include "beamwarden/model/records.hpp"

#include <cmath>
#include <cstdint>
#include <string>
#include <vector>

namespace beamwarden::bench {

// splitmix64: std::mt19937 is portable but the standard distributions are not, so the numbers are drawn here.
class Random {
public:
    explicit Random(std::uint64_t seed) : m_state(seed) {}

    std::uint64_t next()
    {
        std::uint64_t z = (m_state += 0x9e3779b97f4a7c15ULL);
        z = (z ^ (z >> 30U)) * 0xbf58476d1ce4e5b9ULL;
        z = (z ^ (z >> 27U)) * 0x94d049bb133111ebULL;
        return z ^ (z >> 31U);
    }
    // [0, 1) with 53 random bits.
    double unit() { return static_cast<double>(next() >> 11U) * 0x1.0p-53; }
    double uniform(double lo, double hi) { return lo + (hi - lo) * unit(); }
    // Spread evenly over the decades between lo and hi (powers, energies, rates).
    double logUniform(double lo, double hi) { return lo * std::pow(hi / lo, unit()); }
    int index(int count) { return static_cast<int>(next() % static_cast<std::uint64_t>(count)); }
    bool chance(double p) { return unit() < p; }
    template <typename T>
    const T& pick(const std::vector<T>& from)
    {
        return from[static_cast<std::size_t>(index(static_cast<int>(from.size())))];
    }

private:
    std::uint64_t m_state;
};

// The lab's rooms, their names as "B101", "B102", ...
[[nodiscard]] model::Lab makeLargeLabRecord(int roomCount);

// Laser number `number` (from 1), of a kind drawn from the lab's mix, in one of `rooms`.
[[nodiscard]] model::Laser makeLaser(Random& random, int number, const std::vector<model::Room>& rooms);

// Eyewear item number `number` (from 1): a filter family with its EN 207 (or EN 208) markings and OD table.
[[nodiscard]] model::EyewearItem makeEyewear(Random& random, int number, const std::vector<model::Room>& rooms);

// `count` assessments of one stored laser over the years, oldest first: approved ones (out of date once the laser
// changed), withdrawn ones, some in review and a draft, each with the sign-offs that led to its status. `results`
// and `snapshot` are the JSON the store keeps with each.
[[nodiscard]] std::vector<model::Assessment> makeHistory(Random& random, const model::Laser& laser, int count,
                                                         const std::string& snapshot, const std::string& results);

} // namespace beamwarden::bench
