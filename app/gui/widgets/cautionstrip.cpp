#include "widgets/cautionstrip.hpp"

#include "beamwarden/caution.hpp"
#include "widgets/palette.hpp"
#include "widgets/wrappedlabel.hpp"

#include <QCoreApplication>
#include <QHBoxLayout>
#include <QLabel>
#include <QToolButton>

namespace beamwarden::gui {

const char* const kCautionSourceText = QT_TRANSLATE_NOOP(
    "Caution", "Caution: these figures follow the published formula structure of the rule set named with them. They "
               "support, and never replace, the judgement of your institution's laser safety officer; local "
               "regulations and the manufacturer's data take precedence. Check every input before relying on a "
               "figure.");

CautionStrip::CautionStrip(QWidget* parent) : QFrame(parent)
{
    setObjectName(QStringLiteral("cautionStrip"));
    setFrameShape(QFrame::NoFrame);
    setAutoFillBackground(true);
    setStyleSheet(QStringLiteral("#cautionStrip { background: %1; border-bottom: 2px solid %2; }"
                                 "#cautionStrip QLabel { color: %3; }")
                      .arg(palette::kCautionBackground.name(), palette::kOrange.name(), palette::kInk.name()));

    m_icon = new QLabel(QStringLiteral("\u26A0"), this);
    QFont iconFont = m_icon->font();
    iconFont.setPointSizeF(iconFont.pointSizeF() * 1.6);
    m_icon->setFont(iconFont);
    m_icon->setAlignment(Qt::AlignTop);

    m_text = new WrappedLabel(this); // always shown, so laid out on every change in the window
    m_text->setObjectName(QStringLiteral("cautionText"));
    m_text->setTextInteractionFlags(Qt::TextSelectableByMouse);

    m_foldButton = new QToolButton(this);
    m_foldButton->setAutoRaise(true);
    connect(m_foldButton, &QToolButton::clicked, this, [this] { setFolded(!m_folded); });

    auto* layout = new QHBoxLayout(this);
    layout->setContentsMargins(12, 8, 12, 8);
    layout->setSpacing(10);
    layout->addWidget(m_icon);
    layout->addWidget(m_text, 1);
    layout->addWidget(m_foldButton, 0, Qt::AlignTop);
    setFolded(false);
}

QString CautionStrip::cautionText() const
{
    // The source text lives in core so the CLI and the sheets carry the same words; tr() offers a translation.
    const std::string_view text = caution();
    const QByteArray source(text.data(), static_cast<qsizetype>(text.size()));
    return QCoreApplication::translate("Caution", source.constData());
}

void CautionStrip::setFolded(bool folded)
{
    m_folded = folded;
    // Folded still says what matters: the figures support, not replace, the laser safety officer.
    m_text->setText(folded ? tr("Caution: an aid to your laser safety officer, not a substitute. Local rules take "
                                "precedence.")
                           : cautionText());
    m_foldButton->setText(folded ? tr("More") : tr("Less"));
    m_foldButton->setToolTip(folded ? tr("Show the full caution") : tr("Fold the caution to one line"));
}

} // namespace beamwarden::gui
