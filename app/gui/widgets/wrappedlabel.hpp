#pragma once
// A word-wrapped label that remembers its height for the last widths asked. Layouts ask a label for its height at
// a width many times per pass and Qt does not keep the answer for the minimum height, so a long wrapped text (the
// caution, an assessment's summary) was laid out again, dozens of times per edit anywhere in the window.
#include <QFont>
#include <QLabel>

#include <array>

namespace beamwarden::gui {

class WrappedLabel : public QLabel {
    Q_OBJECT
public:
    explicit WrappedLabel(QWidget* parent = nullptr);

    [[nodiscard]] int heightForWidth(int width) const override;

private:
    struct Entry {
        int width = -1;
        int height = 0;
        QString text;
        QFont font;
        QMargins margins;
    };
    mutable std::array<Entry, 3> m_cache; // a layout pass asks at a few widths
    mutable std::size_t m_next = 0;
};

} // namespace beamwarden::gui
