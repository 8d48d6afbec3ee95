// SPDX-License-Identifier: GPL-3.0-or-later
// ColonyStore::loadEncounterRangeWithoutSupporters and loadSupporters, the
// desktop's background load in parts: the parts of any cut of the seq range,
// put end to end, with their supporters added once, are exactly
// loadEncounters() (every field, uid, note and supporters), also after
// deletions left gaps in seq (model-based: random colony files, random cuts).
#include "core/store/colony_edits.h"
#include "core/store/colony_store.h"
#include "import_test_support.h"
#include "random_colony.h"

#include <gtest/gtest.h>

#include <random>
#include <sstream>

using namespace hierloom::core;
using hierloom::test::TempDir;

namespace {

std::string everyField(const Encounter& e)
{
    std::ostringstream s;
    s << e.seq << ' ' << e.uid << ' ' << e.date << ' ' << (e.time ? *e.time : -1) << ' ' << e.winner << ' ' << e.loser
      << ' ' << toString(e.outcome) << " b=" << e.behaviour << " g=" << e.group << " o=" << e.observer << " n=" << e.note
      << " ws=";
    for (const std::string& id : e.winnerSupport) s << id << ',';
    s << " ls=";
    for (const std::string& id : e.loserSupport) s << id << ',';
    return s.str();
}

std::vector<std::string> texts(const std::vector<Encounter>& rows)
{
    std::vector<std::string> out;
    for (const Encounter& e : rows) out.push_back(everyField(e));
    return out;
}

} // namespace

TEST(EncounterRange, PartsEndToEndAreTheWholeFile)
{
    std::mt19937_64 rng(4021);
    auto below = [&](std::int64_t n) { return static_cast<std::int64_t>(rng() % static_cast<std::uint64_t>(n)); };
    TempDir dir;
    int supporters = 0;
    for (int file = 0; file < 6; ++file) {
        hierloom::test::RandomColonyShape shape;
        shape.animals = 4 + static_cast<int>(below(12));
        shape.groups = 1 + static_cast<int>(below(3));
        shape.encounters = 1 + static_cast<int>(below(400));
        shape.days = 1 + static_cast<int>(below(90));
        Colony colony = hierloom::test::randomColony(rng(), shape);
        for (Encounter& e : colony.encounters) e.seq = 0; // the store numbers them
        const std::string path = dir.file("f" + std::to_string(file) + ".hierloom");
        ColonyStore store = ColonyStore::create(path);
        store.append(colony.animals, colony.residences, colony.encounters);
        // Gaps in seq: a few rows deleted.
        std::vector<std::string> gone;
        for (const Encounter& e : store.loadEncounters())
            if (below(5) == 0) gone.push_back(e.uid);
        deleteEncounters(store, gone);

        const std::vector<Encounter> whole = store.loadEncounters();
        for (const Encounter& e : whole) supporters += static_cast<int>(e.winnerSupport.size() + e.loserSupport.size());
        const auto range = store.encounterSeqRange();
        ASSERT_EQ(range.has_value(), !whole.empty());
        if (!range) continue;
        EXPECT_EQ(range->first, whole.front().seq);
        EXPECT_EQ(range->second, whole.back().seq);
        for (int cut = 0; cut < 10; ++cut) {
            // Random part boundaries, some beyond either end, some parts empty.
            const std::int64_t parts = 1 + below(8);
            std::vector<Encounter> joined;
            std::int64_t first = range->first - below(3);
            for (std::int64_t p = 0; p < parts; ++p) {
                const std::int64_t last = p + 1 == parts ? range->second + below(3) : first + below(60);
                for (Encounter& e : store.loadEncounterRangeWithoutSupporters(first, last)) {
                    EXPECT_TRUE(e.winnerSupport.empty() && e.loserSupport.empty());
                    joined.push_back(std::move(e));
                }
                first = last + 1;
            }
            if (first <= range->second)
                for (Encounter& e : store.loadEncounterRangeWithoutSupporters(first, range->second))
                    joined.push_back(std::move(e));
            store.loadSupporters(joined);
            EXPECT_EQ(texts(joined), texts(whole)) << "file " << file << ", cut " << cut;
        }
    }
    EXPECT_GT(supporters, 20) << "the files must carry supporters for the check to mean anything";
}

TEST(EncounterRange, AnEmptyFileHasNoRange)
{
    TempDir dir;
    const ColonyStore store = ColonyStore::create(dir.file("empty.hierloom"));
    EXPECT_FALSE(store.encounterSeqRange());
    EXPECT_TRUE(store.loadEncounterRangeWithoutSupporters(0, 1000).empty());
}
