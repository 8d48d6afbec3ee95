// SPDX-License-Identifier: GPL-3.0-or-later
#include "core/rules/record_messages.h"

namespace hierloom::core {

std::string inTheFuture(Day d) { return quotedValue(formatDate(d)) + " is in the future"; }

std::string notAnAnimalOf(std::string_view id, std::string_view known)
{
    return quotedValue(id) + " is not an animal of " + std::string(known);
}

} // namespace hierloom::core
