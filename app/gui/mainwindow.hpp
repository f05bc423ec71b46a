#pragma once
// The main window: the caution strip, a laser selector, the navigation rail of the six panels and the panel area;
// the open lab file and the rule set in the title and status bar. It owns the open lab and recomputes the selected
// laser's assessment on every change (the engines are fast enough to do it on each edit).
#include "beamwarden/assessment/assessment.hpp"
#include "panels/panel.hpp"

#include <QMainWindow>

#include <memory>
#include <optional>

class QComboBox;
class QLabel;
class QListWidget;
class QMenu;

namespace beamwarden::gui {

class AssessmentPanel;
class CautionStrip;
class EyewearPanel;
class HazardSheetPanel;
class HistoryPanel;
class LimitCurvesPanel;
class LabDocument;
class LasersPanel;
class PanelPage;
class PanelStack;

class MainWindow : public QMainWindow {
    Q_OBJECT
public:
    explicit MainWindow(QWidget* parent = nullptr);
    ~MainWindow() override;

    void showPanel(Panel panel);
    [[nodiscard]] Panel currentPanel() const;
    [[nodiscard]] PanelPage* panelPage(Panel panel) const;
    [[nodiscard]] CautionStrip* cautionStrip() const { return m_caution; }

    // Opens a lab file; on refusal shows the reason in the status bar and returns it.
    Result<void> openLab(const QString& path);
    // Opens (creating it on first use) the demo lab in the user's data folder.
    Result<void> openDemoLab();
    [[nodiscard]] LabDocument* document() const { return m_document.get(); }
    void selectLaser(int index);
    [[nodiscard]] int selectedLaser() const;
    [[nodiscard]] const std::optional<assessment::LaserAssessment>& currentAssessment() const { return m_assessment; }
    [[nodiscard]] LasersPanel* lasersPanel() const { return m_lasersPanel; }
    [[nodiscard]] AssessmentPanel* assessmentPanel() const { return m_assessmentPanel; }
    [[nodiscard]] EyewearPanel* eyewearPanel() const { return m_eyewearPanel; }
    [[nodiscard]] HistoryPanel* historyPanel() const { return m_historyPanel; }
    [[nodiscard]] LimitCurvesPanel* limitCurvesPanel() const { return m_curvesPanel; }
    [[nodiscard]] HazardSheetPanel* hazardSheetPanel() const { return m_sheetPanel; }

    // Shows which lab is open: its name in the title, the file (or "demo lab") in the status bar.
    void setLab(const QString& labName, const QString& fileLabel);

public Q_SLOTS:
    void recompute();

private:
    void buildMenus();
    void buildStatusBar();
    void showAbout();
    void attachDocument(std::unique_ptr<LabDocument> document);
    void refreshLaserSelector();
    void refreshRuleSetLabel();
    void chooseAndOpen();
    void newLab();
    void importExport();
    void exportLab();
    void importEyewearCsv();
    void backupLab();
    void fillRecentMenu();
    // The curves and the sheet cost more to draw than the tables, so they are redrawn when shown, not on every edit.
    void refreshDeferredPanels();
    void refreshCurveSelectors();

    std::unique_ptr<LabDocument> m_document;
    std::optional<assessment::LaserAssessment> m_assessment;
    QListWidget* m_navigation = nullptr;
    PanelStack* m_pages = nullptr;
    CautionStrip* m_caution = nullptr;
    QComboBox* m_laserSelector = nullptr;
    QLabel* m_labLabel = nullptr;
    QLabel* m_ruleSetLabel = nullptr;
    QMenu* m_recentMenu = nullptr;
    LasersPanel* m_lasersPanel = nullptr;
    AssessmentPanel* m_assessmentPanel = nullptr;
    EyewearPanel* m_eyewearPanel = nullptr;
    HistoryPanel* m_historyPanel = nullptr;
    LimitCurvesPanel* m_curvesPanel = nullptr;
    HazardSheetPanel* m_sheetPanel = nullptr;
    QComboBox* m_curveOutput = nullptr;
    QComboBox* m_curveCase = nullptr;
    bool m_curvesStale = true;
    bool m_sheetStale = true;
    bool m_selecting = false;
};

} // namespace beamwarden::gui
