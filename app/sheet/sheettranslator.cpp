#include "sheettranslator.hpp"

#include <QCoreApplication>
#include <QLocale>
#include <QTranslator>

namespace beamwarden::sheet {

bool installSheetTranslator(QCoreApplication& app, const QString& language)
{
    const QLocale locale(language);
    if (language.isEmpty() || locale.language() == QLocale::English)
        return true;
    if (locale.language() == QLocale::C)
        return false; // QLocale did not recognise the code
    auto* translator = new QTranslator(&app);
    if (!translator->load(locale, QStringLiteral("beamwarden"), QStringLiteral("_"),
                          QStringLiteral(":/beamwarden-sheet/i18n"))) {
        delete translator;
        return false;
    }
    return QCoreApplication::installTranslator(translator);
}

} // namespace beamwarden::sheet
