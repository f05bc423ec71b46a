#include "store/isotime.hpp"

#include <ctime>
#include <fmt/core.h>

namespace beamwarden::store {

namespace {

bool digits(std::string_view text, std::size_t from, std::size_t count, int& value)
{
    value = 0;
    for (std::size_t i = from; i < from + count; ++i) {
        if (i >= text.size() || text[i] < '0' || text[i] > '9')
            return false;
        value = value * 10 + (text[i] - '0');
    }
    return true;
}

bool allDigits(std::string_view text)
{
    return !text.empty() && text.find_first_not_of("0123456789") == std::string_view::npos;
}

bool isLeapYear(int year)
{
    return (year % 4 == 0 && year % 100 != 0) || year % 400 == 0;
}

} // namespace

bool isIsoDate(std::string_view text)
{
    int year = 0;
    int month = 0;
    int day = 0;
    if (text.size() != 10 || text[4] != '-' || text[7] != '-' || !digits(text, 0, 4, year) ||
        !digits(text, 5, 2, month) || !digits(text, 8, 2, day))
        return false;
    if (month < 1 || month > 12 || day < 1)
        return false;
    constexpr int kDays[12] = {31, 28, 31, 30, 31, 30, 31, 31, 30, 31, 30, 31};
    const int last = month == 2 && isLeapYear(year) ? 29 : kDays[month - 1];
    return day <= last;
}

bool isIsoUtcTime(std::string_view text)
{
    int hour = 0;
    int minute = 0;
    int second = 0;
    if (text.size() < 20 || !isIsoDate(text.substr(0, 10)) || text[10] != 'T' || text[13] != ':' || text[16] != ':' ||
        text.back() != 'Z' || !digits(text, 11, 2, hour) || !digits(text, 14, 2, minute) ||
        !digits(text, 17, 2, second))
        return false;
    if (hour > 23 || minute > 59 || second > 60) // 60: a leap second
        return false;
    const std::string_view fraction = text.substr(19, text.size() - 20);
    if (fraction.empty())
        return true;
    return fraction[0] == '.' && allDigits(fraction.substr(1));
}

std::string utcNow()
{
    const std::time_t now = std::time(nullptr);
    std::tm utc{};
    gmtime_r(&now, &utc); // the reentrant form: the GUI may save from more than one thread
    return fmt::format("{:04}-{:02}-{:02}T{:02}:{:02}:{:02}Z", utc.tm_year + 1900, utc.tm_mon + 1, utc.tm_mday,
                       utc.tm_hour, utc.tm_min, utc.tm_sec);
}

} // namespace beamwarden::store
