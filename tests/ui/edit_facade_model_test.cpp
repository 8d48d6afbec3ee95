// SPDX-License-Identifier: GPL-3.0-or-later
// Model-based test of the desktop's write path: a seeded random run of
// encounter additions, edits and deletions, undo, redo and settings changes,
// all through the edit facade. A plain model (a list of states with an undo
// position) says what the file should hold after each step; after every step
// the file read by a fresh connection, the document's cache and the encounter
// table's rows must all agree with it. Drift between the cache, the table's
// incremental updates and the file shows up at the step that caused it.
#include "ui/document/colony_document.h"
#include "ui/document/colony_edit_facade.h"
#include "ui/document/qt_convert.h"
#include "ui/document/record_equality.h"
#include "ui/records/encounter_table_model.h"

#include "tests/ui/facade_test_support.h"

#include <QUndoStack>

#include <gtest/gtest.h>

#include <algorithm>
#include <random>

using namespace hierloom;
using hierloom::test::TempDir;

namespace {

/// What the file should hold after a step.
struct State {
    std::vector<core::Encounter> encounters; // seq order, as the file gives them
    std::vector<std::string> observers;
    core::SettingValues thresholds;
};

/// The model: every state the undo history can reach and where it stands.
struct Model {
    std::vector<State> history;
    size_t at = 0;

    const State& now() const { return history[at]; }
    /// A new command: the redo tail is dropped, as QUndoStack does.
    void push(State s)
    {
        history.resize(at + 1);
        history.push_back(std::move(s));
        ++at;
    }
};

/// Writing an encounter puts its observer on the observer list (sorted by name).
void addObserver(State& s, const std::string& name)
{
    const auto at = std::lower_bound(s.observers.begin(), s.observers.end(), name);
    if (!name.empty() && (at == s.observers.end() || *at != name)) s.observers.insert(at, name);
}

State readFile(const std::string& path)
{
    const core::ColonyStore store = core::ColonyStore::open(path, core::ColonyStore::Mode::ReadOnly);
    return {store.loadEncounters(), store.observers(),
            core::readSettingValues(store, core::stabilityThresholdValues({}))};
}

const std::vector<std::vector<std::string>> kGroups = {{"F1", "F2", "D1", "D2"}, {"M1", "G1"}};
const std::vector<std::string> kObservers = {"GW", "HK", "JL"};

class RandomRun {
public:
    explicit RandomRun(unsigned seed) : random_(seed)
    {
        document_.open(ui::toQString(path_));
        facade_.setToday(core::dayFromCivil(2024, 12, 31));
        model_.history.push_back(readFile(path_));
    }

    void step(int n)
    {
        const int pick = uniform(0, 99);
        if (pick < 35) add();
        else if (pick < 50) edit();
        else if (pick < 60) remove();
        else if (pick < 75) undo();
        else if (pick < 85) redo();
        else if (pick < 93) thresholds();
        else observers();
        check(n);
    }

    int commands() const { return document_.undoStack()->count(); }
    size_t encounters() const { return model_.now().encounters.size(); }

private:
    int uniform(int lo, int hi) { return std::uniform_int_distribution<int>(lo, hi)(random_); }

    core::Encounter randomEncounter()
    {
        const auto& group = kGroups[static_cast<size_t>(uniform(0, 9) < 7 ? 0 : 1)];
        core::Encounter e;
        // D2, the youngest, lives from 2017-06-04; every date after that has everyone present.
        e.date = core::dayFromCivil(2018, 1, 1) + uniform(0, 2500);
        if (uniform(0, 1)) e.time = uniform(0, 1439);
        const size_t w = static_cast<size_t>(uniform(0, static_cast<int>(group.size()) - 1));
        size_t l = static_cast<size_t>(uniform(0, static_cast<int>(group.size()) - 2));
        if (l >= w) ++l;
        e.winner = group[w];
        e.loser = group[l];
        e.outcome = uniform(0, 9) == 0 ? core::Outcome::Draw : core::Outcome::Decided;
        e.observer = kObservers[static_cast<size_t>(uniform(0, 2))];
        return e;
    }

    void add()
    {
        core::Encounter e = randomEncounter();
        const core::FieldProblems p = facade_.addEncounter(e);
        ASSERT_TRUE(p.empty()) << p.front().message;
        State s = model_.now();
        s.encounters.push_back(e); // with the seq and uid it was given
        addObserver(s, e.observer);
        model_.push(std::move(s));
    }

    void edit()
    {
        const auto& cache = document_.colony().encounters;
        if (cache.empty()) return;
        core::Encounter e = cache[static_cast<size_t>(uniform(0, static_cast<int>(cache.size()) - 1))];
        switch (uniform(0, 4)) {
        case 0: std::swap(e.winner, e.loser); break;
        case 1: e.note = "note " + std::to_string(uniform(0, 3)); break;
        case 2: e.time = uniform(0, 3) == 0 ? std::nullopt : std::optional<int>(uniform(0, 1439)); break;
        case 3: e.outcome = e.outcome == core::Outcome::Draw ? core::Outcome::Decided : core::Outcome::Draw; break;
        default: break; // unchanged: a no-op the facade must drop
        }
        const core::FieldProblems p = facade_.editEncounter(e);
        ASSERT_TRUE(p.empty()) << p.front().message;
        State s = model_.now();
        auto it = std::find_if(s.encounters.begin(), s.encounters.end(), [&](const auto& x) { return x.uid == e.uid; });
        ASSERT_NE(it, s.encounters.end());
        if (ui::sameRecord(*it, e)) return; // nothing changed, nothing pushed
        *it = e;
        addObserver(s, e.observer);
        model_.push(std::move(s));
    }

    void remove()
    {
        const auto& cache = document_.colony().encounters;
        if (cache.empty()) return;
        std::vector<core::Encounter> rows;
        const int n = std::min(uniform(1, 3), static_cast<int>(cache.size()));
        std::vector<size_t> picks(cache.size());
        for (size_t i = 0; i < picks.size(); ++i) picks[i] = i;
        std::shuffle(picks.begin(), picks.end(), random_);
        for (int i = 0; i < n; ++i) rows.push_back(cache[picks[static_cast<size_t>(i)]]);
        const core::FieldProblems p = facade_.deleteEncounters(rows);
        ASSERT_TRUE(p.empty()) << p.front().message;
        State s = model_.now();
        std::erase_if(s.encounters, [&](const core::Encounter& x) {
            return std::any_of(rows.begin(), rows.end(), [&](const auto& r) { return r.uid == x.uid; });
        });
        model_.push(std::move(s));
    }

    void undo()
    {
        ASSERT_EQ(document_.undoStack()->canUndo(), model_.at > 0);
        if (model_.at == 0) return;
        document_.undoStack()->undo();
        --model_.at;
    }

    void redo()
    {
        ASSERT_EQ(document_.undoStack()->canRedo(), model_.at + 1 < model_.history.size());
        if (model_.at + 1 >= model_.history.size()) return;
        document_.undoStack()->redo();
        ++model_.at;
    }

    void thresholds()
    {
        core::StabilityThresholds t;
        t.counterShare = 0.05 * uniform(1, 4); // few values, so repeats (no-ops) happen
        t.minDecided = uniform(10, 12);
        const core::FieldProblems p = facade_.setStabilityThresholds(t);
        ASSERT_TRUE(p.empty()) << p.front().message;
        const core::SettingValues values = core::stabilityThresholdValues(t);
        // An absent key reads as its default, so storing what is in effect is no change.
        core::SettingValues inEffect = model_.now().thresholds;
        for (auto& [key, value] : inEffect)
            if (!value) value = core::stabilityThresholdValues(core::StabilityThresholds{}).at(key);
        if (inEffect == values) return;
        State s = model_.now();
        s.thresholds = values;
        model_.push(std::move(s));
    }

    void observers()
    {
        std::vector<std::string> names;
        for (const std::string& o : kObservers)
            if (uniform(0, 1)) names.push_back(o);
        if (names.empty()) names.push_back(kObservers.front());
        const core::FieldProblems p = facade_.setObservers(names);
        ASSERT_TRUE(p.empty()) << p.front().message;
        if (model_.now().observers == names) return;
        State s = model_.now();
        s.observers = names;
        model_.push(std::move(s));
    }

    void check(int n)
    {
        SCOPED_TRACE("after step " + std::to_string(n));
        const State file = readFile(path_);
        ASSERT_TRUE(ui::sameRecords(file.encounters, model_.now().encounters))
            << "the file's encounters are not what the steps should have made (" << file.encounters.size() << " vs "
            << model_.now().encounters.size() << ")";
        ASSERT_EQ(file.observers, model_.now().observers);
        ASSERT_EQ(file.thresholds, model_.now().thresholds);
        ASSERT_EQ(document_.undoStack()->count(), static_cast<int>(model_.history.size()) - 1);
        ASSERT_EQ(document_.undoStack()->index(), static_cast<int>(model_.at));
        ASSERT_TRUE(ui::sameRecords(document_.colony().encounters, file.encounters)) << "the document's cache drifted";

        // The table: every encounter, newest first, each cell from the file's record.
        std::vector<size_t> order = core::chronologicalOrder(file.encounters);
        std::reverse(order.begin(), order.end());
        ASSERT_EQ(table_.rowCount(), static_cast<int>(order.size()));
        for (int row = 0; row < table_.rowCount(); ++row) {
            const core::Encounter& expected = file.encounters[order[static_cast<size_t>(row)]];
            ASSERT_TRUE(ui::sameRecord(table_.encounterAt(row), expected)) << "table row " << row;
            ASSERT_EQ(table_.index(row, ui::EncounterTableModel::Winner).data().toString(), ui::toQString(expected.winner));
            ASSERT_EQ(table_.index(row, ui::EncounterTableModel::Loser).data().toString(), ui::toQString(expected.loser));
        }
        QStringList names;
        for (const core::Encounter& e : file.encounters) names << ui::toQString(e.observer);
        names.sort();
        names.removeDuplicates();
        ASSERT_EQ(table_.observers(), names);
    }

    std::mt19937 random_;
    TempDir dir_;
    std::string path_ = test::makeFacadeColony(dir_);
    ui::ColonyDocument document_;
    ui::ColonyEditFacade facade_{&document_};
    ui::EncounterTableModel table_{&document_};
    Model model_;
};

} // namespace

TEST(EditFacadeModel, ThousandRandomStepsKeepFileCacheAndTableInStep)
{
    RandomRun run(20261202u);
    for (int n = 1; n <= 1200; ++n) {
        run.step(n);
        if (::testing::Test::HasFatalFailure()) return;
    }
    // The run did build up history and records (not a string of no-ops).
    EXPECT_GT(run.commands(), 50);
    EXPECT_GT(run.encounters(), 20u);
}
