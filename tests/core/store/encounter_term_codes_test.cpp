// SPDX-License-Identifier: GPL-3.0-or-later
// EncounterTermCodes answers from what it met before (the last text, then
// its map) or from the file: whichever answers, the code must be the file's
// code of that text.
#include "core/store/colony_store.h"
#include "core/store/encounter_terms.h"
#include "core/store/sqlite_statement.h"
#include "core/store/write_transaction.h"
#include "import_test_support.h"

#include <gtest/gtest.h>

#include <random>

using namespace hierloom::core;
using hierloom::test::TempDir;

TEST(EncounterTermCodes, EveryLookUpGivesTheFilesCodeOfThatText)
{
    TempDir dir;
    ColonyStore store = ColonyStore::create(dir.file("c.hierloom"));
    WriteTransaction tx(store, WriteTransaction::Size::Small);
    EncounterTermCodes codes(store.handle());
    std::vector<std::string> texts;
    for (int i = 0; i < 3000; ++i) texts.push_back(i % 3 ? "G" + std::to_string(i) : std::string(1 + i % 40, 'x'));
    std::mt19937 rng(11);
    SqliteStatement q(store.handle(), "SELECT code FROM encounter_term WHERE text = ?");
    for (int round = 0; round < 20000; ++round) {
        const std::string& text = texts[rng() % (round < 5000 ? 50 : texts.size())];
        const std::int64_t code = codes(text);
        q.bind(1, text);
        ASSERT_TRUE(q.step()) << text;
        EXPECT_EQ(code, q.integer(0)) << text;
        q.reset();
        EXPECT_EQ(codes(std::string(text)), code) << "asked again, as another string";
    }
    EXPECT_EQ(codes(""), 0);
}
