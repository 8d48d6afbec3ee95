// SPDX-License-Identifier: GPL-3.0-or-later
// Active and passive rank changes (docs/methods.md "Active and passive rank
// changes"): periods worked by hand from the definition there, and
// randomised checks that active + passive = total.
#include "core/ranks/rank_changes.h"

#include "pedigree_test_support.h"

#include <gtest/gtest.h>

#include <algorithm>
#include <map>
#include <random>

using namespace hierloom::core;
using hierloom::test::PedigreeBuilder;

namespace {

const RankChange& of(const std::vector<RankChange>& changes, const std::string& id)
{
    return *std::find_if(changes.begin(), changes.end(), [&](const RankChange& c) { return c.animal == id; });
}

} // namespace

TEST(RankChanges, OneDeathAboveIsPassive)
{
    // By hand: A dies above B and C; B and C keep their order. B: 2 -> 1, one
    // animal left above her: passive +1, active 0.
    const auto c = splitRankChanges({"A", "B", "C"}, {"B", "C"});
    ASSERT_EQ(c.size(), 2u);
    EXPECT_EQ(of(c, "B").total, 1);
    EXPECT_EQ(of(c, "B").passive, 1);
    EXPECT_EQ(of(c, "B").active, 0);
    EXPECT_EQ(of(c, "B").leftAbove, 1);
    EXPECT_EQ(of(c, "C").passive, 1);
    EXPECT_EQ(of(c, "C").active, 0);
}

TEST(RankChanges, AReversalIsActive)
{
    // By hand: B and C change places, nobody enters or leaves.
    const auto c = splitRankChanges({"A", "B", "C"}, {"A", "C", "B"});
    EXPECT_EQ(of(c, "C").total, 1);
    EXPECT_EQ(of(c, "C").active, 1);
    EXPECT_EQ(of(c, "C").passive, 0);
    EXPECT_EQ(of(c, "B").active, -1);
    EXPECT_EQ(of(c, "A").total, 0);
}

TEST(RankChanges, DeathReversalAndEntryTogether)
{
    // By hand: before A B C D; A dies, C passes B, E enters above D: after C B E D.
    // Animals ranked at both ends: B C D, before in order B C D, after C B D.
    // B: 2 -> 2, active 1 - 2 = -1, passive 1 left above - 0 entered = +1, total 0.
    // C: 3 -> 1, active 2 - 1 = +1, passive +1, total +2.
    // D: 4 -> 4, active 0, passive 1 - 1 = 0.
    const auto c = splitRankChanges({"A", "B", "C", "D"}, {"C", "B", "E", "D"});
    ASSERT_EQ(c.size(), 3u);
    EXPECT_EQ(of(c, "B").active, -1);
    EXPECT_EQ(of(c, "B").passive, 1);
    EXPECT_EQ(of(c, "B").total, 0);
    EXPECT_EQ(of(c, "C").active, 1);
    EXPECT_EQ(of(c, "C").passive, 1);
    EXPECT_EQ(of(c, "C").total, 2);
    EXPECT_EQ(of(c, "D").enteredAbove, 1);
    EXPECT_EQ(of(c, "D").leftAbove, 1);
    EXPECT_EQ(of(c, "D").passive, 0);
}

TEST(RankChanges, ColonyWithADeathAboveByMonth)
{
    // January: A > B > C by their wins; A dies on 10 February; in February B
    // beats C once more, so B and C keep their order. February's change for
    // B: 2 -> 1, passive +1, active 0; C: 3 -> 2, passive +1.
    const Colony c = PedigreeBuilder()
                         .female("A", "2000-01-01")
                         .female("B", "2000-01-01")
                         .female("C", "2000-01-01")
                         .win("2020-01-05", "A", "B")
                         .win("2020-01-06", "A", "C")
                         .win("2020-01-07", "B", "C")
                         .win("2020-02-12", "B", "C")
                         .died("A", "2020-02-10")
                         .build();
    const ResidenceIndex where(c.animals, c.residences);
    const auto periods = rankChangesByPeriod(c, where, SelectionOptions{}, RankOptions{}, PeriodLength::Month);
    ASSERT_EQ(periods.size(), 1u);
    EXPECT_EQ(formatDate(periods[0].period.start), "2020-02-01");
    const auto& ch = periods[0].changes;
    ASSERT_EQ(ch.size(), 2u);
    EXPECT_EQ(of(ch, "B").rankBefore, 2);
    EXPECT_EQ(of(ch, "B").rankAfter, 1);
    EXPECT_EQ(of(ch, "B").passive, 1);
    EXPECT_EQ(of(ch, "B").active, 0);
    EXPECT_EQ(of(ch, "C").passive, 1);
    EXPECT_EQ(of(ch, "C").active, 0);
}

TEST(RankChanges, RandomOrdersSumToTheTotal)
{
    // Identity of docs/methods.md: active + passive = total; active is also the
    // change of place among the common animals, counted here by brute force.
    std::mt19937 gen(11);
    for (int round = 0; round < 200; ++round) {
        std::vector<std::string> pool;
        for (int i = 0; i < 15; ++i) pool.push_back("a" + std::to_string(i));
        std::shuffle(pool.begin(), pool.end(), gen);
        std::vector<std::string> before(pool.begin(), pool.begin() + 10);
        std::vector<std::string> after;
        for (const std::string& id : pool)
            if (std::bernoulli_distribution(0.7)(gen)) after.push_back(id);
        std::shuffle(after.begin(), after.end(), gen);
        const auto changes = splitRankChanges(before, after);
        for (const RankChange& c : changes) {
            EXPECT_EQ(c.active + c.passive, c.total);
            int commonAbove0 = 0, commonAbove1 = 0;
            for (int k = 0; k < c.rankBefore - 1; ++k)
                commonAbove0 += std::count(after.begin(), after.end(), before[static_cast<size_t>(k)]) > 0;
            for (int k = 0; k < c.rankAfter - 1; ++k)
                commonAbove1 += std::count(before.begin(), before.end(), after[static_cast<size_t>(k)]) > 0;
            EXPECT_EQ(c.active, commonAbove0 - commonAbove1);
        }
    }
}

TEST(RankChanges, GeneratedColoniesSumToTheTotal)
{
    // Randomised colonies with deaths and births: every row of every month
    // satisfies active + passive = total, and its ranks are those of
    // computeRanksByPeriod at the two period ends.
    for (unsigned seed = 1; seed <= 6; ++seed) {
        std::mt19937 gen(seed);
        PedigreeBuilder b;
        std::vector<std::string> ids;
        for (int i = 0; i < 12; ++i) {
            const std::string id = "f" + std::to_string(i);
            const std::string mother = i >= 4 ? ids[static_cast<size_t>(gen() % 4)] : std::string();
            b.female(id, i >= 4 ? "2019-0" + std::to_string(1 + gen() % 6) + "-01" : "2000-01-01", mother);
            ids.push_back(id);
        }
        for (int day = 0; day < 500; ++day) {
            const Day d = dayFromCivil(2020, 1, 1) + day;
            const size_t w = gen() % ids.size(), l = gen() % ids.size();
            if (w != l) b.win(formatDate(d), ids[w], ids[l]);
        }
        b.died(ids[gen() % 4], "2020-06-15").died(ids[4 + gen() % 8], "2020-10-03");
        Colony c = b.build();
        // Encounters after a death are not valid records; drop them.
        std::erase_if(c.encounters, [&](const Encounter& e) {
            for (const std::string& id : {e.winner, e.loser}) {
                const Animal& a = c.animals[static_cast<size_t>(c.animalIndex(id))];
                if (a.exit && e.date > *a.exit) return true;
            }
            return false;
        });
        const ResidenceIndex where(c.animals, c.residences);
        for (EloStartRule rule : {EloStartRule::None, EloStartRule::Youngest}) {
            RankOptions o;
            o.startRule = rule;
            std::map<Day, std::map<std::string, int>> rankAt;
            for (const PeriodRankRow& r : computeRanksByPeriod(c, where, SelectionOptions{}, o, PeriodLength::Month))
                rankAt[r.period.end][r.row.animal] = r.row.rank;
            const auto periods = rankChangesByPeriod(c, where, SelectionOptions{}, o, PeriodLength::Month);
            ASSERT_FALSE(periods.empty());
            int rows = 0;
            for (const PeriodRankChanges& p : periods)
                for (const RankChange& ch : p.changes) {
                    ++rows;
                    EXPECT_EQ(ch.active + ch.passive, ch.total);
                    EXPECT_EQ(ch.total, ch.rankBefore - ch.rankAfter);
                    EXPECT_EQ(rankAt[p.period.end][ch.animal], ch.rankAfter);
                    EXPECT_EQ(rankAt[p.period.start - 1][ch.animal], ch.rankBefore);
                }
            EXPECT_GT(rows, 50);
        }
    }
}
