#pragma once
// The main window's panel area: one panel shown at a time, like QStackedWidget, but sized by the shown panel only.
// QStackedLayout asks every page for its size and its height for a width, so a long word-wrapped text on a hidden
// panel (the assessment's summary, say) was laid out again on every change anywhere in the window, an edit's
// largest cost.
#include <QWidget>

namespace beamwarden::gui {

class PanelStackLayout;

class PanelStack : public QWidget {
    Q_OBJECT
public:
    explicit PanelStack(QWidget* parent = nullptr);

    void addWidget(QWidget* page);
    void setCurrentIndex(int index);
    [[nodiscard]] int currentIndex() const;
    [[nodiscard]] QWidget* widget(int index) const;
    [[nodiscard]] int count() const;

private:
    PanelStackLayout* m_layout = nullptr;
};

} // namespace beamwarden::gui
