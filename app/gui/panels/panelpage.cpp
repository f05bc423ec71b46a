#include "panels/panelpage.hpp"

#include "widgets/palette.hpp"
#include "widgets/wrappedlabel.hpp"

#include <QLabel>
#include <QVBoxLayout>

namespace beamwarden::gui {

namespace {

QString emptyStateText(Panel panel)
{
    switch (panel) {
    case Panel::Lasers:
        return PanelPage::tr("No lasers in this lab yet.");
    case Panel::Eyewear:
        return PanelPage::tr("No eyewear on the shelf yet.");
    case Panel::Assessment:
        return PanelPage::tr("Select a laser to see its assessment.");
    case Panel::LimitCurves:
        return PanelPage::tr("Select a laser to plot its limit curves.");
    case Panel::HazardSheet:
        return PanelPage::tr("Select a laser to preview its hazard sheet.");
    case Panel::History:
        return PanelPage::tr("No assessments recorded yet.");
    case Panel::Count:
        break;
    }
    return {};
}

} // namespace

PanelPage::PanelPage(Panel panel, QWidget* parent) : QWidget(parent), m_panel(panel)
{
    auto* heading = new QLabel(panelTitle(panel), this);
    heading->setObjectName(QStringLiteral("panelHeading"));
    QFont headingFont = heading->font();
    headingFont.setPointSizeF(headingFont.pointSizeF() * 1.5);
    headingFont.setBold(true);
    heading->setFont(headingFont);

    auto* purpose = new WrappedLabel(this);
    purpose->setText(panelPurpose(panel));
    purpose->setStyleSheet(QStringLiteral("color: %1;").arg(palette::kNavy.name()));

    auto* empty = new QLabel(emptyStateText(panel), this);
    empty->setAlignment(Qt::AlignCenter);
    empty->setStyleSheet(QStringLiteral("color: #6b7686; font-style: italic;"));

    m_layout = new QVBoxLayout(this);
    m_layout->setContentsMargins(20, 16, 20, 16);
    m_layout->addWidget(heading);
    m_layout->addWidget(purpose);
    m_layout->addSpacing(8);
    m_layout->addWidget(empty, 1);
    m_body = empty;
}

void PanelPage::setBody(QWidget* body)
{
    // replaceWidget() hands back the old widget's layout item, which the caller owns (found by LeakSanitizer).
    delete m_layout->replaceWidget(m_body, body);
    delete m_body;
    m_body = body;
    m_layout->setStretchFactor(body, 1);
}

} // namespace beamwarden::gui
