// SPDX-License-Identifier: GPL-3.0-or-later
#include "core/base/civil_date.h"

#include <cstdio>
#include <ctime>

namespace hierloom::core {

bool isLeapYear(int y) { return (y % 4 == 0 && y % 100 != 0) || y % 400 == 0; }

unsigned daysInMonth(int y, unsigned m)
{
    static constexpr unsigned len[12] = {31, 28, 31, 30, 31, 30, 31, 31, 30, 31, 30, 31};
    return (m == 2 && isLeapYear(y)) ? 29U : len[m - 1];
}

Day dayFromCivil(int y, unsigned m, unsigned d)
{
    y -= m <= 2 ? 1 : 0;
    const int era = (y >= 0 ? y : y - 399) / 400;
    const auto yoe = static_cast<unsigned>(y - era * 400);
    const unsigned doy = (153 * (m > 2 ? m - 3 : m + 9) + 2) / 5 + d - 1;
    const unsigned doe = yoe * 365 + yoe / 4 - yoe / 100 + doy;
    return era * 146097 + static_cast<int>(doe) - 719468;
}

CivilDate civilFromDay(Day z)
{
    z += 719468;
    const int era = (z >= 0 ? z : z - 146096) / 146097;
    const auto doe = static_cast<unsigned>(z - era * 146097);
    const unsigned yoe = (doe - doe / 1460 + doe / 36524 - doe / 146096) / 365;
    const int y = static_cast<int>(yoe) + era * 400;
    const unsigned doy = doe - (365 * yoe + yoe / 4 - yoe / 100);
    const unsigned mp = (5 * doy + 2) / 153;
    const unsigned d = doy - (153 * mp + 2) / 5 + 1;
    const unsigned m = mp < 10 ? mp + 3 : mp - 9;
    return {y + (m <= 2 ? 1 : 0), m, d};
}

static bool digits(std::string_view s, size_t from, size_t count, int& out)
{
    out = 0;
    for (size_t i = from; i < from + count; ++i) {
        if (s[i] < '0' || s[i] > '9') return false;
        out = out * 10 + (s[i] - '0');
    }
    return true;
}

std::optional<Day> parseDate(std::string_view s)
{
    if (s.size() != 10 || s[4] != '-' || s[7] != '-') return std::nullopt;
    int y = 0, m = 0, d = 0;
    if (!digits(s, 0, 4, y) || !digits(s, 5, 2, m) || !digits(s, 8, 2, d)) return std::nullopt;
    if (y < 1800 || m < 1 || m > 12 || d < 1) return std::nullopt;
    if (static_cast<unsigned>(d) > daysInMonth(y, static_cast<unsigned>(m))) return std::nullopt;
    return dayFromCivil(y, static_cast<unsigned>(m), static_cast<unsigned>(d));
}

std::string formatDate(Day d)
{
    // Hand-formatted: this runs once per encounter on import and export.
    const CivilDate c = civilFromDay(d);
    if (c.year < 0 || c.year > 9999) {
        char buf[24];
        std::snprintf(buf, sizeof buf, "%04d-%02u-%02u", c.year, c.month, c.day);
        return buf;
    }
    std::string out(10, '-');
    const auto y = static_cast<unsigned>(c.year);
    out[0] = static_cast<char>('0' + y / 1000);
    out[1] = static_cast<char>('0' + y / 100 % 10);
    out[2] = static_cast<char>('0' + y / 10 % 10);
    out[3] = static_cast<char>('0' + y % 10);
    out[5] = static_cast<char>('0' + c.month / 10);
    out[6] = static_cast<char>('0' + c.month % 10);
    out[8] = static_cast<char>('0' + c.day / 10);
    out[9] = static_cast<char>('0' + c.day % 10);
    return out;
}

std::string formatDate(const std::optional<Day>& d) { return d ? formatDate(*d) : std::string(); }

std::size_t controlCharacterAt(std::string_view text, std::size_t i)
{
    const auto c = static_cast<unsigned char>(text[i]);
    if ((c < 0x20 && c != '\t') || c == 0x7F) return 1;
    if (c == 0xC2 && i + 1 < text.size()) {
        const auto d = static_cast<unsigned char>(text[i + 1]);
        if (d >= 0x80 && d <= 0x9F) return 2;
    }
    return 0;
}

std::string printableText(std::string_view text)
{
    static const char* hex = "0123456789abcdef";
    std::string out;
    out.reserve(text.size());
    for (std::size_t i = 0; i < text.size(); ++i) {
        const std::size_t n = controlCharacterAt(text, i);
        if (n == 0) {
            if (text[i] == '\\') out += '\\';
            out += text[i];
            continue;
        }
        const auto c = static_cast<unsigned char>(text[i + n - 1]);
        out += n == 1 ? "\\x" : "\\u00";
        out += hex[c >> 4];
        out += hex[c & 0x0f];
        i += n - 1;
    }
    return out;
}

std::string quotedValue(std::string_view value) { return "'" + printableText(value) + "'"; }

std::optional<int> parseTimeOfDay(std::string_view s)
{
    if (s.size() != 5 || s[2] != ':') return std::nullopt;
    int h = 0, m = 0;
    if (!digits(s, 0, 2, h) || !digits(s, 3, 2, m)) return std::nullopt;
    if (h > 23 || m > 59) return std::nullopt;
    return h * 60 + m;
}

std::string formatTimeOfDay(int minutes)
{
    if (minutes >= 0 && minutes < 100 * 60) { // two-digit hours: hand-formatted (once per imported encounter)
        const int h = minutes / 60, m = minutes % 60;
        return {static_cast<char>('0' + h / 10), static_cast<char>('0' + h % 10), ':', static_cast<char>('0' + m / 10),
                static_cast<char>('0' + m % 10)};
    }
    char buf[32];
    std::snprintf(buf, sizeof buf, "%02d:%02d", minutes / 60, minutes % 60);
    return buf;
}

Day anniversary(Day birth, int years)
{
    const CivilDate c = civilFromDay(birth);
    const int y = c.year + years;
    if (c.month == 2 && c.day == 29 && !isLeapYear(y)) return dayFromCivil(y, 3, 1);
    return dayFromCivil(y, c.month, c.day);
}

int ageInYears(Day birth, Day d)
{
    if (d < birth) return -1;
    const CivilDate b = civilFromDay(birth);
    const CivilDate c = civilFromDay(d);
    int age = c.year - b.year;
    if (age > 0 && d < anniversary(birth, age)) --age;
    return age;
}

Day today()
{
    const std::time_t t = std::time(nullptr);
    std::tm local{};
    localtime_r(&t, &local);
    return dayFromCivil(local.tm_year + 1900, static_cast<unsigned>(local.tm_mon + 1),
                        static_cast<unsigned>(local.tm_mday));
}

} // namespace hierloom::core
