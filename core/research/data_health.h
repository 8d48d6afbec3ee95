// SPDX-License-Identifier: GPL-3.0-or-later
#pragma once
#include "core/base/calendar_period.h"
#include "core/base/colony.h"
#include "core/ranks/encounter_selection.h"
#include "core/base/compact_encounters.h"
#include "core/base/residence_index.h"
#include "core/ranks/elo_rating.h"

#include <atomic>
#include <cstdint>
#include <map>
#include <optional>
#include <string>
#include <vector>

namespace hierloom::core {

/// Fewer counted encounters than this in the window and an animal's rank is
/// flagged as resting on too few data (docs/methods.md, "Data health").
inline constexpr int kDefaultMinEncounters = 10;
/// Days without being seen after which a resident animal is listed.
inline constexpr int kDefaultUnseenDays = 14;
/// Two observers' encounters of one dyad on one day match when their times
/// differ by at most this many minutes.
inline constexpr int kDefaultMatchMinutes = 5;

/// Shown with every list of animals not seen (CLI, view, report).
inline constexpr const char* kUnseenCaution =
    "An animal nobody has seen may be ill, injured or missing: check on it. What is done is decided by the "
    "veterinary and animal-care staff under the institution's approved protocols and local regulations.";

/// What data health looks at (docs/methods.md, "Data health").
struct HealthOptions {
    std::optional<Day> from; ///< inclusive; default: all data
    std::optional<Day> to;   ///< inclusive; default: all data (see DataHealth::reference)
    std::string group;       ///< empty: every group
    Day today = 0;           ///< bounds the reference day of an open window
    int unseenDays = kDefaultUnseenDays;
    int minEncounters = kDefaultMinEncounters;
    int matchMinutes = kDefaultMatchMinutes;
    EloSettings elo;         ///< for the randomised-Elo interval widths
    int randomisations = 1000; ///< orders of randomised Elo (0: no widths)
    std::uint64_t seed = 1;
    unsigned threads = 0;    ///< for the randomisations; 0: every core (the widths are the same for any count)
};

/// One animal's observation effort in the window.
struct AnimalEffort {
    std::string animal;
    int encounters = 0;                  ///< counted encounters it took part in
    int daysSeen = 0;                    ///< distinct days it appears in an encounter
    std::optional<Day> lastSeen;         ///< last encounter on or before the reference day (any group)
    bool fewEncounters = false;          ///< encounters < minEncounters: rank resting on too few data
    std::optional<double> intervalWidth; ///< randomised Elo: 97.5 % minus 2.5 % quantile of its rating
};

struct ObserverEffort {
    std::string observer; ///< empty: encounters without an observer
    int encounters = 0;
    int days = 0; ///< distinct days with at least one encounter recorded
};

struct MonthEffort {
    int year = 0;
    unsigned month = 0;
    int encounters = 0;
    int days = 0;    ///< distinct days with records
    int animals = 0; ///< distinct animals seen
};

/// A resident animal nobody has recorded for more than `unseenDays` days.
struct UnseenAnimal {
    std::string animal;
    std::optional<Day> lastSeen; ///< empty: never seen since it joined
    Day since = 0;               ///< last seen, or the start of its life in the colony
    int days = 0;                ///< reference day minus `since`
};

/// Two observers' records of the same group on the same days.
struct ObserverAgreement {
    std::string first, second; ///< first < second (byte order)
    int sharedDays = 0;        ///< days (and groups) both recorded
    int matched = 0;           ///< encounter pairs matched by dyad and time
    int onlyFirst = 0;         ///< their encounters on shared days left unmatched
    int onlySecond = 0;
    int agreeing = 0;          ///< matched pairs with the same direction (or both a draw)
    std::optional<double> share;  ///< agreeing / matched
    std::optional<double> kappa;  ///< Cohen's kappa over the direction categories
};

/// Which day "not seen" is counted to (docs/methods.md, "Data health").
enum class ReferenceDay {
    WindowEnd,  ///< the window's given last day
    LastRecord, ///< open window: the file's last encounter day (any group, not after today)
    Today,      ///< open window, and the file has no encounter up to today
};

struct DataHealth {
    Day reference = 0; ///< the day "not seen" is counted to, and the window's last day
    ReferenceDay referenceKind = ReferenceDay::WindowEnd;
    int minEncounters = 0;
    int unseenDays = 0;
    std::vector<AnimalEffort> animals;       ///< id order
    std::vector<ObserverEffort> observers;   ///< name order
    std::vector<MonthEffort> months;         ///< calendar order
    std::vector<UnseenAnimal> unseen;        ///< longest unseen first
    std::vector<ObserverAgreement> agreement;
};

/// Data health of a group and window (docs/methods.md, "Data health").
/// `cancel` (a view's worker): the interval widths stop early and are left empty.
DataHealth dataHealth(const Colony& colony, const ResidenceIndex& where, const HealthOptions& options,
                      const std::atomic<bool>* cancel = nullptr);
/// The same from compact records (the desktop's, without expanding them);
/// `animals` is the colony's animal list.
DataHealth dataHealth(const CompactEncounters& encounters, const std::vector<Animal>& animals,
                      const ResidenceIndex& where, const HealthOptions& options,
                      const std::atomic<bool>* cancel = nullptr);

/// The one rule of the flag (docs/methods.md, "Data health"): an animal with
/// fewer than `minEncounters` encounters in the window has a rank resting on
/// too few data. Every rank table and view asks this function.
inline bool tooFewEncounters(int encounters, int minEncounters) { return encounters < minEncounters; }

/// The flag beside one animal's rank.
struct RankFlag {
    int encounters = 0;                  ///< encounters in the window and group (encounterCounts)
    bool fewEncounters = false;          ///< tooFewEncounters(encounters, threshold)
    std::optional<double> intervalWidth; ///< randomised Elo, when computed and the animal is rated
};

/// The flags of every animal with an encounter in the window and group, in
/// id order, without interval widths (cheap: one pass over the encounters).
std::map<std::string, RankFlag> rankFlags(const Colony& colony, std::optional<Day> from, std::optional<Day> to,
                                          const std::string& group, int minEncounters);
/// The same flags from compact records (core/base/compact_encounters.h).
std::map<std::string, RankFlag> rankFlags(const CompactEncounters& encounters, std::optional<Day> from,
                                          std::optional<Day> to, const std::string& group, int minEncounters);

/// The flags of a long rank table's periods (`ranks --every`), one map per
/// period in the order given (periods in calendar order, as
/// periodsCovering makes them). `cumulative` (Elo, which runs on over the
/// window and is read at each period's last day): the encounters from `from`
/// to the period's last day; otherwise (David's score, I&SI: each period
/// alone) the period's own encounters. One pass over the encounters.
std::vector<std::map<std::string, RankFlag>> periodRankFlags(const Colony& colony,
                                                             const std::vector<CalendarPeriod>& periods,
                                                             std::optional<Day> from, const std::string& group,
                                                             int minEncounters, bool cumulative);
/// The same flags from compact records.
std::vector<std::map<std::string, RankFlag>> periodRankFlags(const CompactEncounters& encounters,
                                                             const std::vector<CalendarPeriod>& periods,
                                                             std::optional<Day> from, const std::string& group,
                                                             int minEncounters, bool cumulative);

/// Randomised-Elo interval widths (97.5 % minus 2.5 % quantile of the final
/// rating) of every rated animal of the window `options.from`..`to` (to
/// defaults to `today`) and group, with `options.randomisations` orders,
/// `options.seed` and `options.elo` (draws policy included). Empty with no
/// randomisations or when `cancel` was set (a view's worker gives up).
std::map<std::string, double> eloIntervalWidths(const Colony& colony, const ResidenceIndex& where,
                                                const HealthOptions& options,
                                                const std::atomic<bool>* cancel = nullptr);
/// The selection eloIntervalWidths draws from (its window, group and draws
/// policy), and the widths of a selection so made: a worker may select, let
/// go of the colony, then randomise.
EncounterSelection eloIntervalSelection(const Colony& colony, const ResidenceIndex& where, const HealthOptions& options);
/// The same selection from compact records; `animals` is the colony's animal list.
EncounterSelection eloIntervalSelection(const CompactEncounters& encounters, const std::vector<Animal>& animals,
                                        const ResidenceIndex& where, const HealthOptions& options);
std::map<std::string, double> eloIntervalWidths(const EncounterSelection& selection, const HealthOptions& options,
                                                const std::atomic<bool>* cancel = nullptr);

/// Counted encounters per animal id in a window and group (both animals of
/// an encounter count it; ignored draws are not counted when draws are ignored).
std::vector<std::pair<std::string, int>> encounterCounts(const Colony& colony, std::optional<Day> from,
                                                         std::optional<Day> to, const std::string& group);
/// The same counts from compact records (core/base/compact_encounters.h).
std::vector<std::pair<std::string, int>> encounterCounts(const CompactEncounters& encounters, std::optional<Day> from,
                                                         std::optional<Day> to, const std::string& group);

} // namespace hierloom::core
