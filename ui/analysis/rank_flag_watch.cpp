// SPDX-License-Identifier: GPL-3.0-or-later
#include "ui/analysis/rank_flag_watch.h"

#include "ui/document/colony_document.h"
#include "ui/document/compute_runner.h"
#include "ui/document/document_settings.h"

#include "core/pedigree/inheritance_prediction.h"

#include <memory>
#include <optional>

namespace hierloom::ui {

RankFlagWatch::RankFlagWatch(ColonyDocument* document, QObject* parent)
    : QObject(parent), document_(document), runner_(new ComputeRunner(this))
{
}

void RankFlagWatch::clear()
{
    runner_->cancel();
    flags_.clear();
    widthsReady_ = false;
    emit updated();
}

void RankFlagWatch::request(std::optional<core::Day> from, std::optional<core::Day> to, const std::string& group)
{
    if (!document_->isOpen()) {
        clear();
        return;
    }
    // The counts at once: the mark is on screen with the view's own figures.
    flags_ = core::rankFlags(document_->encounters().compact(), from, to, group, threshold_);
    widthsReady_ = false;
    emit updated();
    core::HealthOptions o;
    o.from = from;
    o.to = to;
    o.today = to ? *to : document_->lastEncounterDay().value_or(core::today());
    o.group = group;
    o.minEncounters = threshold_;
    o.elo = documentAnalysisSettings(document_).elo;
    o.randomisations = kRandomisations;
    o.threads = 1;
    const auto dayText = [](std::optional<core::Day> d) { return d ? std::to_string(*d) : std::string(); };
    const std::string key = group + '|' + dayText(from) + '|' + dayText(to) + '|' + std::to_string(o.today) + '|' +
                            std::to_string(threshold_);
    const std::uint64_t revision = document_->revision();
    // "Every group" of a file kept group by group changes as groups are read: never kept.
    const bool keep = !group.empty() || document_->isComplete();
    if (keep) {
        if (const auto hit = widths_.find(key, revision)) {
            runner_->cancel();
            applyWidths(*hit);
            return;
        }
    }
    const ColonyDocument::Snapshot snapshot = document_->snapshot();
    runner_->start([this, snapshot = snapshot, o, key, revision, keep](const std::atomic<bool>& cancel, const ComputeRunner::Progress&) mutable {
        // The rows picked, the document's records are let go before the long
        // part: an edit meanwhile need not copy them (colony_document.h, snapshot()).
        // The selection costs the group, and the document's records are let go sooner.
        std::shared_ptr<const core::CompactEncounters> scope = snapshot.takeScope(o.group);
        const core::EncounterSelection picked =
            core::eloIntervalSelection(*scope, snapshot.pedigree->animals, *snapshot.residences, o);
        scope.reset();
        snapshot = {};
        auto widths = std::make_shared<const Widths>(core::eloIntervalWidths(picked, o, &cancel));
        return ComputeRunner::Apply([this, widths, key, revision, keep] {
            // Records changed meanwhile: these widths are not theirs.
            if (document_->revision() != revision) return;
            if (keep) widths_.store(key, revision, widths);
            applyWidths(*widths);
        });
    });
}

void RankFlagWatch::applyWidths(const Widths& widths)
{
    for (auto& [id, flag] : flags_) {
        const auto it = widths.find(id);
        flag.intervalWidth = it != widths.end() ? std::optional<double>(it->second) : std::nullopt;
    }
    widthsReady_ = true;
    emit updated();
}

bool RankFlagWatch::flagged(const std::string& id) const { return core::tooFewEncounters(encounters(id), threshold_); }

int RankFlagWatch::encounters(const std::string& id) const
{
    const auto it = flags_.find(id);
    return it != flags_.end() ? it->second.encounters : 0;
}

std::optional<double> RankFlagWatch::intervalWidth(const std::string& id) const
{
    const auto it = flags_.find(id);
    return it != flags_.end() ? it->second.intervalWidth : std::nullopt;
}

int RankFlagWatch::flaggedCount() const
{
    int n = 0;
    for (const auto& [id, flag] : flags_) n += flag.fewEncounters;
    return n;
}

QString RankFlagWatch::mark() { return QStringLiteral("\u26A0"); }

QString RankFlagWatch::marked(const QString& name, const std::string& id) const
{
    return flagged(id) ? name + QLatin1Char(' ') + mark() : name;
}

QString RankFlagWatch::describe(const std::string& id) const
{
    QString width;
    if (!widthsReady_) width = tr("Elo interval width: being computed");
    else if (const std::optional<double> w = intervalWidth(id)) width = tr("Elo interval width %1 points").arg(*w, 0, 'f', 0);
    else width = tr("Elo interval width: not rated");
    const int n = encounters(id);
    return flagged(id) ? tr("%1 Too few encounters for a stable rank: %2 in the window (threshold %3); %4")
                             .arg(mark())
                             .arg(n)
                             .arg(threshold_)
                             .arg(width)
                       : tr("Encounters in the window: %1 (threshold %2); %3").arg(n).arg(threshold_).arg(width);
}

QString RankFlagWatch::legend() const
{
    return tr("%1 after a name: fewer than %2 encounters in the window, rank not stable (flagged: %3); hover a "
              "name for its encounters and randomised-Elo interval width%4.")
        .arg(mark())
        .arg(threshold_)
        .arg(flaggedCount())
        .arg(widthsReady_ ? QString() : tr(" (widths being computed)"));
}

} // namespace hierloom::ui
