// SPDX-License-Identifier: GPL-3.0-or-later
#pragma once
#include "core/base/colony.h"
#include "core/base/compact_encounters.h"
#include "core/base/residence_index.h"
#include "core/ranks/elo_rating.h"

#include <cstdint>
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
    std::optional<Day> to;   ///< inclusive; default: all data up to `today`
    std::string group;       ///< empty: every group
    Day today = 0;           ///< the reference day when `to` is not given
    int unseenDays = kDefaultUnseenDays;
    int minEncounters = kDefaultMinEncounters;
    int matchMinutes = kDefaultMatchMinutes;
    EloSettings elo;         ///< for the randomised-Elo interval widths
    int randomisations = 1000; ///< orders of randomised Elo (0: no widths)
    std::uint64_t seed = 1;
    unsigned threads = 0;
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

struct DataHealth {
    Day reference = 0; ///< the day "not seen" is counted to
    int minEncounters = 0;
    int unseenDays = 0;
    std::vector<AnimalEffort> animals;       ///< id order
    std::vector<ObserverEffort> observers;   ///< name order
    std::vector<MonthEffort> months;         ///< calendar order
    std::vector<UnseenAnimal> unseen;        ///< longest unseen first
    std::vector<ObserverAgreement> agreement;
};

/// Data health of a group and window (docs/methods.md, "Data health").
DataHealth dataHealth(const Colony& colony, const ResidenceIndex& where, const HealthOptions& options);

/// Counted encounters per animal id in a window and group (both animals of
/// an encounter count it; ignored draws are not counted when draws are ignored).
std::vector<std::pair<std::string, int>> encounterCounts(const Colony& colony, std::optional<Day> from,
                                                         std::optional<Day> to, const std::string& group);
/// The same counts from compact records (core/base/compact_encounters.h).
std::vector<std::pair<std::string, int>> encounterCounts(const CompactEncounters& encounters, std::optional<Day> from,
                                                         std::optional<Day> to, const std::string& group);

} // namespace hierloom::core
