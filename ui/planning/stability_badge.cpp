// SPDX-License-Identifier: GPL-3.0-or-later
#include "ui/planning/stability_badge.h"

#include "core/base/compact_encounters.h"
#include "core/pedigree/matriline.h"
#include "ui/widgets/caution_label.h"
#include "ui/document/colony_document.h"
#include "ui/document/compute_runner.h"
#include "ui/document/qt_convert.h"
#include "ui/document/document_queries.h"
#include "ui/planning/stability_view.h"

namespace hierloom::ui {

StabilityBadge::StabilityBadge(ColonyDocument* document, QWidget* parent)
    : QToolButton(parent), document_(document), runner_(new ComputeRunner(this))
{
    setObjectName(QStringLiteral("stabilityBadge"));
    setAutoRaise(true);
    setStyleSheet(QStringLiteral("QToolButton { color: white; background: #c00000; border-radius: 3px;"
                                 " padding: 1px 8px; font-weight: bold; }"));
    setVisible(false);
    // A burst of edits (an evening's typing) re-checks the alerts once, after a pause.
    debounce_.setSingleShot(true);
    debounce_.setInterval(3000);
    connect(&debounce_, &QTimer::timeout, this, &StabilityBadge::refresh);
    // A new file or new thresholds show at once; record edits after a pause.
    connect(document_, &ColonyDocument::changed, this, [this](ColonyDocument::ChangeKind kind) {
        if (kind == ColonyDocument::ChangeKind::Reset || kind == ColonyDocument::ChangeKind::SettingsChanged) refresh();
        else debounce_.start();
    });
    connect(document_, &ColonyDocument::loadFinished, this, &StabilityBadge::refresh);
    refresh();
}

StabilityBadge::~StabilityBadge() = default;

void StabilityBadge::refresh()
{
    debounce_.stop();
    if (!document_->isOpen()) {
        runner_->cancel();
        show({}, {});
        return;
    }
    // A large file still loading: the alerts need every group, so they wait for the rest.
    if (!document_->isComplete()) {
        runner_->cancel();
        show({}, {});
        return;
    }
    // Options are read from the file here; the records are the shared snapshot.
    const ColonyDocument::Snapshot snapshot = document_->snapshot();
    std::vector<std::pair<std::string, std::vector<core::StabilityOptions>>> checks;
    for (const std::string& g : groupsWithEncounters(*snapshot.encounters, *snapshot.residences))
        checks.push_back({g,
                          {documentStabilityOptions(document_, g, core::PeriodLength::Week),
                           documentStabilityOptions(document_, g, core::PeriodLength::Month)}});
    runner_->start([this, snapshot = snapshot, checks](const std::atomic<bool>& cancel, const ComputeRunner::Progress& progress) mutable {
        // Each group's own records, copied out by one pass; then the
        // document's are let go, so that an edit while the groups are checked
        // need not copy them (colony_document.h, snapshot()). Each group's
        // copy goes as soon as it is checked.
        std::vector<std::string> names;
        for (const auto& check : checks) names.push_back(check.first);
        std::vector<core::CompactEncounters> scopes = core::scopesOf(snapshot.encounters->compact(), names);
        snapshot.encounters.reset();
        const core::Matrilines lines(*snapshot.pedigree);
        const std::vector<core::Animal>& animals = snapshot.pedigree->animals;
        const std::shared_ptr<const core::ResidenceIndex> where = snapshot.residences;
        QStringList groups, evidence;
        int done = 0;
        for (size_t k = 0; k < checks.size(); ++k) {
            const auto& [group, options] = checks[k];
            bool alerted = false;
            for (const core::StabilityOptions& o : options) {
                if (cancel) return ComputeRunner::Apply{};
                const core::StabilitySeries s = core::stabilityWatch(scopes[k], animals, *where, lines, o);
                for (const core::StabilityAlert& a : s.latestAlerts()) {
                    alerted = true;
                    evidence << QStringLiteral("%1: %2").arg(toQString(group), toQString(core::describeAlert(s, a)));
                }
            }
            if (alerted) groups << toQString(group);
            scopes[k] = {};
            progress(++done, static_cast<int>(checks.size()));
        }
        return ComputeRunner::Apply([this, groups, evidence] { show(groups, evidence); });
    });
}

void StabilityBadge::waitForCheck() { runner_->wait(); }

void StabilityBadge::show(const QStringList& groups, const QStringList& evidence)
{
    groups_ = groups;
    setVisible(!groups_.isEmpty());
    setText(tr("Stability alert: %1").arg(groups_.join(QStringLiteral(", "))));
    setToolTip(evidence.join(QStringLiteral("\n\n")) + QStringLiteral("\n\n") + planningCaution());
}

} // namespace hierloom::ui
