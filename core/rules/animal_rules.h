// SPDX-License-Identifier: GPL-3.0-or-later
#pragma once
#include "core/base/colony.h"
#include "core/base/field_problem.h"
#include "core/base/residence_index.h"

#include <string>
#include <string_view>
#include <vector>

namespace hierloom::core {

/// Every rule an animal record obeys (docs/file-formats.md, "animals.csv"), in the order
/// their problems are reported. The import, the pedigree dialogs and the merge
/// all check animals through this module, so each message is written once.
enum class AnimalRule {
    IdGiven,              // id: not empty
    IdForm,               // id: 1-32 letters, digits, '_', '-' or '.'
    IdUnique,             // id: not used by another animal (of the colony or the same file)
    DatesNotInFuture,     // birth_date, entry_date, exit_date: not after today
    ExitTypeWithExitDate, // exit_type: given when exit_date is
    ExitDateWithExitType, // exit_date: given when exit_type is
    EntryKnown,           // entry_date: needed without a birth date
    EntryNotBeforeBirth,  // entry_date: not before birth_date
    ExitNotBeforeEntry,   // exit_date: not before the entry (or birth)
    ParentNotItself,      // mother, father: not the animal itself
    ParentKnown,          // mother, father: an animal of the colony (or file)
    ParentSex,            // mother female, father male
    ParentBornBefore,     // mother, father: born before the offspring
    NoAncestorLoop,       // mother: no loop of parent links
    ParentKeepsSex,       // sex: an animal already a parent keeps the sex its offspring need
    ParentKeepsBirthOrder, // birth_date: an animal already a parent stays born before its offspring
    NameText,             // name: no control character but tab
    Count
};

const char* ruleName(AnimalRule rule);

/// Fields an import could not read from their text (it has said why); the
/// rules that need them are left out for that row.
struct AnimalUnread {
    static constexpr unsigned birth = 1, entry = 2, exit = 4, exitType = 8;
};

/// What an animal is checked against: the colony's animals (a record with
/// `replacedUid` is the version being edited and is left out) and, during an
/// import, the rows of its animals file read so far.
class AnimalContext {
public:
    AnimalContext(const std::vector<Animal>& colony, Day today, std::string_view replacedUid = {});

    /// Makes the rows of an import file known; `known` names the place an
    /// unknown parent was looked for. Rows join with addFileRow.
    void useFile(const std::vector<Animal>& rows, std::string_view known);
    void addFileRow(std::size_t index, int line);

    /// The animal with this id, or nullptr.
    const Animal* find(std::string_view id) const;
    /// The file line of the animal with this id: 0 when it is in the colony, -1 when unknown.
    int lineOf(std::string_view id) const;

    Day today() const { return today_; }
    std::string_view known() const { return known_; }
    const std::vector<Animal>& colony() const { return colony_; }
    const std::string& replacedUid() const { return replacedUid_; }

private:
    const std::vector<Animal>& colony_;
    Day today_;
    std::string replacedUid_;
    std::string_view known_ = "the colony";
    const std::vector<Animal>* file_ = nullptr;
    std::vector<int> lines_;
    IdIndex ids_; // colony index, or -1 - file index
};

/// The rules about the record itself (id, dates, exit), appended to `out`.
void checkAnimalRow(const Animal& a, const AnimalContext& ctx, FieldProblems& out, unsigned unread = 0);

/// The rules about its links to other animals (parents, loops, offspring);
/// an import runs them once every row of its file is known.
void checkAnimalLinks(const Animal& a, const AnimalContext& ctx, FieldProblems& out);

/// Every animal rule for one animal added or edited by hand; `colony` holds
/// the colony's animals, a record with the same uid as `a` is the version
/// being replaced.
FieldProblems checkAnimal(const Animal& a, const std::vector<Animal>& colony, Day today);

} // namespace hierloom::core
