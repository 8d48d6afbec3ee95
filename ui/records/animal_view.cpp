// SPDX-License-Identifier: GPL-3.0-or-later
#include "ui/records/animal_view.h"

#include "ui/records/animal_filter_proxy.h"
#include "ui/records/animal_table_model.h"
#include "ui/document/colony_document.h"
#include "ui/widgets/table_columns.h"

#include <QComboBox>
#include <QHBoxLayout>
#include <QHeaderView>
#include <QLabel>
#include <QLineEdit>
#include <QTableView>
#include <QVBoxLayout>

namespace hierloom::ui {

AnimalView::AnimalView(ColonyDocument* document, QWidget* parent)
    : QWidget(parent),
      model_(new AnimalTableModel(document, this)),
      proxy_(new AnimalFilterProxy(this)),
      search_(new QLineEdit(this)),
      status_(new QComboBox(this)),
      summary_(new QLabel(this)),
      table_(new QTableView(this))
{
    proxy_->setSourceModel(model_);

    search_->setPlaceholderText(tr("ID, name, mother or matriarch"));
    search_->setClearButtonEnabled(true);
    auto* searchLabel = new QLabel(tr("F&ind:"), this);
    searchLabel->setBuddy(search_);
    status_->addItem(tr("All animals"));
    status_->addItem(tr("Present only"));
    auto* statusLabel = new QLabel(tr("&Show:"), this);
    statusLabel->setBuddy(status_);

    auto* filters = new QHBoxLayout;
    filters->addWidget(searchLabel);
    filters->addWidget(search_, 1);
    filters->addSpacing(12);
    filters->addWidget(statusLabel);
    filters->addWidget(status_);
    filters->addSpacing(12);
    filters->addWidget(summary_);

    table_->setModel(proxy_);
    table_->setSortingEnabled(true);
    table_->sortByColumn(AnimalTableModel::Id, Qt::AscendingOrder);
    table_->setSelectionBehavior(QAbstractItemView::SelectRows);
    table_->setAlternatingRowColors(true);
    table_->verticalHeader()->hide();
    // Compact rows: a colony's tables are read like a ledger.
    table_->verticalHeader()->setDefaultSectionSize(table_->fontMetrics().height() + 8);
    table_->horizontalHeader()->setStretchLastSection(true);

    auto* layout = new QVBoxLayout(this);
    layout->addLayout(filters);
    layout->addWidget(table_, 1);

    connect(search_, &QLineEdit::textChanged, proxy_, &AnimalFilterProxy::setText);
    connect(status_, &QComboBox::currentIndexChanged, this, [this](int i) { proxy_->setPresentOnly(i == 1); });
    connect(proxy_, &QAbstractItemModel::modelReset, this, &AnimalView::updateSummary);
    connect(proxy_, &QAbstractItemModel::rowsInserted, this, &AnimalView::updateSummary);
    connect(proxy_, &QAbstractItemModel::rowsRemoved, this, &AnimalView::updateSummary);
    connect(proxy_, &QAbstractItemModel::layoutChanged, this, &AnimalView::updateSummary);
    connect(model_, &QAbstractItemModel::modelReset, this, [this] { fitColumns(table_); });
    fitColumns(table_);
    updateSummary();
}

int AnimalView::visibleRowCount() const { return proxy_->rowCount(); }

void AnimalView::setFilterText(const QString& text) { search_->setText(text); }

void AnimalView::setPresentOnly(bool presentOnly) { status_->setCurrentIndex(presentOnly ? 1 : 0); }

void AnimalView::updateSummary()
{
    summary_->setText(tr("%1 of %2 animals").arg(proxy_->rowCount()).arg(model_->rowCount()));
}

} // namespace hierloom::ui
