#pragma once
// The main window: a navigation rail of the six panels, the panel area, the caution strip above both, and the
// open lab file and rule set in the title and status bar.
#include "panels/panel.hpp"

#include <QMainWindow>

class QLabel;
class QListWidget;
class QStackedWidget;

namespace beamwarden::gui {

class CautionStrip;
class PanelPage;

class MainWindow : public QMainWindow {
    Q_OBJECT
public:
    explicit MainWindow(QWidget* parent = nullptr);

    void showPanel(Panel panel);
    [[nodiscard]] Panel currentPanel() const;
    [[nodiscard]] PanelPage* panelPage(Panel panel) const;
    [[nodiscard]] CautionStrip* cautionStrip() const { return m_caution; }

    // Shows which lab is open: its name in the title, the file (or "demo lab") in the status bar.
    void setLab(const QString& labName, const QString& fileLabel);

private:
    void buildMenus();
    void buildStatusBar();
    void showAbout();

    QListWidget* m_navigation = nullptr;
    QStackedWidget* m_pages = nullptr;
    CautionStrip* m_caution = nullptr;
    QLabel* m_labLabel = nullptr;
    QLabel* m_ruleSetLabel = nullptr;
};

} // namespace beamwarden::gui
