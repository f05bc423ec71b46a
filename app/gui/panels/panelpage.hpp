#pragma once
// A panel's frame: heading, one line on its purpose, and the body. Until a panel has content, the body says so.
#include "panels/panel.hpp"

#include <QWidget>

class QVBoxLayout;

namespace beamwarden::gui {

class PanelPage : public QWidget {
    Q_OBJECT
public:
    explicit PanelPage(Panel panel, QWidget* parent = nullptr);

    [[nodiscard]] Panel panel() const { return m_panel; }
    // Replaces the empty-state body with real content (takes ownership).
    void setBody(QWidget* body);

private:
    Panel m_panel;
    QVBoxLayout* m_layout = nullptr;
    QWidget* m_body = nullptr;
};

} // namespace beamwarden::gui
