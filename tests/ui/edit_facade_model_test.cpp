// SPDX-License-Identifier: GPL-3.0-or-later
// Model-based test of the desktop's write path: a seeded random run of
// encounter additions, edits and deletions, undo, redo, taking back a whole
// session and settings changes, all through the edit facade, interleaved with
// writes by another program (a second connection, as the command line is).
// A plain model (a list of states with an undo position, plus the file's state
// when another program changed it) says what the file should hold after each
// step; after every step the file read by a fresh connection, the document's
// cache and the encounter table's rows must all agree with it. Drift between
// the cache, the table's incremental updates and the file shows up at the
// step that caused it. When another program wrote, the desktop's next write,
// undo or redo (or the window's activation) must first read the file again
// and empty its history: the model then starts a new history from the file.
#include "ui/document/colony_document.h"
#include "ui/document/colony_edit_facade.h"
#include "ui/document/qt_convert.h"
#include "ui/document/record_equality.h"
#include "ui/records/animal_table_model.h"
#include "ui/records/encounter_table_model.h"

#include "core/store/colony_edits.h"

#include "tests/ui/facade_test_support.h"

#include <QUndoStack>

#include <gtest/gtest.h>

#include <algorithm>
#include <cstdio>
#include <optional>
#include <random>
#include <set>

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
        facade_.setToday(today_);
        model_.history.push_back(readFile(path_));
    }

    void step(int n)
    {
        const int pick = uniform(0, 99);
        kinds_.push_back(pick < 30 ? 'a' : pick < 42 ? 'e' : pick < 50 ? 'd' : pick < 63 ? 'u' : pick < 72 ? 'r'
                         : pick < 79 ? 't' : pick < 84 ? 'o' : pick < 90 ? 's' : 'x');
        if (pick < 30) add();
        else if (pick < 42) edit();
        else if (pick < 50) remove();
        else if (pick < 63) undo();
        else if (pick < 72) redo();
        else if (pick < 79) thresholds();
        else if (pick < 84) observers();
        else if (pick < 90) undoSession();
        else outsideWrite();
        check(n);
    }

    int mostCommands() const { return mostCommands_; }
    size_t mostEncounters() const { return mostEncounters_; }
    int outsideWrites() const { return outsideWrites_; }
    int sessionsTakenBack() const { return sessionsTakenBack_; }
    int refusedOnTop() const { return refusedOnTop_; }

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

    /// The desktop read the file again (its next write, undo, redo or the
    /// window's activation): its history starts anew from what the file holds.
    void caughtUp()
    {
        if (!outside_) return;
        model_.history = {*outside_};
        model_.at = 0;
        outside_.reset();
    }

    void add()
    {
        core::Encounter e = randomEncounter();
        const core::FieldProblems p = facade_.addEncounter(e);
        caughtUp();
        ASSERT_TRUE(p.empty()) << p.front().message;
        State s = model_.now();
        s.encounters.push_back(e); // with the seq and uid it was given
        addObserver(s, e.observer);
        session_.insert(e.uid);
        model_.push(std::move(s));
    }

    void edit()
    {
        const std::vector<core::Encounter> cache = document_.encounters().expand();
        if (cache.empty()) return;
        core::Encounter e = cache[static_cast<size_t>(uniform(0, static_cast<int>(cache.size()) - 1))];
        switch (uniform(0, 4)) {
        case 0: std::swap(e.winner, e.loser); break;
        case 1: e.note = "note " + std::to_string(uniform(0, 3)); break;
        case 2: e.time = uniform(0, 3) == 0 ? std::nullopt : std::optional<int>(uniform(0, 1439)); break;
        case 3: e.outcome = e.outcome == core::Outcome::Draw ? core::Outcome::Decided : core::Outcome::Draw; break;
        default: break; // unchanged: a no-op the facade must drop
        }
        // Picked from the cache, which lags when another program wrote: the
        // facade reads the file first and changes the row as it is now, or
        // refuses when the row is gone.
        const core::FieldProblems p = facade_.editEncounter(e);
        caughtUp();
        State s = model_.now();
        auto it = std::find_if(s.encounters.begin(), s.encounters.end(), [&](const auto& x) { return x.uid == e.uid; });
        if (it == s.encounters.end()) {
            ASSERT_FALSE(p.empty()) << "an edit of a row another program deleted was written";
            ASSERT_NE(p.front().message.find("no longer in the file"), std::string::npos) << p.front().message;
            ++refusedOnTop_;
            return;
        }
        ASSERT_TRUE(p.empty()) << p.front().message;
        if (ui::sameRecord(*it, e)) return; // nothing changed, nothing pushed
        *it = e;
        addObserver(s, e.observer);
        model_.push(std::move(s));
    }

    void remove()
    {
        const std::vector<core::Encounter> cache = document_.encounters().expand();
        if (cache.empty()) return;
        std::vector<core::Encounter> rows;
        const int n = std::min(uniform(1, 3), static_cast<int>(cache.size()));
        std::vector<size_t> picks(cache.size());
        for (size_t i = 0; i < picks.size(); ++i) picks[i] = i;
        std::shuffle(picks.begin(), picks.end(), random_);
        for (int i = 0; i < n; ++i) rows.push_back(cache[picks[static_cast<size_t>(i)]]);
        const core::FieldProblems p = facade_.deleteEncounters(rows);
        caughtUp();
        State s = model_.now();
        const bool allThere = std::all_of(rows.begin(), rows.end(), [&](const core::Encounter& r) {
            return std::any_of(s.encounters.begin(), s.encounters.end(), [&](const auto& x) { return x.uid == r.uid; });
        });
        if (!allThere) {
            ASSERT_FALSE(p.empty()) << "a delete of rows another program deleted was written";
            ++refusedOnTop_;
            return;
        }
        ASSERT_TRUE(p.empty()) << p.front().message;
        std::erase_if(s.encounters, [&](const core::Encounter& x) {
            return std::any_of(rows.begin(), rows.end(), [&](const auto& r) { return r.uid == x.uid; });
        });
        model_.push(std::move(s));
    }

    // Through the document, as the Edit menu and the entry's keys go.
    void undo()
    {
        if (outside_) {
            document_.undo(); // reads the file again and undoes nothing
            caughtUp();
            return;
        }
        ASSERT_EQ(document_.undoStack()->canUndo(), model_.at > 0);
        if (model_.at == 0) return;
        document_.undo();
        --model_.at;
    }

    void redo()
    {
        if (outside_) {
            document_.redo();
            caughtUp();
            return;
        }
        ASSERT_EQ(document_.undoStack()->canRedo(), model_.at + 1 < model_.history.size());
        if (model_.at + 1 >= model_.history.size()) return;
        document_.redo();
        ++model_.at;
    }

    /// Undo Whole Session as the entry does it: after reading the file again,
    /// this session's lines still in the file, deleted as one step. Now and
    /// then the session ends instead and a new one begins.
    void undoSession()
    {
        if (uniform(0, 4) == 0) {
            session_.clear();
            return;
        }
        const core::FieldProblems caught = facade_.catchUp();
        ASSERT_TRUE(caught.empty()) << caught.front().message;
        caughtUp();
        std::vector<core::Encounter> rows;
        for (const core::Encounter& e : document_.encounters().expand())
            if (session_.count(e.uid)) rows.push_back(e);
        if (rows.empty()) return;
        const core::FieldProblems p = facade_.deleteEncounters(rows, QStringLiteral("Take back the session"));
        ASSERT_TRUE(p.empty()) << p.front().message;
        State s = model_.now();
        std::erase_if(s.encounters, [&](const core::Encounter& x) { return session_.count(x.uid) > 0; });
        model_.push(std::move(s));
        ++sessionsTakenBack_;
    }

    /// Another program (a second connection, as `hierloom-cli import` is)
    /// adds, changes or deletes an encounter, or rewrites the observer list.
    /// Half the time the person then comes back to the window (activation);
    /// otherwise the desktop notices at its next step.
    void outsideWrite()
    {
        State s = outside_ ? *outside_ : model_.now();
        {
            core::ColonyStore other = core::ColonyStore::open(path_, core::ColonyStore::Mode::ReadWrite);
            const int what = s.encounters.empty() ? 0 : uniform(0, 5);
            if (what <= 2) {
                std::vector<core::Encounter> one{randomEncounter()};
                const core::FieldProblems p = core::insertEncounters(other, one, today_);
                ASSERT_TRUE(p.empty()) << p.front().message;
                s.encounters.push_back(one.front());
                addObserver(s, one.front().observer);
            } else if (what == 3) {
                const size_t i = static_cast<size_t>(uniform(0, static_cast<int>(s.encounters.size()) - 1));
                core::deleteEncounters(other, {s.encounters[i].uid});
                s.encounters.erase(s.encounters.begin() + static_cast<std::ptrdiff_t>(i));
            } else if (what == 4) {
                const size_t i = static_cast<size_t>(uniform(0, static_cast<int>(s.encounters.size()) - 1));
                core::Encounter e = s.encounters[i];
                e.note = "outside " + std::to_string(uniform(0, 99));
                const core::FieldProblems p = core::updateEncounter(other, e, today_);
                ASSERT_TRUE(p.empty()) << p.front().message;
                s.encounters[i] = e;
                addObserver(s, e.observer); // writing a line lists its observer, as the desktop's writes do
            } else {
                std::vector<std::string> names = s.observers;
                names.push_back("outside " + std::to_string(uniform(0, 3)));
                std::sort(names.begin(), names.end());
                names.erase(std::unique(names.begin(), names.end()), names.end());
                core::writeObservers(other, names);
                s.observers = names;
            }
        }
        outside_ = s;
        ++outsideWrites_;
        ASSERT_TRUE(document_.writtenElsewhere());
        if (uniform(0, 1)) {
            ASSERT_TRUE(document_.catchUpWithFile());
            caughtUp();
        }
    }

    void thresholds()
    {
        core::StabilityThresholds t;
        t.counterShare = 0.05 * uniform(1, 4); // few values, so repeats (no-ops) happen
        t.minDecided = uniform(10, 12);
        const core::FieldProblems p = facade_.setStabilityThresholds(t);
        caughtUp();
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
        caughtUp();
        ASSERT_TRUE(p.empty()) << p.front().message;
        if (model_.now().observers == names) return;
        State s = model_.now();
        s.observers = names;
        model_.push(std::move(s));
    }

    void check(int n)
    {
        // The last steps' kinds: add, edit, delete, undo, redo, thresholds, observers, session, x = outside.
        SCOPED_TRACE("after step " + std::to_string(n) + ", the last steps " + kinds_.substr(kinds_.size() > 12 ? kinds_.size() - 12 : 0));
        const State file = readFile(path_);
        const State& expectedFile = outside_ ? *outside_ : model_.now();
        ASSERT_TRUE(ui::sameRecords(file.encounters, expectedFile.encounters))
            << "the file's encounters are not what the steps should have made (" << file.encounters.size() << " vs "
            << expectedFile.encounters.size() << ")";
        ASSERT_EQ(file.observers, expectedFile.observers);
        ASSERT_EQ(file.thresholds, expectedFile.thresholds);
        ASSERT_EQ(document_.undoStack()->count(), static_cast<int>(model_.history.size()) - 1);
        ASSERT_EQ(document_.undoStack()->index(), static_cast<int>(model_.at));
        mostCommands_ = std::max(mostCommands_, document_.undoStack()->count());
        mostEncounters_ = std::max(mostEncounters_, file.encounters.size());
        // Until the desktop notices another program's write, it shows the file as it last read it.
        ASSERT_EQ(document_.writtenElsewhere(), outside_.has_value());
        const State& shown = model_.now();
        ASSERT_TRUE(ui::sameRecords(document_.encounters().expand(), shown.encounters)) << "the document's cache drifted";
        if (!outside_) ASSERT_TRUE(ui::sameRecords(document_.encounters().expand(), file.encounters));
        ASSERT_EQ(animals_.rowCount(), 6); // the animals' table is not touched by any of these steps

        // The table: every encounter the document shows, newest first, each cell from its record.
        std::vector<size_t> order = core::chronologicalOrder(shown.encounters);
        std::reverse(order.begin(), order.end());
        ASSERT_EQ(table_.rowCount(), static_cast<int>(order.size()));
        for (int row = 0; row < table_.rowCount(); ++row) {
            const core::Encounter& expected = shown.encounters[order[static_cast<size_t>(row)]];
            ASSERT_TRUE(ui::sameRecord(table_.encounterAt(row), expected)) << "table row " << row;
            ASSERT_EQ(table_.index(row, ui::EncounterTableModel::Winner).data().toString(), ui::toQString(expected.winner));
            ASSERT_EQ(table_.index(row, ui::EncounterTableModel::Loser).data().toString(), ui::toQString(expected.loser));
        }
        QStringList names;
        for (const core::Encounter& e : shown.encounters) names << ui::toQString(e.observer);
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
    ui::AnimalTableModel animals_{&document_};
    Model model_;
    std::optional<State> outside_;  // the file's state while the desktop has not noticed another program's write
    std::set<std::string> session_; // uids added in the current entry session
    core::Day today_ = core::dayFromCivil(2024, 12, 31);
    std::string kinds_;
    int mostCommands_ = 0;
    size_t mostEncounters_ = 0;
    int outsideWrites_ = 0;
    int sessionsTakenBack_ = 0;
    int refusedOnTop_ = 0;
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
    EXPECT_GT(run.mostCommands(), 20);
    EXPECT_GT(run.mostEncounters(), 20u);
    // Every kind of step happened, often enough to matter.
    EXPECT_GT(run.outsideWrites(), 50);
    EXPECT_GT(run.sessionsTakenBack(), 10);
    std::printf("most commands %d, most encounters %zu, outside writes %d, sessions taken back %d, refused on top %d\n",
                run.mostCommands(), run.mostEncounters(), run.outsideWrites(), run.sessionsTakenBack(), run.refusedOnTop());
}
