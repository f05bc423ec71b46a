// EN 207 marking grammar (hazard-and-eyewear.md section 6.7, a Beamwarden design on the published forms):
// line = term { "+" term }; term = [wavelengths] modes level | modes wavelengths level;
// wavelengths = value ["-" value] { "/" value } with optional "nm"; modes = letters of D I R M, no repeats;
// level = ("LB" | "L") 1..10 ["Y"].
#include "beamwarden/eyewear/marking.hpp"

#include "beamwarden/text.hpp"

#include <algorithm>
#include <array>
#include <cctype>
#include <charconv>
#include <cmath>
#include <fmt/core.h>

namespace beamwarden::eyewear {

namespace {

constexpr std::string_view kField = "marking";
// Real markings run to a few dozen characters; this bounds a pasted page, not any marking.
constexpr std::size_t kMaxPrintedLength = 500;

std::string trim(std::string_view s)
{
    while (!s.empty() && std::isspace(static_cast<unsigned char>(s.front())) != 0)
        s.remove_prefix(1);
    while (!s.empty() && std::isspace(static_cast<unsigned char>(s.back())) != 0)
        s.remove_suffix(1);
    return std::string(s);
}

// One spelling before tokenising: dashes as '-', no spaces around '-' and '/', "nm" detached.
std::string normalise(std::string_view text)
{
    std::string s;
    for (std::size_t i = 0; i < text.size(); ++i) {
        // U+2013 EN DASH and U+2212 MINUS SIGN in UTF-8
        if (text.substr(i, 3) == "\xE2\x80\x93" || text.substr(i, 3) == "\xE2\x88\x92") {
            s += '-';
            i += 2;
            continue;
        }
        s += text[i];
    }
    std::string out;
    for (std::size_t i = 0; i < s.size(); ++i) {
        const char c = s[i];
        if (c == '-' || c == '/') {
            while (!out.empty() && out.back() == ' ')
                out.pop_back();
            out += c;
            while (i + 1 < s.size() && s[i + 1] == ' ')
                ++i;
            continue;
        }
        out += c;
    }
    return out;
}

std::vector<std::string> tokens(const std::string& s)
{
    std::vector<std::string> out;
    std::string current;
    for (const char c : s) {
        if (std::isspace(static_cast<unsigned char>(c)) != 0) {
            if (!current.empty())
                out.push_back(std::move(current));
            current.clear();
        } else {
            current += c;
        }
    }
    if (!current.empty())
        out.push_back(std::move(current));
    return out;
}

bool parseNumber(std::string_view text, double& value)
{
    if (text.ends_with("nm"))
        text.remove_suffix(2);
    if (text.empty())
        return false;
    const auto [end, ec] = std::from_chars(text.data(), text.data() + text.size(), value);
    return ec == std::errc{} && end == text.data() + text.size() && value >= 180.0 && value <= 1e6;
}

bool looksLikeWavelength(const std::string& token)
{
    return !token.empty() && std::isdigit(static_cast<unsigned char>(token.front())) != 0;
}

Result<std::vector<WavelengthSpan>> parseWavelengths(const std::string& token)
{
    std::vector<WavelengthSpan> spans;
    std::string_view rest = token;
    while (true) {
        const auto slash = rest.find('/');
        const std::string_view item = rest.substr(0, slash);
        const auto dash = item.find('-');
        WavelengthSpan span;
        const bool ok = dash == std::string_view::npos ? parseNumber(item, span.from_nm)
                                                       : parseNumber(item.substr(0, dash), span.from_nm) &&
                                                             parseNumber(item.substr(dash + 1), span.to_nm);
        if (dash == std::string_view::npos)
            span.to_nm = span.from_nm;
        if (!ok || span.to_nm < span.from_nm)
            return fail(std::string(kField), std::string(item),
                        "a wavelength in nm (180 to 1000000), a range such as 740-1100, or values joined by '/'");
        spans.push_back(span);
        if (slash == std::string_view::npos)
            break;
        rest = rest.substr(slash + 1);
    }
    return spans;
}

Result<std::uint8_t> parseModes(const std::string& token)
{
    std::uint8_t modes = 0;
    for (const char c : token) {
        const std::string_view letters = "DIRM";
        const auto index = letters.find(c);
        if (index == std::string_view::npos)
            return fail(std::string(kField), token, "test-mode letters from D, I, R, M");
        const auto bit = static_cast<std::uint8_t>(1U << index);
        if ((modes & bit) != 0)
            return fail(std::string(kField), token, "each test-mode letter once");
        modes = static_cast<std::uint8_t>(modes | bit);
    }
    return modes;
}

bool isLevel(const std::string& token)
{
    return token.size() >= 2 && token[0] == 'L' &&
           (std::isdigit(static_cast<unsigned char>(token[1])) != 0 || (token[1] == 'B' && token.size() >= 3));
}

Result<MarkingTerm> parseLevel(const std::string& token, MarkingTerm term)
{
    std::string_view digits = token;
    digits.remove_prefix(token.starts_with("LB") ? 2 : 1);
    if (digits.ends_with('Y')) {
        term.notTestedAtLowRates = true;
        digits.remove_suffix(1);
    }
    int level = 0;
    const auto [end, ec] = std::from_chars(digits.data(), digits.data() + digits.size(), level);
    if (ec != std::errc{} || end != digits.data() + digits.size() || level < 1 || level > 10)
        return fail(std::string(kField), token, "a protection level LB1 to LB10 (optionally with Y)");
    term.level = level;
    return term;
}

Result<MarkingTerm> parseTerm(const std::string& text, const std::vector<WavelengthSpan>& inherited)
{
    const std::vector<std::string> parts = tokens(text);
    if (parts.empty())
        return fail(std::string(kField), text, "a term such as '1064 D LB7' between '+' signs");
    MarkingTerm term;
    std::size_t i = 0;
    bool modesSeen = false;
    // [wavelengths] modes | modes [wavelengths], then the level
    for (; i < parts.size() && !isLevel(parts[i]); ++i) {
        if (parts[i] == "nm")
            continue;
        if (looksLikeWavelength(parts[i])) {
            if (!term.wavelengths.empty())
                return fail(std::string(kField), parts[i], "one wavelength group per term");
            auto w = parseWavelengths(parts[i]);
            if (!w)
                return std::unexpected(w.error());
            term.wavelengths = *w;
        } else {
            if (modesSeen)
                return fail(std::string(kField), parts[i], "the test modes once per term, e.g. 'DIR'");
            auto modes = parseModes(parts[i]);
            if (!modes)
                return std::unexpected(modes.error());
            term.modes = *modes;
            modesSeen = true;
        }
    }
    if (!modesSeen)
        return fail(std::string(kField), text, "test-mode letters (D, I, R, M) in the term");
    if (i == parts.size())
        return fail(std::string(kField), text, "a protection level such as LB7 at the end of the term");
    auto leveled = parseLevel(parts[i], term);
    if (!leveled)
        return std::unexpected(leveled.error());
    if (i + 1 != parts.size())
        return fail(std::string(kField), parts[i + 1], "nothing after the protection level but '+' and a new term");
    if (leveled->wavelengths.empty()) {
        if (inherited.empty())
            return fail(std::string(kField), text, "a wavelength in the first term, e.g. '1064 D LB7'");
        leveled->wavelengths = inherited;
    }
    return leveled;
}

// The shortest plain decimal that reads back as the same double: "{:g}" wrote 1000000 nm as "1e+06", whose '+'
// starts a new term on reading, and six fixed decimals printed 5320-5320.0000004 as the one wavelength 5320.
std::string formatNumber(double nm)
{
    std::array<char, 400> buffer{}; // fixed notation of any finite double fits (at most 309 integer digits)
    const auto [end, ec] = std::to_chars(buffer.data(), buffer.data() + buffer.size(), nm, std::chars_format::fixed);
    return ec == std::errc{} ? std::string(buffer.data(), end) : fmt::format("{:f}", nm);
}

std::string formatWavelengths(const std::vector<WavelengthSpan>& spans)
{
    std::string out;
    for (const WavelengthSpan& span : spans) {
        if (!out.empty())
            out += '/';
        out += formatNumber(span.from_nm);
        if (span.to_nm != span.from_nm)
            out += '-' + formatNumber(span.to_nm);
    }
    return out;
}

} // namespace

char letter(Mode mode)
{
    return "DIRM"[static_cast<std::size_t>(mode)];
}

bool MarkingTerm::covers(double lambda_nm) const
{
    return std::any_of(wavelengths.begin(), wavelengths.end(),
                       [&](const WavelengthSpan& s) { return s.contains(lambda_nm); });
}

Result<En207Marking> parseEn207(std::string_view text)
{
    // Other bytes would be taken for test-mode letters or numbers and refused with a reason that misleads.
    if (!text::isValidUtf8(text))
        return fail(std::string(kField), std::string(text),
                    "an EN 207 marking in UTF-8 text (this one holds bytes that are not UTF-8)");
    const std::string line = normalise(trim(text));
    if (line.empty())
        return fail(std::string(kField), "", "an EN 207 marking such as '1064 D LB7 + I LB8'");
    // The limit holds for the marking as format() prints it, since that is what is stored and read back: "+I L8"
    // prints as " + I LB8", so a typed line under the limit can print over it. The typed line only gets a looser
    // bound, to keep the work per line small.
    if (line.size() > 4 * kMaxPrintedLength)
        return fail(std::string(kField), line.substr(0, 40) + "...",
                    fmt::format("a marking of at most {} characters", kMaxPrintedLength));
    En207Marking marking;
    std::size_t start = 0;
    while (start <= line.size()) {
        const auto plus = line.find('+', start);
        const std::string part = line.substr(start, plus == std::string::npos ? std::string::npos : plus - start);
        auto term =
            parseTerm(part, marking.terms.empty() ? std::vector<WavelengthSpan>{} : marking.terms.back().wavelengths);
        if (!term)
            return std::unexpected(term.error());
        marking.terms.push_back(*term);
        if (plus == std::string::npos)
            break;
        start = plus + 1;
    }
    if (const std::string printed = format(marking); printed.size() > kMaxPrintedLength)
        return fail(std::string(kField), line.substr(0, 40) + "...",
                    fmt::format("a marking of at most {} characters as printed ('1064 D LB7 + I LB8'); this one "
                                "prints as {} characters",
                                kMaxPrintedLength, printed.size()));
    return marking;
}

std::string format(const En207Marking& marking)
{
    std::string out;
    const std::vector<WavelengthSpan>* previous = nullptr;
    for (const MarkingTerm& term : marking.terms) {
        if (!out.empty())
            out += " + ";
        if (previous == nullptr || *previous != term.wavelengths)
            out += formatWavelengths(term.wavelengths) + ' ';
        for (int m = 0; m < kModeCount; ++m) {
            if (term.has(static_cast<Mode>(m)))
                out += letter(static_cast<Mode>(m));
        }
        out += fmt::format(" LB{}{}", term.level, term.notTestedAtLowRates ? "Y" : "");
        previous = &term.wavelengths;
    }
    return out;
}

} // namespace beamwarden::eyewear
