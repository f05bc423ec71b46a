#pragma once
// What the command line asks of the GUI at start-up: a lab file or the demo lab, and optionally a screenshot.
#include "panels/panel.hpp"
#include "startupprobe.hpp"

#include <QString>
#include <QStringList>

#include <optional>

class QApplication;

namespace beamwarden::gui {

struct StartupOptions {
    QString labFile;        // empty: no lab file named
    bool openDemo = false;  // --demo: open the bundled demo lab
    QString screenshotPath; // --screenshot FILE.png: render the window after start-up, save, exit
    QString language;       // --language de: force a UI language (otherwise the settings, then the system locale)
    QString panel;          // --panel NAME: the panel to show first (names as in the navigation rail)
    QString laser;          // --laser NAME: the laser to select first
    StartupProbe probe = StartupProbe::None; // hidden options of the performance measurements
};

// Parses the arguments; on --help/--version or a bad argument it prints and returns the exit code instead.
struct StartupParse {
    std::optional<StartupOptions> options;
    int exitCode = 0;
};
[[nodiscard]] StartupParse parseStartupOptions(const QStringList& arguments);

// The panel for a name as the rail shows it (English or the current language), case and spaces ignored.
[[nodiscard]] std::optional<Panel> panelFromName(const QString& name);

// Installs the translation for the UI language (system locale unless overridden).
void installTranslations(QApplication& app, const QString& language);

// Builds the main window from the options, shows it, and runs the event loop. Returns the process exit code.
int runApplication(QApplication& app, const StartupOptions& options);

} // namespace beamwarden::gui
