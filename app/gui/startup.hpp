#pragma once
// What the command line asks of the GUI at start-up: a lab file or the demo lab, and optionally a screenshot.
#include <QString>
#include <QStringList>

#include <optional>

class QApplication;

namespace beamwarden::gui {

struct StartupOptions {
    QString labFile;        // empty: no lab file named
    bool openDemo = false;  // --demo: open the bundled demo lab
    QString screenshotPath; // --screenshot FILE.png: render the window after start-up, save, exit
    QString language;       // --language de: force a UI language (otherwise the system locale)
};

// Parses the arguments; on --help/--version or a bad argument it prints and returns the exit code instead.
struct StartupParse {
    std::optional<StartupOptions> options;
    int exitCode = 0;
};
[[nodiscard]] StartupParse parseStartupOptions(const QStringList& arguments);

// Installs the translation for the UI language (system locale unless overridden).
void installTranslations(QApplication& app, const QString& language);

// Builds the main window from the options, shows it, and runs the event loop. Returns the process exit code.
int runApplication(QApplication& app, const StartupOptions& options);

} // namespace beamwarden::gui
