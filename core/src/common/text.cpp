#include "beamwarden/text.hpp"

namespace beamwarden::text {

namespace {

constexpr std::string_view kReplacement = "\xEF\xBF\xBD"; // U+FFFD
constexpr std::string_view kEllipsis = "\xE2\x80\xA6";    // U+2026

// Length of the well-formed UTF-8 sequence at the start of `text`, or 0. Overlong forms, surrogates and
// code points past U+10FFFF are refused, as the Unicode standard's table of well-formed sequences says.
std::size_t sequenceLength(std::string_view text)
{
    const auto byteAt = [text](std::size_t i) { return static_cast<unsigned char>(text[i]); };
    const unsigned char lead = byteAt(0);
    if (lead < 0x80)
        return 1;
    std::size_t length = 0;
    unsigned char secondMin = 0x80;
    unsigned char secondMax = 0xBF;
    if (lead >= 0xC2 && lead <= 0xDF) {
        length = 2;
    } else if (lead >= 0xE0 && lead <= 0xEF) {
        length = 3;
        if (lead == 0xE0)
            secondMin = 0xA0;
        if (lead == 0xED)
            secondMax = 0x9F;
    } else if (lead >= 0xF0 && lead <= 0xF4) {
        length = 4;
        if (lead == 0xF0)
            secondMin = 0x90;
        if (lead == 0xF4)
            secondMax = 0x8F;
    } else {
        return 0;
    }
    if (text.size() < length || byteAt(1) < secondMin || byteAt(1) > secondMax)
        return 0;
    for (std::size_t i = 2; i < length; ++i) {
        if (byteAt(i) < 0x80 || byteAt(i) > 0xBF)
            return 0;
    }
    return length;
}

bool isControl(unsigned char byte)
{
    return byte < 0x20 || byte == 0x7F;
}

} // namespace

bool isValidUtf8(std::string_view text)
{
    while (!text.empty()) {
        const std::size_t length = sequenceLength(text);
        if (length == 0)
            return false;
        text.remove_prefix(length);
    }
    return true;
}

std::size_t characterCount(std::string_view text)
{
    std::size_t count = 0;
    while (!text.empty()) {
        const std::size_t length = sequenceLength(text);
        text.remove_prefix(length == 0 ? 1 : length);
        ++count;
    }
    return count;
}

bool hasControlCharacter(std::string_view text)
{
    for (const char c : text) {
        if (isControl(static_cast<unsigned char>(c)))
            return true;
    }
    return false;
}

std::string displayable(std::string_view text, std::size_t maxBytes)
{
    std::string out;
    while (!text.empty()) {
        const std::size_t length = sequenceLength(text);
        std::string_view piece = text.substr(0, length == 0 ? 1 : length);
        if (length == 0) {
            piece = kReplacement;
        } else if (length == 1) {
            const auto byte = static_cast<unsigned char>(text.front());
            if (byte == '\t' || byte == '\n' || byte == '\r' || byte == '\v' || byte == '\f')
                piece = " ";
            else if (isControl(byte))
                piece = kReplacement;
        }
        if (out.size() + piece.size() > maxBytes) {
            out += kEllipsis;
            break;
        }
        out += piece;
        text.remove_prefix(length == 0 ? 1 : length);
    }
    return out;
}

} // namespace beamwarden::text
