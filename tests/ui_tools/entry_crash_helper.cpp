// SPDX-License-Identifier: GPL-3.0-or-later
// Commits encounter lines through the edit facade, then dies by SIGKILL with
// no chance to flush or close anything: the test that runs it checks that
// every committed line is already in the colony file.
// Usage: entry_crash_helper COLONY DATE WINNER:LOSER...
#include "core/store/colony_store.h"
#include "ui/document/colony_document.h"
#include "ui/document/colony_edit_facade.h"
#include "ui/document/qt_convert.h"

#include <QApplication>

#include <csignal>
#include <cstdio>

int main(int argc, char* argv[])
{
    if (qEnvironmentVariableIsEmpty("QT_QPA_PLATFORM")) qputenv("QT_QPA_PLATFORM", "offscreen");
    QApplication app(argc, argv);
    if (argc < 4) return 2;
    using namespace hierloom;
    ui::ColonyDocument document;
    document.open(QString::fromLocal8Bit(argv[1]));
    ui::ColonyEditFacade facade(&document);
    const auto date = core::parseDate(argv[2]);
    if (!date) return 2;
    for (int i = 3; i < argc; ++i) {
        const std::string pair = argv[i];
        core::Encounter e;
        e.date = *date;
        e.time = 600 + i;
        e.winner = pair.substr(0, pair.find(':'));
        e.loser = pair.substr(pair.find(':') + 1);
        e.observer = "crash";
        if (!facade.addEncounter(e).empty()) return 3;
        std::printf("committed %s\n", argv[i]);
        std::fflush(stdout);
    }
    std::raise(SIGKILL);
    return 0;
}
