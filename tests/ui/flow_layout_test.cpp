// SPDX-License-Identifier: GPL-3.0-or-later
// FlowLayout (ui/widgets/flow_layout.h): one row when the width allows, more
// rows when it does not, a group never split, the minimum width that of the
// widest item.
#include "ui/widgets/flow_layout.h"

#include <QLabel>
#include <QPushButton>
#include <QWidget>

#include <gtest/gtest.h>

#include <algorithm>

using namespace hierloom;

namespace {

struct Row {
    QWidget host;
    ui::FlowLayout* layout = new ui::FlowLayout(&host);
    QPushButton* first = new QPushButton(QStringLiteral("First button"), &host);
    QLabel* label = new QLabel(QStringLiteral("A label:"), &host);
    QPushButton* field = new QPushButton(QStringLiteral("Its field"), &host);
    QPushButton* last = new QPushButton(QStringLiteral("The last button of the row"), &host);

    Row()
    {
        layout->setContentsMargins(0, 0, 0, 0);
        layout->addWidget(first);
        layout->addGroup({label, field});
        layout->addWidget(last);
    }
    int oneRowWidth() const { return layout->sizeHint().width(); }
    void layOut(int width)
    {
        layout->setGeometry(QRect(0, 0, width, layout->heightForWidth(width)));
    }
};

} // namespace

TEST(FlowLayout, OneRowWhenWideMoreRowsWhenNarrow)
{
    Row row;
    const int wide = row.oneRowWidth();
    row.layOut(wide);
    EXPECT_EQ(row.first->y(), row.last->y()) << "all on one row";
    EXPECT_LT(row.first->x(), row.label->x());
    EXPECT_LT(row.field->x(), row.last->x());
    EXPECT_EQ(row.layout->heightForWidth(wide), row.layout->sizeHint().height());

    // Too narrow for the last button beside the others: it starts the second row.
    const int narrow = wide - row.last->sizeHint().width() / 2;
    row.layOut(narrow);
    EXPECT_EQ(row.first->y(), row.label->y());
    EXPECT_GT(row.last->y(), row.first->y() + row.first->height() - 1);
    EXPECT_EQ(row.last->x(), 0);
    EXPECT_GT(row.layout->heightForWidth(narrow), row.layout->heightForWidth(wide));
}

TEST(FlowLayout, AGroupIsNeverSplitAndTheMinimumIsTheWidestItem)
{
    Row row;
    int widest = 0;
    for (QWidget* w : {static_cast<QWidget*>(row.first), static_cast<QWidget*>(row.last)})
        widest = std::max(widest, w->minimumSizeHint().width());
    EXPECT_GE(row.layout->minimumSize().width(), widest);
    EXPECT_LT(row.layout->minimumSize().width(), row.oneRowWidth());
    // At its minimum width every item has a row of its own, the label beside its field.
    row.layOut(row.layout->minimumSize().width());
    EXPECT_EQ(row.label->y() + row.label->height() / 2, row.field->y() + row.field->height() / 2);
    EXPECT_LT(row.label->x(), row.field->x());
    EXPECT_GT(row.label->y(), row.first->y());
    EXPECT_GT(row.last->y(), row.field->y());
    EXPECT_LE(row.last->x() + row.last->width(), row.layout->minimumSize().width());
}
