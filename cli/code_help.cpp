// SPDX-License-Identifier: GPL-3.0-or-later
#include "cli/code_help.h"

#include "core/base/csv_writer.h"
#include "core/research/maternal_rank.h"
#include "core/research/sex_ratio_analysis.h"

#include <CLI/CLI.hpp>

#include <algorithm>
#include <cctype>
#include <ostream>

namespace hierloom::cli {

using namespace hierloom::core;

std::string codesHelp(CodeKind kind, const std::vector<std::string>& codes)
{
    std::string title = toString(kind);
    title[0] = static_cast<char>(std::toupper(static_cast<unsigned char>(title[0])));
    size_t width = 0;
    for (const std::string& c : codes) width = std::max(width, c.size());
    std::string out = title + " codes and their names:\n";
    for (const std::string& c : codes)
        out += "  " + c + std::string(width - c.size() + 2, ' ') + displayName(kind, c) + "\n";
    return out;
}

std::vector<std::string> codesOf(CodeKind kind)
{
    std::vector<std::string> out;
    for (const CodeName& c : codeNames())
        if (c.kind == kind) out.emplace_back(c.code);
    return out;
}

std::vector<std::string> sexRatioCodes()
{
    std::vector<std::string> out;
    for (const auto& row : sexRatioRows(SexRatioAnalysis{})) out.push_back(row.first);
    return out;
}

std::vector<std::string> reasonCodes()
{
    std::vector<std::string> out;
    for (BirthExclusion r : {BirthExclusion::UnknownMother, BirthExclusion::UnknownSex, BirthExclusion::MotherNotResident,
                             BirthExclusion::MotherNotMature, BirthExclusion::MotherNotRated,
                             BirthExclusion::FewerThanTwoRanked})
        out.emplace_back(toString(r));
    return out;
}

void addCodesCommand(CLI::App& app, CommandContext& ctx, CommandAction& action)
{
    auto* cmd = app.add_subcommand("codes", "the codes the commands write, each with the name the desktop program "
                                            "and the reports show for it (CSV: kind,code,name)");
    cmd->callback([&ctx, &action] {
        action = [&ctx] {
            ctx.out << "kind,code,name\n";
            for (const CodeName& c : codeNames())
                ctx.out << csvField(toString(c.kind)) << ',' << csvField(c.code) << ',' << csvField(c.name) << '\n';
        };
    });
}

} // namespace hierloom::cli
