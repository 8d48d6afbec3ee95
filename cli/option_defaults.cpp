// SPDX-License-Identifier: GPL-3.0-or-later
#include "cli/option_defaults.h"

#include <CLI/CLI.hpp>

namespace hierloom::cli {

namespace {

void describe(CLI::App& command)
{
    for (CLI::Option* option : command.get_options()) {
        if (option->get_required() || option->get_positional()) continue;
        const std::string name = option->get_name();
        if (name == "--help" || name == "-h" || name == "--version") continue;
        const std::string text = option->get_description();
        if (text.find("default") != std::string::npos) continue;
        std::string value;
        if (option->get_expected_min() == 0) {
            value = "off";
        } else if (name == "--out") {
            value = "standard output";
        } else {
            option->capture_default_str();
            value = option->get_default_str();
            if (value.empty()) value = "none";
        }
        option->description(text + (text.empty() ? "" : " ") + "(default: " + value + ")");
    }
}

} // namespace

void describeDefaults(CLI::App& app)
{
    describe(app);
    for (CLI::App* command : app.get_subcommands([](CLI::App*) { return true; })) describe(*command);
}

} // namespace hierloom::cli
