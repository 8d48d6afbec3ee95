// SPDX-License-Identifier: GPL-3.0-or-later
// Predicted order of core/pedigree/inheritance_prediction.h on hand-built pedigrees
// (docs/methods.md "Matrilineal rank prediction"; Kawamura 1958; Datta 1988).
#include "core/pedigree/inheritance_prediction.h"

#include "pedigree_test_support.h"

#include <gtest/gtest.h>

#include <stdexcept>

using namespace hierloom::core;
using hierloom::test::PedigreeBuilder;

namespace {

const Day kAt = dayFromCivil(2020, 6, 1);

// Line A: A (1990); daughters A1 (2000), A2 (2005), A3 (2008); A2's daughter A2a (2012); A's son Am.
// Line B: B (1990); daughter B1 (2003). A beats B: line A observed on top.
PedigreeBuilder twoLines()
{
    PedigreeBuilder b;
    b.female("A", "1990-01-01")
        .female("A1", "2000-01-01", "A")
        .female("A2", "2005-01-01", "A")
        .female("A3", "2008-01-01", "A")
        .female("A2a", "2012-01-01", "A2")
        .male("Am", "2009-01-01", "A")
        .female("B", "1990-01-01")
        .female("B1", "2003-01-01", "B")
        .win("2020-01-10", "A", "B");
    return b;
}

std::vector<std::string> order(const InheritancePrediction& p)
{
    std::vector<std::string> out;
    for (const auto& f : p.females) out.push_back(f.animal);
    return out;
}

InheritancePrediction predict(const Colony& c, InheritanceOptions o = {})
{
    if (!o.at) o.at = kAt;
    const ResidenceIndex where(c.animals, c.residences);
    const Matrilines lines(c);
    return predictInheritance(c, where, lines, o);
}

using Ids = std::vector<std::string>;

} // namespace

TEST(InheritancePrediction, YoungestAscendancy)
{
    // Kawamura 1958, youngest ascendancy (common practice): a daughter sits directly below
    // her mother and above every female her mother outranks; of three sisters the youngest
    // (A3) is first; A2's daughter follows A2 (mother before her offspring's subtree).
    const InheritancePrediction p = predict(twoLines().build());
    EXPECT_EQ(order(p), (Ids{"A", "A3", "A2", "A2a", "A1", "B", "B1"}));
    EXPECT_EQ(p.matrilineOrder, (Ids{"A", "B"}));
    EXPECT_EQ(p.females[1].matriarch, "A");
    EXPECT_EQ(p.females[1].predictedRank, 2);
    // Observed ranks (docs/methods.md "Small choices"): among ranked females with a rating, 1..m.
    EXPECT_EQ(p.females[0].observedRank, 1);
    EXPECT_EQ(p.females[5].observedRank, 2);
    EXPECT_FALSE(p.females[1].observedRank.has_value());
}

TEST(InheritancePrediction, EldestRuleReversesSisters)
{
    // docs/methods.md: rule `eldest` orders daughters by birth date ascending.
    InheritanceOptions o;
    o.rule = SiblingRule::Eldest;
    EXPECT_EQ(order(predict(twoLines().build(), o)), (Ids{"A", "A1", "A2", "A2a", "A3", "B", "B1"}));
}

TEST(InheritancePrediction, DeadMothersDaughtersKeepTheLinesPlace)
{
    // docs/methods.md: the whole pedigree, dead animals included, shapes the order; skipped
    // animals' descendants keep their places. A2 dead: A2a still between A3 and A1.
    EXPECT_EQ(order(predict(twoLines().died("A2", "2015-01-01").build())), (Ids{"A", "A3", "A2a", "A1", "B", "B1"}));
    // The matriarch dead: her daughters keep the line's place above line B (A3 observed top).
    const Colony c = twoLines().died("A", "2015-01-01").win("2020-02-01", "A3", "B1").win("2020-02-02", "A1", "B").build();
    const InheritancePrediction p = predict(c);
    EXPECT_EQ(order(p), (Ids{"A3", "A2", "A2a", "A1", "B", "B1"}));
    EXPECT_EQ(p.females[0].matriarch, "A");
}

TEST(InheritancePrediction, ImmatureSkippedDescendantsKeepPlace)
{
    // docs/methods.md: immature females are skipped, their descendants keep their places.
    // A3 born 2017 is 3 on 2020-06-01 (maturity 4); her daughter X has no birth date
    // (counts as mature, a data-entry case) and takes A3's place.
    PedigreeBuilder b = twoLines();
    Colony c = b.build();
    c.animals[static_cast<size_t>(c.animalIndex("A3"))].birth = parseDate("2017-01-01");
    c.animals[static_cast<size_t>(c.animalIndex("A3"))].entry = parseDate("2017-01-01");
    Animal x;
    x.id = "X";
    x.sex = Sex::Female;
    x.mother = "A3";
    x.entry = parseDate("2019-01-01");
    c.animals.push_back(x);
    c.residences.push_back({"X", "main", *x.entry, std::nullopt, {}});
    c.reindex();
    const InheritancePrediction p = predict(c);
    EXPECT_EQ(order(p), (Ids{"A", "X", "A2", "A2a", "A1", "B", "B1"}));
    EXPECT_EQ(p.unknownBirthCountedMature, (Ids{"X"}));
    EXPECT_TRUE(p.unorderable.empty()); // X has no sister
    // Maturity on the birthday itself (docs/methods.md "Age"): A2a turns 8 on 2020-01-01.
    InheritanceOptions o;
    o.maturityYears = 8;
    o.at = dayFromCivil(2019, 12, 31);
    EXPECT_EQ(predict(twoLines().build(), o).find("A2a"), -1);
    o.at = dayFromCivil(2020, 1, 1);
    EXPECT_GE(predict(twoLines().build(), o).find("A2a"), 0);
}

TEST(InheritancePrediction, MatrilineOrderFollowsObservedTopMember)
{
    // docs/methods.md: matrilines ordered by the best observed rank among their ranked members.
    // B1 beats everyone of line A: line B moves on top although A beat B.
    const Colony c = twoLines().win("2020-03-01", "B1", "A", 4).win("2020-03-02", "B1", "A3", 2).build();
    const InheritancePrediction p = predict(c);
    EXPECT_EQ(p.matrilineOrder, (Ids{"B", "A"}));
    EXPECT_EQ(order(p), (Ids{"B", "B1", "A", "A3", "A2", "A2a", "A1"}));
}

TEST(InheritancePrediction, ExplicitMatrilineOrderOverrides)
{
    // docs/methods.md: an explicit matriline order given by the user overrides the observed one.
    InheritanceOptions o;
    o.matrilineOrder = {"B"};
    const InheritancePrediction p = predict(twoLines().build(), o);
    EXPECT_EQ(order(p), (Ids{"B", "B1", "A", "A3", "A2", "A2a", "A1"}));
    o.matrilineOrder = {"A2"};
    EXPECT_THROW(predict(twoLines().build(), o), std::invalid_argument); // not a matriarch
    o.matrilineOrder = {"nobody"};
    EXPECT_THROW(predict(twoLines().build(), o), std::invalid_argument);
    o.matrilineOrder = {"A", "A"};
    EXPECT_THROW(predict(twoLines().build(), o), std::invalid_argument);
}

TEST(InheritancePrediction, LinesWithoutObservedRankLastById)
{
    // docs/methods.md: matrilines without an observed rank come last, by matriarch id.
    const Colony c = twoLines().female("D", "1995-01-01").female("C", "1995-01-01").build();
    EXPECT_EQ(predict(c).matrilineOrder, (Ids{"A", "B", "C", "D"}));
}

TEST(InheritancePrediction, UnknownBirthSistersPlacedEldestAndReported)
{
    // docs/methods.md "Small choices": sisters with an unknown birth date are placed as the
    // eldest; they are reported as unorderable, not hidden.
    const Colony c = PedigreeBuilder()
                         .female("M", "1990-01-01")
                         .female("K", "2000-01-01", "M")
                         .female("U", "", "M")
                         .female("L", "2005-01-01", "M")
                         .build();
    const InheritancePrediction y = predict(c);
    EXPECT_EQ(order(y), (Ids{"M", "L", "K", "U"}));
    EXPECT_EQ(y.unorderable, (Ids{"U"}));
    EXPECT_EQ(y.unknownBirthCountedMature, (Ids{"U"}));
    InheritanceOptions o;
    o.rule = SiblingRule::Eldest;
    EXPECT_EQ(order(predict(c, o)), (Ids{"M", "U", "K", "L"}));
}

TEST(InheritancePrediction, SameBirthDateByIdUnderBothRules)
{
    // docs/methods.md "Small choices": sisters born the same day are ordered by id ascending.
    const Colony c = PedigreeBuilder()
                         .female("M", "1990-01-01")
                         .female("T2", "2005-05-05", "M")
                         .female("T1", "2005-05-05", "M")
                         .build();
    EXPECT_EQ(order(predict(c)), (Ids{"M", "T1", "T2"}));
    InheritanceOptions o;
    o.rule = SiblingRule::Eldest;
    EXPECT_EQ(order(predict(c, o)), (Ids{"M", "T1", "T2"}));
}

TEST(InheritancePrediction, GroupAndResidence)
{
    // Only females resident at D in the chosen group are ranked; males never.
    const Colony c = twoLines().female("Z", "2001-01-01", "A", {}, "other").build();
    InheritanceOptions o;
    o.group = "main";
    EXPECT_EQ(predict(c, o).find("Z"), -1);
    o.group = "other";
    EXPECT_EQ(order(predict(c, o)), (Ids{"Z"}));
    o.group.clear();
    const InheritancePrediction all = predict(c, o);
    EXPECT_EQ(all.find("Am"), -1);
    EXPECT_EQ(order(all), (Ids{"A", "A3", "A2", "A2a", "Z", "A1", "B", "B1"}));
}

TEST(InheritancePrediction, MissingMotherDaughtersOrderedAsSisters)
{
    // Bad input: a mother missing from the file; her daughters form one line named after her.
    const Colony c = PedigreeBuilder().female("S1", "2000-01-01", "Q").female("S2", "2004-01-01", "Q").build();
    const InheritancePrediction p = predict(c);
    EXPECT_EQ(order(p), (Ids{"S2", "S1"}));
    EXPECT_EQ(p.females[0].matriarch, "Q");
}

TEST(InheritancePrediction, DefaultDateIsLastEncounter)
{
    const Colony c = twoLines().win("2021-02-03", "A", "B").build();
    const ResidenceIndex where(c.animals, c.residences);
    EXPECT_EQ(predictInheritance(c, where, Matrilines(c), {}).at, dayFromCivil(2021, 2, 3));
    const Colony empty = PedigreeBuilder().female("A", "2000-01-01").build();
    const ResidenceIndex w2(empty.animals, empty.residences);
    EXPECT_THROW(predictInheritance(empty, w2, Matrilines(empty), {}), std::invalid_argument);
}
