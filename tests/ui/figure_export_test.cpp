// SPDX-License-Identifier: GPL-3.0-or-later
// Every plot as a journal figure: laid out at one and two columns (85 and 175
// mm) its text boxes neither overlap nor leave the page and none is under
// 7 pt; the files have the sizes asked for; the caption names the method and
// the program; exports stay on white under the dark palette; months without
// encounters are gaps in every series.
#include "ui/analysis/hierarchy_plots_view.h"
#include "ui/analysis/matrix_view.h"
#include "ui/analysis/prediction_view.h"
#include "ui/analysis/rank_timeline_view.h"
#include "ui/analysis/sex_ratio_view.h"
#include "ui/document/animal_selection.h"
#include "ui/document/colony_edit_facade.h"
#include "ui/planning/stability_view.h"
#include "ui/widgets/figure_text_boxes.h"
#include "ui/widgets/plot_export.h"
#include "ui/widgets/plot_palette.h"

#include "core/store/colony_store.h"
#include "plot_test_support.h"

#include <QDir>
#include <QFile>
#include <QImage>
#include <QRegularExpression>
#include <QSettings>

#include <gtest/gtest.h>
#include <qcustomplot.h>

#include <cmath>
#include <memory>

using namespace hierloom;
using hierloom::test::DemoDocument;
using hierloom::test::finish;
using hierloom::test::TempDir;

namespace {

struct FigureView {
    QString name;
    std::unique_ptr<QWidget> view;
    const ui::PlotFigure& figure() const { return view->findChild<ui::FigureExportButton*>()->figure(); }
};

/// Every view with a plot, on the demo colony, computed.
std::vector<FigureView> figureViews(DemoDocument& demo, ui::AnimalSelection& selection)
{
    std::vector<FigureView> out;
    auto hierarchy = std::make_unique<ui::HierarchyPlotsView>(demo.document());
    finish(hierarchy->runner());
    out.push_back({QStringLiteral("hierarchy"), std::move(hierarchy)});
    auto matrix = std::make_unique<ui::MatrixView>(demo.document());
    matrix->setWindow(std::nullopt, std::nullopt);
    finish(matrix->runner());
    out.push_back({QStringLiteral("matrix"), std::move(matrix)});
    auto prediction = std::make_unique<ui::PredictionView>(demo.document(), &selection);
    finish(prediction->runner());
    out.push_back({QStringLiteral("prediction"), std::move(prediction)});
    auto timeline = std::make_unique<ui::RankTimelineView>(demo.document(), &selection);
    finish(timeline->runner());
    out.push_back({QStringLiteral("timeline"), std::move(timeline)});
    out.push_back({QStringLiteral("sex-ratio"), std::make_unique<ui::SexRatioView>(demo.facade())});
    out.push_back({QStringLiteral("stability"), std::make_unique<ui::StabilityView>(demo.facade())});
    return out;
}

QByteArray readAll(const QString& path)
{
    QFile f(path);
    return f.open(QIODevice::ReadOnly) ? f.readAll() : QByteArray();
}

} // namespace

TEST(FigureLayoutCheck, FindsOverlapClippingAndSmallText)
{
    // Hand-made boxes on an 85 x 60 mm page (321 x 227 units of 1/96 inch).
    const ui::FigureSize size{85, 60, 300};
    const std::vector<ui::FigureTextBox> fine{{QStringLiteral("a"), QRectF(10, 10, 40, 12), 7.5},
                                              {QStringLiteral("b"), QRectF(10, 22, 40, 12), 7.5}}; // touching only
    EXPECT_TRUE(ui::figureLayoutProblems(fine, size).isEmpty());
    const std::vector<ui::FigureTextBox> overlap{{QStringLiteral("a"), QRectF(10, 10, 40, 12), 8},
                                                 {QStringLiteral("b"), QRectF(30, 15, 40, 12), 8}};
    EXPECT_EQ(ui::figureLayoutProblems(overlap, size).size(), 1);
    const std::vector<ui::FigureTextBox> outside{{QStringLiteral("h' (de Vries 1995)"), QRectF(300, 10, 60, 12), 8}};
    EXPECT_EQ(ui::figureLayoutProblems(outside, size).size(), 1);
    const std::vector<ui::FigureTextBox> small{{QStringLiteral("x"), QRectF(10, 10, 5, 8), 6.9}};
    EXPECT_EQ(ui::figureLayoutProblems(small, size).size(), 1);
}

// The plots as exported at both journal widths, checked from the text the
// figure draws (each line's box as the painter places it).
TEST(FigureExport, EveryPlotAtBothWidthsKeepsItsTextApartAndOnThePage)
{
    DemoDocument demo;
    ui::AnimalSelection selection;
    const std::vector<FigureView> views = figureViews(demo, selection);
    ASSERT_EQ(views.size(), 6u);
    const QString dir = qEnvironmentVariable("HIERLOOM_FIGURE_DIR"); // to look at them: set it to a folder
    for (const FigureView& v : views) {
        const ui::PlotFigure& figure = v.figure();
        ASSERT_NE(figure.plot, nullptr) << v.name.toStdString();
        for (bool doubleColumn : {false, true}) {
            const ui::FigureSize size = figure.size(doubleColumn);
            EXPECT_EQ(size.widthMm, doubleColumn ? 175 : 85);
            const std::vector<ui::FigureTextBox> boxes = ui::figureTextBoxes(figure, size);
            const QStringList problems = ui::figureLayoutProblems(boxes, size);
            EXPECT_TRUE(problems.isEmpty()) << v.name.toStdString() << " at " << size.widthMm << " mm:\n"
                                            << problems.join(QLatin1Char('\n')).toStdString();
            EXPECT_GT(boxes.size(), 8u) << v.name.toStdString();
            QString all;
            for (const ui::FigureTextBox& b : boxes) all += b.text + QLatin1Char('\n');
            // Title and caption lines: the program and its version end the caption.
            EXPECT_TRUE(all.contains(QStringLiteral("Hierloom "))) << v.name.toStdString();
            for (const QString& word : figure.title.split(QLatin1Char(' ')))
                EXPECT_TRUE(all.contains(word)) << v.name.toStdString() << ": " << word.toStdString();
            if (!dir.isEmpty())
                ui::exportFigure(figure, QStringLiteral("%1/%2-%3mm.png").arg(dir, v.name).arg(size.widthMm), size);
        }
        // The plot is given back as it was: its on-screen size and fonts.
        EXPECT_GT(figure.plot->axisRects().size(), 0);
    }
}

TEST(FigureExport, CaptionNamesGroupWindowMethodAndVersion)
{
    DemoDocument demo;
    ui::MatrixView matrix(demo.document());
    matrix.setMethod(core::RankMethod::Elo);
    matrix.setWindow(core::dayFromCivil(2024, 1, 1), core::dayFromCivil(2024, 12, 31));
    finish(matrix.runner());
    const QString caption = ui::figureCaption(matrix.findChild<ui::FigureExportButton*>()->figure());
    for (const char* part : {"all groups", "2024-01-01 to 2024-12-31", "Elo rating (k 100, start 1000, logistic curve",
                             "Hierloom "})
        EXPECT_TRUE(caption.contains(QString::fromUtf8(part))) << caption.toStdString() << " lacks " << part;
}

TEST(FigureExport, PngSvgAndPdfAtJournalSizes)
{
    DemoDocument demo;
    ui::HierarchyPlotsView view(demo.document());
    finish(view.runner());
    const ui::PlotFigure& figure = view.findChild<ui::FigureExportButton*>()->figure();
    TempDir dir;
    for (bool doubleColumn : {false, true}) {
        const ui::FigureSize size = figure.size(doubleColumn);
        const double pointsWide = size.widthMm / 25.4 * 72, pointsHigh = size.heightMm / 25.4 * 72;
        const QString base = QString::fromStdString(dir.file(doubleColumn ? "two" : "one"));
        ASSERT_TRUE(ui::exportFigure(figure, base + QStringLiteral(".png"), size));
        const QImage image(base + QStringLiteral(".png"));
        // 85 mm at 300 dpi = 1004 px, 175 mm = 2067 px (mm / 25.4 * 300).
        EXPECT_NEAR(image.width(), doubleColumn ? 2067 : 1004, 2);
        EXPECT_NEAR(image.height(), size.heightMm / 25.4 * 300, 2);
        EXPECT_NEAR(image.dotsPerMeterX(), 300 / 0.0254, 2);
        ASSERT_TRUE(ui::exportFigure(figure, base + QStringLiteral(".svg"), size));
        const QString svg = QString::fromUtf8(readAll(base + QStringLiteral(".svg")));
        const QRegularExpression width(QStringLiteral("width=\"([0-9.]+)mm\""));
        const auto w = width.match(svg);
        ASSERT_TRUE(w.hasMatch());
        EXPECT_NEAR(w.captured(1).toDouble(), size.widthMm, 0.5);
        EXPECT_TRUE(svg.contains(QStringLiteral("Hierloom ")));
        ASSERT_TRUE(ui::exportFigure(figure, base + QStringLiteral(".pdf"), size));
        const QByteArray pdf = readAll(base + QStringLiteral(".pdf"));
        EXPECT_TRUE(pdf.startsWith("%PDF"));
        const QRegularExpression box(QStringLiteral("/MediaBox \\[0 0 ([0-9.]+) ([0-9.]+)\\]"));
        const auto m = box.match(QString::fromLatin1(pdf));
        ASSERT_TRUE(m.hasMatch());
        EXPECT_NEAR(m.captured(1).toDouble(), pointsWide, 1); // 85 mm = 240.9 pt, 175 mm = 496.1 pt
        EXPECT_NEAR(m.captured(2).toDouble(), pointsHigh, 1);
    }
    EXPECT_FALSE(ui::exportFigure(figure, QString::fromStdString(dir.file("x.bmp")), figure.size(true)));
}

TEST(FigureExport, DarkPaletteOnScreenWhitePaperInTheFile)
{
    DemoDocument demo;
    QWidget root;
    auto* view = new ui::HierarchyPlotsView(demo.document(), &root);
    finish(view->runner());
    ui::setPlotPalette(&root, ui::PlotPalette::Dark);
    view->plot()->replot(QCustomPlot::rpImmediateRefresh);
    const ui::PlotColours dark = ui::plotColours(ui::PlotPalette::Dark);
    EXPECT_EQ(view->plot()->axisRect(0)->axis(QCPAxis::atLeft)->tickLabelColor(), dark.text);
    EXPECT_EQ(ui::plotPalette(view->plot()), ui::PlotPalette::Dark);
    EXPECT_EQ(ui::storedPlotPalette(), ui::PlotPalette::Dark);
    TempDir dir;
    const QString png = QString::fromStdString(dir.file("dark.png"));
    ASSERT_TRUE(ui::exportFigure(view->findChild<ui::FigureExportButton*>()->figure(), png,
                                 view->findChild<ui::FigureExportButton*>()->figure().size(false)));
    const QImage image(png);
    EXPECT_EQ(image.pixelColor(3, 3), QColor(Qt::white));
    EXPECT_EQ(image.pixelColor(image.width() - 3, image.height() / 2), QColor(Qt::white));
    // Back on screen the plot is dark again.
    view->plot()->replot(QCustomPlot::rpImmediateRefresh);
    EXPECT_EQ(view->plot()->axisRect(0)->axis(QCPAxis::atLeft)->tickLabelColor(), dark.text);
    ui::setPlotPalette(&root, ui::PlotPalette::Light);
    view->plot()->replot(QCustomPlot::rpImmediateRefresh);
    EXPECT_EQ(view->plot()->axisRect(0)->axis(QCPAxis::atLeft)->tickLabelColor(), QColor(Qt::black));
}

namespace {

/// Group A with encounters in January and March 2020 only: February is empty.
std::string colonyWithAnEmptyMonth(TempDir& dir)
{
    const std::string path = dir.file("gap.hierloom");
    core::ColonyStore store = core::ColonyStore::create(path);
    std::vector<core::Animal> animals;
    std::vector<core::Residence> stays;
    for (const char* id : {"A1", "A2", "A3", "A4"}) {
        core::Animal a;
        a.id = id;
        a.sex = core::Sex::Female;
        a.entry = core::dayFromCivil(2010, 1, 1);
        a.entryType = core::EntryType::Founder;
        animals.push_back(a);
        stays.push_back({id, "A", *a.entry, std::nullopt, {}});
    }
    std::vector<core::Encounter> encounters;
    const char* order[] = {"A1", "A2", "A3", "A4"};
    for (int month : {1, 3})
        for (int day = 1; day <= 24; ++day) {
            core::Encounter e;
            e.date = core::dayFromCivil(2020, month, day);
            const int a = day % 4, b = (day / 4 + a + 1) % 4;
            if (a == b) continue;
            // Mostly the higher animal wins; in March the order of A3 and A4 turns.
            const bool turn = month == 3 && ((a == 2 && b == 3) || (a == 3 && b == 2));
            e.winner = order[(a < b) != turn ? a : b];
            e.loser = order[(a < b) != turn ? b : a];
            e.group = "A";
            encounters.push_back(e);
        }
    store.append(animals, stays, encounters);
    return path;
}

bool isGapAt(const QCPGraph* g, int index) { return std::isnan(g->data()->at(index)->value); }

} // namespace

TEST(EmptyPeriods, AreGapsInEveryHierarchySeries)
{
    TempDir dir;
    ui::ColonyDocument document;
    document.open(QString::fromStdString(colonyWithAnEmptyMonth(dir)));
    ui::HierarchyPlotsView view(&document);
    finish(view.runner());
    ASSERT_EQ(view.series().months.size(), 3u); // January, February, March
    ASSERT_EQ(view.series().months[1].encounters, 0);
    using P = ui::HierarchyPlotsView;
    for (P::Panel p : {P::HPrime, P::Steepness, P::TTri, P::Conformity}) {
        const auto* g = qobject_cast<const QCPGraph*>(view.plottable(p));
        ASSERT_NE(g, nullptr);
        ASSERT_EQ(g->dataCount(), 3);
        EXPECT_TRUE(isGapAt(g, 1)) << "panel " << p << " draws February";
    }
    // Conformity is defined in January (the core carries it into February); the plot does not.
    const auto* conformity = qobject_cast<const QCPGraph*>(view.plottable(P::Conformity));
    EXPECT_FALSE(isGapAt(conformity, 0));
    // The count of encounters is a count: zero, not a gap.
    const auto* bars = qobject_cast<const QCPBars*>(view.plottable(P::Encounters));
    EXPECT_EQ(bars->data()->at(1)->value, 0.0);
}

TEST(EmptyPeriods, AreGapsInEveryStabilitySeries)
{
    TempDir dir;
    const std::string path = colonyWithAnEmptyMonth(dir);
    ui::ColonyDocument document;
    document.open(QString::fromStdString(path));
    ui::ColonyEditFacade facade(&document);
    ui::StabilityView view(&facade);
    view.setGroup(QStringLiteral("A"));
    view.setPeriodLength(core::PeriodLength::Month);
    ASSERT_EQ(view.series().periods.size(), 3u);
    ASSERT_EQ(view.series().periods[1].encounters, 0);
    for (int p = 0; p < 3; ++p) {
        // The first graph of each panel is its series (then the alert marks and the threshold).
        const QCPGraph* line = view.plot()->axisRect(p)->graphs().front();
        ASSERT_EQ(line->dataCount(), 3);
        EXPECT_TRUE(isGapAt(line, 1)) << "panel " << p << " draws February";
    }
    // March's rank change is drawn (A3 and A4 changed places), February's is not a zero.
    const QCPGraph* change = view.plot()->axisRect(2)->graphs().front();
    EXPECT_FALSE(isGapAt(change, 2));
}
