// SPDX-License-Identifier: GPL-3.0-or-later
// The import derives each encounter's uid as 16 bytes; these must be the
// bytes of the text uid that earlier versions derived for the same row, so
// that importing the same file into two copies of a colony (one by an older
// program) still gives the same records the same uids.
#include "core/base/derived_uid.h"
#include "core/store/colony_import.h"
#include "core/store/uid_storage.h"

#include <gtest/gtest.h>

#include <array>
#include <random>

using namespace hierloom::core;

namespace {

// The text derivation as it was before the bytes were derived directly
// (derived_uid.cpp and colony_import.cpp, 2026-12-03), kept here as the reference.
__extension__ typedef unsigned __int128 U128;

std::array<unsigned char, 16> referenceFnv(std::string_view key)
{
    U128 h = (static_cast<U128>(0x6c62272e07bb0142ULL) << 64) | 0x62b821756295c58dULL;
    const U128 prime = (static_cast<U128>(1) << 88) | 0x13b;
    for (unsigned char c : key) {
        h ^= c;
        h *= prime;
    }
    std::array<unsigned char, 16> b{};
    for (int i = 15; i >= 0; --i) {
        b[static_cast<size_t>(i)] = static_cast<unsigned char>(h & 0xff);
        h >>= 8;
    }
    return b;
}

std::string referenceRowUid(std::string_view place, std::uint64_t row, std::string_view key)
{
    const auto p = referenceFnv(place);
    const auto k = referenceFnv(key);
    std::array<unsigned char, 16> b{};
    for (size_t i = 0; i < 6; ++i) b[i] = p[i];
    b[6] = static_cast<unsigned char>((row >> 30) & 0x0f);
    b[7] = static_cast<unsigned char>((row >> 22) & 0xff);
    b[8] = static_cast<unsigned char>((row >> 16) & 0x3f);
    b[9] = static_cast<unsigned char>((row >> 8) & 0xff);
    b[10] = static_cast<unsigned char>(row & 0xff);
    for (size_t i = 11; i < 16; ++i) b[i] = k[i];
    b[6] = static_cast<unsigned char>((b[6] & 0x0f) | 0x80);
    b[8] = static_cast<unsigned char>((b[8] & 0x3f) | 0x80);
    static const char* hex = "0123456789abcdef";
    std::string out;
    for (size_t i = 0; i < 16; ++i) {
        if (i == 4 || i == 6 || i == 8 || i == 10) out += '-';
        out += hex[b[i] >> 4];
        out += hex[b[i] & 0x0f];
    }
    return out;
}

std::string referenceEncounterUid(const Encounter& e, std::int64_t epoch, std::size_t row)
{
    std::string key;
    for (const std::string& f : {formatDate(e.date), e.time ? formatTimeOfDay(*e.time) : std::string(), e.winner,
                                 e.loser, std::string(toString(e.outcome)), e.behaviour, e.group, e.observer, e.note})
        key += f + '\x1f';
    return referenceRowUid("encounter\x1f" + std::to_string(epoch), row, key);
}

/// A text of 0-40 characters from a mix of ASCII, separators and UTF-8.
std::string randomText(std::mt19937_64& rng)
{
    static const std::vector<std::string> pieces = {"a", "G01", "A0", "7", " ", ",", "\"", "\t", "\x1f", "é", "猿", "-", "_", "."};
    std::string s;
    for (int n = static_cast<int>(rng() % 12); n > 0; --n) s += pieces[rng() % pieces.size()];
    return s;
}

Encounter randomEncounter(std::mt19937_64& rng)
{
    Encounter e;
    e.date = static_cast<Day>(static_cast<std::int64_t>(rng() % 3000000) - 719528); // years 0000-8000
    if (rng() % 3) e.time = static_cast<int>(rng() % 1440);
    e.winner = randomText(rng);
    e.loser = randomText(rng);
    e.outcome = rng() % 4 ? Outcome::Decided : Outcome::Draw;
    e.behaviour = rng() % 2 ? randomText(rng) : std::string();
    e.group = randomText(rng);
    e.observer = rng() % 2 ? randomText(rng) : std::string();
    e.note = rng() % 3 ? std::string() : randomText(rng);
    return e;
}

} // namespace

TEST(EncounterUidBytes, AreTheBytesOfTheTextUidEarlierVersionsDerived)
{
    std::mt19937_64 rng(17);
    const std::vector<std::int64_t> epochs = {0, 1, 9, 10, 12345, 9007199254740993LL};
    for (int i = 0; i < 200000; ++i) {
        const Encounter e = randomEncounter(rng);
        const std::int64_t epoch = epochs[static_cast<size_t>(i) % epochs.size()];
        // Small rows, rows around the byte boundaries of the row field, and the largest rows it holds.
        const std::size_t row = i % 4 == 0 ? static_cast<std::size_t>(i)
                                : i % 4 == 1 ? static_cast<std::size_t>(rng() % (1ULL << 34))
                                : i % 4 == 2 ? static_cast<std::size_t>((1ULL << (rng() % 35)) - rng() % 2)
                                             : static_cast<std::size_t>(rng() % 3000000);
        const std::string reference = referenceEncounterUid(e, epoch, row);
        ASSERT_EQ(encounterUid(e, epoch, row), reference) << "row " << row;
    }
}
