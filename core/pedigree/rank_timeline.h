// SPDX-License-Identifier: GPL-3.0-or-later
#pragma once
#include "core/base/colony.h"
#include "core/pedigree/inheritance_prediction.h"
#include "core/pedigree/matriline.h"
#include "core/base/residence_index.h"

#include <atomic>
#include <functional>
#include <optional>
#include <string>
#include <vector>

namespace hierloom::core {

/// Spacing of the checkpoints of a rank timeline.
enum class TimelineStep { Week, Month };

/// A dated event of a female's life shown on the timeline.
enum class LifeEventKind { Birth, Maturity, Death, Removal, Introduction };

/// `birth`, `maturity`, `death`, `removal`, `introduction`.
const char* toString(LifeEventKind kind);

struct LifeEvent {
    LifeEventKind kind = LifeEventKind::Birth;
    Day day = 0;
};

/// One checkpoint of one ranked female: her Elo rating (Elo 1978; Neumann et
/// al. 2011) and ordinal rank among the ranked females with a rating, against
/// her rank in the matrilineal prediction (docs/methods.md "Matrilineal rank
/// prediction"; Kawamura 1958; Datta 1988).
struct RankTimelinePoint {
    Day day = 0;
    std::optional<double> elo;    ///< empty before her first counted encounter
    std::optional<int> rank;      ///< observed ordinal rank, 1 = top; empty without a rating
    int predictedRank = 0;        ///< 1 = top
    int discordantDyads = 0;      ///< pairs with her whose observed order reverses the predicted one
    bool discordant() const { return discordantDyads > 0; }
};

/// The line of one female: every checkpoint at which she was ranked, and her life events.
struct RankTimelineFemale {
    std::string animal;
    std::string name;
    std::string matriarch; ///< her matriline, named after its matriarch
    std::optional<Day> birth;
    std::vector<RankTimelinePoint> points; ///< checkpoint order
    std::vector<LifeEvent> events;         ///< day order
};

/// Settings of a timeline: the prediction settings (group, rule, maturity,
/// matriline order, Elo) of every checkpoint, and the checkpoint spacing.
struct RankTimelineOptions {
    InheritanceOptions inheritance; ///< `at` is ignored
    TimelineStep step = TimelineStep::Month;
};

/// Every ranked female's observed and predicted rank over the record.
struct RankTimeline {
    std::vector<Day> checkpoints;            ///< last day of each week or month, clipped to the record
    std::vector<RankTimelineFemale> females; ///< females ranked at one checkpoint at least, matriline then id order
    int maxRank = 0;                         ///< most ranked females at any checkpoint
    bool cancelled = false;                  ///< stopped early: checkpoints and points are incomplete
    /// Position of a female in `females`, or -1.
    int find(std::string_view id) const;
};

/// Called with (checkpoints done, checkpoints in all) between checkpoints.
using TimelineProgress = std::function<void(int, int)>;

/// The rank timeline over the record (of options.group's encounters): at the
/// last day of each week or month, the inheritance prediction of docs/methods.md
/// with observed ranks by Elo continued over the record, as monthlyConformity
/// reads them, all from one Elo pass (eloAtCheckpoints). `cancel`, when set,
/// is checked between checkpoints; a cancelled result says so.
RankTimeline computeRankTimeline(const Colony& colony, const ResidenceIndex& where, const Matrilines& lines,
                                 const RankTimelineOptions& options, const std::atomic<bool>* cancel = nullptr,
                                 const TimelineProgress& progress = {});

} // namespace hierloom::core
