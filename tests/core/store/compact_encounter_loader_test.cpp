// SPDX-License-Identifier: GPL-3.0-or-later
// The compact loader (core/store/compact_encounter_loader.h) against the
// record loader it stands beside, ColonyStore::loadEncounters(scope): the same
// rows for every scope, and the same rank tables, bit for bit, when the rank
// engines run on either (model-based: random colony files and random scopes).
#include "core/ranks/compact_selection.h"
#include "core/ranks/rank_table.h"
#include "core/store/compact_encounter_loader.h"
#include "core/store/colony_store.h"
#include "import_test_support.h"
#include "random_colony.h"

#include <gtest/gtest.h>

#include <bit>
#include <random>
#include <sstream>

using namespace hierloom::core;
using hierloom::test::TempDir;

namespace {

std::string writeColony(const TempDir& dir, const std::string& name, Colony colony)
{
    const std::string path = dir.file(name);
    ColonyStore store = ColonyStore::create(path);
    for (Encounter& e : colony.encounters) e.seq = 0; // the store numbers them
    store.append(colony.animals, colony.residences, colony.encounters);
    return path;
}

/// An encounter as the rank engines see it: everything but uid and note.
std::string fields(const Encounter& e)
{
    std::ostringstream s;
    s << e.seq << ' ' << e.date << ' ' << (e.time ? *e.time : -1) << ' ' << e.winner << ' ' << e.loser << ' '
      << toString(e.outcome) << " b=" << e.behaviour << " g=" << e.group << " o=" << e.observer << " ws=";
    for (const std::string& id : e.winnerSupport) s << id << ',';
    s << " ls=";
    for (const std::string& id : e.loserSupport) s << id << ',';
    return s.str();
}

std::string text(const RankTable& t)
{
    auto bits = [](const std::optional<double>& x) { return x ? std::bit_cast<std::uint64_t>(*x) : 0; };
    std::ostringstream s;
    s << bits(t.kUsed) << ' ' << bits(t.logLikelihood) << ' ' << (t.rankedOn ? *t.rankedOn : -1) << '\n';
    for (const RankRow& r : t.rows)
        s << r.animal << ' ' << r.rank << ' ' << bits(r.score) << ' ' << bits(r.low) << ' ' << bits(r.high) << '\n';
    return s.str();
}

} // namespace

TEST(CompactEncounterLoader, ReadsTheRowsOfEveryScopeAndRanksIdenticallyToTheRecordLoader)
{
    std::mt19937_64 rng(1712);
    auto below = [&](int n) { return static_cast<int>(rng() % static_cast<std::uint64_t>(n)); };
    TempDir dir;
    for (int file = 0; file < 8; ++file) {
        hierloom::test::RandomColonyShape shape;
        shape.animals = 3 + below(15);
        shape.groups = 1 + below(3);
        shape.encounters = 1 + below(300);
        shape.days = 1 + below(60);
        const std::string path = writeColony(dir, "f" + std::to_string(file) + ".hierloom",
                                             hierloom::test::randomColony(rng(), shape));
        const ColonyStore store = ColonyStore::open(path, ColonyStore::Mode::ReadOnly);
        Colony colony;
        colony.animals = store.loadAnimals();
        colony.residences = store.loadResidences();
        colony.reindex();
        const ResidenceIndex where(colony.animals, colony.residences);
        for (int round = 0; round < 12; ++round) {
            EncounterScope scope;
            if (round > 0 && below(3) != 0) scope.group = below(5) == 0 ? "G9" : "G" + std::to_string(1 + below(shape.groups));
            if (below(3) == 0) scope.from = 18000 + below(60);
            if (below(3) == 0) scope.to = 18000 + below(60);
            scope.uids = false;
            const std::string label = "file " + std::to_string(file) + " round " + std::to_string(round) + " group '" +
                                      scope.group + "'";
            colony.encounters = store.loadEncounters(scope);
            const CompactEncounters compact = loadCompactEncounters(store, scope);
            ASSERT_EQ(compact.size(), colony.encounters.size()) << label;
            for (size_t i = 0; i < compact.size(); ++i) {
                Encounter e = colony.encounters[i];
                e.note.clear();
                EXPECT_EQ(fields(compact.expand(i)), fields(e)) << label;
            }
            // The desktop's full records: every field, uid and note included.
            {
                EncounterScope withUids = scope;
                withUids.uids = true;
                const std::vector<Encounter> expected = store.loadEncounters(withUids);
                const EncounterRecords records = loadEncounterRecords(store, scope);
                ASSERT_EQ(records.size(), expected.size()) << label;
                for (size_t i = 0; i < records.size(); ++i) {
                    const Encounter e = records.at(i);
                    EXPECT_EQ(fields(e), fields(expected[i])) << label;
                    EXPECT_EQ(e.uid, expected[i].uid) << label;
                    EXPECT_EQ(e.note, expected[i].note) << label;
                }
            }
            // What the command line does with a scope: select the same group and window.
            SelectionOptions sel;
            sel.group = scope.group;
            sel.from = scope.from;
            sel.to = scope.to;
            sel.draws = below(2) == 0 ? DrawPolicy::Half : DrawPolicy::Ignore;
            for (RankMethod method : {RankMethod::Elo, RankMethod::DavidsScore, RankMethod::Isi}) {
                RankOptions r;
                r.method = method;
                r.threads = 1;
                EXPECT_EQ(text(computeRanks(colony, where, sel, r)),
                          text(computeRanks(selectEncounters(compact, colony.animals, where, sel), colony, where, sel, r)))
                    << label << " method " << static_cast<int>(method);
            }
        }
    }
}

TEST(CompactEncounterLoader, FilesWithoutTheSupportTableAndDamagedDates)
{
    TempDir dir;
    const std::string path = writeColony(dir, "c.hierloom", hierloom::test::randomColony(5));
    {
        const ColonyStore store = ColonyStore::open(path, ColonyStore::Mode::ReadOnly);
        EXPECT_FALSE(loadCompactEncounters(store, {}).supporters.empty()); // the generator gives about one in nine
    }
    {
        // Schema versions 1 and 2 had no encounter_support table: no supporters, the same rows.
        ColonyStore store = ColonyStore::open(path);
        store.exec("DROP TABLE encounter_support");
        const CompactEncounters compact = loadCompactEncounters(store, {});
        EXPECT_TRUE(compact.supporters.empty());
        EXPECT_EQ(compact.size(), 300U);
        // A day number past 9999-12-31 (written with the CHECKs off) or a
        // code the term table lacks (foreign keys off): refused as the record
        // loader refuses them.
        store.exec("PRAGMA ignore_check_constraints = ON");
        store.exec("UPDATE encounter_row SET day = 2932897 WHERE seq = 7");
        store.exec("PRAGMA ignore_check_constraints = OFF");
        for (int loader = 0; loader < 2; ++loader)
            try {
                if (loader == 0) loadCompactEncounters(store, {});
                else store.loadEncounters();
                ADD_FAILURE() << "an impossible day was read";
            } catch (const ColonyFileError& e) {
                EXPECT_EQ(e.kind(), ColonyFileError::Kind::Damaged);
                EXPECT_EQ(std::string(e.what()), path + ": holds an impossible day number 2932897");
            }
        store.exec("UPDATE encounter_row SET day = 18000 WHERE seq = 7");
        EXPECT_EQ(loadCompactEncounters(store, {}).size(), 300U);
        store.exec("PRAGMA foreign_keys = OFF");
        store.exec("UPDATE encounter_row SET behaviour = 999 WHERE seq = 7");
        store.exec("PRAGMA foreign_keys = ON");
        for (int loader = 0; loader < 2; ++loader)
            try {
                if (loader == 0) loadCompactEncounters(store, {});
                else store.loadEncounters();
                ADD_FAILURE() << "an unknown code was read";
            } catch (const ColonyFileError& e) {
                EXPECT_EQ(e.kind(), ColonyFileError::Kind::Damaged);
                EXPECT_EQ(std::string(e.what()), path + ": an encounter names the code 999, which the file lacks");
            }
    }
}
