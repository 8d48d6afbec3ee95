// SPDX-License-Identifier: GPL-3.0-or-later
// First run (issue 10): with an empty settings file the window offers the
// demo colony, a new colony and CSV import, and the demo opens read-only as
// a copy in the per-user data folder.
#include "core/demo/demo_colony.h"
#include "ui/document/colony_document.h"
#include "ui/shell/demo_colony_copy.h"
#include "ui/shell/main_window.h"
#include "ui/shell/welcome_panel.h"

#include <QCommandLinkButton>
#include <QDir>
#include <QFile>
#include <QListWidget>
#include <QSettings>
#include <QStandardPaths>

#include <gtest/gtest.h>

using namespace hierloom;

namespace {

/// Records errors instead of showing a modal box.
class QuietWindow : public ui::MainWindow {
public:
    QStringList errors;

protected:
    void reportError(const QString& title, const QString& message) override { errors << title + ": " + message; }
};

/// Starts every test with an empty settings file (no recent colonies).
class FirstRun : public ::testing::Test {
protected:
    void SetUp() override
    {
        ASSERT_TRUE(QStandardPaths::isTestModeEnabled()) << "would touch the person's own settings";
        QSettings settings;
        settings.clear();
        settings.sync();
    }
    void TearDown() override { QSettings().clear(); }
};

} // namespace

TEST_F(FirstRun, EmptySettingsShowTheThreeWaysIn)
{
    QuietWindow window;
    window.show();
    auto* welcome = window.findChild<ui::WelcomePanel*>();
    ASSERT_NE(welcome, nullptr);
    EXPECT_TRUE(welcome->isVisible()) << "the welcome panel is not what the window shows";
    EXPECT_TRUE(welcome->isFirstRun());
    for (const char* name : {"demoButton", "newButton", "importButton"}) {
        auto* button = welcome->findChild<QCommandLinkButton*>(QLatin1String(name));
        ASSERT_NE(button, nullptr) << name;
        EXPECT_TRUE(button->isVisible()) << name;
    }
    EXPECT_FALSE(welcome->findChild<QListWidget*>(QStringLiteral("recentList"))->isVisible());
    EXPECT_TRUE(window.errors.isEmpty()) << window.errors.join('\n').toStdString();
}

TEST_F(FirstRun, DemoOpensReadOnlyAsACopy)
{
    QuietWindow window;
    window.show();
    auto* demo = window.findChild<QCommandLinkButton*>(QStringLiteral("demoButton"));
    ASSERT_NE(demo, nullptr);
    demo->click();
    ASSERT_TRUE(window.errors.isEmpty()) << window.errors.join('\n').toStdString();

    ui::ColonyDocument* doc = window.document();
    ASSERT_TRUE(doc->isOpen());
    EXPECT_TRUE(doc->isReadOnly());
    // A copy in the per-user data folder, never a shipped file.
    const QString dataFolder = QStandardPaths::writableLocation(QStandardPaths::AppDataLocation);
    EXPECT_EQ(QFileInfo(doc->path()).absoluteFilePath(), QFileInfo(ui::demoColonyCopyPath()).absoluteFilePath());
    EXPECT_TRUE(QFileInfo(doc->path()).absoluteFilePath().startsWith(QDir(dataFolder).absolutePath()));
    // It holds the bundled demo colony (the generator's own record count).
    const core::Colony expected = core::generateDemoColony();
    EXPECT_EQ(doc->pedigree().animals.size(), expected.animals.size());
    EXPECT_EQ(doc->encounters().size(), expected.encounters.size());
    EXPECT_FALSE(window.findChild<ui::WelcomePanel*>()->isVisible());
    EXPECT_TRUE(window.windowTitle().contains(QStringLiteral("read-only"))) << window.windowTitle().toStdString();
    // The copy is replaced on every visit, so it stays out of the recent list.
    EXPECT_FALSE(QSettings().value(QStringLiteral("recentFiles")).toStringList().contains(doc->path()));
}

TEST_F(FirstRun, DemoCopyIsReplacedEachTime)
{
    const QString first = ui::prepareDemoColonyCopy();
    ASSERT_TRUE(QFile::exists(first));
    // A damaged or outdated copy is thrown away and written afresh.
    {
        QFile damaged(first);
        ASSERT_TRUE(damaged.open(QIODevice::WriteOnly | QIODevice::Truncate));
        damaged.write("not a colony");
    }
    const QString second = ui::prepareDemoColonyCopy();
    EXPECT_EQ(first, second);
    QFile file(second);
    ASSERT_TRUE(file.open(QIODevice::ReadOnly));
    EXPECT_EQ(file.read(15), QByteArray("SQLite format 3"));
}

TEST_F(FirstRun, WithRecentFilesTheListIsShown)
{
    ui::WelcomePanel panel;
    panel.setRecentFiles({QStringLiteral("/data/colony-a.hierloom"), QStringLiteral("/data/colony-b.hierloom")});
    panel.show();
    EXPECT_FALSE(panel.isFirstRun());
    auto* list = panel.findChild<QListWidget*>(QStringLiteral("recentList"));
    ASSERT_NE(list, nullptr);
    EXPECT_TRUE(list->isVisible());
    ASSERT_EQ(list->count(), 2);
    QString asked;
    QObject::connect(&panel, &ui::WelcomePanel::recentRequested, [&asked](const QString& p) { asked = p; });
    emit list->itemActivated(list->item(1));
    EXPECT_EQ(asked, QStringLiteral("/data/colony-b.hierloom"));
    // The three ways in stay on offer.
    EXPECT_TRUE(panel.findChild<QCommandLinkButton*>(QStringLiteral("demoButton"))->isVisible());
}
