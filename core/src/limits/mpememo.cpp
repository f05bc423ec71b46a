#include "beamwarden/limits/mpememo.hpp"

#include <bit>

namespace beamwarden::limits {

namespace {

thread_local MpeMemo* t_active = nullptr;

std::uint64_t bits(double value)
{
    return std::bit_cast<std::uint64_t>(value);
}

} // namespace

MpeMemo::MpeMemo() : m_previous(t_active)
{
    t_active = this;
}

MpeMemo::~MpeMemo()
{
    t_active = m_previous;
}

MpeMemo::Pause::Pause() : m_paused(t_active)
{
    t_active = nullptr;
}

MpeMemo::Pause::~Pause()
{
    t_active = m_paused;
}

MpeMemo* MpeMemo::active()
{
    return t_active;
}

MpeMemo::Key MpeMemo::keyOf(const MpeRequest& request)
{
    Key key;
    key.numbers[0] = bits(request.wavelength.si());
    key.numbers[1] = bits(request.duration.si());
    key.numbers[2] = bits(request.sourceAngle.si());
    key.numbers[3] = bits(request.skinArea.si());
    std::uint32_t flags = static_cast<std::uint32_t>(request.target) | static_cast<std::uint32_t>(request.rules) << 2U |
                          static_cast<std::uint32_t>(request.c5) << 4U;
    if (request.train) {
        flags |= 1U << 6U;
        key.numbers[4] = bits(request.train->prf.si());
        key.numbers[5] = bits(request.train->exposure.si());
        if (request.train->burst) {
            flags |= 1U << 7U;
            key.numbers[6] = static_cast<std::uint64_t>(request.train->burst->pulsesPerBurst);
            key.numbers[7] = bits(request.train->burst->burstRate.si());
        }
    }
    key.flags = flags;
    return key;
}

std::size_t MpeMemo::KeyHash::operator()(const Key& key) const
{
    // A multiply-and-rotate mix per word: cheap, and the wavelengths of a band differ only in their low bits.
    std::uint64_t h = 0x9e3779b97f4a7c15ULL ^ key.flags;
    for (const std::uint64_t word : key.numbers) {
        h ^= word * 0xff51afd7ed558ccdULL;
        h = std::rotl(h, 29) * 0xc4ceb9fe1a85ec53ULL;
    }
    return static_cast<std::size_t>(h ^ (h >> 32U));
}

const Result<MpeResult>* MpeMemo::find(const MpeRequest& request) const
{
    const auto found = m_results.find(keyOf(request));
    if (found == m_results.end())
        return nullptr;
    ++m_hits;
    return &found->second;
}

void MpeMemo::remember(const MpeRequest& request, const Result<MpeResult>& result)
{
    if (m_results.size() < kMaxEntries)
        m_results.emplace(keyOf(request), result);
}

} // namespace beamwarden::limits
