#include "beamwarden/model/ranges.hpp"

#include "beamwarden/units.hpp"

#include <cmath>

namespace beamwarden::model {

namespace {

struct Range {
    double min;
    bool minIncluded; // false: the value must be above min
    double max;
};

Range rangeOf(Quantity quantity)
{
    switch (quantity) {
    case Quantity::Wavelength:
        return {180e-9, true, 1e-3};
    case Quantity::AveragePower:
        return {0.0, false, kMaxAveragePower_W};
    case Quantity::PulseEnergy:
        return {0.0, false, kMaxPulseEnergy_J};
    case Quantity::PulseDuration:
    case Quantity::Exposure:
        return {0.0, false, 3e4};
    case Quantity::Prf:
        return {0.0, false, kMaxPrf_Hz};
    case Quantity::BeamDiameter:
        return {0.0, false, 10.0};
    case Quantity::Divergence:
        return {0.0, true, 3.2};
    case Quantity::Distance:
        return {0.0, true, 1e6};
    }
    return {0.0, false, 0.0};
}

std::string quoted(Quantity quantity, double si)
{
    switch (quantity) {
    case Quantity::Wavelength:
        return units::formatExact(units::Wavelength::fromSi(si));
    case Quantity::AveragePower:
        return units::formatExact(units::Power::fromSi(si));
    case Quantity::PulseEnergy:
        return units::formatExact(units::Energy::fromSi(si));
    case Quantity::PulseDuration:
    case Quantity::Exposure:
        return units::formatExact(units::Duration::fromSi(si));
    case Quantity::Prf:
        return units::formatExact(units::Frequency::fromSi(si));
    case Quantity::BeamDiameter:
    case Quantity::Distance:
        return units::formatExact(units::Length::fromSi(si));
    case Quantity::Divergence:
        return units::formatExact(units::Angle::fromSi(si));
    }
    return units::formatSi(si, "");
}

} // namespace

std::string allowedRange(Quantity quantity)
{
    switch (quantity) {
    case Quantity::Wavelength:
        return "180 nm to 1 mm";
    case Quantity::AveragePower:
        return "a power above 0 W and at most " + units::format(units::Power::fromSi(kMaxAveragePower_W));
    case Quantity::PulseEnergy:
        return "a pulse energy above 0 J and at most " + units::format(units::Energy::fromSi(kMaxPulseEnergy_J));
    case Quantity::PulseDuration:
        return "a pulse duration above 0 s and at most 30000 s";
    case Quantity::Prf:
        return "more than 0 Hz and at most " + units::format(units::Frequency::fromSi(kMaxPrf_Hz));
    case Quantity::BeamDiameter:
        return "more than 0 m and at most 10 m";
    case Quantity::Divergence:
        return "0 (collimated) up to pi rad, full angle";
    case Quantity::Exposure:
        return "an exposure duration above 0 s and at most 30000 s";
    case Quantity::Distance:
        return "0 (at the exit) up to 1000 km";
    }
    return {};
}

Result<void> checkRange(Quantity quantity, double si, std::string_view field)
{
    const Range range = rangeOf(quantity);
    const bool aboveMin = range.minIncluded ? si >= range.min : si > range.min;
    // Written so that NaN fails every comparison and is refused with the rest.
    if (std::isfinite(si) && aboveMin && si <= range.max)
        return {};
    return fail(std::string(field), quoted(quantity, si), allowedRange(quantity));
}

} // namespace beamwarden::model
