// SPDX-License-Identifier: GPL-3.0-or-later
#include "core/encounter_selection.h"

#include <algorithm>

namespace hierloom::core {

int EncounterSelection::indexOf(const std::string& id) const
{
    auto it = std::lower_bound(ids.begin(), ids.end(), id);
    return it != ids.end() && *it == id ? static_cast<int>(it - ids.begin()) : -1;
}

EncounterSelection selectEncounters(const Colony& colony, const ResidenceIndex& where, const SelectionOptions& o)
{
    EncounterSelection sel;
    const int groupIndex = o.group.empty() ? -1 : where.group(o.group);
    std::vector<size_t> picked;
    for (size_t i : chronologicalOrder(colony.encounters)) {
        const Encounter& e = colony.encounters[i];
        if (o.from && e.date < *o.from) continue;
        if (o.to && e.date > *o.to) continue;
        if (e.outcome == Outcome::Draw && o.draws == DrawPolicy::Ignore) continue;
        if (!o.group.empty()) {
            // An encounter without a group belongs to the group both animals shared that day.
            if (!e.group.empty()) {
                if (e.group != o.group) continue;
            } else {
                const int w = where.animal(e.winner);
                if (groupIndex < 0 || w < 0 || where.groupOn(w, e.date) != groupIndex) continue;
            }
        }
        picked.push_back(i);
    }
    std::vector<std::string> ids;
    for (size_t i : picked) {
        ids.push_back(colony.encounters[i].winner);
        ids.push_back(colony.encounters[i].loser);
    }
    if (o.includeResidents) {
        const Day from = o.from.value_or(-ResidenceIndex::openEnd);
        const Day to = o.to.value_or(ResidenceIndex::openEnd);
        for (const Animal& a : colony.animals) {
            const int k = where.animal(a.id);
            if (k >= 0 && where.residentDuring(k, from, to, groupIndex) && (groupIndex >= 0 || o.group.empty()))
                ids.push_back(a.id);
        }
    }
    std::sort(ids.begin(), ids.end());
    ids.erase(std::unique(ids.begin(), ids.end()), ids.end());
    sel.ids = std::move(ids);
    sel.bouts.reserve(picked.size());
    for (size_t i : picked) {
        const Encounter& e = colony.encounters[i];
        sel.bouts.push_back({sel.indexOf(e.winner), sel.indexOf(e.loser), e.outcome == Outcome::Draw});
        sel.days.push_back(e.date);
        sel.source.push_back(i);
    }
    if (!sel.days.empty()) {
        sel.firstDay = sel.days.front();
        sel.lastDay = sel.days.back();
    }
    return sel;
}

std::vector<bool> residentMask(const std::vector<std::string>& ids, const ResidenceIndex& where, Day d,
                               const std::string& group)
{
    const int g = group.empty() ? -1 : where.group(group);
    std::vector<bool> mask(ids.size(), false);
    for (size_t i = 0; i < ids.size(); ++i) {
        const int k = where.animal(ids[i]);
        if (k < 0) continue;
        const int on = where.groupOn(k, d);
        mask[i] = on >= 0 && (group.empty() || on == g);
    }
    return mask;
}

} // namespace hierloom::core
