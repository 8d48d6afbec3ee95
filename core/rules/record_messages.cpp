// SPDX-License-Identifier: GPL-3.0-or-later
#include "core/rules/record_messages.h"

namespace hierloom::core {

std::string inTheFuture(Day d) { return quotedValue(formatDate(d)) + " is in the future"; }

std::string notAnAnimalOf(std::string_view id, std::string_view known)
{
    return quotedValue(id) + " is not an animal of " + std::string(known);
}

void checkPlainText(std::string_view value, const char* column, FieldProblems& out)
{
    for (std::size_t i = 0; i < value.size(); ++i)
        if (const std::size_t n = controlCharacterAt(value, i)) {
            out.push_back({column, quotedValue(value) + " holds the control character " +
                                       printableText(value.substr(i, n)) + " (only tab may appear in text)"});
            return;
        }
}

} // namespace hierloom::core
