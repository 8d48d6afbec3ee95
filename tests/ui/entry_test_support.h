// SPDX-License-Identifier: GPL-3.0-or-later
#pragma once
// The evening entry's test fixture: a small hand-made colony, a panel on it,
// keystrokes sent to whichever widget has the focus, and a person answering
// the next modal question box.
#include "core/store/colony_import.h"
#include "core/store/colony_store.h"
#include "tests/core/import_test_support.h"
#include "ui/document/colony_document.h"
#include "ui/document/colony_edit_facade.h"
#include "ui/document/qt_convert.h"
#include "ui/entry/encounter_entry_panel.h"

#include <QApplication>
#include <QComboBox>
#include <QLineEdit>
#include <QMessageBox>
#include <QTest>
#include <QTimer>

#include <gtest/gtest.h>

#include <memory>

namespace hierloom::test {

// Group A: the F1 matriline and F2; group B: M1 and G1. Hand-made so every
// expected row below can be checked by eye.
inline const char* const animalsCsv = "id,name,sex,birth_date,mother,entry_type\n"
                               "F1,Ada,F,2010-03-01,,founder\n"
                               "F2,Bea,F,2012-05-02,,founder\n"
                               "D1,Cleo,F,2015-04-03,F1,born\n"
                               "D2,Dot,F,2017-06-04,D1,born\n"
                               "M1,Eli,M,2011-01-01,,founder\n"
                               "G1,Gus,F,2012-01-01,,founder\n";
inline const char* const residencesCsv = "animal,group,from\n"
                                  "F1,A,2010-03-01\nF2,A,2012-05-02\nD1,A,2015-04-03\nD2,A,2017-06-04\n"
                                  "M1,B,2011-01-01\nG1,B,2012-01-01\n";

inline std::string makeColony(const TempDir& dir)
{
    const std::string path = dir.file("entry.hierloom");
    core::ColonyStore store = core::ColonyStore::create(path);
    const core::ImportResult plan = core::importFiles(
        store, {dir.write("a.csv", animalsCsv), dir.write("r.csv", residencesCsv), {}}, core::today());
    EXPECT_TRUE(plan.ok()) << plan.problems.text();
    return path;
}

/// Encounters in the file, read by a separate connection (what another program or a restart would see).
inline std::vector<core::Encounter> inFile(const std::string& path)
{
    return core::ColonyStore::open(path, core::ColonyStore::Mode::ReadOnly).loadEncounters();
}

/// Presses `key` on the next modal question box as soon as it is up (a person
/// reading it and pressing Y, N or Enter), noting its text in `seen`. Calls
/// made one after the other answer the boxes in the order they come up.
inline void answerNextBox(Qt::Key key, QStringList* seen = nullptr, int tries = 300)
{
    QTimer::singleShot(10, [key, seen, tries] {
        auto* box = qobject_cast<QMessageBox*>(QApplication::activeModalWidget());
        if (!box || box->property("hierloomAnswered").toBool()) {
            if (tries > 0) answerNextBox(key, seen, tries - 1);
            return;
        }
        box->setProperty("hierloomAnswered", true);
        if (seen) *seen << box->text();
        QTest::keyClick(box, key);
    });
}

/// The widget with the keyboard focus in `window`, making the window active
/// again first: after a question box closes, the offscreen platform (which
/// has no window manager) leaves no window active, where a desktop would
/// give the keyboard back to the window.
inline QWidget* focusIn(QWidget* window)
{
    if (QApplication::activeWindow() != window) QApplication::setActiveWindow(window);
    return QApplication::focusWidget() ? QApplication::focusWidget() : window;
}

struct Entry {
    TempDir dir;
    std::string path = makeColony(dir);
    ui::ColonyDocument document;
    ui::ColonyEditFacade facade{&document};
    std::unique_ptr<ui::EncounterEntryPanel> panel;
    QStringList questions;
    bool answer = true;
    int keys = 0; // keystrokes sent through type()/key()

    Entry()
    {
        document.open(ui::toQString(path));
        panel = std::make_unique<ui::EncounterEntryPanel>(&facade);
        panel->setDuplicateQuestion([this](const QString& q) {
            questions << q;
            return answer;
        });
        panel->show();
        QApplication::setActiveWindow(panel.get());
        panel->dateEdit()->setText(QStringLiteral("2021-05-01"));
        panel->groupBox()->setCurrentText(QStringLiteral("A"));
        panel->observerBox()->setCurrentText(QStringLiteral("AB"));
        panel->focusEntry();
    }
    QWidget* focus() const { return focusIn(panel.get()); }
    void type(const QString& text)
    {
        QTest::keyClicks(focus(), text);
        keys += static_cast<int>(text.size());
    }
    void key(Qt::Key k)
    {
        QTest::keyClick(focus(), k);
        ++keys;
    }
    /// One notebook line as a person types it: time (optional), Tab, winner, Tab, loser, Enter.
    void line(const QString& time, const QString& winner, const QString& loser)
    {
        if (focus() == panel->timeEdit()) {
            if (!time.isEmpty()) type(time);
            key(Qt::Key_Tab);
        }
        type(winner);
        key(Qt::Key_Tab);
        type(loser);
        key(Qt::Key_Return);
    }
};

} // namespace hierloom::test
