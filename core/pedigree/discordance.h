// SPDX-License-Identifier: GPL-3.0-or-later
#pragma once
#include "core/base/colony.h"
#include "core/base/compact_encounters.h"
#include "core/ranks/elo_rating.h"
#include "core/pedigree/inheritance_prediction.h"
#include "core/pedigree/matriline.h"
#include "core/base/residence_index.h"

#include <optional>
#include <string>
#include <vector>

namespace hierloom::core {

/// Kind of a discordant dyad (docs/methods.md "Matrilineal rank prediction").
enum class DiscordanceCategory { DaughterOverMother, SiblingOrder, WithinMatriline, CrossMatriline };

/// `daughter_over_mother`, `sibling_order`, `within_matriline`, `cross_matriline`.
const char* toString(DiscordanceCategory category);

/// A pair of ranked females whose observed order reverses the predicted one.
struct DiscordantDyad {
    std::string above; ///< the female observed above (predicted below)
    std::string below;
    DiscordanceCategory category = DiscordanceCategory::CrossMatriline;
};

/// How far an observed hierarchy departs from the inheritance prediction
/// (docs/methods.md): discordant dyads, conformity and Kendall's tau-b (Kendall 1945).
struct DiscordanceSummary {
    int ranked = 0;     ///< ranked females
    int observed = 0;   ///< of them with an observed rank
    int comparable = 0; ///< dyads of females both with an observed rank
    int discordant = 0;
    std::optional<double> conformity; ///< 1 - discordant / comparable; empty without comparable dyads
    std::optional<double> tauB;       ///< predicted against observed ranks
    std::vector<DiscordantDyad> dyads; ///< by predicted rank of the female predicted higher, then of the other
};

/// The category of a discordant pair (docs/methods.md): `above` is a daughter of `below`
/// (daughter_over_mother), two daughters of one mother (sibling_order), any other
/// pair of one matriline (within_matriline), else cross_matriline.
DiscordanceCategory discordanceCategory(const Matrilines& lines, int above, int below);

/// Discordant dyads, conformity = 1 - discordant/comparable and Kendall's tau-b
/// between predicted and observed ranks of one prediction (docs/methods.md).
DiscordanceSummary summariseDiscordance(const Matrilines& lines, const InheritancePrediction& prediction);

/// One month of a conformity series, read at the month's last day (clipped to the record).
struct ConformityPoint {
    Day periodStart = 0;
    Day periodEnd = 0;
    int ranked = 0;
    int observed = 0;
    int comparable = 0;
    int discordant = 0;
    std::optional<double> conformity;
    std::optional<double> tauB;
};

/// Conformity over the whole record month by month, so one can see when a
/// reversal started: observed ranks by Elo at each month's last day (ratings
/// continuing over the record) and by David's score (David 1987, P index) over
/// each month's own encounters.
struct ConformitySeries {
    std::vector<ConformityPoint> elo;
    std::vector<ConformityPoint> davidsScore;
};

/// The monthly series from the record's first to its last encounter (of the
/// group, when options.group is set); options.at is ignored and the explicit
/// matriline order, rule and maturity apply to every month.
ConformitySeries monthlyConformity(const Colony& colony, const ResidenceIndex& where, const Matrilines& lines,
                                   const InheritanceOptions& options);
/// The same from compact records (core/base/compact_encounters.h): the same
/// series, as the selection is the same (selectEncounters).
ConformitySeries monthlyConformity(const CompactEncounters& encounters, const std::vector<Animal>& animals,
                                   const ResidenceIndex& where, const Matrilines& lines,
                                   const InheritanceOptions& options);

} // namespace hierloom::core
