// Engine workloads for the benchmarks, grown from the demo lab (see benchfixtures.hpp).
#include "benchfixtures.hpp"

#include "beamwarden/limits/ruleset.hpp"
#include "beamwarden/store/labexport.hpp"

#include <algorithm>
#include <cmath>
#include <cstdio>
#include <cstdlib>
#include <fstream>
#include <iterator>
#include <sstream>
#include <string>

namespace beamwarden::bench {

namespace {

[[noreturn]] void giveUp(const std::string& why)
{
    std::fprintf(stderr, "benchmark fixture: %s\n", why.c_str());
    std::exit(1);
}

store::LabContents loadDemo()
{
    const std::string path = std::string(BEAMWARDEN_SOURCE_DIR) + "/resources/demo.bwlab.json";
    std::ifstream in(path, std::ios::binary);
    if (!in)
        giveUp("cannot read " + path);
    std::ostringstream text;
    text << in.rdbuf();
    auto contents = store::parseLabExport(text.str());
    if (!contents)
        giveUp(path + ": " + contents.error().message());
    return std::move(*contents);
}

// A Gaussian band of `samples` equal bins over +-1.5 FWHM around `centre`, the bins' power shares normalised.
model::Spectrum resampled(const model::Spectrum& original, int samples)
{
    const double centre = original.centroid().si();
    // The band's width as the original's extent, or 1 % of the centre for a single line.
    const double extent = original.longest().si() - original.shortest().si();
    const double fwhm = extent > 0 ? extent / 3.0 : centre * 0.01;
    const double from = centre - 1.5 * fwhm;
    const double width = 3.0 * fwhm / samples;
    std::vector<model::SpectralSample> lines;
    lines.reserve(static_cast<std::size_t>(samples));
    for (int i = 0; i < samples; ++i) {
        const double lambda = from + (i + 0.5) * width;
        const double x = (lambda - centre) / fwhm;
        lines.push_back({units::Wavelength::fromSi(lambda), std::exp(-4.0 * std::log(2.0) * x * x),
                         units::Wavelength::fromSi(width)});
    }
    auto spectrum = model::lines(lines);
    if (!spectrum)
        giveUp("resampling a spectrum: " + spectrum.error().message());
    return *spectrum;
}

model::NamedExposureCase exposureCase(int index)
{
    model::NamedExposureCase named;
    const double farther = 1.0 + index / 4; // beyond the first four, the same kinds again farther away
    switch (index % 4) {
    case 0:
        named.name = "intrabeam";
        named.exposureCase.viewing = model::Viewing::Direct;
        named.exposureCase.distance = units::Length::fromSi(0.5 * (farther - 1.0));
        break;
    case 1:
        named.name = "diffuse from the beam dump";
        named.exposureCase.viewing = model::Viewing::Diffuse;
        named.exposureCase.distance = units::Length::fromSi(0.5 * farther);
        named.exposureCase.reflectance = 0.9;
        break;
    case 2:
        named.name = "specular from a window";
        named.exposureCase.viewing = model::Viewing::Specular;
        named.exposureCase.distance = units::Length::fromSi(1.0 * farther);
        named.exposureCase.reflectance = 0.04;
        break;
    default:
        named.name = "behind the focusing lens";
        named.exposureCase.viewing = model::Viewing::Lens;
        named.exposureCase.distance = units::Length::fromSi(0.3 * farther);
        named.exposureCase.focalLength = units::Length::fromSi(0.1);
        break;
    }
    named.name += " " + std::to_string(index + 1);
    return named;
}

} // namespace

const store::LabContents& demoLab()
{
    static const store::LabContents demo = loadDemo();
    return demo;
}

model::Laser ultrafastLaser(int outputs, int samples, int cases)
{
    const auto& lasers = demoLab().lasers;
    const auto amplifier =
        std::find_if(lasers.begin(), lasers.end(), [](const model::Laser& l) { return l.name == "Amplifier A1"; });
    if (amplifier == lasers.end())
        giveUp("the demo lab has no Amplifier A1");
    model::Laser laser = *amplifier;
    const std::vector<model::Output> originals = laser.outputs;
    laser.outputs.clear();
    for (int i = 0; i < outputs; ++i) {
        model::Output output = originals.at(static_cast<std::size_t>(i) % originals.size());
        output.name += " " + std::to_string(i + 1);
        output.emission.spectrum = resampled(output.emission.spectrum, samples);
        output.exposureCases.clear();
        for (int c = 0; c < cases; ++c)
            output.exposureCases.push_back(exposureCase(c));
        laser.outputs.push_back(std::move(output));
    }
    return laser;
}

std::vector<model::EyewearItem> shelf(int count)
{
    const auto& demo = demoLab().eyewear;
    std::vector<model::EyewearItem> items;
    items.reserve(static_cast<std::size_t>(count));
    for (int i = 0; i < count; ++i) {
        model::EyewearItem item = demo.at(static_cast<std::size_t>(i) % demo.size());
        item.name += " #" + std::to_string(i + 1);
        // Vary the measured OD a little (never above 10) so that no two items are the same.
        for (model::OdRow& row : item.spectralOd)
            row.od = std::min(10.0, std::max(0.5, row.od - 0.1 * (i % 7)));
        items.push_back(std::move(item));
    }
    return items;
}

std::vector<limits::MpeRequest> oneRequestPerRow()
{
    std::vector<limits::MpeRequest> requests;
    for (const auto id : {limits::RuleSetId::Iec60825_1_2007, limits::RuleSetId::Iec60825_1_2014}) {
        for (const limits::LimitRow& row : limits::ruleSet(id).rows) {
            limits::MpeRequest request;
            request.wavelength = units::Wavelength::fromSi(0.5e-9 * (row.lambdaFrom_nm + row.lambdaTo_nm));
            const double from = std::max(row.durationFrom_s, 1e-13);
            request.duration = units::Duration::fromSi(std::sqrt(from * row.durationTo_s));
            request.target = row.target;
            request.sourceAngle = units::Angle::fromSi(row.source == limits::SourceSize::Extended ? 0.02 : 0.0);
            request.rules = id == limits::RuleSetId::Iec60825_1_2007 ? limits::RuleChoice::Iec60825_1_2007
                                                                     : limits::RuleChoice::Iec60825_1_2014;
            if (limits::evaluateMpe(request))
                requests.push_back(request);
        }
    }
    if (requests.empty())
        giveUp("no row gave a request the engine accepts");
    return requests;
}

} // namespace beamwarden::bench
