// SPDX-License-Identifier: GPL-3.0-or-later
#pragma once
#include "core/base/calendar_period.h"
#include "core/base/colony.h"
#include "core/ranks/elo_rating.h"
#include "core/ranks/encounter_selection.h"
#include "core/ranks/informed_elo.h"

#include <cstdint>
#include <optional>
#include <string>
#include <vector>

namespace hierloom::core {

/// The rank methods of docs/methods.md.
enum class RankMethod { Elo, DavidsScore, Isi };

std::optional<RankMethod> parseRankMethod(std::string_view text);

/// How a rank table is computed; the defaults are those of docs/methods.md.
struct RankOptions {
    RankMethod method = RankMethod::Elo;
    EloSettings elo;            // k, start, curve (draws come from the selection)
    EloStartRule startRule = EloStartRule::None; // Elo: rule-informed start (docs/methods.md)
    std::optional<Day> at;      // Elo: ratings at this date
    bool optimiseK = false;     // Elo: use the maximum-likelihood k (Foerster et al. 2016)
    int randomise = 0;          // Elo: randomised Elo with this many orders (0: off)
    std::uint64_t seed = 1;     // for randomised Elo
    bool correctedDs = false;   // David's score from D instead of P
    unsigned threads = 0;       // 0: every core
};

/// One row of a rank table.
struct RankRow {
    std::string animal;
    int rank = 0;
    std::optional<double> score;     // Elo rating, David's score; empty for I&SI
    std::optional<double> low;       // randomised Elo: 2.5 % quantile
    std::optional<double> high;      // randomised Elo: 97.5 % quantile
    std::optional<double> meanRank;  // randomised Elo: mean rank
};

/// A rank table and what it was computed with.
struct RankTable {
    std::vector<RankRow> rows; // rank order
    std::optional<double> kUsed;         // Elo
    std::optional<double> logLikelihood; // Elo, at kUsed
    std::optional<Day> rankedOn;         // Elo: the day whose residents are ranked
};

/// Ranks of the selected window (docs/methods.md "Small choices"): Elo at --at or
/// at the window's last day among residents with a rating; David's score and
/// I&SI over the window's analysed animals.
RankTable computeRanks(const Colony& colony, const ResidenceIndex& where, const SelectionOptions& selection,
                       const RankOptions& options);

/// computeRanks of a selection already made (selectEncounters of the colony's
/// encounters or of their compact records, compact_selection.h) of `selection`'s
/// window; `colony` gives the animals (its encounters are not read).
RankTable computeRanks(EncounterSelection sel, const Colony& colony, const ResidenceIndex& where,
                       const SelectionOptions& selection, const RankOptions& options);

/// One row of the long per-period table.
struct PeriodRankRow {
    CalendarPeriod period;
    RankRow row;
};

/// Ranks per period: Elo continues over the whole window and is read at each
/// period's last day; David's score and I&SI use each period's encounters alone.
std::vector<PeriodRankRow> computeRanksByPeriod(const Colony& colony, const ResidenceIndex& where,
                                                const SelectionOptions& selection, const RankOptions& options,
                                                PeriodLength every);

/// computeRanksByPeriod of a selection already made (as computeRanks above).
std::vector<PeriodRankRow> computeRanksByPeriod(const EncounterSelection& sel, const Colony& colony,
                                                const ResidenceIndex& where, const SelectionOptions& selection,
                                                const RankOptions& options, PeriodLength every);

/// Ordinal order of the selection's animals by a method over the whole
/// window (all analysed animals, resident or not); index list, top first.
/// Elo uses `elo`; every method counts draws by elo.draws.
std::vector<int> orderByMethod(const EncounterSelection& selection, RankMethod method, const EloSettings& elo);

} // namespace hierloom::core
