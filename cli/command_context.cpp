// SPDX-License-Identifier: GPL-3.0-or-later
#include "cli/command_context.h"

#include "cli/checked_output.h"

#include <CLI/CLI.hpp>

#include <cstdio>
#include <filesystem>
#include <fstream>
#include <ostream>
#include <unistd.h>

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

void passCheck(CommandContext& ctx)
{
    if (ctx.checked) ctx.checked->pass();
}

void emit(CommandContext& ctx, const std::string& text)
{
    passCheck(ctx);
    if (ctx.outFile.empty()) {
        ctx.out << text;
        ctx.out.flush();
        return;
    }
    writeFilesTogether({{ctx.outFile, text}});
}

void writeFilesTogether(const std::vector<std::pair<std::string, std::string>>& pathsAndTexts)
{
    std::vector<std::string> temps;
    auto removeTemps = [&temps] {
        std::error_code ec;
        for (const std::string& t : temps) std::filesystem::remove(t, ec);
    };
    for (const auto& [path, text] : pathsAndTexts) {
        // Per process, so two programs writing the same file never share a temporary.
        const std::string tmp = path + ".part-" + std::to_string(::getpid());
        temps.push_back(tmp);
        std::ofstream f(tmp, std::ios::binary | std::ios::trunc);
        if (!f) {
            removeTemps();
            throw BadInputError("--out: cannot write " + path);
        }
        f << text;
        f.flush();
        if (!f) {
            f.close();
            removeTemps();
            throw BadInputError("--out: writing " + path + " failed (disk full?)");
        }
    }
    for (size_t i = 0; i < temps.size(); ++i) {
        std::error_code ec;
        std::filesystem::rename(temps[i], pathsAndTexts[i].first, ec);
        if (ec) {
            // The files already renamed are complete; the rest are not written at all.
            for (size_t j = i; j < temps.size(); ++j) std::filesystem::remove(temps[j], ec);
            throw BadInputError("--out: cannot write " + pathsAndTexts[i].first + ": " + ec.message());
        }
    }
}

} // namespace hierloom::cli
