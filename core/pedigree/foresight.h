// SPDX-License-Identifier: GPL-3.0-or-later
#pragma once
#include "core/base/colony.h"
#include "core/base/compact_encounters.h"
#include "core/base/residence_index.h"
#include "core/pedigree/inheritance_prediction.h"
#include "core/ranks/elo_rating.h"
#include "core/ranks/encounter_selection.h"

#include <optional>
#include <string>
#include <vector>

namespace hierloom::core {

/// The models whose foresight is compared (docs/methods.md "Foresight").
enum class ForesightModel { Rule, Elo, InformedElo };

/// `rule`, `elo`, `informed_elo`.
const char* toString(ForesightModel model);

/// Every model, in the order tables list them.
inline constexpr ForesightModel kForesightModels[] = {ForesightModel::Rule, ForesightModel::Elo,
                                                      ForesightModel::InformedElo};

/// One decided encounter with the chance each model gave its winner beforehand.
struct ForesightEncounter {
    Day day = 0;
    std::string winner;
    std::string loser;
    /// Rule: whether the winner stood higher in the predicted order; empty
    /// when the pair was not comparable (not both in it, or in two
    /// matrilines not both placed by observation).
    std::optional<bool> ruleConforms;
    double rule = 0.5;
    double elo = 0.5;
    double informedElo = 0.5;

    double chance(ForesightModel model) const;
};

/// How well a list of winners' chances foresaw them (docs/methods.md): the
/// log-likelihood sum ln p, the Brier score mean (1 - p)^2, how many chances
/// differed from 1/2 (called) and how many exceeded it (predicted).
struct ForesightScore {
    int encounters = 0;
    int called = 0;
    int predicted = 0;
    double logLikelihood = 0;
    std::optional<double> brier;          ///< empty without encounters
    std::optional<double> sharePredicted; ///< predicted / encounters; empty without encounters
};

ForesightScore scoreForesight(const std::vector<double>& winnerChances);

/// The rule's one win probability by maximum likelihood (docs/methods.md):
/// conforming / comparable; empty when nothing was comparable.
std::optional<double> fitRuleWinProbability(int conforming, int comparable);

/// One row of the foresight table: a model over one calendar year, or the whole window (year empty).
struct ForesightRow {
    ForesightModel model = ForesightModel::Rule;
    std::optional<int> year;
    ForesightScore score;
};

struct ForesightOptions {
    SiblingRule rule = SiblingRule::Youngest; ///< of the rule model and the rule-informed Elo
    int maturityYears = kDefaultMaturityYears;
    EloSettings elo; ///< k, start, curve of both Elo models (draws come from the selection)
};

/// Foresight of the window's decided encounters.
struct Foresight {
    SiblingRule rule = SiblingRule::Youngest;
    int comparable = 0;
    int conforming = 0;
    std::optional<double> ruleWinProbability;
    std::vector<ForesightEncounter> encounters; ///< analysis order
    std::vector<ForesightRow> rows;             ///< per model: each year in order, then the whole window
};

/// The foresight of the rule alone, plain Elo and rule-informed Elo over the
/// selection's decided encounters (docs/methods.md "Foresight"). The rule's
/// order on day d is the matrilineal prediction of the females ranked that day
/// with matrilines placed by plain Elo after the day before; both Elo runs
/// cover the selection's encounters (draws update them, but are not scored).
Foresight computeForesight(const Colony& colony, const ResidenceIndex& where, const SelectionOptions& selection,
                           const ForesightOptions& options);
/// The same from compact records; `pedigree`'s animals are read, not its encounters.
Foresight computeForesight(const CompactEncounters& encounters, const Colony& pedigree, const ResidenceIndex& where,
                           const SelectionOptions& selection, const ForesightOptions& options);

} // namespace hierloom::core
