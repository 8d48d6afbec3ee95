// SPDX-License-Identifier: GPL-3.0-or-later
#pragma once
#include "core/base/colony.h"
#include "core/base/field_problem.h"

#include <string_view>
#include <vector>

namespace hierloom::core {

/// Every rule a stay of an animal in a group obeys (docs/file-formats.md,
/// "residences.csv"), in the order their problems are reported; the import and the
/// pedigree dialogs (moves, exits, new animals) check stays only here.
enum class ResidenceRule {
    AnimalKnown,      // animal: an animal of the colony (or of the import's animals file)
    GroupGiven,       // group: not empty
    GroupText,        // group: no control character but tab
    DatesNotInFuture, // from, to: not after today
    ToNotBeforeFrom,  // to: not before from
    WithinLife,       // from, to: inside the animal's life in the colony
    NoOverlap,        // from: no other stay of the animal on the same day
    Count
};

const char* ruleName(ResidenceRule rule);

/// Fields an import could not read from their text (it has said why).
struct ResidenceUnread {
    static constexpr unsigned from = 1, to = 2;
};

/// One other stay of the same animal; `line` is its import file line, 0 for a stay in the colony.
struct StaySpan {
    Day from = 0;
    Day to = 0; // ResidenceIndex::openEnd while open
    int line = 0;
};

/// What a stay is checked against.
struct ResidenceContext {
    Day today = 0;
    const Animal* animal = nullptr;               // the stay's animal, nullptr when unknown
    const std::vector<StaySpan>* others = nullptr; // its other stays
    std::string_view known = "the colony";        // where an unknown animal was looked for
};

/// Appends the problems of stay `r` to `out` (which may already hold the
/// problems an import found in the row's text: the life and overlap rules
/// need a row with nothing wrong so far). True when the stay lies within the
/// animal's life, so that it may stand as another stay for later rows.
bool checkStay(const Residence& r, const ResidenceContext& ctx, FieldProblems& out, unsigned unread = 0);

/// Every rule for one stay of `a` edited by hand; `otherStays` are stays in
/// the colony (those of other animals and `r`'s own old version are left out).
FieldProblems checkResidence(const Residence& r, const Animal& a, const std::vector<Residence>& otherStays, Day today);

} // namespace hierloom::core
