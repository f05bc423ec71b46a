#pragma once
// The caution strip: always on screen, above every panel. It may be folded to one line, never removed.
#include <QFrame>

class QLabel;
class QToolButton;

namespace beamwarden::gui {

// The caution's English text as lupdate sees it (context "Caution"): it must equal core's caution(), which a test
// checks, so the translation is never dropped as obsolete.
extern const char* const kCautionSourceText;

class CautionStrip : public QFrame {
    Q_OBJECT
public:
    explicit CautionStrip(QWidget* parent = nullptr);

    // The full caution text shown when unfolded (translated from core's caution()).
    [[nodiscard]] QString cautionText() const;
    [[nodiscard]] bool isFolded() const { return m_folded; }
    void setFolded(bool folded);

private:
    QLabel* m_icon = nullptr;
    QLabel* m_text = nullptr;
    QToolButton* m_foldButton = nullptr;
    bool m_folded = false;
};

} // namespace beamwarden::gui
