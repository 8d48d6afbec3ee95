// SPDX-License-Identifier: GPL-3.0-or-later
#include "core/research/maternal_rank.h"

#include <gtest/gtest.h>

#include <map>

using namespace hierloom::core;

namespace {

Day on(int y, unsigned m, unsigned d) { return dayFromCivil(y, m, d); }

constexpr int kGestation = 165;

/// A small colony whose Elo ratings are worked out by hand (docs/methods.md Elo,
/// k = 100, start 1000, logistic curve):
///   2019-12-01 A beats X (male):      A 1050,    X 950
///   2020-01-01 A beats B, A beats C, B beats C:
///                                     A 1129.80, B 1008.00, C 912.20
///   2020-01-02 X beats E (young F):   X 1007.15, E 942.85
///   2020-03-01 C beats B:             C 975.65,  B 944.55
/// So the ranked (mature, resident, rated) females are A > B > C from
/// 2020-01-01 and A > C > B from 2020-03-01; X is male and E is under 4
/// (4th birthday 2021-06-01), so neither counts before then.
class HandColony {
public:
    HandColony()
    {
        animal("A", Sex::Female, on(2000, 1, 1), "");
        animal("B", Sex::Female, on(2000, 1, 1), "");
        animal("C", Sex::Female, on(2000, 1, 1), "");
        animal("X", Sex::Male, on(2000, 1, 1), "");
        animal("E", Sex::Female, on(2017, 6, 1), "");
        animal("F", Sex::Female, on(2000, 1, 1), "", on(2020, 3, 1)); // enters 2020-03-01, never fights
        encounter(on(2019, 12, 1), "A", "X");
        encounter(on(2020, 1, 1), "A", "B");
        encounter(on(2020, 1, 1), "A", "C");
        encounter(on(2020, 1, 1), "B", "C");
        encounter(on(2020, 1, 2), "X", "E");
        encounter(on(2020, 3, 1), "C", "B");
        // Births, named by their conception day (birth = conception + 165).
        birth("B1", Sex::Male, "B", on(2020, 1, 10));   // used: B 2nd of 3 at conception, 3rd of 3 at birth
        birth("A1", Sex::Female, "A", on(2019, 12, 5)); // only A rated among females: m = 1
        birth("C1", Sex::Female, "C", on(2019, 11, 1)); // before any encounter: C has no rating
        birth("U1", Sex::Unknown, "A", on(2020, 1, 10));
        birth("N1", Sex::Female, "", on(2020, 1, 10));
        birth("E1", Sex::Male, "E", on(2020, 2, 1));    // E under 4 at conception
        birth("E2", Sex::Female, "E", on(2021, 6, 1));  // conceived on E's 4th birthday: ranked
        birth("F1", Sex::Female, "F", on(2019, 12, 20)); // F entered after conception
        colony.reindex();
        where = ResidenceIndex(colony.animals, colony.residences);
    }

    std::map<std::string, MaternalRankRow> ranks(const MaternalRankOptions& o) const
    {
        std::map<std::string, MaternalRankRow> out;
        for (const MaternalRankRow& r : computeMaternalRanks(colony, where, o)) out[r.offspring] = r;
        return out;
    }

    Colony colony;
    ResidenceIndex where;

private:
    void animal(const std::string& id, Sex sex, Day birth, const std::string& mother, std::optional<Day> entry = {})
    {
        Animal a;
        a.id = id;
        a.sex = sex;
        a.birth = birth;
        a.mother = mother;
        a.entry = entry;
        colony.animals.push_back(a);
        colony.residences.push_back({id, "main", entry.value_or(birth), std::nullopt, {}});
    }
    void birth(const std::string& id, Sex sex, const std::string& mother, Day conception)
    {
        animal(id, sex, conception + kGestation, mother);
    }
    void encounter(Day d, const std::string& w, const std::string& l)
    {
        Encounter e;
        e.date = d;
        e.winner = w;
        e.loser = l;
        e.group = "main";
        e.seq = static_cast<std::int64_t>(colony.encounters.size()) + 1;
        colony.encounters.push_back(e);
    }
};

MaternalRankOptions options()
{
    MaternalRankOptions o;
    o.gestationDays = kGestation;
    o.maturityYears = 4;
    return o;
}

} // namespace

TEST(MaternalRank, RelativeRankAtConceptionAndAtBirthByHand)
{
    const HandColony c;
    const auto rows = c.ranks(options());
    const MaternalRankRow& b = rows.at("B1");
    // Hand computation above: on 2020-01-10 A > B > C, m = 3 (X male, E immature).
    EXPECT_EQ(b.atConception.day, on(2020, 1, 10)); // docs/methods.md: conception = birth - gestation
    EXPECT_EQ(b.atConception.rank, 2);
    EXPECT_EQ(b.atConception.rankedFemales, 3);
    EXPECT_EQ(b.atConception.relativeRank, 0.5); // 1 - (2 - 1)/(3 - 1)
    // At birth (2020-06-23) C has overtaken B: A > C > B, B 3rd of 3, relative 0.
    EXPECT_EQ(b.atBirth.rank, 3);
    EXPECT_EQ(b.atBirth.rankedFemales, 3);
    EXPECT_EQ(b.atBirth.relativeRank, 0.0);
    EXPECT_EQ(b.exclusion, BirthExclusion::None);
}

TEST(MaternalRank, MaturityCountsFromTheBirthdayItself)
{
    const HandColony c;
    const auto rows = c.ranks(options());
    // docs/methods.md "Age": at least 4 on and after the 4th birthday. On 2021-06-01
    // E (942.85) ranks below A, C (975.65) and B (944.55): 4th of 4, relative 0.
    const MaternalRankRow& e2 = rows.at("E2");
    EXPECT_EQ(e2.exclusion, BirthExclusion::None);
    EXPECT_EQ(e2.atConception.rank, 4);
    EXPECT_EQ(e2.atConception.rankedFemales, 4);
    EXPECT_EQ(e2.atConception.relativeRank, 0.0);
    // E1: conceived at 2 years 8 months, left out as immature.
    EXPECT_EQ(rows.at("E1").exclusion, BirthExclusion::MotherNotMature);
    EXPECT_STREQ(toString(BirthExclusion::MotherNotMature), "mother_not_mature");
}

TEST(MaternalRank, LeftOutBirthsCarryTheirReason)
{
    const HandColony c;
    const auto rows = c.ranks(options());
    // The 8 offspring are the births; the 6 adults were born (2000, 2017) before the
    // record's first encounter (2019-12-01) and are not births (docs/methods.md, "Births").
    ASSERT_EQ(rows.size(), 8U);
    EXPECT_EQ(rows.count("A"), 0U);
    EXPECT_EQ(countNonBirths(c.colony, c.where, options()).bornBefore, 6);
    // docs/methods.md: m < 2 is left out. On 2019-12-05 only A is a rated female.
    const MaternalRankRow& a1 = rows.at("A1");
    EXPECT_EQ(a1.exclusion, BirthExclusion::FewerThanTwoRanked);
    EXPECT_EQ(a1.atConception.rank, 1);
    EXPECT_EQ(a1.atConception.rankedFemales, 1);
    EXPECT_FALSE(a1.atConception.relativeRank);
    EXPECT_EQ(a1.atBirth.relativeRank, 1.0); // at birth (2020-05-18) A tops 3 females
    // docs/methods.md: a mother without a rating is left out (no encounter before 2019-11-01).
    EXPECT_EQ(rows.at("C1").exclusion, BirthExclusion::MotherNotRated);
    EXPECT_EQ(rows.at("C1").atConception.rankedFemales, 0);
    EXPECT_STREQ(toString(BirthExclusion::MotherNotRated), "no_rating");
    // docs/methods.md: sex F or M and a known mother only.
    EXPECT_EQ(rows.at("U1").exclusion, BirthExclusion::UnknownSex);
    EXPECT_EQ(rows.at("U1").atConception.relativeRank, 1.0); // the rank itself is still reported
    EXPECT_EQ(rows.at("N1").exclusion, BirthExclusion::UnknownMother);
    EXPECT_FALSE(rows.at("N1").atConception.rankedFemales);
    // F entered on 2020-03-01, after her offspring's conception (2019-12-20), and the reason says so.
    EXPECT_EQ(rows.at("F1").exclusion, BirthExclusion::MotherNotResident);
    EXPECT_EQ(rows.at("F1").detail, "the mother F arrived on 2020-03-01, after conception");
    EXPECT_TRUE(rows.at("B1").detail.empty());
}

// Founders are never births, whatever their birth date; births conceived before
// the record began say so rather than blaming the mother's residence.
TEST(MaternalRank, FoundersAndAnimalsBornBeforeTheRecordAreNotBirths)
{
    Colony colony;
    auto add = [&](const std::string& id, Sex sex, Day birth, const std::string& mother, EntryType type, Day from) {
        Animal a;
        a.id = id;
        a.sex = sex;
        a.birth = birth;
        a.mother = mother;
        a.entryType = type;
        a.entry = from;
        colony.animals.push_back(a);
        colony.residences.push_back({id, "main", from, std::nullopt, {}});
    };
    // The record begins with the first encounter, 2019-01-05; residences begin then too.
    const Day start = on(2019, 1, 5);
    add("M", Sex::Female, on(2010, 5, 1), "", EntryType::Founder, start);
    add("N", Sex::Female, on(2012, 5, 1), "", EntryType::Founder, start);
    add("Y", Sex::Female, on(2019, 3, 1), "", EntryType::Founder, start); // a founder born after the start
    add("P", Sex::Male, on(2018, 4, 1), "M", EntryType::Born, start);     // born before the record
    add("Q", Sex::Female, on(2019, 3, 1), "M", EntryType::Born, on(2019, 3, 1)); // conceived 2018-09-17
    Encounter e;
    e.date = start;
    e.winner = "M";
    e.loser = "N";
    e.group = "main";
    e.seq = 1;
    colony.encounters.push_back(e);
    colony.reindex();
    const ResidenceIndex where(colony.animals, colony.residences);
    const std::vector<MaternalRankRow> rows = computeMaternalRanks(colony, where, options());
    ASSERT_EQ(rows.size(), 1U); // Q alone: M, N, Y are founders, P was born before the record
    EXPECT_EQ(rows[0].offspring, "Q");
    EXPECT_EQ(rows[0].exclusion, BirthExclusion::MotherNotResident);
    EXPECT_EQ(rows[0].detail, "conceived on 2018-09-17, before the record began on 2019-01-05");
    EXPECT_TRUE(rows[0].conceivedBeforeRecord);
    const BirthCounting c = countNonBirths(colony, where, options());
    EXPECT_EQ(c.recordStart, start);
    EXPECT_EQ(c.founders, 3);
    EXPECT_EQ(c.bornBefore, 1);
}

TEST(MaternalRank, FromAndToSelectByBirthDate)
{
    const HandColony c;
    MaternalRankOptions o = options();
    // B1 is born on 2020-06-23 (2020-01-10 + 165 days).
    o.from = on(2020, 6, 23);
    o.to = on(2020, 6, 23);
    const auto only = computeMaternalRanks(c.colony, c.where, o);
    ASSERT_EQ(only.size(), 3U); // B1, U1 and N1 share the birth day
    EXPECT_EQ(only[0].offspring, "B1"); // birth date, then id
    EXPECT_EQ(only[1].offspring, "N1");
    EXPECT_EQ(only[2].offspring, "U1");
    // Ranks do not depend on the birth window: Elo runs over the whole record.
    EXPECT_EQ(only[0].atConception.relativeRank, 0.5);
}

TEST(MaternalRank, GestationMovesTheConceptionDay)
{
    const HandColony c;
    MaternalRankOptions o = options();
    o.gestationDays = kGestation - 60; // B1 conceived 2020-03-10, after C overtook B
    const MaternalRankRow b = c.ranks(o).at("B1");
    EXPECT_EQ(b.atConception.day, on(2020, 3, 10));
    EXPECT_EQ(b.atConception.rank, 3);
    EXPECT_EQ(b.atConception.relativeRank, 0.0);
}

TEST(MaternalRank, NoBirthsGiveAnEmptyTable)
{
    Colony empty;
    empty.reindex();
    const ResidenceIndex where(empty.animals, empty.residences);
    EXPECT_TRUE(computeMaternalRanks(empty, where, options()).empty());
}
