#pragma once
// Typed physical quantities. Each holds one SI double because laser quantities span some thirty decades
// (femtosecond pulses to eight-hour shifts, nanojoules to kilojoules), and the unit is spelled where the number
// is taken out, so a bare double never travels far. Prefixes and unit symbols exist only at the edges: the
// literals, parse*() and format().
#include <compare>
#include <concepts>
#include <numbers>
#include <string>
#include <string_view>

#include "beamwarden/error.hpp"

namespace beamwarden::units {

// Distinct tags keep a wavelength from being passed where a beam diameter is meant, though both are metres.
struct WavelengthTag {};
struct DurationTag {};
struct EnergyTag {};
struct PowerTag {};
struct RadiantExposureTag {};
struct IrradianceTag {};
struct AngleTag {};
struct FrequencyTag {};
struct LengthTag {};
struct AreaTag {};

template <typename Tag>
concept MetreTag = std::same_as<Tag, WavelengthTag> || std::same_as<Tag, LengthTag>;

template <typename Tag>
class Quantity {
public:
    constexpr Quantity() = default;

    [[nodiscard]] static constexpr Quantity fromSi(double value) { return Quantity{value}; }
    [[nodiscard]] constexpr double si() const { return m_si; }

    [[nodiscard]] constexpr double metres() const requires MetreTag<Tag> { return m_si; }
    [[nodiscard]] constexpr double kilometres() const requires MetreTag<Tag> { return m_si / 1e3; }
    [[nodiscard]] constexpr double centimetres() const requires MetreTag<Tag> { return m_si * 1e2; }
    [[nodiscard]] constexpr double millimetres() const requires MetreTag<Tag> { return m_si * 1e3; }
    [[nodiscard]] constexpr double micrometres() const requires MetreTag<Tag> { return m_si * 1e6; }
    [[nodiscard]] constexpr double nanometres() const requires MetreTag<Tag> { return m_si * 1e9; }

    [[nodiscard]] constexpr double hours() const requires std::same_as<Tag, DurationTag> { return m_si / 3600.0; }
    [[nodiscard]] constexpr double minutes() const requires std::same_as<Tag, DurationTag> { return m_si / 60.0; }
    [[nodiscard]] constexpr double seconds() const requires std::same_as<Tag, DurationTag> { return m_si; }
    [[nodiscard]] constexpr double milliseconds() const requires std::same_as<Tag, DurationTag> { return m_si * 1e3; }
    [[nodiscard]] constexpr double microseconds() const requires std::same_as<Tag, DurationTag> { return m_si * 1e6; }
    [[nodiscard]] constexpr double nanoseconds() const requires std::same_as<Tag, DurationTag> { return m_si * 1e9; }
    [[nodiscard]] constexpr double picoseconds() const requires std::same_as<Tag, DurationTag> { return m_si * 1e12; }
    [[nodiscard]] constexpr double femtoseconds() const requires std::same_as<Tag, DurationTag> { return m_si * 1e15; }

    [[nodiscard]] constexpr double joules() const requires std::same_as<Tag, EnergyTag> { return m_si; }
    [[nodiscard]] constexpr double millijoules() const requires std::same_as<Tag, EnergyTag> { return m_si * 1e3; }
    [[nodiscard]] constexpr double microjoules() const requires std::same_as<Tag, EnergyTag> { return m_si * 1e6; }
    [[nodiscard]] constexpr double nanojoules() const requires std::same_as<Tag, EnergyTag> { return m_si * 1e9; }

    [[nodiscard]] constexpr double kilowatts() const requires std::same_as<Tag, PowerTag> { return m_si / 1e3; }
    [[nodiscard]] constexpr double watts() const requires std::same_as<Tag, PowerTag> { return m_si; }
    [[nodiscard]] constexpr double milliwatts() const requires std::same_as<Tag, PowerTag> { return m_si * 1e3; }

    [[nodiscard]] constexpr double joulesPerSquareMetre() const requires std::same_as<Tag, RadiantExposureTag>
    {
        return m_si;
    }
    [[nodiscard]] constexpr double joulesPerSquareCentimetre() const requires std::same_as<Tag, RadiantExposureTag>
    {
        return m_si / 1e4;
    }

    [[nodiscard]] constexpr double wattsPerSquareMetre() const requires std::same_as<Tag, IrradianceTag>
    {
        return m_si;
    }
    [[nodiscard]] constexpr double wattsPerSquareCentimetre() const requires std::same_as<Tag, IrradianceTag>
    {
        return m_si / 1e4;
    }

    [[nodiscard]] constexpr double radians() const requires std::same_as<Tag, AngleTag> { return m_si; }
    [[nodiscard]] constexpr double milliradians() const requires std::same_as<Tag, AngleTag> { return m_si * 1e3; }
    [[nodiscard]] constexpr double microradians() const requires std::same_as<Tag, AngleTag> { return m_si * 1e6; }
    [[nodiscard]] constexpr double degrees() const requires std::same_as<Tag, AngleTag>
    {
        return m_si * 180.0 / std::numbers::pi;
    }

    [[nodiscard]] constexpr double hertz() const requires std::same_as<Tag, FrequencyTag> { return m_si; }
    [[nodiscard]] constexpr double kilohertz() const requires std::same_as<Tag, FrequencyTag> { return m_si / 1e3; }
    [[nodiscard]] constexpr double megahertz() const requires std::same_as<Tag, FrequencyTag> { return m_si / 1e6; }

    [[nodiscard]] constexpr double squareMetres() const requires std::same_as<Tag, AreaTag> { return m_si; }
    [[nodiscard]] constexpr double squareCentimetres() const requires std::same_as<Tag, AreaTag> { return m_si * 1e4; }
    [[nodiscard]] constexpr double squareMillimetres() const requires std::same_as<Tag, AreaTag> { return m_si * 1e6; }

    constexpr Quantity& operator+=(Quantity other)
    {
        m_si += other.m_si;
        return *this;
    }
    constexpr Quantity& operator-=(Quantity other)
    {
        m_si -= other.m_si;
        return *this;
    }
    constexpr Quantity& operator*=(double factor)
    {
        m_si *= factor;
        return *this;
    }
    constexpr Quantity& operator/=(double divisor)
    {
        m_si /= divisor;
        return *this;
    }

    [[nodiscard]] friend constexpr Quantity operator+(Quantity a, Quantity b) { return Quantity{a.m_si + b.m_si}; }
    [[nodiscard]] friend constexpr Quantity operator-(Quantity a, Quantity b) { return Quantity{a.m_si - b.m_si}; }
    [[nodiscard]] friend constexpr Quantity operator*(Quantity q, double factor) { return Quantity{q.m_si * factor}; }
    [[nodiscard]] friend constexpr Quantity operator*(double factor, Quantity q) { return Quantity{factor * q.m_si}; }
    [[nodiscard]] friend constexpr Quantity operator/(Quantity q, double divisor) { return Quantity{q.m_si / divisor}; }
    // A ratio of like quantities has no unit, so it leaves the type system as a plain number.
    [[nodiscard]] friend constexpr double operator/(Quantity a, Quantity b) { return a.m_si / b.m_si; }

    friend constexpr auto operator<=>(const Quantity&, const Quantity&) = default;

private:
    explicit constexpr Quantity(double value) : m_si(value) {}

    double m_si = 0.0;
};

using Wavelength = Quantity<WavelengthTag>;           // m
using Duration = Quantity<DurationTag>;               // s
using Energy = Quantity<EnergyTag>;                   // J
using Power = Quantity<PowerTag>;                     // W
using RadiantExposure = Quantity<RadiantExposureTag>; // J/m²
using Irradiance = Quantity<IrradianceTag>;           // W/m²
using Angle = Quantity<AngleTag>;                     // rad
using Frequency = Quantity<FrequencyTag>;             // Hz
using Length = Quantity<LengthTag>;                   // m
using Area = Quantity<AreaTag>;                       // m²

// Cross-type arithmetic only where the physics is one multiplication: W·s = J, J/m² and W/m² per area, and so on.
// clang-format off
[[nodiscard]] constexpr Energy operator*(Power p, Duration t) { return Energy::fromSi(p.si() * t.si()); }
[[nodiscard]] constexpr Energy operator*(Duration t, Power p) { return p * t; }
[[nodiscard]] constexpr Power operator/(Energy e, Duration t) { return Power::fromSi(e.si() / t.si()); }
[[nodiscard]] constexpr RadiantExposure operator/(Energy e, Area a) { return RadiantExposure::fromSi(e.si() / a.si()); }
[[nodiscard]] constexpr Irradiance operator/(Power p, Area a) { return Irradiance::fromSi(p.si() / a.si()); }
[[nodiscard]] constexpr Energy operator*(RadiantExposure h, Area a) { return Energy::fromSi(h.si() * a.si()); }
[[nodiscard]] constexpr Energy operator*(Area a, RadiantExposure h) { return h * a; }
[[nodiscard]] constexpr Power operator*(Irradiance e, Area a) { return Power::fromSi(e.si() * a.si()); }
[[nodiscard]] constexpr Power operator*(Area a, Irradiance e) { return e * a; }
[[nodiscard]] constexpr RadiantExposure operator*(Irradiance e, Duration t)
{
    return RadiantExposure::fromSi(e.si() * t.si());
}
[[nodiscard]] constexpr RadiantExposure operator*(Duration t, Irradiance e) { return e * t; }
[[nodiscard]] constexpr Irradiance operator/(RadiantExposure h, Duration t)
{
    return Irradiance::fromSi(h.si() / t.si());
}
[[nodiscard]] constexpr Area operator*(Length a, Length b) { return Area::fromSi(a.si() * b.si()); }
// Pulse count in a window: repetition rate (Hz) times duration (s), a plain number.
[[nodiscard]] constexpr double operator*(Frequency f, Duration t) { return f.si() * t.si(); }
[[nodiscard]] constexpr double operator*(Duration t, Frequency f) { return f * t; }
// Time between pulses, 1/f in s. A zero frequency gives an infinite period; callers range-check first.
[[nodiscard]] constexpr Duration period(Frequency f) { return Duration::fromSi(1.0 / f.si()); }
// clang-format on

// Literal rule: sub-millimetre metre literals (_nm, _um) give a Wavelength; millimetre and larger (_mm, _cm,
// _m, _km) give a Length. For the rare far-infrared wavelength in mm, or a beam waist in µm, spell it out with
// Wavelength::fromSi(1e-3) or Length::fromSi(20e-6).
namespace literals {

namespace detail {
// Dividing by an exact power of ten is correctly rounded, where multiplying by an inexact 1e-9 is not; the
// parser scales the same way, so 800_nm and parseWavelength("800 nm") are the same double.
template <typename Q, int Exponent, typename Number>
[[nodiscard]] constexpr Q scaled(Number number)
{
    double power = 1.0;
    for (int i = 0; i < (Exponent < 0 ? -Exponent : Exponent); ++i)
        power *= 10.0;
    const auto value = static_cast<double>(number);
    return Q::fromSi(Exponent < 0 ? value / power : value * power);
}

template <typename Q, typename Number>
[[nodiscard]] constexpr Q times(Number number, double factor)
{
    return Q::fromSi(static_cast<double>(number) * factor);
}
} // namespace detail

// clang-format off
[[nodiscard]] constexpr Wavelength operator""_nm(long double v) { return detail::scaled<Wavelength, -9>(v); }
[[nodiscard]] constexpr Wavelength operator""_nm(unsigned long long v) { return detail::scaled<Wavelength, -9>(v); }
[[nodiscard]] constexpr Wavelength operator""_um(long double v) { return detail::scaled<Wavelength, -6>(v); }
[[nodiscard]] constexpr Wavelength operator""_um(unsigned long long v) { return detail::scaled<Wavelength, -6>(v); }

[[nodiscard]] constexpr Length operator""_mm(long double v) { return detail::scaled<Length, -3>(v); }
[[nodiscard]] constexpr Length operator""_mm(unsigned long long v) { return detail::scaled<Length, -3>(v); }
[[nodiscard]] constexpr Length operator""_cm(long double v) { return detail::scaled<Length, -2>(v); }
[[nodiscard]] constexpr Length operator""_cm(unsigned long long v) { return detail::scaled<Length, -2>(v); }
[[nodiscard]] constexpr Length operator""_m(long double v) { return detail::scaled<Length, 0>(v); }
[[nodiscard]] constexpr Length operator""_m(unsigned long long v) { return detail::scaled<Length, 0>(v); }
[[nodiscard]] constexpr Length operator""_km(long double v) { return detail::scaled<Length, 3>(v); }
[[nodiscard]] constexpr Length operator""_km(unsigned long long v) { return detail::scaled<Length, 3>(v); }

[[nodiscard]] constexpr Area operator""_mm2(long double v) { return detail::scaled<Area, -6>(v); }
[[nodiscard]] constexpr Area operator""_mm2(unsigned long long v) { return detail::scaled<Area, -6>(v); }
[[nodiscard]] constexpr Area operator""_cm2(long double v) { return detail::scaled<Area, -4>(v); }
[[nodiscard]] constexpr Area operator""_cm2(unsigned long long v) { return detail::scaled<Area, -4>(v); }
[[nodiscard]] constexpr Area operator""_m2(long double v) { return detail::scaled<Area, 0>(v); }
[[nodiscard]] constexpr Area operator""_m2(unsigned long long v) { return detail::scaled<Area, 0>(v); }

[[nodiscard]] constexpr Duration operator""_fs(long double v) { return detail::scaled<Duration, -15>(v); }
[[nodiscard]] constexpr Duration operator""_fs(unsigned long long v) { return detail::scaled<Duration, -15>(v); }
[[nodiscard]] constexpr Duration operator""_ps(long double v) { return detail::scaled<Duration, -12>(v); }
[[nodiscard]] constexpr Duration operator""_ps(unsigned long long v) { return detail::scaled<Duration, -12>(v); }
[[nodiscard]] constexpr Duration operator""_ns(long double v) { return detail::scaled<Duration, -9>(v); }
[[nodiscard]] constexpr Duration operator""_ns(unsigned long long v) { return detail::scaled<Duration, -9>(v); }
[[nodiscard]] constexpr Duration operator""_us(long double v) { return detail::scaled<Duration, -6>(v); }
[[nodiscard]] constexpr Duration operator""_us(unsigned long long v) { return detail::scaled<Duration, -6>(v); }
[[nodiscard]] constexpr Duration operator""_ms(long double v) { return detail::scaled<Duration, -3>(v); }
[[nodiscard]] constexpr Duration operator""_ms(unsigned long long v) { return detail::scaled<Duration, -3>(v); }
[[nodiscard]] constexpr Duration operator""_s(long double v) { return detail::scaled<Duration, 0>(v); }
[[nodiscard]] constexpr Duration operator""_s(unsigned long long v) { return detail::scaled<Duration, 0>(v); }
[[nodiscard]] constexpr Duration operator""_min(long double v) { return detail::times<Duration>(v, 60.0); }
[[nodiscard]] constexpr Duration operator""_min(unsigned long long v) { return detail::times<Duration>(v, 60.0); }
[[nodiscard]] constexpr Duration operator""_h(long double v) { return detail::times<Duration>(v, 3600.0); }
[[nodiscard]] constexpr Duration operator""_h(unsigned long long v) { return detail::times<Duration>(v, 3600.0); }

[[nodiscard]] constexpr Energy operator""_J(long double v) { return detail::scaled<Energy, 0>(v); }
[[nodiscard]] constexpr Energy operator""_J(unsigned long long v) { return detail::scaled<Energy, 0>(v); }
[[nodiscard]] constexpr Energy operator""_mJ(long double v) { return detail::scaled<Energy, -3>(v); }
[[nodiscard]] constexpr Energy operator""_mJ(unsigned long long v) { return detail::scaled<Energy, -3>(v); }
[[nodiscard]] constexpr Energy operator""_uJ(long double v) { return detail::scaled<Energy, -6>(v); }
[[nodiscard]] constexpr Energy operator""_uJ(unsigned long long v) { return detail::scaled<Energy, -6>(v); }
[[nodiscard]] constexpr Energy operator""_nJ(long double v) { return detail::scaled<Energy, -9>(v); }
[[nodiscard]] constexpr Energy operator""_nJ(unsigned long long v) { return detail::scaled<Energy, -9>(v); }

[[nodiscard]] constexpr Power operator""_W(long double v) { return detail::scaled<Power, 0>(v); }
[[nodiscard]] constexpr Power operator""_W(unsigned long long v) { return detail::scaled<Power, 0>(v); }
[[nodiscard]] constexpr Power operator""_mW(long double v) { return detail::scaled<Power, -3>(v); }
[[nodiscard]] constexpr Power operator""_mW(unsigned long long v) { return detail::scaled<Power, -3>(v); }
[[nodiscard]] constexpr Power operator""_kW(long double v) { return detail::scaled<Power, 3>(v); }
[[nodiscard]] constexpr Power operator""_kW(unsigned long long v) { return detail::scaled<Power, 3>(v); }

[[nodiscard]] constexpr Frequency operator""_Hz(long double v) { return detail::scaled<Frequency, 0>(v); }
[[nodiscard]] constexpr Frequency operator""_Hz(unsigned long long v) { return detail::scaled<Frequency, 0>(v); }
[[nodiscard]] constexpr Frequency operator""_kHz(long double v) { return detail::scaled<Frequency, 3>(v); }
[[nodiscard]] constexpr Frequency operator""_kHz(unsigned long long v) { return detail::scaled<Frequency, 3>(v); }
[[nodiscard]] constexpr Frequency operator""_MHz(long double v) { return detail::scaled<Frequency, 6>(v); }
[[nodiscard]] constexpr Frequency operator""_MHz(unsigned long long v) { return detail::scaled<Frequency, 6>(v); }
[[nodiscard]] constexpr Frequency operator""_GHz(long double v) { return detail::scaled<Frequency, 9>(v); }
[[nodiscard]] constexpr Frequency operator""_GHz(unsigned long long v) { return detail::scaled<Frequency, 9>(v); }

[[nodiscard]] constexpr Angle operator""_rad(long double v) { return detail::scaled<Angle, 0>(v); }
[[nodiscard]] constexpr Angle operator""_rad(unsigned long long v) { return detail::scaled<Angle, 0>(v); }
[[nodiscard]] constexpr Angle operator""_mrad(long double v) { return detail::scaled<Angle, -3>(v); }
[[nodiscard]] constexpr Angle operator""_mrad(unsigned long long v) { return detail::scaled<Angle, -3>(v); }
[[nodiscard]] constexpr Angle operator""_urad(long double v) { return detail::scaled<Angle, -6>(v); }
[[nodiscard]] constexpr Angle operator""_urad(unsigned long long v) { return detail::scaled<Angle, -6>(v); }
[[nodiscard]] constexpr Angle operator""_deg(long double v)
{
    return detail::times<Angle>(v, std::numbers::pi / 180.0);
}
[[nodiscard]] constexpr Angle operator""_deg(unsigned long long v)
{
    return detail::times<Angle>(v, std::numbers::pi / 180.0);
}
// clang-format on

} // namespace literals

// Reading user text. Accepted: optional whitespace, a non-negative decimal number (".5", "2.5E4"), optional
// whitespace, then a unit with an SI prefix where it makes sense (µ as U+00B5, U+03BC or "u"; prefixes are
// case-sensitive, so "mHz" is millihertz and "MHz" megahertz). Units per quantity:
//   wavelength, length: pm nm µm mm cm m km        duration: fs ps ns µs ms s, min, h
//   energy: fJ … kJ        power: fW … PW          frequency: mHz … THz (the "Hz" itself in any case)
//   angle: nrad µrad mrad rad, deg or °           area: nm² … km², written m², m2 or m^2
//   radiant exposure: [prefix]J over an area unit (J/m², mJ/cm², J/cm^2); irradiance likewise with W.
// The result is in SI units (m, s, J, W, J/m², W/m², rad, Hz, m²). Zero is accepted; callers check ranges.
// Refusals name `field`, quote the text (trimmed; bytes that are not UTF-8 shown as U+FFFD) and say what
// would be accepted.
[[nodiscard]] Result<Wavelength> parseWavelength(std::string_view text, std::string_view field = "wavelength");
[[nodiscard]] Result<Duration> parseDuration(std::string_view text, std::string_view field = "duration");
[[nodiscard]] Result<Energy> parseEnergy(std::string_view text, std::string_view field = "energy");
[[nodiscard]] Result<Power> parsePower(std::string_view text, std::string_view field = "power");
[[nodiscard]] Result<RadiantExposure> parseRadiantExposure(std::string_view text,
                                                           std::string_view field = "radiant exposure");
[[nodiscard]] Result<Irradiance> parseIrradiance(std::string_view text, std::string_view field = "irradiance");
[[nodiscard]] Result<Angle> parseAngle(std::string_view text, std::string_view field = "angle");
[[nodiscard]] Result<Frequency> parseFrequency(std::string_view text, std::string_view field = "frequency");
[[nodiscard]] Result<Length> parseLength(std::string_view text, std::string_view field = "length");
[[nodiscard]] Result<Area> parseArea(std::string_view text, std::string_view field = "area");

// Printing for people: `significant` digits (clamped to 1..17), trailing zeros dropped, and an SI prefix that
// puts the number in [1, 1000); outside the prefixes a quantity has, plain scientific notation in the base unit
// ("1e-18 s"). Per quantity: wavelengths in nm below 10 µm, µm below 1 mm, mm above; durations of 1000 s and
// more in plain seconds; radiant exposure and irradiance with the prefix on J or W ("23.77 µJ/m²"); areas in
// mm², cm² or m². Zero prints as "0 <unit>". The output always parses back with the matching parse*().
[[nodiscard]] std::string format(Wavelength value, int significant = 4);
[[nodiscard]] std::string format(Duration value, int significant = 4);
[[nodiscard]] std::string format(Energy value, int significant = 4);
[[nodiscard]] std::string format(Power value, int significant = 4);
[[nodiscard]] std::string format(RadiantExposure value, int significant = 4);
[[nodiscard]] std::string format(Irradiance value, int significant = 4);
[[nodiscard]] std::string format(Angle value, int significant = 4);
[[nodiscard]] std::string format(Frequency value, int significant = 4);
[[nodiscard]] std::string format(Length value, int significant = 4);
[[nodiscard]] std::string format(Area value, int significant = 4);

// The fewest significant digits (1 to 17) with which `si` prints as a decimal that reads back as the same double.
[[nodiscard]] int exactDigits(double si);

// format() with every digit the value has: for quoting a value back in a refusal, where a rounded "1 mm" or
// "30000 s" would read as inside the very range the message names.
template <typename Q>
[[nodiscard]] std::string formatExact(Q value)
{
    return format(value, exactDigits(value.si()));
}

// `value` in SI units of `unit`; the chosen prefix (f to P) is put in front of the whole unit text, so pass
// "J/m²" but not "m²" (a prefix on a squared unit means something else).
[[nodiscard]] std::string formatSi(double value, std::string_view unit, int significant = 4);

} // namespace beamwarden::units
