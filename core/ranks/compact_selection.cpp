// SPDX-License-Identifier: GPL-3.0-or-later
#include "core/ranks/compact_selection.h"

#include <algorithm>

namespace hierloom::core {

namespace {

/// The picking rules of selectEncounters (encounter_selection.cpp) on one record.
class Picker {
public:
    Picker(const CompactEncounters& encounters, const ResidenceIndex& where, const SelectionOptions& o)
        : o_(o), where_(where)
    {
        if (o.group.empty()) return;
        groupCode_ = encounters.groups.find(o.group);
        groupIndex_ = where.group(o.group);
        // Encounters without a group need the winner's residence index.
        whereOf_.resize(static_cast<size_t>(encounters.animals.size()));
        for (std::int32_t a = 0; a < encounters.animals.size(); ++a)
            whereOf_[static_cast<size_t>(a)] = where.animal(encounters.animals.name(a));
    }

    bool operator()(const CompactEncounter& e) const
    {
        if (o_.from && e.date < *o_.from) return false;
        if (o_.to && e.date > *o_.to) return false;
        if (e.draw && o_.draws == DrawPolicy::Ignore) return false;
        if (!o_.group.empty()) {
            // An encounter without a group belongs to the group both animals shared that day.
            if (e.group != 0) return e.group == groupCode_;
            const int w = whereOf_[static_cast<size_t>(e.winner)];
            if (groupIndex_ < 0 || w < 0 || where_.groupOn(w, e.date) != groupIndex_) return false;
        }
        return true;
    }

private:
    const SelectionOptions& o_;
    const ResidenceIndex& where_;
    std::int32_t groupCode_ = -1; // -1: no encounter names the group
    int groupIndex_ = -1;
    std::vector<int> whereOf_;
};

} // namespace

EncounterSelection selectEncounters(const CompactEncounters& encounters, const std::vector<Animal>& animals,
                                    const ResidenceIndex& where, const SelectionOptions& o)
{
    EncounterSelection sel;
    const Picker picks(encounters, where, o);
    const std::vector<CompactEncounter>& records = encounters.records;
    // Records in analysis order need no index list (the usual case: entered by date).
    const bool ordered = inAnalysisOrder(records);
    const std::vector<std::uint32_t> order = ordered ? std::vector<std::uint32_t>{} : analysisOrder(records);
    auto recordAt = [&](size_t k) { return ordered ? k : static_cast<size_t>(order[k]); };

    std::vector<unsigned char> used(static_cast<size_t>(encounters.animals.size()), 0);
    size_t count = 0;
    for (size_t k = 0; k < records.size(); ++k) {
        const CompactEncounter& e = records[recordAt(k)];
        if (!picks(e)) continue;
        used[static_cast<size_t>(e.winner)] = 1;
        used[static_cast<size_t>(e.loser)] = 1;
        ++count;
    }
    for (std::int32_t a = 0; a < encounters.animals.size(); ++a)
        if (used[static_cast<size_t>(a)]) sel.ids.push_back(encounters.animals.name(a));
    if (o.includeResidents) {
        const int groupIndex = o.group.empty() ? -1 : where.group(o.group);
        const Day from = o.from.value_or(-ResidenceIndex::openEnd);
        const Day to = o.to.value_or(ResidenceIndex::openEnd);
        for (const Animal& a : animals) {
            const int k = where.animal(a.id);
            if (k >= 0 && where.residentDuring(k, from, to, groupIndex) && (groupIndex >= 0 || o.group.empty()))
                sel.ids.push_back(a.id);
        }
    }
    std::sort(sel.ids.begin(), sel.ids.end());
    sel.ids.erase(std::unique(sel.ids.begin(), sel.ids.end()), sel.ids.end());
    // Code of the compact table -> index among the selection's sorted ids.
    std::vector<int> index(used.size(), -1);
    for (std::int32_t a = 0; a < encounters.animals.size(); ++a)
        if (used[static_cast<size_t>(a)]) index[static_cast<size_t>(a)] = sel.indexOf(encounters.animals.name(a));
    sel.bouts.reserve(count);
    sel.days.reserve(count);
    sel.source.reserve(count);
    for (size_t k = 0; k < records.size(); ++k) {
        const size_t i = recordAt(k);
        const CompactEncounter& e = records[i];
        if (!picks(e)) continue;
        sel.bouts.push_back({index[static_cast<size_t>(e.winner)], index[static_cast<size_t>(e.loser)], e.draw});
        sel.days.push_back(e.date);
        sel.source.push_back(i);
    }
    if (!sel.days.empty()) {
        sel.firstDay = sel.days.front();
        sel.lastDay = sel.days.back();
    }
    return sel;
}

} // namespace hierloom::core
