// SPDX-License-Identifier: GPL-3.0-or-later
#include "ui/shell/welcome_panel.h"

#include "ui/shell/about_dialog.h"
#include "ui/widgets/help_browser.h"

#include <QCommandLinkButton>
#include <QDir>
#include <QFileInfo>
#include <QHBoxLayout>
#include <QLabel>
#include <QListWidget>
#include <QPushButton>
#include <QVBoxLayout>

namespace hierloom::ui {

namespace {
QCommandLinkButton* choice(const QString& name, const QString& title, const QString& detail, QWidget* parent)
{
    auto* button = new QCommandLinkButton(title, detail, parent);
    button->setObjectName(name);
    return button;
}
} // namespace

WelcomePanel::WelcomePanel(QWidget* parent)
    : QWidget(parent),
      title_(new QLabel(this)),
      intro_(new QLabel(this)),
      recentTitle_(new QLabel(tr("Recent colonies"), this)),
      recent_(new QListWidget(this))
{
    auto* logo = new QLabel(this);
    logo->setPixmap(applicationIcon().pixmap(QSize(64, 64), devicePixelRatio()));
    QFont font = title_->font();
    font.setPointSizeF(font.pointSizeF() * 1.6);
    title_->setFont(font);
    intro_->setWordWrap(true);
    QFont bold = recentTitle_->font();
    bold.setBold(true);
    recentTitle_->setFont(bold);
    recent_->setObjectName(QStringLiteral("recentList"));
    recent_->setMaximumHeight(recent_->fontMetrics().height() * 9);
    connect(recent_, &QListWidget::itemActivated, this,
            [this](QListWidgetItem* item) { emit recentRequested(item->data(Qt::UserRole).toString()); });

    auto* demo = choice(QStringLiteral("demoButton"), tr("Explore the demo colony"),
                        tr("A made-up group of monkeys with seven years of records. It opens as a read-only copy, "
                           "so nothing you do can break it."),
                        this);
    auto* create = choice(QStringLiteral("newButton"), tr("Create a new colony"),
                          tr("An empty colony file for your own animals and encounters."), this);
    auto* import = choice(QStringLiteral("importButton"), tr("Import CSV files"),
                          tr("Make a new colony from spreadsheet files of animals, groups and encounters."), this);
    auto* open = new QPushButton(tr("&Open a Colony File..."), this);
    open->setObjectName(QStringLiteral("openButton"));
    auto* help = new QPushButton(tr("&Help"), this);
    connect(demo, &QPushButton::clicked, this, &WelcomePanel::demoRequested);
    connect(create, &QPushButton::clicked, this, &WelcomePanel::newRequested);
    connect(import, &QPushButton::clicked, this, &WelcomePanel::importRequested);
    connect(open, &QPushButton::clicked, this, &WelcomePanel::openRequested);
    connect(help, &QPushButton::clicked, this, [this] { showHelp(this, QStringLiteral("index.html")); });

    auto* heading = new QHBoxLayout;
    heading->addWidget(logo);
    heading->addSpacing(12);
    heading->addWidget(title_, 1);
    auto* more = new QHBoxLayout;
    more->addWidget(open);
    more->addWidget(help);
    more->addStretch(1);

    // One column of readable width in the middle of the window.
    auto* column = new QVBoxLayout;
    column->addLayout(heading);
    column->addSpacing(8);
    column->addWidget(intro_);
    column->addSpacing(8);
    column->addWidget(recentTitle_);
    column->addWidget(recent_);
    column->addWidget(demo);
    column->addWidget(create);
    column->addWidget(import);
    column->addSpacing(8);
    column->addLayout(more);
    auto* holder = new QWidget(this);
    holder->setLayout(column);
    holder->setFixedWidth(fontMetrics().averageCharWidth() * 76);

    auto* row = new QHBoxLayout;
    row->addStretch(1);
    row->addWidget(holder);
    row->addStretch(1);
    auto* layout = new QVBoxLayout(this);
    layout->addStretch(1);
    layout->addLayout(row);
    layout->addStretch(2);

    setRecentFiles({});
}

void WelcomePanel::setRecentFiles(const QStringList& files)
{
    firstRun_ = files.isEmpty();
    recent_->clear();
    for (const QString& path : files) {
        auto* item = new QListWidgetItem(
            tr("%1   (%2)").arg(QFileInfo(path).fileName(), QDir::toNativeSeparators(QFileInfo(path).absolutePath())),
            recent_);
        item->setData(Qt::UserRole, path);
        item->setToolTip(QDir::toNativeSeparators(path));
    }
    recentTitle_->setVisible(!firstRun_);
    recent_->setVisible(!firstRun_);
    if (firstRun_) {
        title_->setText(tr("Welcome to Hierloom"));
        intro_->setText(tr("Hierloom keeps the records of an animal colony and shows who ranks above whom. "
                           "New here? Start with the demo colony."));
    } else {
        title_->setText(tr("No colony is open"));
        intro_->setText(tr("Open a recent colony (double-click it), or choose below."));
    }
}

} // namespace hierloom::ui
