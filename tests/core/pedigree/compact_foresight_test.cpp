// SPDX-License-Identifier: GPL-3.0-or-later
// Foresight from compact records against foresight from a Colony's encounters
// (the older path is the reference), on random colonies: every group and one,
// windows, both sibling rules and draw policies; every field compared, numbers
// by their bits.
#include "core/pedigree/foresight.h"

#include "random_colony.h"

#include <gtest/gtest.h>

#include <sstream>

using namespace hierloom::core;

namespace {

using hierloom::test::bits;

std::string text(const Foresight& f)
{
    std::ostringstream out;
    out << toString(f.rule) << ' ' << f.comparable << ' ' << f.conforming << ' ' << bits(f.ruleWinProbability) << '\n';
    for (const ForesightEncounter& e : f.encounters)
        out << e.day << ' ' << e.winner << ' ' << e.loser << ' '
            << (e.ruleConforms ? (*e.ruleConforms ? "y" : "n") : "-") << ' ' << bits(e.rule) << ' ' << bits(e.elo)
            << ' ' << bits(e.informedElo) << '\n';
    for (const ForesightRow& r : f.rows)
        out << toString(r.model) << ' ' << (r.year ? std::to_string(*r.year) : "-") << ' ' << r.score.encounters << ' '
            << r.score.called << ' ' << r.score.predicted << ' ' << bits(r.score.logLikelihood) << ' '
            << bits(r.score.brier) << ' ' << bits(r.score.sharePredicted) << '\n';
    return out.str();
}

} // namespace

TEST(CompactForesight, RandomColoniesGiveTheSameForesight)
{
    int comparable = 0;
    size_t encounters = 0;
    for (std::uint64_t seed = 1; seed <= 40; ++seed) {
        hierloom::test::RandomColonyShape shape;
        shape.animals = 8 + static_cast<int>(seed % 13);
        shape.encounters = 40 + static_cast<int>(seed * 11 % 300);
        shape.days = 30 + static_cast<int>(seed * 37 % 500); // over a year boundary on some seeds
        Colony colony = hierloom::test::randomColony(seed, shape);
        const ResidenceIndex where(colony.animals, colony.residences);
        const CompactEncounters compact = compactEncounters(colony.encounters);
        Colony pedigree = colony;
        pedigree.encounters.clear();
        for (const std::string& group : {std::string(), std::string("G1"), std::string("G3")}) {
            for (int variant = 0; variant < 2; ++variant) {
                SelectionOptions selection;
                selection.group = group;
                selection.draws = variant == 0 ? DrawPolicy::Half : DrawPolicy::Ignore;
                if (variant == 1) selection.from = 18000 + 4;
                ForesightOptions o;
                o.rule = variant == 0 ? SiblingRule::Youngest : SiblingRule::Eldest;
                o.maturityYears = 2 + static_cast<int>(seed % 4);
                const Foresight reference = computeForesight(colony, where, selection, o);
                EXPECT_EQ(text(reference), text(computeForesight(compact, pedigree, where, selection, o)))
                    << "seed " << seed << ", group '" << group << "', variant " << variant;
                comparable += reference.comparable;
                encounters += reference.encounters.size();
            }
        }
    }
    EXPECT_GT(comparable, 200);
    EXPECT_GT(encounters, 5000U);
}
