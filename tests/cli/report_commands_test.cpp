// SPDX-License-Identifier: GPL-3.0-or-later
// hierloom-cli stability and report on the demo colony (demo_colony.h: revolt 2023-05-15..2023-07-31).
#include "cli_test_support.h"

#include <gtest/gtest.h>

#include <filesystem>

#include <fstream>

using hierloom::test::CliTempDir;
using hierloom::test::lines;
using hierloom::test::runCli;

TEST(StabilityCommand, DemoRevoltMonthsCarryTheAlerts)
{
    CliTempDir dir;
    const std::string colony = dir.file("demo.hierloom");
    ASSERT_EQ(runCli({"demo", colony}).status, 0);
    const auto r = runCli({"stability", colony, "--group", "North Corral", "--every", "month"});
    ASSERT_EQ(r.status, 0) << r.err;
    int alerted = 0;
    for (const std::string& line : lines(r.out)) {
        if (line.ends_with(",") || line.starts_with("period_start")) continue;
        ++alerted;
        // Only the revolt months (the generator's kRevoltStart..kRevoltEnd) alert.
        EXPECT_TRUE(line.starts_with("2023-05-01") || line.starts_with("2023-06-01") || line.starts_with("2023-07-01"))
            << line;
    }
    EXPECT_EQ(alerted, 3);
    EXPECT_NE(r.err.find("alert: 2023-06-01"), std::string::npos);
    EXPECT_EQ(runCli({"stability", colony, "--group", "Nowhere"}).status, 2);
}

TEST(ReportCommand, WritesAPdfAndRejectsAnUnknownGroup)
{
    CliTempDir dir;
    const std::string colony = dir.file("demo.hierloom");
    ASSERT_EQ(runCli({"demo", colony}).status, 0);
    const std::string pdf = dir.file("report.pdf");
    const auto r = runCli({"report", colony, "--group", "North Corral", "--at", "2023-08-01", "--out", pdf});
#ifndef HIERLOOM_HAVE_REPORT
    // Built without the desktop libraries (e.g. the sanitiser build): a clear refusal.
    EXPECT_EQ(r.status, 2);
    EXPECT_NE(r.err.find("cannot write PDF reports"), std::string::npos) << r.err;
    EXPECT_FALSE(std::filesystem::exists(pdf));
    return;
#endif
    ASSERT_EQ(r.status, 0) << r.err;
    std::ifstream in(pdf, std::ios::binary);
    std::string head(4, '\0');
    in.read(head.data(), 4);
    EXPECT_EQ(head, "%PDF");
    EXPECT_NE(r.err.find("pages"), std::string::npos);
    EXPECT_EQ(runCli({"report", colony, "--group", "Nowhere", "--out", pdf}).status, 2);
    EXPECT_EQ(runCli({"report", colony, "--group", "North Corral", "--at", "2031-02-30", "--out", pdf}).status, 2);
}
