#include "sheetformat.hpp"

#include "beamwarden/assessment/assessment.hpp"
#include "beamwarden/units.hpp"
#include "sheettr.hpp"

#include <QRegularExpression>

namespace beamwarden::sheet {

QString fromUtf8(std::string_view text)
{
    return QString::fromUtf8(text.data(), static_cast<qsizetype>(text.size()));
}

SheetFormat::SheetFormat(const QString& language)
    : m_locale(language.isEmpty() ? QLocale(QLocale::English, QLocale::UnitedStates) : QLocale(language))
{
    m_locale.setNumberOptions(QLocale::OmitGroupSeparator);
}

QString SheetFormat::number(const std::string& printed) const
{
    QString text = fromUtf8(printed);
    // A number never parts from its unit at a line end.
    text.replace(QLatin1Char(' '), QChar(QChar::Nbsp));
    const QString point = m_locale.decimalPoint();
    if (point != QStringLiteral("."))
        text.replace(QLatin1Char('.'), point);
    return text;
}

QString SheetFormat::number(double value, int decimals) const
{
    return m_locale.toString(value, 'f', decimals);
}

QString SheetFormat::exposureVerdict(double ratio) const
{
    const std::string words = assessment::exposureVerdict(ratio);
    const std::string_view over = "over limit ";
    if (!std::string_view(words).starts_with(over))
        return Sheet::tr("within limit");
    // Large factors come as "×1.3e+07" from core; on paper they read better as "×1.3·10⁷".
    QString factor = number(words.substr(over.size()));
    static const QRegularExpression exponent(QStringLiteral("e\\+?(-?)0*(\\d+)$"));
    const QRegularExpressionMatch match = exponent.match(factor);
    if (match.hasMatch()) {
        static const QString superscripts =
            QStringLiteral("\u2070\u00b9\u00b2\u00b3\u2074\u2075\u2076\u2077\u2078\u2079");
        QString power = match.captured(1).isEmpty() ? QString() : QStringLiteral("\u207b");
        for (const QChar digit : match.captured(2))
            power += superscripts[digit.digitValue()];
        factor = factor.left(match.capturedStart()) + QStringLiteral("\u00b710") + power;
    }
    return Sheet::tr("over limit %1").arg(factor);
}

QString SheetFormat::requiredOd(double exactOd) const
{
    const double shown = hazard::roundOdUp(exactOd);
    if (shown <= 0.0)
        return Sheet::tr("none");
    return number(shown, 1);
}

QString SheetFormat::divergence(units::Angle angle) const
{
    // Divergences are given in mrad on data sheets; keep that unit rather than switching to µrad.
    return number(QString::number(angle.milliradians(), 'g', 4).toStdString() + " mrad");
}

QString SheetFormat::beamDiameter(units::Length diameter) const
{
    // Beam diameters read in mm on data sheets; only a fibre core or a focus is given in µm.
    if (diameter.millimetres() < 0.1)
        return quantity(diameter);
    return number(QString::number(diameter.millimetres(), 'g', 4).toStdString() + " mm");
}

QString SheetFormat::distance(const hazard::HazardDistance& d) const
{
    switch (d.kind) {
    case hazard::DistanceKind::Zero:
        return Sheet::tr("none");
    case hazard::DistanceKind::Unbounded:
        return Sheet::tr("unbounded");
    case hazard::DistanceKind::Finite:
        break;
    }
    return quantity(d.value, 3);
}

QString SheetFormat::timeStamp(const std::string& iso)
{
    QString text = fromUtf8(iso);
    // "2026-12-01T14:03:00Z" -> "2026-12-01 14:03 UTC"; anything else is shown as stored.
    if (text.size() >= 16 && text[10] == QLatin1Char('T')) {
        const bool utc = text.endsWith(QLatin1Char('Z'));
        return text.left(10) + QLatin1Char(' ') + text.mid(11, 5) + (utc ? QStringLiteral(" UTC") : QString());
    }
    return text;
}

QString SheetFormat::verdict(eyewear::Verdict verdict)
{
    switch (verdict) {
    case eyewear::Verdict::Covers:
        return Sheet::tr("covers");
    case eyewear::Verdict::CannotTell:
        return Sheet::tr("cannot tell");
    case eyewear::Verdict::FallsShort:
        return Sheet::tr("falls short");
    }
    return {};
}

QString SheetFormat::status(model::AssessmentStatus status)
{
    switch (status) {
    case model::AssessmentStatus::Draft:
        return Sheet::tr("draft");
    case model::AssessmentStatus::InReview:
        return Sheet::tr("in review");
    case model::AssessmentStatus::Approved:
        return Sheet::tr("approved");
    case model::AssessmentStatus::Withdrawn:
        return Sheet::tr("withdrawn");
    }
    return {};
}

QString SheetFormat::laserClass(model::LaserClass laserClass)
{
    if (laserClass == model::LaserClass::Unknown)
        return Sheet::tr("class not recorded");
    return Sheet::tr("Class %1").arg(fromUtf8(model::toString(laserClass)));
}

QString SheetFormat::viewing(model::Viewing viewing)
{
    switch (viewing) {
    case model::Viewing::Direct:
        return Sheet::tr("intrabeam");
    case model::Viewing::Lens:
        return Sheet::tr("through a lens");
    case model::Viewing::Fibre:
        return Sheet::tr("from a fibre end");
    case model::Viewing::Diffuse:
        return Sheet::tr("diffuse reflection");
    case model::Viewing::Specular:
        return Sheet::tr("specular reflection");
    case model::Viewing::Aided:
        return Sheet::tr("through magnifying optics");
    }
    return {};
}

QString SheetFormat::pulseRule(limits::PulseRule rule)
{
    switch (rule) {
    case limits::PulseRule::SinglePulse:
        return Sheet::tr("rule 1, single pulse");
    case limits::PulseRule::AveragePower:
        return Sheet::tr("rule 2, average power");
    case limits::PulseRule::PulseTrain:
        return Sheet::tr("rule 3, pulse train");
    }
    return {};
}

QString SheetFormat::shortRuleSetName(limits::RuleSetId set)
{
    const QString full = fromUtf8(limits::fullName(set));
    const qsizetype bracket = full.indexOf(QStringLiteral(" ("));
    return bracket > 0 ? full.left(bracket) : full;
}

} // namespace beamwarden::sheet
