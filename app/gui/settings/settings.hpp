#pragma once
// One typed settings class: every key and default in one place (QSettings underneath). Tests enable
// QStandardPaths test mode so a user's settings are never touched.
#include "beamwarden/limits/types.hpp"

#include <QString>
#include <QStringList>

namespace beamwarden::gui {

class Settings {
public:
    [[nodiscard]] static limits::RuleChoice ruleChoice();
    static void setRuleChoice(limits::RuleChoice choice);
    [[nodiscard]] static limits::C5Option c5Option();
    static void setC5Option(limits::C5Option option);
    [[nodiscard]] static QString language(); // "" = the system locale
    static void setLanguage(const QString& language);
    [[nodiscard]] static QStringList recentFiles();
    static void addRecentFile(const QString& path);
    [[nodiscard]] static QString authorName();
    static void setAuthorName(const QString& name);
};

} // namespace beamwarden::gui
