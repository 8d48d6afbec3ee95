// SPDX-License-Identifier: GPL-3.0-or-later
#include "cli/command_context.h"

#include <CLI/CLI.hpp>

#include <cstdio>
#include <filesystem>
#include <fstream>
#include <ostream>

namespace hierloom::cli {

void addWindowOptions(CLI::App& command, WindowOptions& options)
{
    command.add_option("--from", options.from, "first day of the window, YYYY-MM-DD (default: the first encounter)");
    command.add_option("--to", options.to, "last day of the window, YYYY-MM-DD (default: the last encounter)");
    command.add_option("--group", options.group, "social group to analyse (default: every group)");
    command.add_option("--draws", options.draws,
                       "draws count half to each side, or are ignored (default: the colony's setting, else half)")
        ->check(CLI::IsMember({"half", "ignore"}));
}

std::optional<hierloom::core::Day> optionDate(const std::string& text, const char* option)
{
    if (text.empty()) return std::nullopt;
    auto d = hierloom::core::parseDate(text);
    if (!d) throw BadInputError(std::string(option) + ": '" + text + "' is not a real date in the form YYYY-MM-DD");
    return d;
}

void emit(CommandContext& ctx, const std::string& text)
{
    if (ctx.outFile.empty()) {
        ctx.out << text;
        ctx.out.flush();
        return;
    }
    const std::string tmp = ctx.outFile + ".part";
    {
        std::ofstream f(tmp, std::ios::binary | std::ios::trunc);
        if (!f) throw BadInputError("--out: cannot write " + ctx.outFile);
        f << text;
        f.flush();
        if (!f) throw BadInputError("--out: writing " + ctx.outFile + " failed (disk full?)");
    }
    std::error_code ec;
    std::filesystem::rename(tmp, ctx.outFile, ec);
    if (ec) throw BadInputError("--out: cannot write " + ctx.outFile + ": " + ec.message());
}

} // namespace hierloom::cli
