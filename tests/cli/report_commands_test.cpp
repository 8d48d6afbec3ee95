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

// A colony with one group needs no --group; with two, leaving it out is an error naming them.
TEST(ReportCommand, TheOnlyGroupIsTheDefault)
{
    CliTempDir dir;
    const std::string colony = dir.file("demo.hierloom");
    ASSERT_EQ(runCli({"demo", colony}).status, 0); // the demo has one group, North Corral
    const auto withGroup = runCli({"stability", colony, "--group", "North Corral"});
    const auto without = runCli({"stability", colony});
    ASSERT_EQ(without.status, 0) << without.err;
    EXPECT_EQ(without.out, withGroup.out);
#ifdef HIERLOOM_HAVE_REPORT
    const std::string pdf = dir.file("report.pdf");
    const auto r = runCli({"report", colony, "--out", pdf});
    EXPECT_EQ(r.status, 0) << r.err;
    EXPECT_TRUE(std::filesystem::exists(pdf));
#endif
    // A second group (a new animal living in South Pen): --group is needed again.
    const std::string animals = dir.file("animals.csv");
    std::ofstream(animals) << "id,sex,birth_date,entry_date,entry_type\nZZ1,F,2020-01-01,2024-01-01,introduced\n";
    const std::string residences = dir.file("residences.csv");
    std::ofstream(residences) << "animal,group,from\nZZ1,South Pen,2024-01-01\n";
    const auto imported = runCli({"import", colony, "--animals", animals, "--residences", residences});
    ASSERT_EQ(imported.status, 0) << imported.err;
    const auto two = runCli({"stability", colony});
    EXPECT_EQ(two.status, 2);
    EXPECT_NE(two.err.find("2 groups (North Corral, South Pen)"), std::string::npos) << two.err;
}
