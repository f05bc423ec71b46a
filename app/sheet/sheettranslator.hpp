#pragma once
// The sheet's own copy of the translations, for programs without the GUI's resources (beamwarden-cli).
#include <QString>

class QCoreApplication;

namespace beamwarden::sheet {

// Installs the translation for `language` ("de", "de_DE", ...) on `app`. English needs none and returns true;
// false when no translation exists for the language.
bool installSheetTranslator(QCoreApplication& app, const QString& language);

} // namespace beamwarden::sheet
