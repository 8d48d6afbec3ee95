// SPDX-License-Identifier: GPL-3.0-or-later
#pragma once
#include "core/base/civil_date.h"
#include "core/base/colony.h"

#include <cstdint>
#include <map>
#include <string>
#include <vector>

namespace hierloom::core {

/// The invented scenario of the bundled demo colony: a rhesus macaque
/// (Macaca mulatta) breeding group whose latent order follows matrilineal
/// rank inheritance with youngest ascendancy (Kawamura 1958; Datta 1988).
namespace demo {
inline constexpr std::uint64_t kDefaultSeed = 20260601;
inline constexpr const char* kStation = "Larchmere Primate Field Station";
inline constexpr const char* kGroup = "North Corral";
inline constexpr CivilDate kRecordStart{2019, 1, 1};
inline constexpr CivilDate kRecordEnd{2025, 12, 31};
/// Matriline C overthrows matriline B between these two days (both included).
inline constexpr CivilDate kRevoltStart{2023, 5, 15};
inline constexpr CivilDate kRevoltEnd{2023, 7, 31};
/// The one unrelated adult female introduced; she founds matriline E.
inline constexpr CivilDate kIntroduction{2020, 9, 14};
/// The one removal of the record (a B-line female taken out for veterinary care).
inline constexpr CivilDate kRemoval{2022, 3, 8};
/// Matriline letters in their latent order at the start of the record.
inline constexpr const char* kLinesBeforeRevolt = "ABCDE";
/// ... and after the revolt, C above B for the rest of the record.
inline constexpr const char* kLinesAfterRevolt = "ACBDE";
} // namespace demo

/// Kind of a planted, persistent departure from the youngest-ascendancy
/// prediction of docs/methods.md ("Matrilineal rank prediction").
enum class PlantedReversalKind { SiblingOrder, DaughterOverMother, MaleBelowFemale, CrossMatriline };

/// One planted reversal: `upper` dominates `lower` for the whole record
/// although the inheritance rule (or, for a male, sex) predicts the opposite.
struct PlantedReversal {
    std::string upper;
    std::string lower;
    PlantedReversalKind kind;
    std::string description;
};

/// Scenario facts of one generated demo colony, for tests and documentation.
struct DemoColonyFacts {
    /// Matriarch ids by matriline letter: A, B, C, D (founders) and E (the introduced female).
    std::map<char, std::string> matriarchs;
    /// Matriline letter of every animal descended from (or being) a matriarch.
    std::map<std::string, char> lineOf;
    std::string introducedFemale;
    std::string removedAnimal;
    std::vector<std::string> founderMales;    // unrelated adult males present on day one
    std::vector<std::string> introducedMales; // unrelated adult males who joined later
    std::vector<std::string> observers;
    std::vector<PlantedReversal> reversals;
};

/// The bundled demo colony (invented): a deterministic record of the North
/// Corral group, 2019-2025, whose encounters follow a latent matrilineal order
/// (Kawamura 1958; Datta 1988) with the planted reversals and revolt described
/// by demoColonyFacts(). Uids are left empty; seq runs 1..N in row order.
/// Only std::mt19937_64 with hand-written draws is used, so the output is the
/// same with every compiler and standard library.
Colony generateDemoColony(std::uint64_t seed = demo::kDefaultSeed);

/// The scenario facts (ids of matriarchs, planted reversals, ...) of the colony
/// generateDemoColony(seed) returns.
DemoColonyFacts demoColonyFacts(std::uint64_t seed = demo::kDefaultSeed);

/// The civil date as a day count (a convenience for the constants above).
inline Day toDay(CivilDate c) { return dayFromCivil(c.year, c.month, c.day); }

/// Stable text of a planted reversal kind, as in the `inherit --dyads` categories
/// (`male_below_female` has no such category: males are not ranked there).
const char* toString(PlantedReversalKind kind);

} // namespace hierloom::core
