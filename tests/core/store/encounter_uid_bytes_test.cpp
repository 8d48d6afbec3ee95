// SPDX-License-Identifier: GPL-3.0-or-later
// The import derives each encounter's uid as 16 bytes; these must be the
// bytes of the text uid that earlier versions derived for the same row, so
// that importing the same file into two copies of a colony (one by an older
// program) still gives the same records the same uids.
#include "core/base/derived_uid.h"
#include "core/store/colony_import.h"
#include "core/store/colony_store.h"
#include "core/store/uid_storage.h"
#include "import_test_support.h"

#include <gtest/gtest.h>

#include <array>
#include <cstdio>
#include <random>

using namespace hierloom::core;
using hierloom::test::TempDir;

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
    std::string time;
    if (e.time) {
        char buf[32];
        std::snprintf(buf, sizeof buf, "%02d:%02d", *e.time / 60, *e.time % 60);
        time = buf;
    }
    std::string key;
    for (const std::string& f : {formatDate(e.date), time, e.winner,
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
        const UidBytes bytes = encounterUidBytes(e, encounterUidPlace(epoch), row);
        ASSERT_EQ(compactUid(reference), bytes) << reference << " row " << row;
        ASSERT_EQ(uuidTextOf(bytes.data()), reference);
        ASSERT_EQ(encounterUid(e, epoch, row), reference);
    }
}

TEST(EncounterUidBytes, RowUidsAgreeWithTheReferenceText)
{
    std::mt19937_64 rng(5);
    for (int i = 0; i < 20000; ++i) {
        const std::string place = randomText(rng), key = randomText(rng);
        const std::uint64_t row = rng() % (1ULL << 34);
        const std::string reference = referenceRowUid(place, row, key);
        EXPECT_EQ(derivedRowUid(place, row, key), reference);
        EXPECT_EQ(derivedRowUidBytes(KeyHash().add(place).bytes(), row, KeyHash().add(key).bytes()),
                  compactUid(reference));
    }
    // Hashing in pieces is hashing the joined text.
    EXPECT_EQ(KeyHash().add("enc").add('o').add("").add("unter").bytes(), KeyHash().add("encounter").bytes());
    EXPECT_EQ(uuidTextOf(KeyHash().bytes().data()), "6c62272e-07bb-0142-62b8-21756295c58d"); // the FNV offset basis
}

TEST(EncounterUidBytes, AnImportWritesTheUidsOfThePlannedImport)
{
    // The bulk path (bytes, written by the appender) and the plan (text,
    // deriveUids) give the rows of the same file the same uids.
    TempDir dir;
    ColonyStore store = ColonyStore::create(dir.file("c.hierloom"));
    ImportInput input;
    input.animals = ImportSource{"animals.csv", "id,sex,entry_date\nA,F,2020-01-01\nB,M,2020-01-01\nC,F,2020-01-01\n"};
    ASSERT_TRUE(importInput(store, input, *parseDate("2024-01-01")).ok());
    std::string csv = "date,time,winner,loser,outcome,behaviour,observer,note\n";
    std::mt19937_64 rng(3);
    for (int i = 0; i < 500; ++i) {
        const char* ids[] = {"A", "B", "C"};
        const int w = static_cast<int>(rng() % 3);
        const int l = (w + 1 + static_cast<int>(rng() % 2)) % 3;
        csv += formatDate(*parseDate("2021-01-01") + static_cast<Day>(rng() % 700)) + "," +
               (rng() % 2 ? formatTimeOfDay(static_cast<int>(rng() % 1440)) : std::string()) + "," + ids[w] + "," +
               ids[l] + "," + (rng() % 5 ? "decided" : "draw") + "," + (rng() % 2 ? "bite" : "") + "," +
               (rng() % 2 ? "ann" : "ben") + "," + (rng() % 7 ? "" : "\"a, note\"") + "\n";
    }
    ImportInput encounters;
    encounters.encounters = ImportSource{"encounters.csv", csv};
    const std::int64_t epoch = importEpoch(store);
    ImportPlan plan = planImport(store.loadAnimals(), store.loadResidences(), encounters, *parseDate("2024-01-01"));
    ASSERT_TRUE(plan.ok()) << plan.problems.text();
    deriveUids(plan, epoch);
    ASSERT_TRUE(importInput(store, encounters, *parseDate("2024-01-01")).ok());
    const Colony colony = store.load();
    ASSERT_EQ(colony.encounters.size(), plan.encounters.size());
    for (std::size_t i = 0; i < plan.encounters.size(); ++i) {
        EXPECT_EQ(colony.encounters[i].uid, plan.encounters[i].uid) << i;
        EXPECT_EQ(colony.encounters[i].uid, referenceEncounterUid(plan.encounters[i], epoch, i)) << i;
    }
}
