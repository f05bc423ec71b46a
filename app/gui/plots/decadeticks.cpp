#include "plots/decadeticks.hpp"

#include <array>

namespace beamwarden::gui {

namespace {

QString superscript(int value)
{
    static constexpr std::array<char16_t, 10> kDigits = {u'⁰', u'¹', u'²', u'³', u'⁴', u'⁵', u'⁶', u'⁷', u'⁸', u'⁹'};
    QString text;
    if (value < 0)
        text += QChar(u'⁻');
    const QString digits = QString::number(value < 0 ? -value : value);
    for (const QChar digit : digits)
        text += QChar(kDigits.at(static_cast<std::size_t>(digit.unicode() - u'0')));
    return text;
}

// 10^exponent written in a unit of 10^unitExponent: "1", "10" or "100" followed by the unit.
QString inUnit(int exponent, int unitExponent, const QString& unit)
{
    QString number = QStringLiteral("1");
    for (int i = unitExponent; i < exponent; ++i)
        number += QLatin1Char('0');
    return number + QChar(u' ') + unit;
}

int floorDiv(int value, int divisor)
{
    return value >= 0 ? value / divisor : -((-value + divisor - 1) / divisor);
}

} // namespace

QString powerOfTen(int exponent)
{
    return QStringLiteral("10") + superscript(exponent);
}

QString decadeLabel(int exponent, TickStyle style)
{
    switch (style) {
    case TickStyle::Duration: {
        // Unit symbols are SI and not translated.
        static const std::array<QString, 7> kUnits = {QStringLiteral("fs"), QStringLiteral("ps"), QStringLiteral("ns"),
                                                      QStringLiteral("µs"), QStringLiteral("ms"), QStringLiteral("s"),
                                                      QStringLiteral("ks")};
        const int group = floorDiv(exponent, 3); // -5 for fs … 1 for ks
        if (group < -5 || group > 1)
            return powerOfTen(exponent) + QStringLiteral(" s");
        return inUnit(exponent, group * 3, kUnits.at(static_cast<std::size_t>(group + 5)));
    }
    case TickStyle::Distance:
        if (exponent < -6)
            return powerOfTen(exponent) + QStringLiteral(" m");
        if (exponent < -3)
            return inUnit(exponent, -6, QStringLiteral("µm"));
        if (exponent == -3)
            return QStringLiteral("1 mm");
        if (exponent < 0)
            return inUnit(exponent, -2, QStringLiteral("cm"));
        if (exponent < 3)
            return inUnit(exponent, 0, QStringLiteral("m"));
        if (exponent <= 6)
            return inUnit(exponent, 3, QStringLiteral("km"));
        return powerOfTen(exponent - 3) + QStringLiteral(" km");
    case TickStyle::PowerOfTen:
        if (exponent == 0)
            return QStringLiteral("1");
        if (exponent == 1)
            return QStringLiteral("10");
        return powerOfTen(exponent);
    case TickStyle::Plain:
        break;
    }
    return QString::number(exponent);
}

int decadeStep(int decades, int room, TickStyle style)
{
    if (room < 1)
        room = 1;
    if (decades <= room)
        return 1;
    static constexpr std::array<int, 7> kDurationSteps = {3, 6, 9, 12, 15, 18, 30};
    static constexpr std::array<int, 8> kSteps = {2, 3, 4, 5, 6, 10, 15, 20};
    if (style == TickStyle::Duration) {
        for (const int step : kDurationSteps) {
            if (decades / step + 1 <= room)
                return step;
        }
        return kDurationSteps.back();
    }
    for (const int step : kSteps) {
        if (decades / step + 1 <= room)
            return step;
    }
    return kSteps.back();
}

} // namespace beamwarden::gui
