// SPDX-License-Identifier: GPL-3.0-or-later
#pragma once
#include "core/base/colony.h"
#include "core/store/colony_edits.h"
#include "core/store/colony_store.h"

#include <optional>
#include <tuple>
#include <vector>

namespace hierloom::ui {

// Field-by-field equality of records, so the facade can drop an edit that
// changes nothing (core/base keeps its records free of operators).

inline bool sameRecord(const core::Encounter& a, const core::Encounter& b)
{
    return std::tie(a.date, a.time, a.winner, a.loser, a.outcome, a.behaviour, a.group, a.observer, a.note, a.seq, a.uid,
                    a.winnerSupport, a.loserSupport) ==
           std::tie(b.date, b.time, b.winner, b.loser, b.outcome, b.behaviour, b.group, b.observer, b.note, b.seq, b.uid,
                    b.winnerSupport, b.loserSupport);
}

inline bool sameRecord(const core::Animal& a, const core::Animal& b)
{
    return std::tie(a.id, a.name, a.sex, a.birth, a.mother, a.father, a.entry, a.entryType, a.exit, a.exitType, a.uid) ==
           std::tie(b.id, b.name, b.sex, b.birth, b.mother, b.father, b.entry, b.entryType, b.exit, b.exitType, b.uid);
}

inline bool sameRecord(const core::Residence& a, const core::Residence& b)
{
    return std::tie(a.animal, a.group, a.from, a.to, a.uid) == std::tie(b.animal, b.group, b.from, b.to, b.uid);
}

inline bool sameRecord(const core::ColonyStore::BehaviourCode& a, const core::ColonyStore::BehaviourCode& b)
{
    return std::tie(a.code, a.severity, a.description) == std::tie(b.code, b.severity, b.description);
}

template <typename T>
bool sameRecords(const std::vector<T>& a, const std::vector<T>& b)
{
    if (a.size() != b.size()) return false;
    for (size_t i = 0; i < a.size(); ++i)
        if (!sameRecord(a[i], b[i])) return false;
    return true;
}

inline bool sameRecord(const core::AnimalRecord& a, const core::AnimalRecord& b)
{
    return sameRecord(a.animal, b.animal) && sameRecords(a.residences, b.residences);
}

inline bool sameRecord(const std::optional<core::AnimalRecord>& a, const std::optional<core::AnimalRecord>& b)
{
    return a.has_value() == b.has_value() && (!a || sameRecord(*a, *b));
}

} // namespace hierloom::ui
