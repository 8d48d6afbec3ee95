// SPDX-License-Identifier: GPL-3.0-or-later
// Measures (prints, asserts nothing) the desktop on a large colony file, such
// as a breeding centre made by tools/make_centre: time from open to the first
// view painted, to every encounter read, a group switch, Enter on an evening
// entry line to its row painted, and the peak memory; beside them, in the same
// run, the sqlite3 shell printing one group and the whole encounter table, and
// the core loader reading the whole file.
// Usage: desktop_centre_measure COLONY [--whole]
//   --whole: open the way the desktop did before (every encounter read before
//   the first view), for the before/after comparison. --read-all: press
//   "Read Every Group" after the first view (a centre above
//   ColonyDocument::readEverythingUpTo() is otherwise kept group by group). Run each mode in its own
//   process: the peak memory is the process's. The colony gets a few lines
//   (taken back at the end through the session's undo).
#include "core/store/colony_store.h"
#include "ui/analysis/rank_timeline_view.h"
#include "ui/document/colony_document.h"
#include "ui/document/compute_runner.h"
#include "ui/document/qt_convert.h"
#include "ui/entry/encounter_entry_panel.h"
#include "ui/shell/main_window.h"
#include "measure_support.h"

#include <QApplication>
#include <QComboBox>
#include <QElapsedTimer>
#include <QKeyEvent>
#include <QLabel>
#include <QLineEdit>
#include <QProcess>
#include <QStandardPaths>
#include <QTableWidget>

#include <algorithm>
#include <cstdio>
#include <limits>
#include <string>
#include <vector>

using namespace hierloom;

namespace {

using measure::memoryMiB;
using measure::ms;

// Runs the events until `done` or 120 s.
template <class Done> void runUntil(Done done) { measure::runUntil(done, 120000); }

// The timeline has finished computing and the window has painted it.
void waitPainted(ui::MainWindow& window, ui::RankTimelineView* timeline)
{
    QApplication::processEvents();
    runUntil([&] { return !timeline->runner()->busy(); });
    QApplication::processEvents();
    window.repaint();
}

double shellSeconds(const QString& file, const QString& sql)
{
    QProcess shell;
    shell.setStandardOutputFile(QProcess::nullDevice());
    QElapsedTimer t;
    t.start();
    shell.start(QStringLiteral("sqlite3"), {file, sql});
    shell.waitForFinished(-1);
    return ms(t);
}

double median(std::vector<double> v)
{
    std::sort(v.begin(), v.end());
    return v[v.size() / 2];
}

} // namespace

int main(int argc, char* argv[])
{
    QStandardPaths::setTestModeEnabled(true);
    QApplication app(argc, argv);
    if (argc < 2) {
        std::fprintf(stderr, "usage: desktop_centre_measure COLONY [--whole]\n");
        return 2;
    }
    const QString path = QString::fromLocal8Bit(argv[1]);
    const bool whole = argc > 2 && std::string(argv[2]) == "--whole";
    const bool readAll = argc > 2 && std::string(argv[2]) == "--read-all";

    ui::MainWindow window;
    window.resize(1400, 900);
    window.show();
    window.showView(QStringLiteral("timeline"));
    auto* timeline = window.analysisViews().timeline;
    ui::ColonyDocument* doc = window.document();
    if (whole) doc->setProgressiveFrom(std::numeric_limits<std::int64_t>::max());
    QApplication::processEvents();

    QElapsedTimer total;
    total.start();
    if (!window.openColony(path)) return 1;
    const double opened = ms(total);
    waitPainted(window, timeline);
    const double firstView = ms(total);
    std::printf("%s: open returned %.0f ms, first view (timeline) painted %.0f ms, %zu encounters held\n",
                whole ? "whole (before)" : "in steps", opened, firstView, doc->encounters().size());

    const std::vector<std::string> groups = doc->residences().groups();
    std::vector<double> switchWhileLoading;
    if (!doc->isComplete() && groups.size() > 2) {
        for (size_t k = 1; k <= 2; ++k) {
            QElapsedTimer t;
            t.start();
            doc->showGroup(ui::toQString(groups[k]));
            waitPainted(window, timeline);
            switchWhileLoading.push_back(ms(t));
        }
        std::printf("group switch, first visit (read from the file), timeline repainted: %.0f ms, %.0f ms\n", switchWhileLoading[0],
                    switchWhileLoading[1]);
    }
    if (readAll) doc->readEverything();
    if (doc->isLoading()) {
        runUntil([&] { return !doc->isLoading(); });
        const double full = ms(total);
        waitPainted(window, timeline);
        std::printf("every encounter read: %.0f ms after open (%zu encounters); RSS now %.0f MiB, peak so far %.0f MiB\n",
                    full, doc->encounters().size(), memoryMiB("VmRSS"), memoryMiB("VmHWM"));
    } else if (!doc->isComplete()) {
        std::printf("kept group by group (more than %lld encounters); RSS now %.0f MiB\n",
                    static_cast<long long>(doc->readEverythingUpTo()), memoryMiB("VmRSS"));
    }

    // A switch: the encounter log on screen (its rows are the document's),
    // then the timeline on screen (a rank computation over the group's record).
    window.showView(QStringLiteral("encounters"));
    QApplication::processEvents();
    std::vector<double> logSwitches, switches, turned, back;
    for (size_t k = 3; k < std::min<size_t>(groups.size(), 8); ++k) {
        QElapsedTimer t;
        t.start();
        doc->showGroup(ui::toQString(groups[k]));
        QApplication::processEvents();
        window.repaint();
        logSwitches.push_back(ms(t));
    }
    window.showView(QStringLiteral("timeline"));
    waitPainted(window, timeline);
    for (size_t k = 8; k < std::min<size_t>(groups.size(), 13); ++k) {
        QElapsedTimer t;
        t.start();
        doc->showGroup(ui::toQString(groups[k]));
        // The interface has turned: the group's data read, the timeline saying it computes.
        QApplication::processEvents();
        window.repaint();
        turned.push_back(ms(t));
        waitPainted(window, timeline);
        switches.push_back(ms(t));
    }
    // Back to groups whose timelines were computed at this revision (kept
    // while the document holds the group: the last heldGroupLimit()).
    for (size_t k = 8; k < std::min<size_t>(groups.size(), 13); ++k) {
        if (!doc->holdsGroup(groups[k])) continue;
        QElapsedTimer t;
        t.start();
        doc->showGroup(ui::toQString(groups[k]));
        waitPainted(window, timeline);
        back.push_back(ms(t));
    }
    if (!logSwitches.empty())
        std::printf("group switch, group read and encounter log repainted (median of %zu): %.0f ms; max %.0f\n",
                    logSwitches.size(), median(logSwitches),
                    *std::max_element(logSwitches.begin(), logSwitches.end()));
    if (!switches.empty())
        std::printf("group switch, group read and timeline recomputed and repainted (median of %zu): %.0f ms; max %.0f\n",
                    switches.size(), median(switches), *std::max_element(switches.begin(), switches.end()));
    if (!turned.empty())
        std::printf("group switch with the timeline on screen, until the interface has turned (data read, timeline "
                    "computing; median of %zu): %.0f ms; max %.0f\n",
                    turned.size(), median(turned), *std::max_element(turned.begin(), turned.end()));
    if (!back.empty())
        std::printf("group switch back to a group held, timeline repainted (median of %zu): %.0f ms; max %.0f\n",
                    back.size(), median(back), *std::max_element(back.begin(), back.end()));
    std::printf("RSS after the switches: %.0f MiB (%zu encounters held), peak so far %.0f MiB\n",
                memoryMiB("VmRSS"), doc->encounters().size(), memoryMiB("VmHWM"));

    // The evening entry: residents of the first group, Enter on the loser field.
    window.showView(QStringLiteral("entry"));
    ui::EncounterEntryPanel* panel = window.entryPanel();
    const std::string group = groups.front();
    std::vector<std::string> residents;
    for (const core::Residence& r : doc->pedigree().residences) {
        if (r.group != group || r.to) continue;
        const int a = doc->pedigree().animalIndex(r.animal);
        if (a >= 0 && !doc->pedigree().animals[static_cast<size_t>(a)].exit) residents.push_back(r.animal);
        if (residents.size() == 40) break;
    }
    panel->dateEdit()->setText(QDate::currentDate().toString(Qt::ISODate));
    panel->groupBox()->setCurrentText(ui::toQString(group));
    panel->observerBox()->setCurrentText(QStringLiteral("bench"));
    panel->setDuplicateQuestion([](const QString&) { return true; });
    panel->setUndoSessionQuestion([](const QString&) { return true; });
    QApplication::processEvents();
    std::vector<double> enter;
    for (int i = 0; i < 21 && residents.size() >= 2; ++i) {
        panel->winnerEdit()->setText(ui::toQString(residents[static_cast<size_t>(i) % (residents.size() / 2)]));
        panel->loserEdit()->setText(
            ui::toQString(residents[residents.size() / 2 + static_cast<size_t>(i) % (residents.size() / 2)]));
        panel->timeEdit()->setText(QStringLiteral("%1:%2").arg(8 + i / 60).arg(i % 60, 2, 10, QLatin1Char('0')));
        QApplication::processEvents();
        const int rowsBefore = panel->sessionList()->rowCount();
        QKeyEvent key(QEvent::KeyPress, Qt::Key_Return, Qt::NoModifier);
        QElapsedTimer t;
        t.start();
        QApplication::sendEvent(panel->loserEdit(), &key);
        while (panel->sessionList()->rowCount() == rowsBefore && t.elapsed() < 3000) QApplication::processEvents();
        if (panel->sessionList()->rowCount() == rowsBefore) {
            std::printf("line %d not saved:", i);
            for (QLabel* label : panel->findChildren<QLabel*>())
                if (label->isVisible() && !label->text().isEmpty())
                    std::printf(" [%s]", ui::toStdString(label->text()).c_str());
            std::printf("\n");
            continue;
        }
        window.repaint();
        enter.push_back(ms(t));
    }
    if (enter.size() > 1)
        std::printf("Enter -> row painted: first %.1f ms; then median %.1f ms, max %.1f (%zu lines)\n", enter.front(),
                    median(std::vector<double>(enter.begin() + 1, enter.end())),
                    *std::max_element(enter.begin() + 1, enter.end()), enter.size() - 1);
    std::printf("peak so far after the lines: %.0f MiB\n", memoryMiB("VmHWM"));
    panel->undoWholeSession();
    QApplication::processEvents();
    std::printf("peak memory (VmHWM) of the desktop: %.0f MiB\n", memoryMiB("VmHWM"));

    // Baselines in the same run.
    const QString g = ui::toQString(groups.front());
    std::printf("baseline: sqlite3 shell, one group's rows (%s): %.0f ms; every encounter: %.0f ms\n",
                group.c_str(), shellSeconds(path, QStringLiteral("SELECT * FROM encounter WHERE grp = '%1'").arg(g)),
                shellSeconds(path, QStringLiteral("SELECT * FROM encounter")));
    {
        QElapsedTimer t;
        t.start();
        const core::ColonyStore store = core::ColonyStore::open(ui::toStdString(path));
        const auto one = store.loadEncounters([&] { core::EncounterScope s; s.group = group; return s; }());
        const double groupMs = ms(t);
        t.restart();
        const core::Colony all = store.load();
        std::printf("baseline: core loader alone, one group %.0f ms (%zu rows); whole file %.0f ms (%zu rows)\n",
                    groupMs, one.size(), ms(t), all.encounters.size());
    }
    return 0;
}
