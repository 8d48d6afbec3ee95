// SPDX-License-Identifier: GPL-3.0-or-later
// The whole-text checks before an import reads its rows: moreLinesThan
// (is it a bulk load? without reading more of a large file than it needs)
// and isValidUtf8 (eight ASCII bytes at a time); each must answer as the
// plain byte-by-byte count or check would.
#include "core/base/csv_reader.h"

#include <gtest/gtest.h>

#include <algorithm>
#include <string_view>
#include <vector>

using namespace hierloom::core;

TEST(MoreLinesThan, AnswersAsCountingEveryLineWould)
{
    for (const std::string text : {"", "a", "a\n", "\n", "\n\n", "a\nb", "a\nb\n", "a\r\nb\r\nc", "x,y\n1,2\n3,4\n\n"}) {
        const auto lines = static_cast<std::size_t>(std::count(text.begin(), text.end(), '\n')) + 1;
        for (std::size_t n = 0; n < 8; ++n) EXPECT_EQ(moreLinesThan(text, n), lines > n) << '"' << text << "\" " << n;
    }
}

namespace {

/// isValidUtf8 as it was, one byte at a time: the reference for the faster one.
bool referenceUtf8(std::string_view s)
{
    const auto* p = reinterpret_cast<const unsigned char*>(s.data());
    size_t i = 0;
    while (i < s.size()) {
        const unsigned char c = p[i];
        if (c < 0x80) {
            ++i;
            continue;
        }
        size_t len;
        unsigned cp;
        if ((c & 0xE0) == 0xC0) { len = 2; cp = c & 0x1F; }
        else if ((c & 0xF0) == 0xE0) { len = 3; cp = c & 0x0F; }
        else if ((c & 0xF8) == 0xF0) { len = 4; cp = c & 0x07; }
        else return false;
        if (i + len > s.size()) return false;
        for (size_t k = 1; k < len; ++k) {
            if ((p[i + k] & 0xC0) != 0x80) return false;
            cp = (cp << 6) | (p[i + k] & 0x3F);
        }
        if ((len == 2 && cp < 0x80) || (len == 3 && cp < 0x800) || (len == 4 && cp < 0x10000)) return false;
        if (cp > 0x10FFFF || (cp >= 0xD800 && cp <= 0xDFFF)) return false;
        i += len;
    }
    return true;
}

} // namespace

TEST(Utf8Check, AgreesWithTheByteByByteCheckWhereverTheBadByteFalls)
{
    // ASCII runs of every length around the 8-byte steps, with a good or bad
    // sequence (or a cut one) at every place.
    const std::vector<std::string> inserts = {"", "é", "猿", "😀", "\x80", "\xC3", "\xC0\xAF", "\xED\xA0\x80",
                                              "\xF4\x90\x80\x80", "\xE2\x82", "\xFF"};
    for (size_t before = 0; before < 20; ++before)
        for (size_t after = 0; after < 12; ++after)
            for (const std::string& middle : inserts) {
                const std::string text = std::string(before, 'a') + middle + std::string(after, 'b');
                EXPECT_EQ(isValidUtf8(text), referenceUtf8(text)) << before << " " << after;
                EXPECT_EQ(isValidUtf8(text.substr(0, before + middle.size() / 2)),
                          referenceUtf8(text.substr(0, before + middle.size() / 2)));
            }
}
