// The large lab's lasers: ultrafast amplifiers with harmonics, parametric amplifiers, oscillators, Q-switched
// solid-state and excimer lasers, CW diodes, fibre lasers, gas lasers. Outputs are typical of each kind (not of any
// product); makers and models are invented.
#include "largelabparts.hpp"

#include <fmt/core.h>

#include <array>
#include <cstdio>
#include <cstdlib>

namespace beamwarden::bench {

namespace {

using model::BeamDefinition;
using model::BeamProfile;
using model::Viewing;

model::Spectrum line(double nm)
{
    return model::singleLine(units::Wavelength::fromSi(nm * 1e-9));
}

// A sampled Gaussian band; the generator's own data, so a refusal is a bug here.
model::Spectrum band(double centre_nm, double fwhm_nm, int samples)
{
    auto spectrum = model::gaussianBand(units::Wavelength::fromSi(centre_nm * 1e-9),
                                        units::Wavelength::fromSi(fwhm_nm * 1e-9), samples);
    if (!spectrum) {
        std::fprintf(stderr, "large lab: %s\n", spectrum.error().message().c_str());
        std::abort();
    }
    return *spectrum;
}

// The band of a transform-limited pulse of `fs` femtoseconds.
model::Spectrum ultrafastBand(double centre_nm, double fs, int samples)
{
    const auto fwhm = model::transformLimitedBandwidth(units::Wavelength::fromSi(centre_nm * 1e-9),
                                                       units::Duration::fromSi(fs * 1e-15));
    return band(centre_nm, fwhm.nanometres(), samples);
}

struct BeamShape {
    double diameter_m;
    double divergence_rad;
    BeamDefinition definition = BeamDefinition::OneOverESquared;
    BeamProfile profile = BeamProfile::Gaussian;
};

model::Output pulsed(std::string name, model::Spectrum spectrum, double energy_J, double duration_s, double prf_Hz,
                     const BeamShape& beam)
{
    model::Output o;
    o.name = std::move(name);
    o.emission.spectrum = std::move(spectrum);
    o.emission.pulsed = true;
    o.emission.pulseEnergy = units::Energy::fromSi(energy_J);
    o.emission.pulseDuration = units::Duration::fromSi(duration_s);
    o.emission.prf = units::Frequency::fromSi(prf_Hz);
    o.emission.averagePower = units::Power::fromSi(energy_J * prf_Hz);
    o.beam = model::Beam{units::Length::fromSi(beam.diameter_m), units::Angle::fromSi(beam.divergence_rad),
                         beam.definition, beam.profile};
    return o;
}

model::Output continuous(std::string name, model::Spectrum spectrum, double power_W, const BeamShape& beam)
{
    model::Output o;
    o.name = std::move(name);
    o.emission.spectrum = std::move(spectrum);
    o.emission.averagePower = units::Power::fromSi(power_W);
    o.beam = model::Beam{units::Length::fromSi(beam.diameter_m), units::Angle::fromSi(beam.divergence_rad),
                         beam.definition, beam.profile};
    return o;
}

void addCase(model::Output& o, std::string name, model::ExposureCase c)
{
    o.exposureCases.push_back(model::NamedExposureCase{0, std::move(name), c});
}

model::ExposureCase direct(double distance_m = 0, double exposure_s = 0)
{
    model::ExposureCase c;
    c.viewing = Viewing::Direct;
    c.distance = units::Length::fromSi(distance_m);
    c.exposure = units::Duration::fromSi(exposure_s);
    return c;
}

model::ExposureCase diffuse(double distance_m, double reflectance)
{
    model::ExposureCase c;
    c.viewing = Viewing::Diffuse;
    c.distance = units::Length::fromSi(distance_m);
    c.reflectance = reflectance;
    return c;
}

model::ExposureCase specular(double distance_m, double reflectance)
{
    model::ExposureCase c;
    c.viewing = Viewing::Specular;
    c.distance = units::Length::fromSi(distance_m);
    c.reflectance = reflectance;
    return c;
}

model::ExposureCase lens(double focal_m, double distance_m)
{
    model::ExposureCase c;
    c.viewing = Viewing::Lens;
    c.focalLength = units::Length::fromSi(focal_m);
    c.distance = units::Length::fromSi(distance_m);
    return c;
}

model::ExposureCase fibre(double na, double distance_m)
{
    model::ExposureCase c;
    c.viewing = Viewing::Fibre;
    c.numericalAperture = na;
    c.distance = units::Length::fromSi(distance_m);
    return c;
}

model::ExposureCase aided(double distance_m)
{
    model::ExposureCase c;
    c.viewing = Viewing::Aided;
    c.distance = units::Length::fromSi(distance_m);
    c.magnification = 7;
    c.objectiveDiameter = units::Length::fromSi(0.05);
    c.transmission = 0.9;
    return c;
}

// The cases an assessor writes for a beam on an open table: the exit, and usually a stray reflection.
void tableCases(Random& r, model::Output& o)
{
    addCase(o, "intrabeam at the exit", direct());
    if (r.chance(0.6))
        addCase(o, "diffuse from the beam dump", diffuse(r.uniform(0.3, 1.0), r.uniform(0.5, 0.95)));
    if (r.chance(0.25))
        addCase(o, "window reflection", specular(r.uniform(0.5, 2.0), 0.04));
    if (r.chance(0.1))
        addCase(o, "after the focusing lens", lens(r.uniform(0.1, 0.5), r.uniform(0.2, 1.0)));
}

struct Kind {
    const char* name;  // as the laser's name starts
    const char* model; // maker and model, invented
    int weight;        // share of the lab's lasers
};

// The lab's mix: an ultrafast and spectroscopy site with teaching and workshop rooms.
constexpr std::array kKinds{
    Kind{"Amplifier", "Ti:sapphire regenerative amplifier RA-{} (invented)", 12},
    Kind{"Yb amplifier", "Ytterbium fibre-rod amplifier YF-{} (invented)", 9},
    Kind{"OPA", "Optical parametric amplifier OP-{} (invented)", 8},
    Kind{"Oscillator", "Kerr-lens mode-locked oscillator KO-{} (invented)", 12},
    Kind{"Nd:YAG", "Flashlamp-pumped Q-switched Nd:YAG QY-{} (invented)", 11},
    Kind{"DPSS", "Diode-pumped Q-switched laser DQ-{} (invented)", 6},
    Kind{"Excimer", "Excimer laser EX-{} (invented)", 3},
    Kind{"Diode", "Diode laser module DM-{} (invented)", 17},
    Kind{"Fibre laser", "CW fibre laser CF-{} (invented)", 8},
    Kind{"HeNe", "Helium-neon laser HN-{} (invented)", 7},
    Kind{"Pump", "CW diode-pumped solid-state laser CP-{} (invented)", 5},
    Kind{"CO2", "CO2 laser CC-{} (invented)", 2},
};

std::size_t drawKind(Random& r)
{
    int total = 0;
    for (const Kind& k : kKinds)
        total += k.weight;
    int at = r.index(total);
    for (std::size_t i = 0; i < kKinds.size(); ++i) {
        if (at < kKinds[i].weight)
            return i;
        at -= kKinds[i].weight;
    }
    return 0;
}

void tiSapphireAmplifier(Random& r, model::Laser& l)
{
    const double fs = r.uniform(25, 120);
    const double centre = r.uniform(780, 820);
    const double energy = r.logUniform(0.5e-3, 12e-3);
    const double prf = r.pick(std::vector<double>{1e3, 1e3, 5e3, 10e3});
    const BeamShape beam{r.uniform(6e-3, 14e-3), r.uniform(0.3e-3, 1e-3)};
    auto fundamental = pulsed("fundamental", ultrafastBand(centre, fs, 11), energy, fs * 1e-15, prf, beam);
    tableCases(r, fundamental);
    l.outputs.push_back(std::move(fundamental));
    auto shg = pulsed("SHG", ultrafastBand(centre / 2, fs * 1.5, 5), energy * 0.3, fs * 1.5e-15, prf, beam);
    addCase(shg, "intrabeam at the exit", direct());
    l.outputs.push_back(std::move(shg));
    if (r.chance(0.5)) {
        auto thg = pulsed("THG", line(centre / 3), energy * 0.08, fs * 2e-15, prf, beam);
        addCase(thg, "intrabeam at the exit", direct());
        l.outputs.push_back(std::move(thg));
    }
}

void ytterbiumAmplifier(Random& r, model::Laser& l)
{
    const double fs = r.uniform(180, 600);
    const double prf = r.logUniform(50e3, 2e6);
    const double energy = r.logUniform(5e-6, 200e-6);
    const BeamShape beam{r.uniform(2e-3, 5e-3), r.uniform(0.3e-3, 1.5e-3)};
    auto fundamental = pulsed("fundamental", ultrafastBand(1030, fs, 7), energy, fs * 1e-15, prf, beam);
    if (r.chance(0.3)) { // burst mode: pulses at the oscillator's rate, bursts at the amplifier's
        const int pulses = 2 + r.index(9);
        fundamental.emission.prf = units::Frequency::fromSi(40e6);
        fundamental.emission.burst = model::BurstPattern{pulses, units::Frequency::fromSi(prf)};
        fundamental.emission.averagePower = units::Power::fromSi(energy * pulses * prf);
    }
    tableCases(r, fundamental);
    l.outputs.push_back(std::move(fundamental));
    if (r.chance(0.7)) {
        auto shg = pulsed("SHG", line(515), energy * 0.5, fs * 1e-15, prf, beam);
        addCase(shg, "intrabeam at the exit", direct());
        l.outputs.push_back(std::move(shg));
    }
    if (r.chance(0.4)) {
        auto thg = pulsed("THG", line(343), energy * 0.2, fs * 1e-15, prf, beam);
        addCase(thg, "intrabeam at the exit", direct());
        l.outputs.push_back(std::move(thg));
    }
}

void parametricAmplifier(Random& r, model::Laser& l)
{
    const double fs = r.uniform(35, 150);
    const double prf = r.pick(std::vector<double>{1e3, 1e3, 10e3, 100e3});
    const double pump = r.logUniform(0.2e-3, 4e-3);
    const double signal = r.uniform(1150, 1600);
    const double idler = 1.0 / (1.0 / 800.0 - 1.0 / signal);
    const BeamShape beam{r.uniform(3e-3, 8e-3), r.uniform(0.5e-3, 2e-3)};
    auto s = pulsed("signal", ultrafastBand(signal, fs, 9), pump * 0.15, fs * 1e-15, prf, beam);
    tableCases(r, s);
    l.outputs.push_back(std::move(s));
    auto i = pulsed("idler", ultrafastBand(idler, fs, 9), pump * 0.1, fs * 1e-15, prf, beam);
    addCase(i, "intrabeam at the exit", direct());
    l.outputs.push_back(std::move(i));
    if (r.chance(0.4)) {
        auto vis = pulsed("sum frequency", line(signal * 800 / (signal + 800)), pump * 0.03, fs * 1e-15, prf, beam);
        addCase(vis, "intrabeam at the exit", direct());
        l.outputs.push_back(std::move(vis));
    }
}

void oscillator(Random& r, model::Laser& l)
{
    const bool erbium = r.chance(0.25);
    const double centre = erbium ? 1560 : r.uniform(780, 820);
    const double fs = erbium ? r.uniform(80, 200) : r.uniform(8, 60);
    const double prf = r.logUniform(40e6, 250e6);
    const double power = erbium ? r.logUniform(0.02, 0.5) : r.logUniform(0.2, 3.5);
    const BeamShape beam{r.uniform(1e-3, 3e-3), r.uniform(0.5e-3, 2e-3)};
    auto o =
        pulsed("fundamental", ultrafastBand(centre, fs, r.chance(0.5) ? 11 : 33), power / prf, fs * 1e-15, prf, beam);
    tableCases(r, o);
    l.outputs.push_back(std::move(o));
    if (!erbium && r.chance(0.3)) {
        auto p = continuous("pump leak", line(532), r.uniform(0.05, 0.5), BeamShape{2e-3, 1e-3});
        addCase(p, "intrabeam at the exit", direct());
        l.outputs.push_back(std::move(p));
    }
}

void qSwitchedYag(Random& r, model::Laser& l, bool diodePumped)
{
    const double ns = diodePumped ? r.uniform(8, 60) : r.uniform(4, 12);
    const double prf = diodePumped ? r.logUniform(1e3, 100e3) : r.pick(std::vector<double>{10, 10, 20, 50});
    const double energy = diodePumped ? r.logUniform(20e-6, 2e-3) : r.logUniform(50e-3, 1.5);
    const BeamShape beam{diodePumped ? r.uniform(0.5e-3, 3e-3) : r.uniform(5e-3, 10e-3), r.uniform(0.3e-3, 3e-3),
                         BeamDefinition::OneOverESquared, diodePumped ? BeamProfile::Gaussian : BeamProfile::Unknown};
    auto fundamental = pulsed("fundamental", line(1064), energy, ns * 1e-9, prf, beam);
    tableCases(r, fundamental);
    if (r.chance(0.2))
        addCase(fundamental, "through the alignment telescope", aided(r.uniform(2, 10)));
    l.outputs.push_back(std::move(fundamental));
    const std::array<std::pair<const char*, double>, 3> harmonics{{{"SHG", 532}, {"THG", 355}, {"FHG", 266}}};
    const int count = r.index(4);
    for (int h = 0; h < count; ++h) {
        auto o = pulsed(harmonics.at(static_cast<std::size_t>(h)).first,
                        line(harmonics.at(static_cast<std::size_t>(h)).second), energy * 0.4 / (h + 1), ns * 0.8e-9,
                        prf, beam);
        addCase(o, "intrabeam at the exit", direct());
        if (h == 0 && r.chance(0.5))
            addCase(o, "diffuse from the sample", diffuse(r.uniform(0.3, 1.5), 0.5));
        l.outputs.push_back(std::move(o));
    }
}

void excimer(Random& r, model::Laser& l)
{
    const std::vector<double> lines{193, 248, 248, 308, 351};
    const double wl = r.pick(lines);
    auto o = pulsed(
        "beam", line(wl), r.logUniform(50e-3, 600e-3), r.uniform(10e-9, 30e-9), r.logUniform(10, 500),
        BeamShape{r.uniform(10e-3, 25e-3), r.uniform(1e-3, 3e-3), BeamDefinition::OneOverE, BeamProfile::FlatTop});
    addCase(o, "intrabeam at the exit", direct());
    addCase(o, "diffuse from the target", diffuse(r.uniform(0.3, 1.0), 0.3));
    l.outputs.push_back(std::move(o));
}

void diode(Random& r, model::Laser& l)
{
    const std::vector<double> lines{405, 445, 450, 520, 635, 638, 660, 685, 785, 808, 830, 915, 976, 1310, 1550};
    const double wl = r.pick(lines) + r.uniform(-2, 2);
    const double power = r.logUniform(0.5e-3, 8);
    const bool fibred = r.chance(0.35);
    auto o = continuous(fibred ? "fibre output" : "beam", line(wl), power,
                        BeamShape{r.uniform(0.8e-3, 4e-3), r.uniform(0.3e-3, 8e-3), BeamDefinition::OneOverESquared,
                                  BeamProfile::Unknown});
    addCase(o, "intrabeam at the exit", direct());
    if (fibred)
        addCase(o, "bare fibre end", fibre(r.pick(std::vector<double>{0.1, 0.12, 0.22}), 0.1));
    if (wl >= 400 && wl <= 700 && power < 5e-3)
        addCase(o, "across the bench with aversion", direct(1.5, 0.25));
    l.outputs.push_back(std::move(o));
}

void fibreLaser(Random& r, model::Laser& l)
{
    const bool telecom = r.chance(0.3);
    auto o = continuous("fibre output", line(telecom ? 1550 : r.uniform(1064, 1080)),
                        telecom ? r.logUniform(0.5, 10) : r.logUniform(5, 500),
                        BeamShape{r.uniform(3e-3, 8e-3), r.uniform(0.1e-3, 1e-3)});
    addCase(o, "at the collimator", direct());
    addCase(o, "bare fibre end", fibre(r.uniform(0.06, 0.15), 0.1));
    if (r.chance(0.4))
        addCase(o, "diffuse from the work piece", diffuse(r.uniform(0.3, 1.0), 0.7));
    l.outputs.push_back(std::move(o));
}

void heliumNeon(Random& r, model::Laser& l)
{
    const double wl = r.chance(0.8) ? 632.8 : 543.5;
    auto o = continuous("beam", line(wl), r.logUniform(0.5e-3, 25e-3),
                        BeamShape{r.uniform(0.5e-3, 1.2e-3), r.uniform(0.7e-3, 1.7e-3)});
    addCase(o, "intrabeam at the exit", direct());
    addCase(o, "across the bench with aversion", direct(r.uniform(1, 3), 0.25));
    l.outputs.push_back(std::move(o));
}

void pumpLaser(Random& r, model::Laser& l)
{
    auto o = continuous("beam", line(r.chance(0.85) ? 532 : 1064), r.logUniform(2, 25),
                        BeamShape{r.uniform(1.5e-3, 3e-3), r.uniform(0.3e-3, 0.6e-3)});
    tableCases(r, o);
    l.outputs.push_back(std::move(o));
}

void carbonDioxide(Random& r, model::Laser& l)
{
    auto o = continuous("beam", line(10600), r.logUniform(10, 400),
                        BeamShape{r.uniform(5e-3, 12e-3), r.uniform(1e-3, 4e-3)});
    addCase(o, "intrabeam at the exit", direct());
    addCase(o, "diffuse from the bed", diffuse(r.uniform(0.3, 0.8), 0.8));
    l.outputs.push_back(std::move(o));
}

// A class as a label would give it: the figures decide the assessment, not this.
model::LaserClass classOf(const model::Laser& l)
{
    double power = 0;
    bool pulsed = false;
    bool visible = true;
    for (const model::Output& o : l.outputs) {
        power = std::max(power, o.emission.averagePower.si());
        pulsed = pulsed || o.emission.pulsed;
        const double nm = o.emission.spectrum.centroid().nanometres();
        visible = visible && nm >= 400 && nm <= 700;
    }
    if (pulsed || power > 0.5)
        return model::LaserClass::Class4;
    if (power > 5e-3)
        return model::LaserClass::Class3B;
    if (power > 1e-3)
        return model::LaserClass::Class3R;
    return visible ? model::LaserClass::Class2 : model::LaserClass::Class1M;
}

} // namespace

model::Laser makeLaser(Random& random, int number, const std::vector<model::Room>& rooms)
{
    const std::size_t kind = drawKind(random);
    model::Laser l;
    l.name = fmt::format("{} {:04}", kKinds.at(kind).name, number);
    l.makerModel = fmt::format(fmt::runtime(kKinds.at(kind).model), 100 + random.index(900));
    l.serial = fmt::format("SN-{:06}", random.index(1000000));
    l.room = random.pick(rooms).name;
    switch (kind) {
    case 0:
        tiSapphireAmplifier(random, l);
        break;
    case 1:
        ytterbiumAmplifier(random, l);
        break;
    case 2:
        parametricAmplifier(random, l);
        break;
    case 3:
        oscillator(random, l);
        break;
    case 4:
        qSwitchedYag(random, l, false);
        break;
    case 5:
        qSwitchedYag(random, l, true);
        break;
    case 6:
        excimer(random, l);
        break;
    case 7:
        diode(random, l);
        break;
    case 8:
        fibreLaser(random, l);
        break;
    case 9:
        heliumNeon(random, l);
        break;
    case 10:
        pumpLaser(random, l);
        break;
    default:
        carbonDioxide(random, l);
        break;
    }
    l.laserClass = classOf(l);
    if (random.chance(0.3))
        l.notes = fmt::format("Beam path enclosed except at the sample stage; interlock on door {}.", l.room);
    return l;
}

} // namespace beamwarden::bench
