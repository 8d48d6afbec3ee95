// SPDX-License-Identifier: GPL-3.0-or-later
#include "core/base/number_format.h"

#include <charconv>
#include <cmath>

namespace hierloom::core {

std::string formatNumber(double value)
{
    if (!std::isfinite(value)) return {};
    if (value == 0.0) value = 0.0; // no "-0"
    char buf[64];
    const auto res = std::to_chars(buf, buf + sizeof buf, value);
    return std::string(buf, res.ptr);
}

std::string formatNumber(const std::optional<double>& value) { return value ? formatNumber(*value) : std::string(); }

} // namespace hierloom::core
