#pragma once
// What counts as text at the edges (names, markings, cells, flags) and how input is quoted back in a message, so
// that every reader refuses alike and no message carries a raw byte or a terminal control sequence.
#include <cstddef>
#include <limits>
#include <string>
#include <string_view>

namespace beamwarden::text {

// Well-formed UTF-8 as the Unicode standard's table of well-formed sequences defines it: no overlong forms, no
// surrogates, nothing past U+10FFFF.
[[nodiscard]] bool isValidUtf8(std::string_view text);

// Characters (code points) in well-formed UTF-8; a byte that starts no well-formed sequence counts as one.
[[nodiscard]] std::size_t characterCount(std::string_view text);

// True if the text holds a C0 control character or DEL (tab and line breaks included).
[[nodiscard]] bool hasControlCharacter(std::string_view text);

// Text that is safe to put in a message or a JSON file: invalid UTF-8 and control characters become U+FFFD (tabs
// and line breaks a space), and anything longer than `maxBytes` is cut at a character boundary with "…".
[[nodiscard]] std::string displayable(std::string_view text,
                                      std::size_t maxBytes = std::numeric_limits<std::size_t>::max());

} // namespace beamwarden::text
