// SPDX-License-Identifier: GPL-3.0-or-later
#include "cli/finite_number.h"

#include <cmath>
#include <cstdlib>

namespace hierloom::cli {

CLI::Validator finiteNumber()
{
    // Range checks compare with < and >, which NaN passes; so the text is checked first.
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

namespace {

void require(CLI::App& command)
{
    for (CLI::Option* option : command.get_options())
        if (option->get_type_name().rfind("FLOAT", 0) == 0) option->check(finiteNumber());
}

} // namespace

void requireFiniteNumbers(CLI::App& app)
{
    require(app);
    for (CLI::App* command : app.get_subcommands([](CLI::App*) { return true; })) require(*command);
}

} // namespace hierloom::cli
