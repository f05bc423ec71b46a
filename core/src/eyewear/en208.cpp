// EN 208 alignment eyewear (hazard-and-eyewear.md section 7).
#include "beamwarden/eyewear/en208.hpp"

#include "beamwarden/hazard/geometry.hpp"
#include "beamwarden/text.hpp"

#include <algorithm>
#include <cctype>
#include <charconv>
#include <cmath>
#include <fmt/core.h>
#include <numbers>

namespace beamwarden::eyewear {

namespace {

constexpr std::string_view kField = "en208 marking";
constexpr double kPupilArea_m2 = std::numbers::pi * 7e-3 * 7e-3 / 4.0;

// "2x10^-4", "2×10^-4", "2e-4", "0.0002"
bool parseScientific(std::string text, double& value)
{
    for (const std::string_view times : {"\xC3\x97", "x", "X"}) {
        const auto at = text.find(times);
        if (at != std::string::npos && text.compare(at + times.size(), 3, "10^") == 0)
            text = text.substr(0, at) + "e" + text.substr(at + times.size() + 3);
    }
    const auto [end, ec] = std::from_chars(text.data(), text.data() + text.size(), value);
    return ec == std::errc{} && end == text.data() + text.size() && std::isfinite(value) && value > 0.0;
}

std::vector<std::string> split(std::string_view text)
{
    std::vector<std::string> parts;
    std::string current;
    for (const char c : text) {
        if (std::isspace(static_cast<unsigned char>(c)) != 0) {
            if (!current.empty())
                parts.push_back(std::move(current));
            current.clear();
        } else {
            current += c;
        }
    }
    if (!current.empty())
        parts.push_back(std::move(current));
    return parts;
}

std::string scientific(double value)
{
    const int exponent = static_cast<int>(std::floor(std::log10(value)));
    const double mantissa = value / std::pow(10.0, exponent);
    if (exponent >= -2 && exponent <= 2)
        return fmt::format("{:g}", value);
    return fmt::format("{:g}x10^{}", std::round(mantissa * 1000.0) / 1000.0, exponent);
}

} // namespace

Result<En208Marking> parseEn208(std::string_view text)
{
    if (!text::isValidUtf8(text))
        return fail(std::string(kField), std::string(text),
                    "an EN 208 marking in UTF-8 text (this one holds bytes that are not UTF-8)");
    const std::vector<std::string> parts = split(text);
    if (parts.empty())
        return fail(std::string(kField), "", "an EN 208 marking such as '1 W 2x10^-4 J 532 RB3'");
    En208Marking marking;
    for (std::size_t i = 0; i < parts.size(); ++i) {
        const std::string& p = parts[i];
        if (p.starts_with("RB")) {
            int level = 0;
            const auto [end, ec] = std::from_chars(p.data() + 2, p.data() + p.size(), level);
            if (ec != std::errc{} || end != p.data() + p.size() || level < 1 || level > 5 || i + 1 != parts.size())
                return fail(std::string(kField), p, "an alignment level RB1 to RB5 at the end");
            marking.level = level;
        } else if (i + 1 < parts.size() && (parts[i + 1] == "W" || parts[i + 1] == "J")) {
            double value = 0.0;
            if (!parseScientific(p, value))
                return fail(std::string(kField), p, "a number before W or J, e.g. 1 W or 2x10^-4 J");
            (parts[i + 1] == "W" ? marking.maxPower_W : marking.maxPulseEnergy_J) = value;
            ++i;
        } else {
            auto term = parseEn207(p + " D LB1"); // reuse the wavelength grammar of EN 207 markings
            if (!term)
                return fail(std::string(kField), p, "a wavelength in nm, a range such as 630-640, or 'W'/'J' values");
            marking.wavelengths = term->terms.front().wavelengths;
        }
    }
    if (marking.level == 0)
        return fail(std::string(kField), std::string(text), "an alignment level RB1 to RB5");
    if (marking.wavelengths.empty())
        return fail(std::string(kField), std::string(text), "the wavelength the filter is for");
    return marking;
}

std::string format(const En208Marking& marking)
{
    std::string out;
    if (marking.maxPower_W > 0.0)
        out += scientific(marking.maxPower_W) + " W ";
    if (marking.maxPulseEnergy_J > 0.0)
        out += scientific(marking.maxPulseEnergy_J) + " J ";
    En207Marking carrier{{MarkingTerm{marking.wavelengths, 1, 1, false}}};
    std::string wl = format(carrier);
    wl = wl.substr(0, wl.find(" D LB1"));
    return out + wl + fmt::format(" RB{}", marking.level);
}

Result<AlignmentRequirement> requiredAlignmentLevel(const hazard::HazardRequest& raw)
{
    auto emission = model::completeAndValidate(raw.emission);
    if (!emission)
        return std::unexpected(emission.error());
    const model::Emission& e = *emission;
    AlignmentRequirement req;
    req.visible = e.spectrum.shortest().nanometres() >= 400.0 && e.spectrum.longest().nanometres() <= 700.0;

    const hazard::PointGeometry point = hazard::geometryAt(raw.exposureCase, raw.beam, raw.exposureCase.distance.si());
    double through7mm = point.powerFactor;
    if (point.pointSource)
        through7mm *= point.pointIrradiancePerWatt * kPupilArea_m2;
    else if (point.d63_m > 7e-3)
        through7mm *= (7e-3 / point.d63_m) * (7e-3 / point.d63_m);
    through7mm = std::min(through7mm, 1.0);

    req.powerThrough7mm = e.averagePower.si() * through7mm;
    double n = std::log10(req.powerThrough7mm) + 3.0;
    req.basis = fmt::format("mean power through 7 mm {}", units::format(units::Power::fromSi(req.powerThrough7mm)));
    const double tp = e.pulseDuration.seconds();
    if (e.pulsed && tp >= 1e-9 && tp <= 2e-4) {
        const double pulsesIn10s = std::max(1.0, 10.0 * e.pulsesPerSecond());
        req.correctedPulseEnergy = e.pulseEnergy.si() * through7mm * std::pow(pulsesIn10s, 0.25);
        n = std::max(n, std::log10(req.correctedPulseEnergy / 2.0) + 7.0);
        req.basis += fmt::format("; pulse energy through 7 mm x N^(1/4), N = {:.4g} in 10 s: {}", pulsesIn10s,
                                 units::format(units::Energy::fromSi(req.correctedPulseEnergy)));
    }
    const int level = static_cast<int>(std::ceil(n - 1e-12));
    req.level = std::clamp(level, 1, 6);
    return req;
}

} // namespace beamwarden::eyewear
