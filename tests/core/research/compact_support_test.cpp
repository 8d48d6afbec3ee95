// SPDX-License-Identifier: GPL-3.0-or-later
// Kin support and rank acquisition from compact records against the same
// from a Colony's encounters (the older path is the reference), on random
// colonies with supporters: every group and one, windows, both draw
// policies; every field compared, numbers by their bits.
#include "core/pedigree/rank_acquisition.h"
#include "core/research/support_analysis.h"

#include "random_colony.h"

#include <gtest/gtest.h>

#include <sstream>

using namespace hierloom::core;

namespace {

using hierloom::test::bits;

std::string day(const std::optional<Day>& d) { return d ? std::to_string(*d) : "-"; }

std::string text(const SupportAnalysis& a)
{
    std::ostringstream out;
    out << a.encounters << ' ' << a.acts << ' ' << bits(a.nepotismIndex) << ' ' << bits(a.test.p) << ' '
        << a.test.iterations << ' ' << a.test.seed << ' ' << bits(a.test.meanRandom) << ' ' << a.motherActsAgainstFemales
        << ' ' << a.motherActsAgainstBelow << ' ' << bits(a.motherShareAgainstBelow) << '\n';
    for (const SupportPair& p : a.pairs)
        out << "p " << p.supporter << ' ' << p.beneficiary << ' ' << bits(p.r) << ' ' << toString(p.kin) << ' '
            << p.opportunities << ' ' << p.given << ' ' << bits(p.rate) << '\n';
    for (const KinClassRate& c : a.classes)
        out << "c " << toString(c.kin) << ' ' << c.pairs << ' ' << c.opportunities << ' ' << c.given << ' '
            << bits(c.rate) << '\n';
    for (const DaughterSupport& d : a.daughters)
        out << "d " << d.daughter << ' ' << d.mother << ' ' << d.olderSisters << ' ' << day(d.reached) << ' '
            << d.maternalOpportunities << ' ' << d.maternalSupport << '\n';
    for (size_t i = 0; i < a.order.size(); ++i) out << "o " << a.order[i] << ' ' << a.matriarchs.at(i) << '\n';
    return out.str();
}

std::string text(const std::vector<SisterOvertaking>& rows)
{
    std::ostringstream out;
    for (const SisterOvertaking& r : rows)
        out << r.daughter << ' ' << r.olderSister << ' ' << r.mother << ' ' << r.compared << ' ' << day(r.firstAbove)
            << ' ' << (r.ageYears ? std::to_string(*r.ageYears) : "-") << ' '
            << (r.ageDays ? std::to_string(*r.ageDays) : "-") << ' ' << r.aboveAtLastComparison << '\n';
    return out.str();
}

} // namespace

TEST(CompactSupport, RandomColoniesGiveTheSameAnalysis)
{
    int acts = 0;
    size_t pairs = 0, daughters = 0, overtakings = 0;
    for (std::uint64_t seed = 1; seed <= 40; ++seed) {
        hierloom::test::RandomColonyShape shape;
        shape.animals = 8 + static_cast<int>(seed % 12);
        shape.encounters = 60 + static_cast<int>(seed * 19 % 400);
        shape.days = 20 + static_cast<int>(seed % 50);
        const Colony colony = hierloom::test::randomColony(seed, shape);
        const ResidenceIndex where(colony.animals, colony.residences);
        const CompactEncounters compact = compactEncounters(colony.encounters);
        Colony pedigree = colony;
        pedigree.encounters.clear();
        const Matrilines lines(colony);
        for (const std::string& group : {std::string(), std::string("G1"), std::string("G2")}) {
            for (int variant = 0; variant < 2; ++variant) {
                SupportOptions o;
                o.group = group;
                o.iterations = 30;
                o.seed = seed;
                o.maturityYears = 1 + static_cast<int>(seed % 4);
                if (variant == 1) {
                    o.from = 18000 + 3;
                    o.to = 18000 + 15;
                    o.elo.draws = DrawPolicy::Ignore;
                    o.rule = SiblingRule::Eldest;
                }
                const SupportAnalysis reference = analyseSupport(colony, where, o);
                EXPECT_EQ(text(reference), text(analyseSupport(compact, pedigree, where, o)))
                    << "seed " << seed << ", group '" << group << "', variant " << variant;
                acts += reference.acts;
                pairs += reference.pairs.size();
                daughters += reference.daughters.size();
                const std::vector<SisterOvertaking> rows = rankAcquisition(colony, where, lines, o.elo, group, o.to);
                EXPECT_EQ(text(rows), text(rankAcquisition(compact, colony.animals, where, lines, o.elo, group, o.to)))
                    << "seed " << seed << ", group '" << group << "', variant " << variant;
                for (const SisterOvertaking& r : rows) overtakings += r.firstAbove.has_value();
            }
        }
    }
    EXPECT_GT(acts, 300);
    EXPECT_GT(pairs, 1000U);
    EXPECT_GT(daughters, 20U);
    EXPECT_GT(overtakings, 20U);
}

// `support --group` reads only the group's scope (its rows and those without
// a group) and gives an open window the record's last day: the same analysis
// as from every encounter, windows from the start or later, any group.
TEST(CompactSupport, AGroupsScopeWithTheRecordsLastDayGivesTheSameAnalysis)
{
    int acts = 0;
    for (std::uint64_t seed = 1; seed <= 30; ++seed) {
        hierloom::test::RandomColonyShape shape;
        shape.animals = 10 + static_cast<int>(seed % 10);
        shape.encounters = 80 + static_cast<int>(seed * 23 % 400);
        shape.days = 30 + static_cast<int>(seed % 60);
        const Colony colony = hierloom::test::randomColony(seed, shape);
        const ResidenceIndex where(colony.animals, colony.residences);
        const Day last = *lastEncounterDay(colony);
        for (const std::string& group : {std::string("G1"), std::string("G2"), std::string("G3")}) {
            Colony scoped = colony;
            scoped.encounters.clear();
            for (const Encounter& e : colony.encounters)
                if (e.group.empty() || e.group == group) scoped.encounters.push_back(e);
            for (int variant = 0; variant < 2; ++variant) {
                SupportOptions o;
                o.group = group;
                o.iterations = 20;
                o.seed = seed;
                o.maturityYears = 1 + static_cast<int>(seed % 3);
                if (variant == 1) o.from = 18000 + 10; // a later start: the Elo still runs from the first encounter
                const SupportAnalysis whole = analyseSupport(colony, where, o);
                SupportOptions ended = o;
                ended.to = last;
                EXPECT_EQ(text(whole), text(analyseSupport(scoped, where, ended)))
                    << "seed " << seed << ", " << group << ", variant " << variant;
                acts += whole.acts;
            }
        }
    }
    EXPECT_GT(acts, 50); // supporters were counted, so the analyses compared are not empty
}
