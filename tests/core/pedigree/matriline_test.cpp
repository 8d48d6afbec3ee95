// SPDX-License-Identifier: GPL-3.0-or-later
// Pedigree queries of core/pedigree/matriline.h: matriarchs, kin, generations, bad links, relatedness.
#include "core/pedigree/matriline.h"

#include "pedigree_test_support.h"

#include <gtest/gtest.h>

using namespace hierloom::core;
using hierloom::test::PedigreeBuilder;

namespace {

std::vector<std::string> ids(const Matrilines& m, const std::vector<int>& nodes)
{
    std::vector<std::string> out;
    for (int n : nodes) out.push_back(m.id(n));
    return out;
}

// G (matriarch, dead) - M, H (maternal half-sisters, fathers S1 and unknown) - D (M's), N (H's);
// F1, F2 full sisters by M and sire S2 (unrelated to M, so nobody is inbred).
Colony family()
{
    return PedigreeBuilder()
        .female("G", "1990-03-01")
        .male("S1", "1992-01-01")
        .female("M", "2000-04-01", "G", "S1")
        .female("H", "2002-04-01", "G")
        .female("D", "2008-04-01", "M")
        .female("N", "2009-04-01", "H")
        .male("S2", "1995-01-01")
        .female("F1", "2012-04-01", "M", "S2")
        .female("F2", "2013-04-01", "M", "S2")
        .male("B", "2014-04-01", "M")
        .died("G", "2010-01-01")
        .build();
}

} // namespace

TEST(Matriline, MatriarchMotherGrandmotherGeneration)
{
    // docs/methods.md "Matrilineal rank prediction": follow mother links to an animal with no
    // recorded mother; dead animals (G) still head their line.
    const Colony c = family();
    const Matrilines m(c);
    const int d = m.index("D");
    EXPECT_EQ(m.id(m.matriarch(d)), "G");
    EXPECT_EQ(m.id(m.mother(d)), "M");
    EXPECT_EQ(m.id(m.grandmother(d)), "G");
    EXPECT_EQ(m.generation(d), 2);
    EXPECT_EQ(m.generation(m.index("G")), 0);
    EXPECT_EQ(m.generation(m.index("M")), 1);
    EXPECT_EQ(m.grandmother(m.index("M")), -1);
    EXPECT_EQ(m.id(m.matriarch(m.index("S1"))), "S1"); // a founder male heads a line of his own
    EXPECT_EQ(ids(m, m.daughters(m.index("M"))), (std::vector<std::string>{"D", "F1", "F2"})); // son B left out
    EXPECT_EQ(ids(m, m.offspring(m.index("M"))), (std::vector<std::string>{"B", "D", "F1", "F2"}));
    EXPECT_EQ(ids(m, m.sisters(m.index("F1"))), (std::vector<std::string>{"D", "F2"}));
    EXPECT_EQ(ids(m, m.sisters(m.index("M"))), (std::vector<std::string>{"H"}));
    EXPECT_TRUE(m.sisters(m.index("G")).empty());
    EXPECT_EQ(ids(m, m.members(m.index("G"))),
              (std::vector<std::string>{"B", "D", "F1", "F2", "G", "H", "M", "N"}));
    EXPECT_TRUE(m.problems().empty());
}

TEST(Matriline, RelatednessThroughThePedigree)
{
    // Wright 1922 path coefficients, r = sum (1/2)^L without inbreeding; checked against
    // Falconer & Mackay 1996, Introduction to Quantitative Genetics, ch. 5 [from memory].
    const Colony c = family();
    const Matrilines m(c);
    PedigreeKinship k(m);
    EXPECT_DOUBLE_EQ(k.of("M", "D")->r, 0.5);    // mother-daughter, one path of L = 1
    EXPECT_DOUBLE_EQ(k.of("F1", "F2")->r, 0.5);  // full sisters: two paths of L = 2
    EXPECT_DOUBLE_EQ(k.of("M", "H")->r, 0.25);   // maternal half-sisters: one path of L = 2
    EXPECT_DOUBLE_EQ(k.of("G", "D")->r, 0.25);   // grandmother-granddaughter, L = 2
    EXPECT_DOUBLE_EQ(k.of("H", "D")->r, 0.125);  // aunt-niece through half-sisters, L = 3
    EXPECT_DOUBLE_EQ(k.of("D", "N")->r, 0.0625); // cousins through half-sister mothers, L = 4
    EXPECT_DOUBLE_EQ(k.of("G", "S1")->r, 0.0);   // unrelated founders
    // Pedigree depth: generations of known ancestry behind the deeper animal (D: M, G).
    EXPECT_EQ(k.of("G", "D")->pedigreeDepth, 2);
    EXPECT_EQ(k.of("G", "S1")->pedigreeDepth, 0);
    EXPECT_FALSE(k.of("G", "nobody").has_value());
}

TEST(Matriline, MotherWithoutARecordKeepsHerDaughtersTogether)
{
    // Bad input (issue 4): a mother id missing from the file is reported; her daughters
    // still form one matriline named after her and count as sisters.
    const Colony c = PedigreeBuilder().female("A", "2010-01-01", "Q").female("B", "2012-01-01", "Q").build();
    const Matrilines m(c);
    ASSERT_EQ(m.size(), 3);
    EXPECT_FALSE(m.recorded(m.index("Q")));
    EXPECT_EQ(m.id(m.matriarch(m.index("A"))), "Q");
    EXPECT_EQ(ids(m, m.sisters(m.index("A"))), (std::vector<std::string>{"B"}));
    ASSERT_EQ(m.problems().size(), 2U);
    EXPECT_NE(m.problems()[0].message.find("Q has no record"), std::string::npos);
}

TEST(Matriline, CyclicMotherLinksDoNotHang)
{
    // A damaged file where two animals are each other's mother: one link is dropped and
    // reported, every query terminates.
    Colony c = PedigreeBuilder().female("X", "2010-01-01", "Y").female("Y", "2011-01-01", "X").build();
    const Matrilines m(c);
    ASSERT_EQ(m.problems().size(), 1U);
    EXPECT_NE(m.problems()[0].message.find("own ancestor"), std::string::npos);
    const int x = m.index("X"), y = m.index("Y");
    EXPECT_EQ(m.matriarch(x), m.matriarch(y));
    EXPECT_EQ(m.generation(m.matriarch(x)), 0);
    PedigreeKinship k(m);
    EXPECT_DOUBLE_EQ(k.of(x, y).r, 0.5); // the remaining link is mother-daughter
}

TEST(Matriline, MaleMotherIsReported)
{
    const Colony c = PedigreeBuilder().male("P", "2000-01-01").female("A", "2010-01-01", "P").build();
    const Matrilines m(c);
    ASSERT_EQ(m.problems().size(), 1U);
    EXPECT_NE(m.problems()[0].message.find("not recorded as female"), std::string::npos);
}
