// SPDX-License-Identifier: GPL-3.0-or-later
// Measures (prints, asserts nothing) the time from Enter on an evening-entry
// line to the new row shown in the session list, in the real main window over
// a colony of 1,000,000 encounters, and the time of a full reload for contrast.
// Usage: entry_latency_measure [COLONY]  (built on first use when missing)
#include "core/store/colony_edits.h"
#include "core/store/colony_store.h"
#include "ui/document/colony_document.h"
#include "ui/document/colony_edit_facade.h"
#include "ui/entry/encounter_entry_panel.h"
#include "ui/records/encounter_view.h"
#include "ui/shell/main_window.h"
#include "ui/document/qt_convert.h"

#include <QApplication>
#include <QComboBox>
#include <QDateEdit>
#include <QElapsedTimer>
#include <QHBoxLayout>
#include <QKeyEvent>
#include <QLineEdit>
#include <QStandardPaths>
#include <QTableWidget>

#include <algorithm>
#include <cstdio>
#include <filesystem>
#include <memory>
#include <random>

using namespace hierloom;

namespace {

void buildColony(const std::string& path)
{
    core::ColonyStore store = core::ColonyStore::create(path);
    std::vector<core::Animal> animals;
    std::vector<core::Residence> stays;
    for (int i = 0; i < 120; ++i) {
        core::Animal a;
        a.id = "A" + std::to_string(i);
        a.sex = i % 3 == 0 ? core::Sex::Male : core::Sex::Female;
        a.birth = core::dayFromCivil(1995, 1, 1);
        a.entry = a.birth;
        a.entryType = core::EntryType::Founder;
        animals.push_back(a);
        stays.push_back({a.id, "A", *a.birth, std::nullopt, {}});
    }
    std::mt19937 rng(7);
    std::uniform_int_distribution<int> who(0, 119);
    const core::Day first = core::dayFromCivil(2000, 1, 1);
    std::vector<core::Encounter> encounters;
    encounters.reserve(1000000);
    for (int i = 0; i < 1000000; ++i) {
        core::Encounter e;
        e.date = first + i / 150;
        e.time = 360 + (i % 150) * 4;
        const int w = who(rng);
        int l = who(rng);
        if (l == w) l = (l + 1) % 120;
        e.winner = animals[static_cast<size_t>(w)].id;
        e.loser = animals[static_cast<size_t>(l)].id;
        e.group = "A";
        e.observer = "bench";
        e.behaviour = "displace";
        encounters.push_back(std::move(e));
    }
    store.append(animals, stays, encounters);
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
    const std::string path = argc > 1 ? argv[1] : "/tmp/hierloom-1m.hierloom";
    if (!std::filesystem::exists(path)) {
        std::printf("building %s (1,000,000 encounters)...\n", path.c_str());
        buildColony(path);
    }
    // --bare: only the document, the encounter log and the entry panel (no analysis views).
    const bool bare = argc > 2 && std::string(argv[2]) == "--bare";
    std::unique_ptr<ui::MainWindow> window;
    std::unique_ptr<ui::ColonyDocument> document;
    std::unique_ptr<ui::ColonyEditFacade> facade;
    std::unique_ptr<QWidget> host;
    ui::EncounterEntryPanel* panel = nullptr;
    QElapsedTimer timer;
    timer.start();
    if (bare) {
        document = std::make_unique<ui::ColonyDocument>();
        facade = std::make_unique<ui::ColonyEditFacade>(document.get());
        host = std::make_unique<QWidget>();
        auto* layout = new QHBoxLayout(host.get());
        layout->addWidget(new ui::EncounterView(document.get(), host.get()));
        panel = new ui::EncounterEntryPanel(facade.get(), host.get());
        layout->addWidget(panel);
        host->show();
        document->open(ui::toQString(path));
    } else {
        window = std::make_unique<ui::MainWindow>();
        window->show();
        if (!window->openColony(ui::toQString(path))) return 1;
        window->showView(QStringLiteral("entry"));
        panel = window->entryPanel();
    }
    ui::ColonyDocument* doc = bare ? document.get() : window->document();
    QApplication::processEvents();
    std::printf("%s: open %lld ms, %zu encounters\n", bare ? "bare" : "main window", static_cast<long long>(timer.elapsed()),
                doc->encounters().size());
    timer.restart();
    doc->reload();
    QApplication::processEvents();
    std::printf("full reload (what a naive undo command would do): %lld ms\n", static_cast<long long>(timer.elapsed()));

    panel->dateEdit()->setText(QDate::currentDate().toString(Qt::ISODate));
    panel->groupBox()->setCurrentText(QStringLiteral("A"));
    panel->observerBox()->setCurrentText(QStringLiteral("bench"));
    // Runs on a reused file repeat the same lines: save them without the duplicate question,
    // and take the session back at the end without the confirmation a person gets.
    panel->setDuplicateQuestion([](const QString&) { return true; });
    panel->setUndoSessionQuestion([](const QString&) { return true; });
    QApplication::processEvents();
    std::vector<double> ms;
    for (int i = 0; i < 21; ++i) {
        panel->winnerEdit()->setText(QStringLiteral("A%1").arg(i % 50));
        panel->loserEdit()->setText(QStringLiteral("A%1").arg(50 + i % 50));
        panel->timeEdit()->setText(QStringLiteral("%1:%2").arg(8 + i / 60).arg(i % 60, 2, 10, QLatin1Char('0')));
        QApplication::processEvents();
        const int rowsBefore = panel->sessionList()->rowCount();
        QKeyEvent enter(QEvent::KeyPress, Qt::Key_Return, Qt::NoModifier);
        QElapsedTimer t;
        t.start();
        QApplication::sendEvent(panel->loserEdit(), &enter);
        // Until the row is in the list and the window has painted it.
        while (panel->sessionList()->rowCount() == rowsBefore && t.elapsed() < 10000) QApplication::processEvents();
        (bare ? host.get() : static_cast<QWidget*>(window.get()))->repaint();
        QApplication::processEvents();
        ms.push_back(static_cast<double>(t.nsecsElapsed()) / 1e6);
    }
    std::printf("Enter -> row visible (median of %zu, first excluded): %.1f ms; min %.1f, max %.1f\n", ms.size() - 1,
                median(std::vector<double>(ms.begin() + 1, ms.end())), *std::min_element(ms.begin() + 1, ms.end()),
                *std::max_element(ms.begin() + 1, ms.end()));
    // The file write alone (one transaction, synchronous=FULL, audit triggers), on a second connection.
    {
        core::ColonyStore raw = core::ColonyStore::open(path);
        std::vector<double> w;
        std::vector<core::Encounter> written;
        for (int i = 0; i < 11; ++i) {
            std::vector<core::Encounter> one{doc->encounters().at(doc->encounters().size() - 1)};
            one[0].seq = 0;
            one[0].uid.clear();
            QElapsedTimer t;
            t.start();
            core::writeEncounterChange(raw, {}, one);
            w.push_back(static_cast<double>(t.nsecsElapsed()) / 1e6);
            written.push_back(one[0]);
        }
        std::vector<core::Encounter> none;
        core::writeEncounterChange(raw, written, none);
        std::printf("of which the file write of one row: median %.1f ms\n", median(w));
    }
    // Leave the shared 1M file as it was.
    panel->undoWholeSession();
    return 0;
}
