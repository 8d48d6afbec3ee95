// SPDX-License-Identifier: GPL-3.0-or-later
#include "core/base/derived_uid.h"
#include "core/rules/identifier_rules.h"

#include <gtest/gtest.h>

#include <set>

using namespace hierloom::core;

TEST(DerivedUid, TheHashOfNothingIsTheFnvOffsetBasisWithVersionAndVariant)
{
    // FNV-1a of the empty input is the offset basis itself: for 128 bits
    // 6c62272e 07bb0142 62b82175 6295c58d (the published FNV parameters);
    // the version nibble becomes 8 and the variant bits 10: 01 -> 81, 62 -> a2.
    EXPECT_EQ(derivedUid(""), "6c62272e-07bb-8142-a2b8-21756295c58d");
    EXPECT_EQ(derivedUid("animal\x1f" "0\x1f" "F1"), derivedUid("animal\x1f" "0\x1f" "F1"));
    EXPECT_NE(derivedUid("animal\x1f" "0\x1f" "F1"), derivedUid("animal\x1f" "1\x1f" "F1"));
    EXPECT_TRUE(isValidUid(derivedUid("x")));
}

TEST(DerivedUid, RowUidsOfOneLoadSortInRowOrder)
{
    std::string previous;
    std::set<std::string> seen;
    for (std::uint64_t row : {0ULL, 1ULL, 2ULL, 255ULL, 256ULL, 65535ULL, 65536ULL, 4194303ULL, 4194304ULL,
                              1073741823ULL, 1073741824ULL, 17179869183ULL}) {
        const std::string uid = derivedRowUid("encounter\x1f" "7", row, "same content");
        EXPECT_TRUE(isValidUid(uid)) << uid;
        EXPECT_EQ(uid[14], '8') << uid; // version 8
        EXPECT_TRUE(uid[19] == '8' || uid[19] == '9' || uid[19] == 'a' || uid[19] == 'b') << uid; // variant 10
        EXPECT_LT(previous, uid) << "row " << row;
        EXPECT_TRUE(seen.insert(uid).second);
        previous = uid;
    }
    // The same place, row and content give the same uid; another load another prefix.
    EXPECT_EQ(derivedRowUid("p", 3, "k"), derivedRowUid("p", 3, "k"));
    EXPECT_NE(derivedRowUid("p", 3, "k").substr(0, 13), derivedRowUid("q", 3, "k").substr(0, 13));
    EXPECT_NE(derivedRowUid("p", 3, "k"), derivedRowUid("p", 3, "l"));
}
