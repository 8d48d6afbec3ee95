// SPDX-License-Identifier: GPL-3.0-or-later
#pragma once
#include "core/base/colony.h"
#include "core/base/field_problem.h"

#include <vector>

namespace hierloom::core {

/// Checks one animal added or edited by hand under the import's animal rules
/// (interfaces.md, "Animals"), with the import's wording: a valid id not used
/// by another record, dates real and not in the future, entry not before
/// birth, exit not before entry, exit date and type together, parents known,
/// of the right sex, born before their offspring and not making a loop of
/// parent links. `colony` holds the colony's animals; a record with the same
/// uid as `a` is the version being replaced. Also checks that `a`, if it is
/// already a parent, keeps the sex and birth date its offspring need.
FieldProblems checkAnimal(const Animal& a, const std::vector<Animal>& colony, Day today);

/// Checks one stay of `a` in a group under the import's residence rules
/// (interfaces.md, "Residences"): a group name, from not after to, within the
/// animal's life in the colony, and not overlapping `otherStays` (its other
/// stays; an animal lives in one group at a time).
FieldProblems checkResidence(const Residence& r, const Animal& a, const std::vector<Residence>& otherStays, Day today);

} // namespace hierloom::core
