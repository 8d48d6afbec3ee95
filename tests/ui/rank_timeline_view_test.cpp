// SPDX-License-Identifier: GPL-3.0-or-later
// The timeline, pedigree and prediction views on the demo colony, against the
// core computations they show and the scenario planted in the demo
// (demo-colony/README.md, core/demo/demo_colony.h).
#include "ui/analysis/rank_timeline_view.h"

#include "core/base/calendar_period.h"
#include "core/pedigree/discordance.h"
#include "core/ranks/encounter_selection.h"
#include "core/pedigree/inheritance_prediction.h"
#include "core/pedigree/matriline.h"
#include "plot_test_support.h"
#include "ui/document/animal_selection.h"
#include "ui/analysis/pedigree_view.h"
#include "ui/analysis/prediction_view.h"
#include "ui/document/qt_convert.h"

#include <QApplication>
#include <QMouseEvent>
#include <QTableWidget>

#include <QWheelEvent>

#include <gtest/gtest.h>
#include <qcustomplot.h>

#include <set>

using namespace hierloom;
using hierloom::test::DemoDocument;
using hierloom::test::finish;

namespace {

struct Planted {
    std::string daughter, mother;
};

Planted daughterOverMother()
{
    for (const core::PlantedReversal& r : core::demoColonyFacts().reversals)
        if (r.kind == core::PlantedReversalKind::DaughterOverMother) return {r.upper, r.lower};
    return {};
}

/// A checkpoint where both females are ranked and the daughter is observed above her mother.
std::optional<core::Day> reversedDay(const core::RankTimeline& t, const Planted& p)
{
    const int d = t.find(p.daughter), m = t.find(p.mother);
    if (d < 0 || m < 0) return std::nullopt;
    std::optional<core::Day> last;
    for (const auto& a : t.females[static_cast<size_t>(d)].points)
        for (const auto& b : t.females[static_cast<size_t>(m)].points)
            if (a.day == b.day && a.rank && b.rank && *a.rank < *b.rank) last = a.day;
    return last;
}

bool hasKey(const QCPGraph* g, double key)
{
    if (!g) return false;
    for (auto it = g->data()->constBegin(); it != g->data()->constEnd(); ++it)
        if (it->key == key && !std::isnan(it->value)) return true;
    return false;
}

void sendClick(QWidget* w, QPointF at)
{
    QMouseEvent press(QEvent::MouseButtonPress, at, w->mapToGlobal(at), Qt::LeftButton, Qt::LeftButton, Qt::NoModifier);
    QCoreApplication::sendEvent(w, &press);
    QMouseEvent release(QEvent::MouseButtonRelease, at, w->mapToGlobal(at), Qt::LeftButton, Qt::NoButton, Qt::NoModifier);
    QCoreApplication::sendEvent(w, &release);
}

class TimelineViewTest : public ::testing::Test {
protected:
    DemoDocument demo;
    ui::AnimalSelection selection;
};

} // namespace

TEST_F(TimelineViewTest, OneLinePerFemaleEverRankedInAPrediction)
{
    ui::RankTimelineView view(demo.document(), &selection);
    finish(view.runner());
    const core::Colony& c = demo.document()->colonyFor({});
    const core::ResidenceIndex& where = demo.document()->residences();
    const core::Matrilines lines(c);
    ASSERT_EQ(view.timeline().checkpoints.size(), 84u); // 2019-01 .. 2025-12 (demo_colony.h)
    // Brute force: the females of predictInheritance at every monthly checkpoint.
    std::set<std::string> ranked;
    for (core::Day d : view.timeline().checkpoints) {
        core::InheritanceOptions o;
        o.at = d;
        for (const auto& f : core::predictInheritance(c, where, lines, o).females) ranked.insert(f.animal);
    }
    EXPECT_EQ(view.visibleLineCount(), static_cast<int>(ranked.size()));
    for (const std::string& id : ranked) EXPECT_NE(view.lineOf(ui::toQString(id)), nullptr) << id;
    // The date slider starts on the last checkpoint.
    ASSERT_TRUE(selection.day().has_value());
    EXPECT_EQ(*selection.day(), view.timeline().checkpoints.back());
}

TEST_F(TimelineViewTest, PlantedDaughterOverMotherIsMarkedDiscordant)
{
    ui::RankTimelineView view(demo.document(), &selection);
    finish(view.runner());
    const Planted p = daughterOverMother();
    const std::optional<core::Day> day = reversedDay(view.timeline(), p);
    ASSERT_TRUE(day.has_value()) << "the planted pair is never observed reversed";
    const double key = ui::RankTimelineView::keyOf(*day);
    // Observed above her mother while predicted below: both carry a discordance marker there.
    EXPECT_TRUE(hasKey(view.discordanceOf(ui::toQString(p.daughter)), key));
    EXPECT_TRUE(hasKey(view.discordanceOf(ui::toQString(p.mother)), key));
    // Shown for the selected female only, unless every female's are asked for.
    EXPECT_FALSE(view.discordanceOf(ui::toQString(p.daughter))->visible());
    selection.setAnimal(ui::toQString(p.daughter));
    EXPECT_TRUE(view.discordanceOf(ui::toQString(p.daughter))->visible());
    EXPECT_FALSE(view.discordanceOf(ui::toQString(p.mother))->visible());
    view.setMarks(ui::RankTimelineView::Marks::All);
    EXPECT_TRUE(view.discordanceOf(ui::toQString(p.mother))->visible());
    const QString hover = view.describe(ui::toQString(p.daughter), *day);
    EXPECT_TRUE(hover.contains(ui::toQString(p.daughter)));
    EXPECT_TRUE(hover.contains(QStringLiteral("Predicted rank:")));
    EXPECT_TRUE(hover.contains(QStringLiteral("Discordant dyads:")));
    EXPECT_TRUE(hover.contains(ui::formatDay(*day)));
}

TEST_F(TimelineViewTest, LifeEventsOfTheScenarioAreMarked)
{
    ui::RankTimelineView view(demo.document(), &selection);
    finish(view.runner());
    const core::DemoColonyFacts facts = core::demoColonyFacts();
    // The one removal and the one introduction of demo_colony.h.
    EXPECT_TRUE(hasKey(view.eventsOf(core::LifeEventKind::Removal), ui::RankTimelineView::keyOf(core::toDay(core::demo::kRemoval))));
    EXPECT_TRUE(hasKey(view.eventsOf(core::LifeEventKind::Introduction),
                       ui::RankTimelineView::keyOf(core::toDay(core::demo::kIntroduction))));
    // Every female's maturity birthday is marked once (all ranked females have a birth date).
    int births = 0;
    for (const auto& f : view.timeline().females) births += f.birth ? 1 : 0;
    EXPECT_EQ(view.eventsOf(core::LifeEventKind::Maturity)->data()->size(), births);
}

TEST_F(TimelineViewTest, FiltersAndScale)
{
    ui::RankTimelineView view(demo.document(), &selection);
    finish(view.runner());
    const core::RankTimeline& t = view.timeline();
    const std::string lineD = core::demoColonyFacts().matriarchs.at('D');
    view.setMatriline(ui::toQString(lineD));
    int inD = 0;
    for (const auto& f : t.females) inD += f.matriarch == lineD ? 1 : 0;
    EXPECT_GT(inD, 2);
    EXPECT_EQ(view.visibleLineCount(), inD);
    view.setMatriline({});
    // Age classes at the selected date (by hand from birth dates).
    const core::Day day = *selection.day();
    int young = 0;
    for (const auto& f : t.females)
        if (f.birth && core::ageInYears(*f.birth, std::min(day, f.points.back().day)) < 8) ++young;
    view.setAgeClass(ui::RankTimelineView::AgeClass::Young);
    EXPECT_EQ(view.visibleLineCount(), young);
    view.setAgeClass(ui::RankTimelineView::AgeClass::All);
    EXPECT_EQ(view.visibleLineCount(), static_cast<int>(t.females.size()));
    // Elo scale: the line holds her ratings.
    view.setScale(ui::RankTimelineView::Scale::Elo);
    const auto& f = t.females.front();
    const QCPGraph* g = view.lineOf(ui::toQString(f.animal));
    ASSERT_NE(g, nullptr);
    for (const auto& pt : f.points)
        if (pt.elo) {
            bool found = false;
            for (auto it = g->data()->constBegin(); it != g->data()->constEnd(); ++it)
                found = found || (it->key == ui::RankTimelineView::keyOf(pt.day) && it->value == *pt.elo);
            EXPECT_TRUE(found) << core::formatDate(pt.day);
        }
    EXPECT_EQ(view.plot()->yAxis->label(), QStringLiteral("Elo rating"));
}

TEST_F(TimelineViewTest, WeeklyStepHasOnePointPerWeek)
{
    ui::RankTimelineView view(demo.document(), &selection);
    view.setStep(core::TimelineStep::Week);
    finish(view.runner());
    // One checkpoint per ISO week meeting the record's first to last encounter (core::periodsCovering).
    const core::EncounterSelection all =
        core::selectEncounters(demo.document()->colonyFor({}), demo.document()->residences(), {});
    EXPECT_EQ(view.timeline().checkpoints.size(),
              core::periodsCovering(*all.firstDay, *all.lastDay, core::PeriodLength::Week).size());
    EXPECT_GT(view.timeline().checkpoints.size(), 360u); // about seven years of weeks
}

TEST_F(TimelineViewTest, ClicksLinkTimelineAndPedigree)
{
    ui::RankTimelineView view(demo.document(), &selection);
    view.resize(1400, 800);
    view.show();
    finish(view.runner());
    view.plot()->replot();
    const Planted p = daughterOverMother();
    // Pedigree -> timeline: clicking the daughter's node selects her; her line is drawn bold.
    ui::PedigreeView* tree = view.pedigree();
    ASSERT_GE(tree->find(ui::toQString(p.daughter)), 0);
    tree->ensureVisible(tree->viewportPosition(ui::toQString(p.daughter)).x(), 0);
    ASSERT_TRUE(tree->clickAt(tree->viewportPosition(ui::toQString(p.daughter))));
    EXPECT_EQ(selection.animal(), ui::toQString(p.daughter));
    EXPECT_GT(view.lineOf(ui::toQString(p.daughter))->pen().widthF(), 3);
    EXPECT_LT(view.lineOf(ui::toQString(p.mother))->pen().color().alpha(), 255);
    // Timeline -> pedigree: a click on the mother's line at a checkpoint selects her.
    const auto& t = view.timeline();
    const auto& mother = t.females[static_cast<size_t>(t.find(p.mother))];
    const auto& pt = mother.points[mother.points.size() / 2];
    ASSERT_TRUE(pt.rank.has_value());
    QCustomPlot* plot = view.plot();
    const QPointF at(plot->xAxis->coordToPixel(ui::RankTimelineView::keyOf(pt.day)), plot->yAxis->coordToPixel(*pt.rank));
    sendClick(plot, at);
    EXPECT_EQ(selection.animal(), ui::toQString(p.mother));
    EXPECT_EQ(*selection.day(), pt.day);
}

TEST_F(TimelineViewTest, PedigreeDrawsMothersAboveDaughtersAndPresence)
{
    ui::PedigreeView tree(demo.document(), &selection);
    const core::Matrilines lines(demo.document()->colonyFor({}));
    const core::DemoColonyFacts facts = core::demoColonyFacts();
    // Every animal of the five female-headed lines is drawn (lineOf lists them, males included).
    EXPECT_EQ(tree.nodes().size(), facts.lineOf.size());
    for (const auto& n : tree.nodes())
        if (n.parent >= 0) EXPECT_GT(n.at.y(), tree.nodes()[static_cast<size_t>(n.parent)].at.y()) << n.id.toStdString();
    // Sisters left to right in birth order.
    for (const auto& n : tree.nodes()) {
        const auto& kids = lines.offspring(lines.index(ui::toStdString(n.id)));
        for (size_t i = 0; i + 1 < kids.size(); ++i) {
            const auto a = lines.birth(kids[i]), b = lines.birth(kids[i + 1]);
            if (!a || !b || *a == *b) continue;
            const int left = *a < *b ? kids[i] : kids[i + 1], right = *a < *b ? kids[i + 1] : kids[i];
            EXPECT_LT(tree.nodes()[static_cast<size_t>(tree.find(ui::toQString(lines.id(left))))].at.x(),
                      tree.nodes()[static_cast<size_t>(tree.find(ui::toQString(lines.id(right))))].at.x());
        }
    }
    // The introduced female is highlighted from her introduction day, the removed one until her removal.
    auto present = [&](const std::string& id) { return tree.nodes()[static_cast<size_t>(tree.find(ui::toQString(id)))].present; };
    selection.setDay(core::toDay(core::demo::kIntroduction) - 1);
    EXPECT_FALSE(present(facts.introducedFemale));
    EXPECT_TRUE(present(facts.removedAnimal));
    selection.setDay(core::toDay(core::demo::kIntroduction));
    EXPECT_TRUE(present(facts.introducedFemale));
    selection.setDay(core::toDay(core::demo::kRemoval) + 1);
    EXPECT_FALSE(present(facts.removedAnimal));
    EXPECT_GT(tree.presentCount(), 20);
}

// Zoom to fit: the whole width of the drawing fits the view, and a click on a
// node still selects that animal; Ctrl+wheel zooms within bounds.
TEST_F(TimelineViewTest, PedigreeZoomsToFitAndClicksStillSelect)
{
    ui::PedigreeView tree(demo.document(), &selection);
    tree.resize(320, 500);
    tree.show();
    // At first the whole drawing is in view: the demo's lines do not fit 320 px at actual size.
    EXPECT_LT(tree.zoom(), 1.0);
    EXPECT_LE(tree.widget()->width(), tree.viewport()->width());
    EXPECT_LE(tree.widget()->height(), tree.viewport()->height() + 1);
    tree.setZoom(1.0);
    const int naturalWidth = tree.widget()->width();
    ASSERT_GT(naturalWidth, tree.viewport()->width());
    tree.zoomToFitWidth();
    EXPECT_LT(tree.zoom(), 1.0);
    EXPECT_LE(tree.widget()->width(), tree.viewport()->width());
    EXPECT_NEAR(tree.widget()->width(), naturalWidth * tree.zoom(), 1.5);
    const Planted p = daughterOverMother();
    const QString daughter = ui::toQString(p.daughter);
    tree.ensureVisible(tree.viewportPosition(daughter).x(), tree.viewportPosition(daughter).y());
    ASSERT_TRUE(tree.clickAt(tree.viewportPosition(daughter)));
    EXPECT_EQ(selection.animal(), daughter);
    // Ctrl + wheel: one notch up enlarges by 15 %, and the zoom stays within its bounds.
    const double before = tree.zoom();
    QWheelEvent up(QPointF(10, 10), tree.mapToGlobal(QPointF(10, 10)), QPoint(), QPoint(0, 120), Qt::NoButton,
                   Qt::ControlModifier, Qt::NoScrollPhase, false);
    QCoreApplication::sendEvent(tree.viewport(), &up);
    EXPECT_NEAR(tree.zoom(), before * 1.15, 1e-9);
    tree.setZoom(100);
    EXPECT_EQ(tree.zoom(), ui::PedigreeView::maxZoom);
    tree.setZoom(1.0);
    EXPECT_EQ(tree.widget()->width(), naturalWidth);
}

TEST_F(TimelineViewTest, UpdatesOnDocumentChangeAndCancelKeepsTheOldResult)
{
    ui::RankTimelineView view(demo.document(), &selection);
    finish(view.runner());
    const size_t females = view.timeline().females.size();
    // An encounter in a new month, written by another connection, then the document re-reads the file.
    core::Encounter e;
    e.date = core::dayFromCivil(2026, 1, 20);
    e.winner = core::demoColonyFacts().matriarchs.at('A');
    e.loser = core::demoColonyFacts().matriarchs.at('C');
    std::vector<core::Animal> noAnimals;
    std::vector<core::Residence> noResidences;
    std::vector<core::Encounter> one{e};
    core::ColonyStore::open(demo.path()).append(noAnimals, noResidences, one);
    demo.document()->reload();
    finish(view.runner());
    EXPECT_EQ(view.timeline().checkpoints.size(), 85u); // one more month
    // A cancelled recomputation leaves the shown timeline as it was.
    bool cancelled = false;
    QObject::connect(view.runner(), &ui::ComputeRunner::finished, [&](bool c) { cancelled = c; });
    view.setStep(core::TimelineStep::Week);
    view.runner()->cancel();
    finish(view.runner());
    EXPECT_TRUE(cancelled);
    EXPECT_EQ(view.timeline().checkpoints.size(), 85u);
    EXPECT_EQ(view.timeline().females.size(), females);
}

TEST_F(TimelineViewTest, PredictionViewShowsThePlantedReversal)
{
    ui::RankTimelineView timeline(demo.document(), &selection);
    finish(timeline.runner());
    const Planted p = daughterOverMother();
    const std::optional<core::Day> day = reversedDay(timeline.timeline(), p);
    ASSERT_TRUE(day.has_value());
    ui::PredictionView view(demo.document(), &selection);
    selection.setDay(*day);
    finish(view.runner());
    EXPECT_EQ(view.prediction().at, *day);
    int observed = 0;
    for (const auto& f : view.prediction().females) observed += f.observedRank ? 1 : 0;
    EXPECT_EQ(view.connectorCount(), observed);
    EXPECT_TRUE(view.isEmphasised(ui::toQString(p.daughter)));
    EXPECT_TRUE(view.isEmphasised(ui::toQString(p.mother)));
    // The dyad list holds the pair under its category (docs/methods.md categories).
    bool listed = false;
    const QTableWidget* table = view.dyadTable();
    EXPECT_EQ(table->rowCount(), view.summary().discordant);
    for (int r = 0; r < table->rowCount(); ++r)
        listed = listed || (table->item(r, 0)->data(Qt::UserRole).toString() == ui::toQString(p.daughter) &&
                            table->item(r, 1)->data(Qt::UserRole).toString() == ui::toQString(p.mother) &&
                            table->item(r, 2)->text() == QStringLiteral("daughter above her mother"));
    EXPECT_TRUE(listed);
    // A concordant female's connector is thin.
    for (const auto& f : view.prediction().females)
        if (f.observedRank && f.discordantDyads == 0) {
            EXPECT_FALSE(view.isEmphasised(ui::toQString(f.animal))) << f.animal;
            break;
        }
}

// The legend stands beside the plot while its entries fit one column of the
// plot's height; in a plot too low for that (as with a centre's many
// matrilines) it goes under the plot, wrapped to its width, so the plot keeps
// the window's width.
TEST_F(TimelineViewTest, LegendBesideWhenItFitsAndUnderWhenItWouldNeedASecondColumn)
{
    ui::RankTimelineView view(demo.document(), &selection);
    finish(view.runner());
    QCustomPlot* plot = view.plot();
    const int entries = plot->legend->itemCount();
    ASSERT_GT(entries, 8);
    const int entryHeight = plot->legend->item(0)->minimumOuterSizeHint().height();
    for (const int height : {entries * (entryHeight + 3) + 200, entries * entryHeight / 2}) {
        view.resize(1000, height);
        view.show();
        QApplication::processEvents();
        plot->replot();
        const QRect legend = plot->legend->outerRect();
        const QRect lines = plot->axisRect()->outerRect();
        if (height > entries * entryHeight) {
            EXPECT_EQ(plot->legend->layout(), plot->plotLayout()->element(0, 1)) << height;
            EXPECT_GE(legend.left(), lines.right()) << height << ": beside the plot";
            EXPECT_EQ(plot->legend->columnCount(), 1) << height << ": one column";
            EXPECT_GT(lines.width(), plot->viewport().width() / 2) << height << ": the legend takes only its width";
        } else {
            EXPECT_EQ(plot->legend->layout(), plot->plotLayout()->element(1, 0)) << height;
            EXPECT_GE(legend.top(), lines.bottom()) << height << ": under the plot";
            EXPECT_GT(plot->legend->columnCount(), 1) << height << ": several columns";
            EXPECT_LE(legend.right(), plot->viewport().right()) << height;
            EXPECT_GT(lines.width(), plot->viewport().width() * 3 / 4) << height << ": the plot keeps the width";
        }
    }
}
