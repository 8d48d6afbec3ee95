// SPDX-License-Identifier: GPL-3.0-or-later
#include "cli/finite_number.h"

#include <cmath>
#include <cstdlib>

namespace hierloom::cli {

CLI::Validator finiteNumber()
{
    return CLI::Validator(
        [](std::string& text) -> std::string {
            const char* begin = text.c_str();
            char* end = nullptr;
            const double v = std::strtod(begin, &end);
            if (end == begin) return {}; // not a number at all: CLI11's own conversion reports it
            if (!std::isfinite(v)) return "'" + text + "' is not a finite number";
            return {};
        },
        "");
}

} // namespace hierloom::cli
