// SPDX-License-Identifier: GPL-3.0-or-later
#pragma once
#include "core/base/civil_date.h"

#include <cstdint>
#include <optional>
#include <string>
#include <string_view>
#include <unordered_map>
#include <vector>

namespace hierloom::core {

enum class Sex { Female, Male, Unknown };
enum class EntryType { None, Born, Introduced, Founder };
enum class ExitType { None, Died, Removed };
enum class Outcome { Decided, Draw };

/// One animal of the colony's pedigree and life history.
struct Animal {
    std::string id;
    std::string name;
    Sex sex = Sex::Unknown;
    std::optional<Day> birth;
    std::string mother; // empty when unknown
    std::string father; // empty when unknown
    std::optional<Day> entry;
    EntryType entryType = EntryType::None;
    std::optional<Day> exit;
    ExitType exitType = ExitType::None;
    std::string uid; // stable unique id for merging files
};

/// A period an animal spent in one social group; both ends are days of residence.
struct Residence {
    std::string animal;
    std::string group;
    Day from = 0;
    std::optional<Day> to; // empty while there
    std::string uid;
};

/// One agonistic encounter: the winner beat the loser (or a draw between them).
struct Encounter {
    Day date = 0;
    std::optional<int> time; // minutes after midnight
    std::string winner;
    std::string loser;
    Outcome outcome = Outcome::Decided;
    std::string behaviour;
    std::string group;
    std::string observer;
    std::string note;
    std::int64_t seq = 0; // order of entry or import
    std::string uid;
    /// Animals that joined the fight on the winner's or the loser's side
    /// (coalitionary support), in the order recorded; empty when none.
    std::vector<std::string> winnerSupport;
    std::vector<std::string> loserSupport;
};

/// The whole record of a colony, as plain values.
struct Colony {
    std::vector<Animal> animals;
    std::vector<Residence> residences;
    std::vector<Encounter> encounters; // in entry order (seq ascending)

    /// Index of the animal with this id, or -1.
    int animalIndex(const std::string& id) const;
    /// Rebuilds the id index after animals changed.
    void reindex();

private:
    std::unordered_map<std::string, int> index_;
};

/// True when `id` is the winner, the loser or a supporter of `e`.
bool takesPart(const Encounter& e, std::string_view id);

/// True when any encounter carries a supporter.
bool hasSupporters(const std::vector<Encounter>& encounters);

/// Supporter ids of one cell of encounters.csv: separated by spaces (runs of
/// spaces count as one), none when empty.
std::vector<std::string> splitSupporters(std::string_view cell);
/// The cell text of a list of supporters: ids joined by one space.
std::string joinSupporters(const std::vector<std::string>& ids);

/// Encounter order of docs/methods.md: date, then time (untimed last), then entry order.
bool encounterBefore(const Encounter& a, const Encounter& b);

/// Indices of `encounters` in analysis order.
std::vector<size_t> chronologicalOrder(const std::vector<Encounter>& encounters);
/// The indices `subset` of `encounters` (ascending) in analysis order: the
/// same order as chronologicalOrder(encounters) keeps them in, at the cost of
/// the subset (one group's rows of a whole centre) rather than of every row.
std::vector<size_t> chronologicalOrder(const std::vector<Encounter>& encounters, std::vector<size_t> subset);

const char* toString(Sex s);
const char* toString(EntryType t);
const char* toString(ExitType t);
const char* toString(Outcome o);
std::optional<Sex> parseSex(std::string_view s);
std::optional<EntryType> parseEntryType(std::string_view s);
std::optional<ExitType> parseExitType(std::string_view s);
std::optional<Outcome> parseOutcome(std::string_view s);

/// A fresh random version-4 UUID in its 36-character text form.
std::string newUid();

} // namespace hierloom::core
