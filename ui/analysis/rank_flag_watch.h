// SPDX-License-Identifier: GPL-3.0-or-later
#pragma once
#include "core/base/civil_date.h"
#include "core/research/data_health.h"
#include "ui/document/result_cache.h"

#include <QObject>
#include <QString>

#include <map>
#include <optional>
#include <string>

namespace hierloom::ui {

class ColonyDocument;
class ComputeRunner;

/// The data-health flag beside each animal of a rank view (docs/methods.md,
/// "Data health"; the rule is core::tooFewEncounters): the encounters of the
/// view's window and group are counted at once (one pass over the records),
/// the randomised-Elo interval widths are computed on a worker thread and
/// arrive later. `updated` is emitted after each, so a view redraws its marks.
class RankFlagWatch : public QObject {
    Q_OBJECT
public:
    /// Orders of randomised Elo for the widths on screen (as the Data Health view).
    static constexpr int kRandomisations = 500;

    explicit RankFlagWatch(ColonyDocument* document, QObject* parent = nullptr);

    /// The window (inclusive; empty ends: the record's first or last day) and group to flag.
    void request(std::optional<core::Day> from, std::optional<core::Day> to, const std::string& group);
    /// Forgets every flag (no colony open).
    void clear();

    /// The animal's encounters in the window are under the threshold.
    bool flagged(const std::string& id) const;
    int encounters(const std::string& id) const;
    std::optional<double> intervalWidth(const std::string& id) const;
    int flaggedCount() const;
    bool widthsReady() const { return widthsReady_; }
    int threshold() const { return threshold_; }
    ComputeRunner* runner() const { return runner_; }

    /// The mark put after a flagged animal's name.
    static QString mark();
    /// The name with the mark when flagged.
    QString marked(const QString& name, const std::string& id) const;
    /// The hover line: encounters in the window, the threshold and the interval width (or that it is pending).
    QString describe(const std::string& id) const;
    /// The short legend line under a view: what the mark means.
    QString legend() const;

signals:
    void updated();

private:
    using Widths = std::map<std::string, double>;
    void applyWidths(const Widths& widths);

    ColonyDocument* document_;
    ComputeRunner* runner_;
    int threshold_ = core::kDefaultMinEncounters;
    std::map<std::string, core::RankFlag> flags_;
    bool widthsReady_ = false;
    // Widths computed at the document's current revision, by group, window
    // and threshold: turning back to a group does not randomise again.
    ResultCache<Widths> widths_;
};

} // namespace hierloom::ui
