// SPDX-License-Identifier: GPL-3.0-or-later
#pragma once
#include "core/base/colony.h"
#include "core/base/compact_encounters.h"
#include "core/ranks/elo_rating.h"
#include "core/pedigree/inheritance_prediction.h"

#include <optional>
#include <stdexcept>
#include <string>
#include <vector>

namespace hierloom::core {

/// One hypothetical change of a what-if scenario.
struct ScenarioChange {
    enum class Kind {
        Remove,    ///< `animal` leaves the colony the day before the scenario date
        Birth,     ///< a newborn of mother `animal`, sex `sex`, id `newId`, born on the date
        Introduce, ///< an unrelated adult female `animal` (a new id) joins the group
        Split      ///< the resident members of the lines of `matriarchs` move to `toGroup`
    };
    Kind kind = Kind::Remove;
    std::string animal;
    Sex sex = Sex::Female;
    std::string newId; ///< Birth: empty gives `new-1`, `new-2`, ... in scenario order
    std::vector<std::string> matriarchs;
    std::string toGroup;
    int line = 0; ///< line of the scenario file, for messages (0: none)
};

/// A what-if scenario: the predicted order at one date (docs/methods.md "Matrilineal
/// rank prediction", Kawamura 1958; Datta 1988) before and after hypothetical changes.
///
/// Conventions: a newborn is placed as if already adult (`newbornsAsAdults`, the
/// place the rule gives her once mature) unless that is switched off; an
/// introduced female has an unknown birth date (so she counts as mature), no
/// mother, and founds a matriline of her own that is placed at the bottom of her
/// group, below every existing matriline, in the order of introduction: newcomers
/// commonly enter a group at the bottom of the female hierarchy.
struct Scenario {
    std::optional<Day> at; ///< default: the date of the record's last encounter
    std::string group;     ///< the group changed; empty: every group resident that day
    SiblingRule rule = SiblingRule::Youngest;
    int maturityYears = kDefaultMaturityYears;
    std::vector<std::string> matrilineOrder; ///< explicit order (matriarch ids) of the lines, as in `inherit`
    int recentDays = 180; ///< observed dyads: decided encounters of the last this-many days up to the date
    bool newbornsAsAdults = true;
    EloSettings elo; ///< observed ranks: Elo over every encounter of the record up to the date
    std::vector<ScenarioChange> changes;
    int dateLine = 0, groupLine = 0, matrilineOrderLine = 0; ///< lines of those settings, for messages
};

/// A scenario that cannot be applied: a line and what is wrong with it.
struct ScenarioProblem {
    int line = 0;
    std::string message;
};

/// Thrown by runScenario for a scenario that checkScenario rejects.
class ScenarioError : public std::runtime_error {
public:
    explicit ScenarioError(std::vector<ScenarioProblem> problems);
    const std::vector<ScenarioProblem>& problems() const { return problems_; }

private:
    std::vector<ScenarioProblem> problems_;
};

/// Everything wrong with a scenario against a colony: unknown or non-resident
/// animals, a mother that is not female, ids already taken, a split naming a
/// non-matriarch, a group that does not exist, a date with nothing to go on.
std::vector<ScenarioProblem> checkScenario(const Colony& colony, const Scenario& scenario);
/// The same against compact records and the pedigree (its encounters not read).
std::vector<ScenarioProblem> checkScenario(const CompactEncounters& encounters, const Colony& pedigree,
                                           const Scenario& scenario);

/// One group's predicted order before and after the changes.
struct ScenarioGroup {
    std::string group;
    InheritancePrediction before; ///< empty for a group formed by a split
    InheritancePrediction after;
};

/// An animal's predicted move; ranks are positions in its group's predicted order.
struct ScenarioMove {
    std::string animal;
    std::string matriarch;
    std::string groupBefore;
    std::optional<int> rankBefore;
    std::string groupAfter;
    std::optional<int> rankAfter;
    /// `removed`, `new`, `moved` (other group), `rises`, `falls` or `unchanged`.
    std::string status;
};

/// An observed relationship the prediction after the change contradicts: over
/// the recent window the female predicted below won more decided encounters
/// against the one predicted above.
struct ScenarioReversal {
    std::string group;
    std::string predictedAbove;
    std::string predictedBelow;
    int winsPredictedAbove = 0;
    int winsPredictedBelow = 0;
    /// The pair was already predicted this way before the change (in one group).
    bool againstPredictionBefore = false;
};

/// What a scenario leads to.
struct ScenarioResult {
    Day at = 0;
    std::vector<ScenarioGroup> groups;
    std::vector<ScenarioMove> moves; ///< by group after, rank after; removed and unranked animals last
    std::vector<ScenarioReversal> reversals;
    std::vector<std::string> addedAnimals; ///< ids of newborns and introduced females
};

/// Applies the scenario's changes in order to a copy of the colony and predicts
/// each group's order before and after (docs/methods.md "Matrilineal rank prediction");
/// nothing is written anywhere. Throws ScenarioError when checkScenario finds problems.
ScenarioResult runScenario(const Colony& colony, const Scenario& scenario);
/// The same from compact records (the desktop's, without expanding them);
/// `pedigree`'s animals and residences are read, not its encounters.
ScenarioResult runScenario(const CompactEncounters& encounters, const Colony& pedigree, const Scenario& scenario);

/// The copy of the colony with the scenario's changes applied (as runScenario
/// sees it), for figures beyond the predicted order such as group composition.
/// Throws ScenarioError when checkScenario finds problems.
Colony scenarioColony(const Colony& colony, const Scenario& scenario);

} // namespace hierloom::core
