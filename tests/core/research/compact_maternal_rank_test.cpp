// SPDX-License-Identifier: GPL-3.0-or-later
// Maternal ranks and the births not counted, from compact records against
// the same from a Colony's encounters (the older path is the reference), on
// random colonies with births during the record: every group, one group and
// a group nobody lives in, windows, gestations and draw policies; every field
// compared, numbers by their bits.
#include "core/research/maternal_rank.h"

#include "random_colony.h"

#include <gtest/gtest.h>

#include <random>
#include <sstream>

using namespace hierloom::core;

namespace {

using hierloom::test::bits;

std::string text(const MaternalRankAt& at)
{
    std::ostringstream out;
    out << at.day << ' ' << (at.rank ? std::to_string(*at.rank) : "-") << ' '
        << (at.rankedFemales ? std::to_string(*at.rankedFemales) : "-") << ' ' << bits(at.relativeRank) << ' '
        << toString(at.problem);
    return out.str();
}

std::string text(const std::vector<MaternalRankRow>& rows, const BirthCounting& c)
{
    std::ostringstream out;
    out << (c.recordStart ? std::to_string(*c.recordStart) : "-") << ' ' << c.founders << ' ' << c.bornBefore << '\n';
    for (const MaternalRankRow& r : rows)
        out << r.offspring << ' ' << r.mother << ' ' << static_cast<int>(r.sex) << ' ' << r.birth << " | "
            << text(r.atConception) << " | " << text(r.atBirth) << " | " << toString(r.exclusion) << ' ' << r.detail
            << ' ' << r.conceivedBeforeRecord << '\n';
    return out.str();
}

/// A random colony in which some daughters and sons are born during the record.
Colony colonyWithBirths(std::uint64_t seed)
{
    hierloom::test::RandomColonyShape shape;
    shape.animals = 10 + static_cast<int>(seed % 12);
    shape.encounters = 60 + static_cast<int>(seed * 17 % 400);
    shape.days = 60 + static_cast<int>(seed * 29 % 300);
    Colony colony = hierloom::test::randomColony(seed, shape);
    std::mt19937_64 rng(seed * 7919);
    for (Animal& a : colony.animals) {
        if (a.mother.empty() && rng() % 4 != 0) continue;
        a.entryType = EntryType::Born;
        const int r = static_cast<int>(rng() % 5);
        if (r == 0) a.birth.reset();
        else a.birth = 18000 - 20 + static_cast<Day>(rng() % static_cast<std::uint64_t>(shape.days + 20));
        if (rng() % 6 == 0) a.sex = Sex::Unknown;
    }
    colony.reindex();
    return colony;
}

} // namespace

TEST(CompactMaternalRank, RandomColoniesGiveTheSameRanks)
{
    size_t births = 0, ranked = 0;
    for (std::uint64_t seed = 1; seed <= 60; ++seed) {
        const Colony colony = colonyWithBirths(seed);
        const ResidenceIndex where(colony.animals, colony.residences);
        const CompactEncounters compact = compactEncounters(colony.encounters);
        Colony pedigree = colony;
        pedigree.encounters.clear();
        for (const std::string& group : {std::string(), std::string("G1"), std::string("G2"), std::string("G9")}) {
            for (int variant = 0; variant < 2; ++variant) {
                MaternalRankOptions o;
                o.group = group;
                o.gestationDays = 5 + static_cast<int>(seed % 30);
                o.maturityYears = 1 + static_cast<int>(seed % 4);
                if (variant == 1) {
                    o.from = 18000 + 10;
                    o.to = 18000 + 150;
                    o.elo.draws = DrawPolicy::Ignore;
                }
                const std::vector<MaternalRankRow> reference = computeMaternalRanks(colony, where, o);
                EXPECT_EQ(text(reference, countNonBirths(colony, where, o)),
                          text(computeMaternalRanks(compact, pedigree, where, o), countNonBirths(compact, pedigree, where, o)))
                    << "seed " << seed << ", group '" << group << "', variant " << variant;
                births += reference.size();
                for (const MaternalRankRow& r : reference) ranked += r.atConception.relativeRank.has_value();
            }
        }
    }
    EXPECT_GT(births, 500U);
    EXPECT_GT(ranked, 100U);
}
