// SPDX-License-Identifier: GPL-3.0-or-later
// Measures (prints, asserts nothing) the views that read every group's
// encounters on a large colony file after "Read Every Group": opens the file,
// reads every encounter, then shows each named view in turn and waits for its
// computation, printing the time and the process's memory (VmRSS now, VmHWM
// peak) after each. Run one view per process to see each view's own peak.
// Usage: views_read_all_measure COLONY VIEW... (view ids of the View menu:
// health, prediction, sex-ratio, support, planner; "none" reads only).
// The colony is only read.
#include "ui/document/colony_document.h"
#include "ui/document/compute_runner.h"
#include "ui/shell/main_window.h"

#include <QApplication>
#include <QElapsedTimer>
#include <QStandardPaths>

#include <cstdio>
#include <fstream>
#include <string>

using namespace hierloom;

namespace {

// VmHWM (peak) or VmRSS (now) of this process in MiB, from /proc/self/status.
double memoryMiB(const std::string& field)
{
    std::ifstream status("/proc/self/status");
    std::string line;
    while (std::getline(status, line))
        if (line.rfind(field + ":", 0) == 0) return std::stod(line.substr(field.size() + 1)) / 1024.0;
    return -1;
}

double ms(const QElapsedTimer& t) { return static_cast<double>(t.nsecsElapsed()) / 1e6; }

// Runs the events until `done` or 600 s.
template <class Done> void runUntil(Done done)
{
    QElapsedTimer t;
    t.start();
    while (!done() && t.elapsed() < 600000) QApplication::processEvents(QEventLoop::AllEvents, 5);
}

// No view of the window is computing (after the events a switch starts have run).
bool idle(const ui::MainWindow& window)
{
    for (const ui::ComputeRunner* r : window.findChildren<ui::ComputeRunner*>())
        if (r->busy()) return false;
    return true;
}

void settle(ui::MainWindow& window)
{
    QElapsedTimer t;
    t.start();
    while (t.elapsed() < 300) QApplication::processEvents(QEventLoop::AllEvents, 5); // debounced starts
    runUntil([&] { return idle(window); });
    QApplication::processEvents();
    window.repaint();
}

} // namespace

int main(int argc, char* argv[])
{
    QStandardPaths::setTestModeEnabled(true);
    QApplication app(argc, argv);
    if (argc < 3) {
        std::fprintf(stderr, "usage: views_read_all_measure COLONY VIEW...\n");
        return 2;
    }
    ui::MainWindow window;
    window.resize(1400, 900);
    window.show();
    window.showView(QStringLiteral("animals"));
    ui::ColonyDocument* doc = window.document();
    QApplication::processEvents();

    QElapsedTimer total;
    total.start();
    if (!window.openColony(QString::fromLocal8Bit(argv[1]))) return 1;
    doc->readEverything();
    runUntil([&] { return !doc->isLoading(); });
    settle(window);
    std::printf("every encounter read: %.0f ms (%zu encounters); RSS %.0f MiB, peak %.0f MiB\n", ms(total),
                doc->encounters().size(), memoryMiB("VmRSS"), memoryMiB("VmHWM"));
    for (int i = 2; i < argc; ++i) {
        const QString view = QString::fromLocal8Bit(argv[i]);
        if (view == QStringLiteral("none")) continue;
        QElapsedTimer t;
        t.start();
        if (!window.showView(view)) {
            std::fprintf(stderr, "no view %s\n", argv[i]);
            return 2;
        }
        settle(window);
        std::printf("view %s computed and painted: %.0f ms; RSS %.0f MiB, peak %.0f MiB\n", argv[i], ms(t),
                    memoryMiB("VmRSS"), memoryMiB("VmHWM"));
    }
    return 0;
}
