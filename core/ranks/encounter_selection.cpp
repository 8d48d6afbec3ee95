// SPDX-License-Identifier: GPL-3.0-or-later
#include "core/ranks/encounter_selection.h"

#include <algorithm>
#include <string_view>
#include <unordered_map>
#include <unordered_set>

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
    // Each row is kept or not on its own, so the rows are picked first and
    // only the picked ones are put in analysis order (one group of a centre
    // costs its own rows' sort, not the whole file's).
    std::vector<size_t> picked;
    for (size_t i = 0; i < colony.encounters.size(); ++i) {
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
    picked = chronologicalOrder(colony.encounters, std::move(picked));
    // Distinct ids first (a million encounters name a few hundred animals), then sorted.
    std::unordered_set<std::string_view> distinct;
    for (size_t i : picked) {
        distinct.insert(colony.encounters[i].winner);
        distinct.insert(colony.encounters[i].loser);
    }
    if (o.includeResidents) {
        const Day from = o.from.value_or(-ResidenceIndex::openEnd);
        const Day to = o.to.value_or(ResidenceIndex::openEnd);
        for (const Animal& a : colony.animals) {
            const int k = where.animal(a.id);
            if (k >= 0 && where.residentDuring(k, from, to, groupIndex) && (groupIndex >= 0 || o.group.empty()))
                distinct.insert(a.id);
        }
    }
    sel.ids.assign(distinct.begin(), distinct.end());
    std::sort(sel.ids.begin(), sel.ids.end());
    std::unordered_map<std::string_view, int> index;
    for (size_t k = 0; k < sel.ids.size(); ++k) index.emplace(sel.ids[k], static_cast<int>(k));
    sel.bouts.reserve(picked.size());
    sel.days.reserve(picked.size());
    sel.source.reserve(picked.size());
    for (size_t i : picked) {
        const Encounter& e = colony.encounters[i];
        sel.bouts.push_back({index.at(e.winner), index.at(e.loser), e.outcome == Outcome::Draw});
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
