// beamwarden: the desktop application.
#include "beamwarden/caution.hpp"
#include "startup.hpp"

#include <QApplication>

int main(int argc, char* argv[])
{
    QApplication app(argc, argv);
    QApplication::setApplicationName(QStringLiteral("Beamwarden"));
    QApplication::setOrganizationName(QStringLiteral("Beamwarden"));
    const std::string_view version = beamwarden::programVersion();
    QApplication::setApplicationVersion(QString::fromUtf8(version.data(), static_cast<qsizetype>(version.size())));

    const beamwarden::gui::StartupParse parsed = beamwarden::gui::parseStartupOptions(QApplication::arguments());
    if (!parsed.options)
        return parsed.exitCode;
    beamwarden::gui::installTranslations(app, parsed.options->language);
    return beamwarden::gui::runApplication(app, *parsed.options);
}
