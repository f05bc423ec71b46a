#include "startup.hpp"

#include "beamwarden/caution.hpp"
#include "mainwindow.hpp"

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

// The demo lab's name; its records arrive with the lab file (the window shows the name until then).
const char* const kDemoLabName = "Larkspur Ridge Photonics Laboratory";

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
    parser.addOptions({demo, screenshot, language});
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
    if (!positional.isEmpty())
        options.labFile = positional.first();
    result.options = options;
    return result;
}

void installTranslations(QApplication& app, const QString& language)
{
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
    if (options.openDemo)
        window.setLab(QString::fromUtf8(kDemoLabName), MainWindow::tr("demo lab"));
    else if (!options.labFile.isEmpty())
        window.setLab(QFileInfo(options.labFile).completeBaseName(), options.labFile);
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
