#include "panels/outputeditor.hpp"

#include "widgets/quantityfield.hpp"

#include <QComboBox>
#include <QFormLayout>
#include <QGroupBox>
#include <QHBoxLayout>
#include <QLabel>
#include <QLineEdit>
#include <QRadioButton>
#include <QSpinBox>
#include <QVBoxLayout>

namespace beamwarden::gui {

namespace {

enum MergeKey {
    kName = 100,
    kWavelength,
    kBandwidth,
    kPower,
    kEnergy,
    kDuration,
    kPrf,
    kBurst,
    kDiameter,
    kDivergence,
    kDefinition,
    kProfile,
    kMode
};

units::Wavelength centreOf(const model::Spectrum& s)
{
    if (s.samples.empty())
        return {};
    return s.centroid();
}

// The FWHM of a sampled Gaussian band (samples span +-1.5 FWHM), 0 for lines.
double bandwidthOf(const model::Spectrum& s)
{
    if (s.samples.size() < 2 || s.samples.front().width.si() <= 0.0)
        return 0.0;
    return (s.longest() - s.shortest()).si() / 3.0;
}

} // namespace

OutputEditor::OutputEditor(QWidget* parent) : QWidget(parent)
{
    m_name = new QLineEdit(this);
    m_wavelength = wavelengthField(this);
    m_wavelength->setObjectName(QStringLiteral("outputWavelength")); // names for tests and measurements
    m_wavelength->setPlaceholder(tr("e.g. 800 nm"));
    m_bandwidth = wavelengthField(this);
    m_bandwidth->setOptional(true);
    m_bandwidth->setPlaceholder(tr("FWHM of a band, e.g. 27 nm; empty for a line"));
    m_cw = new QRadioButton(tr("CW"), this);
    m_pulsed = new QRadioButton(tr("Pulsed"), this);
    auto* modeRow = new QWidget(this);
    auto* modeLayout = new QHBoxLayout(modeRow);
    modeLayout->setContentsMargins(0, 0, 0, 0);
    modeLayout->addWidget(m_cw);
    modeLayout->addWidget(m_pulsed);
    modeLayout->addStretch();
    m_power = powerField(this);
    m_power->setOptional(true);
    m_power->setPlaceholder(tr("CW or mean power, e.g. 4 W"));
    m_energy = energyField(this);
    m_energy->setObjectName(QStringLiteral("outputPulseEnergy"));
    m_energy->setOptional(true);
    m_energy->setPlaceholder(tr("per pulse, e.g. 4 mJ"));
    m_pulseDuration = durationField(this);
    m_pulseDuration->setPlaceholder(tr("e.g. 35 fs"));
    m_prf = frequencyField(this);
    m_prf->setPlaceholder(tr("e.g. 1 kHz"));
    m_burstCount = new QSpinBox(this);
    m_burstCount->setRange(0, 1'000'000);
    m_burstCount->setSpecialValueText(tr("no bursts"));
    m_burstRate = frequencyField(this);
    m_burstRate->setOptional(true);
    m_burstRate->setPlaceholder(tr("rate of the bursts"));
    m_diameter = lengthField(this);
    m_diameter->setPlaceholder(tr("at the exit, e.g. 10 mm"));
    m_definition = new QComboBox(this);
    m_definition->addItem(tr("1/e (63 %)"));
    m_definition->addItem(tr("1/e² (86 %)"));
    m_divergence = angleField(this);
    m_divergence->setPlaceholder(tr("full angle, e.g. 0.5 mrad"));
    m_profile = new QComboBox(this);
    m_profile->addItems({tr("not declared"), tr("Gaussian"), tr("flat-top")});
    // The ranges the record allows, marked while typing (model/ranges.hpp), not only when the lab file refuses.
    checkAs(m_wavelength, model::Quantity::Wavelength, "wavelength");
    checkAs(m_power, model::Quantity::AveragePower, "power");
    checkAs(m_energy, model::Quantity::PulseEnergy, "pulse energy");
    checkAs(m_pulseDuration, model::Quantity::PulseDuration, "pulse duration");
    checkAs(m_prf, model::Quantity::Prf, "repetition rate");
    checkAs(m_burstRate, model::Quantity::Prf, "burst rate");
    checkAs(m_diameter, model::Quantity::BeamDiameter, "beam diameter");
    checkAs(m_divergence, model::Quantity::Divergence, "divergence");

    auto* emission = new QGroupBox(tr("Emission"), this);
    auto* ef = new QFormLayout(emission);
    ef->addRow(tr("Wavelength"), m_wavelength);
    ef->addRow(tr("Bandwidth"), m_bandwidth);
    ef->addRow(tr("Time structure"), modeRow);
    ef->addRow(tr("Power"), m_power);
    ef->addRow(tr("Pulse energy"), m_energy);
    ef->addRow(tr("Pulse duration"), m_pulseDuration);
    ef->addRow(tr("Repetition rate"), m_prf);
    ef->addRow(tr("Pulses per burst"), m_burstCount);
    ef->addRow(tr("Burst rate"), m_burstRate);
    m_pulsedRows = {m_energy, m_pulseDuration, m_prf, m_burstCount, m_burstRate};

    auto* beam = new QGroupBox(tr("Beam"), this);
    auto* bf = new QFormLayout(beam);
    bf->addRow(tr("Diameter"), m_diameter);
    bf->addRow(tr("Divergence"), m_divergence);
    bf->addRow(tr("Given at"), m_definition);
    bf->addRow(tr("Profile"), m_profile);

    auto* top = new QFormLayout;
    top->addRow(tr("Output name"), m_name);
    auto* layout = new QVBoxLayout(this);
    layout->setContentsMargins(0, 0, 0, 0);
    layout->addLayout(top);
    layout->addWidget(emission);
    layout->addWidget(beam);
    layout->addStretch();

    connect(m_name, &QLineEdit::editingFinished, this, [this] {
        if (m_name->text().toStdString() == m_output.name)
            return;
        m_output.name = m_name->text().trimmed().toStdString();
        emitEdit(tr("output name"), kName);
    });
    connect(m_wavelength, &QuantityField::valueCommitted, this, [this](std::optional<double> v) {
        if (!v)
            return;
        const double fwhm = bandwidthOf(m_output.emission.spectrum);
        const auto w = units::Wavelength::fromSi(*v);
        if (fwhm > 0.0) {
            auto band = model::gaussianBand(w, units::Wavelength::fromSi(fwhm));
            m_output.emission.spectrum = band ? *band : model::singleLine(w);
        } else {
            m_output.emission.spectrum = model::singleLine(w);
        }
        emitEdit(tr("wavelength"), kWavelength);
    });
    connect(m_bandwidth, &QuantityField::valueCommitted, this, [this](std::optional<double> v) {
        const units::Wavelength centre = centreOf(m_output.emission.spectrum);
        if (!v || *v <= 0.0) {
            m_output.emission.spectrum = model::singleLine(centre);
        } else {
            auto band = model::gaussianBand(centre, units::Wavelength::fromSi(*v));
            if (!band)
                return;
            m_output.emission.spectrum = *band;
        }
        emitEdit(tr("bandwidth"), kBandwidth);
    });
    auto modeChanged = [this] {
        if (m_loading || m_output.emission.pulsed == m_pulsed->isChecked())
            return;
        m_output.emission.pulsed = m_pulsed->isChecked();
        updatePulsedVisibility();
        emitEdit(tr("time structure"), kMode);
    };
    connect(m_cw, &QRadioButton::toggled, this, modeChanged);
    auto quantity = [this](QuantityField* field, auto apply, const QString& what, int key) {
        connect(field, &QuantityField::valueCommitted, this, [this, apply, what, key](std::optional<double> v) {
            apply(v.value_or(0.0));
            emitEdit(what, key);
        });
    };
    quantity(
        m_power, [this](double v) { m_output.emission.averagePower = units::Power::fromSi(v); }, tr("power"), kPower);
    quantity(
        m_energy, [this](double v) { m_output.emission.pulseEnergy = units::Energy::fromSi(v); }, tr("pulse energy"),
        kEnergy);
    quantity(
        m_pulseDuration, [this](double v) { m_output.emission.pulseDuration = units::Duration::fromSi(v); },
        tr("pulse duration"), kDuration);
    quantity(
        m_prf, [this](double v) { m_output.emission.prf = units::Frequency::fromSi(v); }, tr("repetition rate"), kPrf);
    quantity(
        m_diameter, [this](double v) { m_output.beam.diameter = units::Length::fromSi(v); }, tr("beam diameter"),
        kDiameter);
    quantity(
        m_divergence, [this](double v) { m_output.beam.divergence = units::Angle::fromSi(v); }, tr("divergence"),
        kDivergence);
    auto burstChanged = [this] {
        if (m_loading)
            return;
        const int n = m_burstCount->value();
        const double rate = m_burstRate->value().value_or(0.0);
        if (n > 0 && rate > 0.0)
            m_output.emission.burst = model::BurstPattern{n, units::Frequency::fromSi(rate)};
        else
            m_output.emission.burst.reset();
        emitEdit(tr("bursts"), kBurst);
    };
    connect(m_burstCount, &QSpinBox::editingFinished, this, burstChanged);
    connect(m_burstRate, &QuantityField::valueCommitted, this, burstChanged);
    connect(m_definition, &QComboBox::activated, this, [this](int index) {
        m_output.beam.definition =
            index == 0 ? model::BeamDefinition::OneOverE : model::BeamDefinition::OneOverESquared;
        emitEdit(tr("beam definition"), kDefinition);
    });
    connect(m_profile, &QComboBox::activated, this, [this](int index) {
        m_output.beam.profile = static_cast<model::BeamProfile>(index);
        emitEdit(tr("beam profile"), kProfile);
    });
}

void OutputEditor::setOutput(const model::Output& output)
{
    m_loading = true;
    m_output = output;
    const model::Emission& e = output.emission;
    m_name->setText(QString::fromStdString(output.name));
    m_wavelength->setValue(e.spectrum.samples.empty() ? std::nullopt
                                                      : std::optional<double>(centreOf(e.spectrum).si()));
    const double fwhm = bandwidthOf(e.spectrum);
    m_bandwidth->setValue(fwhm > 0.0 ? std::optional<double>(fwhm) : std::nullopt);
    m_cw->setChecked(!e.pulsed);
    m_pulsed->setChecked(e.pulsed);
    m_power->setValue(e.averagePower.si() > 0.0 ? std::optional<double>(e.averagePower.si()) : std::nullopt);
    m_energy->setValue(e.pulseEnergy.si() > 0.0 ? std::optional<double>(e.pulseEnergy.si()) : std::nullopt);
    m_pulseDuration->setValue(e.pulseDuration.si() > 0.0 ? std::optional<double>(e.pulseDuration.si()) : std::nullopt);
    m_prf->setValue(e.prf.si() > 0.0 ? std::optional<double>(e.prf.si()) : std::nullopt);
    m_burstCount->setValue(e.burst ? e.burst->pulsesPerBurst : 0);
    m_burstRate->setValue(e.burst ? std::optional<double>(e.burst->burstRate.si()) : std::nullopt);
    m_diameter->setValue(std::optional<double>(output.beam.diameter.si()));
    m_divergence->setValue(std::optional<double>(output.beam.divergence.si()));
    m_definition->setCurrentIndex(output.beam.definition == model::BeamDefinition::OneOverE ? 0 : 1);
    m_profile->setCurrentIndex(static_cast<int>(output.beam.profile));
    updatePulsedVisibility();
    m_loading = false;
}

void OutputEditor::emitEdit(const QString& field, int mergeKey)
{
    if (!m_loading)
        Q_EMIT outputEdited(m_output, field, mergeKey);
}

void OutputEditor::updatePulsedVisibility()
{
    for (QWidget* w : m_pulsedRows)
        w->setEnabled(m_output.emission.pulsed);
}

} // namespace beamwarden::gui
