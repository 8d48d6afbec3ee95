// SPDX-License-Identifier: GPL-3.0-or-later
// The Support tab on the demo colony shows the core's figures (one code path)
// with the matrix in rank order and its matriline strips.
#include "ui/analysis/support_view.h"

#include "ui/analysis/rank_flag_watch.h"

#include "core/pedigree/matriline.h"
#include "core/research/support_tables.h"
#include "plot_test_support.h"
#include "ui/document/qt_convert.h"
#include "ui/widgets/matriline_palette.h"

#include <QLabel>
#include <QTableWidget>

#include <gtest/gtest.h>

using namespace hierloom;
using hierloom::test::DemoDocument;

TEST(SupportView, TablesAreTheCoreTablesAndTheMatrixCarriesMatrilineStrips)
{
    DemoDocument demo;
    ui::SupportView view(demo.document());
    view.setPermutations(0);
    hierloom::test::finish(view.runner()); // computed on a worker thread
    const core::SupportAnalysis& a = view.analysis();
    ASSERT_GT(a.acts, 0);
    // Identity with the core's table (what `support --table pairs` prints).
    const core::ExportTable pairs = core::supportPairsTable(a);
    ASSERT_EQ(view.pairTable()->rowCount(), static_cast<int>(pairs.rows.size()));
    for (int c = 0; c < 7; ++c)
        EXPECT_EQ(view.pairTable()->item(3, c)->text(), ui::toQString(pairs.rows[3][static_cast<size_t>(c)]));
    // The matrix: strip row and column, then one row and column per animal in rank order.
    const int n = static_cast<int>(a.order.size());
    ASSERT_EQ(view.matrixTable()->rowCount(), n + 1);
    const ui::MatrilinePalette palette(core::Matrilines(demo.document()->colonyFor({})));
    for (int i = 0; i < n; ++i) {
        // The rank-ordered names, a flagged one with the data-health mark (rank_flag_views_test.cpp).
        const std::string& id = a.order[static_cast<size_t>(i)];
        EXPECT_EQ(view.matrixTable()->verticalHeaderItem(i + 1)->text(), view.flags()->marked(ui::toQString(id), id));
        EXPECT_EQ(view.matrixTable()->item(i + 1, 0)->background().color(),
                  palette.colour(a.matriarchs[static_cast<size_t>(i)]));
        EXPECT_EQ(view.matrixTable()->item(0, i + 1)->background().color(),
                  palette.colour(a.matriarchs[static_cast<size_t>(i)]));
    }
    // A cell is given/opportunities of the row animal for the column animal.
    const core::SupportPair& p = a.pairs.front();
    const auto row = std::find(a.order.begin(), a.order.end(), p.supporter) - a.order.begin();
    const auto col = std::find(a.order.begin(), a.order.end(), p.beneficiary) - a.order.begin();
    EXPECT_EQ(view.matrixTable()->item(static_cast<int>(row) + 1, static_cast<int>(col) + 1)->text(),
              QStringLiteral("%1/%2").arg(p.given).arg(p.opportunities));
    EXPECT_TRUE(view.summary()->text().contains(QStringLiteral("nepotism index"))) << view.summary()->text().toStdString();
}
