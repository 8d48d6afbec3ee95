// SPDX-License-Identifier: GPL-3.0-or-later
// What-if scenarios from compact records and the pedigree against the same
// from a Colony's encounters (the older path is the reference), on random
// colonies: no change, a removal, a birth, an introduction, a split, every
// group and one, dates given and not, scenarios with problems; every field
// of the result (or the problems) compared, numbers by their bits, and the
// scenario text parsed against either.
#include "core/planning/scenario.h"
#include "core/planning/scenario_file.h"

#include "prediction_text.h"
#include "random_colony.h"

#include <gtest/gtest.h>

#include <sstream>

using namespace hierloom::core;

namespace {

using hierloom::test::bits;

std::string text(const InheritancePrediction& p) { return hierloom::test::predictionText(p); }

/// The result, or the problems runScenario threw.
template <class Run> std::string outcome(Run run)
{
    std::ostringstream out;
    try {
        const ScenarioResult r = run();
        out << r.at << '\n';
        for (const ScenarioGroup& g : r.groups) out << "group " << g.group << '\n' << text(g.before) << text(g.after);
        for (const ScenarioMove& m : r.moves)
            out << "move " << m.animal << ' ' << m.matriarch << ' ' << m.groupBefore << ' '
                << (m.rankBefore ? std::to_string(*m.rankBefore) : "-") << ' ' << m.groupAfter << ' '
                << (m.rankAfter ? std::to_string(*m.rankAfter) : "-") << ' ' << m.status << '\n';
        for (const ScenarioReversal& v : r.reversals)
            out << "rev " << v.group << ' ' << v.predictedAbove << ' ' << v.predictedBelow << ' '
                << v.winsPredictedAbove << ' ' << v.winsPredictedBelow << ' ' << v.againstPredictionBefore << '\n';
        for (const std::string& a : r.addedAnimals) out << "added " << a << '\n';
    } catch (const ScenarioError& e) {
        for (const ScenarioProblem& p : e.problems()) out << "problem " << p.line << ' ' << p.message << '\n';
    }
    return out.str();
}

std::string text(const ScenarioFileResult& r)
{
    std::ostringstream out;
    out << (r.scenario ? formatScenarioText(*r.scenario) : "-") << '\n';
    for (const std::string& e : r.errors) out << e << '\n';
    return out.str();
}

} // namespace

TEST(CompactScenario, RandomColoniesGiveTheSameScenarios)
{
    size_t females = 0, reversals = 0, problems = 0;
    for (std::uint64_t seed = 1; seed <= 40; ++seed) {
        hierloom::test::RandomColonyShape shape;
        shape.animals = 10 + static_cast<int>(seed % 12);
        shape.encounters = 60 + static_cast<int>(seed * 23 % 400);
        shape.days = 20 + static_cast<int>(seed % 40);
        const Colony colony = hierloom::test::randomColony(seed, shape);
        const CompactEncounters compact = compactEncounters(colony.encounters);
        Colony pedigree = colony;
        pedigree.encounters.clear();
        std::vector<Scenario> scenarios;
        for (int kind = 0; kind < 6; ++kind) {
            Scenario s;
            s.maturityYears = 1 + static_cast<int>(seed % 4);
            s.recentDays = 3 + static_cast<int>(seed % 30);
            s.group = kind % 2 == 0 ? std::string() : std::string("G1");
            if (kind == 5) s.at = 18000 + 7;
            if (seed % 3 == 0) s.rule = SiblingRule::Eldest;
            const Animal& a = colony.animals[seed % colony.animals.size()];
            ScenarioChange ch;
            if (kind == 1) {
                ch.kind = ScenarioChange::Kind::Remove;
                ch.animal = a.id;
                s.changes.push_back(ch);
            } else if (kind == 2) {
                ch.kind = ScenarioChange::Kind::Birth;
                ch.animal = a.id; // a problem when she is male or not resident
                ch.sex = Sex::Female;
                s.changes.push_back(ch);
            } else if (kind == 3) {
                ch.kind = ScenarioChange::Kind::Introduce;
                ch.animal = "newcomer";
                s.changes.push_back(ch);
            } else if (kind == 4) {
                ch.kind = ScenarioChange::Kind::Split;
                ch.matriarchs = {colony.animals[0].id};
                ch.toGroup = "G7";
                s.changes.push_back(ch);
            }
            scenarios.push_back(s);
        }
        for (size_t k = 0; k < scenarios.size(); ++k) {
            const Scenario& s = scenarios[k];
            const std::string reference = outcome([&] { return runScenario(colony, s); });
            EXPECT_EQ(reference, outcome([&] { return runScenario(compact, pedigree, s); }))
                << "seed " << seed << ", scenario " << k;
            EXPECT_EQ(text(parseScenarioText(formatScenarioText(s), "s.txt", colony, s)),
                      text(parseScenarioText(formatScenarioText(s), "s.txt", compact, pedigree, s)))
                << "seed " << seed << ", scenario " << k;
            try {
                const ScenarioResult r = runScenario(colony, s);
                for (const ScenarioGroup& g : r.groups) females += g.after.females.size();
                reversals += r.reversals.size();
            } catch (const ScenarioError&) {
                ++problems;
            }
        }
    }
    EXPECT_GT(females, 500U);
    EXPECT_GT(reversals, 20U);
    EXPECT_GT(problems, 5U);
}
