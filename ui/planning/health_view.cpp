// SPDX-License-Identifier: GPL-3.0-or-later
#include "ui/planning/health_view.h"

#include "core/base/number_format.h"
#include "ui/document/colony_document.h"
#include "ui/document/compute_runner.h"
#include "ui/document/document_queries.h"
#include "ui/document/document_settings.h"
#include "ui/document/qt_convert.h"
#include "ui/document/visible_refresh.h"
#include "ui/widgets/flow_layout.h"
#include "ui/widgets/help_button.h"
#include "ui/widgets/progress_strip.h"
#include "ui/widgets/typed_date.h"

#include <QComboBox>
#include <QCoreApplication>
#include <QFormLayout>
#include <QHBoxLayout>
#include <QHeaderView>
#include <QLabel>
#include <QLineEdit>
#include <QSpinBox>
#include <QTabWidget>
#include <QTreeWidget>
#include <QVBoxLayout>

namespace hierloom::ui {

namespace {

/// Orders of randomised Elo for the interval widths on screen (the command line's default is 1000).
constexpr int kViewRandomisations = 500;

QTreeWidget* makeList(const QStringList& headers, QWidget* parent)
{
    auto* list = new QTreeWidget(parent);
    list->setHeaderLabels(headers);
    list->setRootIsDecorated(false);
    list->setAlternatingRowColors(true);
    list->setSortingEnabled(false);
    list->header()->setSectionResizeMode(QHeaderView::ResizeToContents);
    return list;
}

QString dateText(const std::optional<core::Day>& d) { return d ? toQString(core::formatDate(*d)) : QString(); }

QString number(const std::optional<double>& v) { return toQString(core::formatNumber(v)); }
/// Rating points as read on screen (the exact value is in the tooltip and the command line).
QString points(const std::optional<double>& v) { return v ? QString::number(*v, 'f', 0) : QString(); }

} // namespace

HealthView::HealthView(ColonyDocument* document, QWidget* parent)
    : QWidget(parent),
      document_(document),
      runner_(new ComputeRunner(this)),
      progress_(new ProgressStrip(runner_, tr("the data health"), this)),
      group_(new QComboBox(this)),
      from_(new QLineEdit(this)),
      to_(new QLineEdit(this)),
      unseenDays_(new QSpinBox(this)),
      minEncounters_(new QSpinBox(this)),
      matchMinutes_(new QSpinBox(this)),
      problem_(new QLabel(this)),
      banner_(new QLabel(this)),
      tabs_(new QTabWidget(this)),
      animals_(makeList({tr("Animal"), tr("Encounters"), tr("Days seen"), tr("Last seen"), tr("Too few for a rank"),
                         tr("Elo interval width")},
                        this)),
      observers_(makeList({tr("Observer"), tr("Encounters"), tr("Days")}, this)),
      months_(makeList({tr("Month"), tr("Encounters"), tr("Days"), tr("Animals")}, this)),
      unseen_(makeList({tr("Animal"), tr("Last seen"), tr("Since"), tr("Days unseen")}, this)),
      agreement_(makeList({tr("Observer"), tr("Observer"), tr("Shared days"), tr("Matched"), tr("Only first"),
                           tr("Only second"), tr("Agreeing"), tr("Agreement"), tr("Cohen's kappa")},
                          this))
{
    setObjectName(QStringLiteral("health"));
    group_->setObjectName(QStringLiteral("healthGroup"));
    from_->setObjectName(QStringLiteral("healthFrom"));
    to_->setObjectName(QStringLiteral("healthTo"));
    from_->setPlaceholderText(tr("first record"));
    to_->setPlaceholderText(tr("last record"));
    unseenDays_->setRange(0, 100000);
    unseenDays_->setValue(core::kDefaultUnseenDays);
    unseenDays_->setObjectName(QStringLiteral("healthUnseenDays"));
    minEncounters_->setRange(0, 1000000);
    minEncounters_->setValue(core::kDefaultMinEncounters);
    minEncounters_->setObjectName(QStringLiteral("healthMinEncounters"));
    matchMinutes_->setRange(0, 1440);
    matchMinutes_->setValue(core::kDefaultMatchMinutes);
    matchMinutes_->setObjectName(QStringLiteral("healthMatchMinutes"));

    // One row on a wide screen; on a small one the controls go on in a second row.
    auto* controls = new FlowLayout;
    controls->addGroup({new QLabel(tr("Group:"), this), group_});
    controls->addGroup({new QLabel(tr("From:"), this), from_});
    controls->addGroup({new QLabel(tr("To:"), this), to_});
    controls->addGroup({new QLabel(tr("Not seen for more than (days):"), this), unseenDays_});
    controls->addGroup({new QLabel(tr("Fewest encounters for a rank:"), this), minEncounters_});
    controls->addGroup({new QLabel(tr("Match within (min):"), this), matchMinutes_});
    controls->addWidget(new HelpButton(QStringLiteral("data_health"), this));
    problem_->setObjectName(QStringLiteral("healthProblem"));
    problem_->setStyleSheet(QStringLiteral("QLabel { color: #b00000; }"));
    problem_->hide();

    banner_->setObjectName(QStringLiteral("healthUnseenBanner"));
    banner_->setWordWrap(true);
    banner_->setStyleSheet(QStringLiteral("QLabel { background: #fde2dc; color: #7a0000; border: 1px solid #cc0000;"
                                          " border-radius: 3px; padding: 4px 6px; font-weight: bold; }"));
    banner_->hide();

    tabs_->addTab(animals_, tr("Animals"));
    tabs_->addTab(unseen_, tr("Not seen"));
    tabs_->addTab(observers_, tr("Observers"));
    tabs_->addTab(months_, tr("Months"));
    tabs_->addTab(agreement_, tr("Observer agreement"));

    auto* layout = new QVBoxLayout(this);
    layout->addLayout(controls);
    layout->addWidget(problem_);
    layout->addWidget(progress_);
    layout->addWidget(banner_);
    layout->addWidget(tabs_, 1);

    connect(progress_, &ProgressStrip::retry, this, &HealthView::recompute);
    connect(group_, &QComboBox::currentTextChanged, this, &HealthView::recompute);
    for (QLineEdit* e : {from_, to_}) connect(e, &QLineEdit::editingFinished, this, &HealthView::recompute);
    for (QSpinBox* s : {unseenDays_, minEncounters_, matchMinutes_})
        connect(s, &QSpinBox::valueChanged, this, &HealthView::recompute);
    auto* refresh = new VisibleRefresh(this, [this] {
        refreshGroups();
        recompute();
    });
    connect(document_, &ColonyDocument::changed, refresh, &VisibleRefresh::request);
    refreshGroups();
    recompute();
}

HealthView::~HealthView()
{
    // Closing the window takes the focus out of a field, whose editingFinished
    // must not recompute a view whose members are already gone.
    for (QWidget* child : findChildren<QWidget*>()) disconnect(child, nullptr, this, nullptr);
}

void HealthView::setGroup(const QString& group) { group_->setCurrentText(group); }

void HealthView::refreshGroups()
{
    const QString current = group_->currentText();
    const QSignalBlocker block(group_);
    group_->clear();
    group_->addItem(tr("(every group)"), QString());
    for (const QString& g : groupsWithEncounters(document_)) group_->addItem(g, g);
    const int at = group_->findText(current);
    group_->setCurrentIndex(at >= 0 ? at : 0);
}

void HealthView::recompute()
{
    for (QTreeWidget* list : {animals_, observers_, months_, unseen_, agreement_}) list->clear();
    health_ = {};
    banner_->hide();
    problem_->hide();
    if (!document_->isOpen()) {
        runner_->cancel();
        return;
    }
    // A large file read group by group: reading this group announces a change,
    // which has recomputed this view (or marked it stale) already.
    if (document_->holdGroup(group_->currentData().toString())) return;
    core::HealthOptions o;
    o.group = toStdString(group_->currentData().toString());
    o.today = core::today();
    o.unseenDays = unseenDays_->value();
    o.minEncounters = minEncounters_->value();
    o.matchMinutes = matchMinutes_->value();
    o.randomisations = kViewRandomisations;
    o.threads = 1;
    o.elo = documentAnalysisSettings(document_).elo;
    for (auto [field, slot] : {std::pair{from_, &o.from}, std::pair{to_, &o.to}}) {
        if (field->text().trimmed().isEmpty()) continue;
        *slot = parseTypedDate(field->text());
        if (!*slot) {
            runner_->cancel();
            problem_->setText(typedDateProblem(field->text()));
            problem_->show();
            return;
        }
    }
    // The randomised-Elo widths take a while on a long record: off the interface thread.
    const ColonyDocument::Snapshot snapshot = document_->snapshot();
    runner_->start([this, snapshot = snapshot, o](const std::atomic<bool>& cancel, const ComputeRunner::Progress&) mutable {
        // Every group's encounters (an animal's last sighting counts in any
        // group), read from the shared compact records without expanding them.
        const std::shared_ptr<const core::CompactEncounters> records = snapshot.takeScope({});
        auto health = std::make_shared<core::DataHealth>(
            core::dataHealth(*records, snapshot.pedigree->animals, *snapshot.residences, o, &cancel));
        return ComputeRunner::Apply([this, health] { adopt(std::move(*health)); });
    });
}

void HealthView::adopt(core::DataHealth health)
{
    health_ = std::move(health);
    for (const core::AnimalEffort& a : health_.animals) {
        auto* item = new QTreeWidgetItem(animals_, {toQString(a.animal), QString::number(a.encounters),
                                                    QString::number(a.daysSeen), dateText(a.lastSeen),
                                                    a.fewEncounters ? tr("too few") : QString(),
                                                    points(a.intervalWidth)});
        if (a.intervalWidth) item->setToolTip(5, number(a.intervalWidth));
        if (a.fewEncounters)
            item->setToolTip(4, tr("Fewer than %1 encounters in the window: this animal's rank is not stable.")
                                    .arg(health_.minEncounters));
    }
    for (const core::ObserverEffort& e : health_.observers)
        new QTreeWidgetItem(observers_, {e.observer.empty() ? tr("(none recorded)") : toQString(e.observer),
                                         QString::number(e.encounters), QString::number(e.days)});
    for (const core::MonthEffort& m : health_.months)
        new QTreeWidgetItem(months_, {QStringLiteral("%1-%2").arg(m.year, 4, 10, QLatin1Char('0')).arg(m.month, 2, 10,
                                                                                                        QLatin1Char('0')),
                                      QString::number(m.encounters), QString::number(m.days),
                                      QString::number(m.animals)});
    for (const core::UnseenAnimal& u : health_.unseen)
        new QTreeWidgetItem(unseen_, {toQString(u.animal), dateText(u.lastSeen), dateText(u.since),
                                      QString::number(u.days)});
    for (const core::ObserverAgreement& a : health_.agreement)
        new QTreeWidgetItem(agreement_, {toQString(a.first), toQString(a.second), QString::number(a.sharedDays),
                                         QString::number(a.matched), QString::number(a.onlyFirst),
                                         QString::number(a.onlySecond), QString::number(a.agreeing), number(a.share),
                                         number(a.kappa)});
    if (!health_.unseen.empty()) {
        QString day = toQString(core::formatDate(health_.reference));
        const int behind = core::today() - health_.reference;
        switch (health_.referenceKind) {
        case core::ReferenceDay::WindowEnd: day = tr("%1 (the window's last day)").arg(day); break;
        case core::ReferenceDay::Today: day = tr("%1 (today)").arg(day); break;
        case core::ReferenceDay::LastRecord:
            day = behind > 0 ? tr("%1 (the file's last day of records, %n day(s) before today)", nullptr, behind).arg(day)
                             : tr("%1 (the file's last day of records, today)").arg(day);
            break;
        }
        banner_->setText(tr("%n resident animal(s) not seen for more than %1 days on %2. ", nullptr,
                            static_cast<int>(health_.unseen.size()))
                             .arg(health_.unseenDays)
                             .arg(day) +
                         QCoreApplication::translate("hierloom::ui::Caution", core::kUnseenCaution));
        banner_->show();
    }
}

} // namespace hierloom::ui
