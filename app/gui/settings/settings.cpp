#include "settings/settings.hpp"

#include <QSettings>

namespace beamwarden::gui {

namespace {

const QString kRules = QStringLiteral("limits/rules");
const QString kC5 = QStringLiteral("limits/c5");
const QString kLanguage = QStringLiteral("ui/language");
const QString kRecent = QStringLiteral("files/recent");
const QString kAuthor = QStringLiteral("signoff/author");
constexpr int kRecentMax = 8;

} // namespace

limits::RuleChoice Settings::ruleChoice()
{
    const auto parsed = limits::parseRuleChoice(QSettings().value(kRules).toString().toStdString());
    return parsed.value_or(limits::RuleChoice::Strictest);
}

void Settings::setRuleChoice(limits::RuleChoice choice)
{
    QSettings().setValue(kRules, QString::fromUtf8(limits::toString(choice).data()));
}

limits::C5Option Settings::c5Option()
{
    const auto parsed = limits::parseC5Option(QSettings().value(kC5).toString().toStdString());
    return parsed.value_or(limits::C5Option::Conservative);
}

void Settings::setC5Option(limits::C5Option option)
{
    QSettings().setValue(kC5, QString::fromUtf8(limits::toString(option).data()));
}

QString Settings::language()
{
    return QSettings().value(kLanguage).toString();
}

void Settings::setLanguage(const QString& language)
{
    QSettings().setValue(kLanguage, language);
}

QStringList Settings::recentFiles()
{
    return QSettings().value(kRecent).toStringList();
}

void Settings::addRecentFile(const QString& path)
{
    QStringList files = recentFiles();
    files.removeAll(path);
    files.prepend(path);
    while (files.size() > kRecentMax)
        files.removeLast();
    QSettings().setValue(kRecent, files);
}

QString Settings::authorName()
{
    return QSettings().value(kAuthor).toString();
}

void Settings::setAuthorName(const QString& name)
{
    QSettings().setValue(kAuthor, name);
}

} // namespace beamwarden::gui
