// SPDX-License-Identifier: GPL-3.0-or-later
// Compact records (core/base/compact_encounters.h) against the records they
// replace: the selection and every rank table computed from them must be
// identical, bit for bit, to those computed from std::vector<Encounter>
// (the reference here is the older path itself, an identity check), on the
// demo colony and on many random colonies (model-based).
#include "core/base/compact_encounters.h"
#include "core/ranks/compact_selection.h"
#include "core/ranks/rank_table.h"
#include "core/research/data_health.h"
#include "demo_fixture.h"
#include "random_colony.h"

#include <gtest/gtest.h>

#include <bit>
#include <cstdint>
#include <numeric>
#include <random>
#include <sstream>

using namespace hierloom::core;

namespace {

using hierloom::test::bits;

/// Every field of a rank table, numbers by their bits.
std::string text(const RankTable& t)
{
    std::ostringstream s;
    s << "k " << bits(t.kUsed) << " ll " << bits(t.logLikelihood) << " on " << (t.rankedOn ? *t.rankedOn : -1) << "\n";
    for (const RankRow& r : t.rows)
        s << r.animal << ' ' << r.rank << ' ' << bits(r.score) << ' ' << bits(r.low) << ' ' << bits(r.high) << ' '
          << bits(r.meanRank) << "\n";
    return s.str();
}

std::string text(const std::vector<PeriodRankRow>& rows)
{
    std::ostringstream s;
    for (const PeriodRankRow& p : rows)
        s << p.period.start << ' ' << p.period.end << ' ' << p.row.animal << ' ' << p.row.rank << ' '
          << bits(p.row.score) << "\n";
    return s.str();
}

void expectSameSelection(const EncounterSelection& a, const EncounterSelection& b, const std::string& where)
{
    EXPECT_EQ(a.ids, b.ids) << where;
    ASSERT_EQ(a.bouts.size(), b.bouts.size()) << where;
    for (size_t i = 0; i < a.bouts.size(); ++i) {
        EXPECT_EQ(a.bouts[i].winner, b.bouts[i].winner) << where << " bout " << i;
        EXPECT_EQ(a.bouts[i].loser, b.bouts[i].loser) << where << " bout " << i;
        EXPECT_EQ(a.bouts[i].draw, b.bouts[i].draw) << where << " bout " << i;
    }
    EXPECT_EQ(a.days, b.days) << where;
    EXPECT_EQ(a.source, b.source) << where;
    EXPECT_EQ(a.firstDay, b.firstDay) << where;
    EXPECT_EQ(a.lastDay, b.lastDay) << where;
}

/// Old and new paths on one colony and one choice of options.
void expectSameRanks(const Colony& colony, const CompactEncounters& compact, const ResidenceIndex& where,
                     const SelectionOptions& sel, const RankOptions& r, const std::string& label)
{
    const EncounterSelection oldSel = selectEncounters(colony, where, sel);
    const EncounterSelection newSel = selectEncounters(compact, colony.animals, where, sel);
    expectSameSelection(oldSel, newSel, label);
    if (!sel.group.empty()) {
        // The desktop's workers select from the group's own records (scopeOf).
        EncounterSelection scoped = selectEncounters(scopeOf(compact, sel.group), colony.animals, where, sel);
        EXPECT_EQ(scoped.source.size(), newSel.source.size()) << label;
        scoped.source = newSel.source; // indices into the scope's records, not into every record
        expectSameSelection(newSel, scoped, label + " (group's scope)");
    }
    Colony animalsOnly;
    animalsOnly.animals = colony.animals;
    animalsOnly.residences = colony.residences;
    animalsOnly.reindex();
    EXPECT_EQ(text(computeRanks(colony, where, sel, r)), text(computeRanks(newSel, animalsOnly, where, sel, r))) << label;
    // Per period (`--every`); I&SI of the demo colony takes seconds a table, so not per period there.
    if (r.randomise == 0 && (r.method != RankMethod::Isi || colony.encounters.size() < 1000)) {
        const PeriodLength every = colony.encounters.size() > 1000 ? PeriodLength::Month : PeriodLength::Week;
        EXPECT_EQ(text(computeRanksByPeriod(colony, where, sel, r, every)),
                  text(computeRanksByPeriod(newSel, animalsOnly, where, sel, r, every)))
            << label << " every " << static_cast<int>(every);
    }
    EXPECT_EQ(encounterCounts(colony, sel.from, sel.to, sel.group), encounterCounts(compact, sel.from, sel.to, sel.group))
        << label;
}

} // namespace

TEST(CompactEncounters, HoldEveryFieldTheEnginesReadInThirtyTwoBytes)
{
    const Colony colony = hierloom::test::randomColony(3, {20, 4, 5000, 200});
    const CompactEncounters compact = compactEncounters(colony.encounters);
    ASSERT_EQ(compact.size(), colony.encounters.size());
    for (size_t i = 0; i < colony.encounters.size(); ++i) {
        Encounter expected = colony.encounters[i];
        expected.note.clear(); // not held
        expected.uid.clear();
        const Encounter got = compact.expand(i);
        EXPECT_EQ(got.seq, expected.seq);
        EXPECT_EQ(got.date, expected.date);
        EXPECT_EQ(got.time, expected.time);
        EXPECT_EQ(got.winner, expected.winner);
        EXPECT_EQ(got.loser, expected.loser);
        EXPECT_EQ(got.outcome, expected.outcome);
        EXPECT_EQ(got.behaviour, expected.behaviour);
        EXPECT_EQ(got.group, expected.group);
        EXPECT_EQ(got.observer, expected.observer);
        EXPECT_EQ(got.winnerSupport, expected.winnerSupport) << i;
        EXPECT_EQ(got.loserSupport, expected.loserSupport) << i;
    }
    // Code 0 of the small tables is the empty text.
    EXPECT_EQ(compact.groups.name(0), "");
    EXPECT_EQ(compact.behaviours.name(0), "");
    EXPECT_EQ(compact.observers.name(0), "");
    // 32 bytes a record; supporters (about one encounter in nine) and the
    // code tables add a little: held bytes per encounter stay under 40.
    const double perEncounter = static_cast<double>(compact.bytesHeld()) / static_cast<double>(compact.size());
    EXPECT_GE(perEncounter, 32.0);
    EXPECT_LT(perEncounter, 40.0);
}

TEST(CompactEncounters, AnalysisOrderEqualsAStableSortByTheDefinition)
{
    // As ChronologicalOrder.EqualsAStableSortByTheDefinition: brute force on
    // random records with many ties; some rounds with ascending dates (the
    // path that sorts each day's run alone), some without.
    std::mt19937 rng(29);
    for (int round = 0; round < 60; ++round) {
        std::vector<Encounter> encounters(1 + rng() % 300);
        Day day = -3;
        for (Encounter& e : encounters) {
            e.date = round % 2 == 0 ? -3 + static_cast<Day>(rng() % 8) : (day += static_cast<Day>(rng() % 5 == 0));
            if (rng() % 3 != 0) e.time = static_cast<int>(rng() % 4) * 480; // 24:00 too (bad data)
            e.seq = static_cast<std::int64_t>(rng() % 5);                   // repeated seq: unsaved records
            e.winner = "a";
            e.loser = "b";
        }
        std::vector<size_t> expected(encounters.size());
        std::iota(expected.begin(), expected.end(), size_t{0});
        std::stable_sort(expected.begin(), expected.end(),
                         [&](size_t a, size_t b) { return encounterBefore(encounters[a], encounters[b]); });
        const std::vector<std::uint32_t> got = analysisOrder(compactEncounters(encounters).records);
        EXPECT_EQ(std::vector<size_t>(got.begin(), got.end()), expected) << "round " << round;
        EXPECT_EQ(inAnalysisOrder(compactEncounters(encounters).records),
                  std::is_sorted(encounters.begin(), encounters.end(), encounterBefore));
    }
}

TEST(CompactSelection, DemoColonyRanksAreIdenticalToTheRecordPath)
{
    const Colony& colony = hierloom::test::demoColony();
    const ResidenceIndex where(colony.animals, colony.residences);
    const CompactEncounters compact = compactEncounters(colony.encounters);
    const std::optional<Day> mid = parseDate("2023-06-30");
    for (RankMethod method : {RankMethod::Elo, RankMethod::DavidsScore, RankMethod::Isi}) {
        for (const std::string& group : {std::string(), std::string(demo::kGroup)}) {
            for (DrawPolicy draws : {DrawPolicy::Half, DrawPolicy::Ignore}) {
                // I&SI of the demo colony takes seconds: one window of the group is enough.
                if (method == RankMethod::Isi && (group.empty() || draws == DrawPolicy::Ignore)) continue;
                SelectionOptions sel;
                sel.group = group;
                sel.draws = draws;
                RankOptions r;
                r.method = method;
                const std::string label = "method " + std::to_string(static_cast<int>(method)) + " group '" + group +
                                          "' draws " + std::to_string(static_cast<int>(draws));
                if (method != RankMethod::Isi) expectSameRanks(colony, compact, where, sel, r, label);
                sel.to = mid;
                expectSameRanks(colony, compact, where, sel, r, label + " to 2023-06-30");
            }
        }
    }
    // The Elo variants of `ranks`: at a date, start rule, optimised k, randomised.
    SelectionOptions sel;
    RankOptions r;
    r.at = mid;
    expectSameRanks(colony, compact, where, sel, r, "elo --at");
    r.at.reset();
    r.startRule = EloStartRule::Youngest;
    expectSameRanks(colony, compact, where, sel, r, "elo youngest");
    r.startRule = EloStartRule::None;
    r.optimiseK = true;
    r.threads = 2;
    expectSameRanks(colony, compact, where, sel, r, "elo optimised k");
    r.optimiseK = false;
    r.randomise = 25;
    expectSameRanks(colony, compact, where, sel, r, "elo randomised");
}

TEST(CompactSelection, RandomColoniesRankIdenticallyToTheRecordPath)
{
    // Model-based: the record path is the model; random colonies (draws,
    // same-day encounters timed and untimed, encounters without a group,
    // supporters, animals moving between groups) and random scopes.
    std::mt19937_64 rng(20261202);
    auto below = [&](int n) { return static_cast<int>(rng() % static_cast<std::uint64_t>(n)); };
    for (int round = 0; round < 120; ++round) {
        hierloom::test::RandomColonyShape shape;
        shape.animals = 2 + below(20);
        shape.groups = 1 + below(4);
        shape.encounters = below(400);
        shape.days = 1 + below(90);
        const Colony colony = hierloom::test::randomColony(rng(), shape);
        const ResidenceIndex where(colony.animals, colony.residences);
        const CompactEncounters compact = compactEncounters(colony.encounters);
        SelectionOptions sel;
        const Day start = 18000;
        if (below(3) == 0) sel.from = start + below(60);
        if (below(3) == 0) sel.to = start + below(90);
        if (below(2) == 0) sel.group = below(6) == 0 ? "G9" : "G" + std::to_string(1 + below(shape.groups));
        sel.draws = below(2) == 0 ? DrawPolicy::Half : DrawPolicy::Ignore;
        sel.includeResidents = below(4) == 0;
        RankOptions r;
        r.method = below(4) == 0 ? RankMethod::DavidsScore : below(4) == 0 ? RankMethod::Isi : RankMethod::Elo;
        r.correctedDs = below(2) == 0;
        r.elo.k = 20 + below(150);
        r.elo.curve = below(3) == 0 ? EloCurve::Normal : EloCurve::Logistic;
        r.threads = 1;
        if (r.method == RankMethod::Elo) {
            if (below(4) == 0) r.at = start + below(90);
            const int variant = below(6);
            if (variant == 0) r.startRule = below(2) == 0 ? EloStartRule::Youngest : EloStartRule::Eldest;
            if (variant == 1) r.optimiseK = true;
            if (variant == 2) r.randomise = 1 + below(20);
        }
        expectSameRanks(colony, compact, where, sel, r, "round " + std::to_string(round));
        if (HasFailure()) break;
    }
}
