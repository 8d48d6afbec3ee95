// SPDX-License-Identifier: GPL-3.0-or-later
// Measures (prints, asserts nothing) the views that read every group's
// encounters on a large colony file after "Read Every Group": opens the file,
// reads every encounter, then shows each named view in turn and waits for its
// computation, printing the time and the process's memory (VmRSS now, VmHWM
// peak) after each. Run one view per process to see each view's own peak.
// Usage: views_read_all_measure COLONY VIEW... (view ids of the View menu:
// health, prediction, sex-ratio, support, planner; "none" reads only;
// "report" writes the first group's hierarchy report to a temporary PDF from
// the document's records as the report dialog does, "report-expanded" from
// colonyFor({}) as it did before). The colony is only read.
#include "ui/document/colony_document.h"
#include "report/hierarchy_report.h"
#include "ui/document/compute_runner.h"
#include "ui/document/qt_convert.h"
#include "ui/planning/report_dialog.h"
#include "ui/shell/main_window.h"
#include "measure_support.h"

#include <QApplication>
#include <QElapsedTimer>
#include <QStandardPaths>
#include <QTemporaryDir>

#include <cstdio>
#include <string>

using namespace hierloom;

namespace {

using measure::memoryMiB;
using measure::ms;

// Runs the events until `done` or 600 s.
template <class Done> void runUntil(Done done) { measure::runUntil(done, 600000); }

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
        if (view.startsWith(QStringLiteral("report"))) {
            const QTemporaryDir dir;
            const QString pdf = dir.filePath(QStringLiteral("report.pdf"));
            const std::string group = doc->residences().groups().front();
            const report::HierarchyReportOptions o = ui::documentReportOptions(doc, group, std::nullopt);
            QElapsedTimer t;
            t.start();
            const int pages = view == QStringLiteral("report-expanded")
                                  ? report::writeHierarchyReportPdf(pdf, doc->colonyFor({}), o)
                                  : report::writeHierarchyReportPdf(pdf, doc->encounters().compact(), doc->pedigree(), o);
            std::printf("%s of %s, %d pages: %.0f ms; RSS %.0f MiB, peak %.0f MiB\n", argv[i], group.c_str(), pages,
                        ms(t), memoryMiB("VmRSS"), memoryMiB("VmHWM"));
            continue;
        }
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
