// SPDX-License-Identifier: GPL-3.0-or-later
#include "cli/finite_option.h"

#include <CLI/CLI.hpp>

#include <cmath>
#include <cstdlib>

namespace hierloom::cli {

namespace {

// Range checks compare with < and >, which NaN passes; so the text is checked first.
const CLI::Validator finiteNumber(
    [](std::string& text) -> std::string {
        const char* begin = text.c_str();
        char* end = nullptr;
        const double value = std::strtod(begin, &end);
        if (end == begin) return {}; // not a number at all: CLI11's conversion reports it
        if (!std::isfinite(value)) return "'" + text + "' is not a finite number";
        return {};
    },
    "", "FINITE");

void require(CLI::App& command)
{
    for (CLI::Option* option : command.get_options())
        if (option->get_type_name().rfind("FLOAT", 0) == 0) option->check(finiteNumber);
}

} // namespace

void requireFiniteNumbers(CLI::App& app)
{
    require(app);
    for (CLI::App* command : app.get_subcommands([](CLI::App*) { return true; })) require(*command);
}

} // namespace hierloom::cli
