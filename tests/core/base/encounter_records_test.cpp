// SPDX-License-Identifier: GPL-3.0-or-later
// EncounterRecords against a plain vector of Encounters (the model): many
// random steps of put, remove, keepIf and merged, each followed by a field-by-field
// comparison of every record.
#include "core/base/encounter_records.h"

#include <gtest/gtest.h>

#include <algorithm>
#include <random>
#include <tuple>

namespace hierloom::core {
namespace {

auto fields(const Encounter& e)
{
    return std::tie(e.date, e.time, e.winner, e.loser, e.outcome, e.behaviour, e.group, e.observer, e.note, e.seq, e.uid,
                    e.winnerSupport, e.loserSupport);
}

void expectSame(const std::vector<Encounter>& model, const EncounterRecords& records, int step)
{
    ASSERT_EQ(records.size(), model.size()) << "step " << step;
    Day last = 0;
    for (size_t i = 0; i < model.size(); ++i) last = i == 0 ? model[i].date : std::max(last, model[i].date);
    ASSERT_EQ(records.lastDay(), last) << "step " << step;
    std::vector<size_t> subset;
    for (size_t i = 0; i < model.size(); i += 2) subset.push_back(i);
    ASSERT_EQ(records.chronologicalOrder(subset), chronologicalOrder(model, subset)) << "step " << step;
    std::vector<size_t> all(model.size());
    for (size_t i = 0; i < all.size(); ++i) all[i] = i;
    ASSERT_EQ(records.chronologicalOrder(all), chronologicalOrder(model)) << "step " << step;
    for (size_t i = 0; i < model.size(); ++i) {
        ASSERT_TRUE(fields(records.at(i)) == fields(model[i])) << "step " << step << ", record " << i;
        ASSERT_EQ(records.seq(i), model[i].seq);
        ASSERT_EQ(records.group(i), model[i].group);
    }
}

class RandomEncounters {
public:
    explicit RandomEncounters(unsigned seed) : random_(seed) {}
    Encounter make(std::int64_t seq)
    {
        static const char* groups[] = {"", "North", "South", "West"};
        static const char* uids[] = {"", "hand-made uid", "0F0E0D0C-0B0A-4908-8706-050403020100"};
        Encounter e;
        e.seq = seq;
        e.date = pick(20000) - 5000;
        if (pick(3) > 0) e.time = pick(1440);
        e.winner = "A" + std::to_string(pick(30));
        e.loser = "B" + std::to_string(pick(30));
        e.outcome = pick(5) == 0 ? Outcome::Draw : Outcome::Decided;
        e.behaviour = pick(3) == 0 ? "" : "bite" + std::to_string(pick(4));
        e.group = groups[pick(4)];
        e.observer = pick(2) == 0 ? "" : "obs" + std::to_string(pick(3));
        e.note = pick(3) == 0 ? "a note long enough to leave the small-string buffer " + std::to_string(seq) : "";
        if (pick(10) == 0) e.uid = uids[pick(3)];
        else e.uid = newUid();
        for (int k = pick(4) == 0 ? pick(3) : 0; k > 0; --k) e.winnerSupport.push_back("S" + std::to_string(pick(9)));
        for (int k = pick(5) == 0 ? pick(3) : 0; k > 0; --k) e.loserSupport.push_back("S" + std::to_string(pick(9)));
        return e;
    }
    int pick(int n) { return std::uniform_int_distribution<int>(0, n - 1)(random_); }

private:
    std::mt19937 random_;
};

void putInModel(std::vector<Encounter>& model, const Encounter& e)
{
    auto it = std::lower_bound(model.begin(), model.end(), e.seq, [](const Encounter& m, std::int64_t s) { return m.seq < s; });
    if (it != model.end() && it->seq == e.seq) *it = e;
    else model.insert(it, e);
}

TEST(EncounterRecords, RandomStepsKeepEveryFieldAsTheModel)
{
    for (unsigned seed = 1; seed <= 20; ++seed) {
        RandomEncounters random(seed);
        std::vector<Encounter> model;
        EncounterRecords records;
        std::int64_t next = 1;
        for (int step = 0; step < 300; ++step) {
            switch (random.pick(6)) {
            case 0: { // append
                const Encounter e = random.make(next += 1 + random.pick(3));
                records.append(e);
                model.push_back(e);
                break;
            }
            case 1: { // put at a seq held or not (an edit, an undone deletion)
                const Encounter e = random.make(1 + random.pick(static_cast<int>(next) + 2));
                records.put(e);
                putInModel(model, e);
                next = std::max(next, e.seq);
                break;
            }
            case 2: { // remove a seq held or not
                const std::int64_t seq = 1 + random.pick(static_cast<int>(next) + 2);
                const bool held = std::any_of(model.begin(), model.end(), [&](const Encounter& m) { return m.seq == seq; });
                EXPECT_EQ(records.remove(seq), held);
                model.erase(std::remove_if(model.begin(), model.end(), [&](const Encounter& m) { return m.seq == seq; }),
                            model.end());
                break;
            }
            case 3: { // drop a group, as a cache that forgets one does
                const std::string g = random.pick(2) == 0 ? "North" : "South";
                records.keepIf([&](const EncounterRecords& r, size_t i) { return r.group(i) != g; });
                model.erase(std::remove_if(model.begin(), model.end(), [&](const Encounter& m) { return m.group == g; }),
                            model.end());
                break;
            }
            default: { // merge a part read from the file: some rows new, some held already
                std::vector<Encounter> part;
                for (std::int64_t seq = 1 + random.pick(5); seq < next + 3; seq += 1 + random.pick(6)) {
                    auto held = std::find_if(model.begin(), model.end(), [&](const Encounter& m) { return m.seq == seq; });
                    // A row in both differs here, so the test sees which one the merge keeps.
                    part.push_back(random.make(seq));
                    if (held == model.end()) putInModel(model, part.back());
                }
                next = std::max(next, part.empty() ? next : part.back().seq);
                records = EncounterRecords::merged(records, EncounterRecords(part));
                break;
            }
            }
            expectSame(model, records, step);
            if (HasFatalFailure()) return;
        }
        for (const char* id : {"A3", "B7", "S2", "nobody"}) {
            std::vector<std::int64_t> expected, got;
            for (const Encounter& e : model)
                if (takesPart(e, id)) expected.push_back(e.seq);
            for (const Encounter& e : records.expandTakingPart(id)) got.push_back(e.seq);
            EXPECT_EQ(got, expected) << id;
        }
        const std::vector<Encounter> all = records.expand();
        ASSERT_EQ(all.size(), model.size());
        for (size_t i = 0; i < all.size(); ++i) EXPECT_TRUE(fields(all[i]) == fields(model[i]));
    }
}

TEST(EncounterRecords, TheAnalysisOrderOverAWideSpanOfDates)
{
    // Dates 2^21 days apart and more: past the packed key, the general path.
    std::vector<Encounter> rows;
    const Day days[] = {2000000, -700000, 2000000, 5, -700000, 2932000};
    const int times[] = {600, 600, 300, -1, -1, 0};
    for (size_t i = 0; i < 6; ++i) {
        Encounter e;
        e.seq = static_cast<std::int64_t>(i) + 1;
        e.date = days[i];
        if (times[i] >= 0) e.time = times[i];
        e.winner = "A";
        e.loser = "B";
        e.uid = newUid();
        rows.push_back(e);
    }
    const EncounterRecords records(rows);
    EXPECT_EQ(records.chronologicalOrder({0, 1, 2, 3, 4, 5}), (std::vector<size_t>{1, 4, 3, 2, 0, 5}));
    EXPECT_EQ(records.chronologicalOrder({0, 1, 2, 3, 4, 5}), chronologicalOrder(rows));
    EXPECT_EQ(records.chronologicalOrder({0, 2, 3}), (std::vector<size_t>{3, 2, 0}));
}

TEST(EncounterRecords, AScopeIsItsGroupAndTheRowsWithoutOne)
{
    std::vector<Encounter> rows(5);
    const char* groups[] = {"North", "", "South", "North", "West"};
    for (size_t i = 0; i < rows.size(); ++i) {
        rows[i].seq = static_cast<std::int64_t>(i) + 1;
        rows[i].winner = "A";
        rows[i].loser = "B";
        rows[i].group = groups[i];
        rows[i].uid = newUid();
    }
    const EncounterRecords records(rows);
    std::vector<std::int64_t> seqs;
    for (const Encounter& e : records.expandScope("North")) seqs.push_back(e.seq);
    EXPECT_EQ(seqs, (std::vector<std::int64_t>{1, 2, 4}));
    EXPECT_EQ(records.expandScope("Nowhere").size(), 1U); // the row without a group only
    EXPECT_EQ(records.expandScope("").size(), 5U);
}

TEST(EncounterRecords, SupportersAddedInAPassLandOnTheirRecords)
{
    std::vector<Encounter> rows(3);
    for (size_t i = 0; i < rows.size(); ++i) {
        rows[i].seq = static_cast<std::int64_t>(i) * 10;
        rows[i].winner = "A";
        rows[i].loser = "B";
        rows[i].uid = newUid();
    }
    EncounterRecords records(rows);
    records.appendSupporter(0, "C", SupportSide::Winner);
    records.appendSupporter(2, "D", SupportSide::Loser);
    records.appendSupporter(2, "E", SupportSide::Winner);
    EXPECT_THROW(records.appendSupporter(1, "F", SupportSide::Winner), std::invalid_argument);
    EXPECT_EQ(records.at(0).winnerSupport, std::vector<std::string>{"C"});
    EXPECT_TRUE(records.at(1).winnerSupport.empty());
    EXPECT_EQ(records.at(2).loserSupport, std::vector<std::string>{"D"});
    EXPECT_EQ(records.at(2).winnerSupport, std::vector<std::string>{"E"});
}

TEST(EncounterRecords, HoldsAnEncounterInAboutFiftyBytes)
{
    RandomEncounters random(7);
    EncounterRecords records;
    records.reserve(100000); // as a load of a known count does
    for (std::int64_t seq = 1; seq <= 100000; ++seq) {
        Encounter e = random.make(seq);
        e.note.clear();
        e.uid = newUid();
        e.winnerSupport.clear();
        e.loserSupport.clear();
        records.append(e);
    }
    // 32 bytes of record and 16 of uid each (compact_encounters.h); the code
    // tables of 30 + 30 animals are small.
    EXPECT_LE(records.bytesHeld() / records.size(), 56U);
    EXPECT_GE(records.bytesHeld() / records.size(), 48U);
}

} // namespace
} // namespace hierloom::core
