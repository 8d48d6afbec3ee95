// SPDX-License-Identifier: GPL-3.0-or-later
// moreLinesThan decides whether an import is a bulk load without reading
// more of a large file than it needs; it must answer as counting every line would.
#include "core/base/csv_reader.h"

#include <gtest/gtest.h>

#include <algorithm>

using namespace hierloom::core;

TEST(MoreLinesThan, AnswersAsCountingEveryLineWould)
{
    for (const std::string text : {"", "a", "a\n", "\n", "\n\n", "a\nb", "a\nb\n", "a\r\nb\r\nc", "x,y\n1,2\n3,4\n\n"}) {
        const auto lines = static_cast<std::size_t>(std::count(text.begin(), text.end(), '\n')) + 1;
        for (std::size_t n = 0; n < 8; ++n) EXPECT_EQ(moreLinesThan(text, n), lines > n) << '"' << text << "\" " << n;
    }
}
