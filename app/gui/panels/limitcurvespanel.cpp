#include "panels/limitcurvespanel.hpp"

#include "beamwarden/units.hpp"
#include "plots/chartwidget.hpp"
#include "plots/limitcurvecontent.hpp"
#include "widgets/palette.hpp"

#include <QButtonGroup>
#include <QFileDialog>
#include <QGridLayout>
#include <QHBoxLayout>
#include <QLabel>
#include <QMenu>
#include <QMessageBox>
#include <QStackedWidget>
#include <QToolButton>
#include <QVBoxLayout>

namespace beamwarden::gui {

namespace {

constexpr int kMpeChart = 0;
constexpr int kOdChart = 1;
constexpr int kDistanceChart = 2;

QString text(const std::string& s)
{
    return QString::fromStdString(s);
}

QString emissionWords(const hazard::HazardResult& eye)
{
    const model::Emission& e = eye.request.emission;
    const model::Spectrum& spectrum = e.spectrum;
    const QString light = spectrum.isSingleLine() ? text(units::format(spectrum.shortest(), 4))
                                                  : LimitCurvesPanel::tr("%1 to %2")
                                                        .arg(text(units::format(spectrum.shortest(), 4)),
                                                             text(units::format(spectrum.longest(), 4)));
    if (e.pulsed)
        return LimitCurvesPanel::tr("%1, %2 pulses of %3 at %4")
            .arg(light, text(units::format(e.pulseDuration, 3)), text(units::format(e.pulseEnergy, 3)),
                 text(units::format(e.prf, 3)));
    return LimitCurvesPanel::tr("%1, continuous, %2").arg(light, text(units::format(e.averagePower, 3)));
}

} // namespace

LimitCurvesPanel::LimitCurvesPanel(QWidget* parent) : QWidget(parent)
{
    setObjectName(QStringLiteral("limitCurvesPanel"));

    m_caption = new QLabel(this);
    m_caption->setObjectName(QStringLiteral("limitCurvesCaption"));
    QFont captionFont = m_caption->font();
    captionFont.setBold(true);
    m_caption->setFont(captionFont);
    m_caption->setStyleSheet(QStringLiteral("color: %1;").arg(palette::kInk.name()));
    m_details = new QLabel(this);
    m_details->setStyleSheet(QStringLiteral("color: %1;").arg(palette::kNavy.name()));

    // A segmented switch: all three charts at a glance, or one of them large.
    auto* switchRow = new QHBoxLayout;
    switchRow->setSpacing(0);
    m_views = new QButtonGroup(this);
    m_views->setExclusive(true);
    const std::array<QString, 4> names = {tr("All three"), tr("MPE"), tr("Optical density"), tr("Distance")};
    const std::array<QString, 4> tips = {tr("Show the three charts together"), tr("MPE against exposure duration"),
                                         tr("Required and available optical density against wavelength"),
                                         tr("Exposure against distance, with the NOHD")};
    for (int i = 0; i < 4; ++i) {
        auto* button = new QToolButton(this);
        button->setText(names.at(static_cast<std::size_t>(i)));
        button->setToolTip(tips.at(static_cast<std::size_t>(i)));
        button->setCheckable(true);
        button->setObjectName(QStringLiteral("curvesView%1").arg(i));
        m_views->addButton(button, i);
        switchRow->addWidget(button);
    }
    m_views->button(0)->setChecked(true);
    connect(m_views, &QButtonGroup::idClicked, this, [this](int id) { setView(static_cast<View>(id)); });
    const QString navy = palette::kNavy.name();
    setStyleSheet(QStringLiteral("QToolButton[objectName^=\"curvesView\"] { border: 1px solid %1; padding: 3px 10px; "
                                 "background: white; color: %1; }"
                                 "QToolButton[objectName^=\"curvesView\"]:checked { background: %1; color: white; }")
                      .arg(navy));

    m_export = new QToolButton(this);
    m_export->setText(tr("Export chart"));
    m_export->setToolTip(tr("Save a chart as a PNG image or an SVG drawing"));
    m_export->setPopupMode(QToolButton::InstantPopup);
    auto* exportMenu = new QMenu(m_export);
    for (int i = 0; i < chartCount(); ++i)
        exportMenu->addAction(tr("%1…").arg(chartName(i)), this, [this, i] { exportWithDialog(i); });
    m_export->setMenu(exportMenu);

    auto* header = new QHBoxLayout;
    auto* captionColumn = new QVBoxLayout;
    captionColumn->setSpacing(2);
    captionColumn->addWidget(m_caption);
    captionColumn->addWidget(m_details);
    header->addLayout(captionColumn, 1);
    header->addLayout(switchRow);
    header->addSpacing(12);
    header->addWidget(m_export);

    m_empty = new QLabel(this);
    m_empty->setObjectName(QStringLiteral("limitCurvesEmpty"));
    m_empty->setAlignment(Qt::AlignCenter);
    m_empty->setWordWrap(true);
    m_empty->setStyleSheet(QStringLiteral("color: #6b7686; font-style: italic;"));

    auto* charts = new QWidget(this);
    m_grid = new QGridLayout(charts);
    m_grid->setContentsMargins(0, 0, 0, 0);
    m_grid->setSpacing(10);
    for (std::size_t i = 0; i < m_charts.size(); ++i) {
        m_charts.at(i) = new ChartWidget(charts);
        m_charts.at(i)->setObjectName(QStringLiteral("limitCurvesChart%1").arg(i));
    }
    m_grid->addWidget(m_charts.at(kMpeChart), 0, 0, 1, 2);
    m_grid->addWidget(m_charts.at(kOdChart), 1, 0);
    m_grid->addWidget(m_charts.at(kDistanceChart), 1, 1);
    m_grid->setRowStretch(0, 1);
    m_grid->setRowStretch(1, 1);

    m_stack = new QStackedWidget(this);
    m_stack->addWidget(m_empty);
    m_stack->addWidget(charts);

    auto* layout = new QVBoxLayout(this);
    layout->setContentsMargins(0, 0, 0, 0);
    layout->setSpacing(8);
    layout->addLayout(header);
    layout->addWidget(m_stack, 1);
    clear();
}

int LimitCurvesPanel::chartCount() const
{
    return static_cast<int>(m_charts.size());
}

QString LimitCurvesPanel::chartName(int chartIndex) const
{
    switch (chartIndex) {
    case kMpeChart:
        return tr("MPE against exposure duration");
    case kOdChart:
        return tr("Optical density against wavelength");
    case kDistanceChart:
        return tr("Exposure against distance");
    default:
        break;
    }
    return {};
}

void LimitCurvesPanel::clear()
{
    showEmpty(tr("Select a laser output to plot its limit curves."));
}

void LimitCurvesPanel::showEmpty(const QString& sentence)
{
    for (ChartWidget* chart : m_charts)
        chart->clear();
    m_showing = false;
    m_caption->setText(tr("No output selected"));
    m_details->clear();
    m_empty->setText(sentence);
    m_stack->setCurrentWidget(m_empty);
    m_export->setEnabled(false);
    for (QAbstractButton* button : m_views->buttons())
        button->setEnabled(false);
}

void LimitCurvesPanel::showAssessment(const assessment::LaserAssessment& assessment,
                                      const std::vector<model::EyewearItem>& shelf, int outputIndex, int caseIndex)
{
    const auto outputs = static_cast<int>(assessment.outputs.size());
    if (outputIndex < 0 || outputIndex >= outputs) {
        showEmpty(tr("This laser has no output number %1 to plot.").arg(outputIndex + 1));
        return;
    }
    const assessment::OutputAssessment& output = assessment.outputs[static_cast<std::size_t>(outputIndex)];
    if (caseIndex < 0 || caseIndex >= static_cast<int>(output.cases.size())) {
        showEmpty(tr("This output has no exposure case number %1 to plot.").arg(caseIndex + 1));
        return;
    }
    const assessment::CaseAssessment& exposureCase = output.cases[static_cast<std::size_t>(caseIndex)];
    if (exposureCase.eye.lines.empty()) {
        showEmpty(tr("This exposure case has no wavelength to plot."));
        return;
    }

    m_charts.at(kMpeChart)->setContent(LimitCurveContent::mpeAgainstDuration(exposureCase, assessment.options));
    m_charts.at(kOdChart)->setContent(
        LimitCurveContent::odAgainstWavelength(exposureCase, output.name, shelf, assessment.eyewear));
    m_charts.at(kDistanceChart)->setContent(LimitCurveContent::exposureAgainstDistance(exposureCase));

    m_caption->setText(tr("%1 — %2, %3").arg(text(assessment.laser.name), text(output.name), text(exposureCase.name)));
    m_details->setText(emissionWords(exposureCase.eye));
    m_showing = true;
    m_stack->setCurrentIndex(1);
    m_export->setEnabled(true);
    for (QAbstractButton* button : m_views->buttons())
        button->setEnabled(true);
}

void LimitCurvesPanel::setView(View view)
{
    m_charts.at(kMpeChart)->setVisible(view == View::All || view == View::Mpe);
    m_charts.at(kOdChart)->setVisible(view == View::All || view == View::Od);
    m_charts.at(kDistanceChart)->setVisible(view == View::All || view == View::Distance);
    // One chart alone takes the whole area.
    m_grid->removeWidget(m_charts.at(kOdChart));
    m_grid->removeWidget(m_charts.at(kDistanceChart));
    if (view == View::All) {
        m_grid->addWidget(m_charts.at(kOdChart), 1, 0);
        m_grid->addWidget(m_charts.at(kDistanceChart), 1, 1);
        m_grid->setRowStretch(1, 1);
    } else {
        m_grid->addWidget(m_charts.at(kOdChart), 0, 0, 1, 2);
        m_grid->addWidget(m_charts.at(kDistanceChart), 0, 0, 1, 2);
        m_grid->setRowStretch(1, 0);
    }
}

bool LimitCurvesPanel::exportChart(int chartIndex, const QString& path)
{
    if (!m_showing || chartIndex < 0 || chartIndex >= chartCount())
        return false;
    return m_charts.at(static_cast<std::size_t>(chartIndex))->exportTo(path);
}

void LimitCurvesPanel::exportWithDialog(int chartIndex)
{
    const QString path = QFileDialog::getSaveFileName(this, tr("Export %1").arg(chartName(chartIndex)), {},
                                                      tr("PNG image (*.png);;SVG drawing (*.svg)"));
    if (path.isEmpty())
        return;
    if (!exportChart(chartIndex, path))
        QMessageBox::warning(this, tr("Export chart"),
                             tr("The chart could not be written to %1. Use a name ending in .png or .svg in a folder "
                                "you can write to.")
                                 .arg(path));
}

} // namespace beamwarden::gui
