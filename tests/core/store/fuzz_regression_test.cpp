// SPDX-License-Identifier: GPL-3.0-or-later
// Replays every input the fuzzers ever reported (tests/fuzz-regressions/<target>/)
// and the seed corpus (fuzz/seeds/<target>/) through the fuzz targets' own entry
// functions, so a fixed crash stays fixed in the normal test suite.
#include "core/base/csv_reader.h"
#include "fuzz/fuzz_entries.h"
#include "import_test_support.h"

#include <gtest/gtest.h>

#include <filesystem>

namespace {

const char* const targets[] = {"import_animals", "import_residences", "import_encounters", "scenario_file"};

int replayFolder(const std::string& target, const std::filesystem::path& folder)
{
    int n = 0;
    std::error_code ec;
    for (const auto& entry : std::filesystem::directory_iterator(folder, ec)) {
        if (!entry.is_regular_file() || entry.path().filename() == "README") continue;
        const std::string bytes = hierloom::test::fileBytes(entry.path().string());
        // Invariants of fuzz_entries.h: a refused plan carries no records, problems iff refused, ...
        EXPECT_TRUE(hierloom::fuzz::fuzzEntry(target, bytes)) << entry.path();
        ++n;
    }
    return n;
}

} // namespace

TEST(FuzzRegressions, EveryRecordedInputStillParsesWithoutBreakingAnInvariant)
{
    const std::filesystem::path root(HIERLOOM_SOURCE_DIR);
    int regressions = 0, seeds = 0;
    for (const char* t : targets) {
        regressions += replayFolder(t, root / "tests" / "fuzz-regressions" / t);
        seeds += replayFolder(t, root / "fuzz" / "seeds" / t);
    }
    // The seed corpus is part of the source tree: 2 files per target (fuzz/seeds).
    EXPECT_EQ(seeds, 8);
    RecordProperty("regression_inputs", regressions);
}

TEST(FuzzRegressions, SeedInputsAreAcceptedByTheFixedColony)
{
    // The seeds are valid files for the fixed colony of fuzz_entries.h (hand-checked
    // against docs/file-formats.md), so the fuzzers start from inputs that reach the deep checks.
    using namespace hierloom::fuzz;
    const auto& c = fixedColony();
    hierloom::core::ImportInput in;
    in.encounters = hierloom::core::ImportSource{
        "e.csv", "date,time,winner,loser,outcome,behaviour,group,observer,note\n2012-02-01,09:30,F1,F2,decided,bite,main,JK,x\n"};
    const auto plan = hierloom::core::planImport(c.animals, c.residences, in, fuzzToday());
    EXPECT_TRUE(plan.ok()) << plan.problems.text();
    in.encounters->text = "date,winner,loser\n2012-02-01,X1,F2\n"; // X1 lived in group north
    EXPECT_FALSE(hierloom::core::planImport(c.animals, c.residences, in, fuzzToday()).ok());
}

TEST(FuzzRegressions, EarlierQuotedFieldsStayValidWhileARecordGrows)
{
    // Found by fuzz_import_animals and fuzz_import_residences: the buffer of a
    // second quoted field moved the first one's short-string bytes away from its
    // view (heap-use-after-free under AddressSanitizer).
    std::string line;
    for (int i = 0; i < 40; ++i) line += std::string(i ? "," : "") + "\"q" + std::to_string(i) + "\"";
    const std::string text = line + "\n"; // the reader keeps a view of it
    hierloom::core::CsvReader reader(text);
    std::vector<std::string_view> fields;
    ASSERT_TRUE(reader.next(fields));
    ASSERT_EQ(fields.size(), 40U);
    for (int i = 0; i < 40; ++i) EXPECT_EQ(fields[static_cast<size_t>(i)], "q" + std::to_string(i));
}
