// SPDX-License-Identifier: GPL-3.0-or-later
// scopesOf (the groups' own records, cut from all of them in one pass)
// against a brute-force filter of the plain encounters: a group's records
// and those without a group, in entry order, with their supporters, and the
// code tables of the whole set unchanged.
#include "core/base/compact_encounters.h"
#include "core/base/encounter_records.h"

#include "random_colony.h"

#include <gtest/gtest.h>

#include <tuple>

namespace hierloom::core {
namespace {

auto fields(const Encounter& e)
{
    return std::tie(e.date, e.time, e.winner, e.loser, e.outcome, e.behaviour, e.group, e.observer, e.seq,
                    e.winnerSupport, e.loserSupport);
}

void expectScope(const std::vector<Encounter>& all, const std::string& group, const CompactEncounters& scope,
                 const CompactEncounters& whole, const std::string& label)
{
    std::vector<Encounter> expected;
    for (const Encounter& e : all)
        if (e.group.empty() || e.group == group) expected.push_back(e);
    ASSERT_EQ(scope.size(), expected.size()) << label;
    for (size_t i = 0; i < expected.size(); ++i) {
        Encounter e = expected[i];
        e.note.clear();
        e.uid.clear();
        ASSERT_TRUE(fields(scope.expand(i)) == fields(e)) << label << ", record " << i;
    }
    EXPECT_EQ(scope.animals.names(), whole.animals.names()) << label;
    EXPECT_EQ(scope.groups.names(), whole.groups.names()) << label;
    EXPECT_EQ(scope.behaviours.names(), whole.behaviours.names()) << label;
    EXPECT_EQ(scope.observers.names(), whole.observers.names()) << label;
}

TEST(CompactScopes, EachGroupsScopeIsItsRowsAndTheRowsWithoutAGroup)
{
    for (std::uint64_t seed = 1; seed <= 40; ++seed) {
        test::RandomColonyShape shape;
        shape.groups = 1 + static_cast<int>(seed % 5);
        shape.encounters = 50 + static_cast<int>(seed * 17 % 400);
        const Colony colony = test::randomColony(seed, shape);
        // Through EncounterRecords with some records replaced, as the
        // desktop holds them after edits.
        EncounterRecords records(colony.encounters);
        std::vector<Encounter> model = colony.encounters;
        for (size_t i = 0; i < model.size(); i += 7) {
            std::swap(model[i].winner, model[i].loser);
            if (i % 3 == 0) model[i].winnerSupport.swap(model[i].loserSupport);
            records.put(model[i]);
        }
        const CompactEncounters& whole = records.compact();
        // Asked in a shuffled order, with one group that has no record and one asked twice.
        std::vector<std::string> groups = {"none"};
        for (int g = shape.groups; g >= 1; --g) groups.push_back("G" + std::to_string(g));
        groups.push_back("G1");
        const std::vector<CompactEncounters> scopes = scopesOf(whole, groups);
        ASSERT_EQ(scopes.size(), groups.size());
        for (size_t k = 0; k < groups.size(); ++k) {
            const std::string label = "seed " + std::to_string(seed) + ", " + groups[k];
            expectScope(model, groups[k], scopes[k], whole, label);
            expectScope(model, groups[k], scopeOf(whole, groups[k]), whole, label + " (scopeOf)");
        }
    }
}

} // namespace
} // namespace hierloom::core
