// SPDX-License-Identifier: GPL-3.0-or-later
#pragma once
#include "core/base/colony.h"
#include "core/base/compact_encounters.h"
#include "core/ranks/analysis_settings.h"
#include "core/ranks/elo_rating.h"
#include "core/base/residence_index.h"

#include <optional>
#include <string>
#include <vector>

namespace hierloom::core {

/// Why a birth is left out of the sex-ratio analysis (docs/methods.md, "Maternal
/// rank and offspring sex ratio" and "Small choices").
enum class BirthExclusion {
    None,               ///< used
    UnknownMother,      ///< no mother recorded
    UnknownSex,         ///< offspring sex U
    MotherNotResident,  ///< mother not resident (in the group) on the conception day
    MotherNotMature,    ///< mother younger than the maturity age on the conception day
    MotherNotRated,     ///< mother had no Elo rating on the conception day
    FewerThanTwoRanked, ///< m < 2 ranked females on the conception day
};

/// Stable code of a reason, as printed in the per-birth table ("" for None).
const char* toString(BirthExclusion reason);
/// A sentence explaining a reason, for messages: its display name
/// (core/base/display_names.h).
const char* describe(BirthExclusion reason);

/// Which births and how mothers are ranked.
struct MaternalRankOptions {
    std::optional<Day> from; ///< births on or after this day (default: every birth)
    std::optional<Day> to;   ///< births on or before this day
    std::string group;       ///< empty: every group; else births in, and ranks within, this group
    int gestationDays = 165;
    int maturityYears = kDefaultMaturityYears;
    EloSettings elo;         ///< start, k, curve, draws
};

/// A mother's Elo rank on one day among the ranked females (docs/methods.md).
struct MaternalRankAt {
    Day day = 0;
    std::optional<int> rank;              ///< r, 1 = top; empty when she is not ranked
    std::optional<int> rankedFemales;     ///< m, the ranked females that day
    std::optional<double> relativeRank;   ///< 1 - (r - 1)/(m - 1); empty unless m >= 2 and r known
    BirthExclusion problem = BirthExclusion::None; ///< why no relative rank (None when there is one)
};

/// One birth with its mother's rank at conception and at birth.
struct MaternalRankRow {
    std::string offspring;
    std::string mother; ///< empty when unknown
    Sex sex = Sex::Unknown;
    Day birth = 0;
    MaternalRankAt atConception; ///< day = birth - gestation
    MaternalRankAt atBirth;
    BirthExclusion exclusion = BirthExclusion::None; ///< None: the birth enters the sex-ratio figures
    /// For people: what happened, when the reason alone does not say it (for
    /// mother_not_resident: she arrived after conception, had left, was in
    /// another group or away); empty otherwise.
    std::string detail;
    /// Conceived before the record's first encounter (left out as mother_not_resident).
    bool conceivedBeforeRecord = false;
};

/// What is not a birth of the analysis: founders, and animals born before
/// the record's first encounter (there was no record of their mothers then).
struct BirthCounting {
    std::optional<Day> recordStart; ///< the record's first encounter; births are counted from this day
    int founders = 0;               ///< founders with a birth date, not counted as births
    int bornBefore = 0;             ///< other animals born before recordStart, not counted
};

/// Maternal rank at conception and at birth for every birth of the window
/// (Trivers & Willard 1973; docs/methods.md "Maternal rank and offspring sex
/// ratio"): r is the mother's ordinal Elo rank among the m ranked females
/// (resident that day, in the group if one is given, at least maturityYears
/// old or of unknown birth date, with an Elo rating from the whole record up
/// to that day). A birth is an animal with a recorded birth date on or after
/// the record's first encounter that is not a founder; with a group, only
/// births whose offspring (else mother) was in it on the birth day.
/// Rows in birth-date order, then offspring id. Elo is run once for all days.
std::vector<MaternalRankRow> computeMaternalRanks(const Colony& colony, const ResidenceIndex& where,
                                                  const MaternalRankOptions& options);

/// The record's start and the animals of the window (and group) that
/// computeMaternalRanks does not count as births.
BirthCounting countNonBirths(const Colony& colony, const ResidenceIndex& where, const MaternalRankOptions& options);

/// The same two from compact records (the desktop's, without expanding
/// them); `pedigree`'s animals are read, not its encounters.
std::vector<MaternalRankRow> computeMaternalRanks(const CompactEncounters& encounters, const Colony& pedigree,
                                                  const ResidenceIndex& where, const MaternalRankOptions& options);
BirthCounting countNonBirths(const CompactEncounters& encounters, const Colony& pedigree, const ResidenceIndex& where,
                             const MaternalRankOptions& options);

} // namespace hierloom::core
