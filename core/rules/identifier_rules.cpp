// SPDX-License-Identifier: GPL-3.0-or-later
#include "core/rules/identifier_rules.h"

#include <algorithm>

namespace hierloom::core {

bool isValidAnimalId(std::string_view id)
{
    if (id.empty() || id.size() > 32) return false;
    return std::all_of(id.begin(), id.end(), [](char c) {
        return (c >= 'a' && c <= 'z') || (c >= 'A' && c <= 'Z') || (c >= '0' && c <= '9') || c == '_' || c == '-' ||
               c == '.';
    });
}

bool isValidUid(std::string_view u)
{
    if (u.size() != 36) return false;
    for (size_t i = 0; i < u.size(); ++i) {
        const char c = u[i];
        if (i == 8 || i == 13 || i == 18 || i == 23) {
            if (c != '-') return false;
        } else if (!((c >= '0' && c <= '9') || (c >= 'a' && c <= 'f') || (c >= 'A' && c <= 'F'))) {
            return false;
        }
    }
    return true;
}

} // namespace hierloom::core
