// SPDX-License-Identifier: GPL-3.0-or-later
#pragma once
#include "core/base/civil_date.h"
#include "core/base/colony.h"
#include "core/base/residence_index.h"
#include "core/ranks/bout.h"
#include "core/ranks/elo_rating.h"

#include <cstddef>
#include <functional>
#include <optional>
#include <string>
#include <string_view>
#include <vector>

namespace hierloom::core {

/// Where a daughter enters the Elo ranking (docs/methods.md "Rule-informed Elo"):
/// at the start value like everyone (None, the default), or at the place the
/// sibling rule of matrilineal inheritance gives her: youngest ascendancy
/// (Kawamura 1958; Datta 1988) or the eldest-first rule.
enum class EloStartRule { None, Youngest, Eldest };

/// `none`, `youngest`, `eldest`.
const char* toString(EloStartRule rule);
/// Reads `none`, `youngest` or `eldest`; empty otherwise.
std::optional<EloStartRule> parseEloStartRule(std::string_view text);

/// Points below her upper neighbour a daughter starts when nobody is rated below it.
inline constexpr double kInformedStartOffset = 100;

/// What the start rule needs to know of the analysed animals 0..n-1.
struct EloFamily {
    std::vector<int> mother;                ///< index of the mother among the analysed animals, -1 if none
    std::vector<std::optional<Day>> birth;  ///< empty when unknown
    std::vector<bool> female;
};

/// The family facts of `ids` (analysed animals, id ascending) from the colony's records.
EloFamily eloFamilyOf(const Colony& colony, const std::vector<std::string>& ids);

/// True when animal i (analysed index) is present in the analysed group on day d.
using PresentOn = std::function<bool(int animal, Day d)>;

/// PresentOn from the residence index: resident on d (in `group` when not empty).
PresentOn residencePresence(const std::vector<std::string>& ids, const ResidenceIndex& where, const std::string& group);

/// The informed start of animal f (docs/methods.md "Rule-informed Elo"), or
/// empty when she starts at the start value: f is female, her mother is
/// analysed, rated and present; U is the family member just above her in the
/// rule's order of mother and rated, present daughters (youngest: mother, then
/// daughters by birth date descending; eldest: ascending; unknown birth dates
/// as the eldest, equal dates by id); L is the rated, present animal just below
/// U in the current order (rating descending, ties by index). She starts at
/// (R_U + R_L) / 2, or R_U - 100 when there is no L.
std::optional<double> informedStart(int f, const std::vector<double>& rating, const std::vector<bool>& rated,
                                    const std::vector<bool>& present, const EloFamily& family, EloStartRule rule);

/// A sequential Elo run followed encounter by encounter.
struct EloTrace {
    std::vector<EloRun> checkpoints;             ///< the run after the first boutCounts[c] bouts
    std::vector<double> winnerChance;            ///< per bout: E(R_w - R_l) just before it (after any informed start)
    std::vector<std::optional<double>> entry;    ///< per animal: its informed start, when it had one
};

/// Called before bout `b` is rated, with the ratings and rated flags (0/1) as they stand.
using EloObserver =
    std::function<void(size_t b, const std::vector<double>& rating, const std::vector<unsigned char>& rated)>;

/// Sequential Elo (as runElo, identical numbers) where each animal entering
/// the ranking at its first counted bout starts where the start rule puts it
/// (informedStart, with the ratings of the animals rated before that bout and
/// present that day); with EloStartRule::None it is plain Elo. Read at the
/// given bout counts (any order); a count beyond the bouts throws std::out_of_range.
/// `observe`, when set, sees the ratings before every bout (after any informed
/// start of its animals), so a caller can read them without a copy per bout.
EloTrace traceElo(int n, const std::vector<Bout>& bouts, const std::vector<Day>& days, const EloSettings& settings,
                  EloStartRule rule, const EloFamily& family, const PresentOn& present,
                  const std::vector<size_t>& boutCounts, const EloObserver& observe = {});

} // namespace hierloom::core
