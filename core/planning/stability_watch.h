// SPDX-License-Identifier: GPL-3.0-or-later
#pragma once
#include "core/base/calendar_period.h"
#include "core/base/colony.h"
#include "core/base/compact_encounters.h"
#include "core/ranks/elo_rating.h"
#include "core/pedigree/matriline.h"
#include "core/base/residence_index.h"

#include <map>
#include <optional>
#include <string>
#include <vector>

namespace hierloom::core {

/// User thresholds of the stability watch (stored in the colony file's settings,
/// see stability_settings.h). Defaults were checked against the demo colony's
/// 2023 revolt: every week and month of it alerts, no calm month does.
struct StabilityThresholds {
    /// Counter-dominance alert: share of ranked decided encounters won by the
    /// lower-rated animal above this ...
    double counterShare = 0.15;
    /// ... over at least this many ranked decided encounters in the period ...
    int minDecided = 20;
    /// ... and concentrated between two matrilines: at least this many of the
    /// period's counter-dominant encounters (either direction) fall between the
    /// same two matrilines, per 7 days of the period (a month needs ~26).
    double linePairPerWeek = 6;
    /// Rank-change alert: mean |rank change| per animal between the ends of
    /// consecutive periods above this (0 switches the alert off).
    double rankChangePerAnimal = 0;
    /// Behaviour codes with at least this severity (0-5) count as severe; 4 = bite level.
    int severeAtLeast = 4;
    /// Severe-aggression alert: severe encounters per animal-day above this
    /// multiple of the median over the record's periods of the same length ...
    double severeFactor = 3.0;
    /// ... with at least this many severe encounters in the period.
    int minSevere = 6;
};

/// Settings of a stability watch.
struct StabilityOptions {
    std::string group;          ///< empty: the whole colony
    PeriodLength length = PeriodLength::Month;
    std::optional<Day> from;    ///< default: the group's first encounter
    std::optional<Day> to;      ///< default: its last encounter
    EloSettings elo;            ///< the sequential Elo ratings that rank the animals
    std::map<std::string, int, std::less<>> severity; ///< behaviour code -> severity 0-5 (unknown codes: not severe)
    StabilityThresholds thresholds;
};

/// A dyad whose encounters in one period were won by the lower-rated animal.
struct CounterDominantDyad {
    std::string winner; ///< the lower-rated animal, who won
    std::string loser;
    std::string winnerLine; ///< matriarch of the winner's matriline
    std::string loserLine;
    int count = 0;
    std::vector<Day> dates; ///< distinct dates, ascending
};

/// Counter-dominant encounters between two matrilines (winner's line first).
struct MatrilinePairCount {
    std::string winnerLine;
    std::string loserLine;
    int count = 0;
};

/// One encounter with a severe behaviour code.
struct SevereEncounter {
    Day date = 0;
    std::string winner;
    std::string loser;
    std::string behaviour;
};

/// The stability figures of one week or month.
struct StabilityPeriod {
    CalendarPeriod period{0, 0};
    int encounters = 0;       ///< all encounters of the group in the period
    int decided = 0;          ///< decided encounters between two animals already rated and not tied
    int counterDominant = 0;  ///< of them won by the lower-rated animal
    std::optional<double> counterShare;
    int rankedAnimals = 0;    ///< animals rated and resident at both this and the previous period end
    std::optional<double> rankChangePerAnimal; ///< empty for the first period or without common animals
    int severe = 0;
    long animalDays = 0;      ///< residents summed over the days with observed encounters
    std::optional<double> severePerAnimalDay;
    std::vector<CounterDominantDyad> dyads;          ///< most encounters first
    std::vector<MatrilinePairCount> matrilinePairs;  ///< most encounters first
    /// The two distinct matrilines with the most counter-dominant encounters
    /// between them, both directions summed (winnerLine/loserLine: the more
    /// frequent winner first); empty when none fell between two lines.
    std::optional<MatrilinePairCount> topLinePair;
    std::vector<SevereEncounter> severeEncounters;   ///< chronological
};

/// The signals of the stability watch.
enum class StabilitySignal { CounterDominance, RankChanges, SevereAggression };

/// `counter_dominance`, `rank_changes`, `severe_aggression`.
const char* toString(StabilitySignal signal);

/// A period whose figure crossed a threshold.
struct StabilityAlert {
    size_t period = 0; ///< index into StabilitySeries::periods
    StabilitySignal signal = StabilitySignal::CounterDominance;
    double value = 0;
    double threshold = 0;
};

/// The series of one group and the alerts it raises.
struct StabilitySeries {
    std::string group;
    PeriodLength length = PeriodLength::Month;
    std::vector<StabilityPeriod> periods;
    std::optional<double> medianSevereRate; ///< the baseline of the severe-aggression alert
    std::vector<StabilityAlert> alerts;     ///< by period, then signal

    /// Alerts of the last period (what the main window shows).
    std::vector<StabilityAlert> latestAlerts() const;
};

/// The stability watch of one group per week or month: counter-dominance (the
/// share of decided encounters won by the lower-ranked animal, ranks by
/// sequential Elo just before each encounter; Elo 1978, Neumann et al. 2011),
/// mean absolute change of ordinal Elo rank per animal between period ends,
/// severe encounters per animal-day and the matrilines involved (Kawamura 1958),
/// with the alerts its thresholds raise.
StabilitySeries stabilityWatch(const Colony& colony, const ResidenceIndex& where, const Matrilines& lines,
                               const StabilityOptions& options);
/// The same watch on compact records (core/base/compact_encounters.h);
/// `animals` is the colony's animal list.
StabilitySeries stabilityWatch(const CompactEncounters& encounters, const std::vector<Animal>& animals,
                               const ResidenceIndex& where, const Matrilines& lines, const StabilityOptions& options);

/// A sentence describing an alert and its evidence (which dyads, which dates).
std::string describeAlert(const StabilitySeries& series, const StabilityAlert& alert);

} // namespace hierloom::core
