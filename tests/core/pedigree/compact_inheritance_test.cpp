// SPDX-License-Identifier: GPL-3.0-or-later
// The matrilineal prediction from compact records against the prediction from
// records (the older path is the reference), on the demo colony and on random
// colonies: every group and none, dates inside and after the record, both
// sibling rules, both draw policies.
#include "core/pedigree/inheritance_prediction.h"
#include "core/pedigree/discordance.h"
#include "core/pedigree/rank_acquisition.h"

#include "demo_fixture.h"
#include "prediction_text.h"
#include "random_colony.h"

#include <gtest/gtest.h>

#include <sstream>

using namespace hierloom::core;

namespace {

using hierloom::test::bits;

std::string text(const InheritancePrediction& p) { return hierloom::test::predictionText(p); }

std::string text(const ObservedScores& scores)
{
    std::ostringstream out;
    for (const auto& [id, score] : scores) out << id << ' ' << bits(score) << '\n';
    return out.str();
}

/// Both paths must agree; returns how many females the record path ranked.
size_t expectSamePrediction(const Colony& colony, const InheritanceOptions& o, const std::string& label)
{
    const ResidenceIndex where(colony.animals, colony.residences);
    const Matrilines lines(colony);
    const CompactEncounters compact = compactEncounters(colony.encounters);
    const InheritancePrediction p = predictInheritance(colony, where, lines, o);
    EXPECT_EQ(text(p), text(predictInheritance(compact, colony.animals, where, lines, o))) << label;
    const Day at = o.at.value_or(*lastEncounterDay(colony));
    EXPECT_EQ(text(eloScoresAt(colony, where, at, o.group, o.elo)),
              text(eloScoresAt(compact, colony.animals, where, at, o.group, o.elo)))
        << label;
    EXPECT_EQ(lastEncounterDay(colony), lastEncounterDay(compact)) << label;
    return p.females.size();
}

} // namespace

TEST(CompactInheritance, DemoColonyPredictionIsIdenticalToTheRecordPath)
{
    const Colony& demo = hierloom::test::demoColony();
    for (const std::string& group : {std::string(), std::string("North Corral")}) {
        InheritanceOptions o;
        o.group = group;
        EXPECT_GT(expectSamePrediction(demo, o, "demo, group '" + group + "'"), 0U);
        o.at = *lastEncounterDay(demo) - 200;
        o.rule = SiblingRule::Eldest;
        expectSamePrediction(demo, o, "demo earlier, group '" + group + "'");
    }
}

TEST(CompactInheritance, RandomColoniesGiveTheSamePrediction)
{
    size_t ranked = 0;
    for (std::uint64_t seed = 1; seed <= 60; ++seed) {
        hierloom::test::RandomColonyShape shape;
        shape.animals = 8 + static_cast<int>(seed % 13);
        shape.encounters = 40 + static_cast<int>(seed * 7 % 300);
        const Colony colony = hierloom::test::randomColony(seed, shape);
        const Day last = *lastEncounterDay(colony);
        for (const std::string& group : {std::string(), std::string("G1"), std::string("G2")}) {
            InheritanceOptions o;
            o.group = group;
            o.maturityYears = static_cast<int>(seed % 4) + 1;
            o.rule = seed % 2 ? SiblingRule::Youngest : SiblingRule::Eldest;
            o.elo.draws = seed % 3 ? DrawPolicy::Half : DrawPolicy::Ignore;
            const std::string label = "seed " + std::to_string(seed) + ", group '" + group + "'";
            ranked += expectSamePrediction(colony, o, label);
            o.at = last - static_cast<Day>(seed % 20);
            ranked += expectSamePrediction(colony, o, label + " earlier");
        }
    }
    EXPECT_GT(ranked, 100U); // the colonies rank females, so the orders compared are not empty
}

namespace {

/// The ranked females by the definition (docs/methods.md): every recorded
/// female resident in the group on day d and mature; the reference for the
/// candidates' shortcut.
std::vector<bool> rankedByDefinition(const Matrilines& lines, const ResidenceIndex& where, Day d,
                                     const std::string& group, int maturityYears)
{
    std::vector<bool> out(static_cast<size_t>(lines.size()), false);
    for (int i = 0; i < lines.recordedCount(); ++i) {
        if (lines.sex(i) != Sex::Female) continue;
        const int k = where.animal(lines.id(i));
        if (k < 0) continue;
        const int on = where.groupOn(k, d);
        if (on < 0 || (!group.empty() && (on != where.group(group) || where.group(group) < 0))) continue;
        const std::optional<Day> birth = lines.birth(i);
        if (birth && d < anniversary(*birth, maturityYears)) continue;
        out[static_cast<size_t>(i)] = true;
    }
    return out;
}

} // namespace

TEST(RankedFemaleCandidates, RankTheSameFemalesAsTheDefinitionOnEveryDay)
{
    int ranked = 0;
    for (std::uint64_t seed = 1; seed <= 20; ++seed) {
        hierloom::test::RandomColonyShape shape;
        shape.animals = 10 + static_cast<int>(seed % 15);
        const Colony colony = hierloom::test::randomColony(seed, shape);
        const ResidenceIndex where(colony.animals, colony.residences);
        const Matrilines lines(colony);
        for (const std::string& group : {std::string(), std::string("G1"), std::string("G3"), std::string("nowhere")}) {
            const std::vector<FemaleCandidate> candidates = rankedFemaleCandidates(lines, where, group);
            for (Day d = 17850; d <= 18100; d += 5) {
                const int years = 1 + static_cast<int>(seed % 5);
                const RankedFemales r = rankedFemalesOn(lines, where, candidates, d, group, years);
                EXPECT_EQ(r.ranked, rankedByDefinition(lines, where, d, group, years))
                    << "seed " << seed << ", group '" << group << "', day " << d;
                EXPECT_EQ(r.unknownBirth, rankedFemalesOn(lines, where, d, group, years).unknownBirth);
                for (bool b : r.ranked) ranked += b;
            }
        }
    }
    EXPECT_GT(ranked, 1000); // the days compared rank females
}

namespace {

std::string text(const std::vector<SisterOvertaking>& rows)
{
    std::ostringstream out;
    for (const SisterOvertaking& r : rows)
        out << r.daughter << ' ' << r.olderSister << ' ' << r.mother << ' ' << r.compared << ' '
            << (r.firstAbove ? std::to_string(*r.firstAbove) : "-") << ' ' << (r.ageYears ? *r.ageYears : -1) << ' '
            << (r.ageDays ? *r.ageDays : -1) << ' ' << r.aboveAtLastComparison << '\n';
    return out.str();
}

std::string text(const ConformitySeries& s)
{
    std::ostringstream out;
    for (const auto* points : {&s.elo, &s.davidsScore}) {
        for (const ConformityPoint& p : *points)
            out << p.periodStart << ' ' << p.periodEnd << ' ' << p.ranked << ' ' << p.observed << ' ' << p.comparable
                << ' ' << p.discordant << ' ' << bits(p.conformity) << ' ' << bits(p.tauB) << '\n';
        out << "--\n";
    }
    return out.str();
}

} // namespace

// `inherit --acquisition` and `--monthly` read compact records: the same rows
// as from records, on random colonies spread over many months.
TEST(CompactInheritance, RankAcquisitionAndTheMonthlySeriesAreTheSameFromCompactRecords)
{
    size_t compared = 0, months = 0;
    for (std::uint64_t seed = 1; seed <= 40; ++seed) {
        hierloom::test::RandomColonyShape shape;
        shape.animals = 10 + static_cast<int>(seed % 11);
        shape.encounters = 100 + static_cast<int>(seed * 13 % 400);
        shape.days = 100 + static_cast<int>(seed * 37 % 500);
        const Colony colony = hierloom::test::randomColony(seed, shape);
        const ResidenceIndex where(colony.animals, colony.residences);
        const Matrilines lines(colony);
        const CompactEncounters compact = compactEncounters(colony.encounters);
        for (const std::string& group : {std::string(), std::string("G1"), std::string("G2")}) {
            const std::string label = "seed " + std::to_string(seed) + ", group '" + group + "'";
            EloSettings elo;
            elo.draws = seed % 3 ? DrawPolicy::Half : DrawPolicy::Ignore;
            const std::optional<Day> to =
                seed % 2 ? std::nullopt : std::optional<Day>(*lastEncounterDay(colony) - static_cast<Day>(seed * 3));
            const std::vector<SisterOvertaking> rows = rankAcquisition(colony, where, lines, elo, group, to);
            EXPECT_EQ(text(rows), text(rankAcquisition(compact, colony.animals, where, lines, elo, group, to))) << label;
            for (const SisterOvertaking& r : rows) compared += r.compared ? 1 : 0;

            InheritanceOptions o;
            o.group = group;
            o.elo = elo;
            o.maturityYears = static_cast<int>(seed % 3) + 1;
            o.rule = seed % 2 ? SiblingRule::Youngest : SiblingRule::Eldest;
            const ConformitySeries series = monthlyConformity(colony, where, lines, o);
            EXPECT_EQ(text(series), text(monthlyConformity(compact, colony.animals, where, lines, o))) << label;
            months += series.elo.size();
        }
    }
    EXPECT_GT(compared, 50U); // sisters were compared, so the rows hold results
    EXPECT_GT(months, 300U);
}
