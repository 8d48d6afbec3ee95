// SPDX-License-Identifier: GPL-3.0-or-later
#include "core/matriline_founder.h"

#include <gtest/gtest.h>

using namespace hierloom::core;

namespace {

Animal female(const std::string& id, const std::string& mother = {})
{
    Animal a;
    a.id = id;
    a.sex = Sex::Female;
    a.mother = mother;
    return a;
}

} // namespace

// All expected values below: brute force by following the mother column of
// the small pedigrees by hand (methods.md, "Matrilineal rank prediction").
TEST(MatrilineFounder, FollowsMotherLinksToTheMatriarch)
{
    Colony c;
    c.animals = {female("gran"), female("mum", "gran"), female("kid", "mum"), female("other")};
    EXPECT_EQ(matrilineFounder(c, "kid"), "gran");
    EXPECT_EQ(matrilineFounder(c, "mum"), "gran");
    EXPECT_EQ(matrilineFounder(c, "gran"), "gran"); // a matriarch heads her own line
    EXPECT_EQ(matrilineFounder(c, "other"), "other");
}

TEST(MatrilineFounder, MalesBelongToTheirMothersLine)
{
    Colony c;
    Animal son = female("son", "mum");
    son.sex = Sex::Male;
    c.animals = {female("mum"), son};
    EXPECT_EQ(matrilineFounder(c, "son"), "mum");
}

TEST(MatrilineFounder, UnknownIdGivesEmpty)
{
    Colony c;
    c.animals = {female("a")};
    EXPECT_EQ(matrilineFounder(c, "nobody"), "");
}

TEST(MatrilineFounder, MotherWithoutRecordEndsTheWalk)
{
    Colony c;
    c.animals = {female("kid", "ghost")};
    EXPECT_EQ(matrilineFounder(c, "kid"), "ghost");
}

TEST(MatrilineFounder, CycleGivesEmptyInsteadOfHanging)
{
    Colony c;
    c.animals = {female("a", "b"), female("b", "c"), female("c", "a"), female("d", "a")};
    EXPECT_EQ(matrilineFounder(c, "a"), "");
    EXPECT_EQ(matrilineFounder(c, "d"), ""); // leads into the cycle
    Colony self;
    self.animals = {female("x", "x")};
    EXPECT_EQ(matrilineFounder(self, "x"), "");
}
