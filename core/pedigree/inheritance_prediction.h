// SPDX-License-Identifier: GPL-3.0-or-later
#pragma once
#include "core/base/colony.h"
#include "core/base/compact_encounters.h"
#include "core/ranks/analysis_settings.h"
#include "core/ranks/elo_rating.h"
#include "core/pedigree/matriline.h"
#include "core/base/residence_index.h"

#include <map>
#include <optional>
#include <string>
#include <string_view>
#include <vector>

namespace hierloom::core {

/// Order of a mother's daughters in the inheritance walk (docs/methods.md "Matrilineal
/// rank prediction"): youngest ascendancy (Kawamura 1958; Datta 1988), birth date
/// descending, or the eldest first, birth date ascending.
enum class SiblingRule { Youngest, Eldest };

/// Reads `youngest` or `eldest` (the sibling rules of docs/methods.md); empty otherwise.
std::optional<SiblingRule> parseSiblingRule(std::string_view text);
/// `youngest` or `eldest`, as the `--rule` option spells them.
const char* toString(SiblingRule rule);

/// Observed standing of animals at one date, higher score = higher rank (an Elo
/// rating, a David's score); animals without a score are absent.
using ObservedScores = std::map<std::string, double, std::less<>>;

/// Settings of the predicted order; the defaults are those of docs/methods.md.
struct InheritanceOptions {
    std::optional<Day> at; ///< default: the date of the record's last encounter
    SiblingRule rule = SiblingRule::Youngest;
    int maturityYears = kDefaultMaturityYears;
    std::string group; ///< empty: every resident female of the colony
    /// Matriarch ids, top line first, overriding the observed matriline order; lines
    /// not listed follow in the observed order.
    std::vector<std::string> matrilineOrder;
    EloSettings elo; ///< observed ranks: Elo over the record up to the date (draws included)
};

/// Who takes part in the predicted order at one date (docs/methods.md): females
/// resident at D (in the group, if one is chosen) aged at least the maturity age.
struct RankedFemales {
    std::vector<bool> ranked;              ///< per node of the Matrilines
    std::vector<std::string> unknownBirth; ///< ranked females whose birth date is unknown (counted mature)
};

/// The ranked females at day d (docs/methods.md "Small choices": a female is mature on
/// and after her maturity-age birthday; an unknown birth date counts as mature).
RankedFemales rankedFemalesOn(const Matrilines& lines, const ResidenceIndex& where, Day d, const std::string& group,
                              int maturityYears);

/// A recorded female of the lines (`node`) with her index in a ResidenceIndex.
struct FemaleCandidate {
    int node = 0;
    int animal = 0;
};

/// The recorded females of the lines that ever stayed in `group` (in any
/// group when empty), node order: the only ones rankedFemalesOn can rank
/// there, with the id lookups it makes done once for a series of days.
std::vector<FemaleCandidate> rankedFemaleCandidates(const Matrilines& lines, const ResidenceIndex& where,
                                                    const std::string& group);
/// rankedFemalesOn looking only at those candidates (the same result when
/// they were found for the same lines, index and group).
RankedFemales rankedFemalesOn(const Matrilines& lines, const ResidenceIndex& where,
                              const std::vector<FemaleCandidate>& candidates, Day d, const std::string& group,
                              int maturityYears);

/// Offspring ordered by the sibling rule (Kawamura 1958): youngest rule birth date
/// descending, eldest rule ascending; unknown birth dates count as the eldest, and
/// equal dates (or several unknown ones) are ordered by id ascending under both rules.
std::vector<int> orderSiblings(const Matrilines& lines, std::vector<int> siblings, SiblingRule rule);

/// The ranked members of one matriline in inheritance order (Kawamura 1958; Datta
/// 1988): depth-first from the matriarch, each mother directly before her
/// offspring's subtrees in sibling-rule order; unranked animals are skipped while
/// their descendants keep their places.
std::vector<int> matrilineWalk(const Matrilines& lines, int matriarch, const std::vector<bool>& ranked,
                               SiblingRule rule);

/// Every node of each matriline in inheritance order (matrilineWalk with every
/// node ranked), walked on first use and kept, for a series of predictions
/// under one sibling rule: matrilineWalk(lines, m, ranked, rule) is walk(m)
/// without the unranked nodes. Not safe to share between threads.
class MatrilineWalks {
public:
    MatrilineWalks(const Matrilines& lines, SiblingRule rule);
    const std::vector<int>& walk(int matriarch);
    SiblingRule rule() const { return rule_; }

private:
    const Matrilines* lines_;
    SiblingRule rule_;
    std::vector<std::vector<int>> walks_; ///< per node; filled when asked
    std::vector<bool> walked_;
};

/// A predicted order in pedigree nodes (predictOrder before the ids).
struct PredictedNodes {
    std::vector<int> females;      ///< ranked females, top first
    std::vector<int> femaleLine;   ///< the matriarch whose line placed each of `females`
    std::vector<int> lines;        ///< matriarchs of the lines laid end to end
    std::vector<int> observedRank; ///< per node: 1..m among ranked females with a score, 0 without
};

/// predictOrder in nodes: `rankedNodes` are the nodes with ranked.ranked set,
/// ascending, and `score[k]` the observed score of rankedNodes[k], if any.
PredictedNodes predictNodes(const Matrilines& lines, MatrilineWalks& walks, const std::vector<bool>& ranked,
                            const std::vector<int>& rankedNodes, const std::vector<std::optional<double>>& score,
                            const std::vector<std::string>& explicitOrder = {});

/// One ranked female of a predicted order.
struct PredictedFemale {
    std::string animal;
    std::string matriarch; ///< her matriline, named after its matriarch
    int predictedRank = 0; ///< 1 = top
    std::optional<int> observedRank; ///< 1..m among ranked females with an observed score
    std::optional<double> observedScore;
    int discordantDyads = 0; ///< pairs with her whose observed order reverses the predicted one
};

/// The predicted order at one date (docs/methods.md "Matrilineal rank prediction").
struct InheritancePrediction {
    Day at = 0;
    SiblingRule rule = SiblingRule::Youngest;
    std::vector<PredictedFemale> females; ///< predicted order, top first
    std::vector<std::string> matrilineOrder; ///< matriarchs of the lines laid end to end
    std::vector<std::string> unknownBirthCountedMature;
    /// Ranked females with an unknown birth date and at least one sister: they
    /// cannot be ordered among their sisters and are placed as the eldest.
    std::vector<std::string> unorderable;

    /// Position of an animal in `females`, or -1.
    int find(std::string_view id) const;
};

/// The predicted order laid end to end (docs/methods.md): matrilines by the best
/// observed rank among their ranked members, lines without one last by matriarch
/// id, unless `explicitOrder` (matriarch ids) sets the order; then each line's walk.
/// Throws std::invalid_argument naming an explicit id that is unknown, not a
/// matriarch, or listed twice.
InheritancePrediction predictOrder(const Matrilines& lines, const RankedFemales& ranked, const ObservedScores& observed,
                                   SiblingRule rule, const std::vector<std::string>& explicitOrder = {});

/// Elo ratings (Elo 1978; Neumann et al. 2011) after the last encounter dated on
/// or before d, over the record from its first encounter (only the group's
/// encounters when a group is given), for every animal that has a rating.
ObservedScores eloScoresAt(const Colony& colony, const ResidenceIndex& where, Day d, const std::string& group,
                           const EloSettings& settings);

/// The same scores from compact records (core/base/compact_encounters.h);
/// `animals` is the colony's animal list.
ObservedScores eloScoresAt(const CompactEncounters& encounters, const std::vector<Animal>& animals,
                           const ResidenceIndex& where, Day d, const std::string& group, const EloSettings& settings);

/// Date of the record's last encounter, if any (the default date of a prediction).
std::optional<Day> lastEncounterDay(const Colony& colony);
/// The same of compact records.
std::optional<Day> lastEncounterDay(const CompactEncounters& encounters);

/// The predicted order at options.at with observed ranks by Elo at that date
/// (docs/methods.md "Small choices", `inherit`). Throws std::invalid_argument for a
/// colony without encounters and no date, or a bad explicit matriline order.
InheritancePrediction predictInheritance(const Colony& colony, const ResidenceIndex& where, const Matrilines& lines,
                                         const InheritanceOptions& options);
/// The same prediction from compact records (`inherit` on the command line);
/// `animals` is the colony's animal list.
InheritancePrediction predictInheritance(const CompactEncounters& encounters, const std::vector<Animal>& animals,
                                         const ResidenceIndex& where, const Matrilines& lines,
                                         const InheritanceOptions& options);

} // namespace hierloom::core
