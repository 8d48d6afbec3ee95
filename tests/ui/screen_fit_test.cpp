// SPDX-License-Identifier: GPL-3.0-or-later
// The main window fits a 1024x768 screen: on the demo colony, with every tab
// (and every tab inside a view) shown and computed, neither the window nor
// any view asks for more than 1008x708 pixels (the screen less a window
// frame and a task bar).
#include "ui/shell/main_window.h"

#include "core/demo/demo_colony_file.h"
#include "tests/core/import_test_support.h"
#include "ui/document/compute_runner.h"
#include "ui/document/qt_convert.h"

#include <QApplication>
#include <QLayout>
#include <QTabWidget>

#include <gtest/gtest.h>

#include <string>

using namespace hierloom;
using hierloom::test::TempDir;

namespace {

constexpr int kMaxWidth = 1008;
constexpr int kMaxHeight = 708;

class QuietWindow : public ui::MainWindow {
protected:
    void reportError(const QString& title, const QString& message) override
    {
        ADD_FAILURE() << title.toStdString() << ": " << message.toStdString();
    }
};

/// Lets every computation the window started end and its result be shown.
void settle(QWidget* window)
{
    for (int round = 0; round < 20; ++round) {
        QApplication::processEvents();
        bool busy = false;
        for (ui::ComputeRunner* runner : window->findChildren<ui::ComputeRunner*>()) {
            busy = busy || runner->busy();
            runner->wait();
        }
        QApplication::processEvents();
        if (!busy) return;
    }
}

/// The smallest size a layout gives a widget: in each direction its minimum size when set, else its hint.
QSize smallest(const QWidget* w)
{
    const QSize set = w->minimumSize(), hint = w->minimumSizeHint();
    return {set.width() > 0 ? set.width() : hint.width(), set.height() > 0 ? set.height() : hint.height()};
}

std::string describe(const QWidget* w)
{
    const QSize size = smallest(w);
    return std::string(w->metaObject()->className()) + " '" + w->objectName().toStdString() + "' " +
           std::to_string(size.width()) + "x" + std::to_string(size.height());
}

void describeLayout(const QLayout* layout, int depth, std::string& out);

/// What makes `w` large: its layout's items (or its visible children) of at least `floor` pixels in either direction.
void describeTree(const QWidget* w, int depth, std::string& out)
{
    out += "\n" + std::string(static_cast<size_t>(2 * depth), ' ') + describe(w);
    if (depth > 12) return;
    if (w->layout()) return describeLayout(w->layout(), depth + 1, out);
    for (const QWidget* c : w->findChildren<QWidget*>(Qt::FindDirectChildrenOnly)) {
        const QSize size = smallest(c);
        if (!c->isWindow() && !c->isHidden() && (size.width() >= 250 || size.height() >= 250))
            describeTree(c, depth + 1, out);
    }
}

void describeLayout(const QLayout* layout, int depth, std::string& out)
{
    for (int i = 0; i < layout->count(); ++i) {
        QLayoutItem* item = layout->itemAt(i);
        const QSize size = item->minimumSize();
        if (item->isEmpty() || (size.width() < 250 && size.height() < 250)) continue;
        if (item->widget()) describeTree(item->widget(), depth, out);
        else if (item->layout()) {
            out += "\n" + std::string(static_cast<size_t>(2 * depth), ' ') + item->layout()->metaObject()->className() +
                   " " + std::to_string(size.width()) + "x" + std::to_string(size.height()) + ":";
            for (int k = 0; k < item->layout()->count(); ++k)
                if (QWidget* c = item->layout()->itemAt(k)->widget(); c && !c->isHidden())
                    out += " " + describe(c) + ";";
        }
    }
}

std::string widestPath(const QWidget* w)
{
    std::string out;
    describeTree(w, 1, out);
    return out;
}

void expectFits(const QWidget* w, const std::string& what)
{
    const QSize size = smallest(w);
    EXPECT_LE(size.width(), kMaxWidth) << what << " is too wide:" << widestPath(w);
    EXPECT_LE(size.height(), kMaxHeight) << what << " is too tall:" << widestPath(w);
}

} // namespace

TEST(ScreenFit, EveryViewOfTheDemoColonyFitsA1024x768Screen)
{
    TempDir dir;
    const std::string path = dir.file("demo.hierloom");
    core::createDemoColonyFile(path);
    QuietWindow window;
    window.show();
    settle(&window);
    expectFits(&window, "the window before a colony is open");
    ASSERT_TRUE(window.openColony(ui::toQString(path)));
    settle(&window);

    auto* tabs = window.centralWidget()->findChild<QTabWidget*>(QString(), Qt::FindDirectChildrenOnly);
    ASSERT_NE(tabs, nullptr);
    ASSERT_EQ(tabs->count(), static_cast<int>(ui::viewRegistry().size()));
    for (const ui::ViewEntry& entry : ui::viewRegistry()) {
        const QString id = QString::fromLatin1(entry.id);
        ASSERT_TRUE(window.showView(id)) << entry.id;
        QWidget* view = tabs->currentWidget();
        ASSERT_EQ(view->objectName(), id);
        // Shown for the first time since the colony opened, the view computes: its progress strip is
        // on screen until the event loop hands the result over. Only the layouts are brought up to date.
        QApplication::sendPostedEvents(nullptr, QEvent::LayoutRequest);
        expectFits(view, "the view " + std::string(entry.id) + " while it computes");
        settle(&window);
        // Tabs inside the view (Planner, Data Health) are shown in turn too.
        for (QTabWidget* inner : view->findChildren<QTabWidget*>())
            for (int i = 0; i < inner->count(); ++i) {
                inner->setCurrentIndex(i);
                settle(&window);
                expectFits(inner->widget(i), std::string(entry.id) + " tab " + inner->tabText(i).toStdString());
            }
        expectFits(view, "the view " + std::string(entry.id));
        expectFits(&window, "the window showing " + std::string(entry.id));
    }
}
