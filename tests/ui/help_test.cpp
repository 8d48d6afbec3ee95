// SPDX-License-Identifier: GPL-3.0-or-later
// Help inside the program (issue 10): every figure key has a methods entry,
// the "?" buttons and the Help menu open the right place, the About box
// names every licence, and the icon and the English catalogue are compiled in.
#include "core/ranks/rank_method_registry.h"
#include "ui/shell/about_dialog.h"
#include "ui/widgets/help_browser.h"
#include "ui/widgets/help_button.h"
#include "ui/widgets/help_topics.h"
#include "ui/shell/main_window.h"
#include "ui/analysis/hierarchy_plots_view.h"
#include "ui/analysis/matrix_view.h"
#include "ui/analysis/prediction_view.h"
#include "ui/analysis/rank_timeline_view.h"
#include "ui/planning/stability_view.h"
#include "ui/shell/translations.h"

#include <QAction>
#include <QApplication>
#include <QFile>
#include <QMainWindow>
#include <QMenu>
#include <QMenuBar>
#include <QRegularExpression>
#include <QSet>
#include <QSvgRenderer>
#include <QTextBrowser>
#include <QTranslator>

#include <gtest/gtest.h>

using namespace hierloom;

namespace {

QString resourceText(const QString& path)
{
    QFile file(path);
    if (!file.open(QIODevice::ReadOnly)) return {};
    return QString::fromUtf8(file.readAll());
}

/// Anchor names (<a name="...">) of an HTML page.
QSet<QString> anchorsOf(const QString& html)
{
    QSet<QString> names;
    const QRegularExpression anchor(QStringLiteral("<a name=\"([^\"]+)\""));
    for (auto it = anchor.globalMatch(html); it.hasNext();) names.insert(it.next().captured(1));
    return names;
}

} // namespace

// The walk: every figure key of help_topics.h has its entry on the methods page.
TEST(HelpTopics, EveryFigureKeyHasAMethodsEntry)
{
    const QString html = resourceText(QStringLiteral(":/help/methods.html"));
    ASSERT_FALSE(html.isEmpty()) << "methods.html is not compiled in";
    const QSet<QString> anchors = anchorsOf(html);
    QSet<QString> keys;
    for (const ui::HelpTopic& topic : ui::figureHelpTopics) {
        const QString key = QString::fromLatin1(topic.key);
        EXPECT_TRUE(anchors.contains(key)) << "no <a name=\"" << topic.key << "\"> in methods.html";
        EXPECT_FALSE(keys.contains(key)) << "key listed twice: " << topic.key;
        EXPECT_NE(qstrlen(topic.title), 0u) << topic.key;
        keys.insert(key);
    }
    // The figures named in the issue are all in the list.
    for (const char* key : {"elo", "davids_score", "normalised_ds", "steepness", "isi", "landau_h", "h_prime", "dci",
                            "ttri", "conformity", "tau_b", "relatedness", "sex_ratio_logistic", "fisher", "wilson",
                            "counter_dominance"})
        EXPECT_NE(ui::findHelpTopic(key), nullptr) << key;
    EXPECT_EQ(ui::findHelpTopic("no_such_figure"), nullptr);
}

// Each methods entry says what it means, how it is computed and where it comes from.
TEST(HelpTopics, MainFiguresHaveMeaningFormulaAndReference)
{
    const QString html = resourceText(QStringLiteral(":/help/methods.html"));
    for (const char* key : {"elo", "davids_score", "landau_h", "dci", "ttri", "sex_ratio_logistic"}) {
        const qsizetype start = html.indexOf(QStringLiteral("<a name=\"%1\"").arg(QLatin1String(key)));
        ASSERT_GE(start, 0) << key;
        const qsizetype next = html.indexOf(QStringLiteral("<h2>"), start + 1);
        const QString entry = html.mid(start, next < 0 ? -1 : next - start);
        EXPECT_TRUE(entry.contains(QStringLiteral("What it means"))) << key;
        EXPECT_TRUE(entry.contains(QStringLiteral("How it is computed"))) << key;
        EXPECT_TRUE(entry.contains(QStringLiteral("Reference"))) << key;
    }
}

// Every link between help pages leads to a page that is compiled in, and every
// #anchor it names exists on that page.
TEST(HelpPages, InternalLinksResolve)
{
    const QStringList pages{QStringLiteral("index.html"), QStringLiteral("methods.html"),
                            QStringLiteral("import-formats.html"), QStringLiteral("shortcuts.html")};
    const QRegularExpression link(QStringLiteral("href=\"([^\"]*)\""));
    int links = 0;
    for (const QString& page : pages) {
        const QString html = resourceText(QStringLiteral(":/help/") + page);
        ASSERT_FALSE(html.isEmpty()) << page.toStdString();
        for (auto it = link.globalMatch(html); it.hasNext();) {
            const QString target = it.next().captured(1);
            if (target.startsWith(QLatin1String("http"))) continue;
            const QString file = target.section(QLatin1Char('#'), 0, 0);
            const QString anchor = target.section(QLatin1Char('#'), 1);
            const QString targetHtml = resourceText(QStringLiteral(":/help/") + (file.isEmpty() ? page : file));
            EXPECT_FALSE(targetHtml.isEmpty()) << page.toStdString() << " -> " << target.toStdString();
            if (!anchor.isEmpty())
                EXPECT_TRUE(anchorsOf(targetHtml).contains(anchor)) << page.toStdString() << " -> " << target.toStdString();
            ++links;
        }
    }
    EXPECT_GT(links, 10);
}

TEST(HelpButton, OpensTheMethodsPageAtTheFiguresEntry)
{
    QMainWindow window;
    auto* button = new ui::HelpButton(QStringLiteral("steepness"), &window);
    // The "?" names its figure, so a row of them can be told apart.
    EXPECT_EQ(button->text(), QStringLiteral("? Steepness"));
    EXPECT_TRUE(button->toolTip().contains(QStringLiteral("Steepness"))) << button->toolTip().toStdString();
    button->click();
    auto* help = window.findChild<ui::HelpBrowser*>();
    ASSERT_NE(help, nullptr);
    EXPECT_TRUE(help->isVisible());
    EXPECT_EQ(help->browser()->source(), QUrl(QStringLiteral("qrc:/help/methods.html#steepness")));
    EXPECT_TRUE(help->browser()->toPlainText().contains(QStringLiteral("least squares")));

    // A second "?" reuses the same help window rather than opening another.
    ui::HelpButton dci(QStringLiteral("dci"), &window);
    dci.click();
    EXPECT_EQ(window.findChildren<ui::HelpBrowser*>().size(), 1);
    EXPECT_EQ(help->browser()->source().fragment(), QStringLiteral("dci"));
    help->close();
}

TEST(HelpMenu, OffersHelpShortcutsFormatsDemoAndAbout)
{
    ui::MainWindow window;
    QMenu* help = window.menuBar()->findChild<QMenu*>(QStringLiteral("helpMenu"));
    ASSERT_NE(help, nullptr);
    QStringList texts;
    QAction* contents = nullptr;
    for (QAction* a : help->actions()) {
        texts << a->text().remove(QLatin1Char('&'));
        if (a->shortcut() == QKeySequence(QKeySequence::HelpContents)) contents = a;
    }
    for (const char* wanted : {"Hierloom Help", "Methods and Figures", "Keyboard Shortcuts", "Import File Formats",
                               "Open the Demo Colony", "About Hierloom"})
        EXPECT_TRUE(texts.contains(QLatin1String(wanted))) << wanted;
    ASSERT_NE(contents, nullptr) << "no F1 action";

    // The shortcut sheet lists the window's real menu shortcuts.
    ui::showHelp(&window, QStringLiteral("shortcuts.html"));
    auto* browser = window.findChild<ui::HelpBrowser*>();
    ASSERT_NE(browser, nullptr);
    const QString sheet = browser->browser()->toPlainText();
    EXPECT_TRUE(sheet.contains(QStringLiteral("File \u2192 Import CSV..."))) << sheet.toStdString();
    EXPECT_TRUE(sheet.contains(QKeySequence(QStringLiteral("Ctrl+I")).toString(QKeySequence::NativeText)));
    EXPECT_TRUE(sheet.contains(QStringLiteral("In tables")));

    ui::showHelp(&window, QStringLiteral("import-formats.html"), QStringLiteral("encounters"));
    const QString formats = browser->browser()->toPlainText();
    EXPECT_TRUE(formats.contains(QStringLiteral("date,time,winner,loser,outcome,behaviour,group,observer,note")));
    EXPECT_TRUE(formats.contains(QStringLiteral("id,name,sex,birth_date,mother")));
    EXPECT_TRUE(formats.contains(QStringLiteral("animal,group,from,to")));
    browser->close();
}

TEST(AboutBox, NamesVersionAndEveryLicence)
{
    const QString text = ui::AboutDialog::aboutHtml();
    EXPECT_TRUE(text.contains(QApplication::applicationVersion())) << text.toStdString();
    for (const char* wanted : {"GPL-3.0-or-later", "LGPL-3.0", "QCustomPlot", "GPL-3.0", "SQLite", "public domain",
                               "CLI11", "BSD-3-Clause", "GoogleTest"})
        EXPECT_TRUE(text.contains(QLatin1String(wanted))) << wanted;
}

TEST(ApplicationIcon, SvgAndPngSizesAreCompiledIn)
{
    QSvgRenderer svg(QStringLiteral(":/icons/hierloom.svg"));
    EXPECT_TRUE(svg.isValid());
    EXPECT_EQ(svg.defaultSize(), QSize(256, 256));
    const QIcon icon = ui::applicationIcon();
    EXPECT_FALSE(icon.isNull());
    for (int size : {16, 32, 48, 256}) {
        const QPixmap pixmap = icon.pixmap(QSize(size, size));
        EXPECT_EQ(pixmap.size(), QSize(size, size)) << size;
        // Not blank: the corner is transparent, the middle is painted.
        const QImage image = pixmap.toImage();
        EXPECT_EQ(qAlpha(image.pixel(0, 0)), 0) << size;
        EXPECT_GT(qAlpha(image.pixel(size / 2, size / 2)), 200) << size;
    }
}

TEST(Translations, EnglishCatalogueIsCompiledInAndLoads)
{
    EXPECT_TRUE(QFile::exists(QStringLiteral(":/i18n/hierloom_en.qm")));
    QTranslator translator;
    EXPECT_TRUE(translator.load(QLocale(QLocale::English), QStringLiteral("hierloom"), QStringLiteral("_"),
                                QString::fromLatin1(ui::translationsResource)));
    EXPECT_EQ(translator.language(), QStringLiteral("en"));
}

// Each figure view carries a "?" for its figures, keyed to an entry of the topic list.
TEST(HelpButton, EveryFigureViewHasItsHelpButtons)
{
    ui::MainWindow window;
    const ui::AnalysisViews& views = window.analysisViews();
    const std::vector<std::pair<QWidget*, QStringList>> expected = {
        {views.hierarchy, {"h_prime", "steepness", "ttri", "conformity"}},
        {views.matrix, {"elo", "davids_score", "isi"}},
        {views.prediction, {"conformity", "tau_b", "discordant_dyads"}},
        {views.timeline, {"elo"}},
        {window.managerViews().stability, {"counter_dominance", "severe_aggression", "rank_changes"}},
    };
    for (const auto& [view, keys] : expected) {
        ASSERT_NE(view, nullptr);
        QStringList found;
        for (const ui::HelpButton* button : view->findChildren<ui::HelpButton*>()) {
            EXPECT_NE(ui::findHelpTopic(button->anchor().toUtf8().constData()), nullptr)
                << view->metaObject()->className() << ": " << button->anchor().toStdString();
            found << button->anchor();
        }
        EXPECT_FALSE(found.isEmpty()) << view->metaObject()->className();
        for (const QString& key : keys)
            EXPECT_TRUE(found.contains(key)) << view->metaObject()->className() << " lacks " << key.toStdString();
    }

    // The matrix shows the "?" of the ordering method in use.
    const auto visibleKeys = [&] {
        QStringList shown;
        for (const ui::HelpButton* b : views.matrix->findChildren<ui::HelpButton*>())
            if (b->isVisibleTo(views.matrix)) shown << b->anchor();
        return shown;
    };
    // It opens in the command line's default order (I&SI, docs/file-formats.md "matrix").
    EXPECT_EQ(visibleKeys(), QStringList{QStringLiteral("isi")});
    views.matrix->setMethod(core::RankMethod::DavidsScore);
    EXPECT_EQ(visibleKeys(), QStringList{QStringLiteral("davids_score")});
    views.matrix->setMethod(core::RankMethod::Elo);
    EXPECT_EQ(visibleKeys(), QStringList{QStringLiteral("elo")});
}

TEST(HelpTopics, EveryRegisteredRankMethodHasItsEntry)
{
    // The rank method registry names the help entry of each method; the matrix
    // view's "?" buttons open it.
    const QSet<QString> anchors = anchorsOf(resourceText(QStringLiteral(":/help/methods.html")));
    for (const core::RankMethodInfo& m : core::rankMethods()) {
        bool listed = false;
        for (const ui::HelpTopic& topic : ui::figureHelpTopics) listed = listed || qstrcmp(topic.key, m.helpKey) == 0;
        EXPECT_TRUE(listed) << m.code << ": " << m.helpKey << " is not a help topic";
        EXPECT_TRUE(anchors.contains(QString::fromLatin1(m.helpKey))) << m.helpKey;
    }
}
