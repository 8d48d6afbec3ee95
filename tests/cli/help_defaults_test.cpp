// SPDX-License-Identifier: GPL-3.0-or-later
// `hierloom-cli --help` and `COMMAND --help` name every option's default
// (issue 10), and --version answers.
#include "tests/cli/cli_test_support.h"

#include <gtest/gtest.h>

#include <regex>
#include <sstream>

using hierloom::test::runCli;

namespace {

/// The command names listed under "Subcommands:" of the top-level help.
std::vector<std::string> commandNames()
{
    const auto r = runCli({"--help"});
    EXPECT_EQ(r.status, 0);
    std::vector<std::string> names;
    std::istringstream in(r.out.substr(r.out.find("Subcommands:")));
    std::string line;
    const std::regex entry("^  ([a-z][a-z-]*) .*");
    std::smatch m;
    while (std::getline(in, line))
        if (std::regex_match(line, m, entry)) names.push_back(m[1]);
    return names;
}

/// Each option of a help text with its description (continuation lines joined).
std::vector<std::string> optionBlocks(const std::string& help)
{
    std::vector<std::string> blocks;
    std::istringstream in(help);
    std::string line;
    bool inOptions = false;
    while (std::getline(in, line)) {
        if (line == "Options:") {
            inOptions = true;
            continue;
        }
        if (!inOptions) continue;
        if (line.empty() || line[0] != ' ') {
            inOptions = false;
            continue;
        }
        if (line.rfind("  -", 0) == 0)
            blocks.push_back(line);
        else if (!blocks.empty())
            blocks.back() += " " + line;
    }
    return blocks;
}

} // namespace

TEST(CliHelp, EveryCommandIsListed)
{
    const auto names = commandNames();
    // The commands of docs/file-formats.md at least; more may be added.
    for (const char* expected : {"init", "import", "export", "demo", "ranks", "matrix", "metrics", "sex-ratio",
                                 "maternal-ranks", "export-tables", "support", "inherit", "scenario"})
        EXPECT_NE(std::find(names.begin(), names.end(), expected), names.end()) << expected;
}

TEST(CliHelp, EveryOptionOfEveryCommandNamesItsDefault)
{
    int checked = 0;
    for (const std::string& command : commandNames()) {
        const auto r = runCli({command, "--help"});
        ASSERT_EQ(r.status, 0) << command;
        const auto blocks = optionBlocks(r.out);
        EXPECT_FALSE(blocks.empty()) << command;
        for (const std::string& block : blocks) {
            if (block.find("--help") != std::string::npos || block.find("REQUIRED") != std::string::npos) continue;
            EXPECT_NE(block.find("default"), std::string::npos) << command << ": " << block;
            ++checked;
        }
    }
    // ranks alone has more than ten optional options: the walk really looked.
    EXPECT_GT(checked, 40);
}

TEST(CliHelp, FlagsAndOutputNameTheirDefault)
{
    const auto r = runCli({"ranks", "--help"});
    // A flag is off unless given; --out writes to standard output unless given.
    EXPECT_NE(r.out.find("(Foerster et al. 2016) (default: off)"), std::string::npos) << r.out;
    EXPECT_NE(r.out.find("instead of standard output (default: standard output)"), std::string::npos) << r.out;
}

TEST(CliHelp, VersionAnswers)
{
    const auto r = runCli({"--version"});
    EXPECT_EQ(r.status, 0);
    EXPECT_TRUE(std::regex_match(r.out, std::regex("hierloom-cli [0-9]+\\.[0-9]+\\.[0-9]+\n"))) << r.out;
}
