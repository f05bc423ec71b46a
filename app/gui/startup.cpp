#include "startup.hpp"

#include "beamwarden/caution.hpp"
#include "document/labdocument.hpp"
#include "mainwindow.hpp"
#include "settings/settings.hpp"

#include <QApplication>
#include <QCommandLineParser>
#include <QFileInfo>
#include <QImageWriter>
#include <QLibraryInfo>
#include <QLocale>
#include <QTimer>
#include <QTranslator>

#include <cstdio>

namespace beamwarden::gui {

namespace {

bool saveScreenshot(QWidget& window, const QString& path)
{
    const QPixmap shot = window.grab();
    QImageWriter writer(path);
    if (shot.isNull() || !writer.write(shot.toImage())) {
        std::fprintf(stderr, "beamwarden: could not write the screenshot to %s: %s\n", qPrintable(path),
                     qPrintable(writer.errorString()));
        return false;
    }
    return true;
}

} // namespace

StartupParse parseStartupOptions(const QStringList& arguments)
{
    QCommandLineParser parser;
    parser.setApplicationDescription(QApplication::translate(
        "Startup", "Beamwarden: exposure limits, hazard distances and eyewear for laser labs."));
    parser.addHelpOption();
    parser.addVersionOption();
    const QCommandLineOption demo(QStringLiteral("demo"), QApplication::translate("Startup", "Open the demo lab."));
    const QCommandLineOption screenshot(
        QStringLiteral("screenshot"),
        QApplication::translate("Startup", "Render the main window to FILE (PNG) after start-up, then exit."),
        QStringLiteral("FILE"));
    const QCommandLineOption language(QStringLiteral("language"),
                                      QApplication::translate("Startup", "User-interface language, e.g. en or de."),
                                      QStringLiteral("CODE"));
    const QCommandLineOption lab(QStringLiteral("lab"), QApplication::translate("Startup", "Lab file to open."),
                                 QStringLiteral("FILE"));
    const QCommandLineOption panel(
        QStringLiteral("panel"),
        QApplication::translate("Startup", "Panel to show: Lasers, Eyewear, Assessment, Limit curves, Hazard sheet, "
                                           "History."),
        QStringLiteral("NAME"));
    const QCommandLineOption laser(QStringLiteral("laser"),
                                   QApplication::translate("Startup", "Laser to select, by name."),
                                   QStringLiteral("NAME"));
    // For tests/bench/measure_gui: report the first paint (or every panel's) on standard output, then quit.
    QCommandLineOption firstPaint(QStringLiteral("exit-after-first-paint"), QString());
    QCommandLineOption everyPanel(QStringLiteral("exit-after-every-panel"), QString());
    firstPaint.setFlags(QCommandLineOption::HiddenFromHelp);
    everyPanel.setFlags(QCommandLineOption::HiddenFromHelp);
    parser.addOptions({demo, screenshot, language, lab, panel, laser, firstPaint, everyPanel});
    parser.addPositionalArgument(QStringLiteral("lab"), QApplication::translate("Startup", "Lab file to open."),
                                 QStringLiteral("[LAB.bwlab]"));

    StartupParse result;
    if (!parser.parse(arguments)) {
        std::fprintf(stderr, "beamwarden: %s\n", qPrintable(parser.errorText()));
        result.exitCode = 2;
        return result;
    }
    if (parser.isSet(QStringLiteral("help"))) {
        std::fputs(qPrintable(parser.helpText()), stdout);
        return result;
    }
    if (parser.isSet(QStringLiteral("version"))) {
        std::printf("beamwarden %s\n", programVersion().data());
        return result;
    }
    const QStringList positional = parser.positionalArguments();
    if (positional.size() > 1) {
        std::fprintf(stderr, "beamwarden: open one lab file at a time (got %lld)\n",
                     static_cast<long long>(positional.size()));
        result.exitCode = 2;
        return result;
    }
    StartupOptions options;
    options.openDemo = parser.isSet(demo);
    options.screenshotPath = parser.value(screenshot);
    options.language = parser.value(language);
    options.panel = parser.value(panel);
    options.laser = parser.value(laser);
    options.labFile = parser.value(lab);
    if (parser.isSet(everyPanel))
        options.probe = StartupProbe::EveryPanel;
    else if (parser.isSet(firstPaint))
        options.probe = StartupProbe::FirstPaint;
    if (!positional.isEmpty()) {
        if (!options.labFile.isEmpty()) {
            std::fprintf(stderr, "beamwarden: give the lab file once (--lab or as an argument)\n");
            result.exitCode = 2;
            return result;
        }
        options.labFile = positional.first();
    }
    if (!options.panel.isEmpty() && !panelFromName(options.panel)) {
        std::fprintf(stderr,
                     "beamwarden: --panel: '%s' is not a panel; expected one of Lasers, Eyewear, Assessment, "
                     "\"Limit curves\", \"Hazard sheet\", History\n",
                     qPrintable(options.panel));
        result.exitCode = 2;
        return result;
    }
    result.options = options;
    return result;
}

std::optional<Panel> panelFromName(const QString& name)
{
    const QString wanted = name.simplified().toLower().remove(QLatin1Char(' ')).remove(QLatin1Char('-'));
    const char* const english[] = {"lasers", "eyewear", "assessment", "limitcurves", "hazardsheet", "history"};
    for (int i = 0; i < kPanelCount; ++i) {
        const QString title = panelTitle(static_cast<Panel>(i)).toLower().remove(QLatin1Char(' '));
        if (wanted == QString::fromLatin1(english[i]) || wanted == title)
            return static_cast<Panel>(i);
    }
    return std::nullopt;
}

void installTranslations(QApplication& app, const QString& requested)
{
    const QString language = requested.isEmpty() ? Settings::language() : requested;
    const QLocale locale = language.isEmpty() ? QLocale::system() : QLocale(language);
    auto* ours = new QTranslator(&app);
    if (ours->load(locale, QStringLiteral("beamwarden"), QStringLiteral("_"), QStringLiteral(":/i18n")))
        QApplication::installTranslator(ours);
    auto* qtBase = new QTranslator(&app);
    if (qtBase->load(locale, QStringLiteral("qtbase"), QStringLiteral("_"),
                     QLibraryInfo::path(QLibraryInfo::TranslationsPath)))
        QApplication::installTranslator(qtBase);
}

int runApplication(QApplication& app, const StartupOptions& options)
{
    MainWindow window;
    if (options.openDemo) {
        if (auto opened = window.openDemoLab(); !opened) {
            std::fprintf(stderr, "beamwarden: the demo lab could not be opened: %s\n",
                         opened.error().message().c_str());
            return 1;
        }
    } else if (!options.labFile.isEmpty()) {
        if (auto opened = window.openLab(options.labFile); !opened) {
            std::fprintf(stderr, "beamwarden: %s\n", opened.error().message().c_str());
            if (!options.screenshotPath.isEmpty() || options.probe != StartupProbe::None)
                return 2; // nothing to show or measure without the lab asked for
        }
    }
    if (!options.laser.isEmpty() && window.document()) {
        const auto& lasers = window.document()->lasers();
        for (std::size_t i = 0; i < lasers.size(); ++i) {
            if (QString::fromStdString(lasers[i].name) == options.laser)
                window.selectLaser(static_cast<int>(i));
        }
    }
    if (const auto panel = panelFromName(options.panel))
        window.showPanel(*panel);
    installStartupProbe(window, options.probe);
    window.show();

    if (!options.screenshotPath.isEmpty()) {
        int exitCode = 0;
        // Let layouts and the first paint settle before grabbing.
        QTimer::singleShot(300, &window, [&] {
            exitCode = saveScreenshot(window, options.screenshotPath) ? 0 : 1;
            app.exit(exitCode);
        });
        app.exec();
        return exitCode;
    }
    return app.exec();
}

} // namespace beamwarden::gui
