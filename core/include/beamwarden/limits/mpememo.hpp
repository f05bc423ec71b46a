#pragma once
// Remembering MPE evaluations within one piece of work. An assessment asks for the same limit many times: every
// exposure case of an output at the same wavelengths, durations and source size, and the skin for every case. While an
// MpeMemo lives, evaluateMpe on the same thread answers a request it has seen before from memory. evaluateMpe is a
// pure function of its request, so the answers are the same to the last bit; the memo only saves the work. It is
// bounded, so a long search over source angles cannot grow it without end.
#include "beamwarden/limits/mpe.hpp"

#include <array>
#include <cstddef>
#include <cstdint>
#include <unordered_map>

namespace beamwarden::limits {

class MpeMemo {
public:
    static constexpr std::size_t kMaxEntries = 16384; // ~40 MB of results at most, freed with the memo

    MpeMemo();  // becomes the thread's active memo (memos nest: the inner one is active until it ends)
    ~MpeMemo(); // the previous memo, if any, becomes active again
    MpeMemo(const MpeMemo&) = delete;
    MpeMemo& operator=(const MpeMemo&) = delete;

    [[nodiscard]] static MpeMemo* active();

    // While a Pause lives, this thread's evaluations are neither looked up nor remembered: for searches whose
    // requests never come back (trial source angles), so that they do not crowd out those that do.
    class Pause {
    public:
        Pause();
        ~Pause();
        Pause(const Pause&) = delete;
        Pause& operator=(const Pause&) = delete;

    private:
        MpeMemo* m_paused;
    };

    [[nodiscard]] const Result<MpeResult>* find(const MpeRequest& request) const;
    void remember(const MpeRequest& request, const Result<MpeResult>& result);

    [[nodiscard]] std::size_t size() const { return m_results.size(); }
    [[nodiscard]] std::size_t hits() const { return m_hits; }

private:
    // Every field of the request, doubles by their bits: equal keys mean equal requests.
    struct Key {
        std::array<std::uint64_t, 8> numbers{};
        std::uint32_t flags = 0;
        bool operator==(const Key&) const = default;
    };
    struct KeyHash {
        std::size_t operator()(const Key& key) const;
    };
    static Key keyOf(const MpeRequest& request);

    std::unordered_map<Key, Result<MpeResult>, KeyHash> m_results;
    mutable std::size_t m_hits = 0;
    MpeMemo* m_previous = nullptr;
};

} // namespace beamwarden::limits
