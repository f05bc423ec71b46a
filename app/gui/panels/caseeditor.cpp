#include "panels/caseeditor.hpp"

#include "widgets/quantityfield.hpp"

#include <QComboBox>
#include <QFormLayout>
#include <QHBoxLayout>
#include <QLineEdit>
#include <QListWidget>
#include <QPushButton>
#include <QVBoxLayout>

namespace beamwarden::gui {

namespace {

enum MergeKey {
    kName = 300,
    kViewing,
    kExposure,
    kDistance,
    kFocal,
    kNa,
    kReflectance,
    kAngle,
    kMagnification,
    kObjective,
    kTransmission,
    kList
};

QString viewingTitle(model::Viewing v)
{
    switch (v) {
    case model::Viewing::Direct:
        return CaseEditor::tr("intrabeam (direct)");
    case model::Viewing::Lens:
        return CaseEditor::tr("behind a lens");
    case model::Viewing::Fibre:
        return CaseEditor::tr("fibre end");
    case model::Viewing::Diffuse:
        return CaseEditor::tr("diffuse reflection");
    case model::Viewing::Specular:
        return CaseEditor::tr("specular reflection");
    case model::Viewing::Aided:
        return CaseEditor::tr("through magnifying optics");
    }
    return {};
}

std::optional<double> positive(double v)
{
    return v > 0.0 ? std::optional<double>(v) : std::nullopt;
}

} // namespace

CaseEditor::CaseEditor(QWidget* parent) : QWidget(parent)
{
    m_list = new QListWidget(this);
    m_list->setMaximumHeight(90);
    m_add = new QPushButton(tr("Add case"), this);
    m_remove = new QPushButton(tr("Remove case"), this);
    m_name = new QLineEdit(this);
    m_viewing = new QComboBox(this);
    for (int v = 0; v <= static_cast<int>(model::Viewing::Aided); ++v)
        m_viewing->addItem(viewingTitle(static_cast<model::Viewing>(v)));
    m_exposure = durationField(this);
    m_exposure->setOptional(true);
    m_exposure->setPlaceholder(tr("default: 100 s (30000 s below 400 nm)"));
    m_distance = lengthField(this);
    m_distance->setOptional(true);
    m_distance->setPlaceholder(tr("closest approach; empty: at the exit"));
    m_focal = lengthField(this);
    m_na = numberField(0.0001, 0.9999, this);
    m_reflectance = numberField(0.0, 1.0, this);
    m_angle = angleField(this);
    m_angle->setOptional(true);
    m_magnification = numberField(1.0, 1000.0, this);
    m_objective = lengthField(this);
    m_transmission = numberField(0.0, 1.0, this);
    // The ranges the record allows, marked while typing (model/ranges.hpp), not only when the lab file refuses.
    checkAs(m_exposure, model::Quantity::Exposure, "exposure duration");
    checkAs(m_distance, model::Quantity::Distance, "distance");

    auto* buttons = new QHBoxLayout;
    buttons->addWidget(m_add);
    buttons->addWidget(m_remove);
    buttons->addStretch();
    m_form = new QFormLayout;
    m_form->addRow(tr("Case name"), m_name);
    m_form->addRow(tr("Viewing"), m_viewing);
    m_form->addRow(tr("Exposure duration"), m_exposure);
    m_form->addRow(tr("Distance"), m_distance);
    m_form->addRow(tr("Focal length"), m_focal);
    m_form->addRow(tr("Numerical aperture"), m_na);
    m_form->addRow(tr("Reflectance"), m_reflectance);
    m_form->addRow(tr("Viewing angle"), m_angle);
    m_form->addRow(tr("Magnification"), m_magnification);
    m_form->addRow(tr("Objective diameter"), m_objective);
    m_form->addRow(tr("Transmission"), m_transmission);
    auto* layout = new QVBoxLayout(this);
    layout->setContentsMargins(0, 0, 0, 0);
    layout->addWidget(m_list);
    layout->addLayout(buttons);
    layout->addLayout(m_form);

    connect(m_list, &QListWidget::currentRowChanged, this, &CaseEditor::showCase);
    connect(m_add, &QPushButton::clicked, this, [this] {
        m_cases.push_back(model::NamedExposureCase{0, tr("intrabeam at the exit").toStdString(), {}});
        edited(tr("add exposure case"), kList);
    });
    connect(m_remove, &QPushButton::clicked, this, [this] {
        const int row = m_list->currentRow();
        if (row < 0 || static_cast<std::size_t>(row) >= m_cases.size())
            return;
        m_cases.erase(m_cases.begin() + row);
        edited(tr("remove exposure case"), kList);
    });
    connect(m_name, &QLineEdit::editingFinished, this, [this] {
        if (auto* c = current(); c && c->name != m_name->text().trimmed().toStdString()) {
            c->name = m_name->text().trimmed().toStdString();
            edited(tr("case name"), kName);
        }
    });
    connect(m_viewing, &QComboBox::activated, this, [this](int index) {
        if (auto* c = current()) {
            c->exposureCase.viewing = static_cast<model::Viewing>(index);
            updateVisibility();
            edited(tr("viewing"), kViewing);
        }
    });
    auto bind = [this](QuantityField* field, auto apply, const QString& what, int key) {
        connect(field, &QuantityField::valueCommitted, this, [this, apply, what, key](std::optional<double> v) {
            if (auto* c = current()) {
                apply(c->exposureCase, v.value_or(0.0));
                edited(what, key);
            }
        });
    };
    bind(
        m_exposure, [](model::ExposureCase& c, double v) { c.exposure = units::Duration::fromSi(v); },
        tr("exposure duration"), kExposure);
    bind(
        m_distance, [](model::ExposureCase& c, double v) { c.distance = units::Length::fromSi(v); }, tr("distance"),
        kDistance);
    bind(
        m_focal, [](model::ExposureCase& c, double v) { c.focalLength = units::Length::fromSi(v); }, tr("focal length"),
        kFocal);
    bind(
        m_na, [](model::ExposureCase& c, double v) { c.numericalAperture = v; }, tr("numerical aperture"), kNa);
    bind(
        m_reflectance, [](model::ExposureCase& c, double v) { c.reflectance = v; }, tr("reflectance"), kReflectance);
    bind(
        m_angle, [](model::ExposureCase& c, double v) { c.viewingAngle = units::Angle::fromSi(v); },
        tr("viewing angle"), kAngle);
    bind(
        m_magnification, [](model::ExposureCase& c, double v) { c.magnification = v; }, tr("magnification"),
        kMagnification);
    bind(
        m_objective, [](model::ExposureCase& c, double v) { c.objectiveDiameter = units::Length::fromSi(v); },
        tr("objective diameter"), kObjective);
    bind(
        m_transmission, [](model::ExposureCase& c, double v) { c.transmission = v; }, tr("transmission"),
        kTransmission);
}

void CaseEditor::setCases(const std::vector<model::NamedExposureCase>& cases)
{
    m_loading = true;
    const int row = std::max(0, m_list->currentRow());
    m_cases = cases;
    m_list->clear();
    for (const model::NamedExposureCase& c : m_cases)
        m_list->addItem(
            QStringLiteral("%1 — %2").arg(QString::fromStdString(c.name), viewingTitle(c.exposureCase.viewing)));
    if (m_cases.empty())
        m_list->addItem(tr("(none: intrabeam at the exit is assumed)"));
    m_list->setCurrentRow(std::min(row, m_list->count() - 1));
    m_loading = false;
    showCase(m_list->currentRow());
}

model::NamedExposureCase* CaseEditor::current()
{
    const int row = m_list->currentRow();
    if (row < 0 || static_cast<std::size_t>(row) >= m_cases.size())
        return nullptr;
    return &m_cases[static_cast<std::size_t>(row)];
}

void CaseEditor::showCase(int)
{
    m_loading = true;
    const model::NamedExposureCase* c = current();
    const bool has = c != nullptr;
    for (QWidget* w :
         std::initializer_list<QWidget*>{m_name, m_viewing, m_exposure, m_distance, m_focal, m_na, m_reflectance,
                                         m_angle, m_magnification, m_objective, m_transmission, m_remove})
        w->setEnabled(has);
    if (has) {
        const model::ExposureCase& e = c->exposureCase;
        m_name->setText(QString::fromStdString(c->name));
        m_viewing->setCurrentIndex(static_cast<int>(e.viewing));
        m_exposure->setValue(positive(e.exposure.si()));
        m_distance->setValue(positive(e.distance.si()));
        m_focal->setValue(positive(e.focalLength.si()));
        m_na->setValue(positive(e.numericalAperture));
        m_reflectance->setValue(e.reflectance);
        m_angle->setValue(e.viewingAngle.si());
        m_magnification->setValue(e.magnification);
        m_objective->setValue(positive(e.objectiveDiameter.si()));
        m_transmission->setValue(e.transmission);
    }
    updateVisibility();
    m_loading = false;
}

void CaseEditor::updateVisibility()
{
    const model::NamedExposureCase* c = current();
    const model::Viewing v = c ? c->exposureCase.viewing : model::Viewing::Direct;
    using model::Viewing;
    m_form->setRowVisible(m_focal, v == Viewing::Lens);
    m_form->setRowVisible(m_na, v == Viewing::Fibre);
    m_form->setRowVisible(m_reflectance, v == Viewing::Diffuse || v == Viewing::Specular);
    m_form->setRowVisible(m_angle, v == Viewing::Diffuse);
    m_form->setRowVisible(m_magnification, v == Viewing::Aided);
    m_form->setRowVisible(m_objective, v == Viewing::Aided);
    m_form->setRowVisible(m_transmission, v == Viewing::Aided);
}

void CaseEditor::edited(const QString& field, int mergeKey)
{
    if (!m_loading)
        Q_EMIT casesEdited(m_cases, field, mergeKey);
}

} // namespace beamwarden::gui
