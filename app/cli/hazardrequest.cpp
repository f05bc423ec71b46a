#include "hazardrequest.hpp"

#include "flagvalues.hpp"

#include <charconv>
#include <fmt/core.h>

namespace beamwarden::cli {

namespace {

using namespace beamwarden::units;
using model::Viewing;

// Propagates a parse error out of the enclosing function returning Result<...>.
#define BW_TRY(var, expr)                                                                                              \
    auto var = (expr);                                                                                                 \
    if (!var)                                                                                                          \
        return std::unexpected(var.error());

Result<model::Spectrum> spectrumFrom(const Arguments& args)
{
    const auto lines = args.value("lines");
    const auto wavelength = args.value("wavelength");
    if (lines && wavelength)
        return fail("--lines", *lines, "either --wavelength (with an optional --bandwidth) or --lines, not both");
    if (lines) {
        // "488nm:0.6,514.5nm:0.4": wavelength and share of the power, comma separated.
        std::vector<model::SpectralSample> samples;
        std::string_view rest = *lines;
        while (!rest.empty()) {
            const auto comma = rest.find(',');
            const std::string_view item = rest.substr(0, comma);
            rest = comma == std::string_view::npos ? std::string_view{} : rest.substr(comma + 1);
            const auto colon = item.find(':');
            if (colon == std::string_view::npos)
                return fail("--lines", std::string(item), "WAVELENGTH:SHARE items, e.g. 488nm:0.6,514.5nm:0.4");
            BW_TRY(w, parseWavelength(item.substr(0, colon), "--lines"));
            double share = 0.0;
            const std::string_view shareText = item.substr(colon + 1);
            const auto [end, ec] = std::from_chars(shareText.data(), shareText.data() + shareText.size(), share);
            if (ec != std::errc{} || end != shareText.data() + shareText.size() || !(share > 0.0))
                return fail("--lines", std::string(item), "a share of the power above 0 after the colon");
            samples.push_back(model::SpectralSample{*w, share, Wavelength{}});
        }
        return model::lines(samples);
    }
    if (!wavelength)
        return fail("--wavelength", "", "the output's wavelength, e.g. 800nm (or --lines for several)");
    BW_TRY(w, parseWavelength(*wavelength, "--wavelength"));
    if (const auto bandwidth = args.value("bandwidth")) {
        BW_TRY(fwhm, parseWavelength(*bandwidth, "--bandwidth"));
        return model::gaussianBand(*w, *fwhm);
    }
    if (w->si() < 180e-9 || w->si() > 1e-3)
        return fail("--wavelength", *wavelength, "180 nm to 1 mm");
    return model::singleLine(*w);
}

} // namespace

const std::vector<FlagSpec>& hazardFlags()
{
    static const std::vector<FlagSpec> flags = {
        {"wavelength", true, "LENGTH", "wavelength, 180 nm to 1 mm"},
        {"bandwidth", true, "LENGTH", "with --wavelength: FWHM of a Gaussian spectrum, sampled (e.g. 27nm)"},
        {"lines", true, "LIST", "several lines with power shares, e.g. 488nm:0.6,514.5nm:0.4"},
        {"power", true, "POWER", "CW power, or the mean power of a pulsed output"},
        {"pulse-energy", true, "ENERGY", "energy per pulse (with --prf)"},
        {"duration", true, "TIME", "pulse duration (with --prf); for CW, the exposure duration"},
        {"prf", true, "FREQUENCY", "pulse repetition rate: a pulsed output"},
        {"burst-count", true, "N", "pulses per burst (with --burst-rate)"},
        {"burst-rate", true, "FREQUENCY", "rate at which bursts repeat"},
        {"beam-diameter", true, "LENGTH", "beam diameter at the exit"},
        {"beam-definition", true, "1/e|1/e2", "definition of diameter and divergence (default 1/e)"},
        {"divergence", true, "ANGLE", "full-angle divergence (0 for a collimated model)"},
        {"profile", true, "NAME", "gaussian, flat-top or unknown (default unknown)"},
        {"exposure", true, "TIME", "exposure duration basis (default 100 s from 400 nm, 30000 s below)"},
        {"distance", true, "LENGTH", "closest approach: from the exit, lens or spot (default 0, at the exit)"},
        {"viewing", true, "CASE", "direct (default), lens, fibre, diffuse, specular or aided"},
        {"focal-length", true, "LENGTH", "lens: focal length"},
        {"na", true, "NUMBER", "fibre: numerical aperture"},
        {"reflectance", true, "NUMBER", "diffuse, specular: reflectance 0-1 (default 1, the worst case)"},
        {"angle", true, "ANGLE", "diffuse: viewing angle from the normal (default 0)"},
        {"magnification", true, "NUMBER", "aided: magnification"},
        {"objective-diameter", true, "LENGTH", "aided: objective diameter"},
        {"transmission", true, "NUMBER", "aided: transmission 0-1 (default 1)"},
        {"rules", true, "SET", "strictest (default), iec60825-1:2014 or iec60825-1:2007"},
        {"c5", true, "OPTION", "2014 repeated-pulse factor: conservative (default) or edition"},
        {"json", false, "", "print the result as JSON"},
        {"help", false, "", "show these flags"},
    };
    return flags;
}

Result<hazard::HazardRequest> hazardRequestFrom(const Arguments& args)
{
    hazard::HazardRequest request;
    BW_TRY(spectrum, spectrumFrom(args));
    request.emission.spectrum = *spectrum;

    if (const auto v = args.value("viewing")) {
        auto viewing = model::parseViewing(*v);
        if (!viewing)
            return fail("--viewing", *v, "direct, lens, fibre, diffuse, specular or aided");
        request.exposureCase.viewing = *viewing;
    }
    const Viewing viewing = request.exposureCase.viewing;

    BW_TRY(power, optionalQuantity<Power>(args, "power", parsePower));
    BW_TRY(energy, optionalQuantity<Energy>(args, "pulse-energy", parseEnergy));
    BW_TRY(duration, optionalQuantity<Duration>(args, "duration", parseDuration));
    BW_TRY(prf, optionalQuantity<Frequency>(args, "prf", parseFrequency));
    BW_TRY(exposure, optionalQuantity<Duration>(args, "exposure", parseDuration));
    // The emission reads zero as "not given" (a pulsed output may give either power or energy), so a zero typed
    // here is refused now, in the range the core allows, rather than taken for a missing value.
    if (*power && (*power)->si() == 0.0)
        return fail("--power", *args.value("power"), model::allowedRange(model::Quantity::AveragePower));
    if (*energy && (*energy)->si() == 0.0)
        return fail("--pulse-energy", *args.value("pulse-energy"), model::allowedRange(model::Quantity::PulseEnergy));
    model::Emission& e = request.emission;
    e.pulsed = prf->has_value();
    if (*power)
        e.averagePower = **power;
    if (*energy)
        e.pulseEnergy = **energy;
    if (e.pulsed) {
        e.prf = **prf;
        if (!*duration)
            return fail("--duration", "", "the pulse duration of a pulsed output, e.g. 35fs");
        e.pulseDuration = **duration;
        if (!*power && !*energy)
            return fail("--pulse-energy", "", "the pulse energy (or --power, the mean power)");
        const auto count = args.value("burst-count");
        BW_TRY(burstRate, optionalQuantity<Frequency>(args, "burst-rate", parseFrequency));
        if (count || *burstRate) {
            if (!count || !*burstRate)
                return fail(count ? "--burst-rate" : "--burst-count", "", "both --burst-count and --burst-rate");
            int n = 0;
            const auto [end, ec] = std::from_chars(count->data(), count->data() + count->size(), n);
            if (ec != std::errc{} || end != count->data() + count->size() || n < 1)
                return fail("--burst-count", *count, "a whole number of pulses, 1 or more");
            e.burst = model::BurstPattern{n, **burstRate};
        }
        if (*exposure)
            request.exposureCase.exposure = **exposure;
    } else {
        if (*energy)
            return fail("--pulse-energy", args.value("pulse-energy").value_or(""), "a pulse energy only with --prf");
        if (!*power)
            return fail("--power", "", "the output's power, e.g. 20W");
        if (*duration && *exposure)
            return fail("--duration", args.value("duration").value_or(""),
                        "for a CW output either --duration or --exposure (both are the exposure duration)");
        if (*duration)
            request.exposureCase.exposure = **duration;
        else if (*exposure)
            request.exposureCase.exposure = **exposure;
    }
    if (request.exposureCase.exposure.si() < 0.0 || (*exposure && request.exposureCase.exposure.si() == 0.0))
        return fail("--exposure", args.value("exposure").value_or(""), "an exposure duration above 0 s");

    // Beam: the exit diameter matters for every beam case; a fibre end or a diffuse spot can go without it.
    BW_TRY(diameter, optionalQuantity<Length>(args, "beam-diameter", parseLength));
    BW_TRY(divergence, optionalQuantity<Angle>(args, "divergence", parseAngle));
    const bool beamCase = viewing == Viewing::Direct || viewing == Viewing::Specular || viewing == Viewing::Lens ||
                          viewing == Viewing::Aided;
    if (beamCase && !*diameter)
        return fail("--beam-diameter", "", "the beam diameter at the exit, e.g. 10mm");
    if ((viewing == Viewing::Direct || viewing == Viewing::Specular || viewing == Viewing::Aided) && !*divergence)
        return fail("--divergence", "", "the full-angle divergence, e.g. 0.5mrad (0 for a collimated model)");
    // Without a diameter the diffuse spot is taken as a point (small source, no C6 relaxation: conservative).
    request.beam.diameter = *diameter ? **diameter : Length::fromSi(1e-6);
    request.beam.divergence = *divergence ? **divergence : Angle{};
    if (const auto definition = args.value("beam-definition")) {
        auto parsed = model::parseBeamDefinition(*definition);
        if (!parsed)
            return fail("--beam-definition", *definition, "1/e or 1/e2");
        request.beam.definition = *parsed;
    }
    if (const auto profile = args.value("profile")) {
        auto parsed = model::parseBeamProfile(*profile);
        if (!parsed)
            return fail("--profile", *profile, "gaussian, flat-top or unknown");
        request.beam.profile = *parsed;
    }

    model::ExposureCase& c = request.exposureCase;
    BW_TRY(distance, optionalQuantity<Length>(args, "distance", parseLength));
    if (*distance)
        c.distance = **distance;
    BW_TRY(focal, optionalQuantity<Length>(args, "focal-length", parseLength));
    if (*focal)
        c.focalLength = **focal;
    else if (viewing == Viewing::Lens)
        return fail("--focal-length", "", "the lens's focal length, e.g. 100mm");
    BW_TRY(na, optionalNumber(args, "na", 0.0, 1.0, "a numerical aperture above 0 and below 1"));
    if (*na)
        c.numericalAperture = **na;
    else if (viewing == Viewing::Fibre)
        return fail("--na", "", "the fibre's numerical aperture, e.g. 0.12");
    BW_TRY(reflectance, optionalNumber(args, "reflectance", 0.0, 1.0, "a reflectance from 0 to 1"));
    if (*reflectance)
        c.reflectance = **reflectance;
    BW_TRY(angle, optionalQuantity<Angle>(args, "angle", parseAngle));
    if (*angle)
        c.viewingAngle = **angle;
    BW_TRY(magnification, optionalNumber(args, "magnification", 1.0, 1000.0, "a magnification from 1 to 1000"));
    if (*magnification)
        c.magnification = **magnification;
    else if (viewing == Viewing::Aided)
        return fail("--magnification", "", "the optics' magnification, e.g. 7");
    BW_TRY(objective, optionalQuantity<Length>(args, "objective-diameter", parseLength));
    if (*objective)
        c.objectiveDiameter = **objective;
    else if (viewing == Viewing::Aided)
        return fail("--objective-diameter", "", "the objective's diameter, e.g. 50mm");
    BW_TRY(transmission, optionalNumber(args, "transmission", 0.0, 1.0, "a transmission from 0 to 1"));
    if (*transmission)
        c.transmission = **transmission;

    BW_TRY(flags, ruleFlags(args));
    request.rules = flags->rules;
    request.c5 = flags->c5;
    return request;
}

#undef BW_TRY

} // namespace beamwarden::cli
