// SPDX-License-Identifier: GPL-3.0-or-later
#include "ui/records/encounter_filter.h"

namespace hierloom::ui {

namespace {

std::vector<bool> codesContaining(const core::CodeTable& table, const std::string& lowerNeedle)
{
    std::vector<bool> out(static_cast<size_t>(table.size()), false);
    if (lowerNeedle.empty()) return out;
    for (std::int32_t c = 0; c < table.size(); ++c)
        out[static_cast<size_t>(c)] = EncounterFilter::contains(table.name(c), lowerNeedle);
    return out;
}

} // namespace

EncounterFilterOnRecords::EncounterFilterOnRecords(const EncounterFilter& filter, const core::EncounterRecords& records)
    : filter_(filter), records_(records)
{
    const core::CompactEncounters& c = records.compact();
    if (!filter.animal.empty()) animal_ = c.animals.find(filter.animal);
    if (filter.observer) observer_ = c.observers.find(*filter.observer);
    animalText_ = codesContaining(c.animals, filter.text);
    behaviourText_ = codesContaining(c.behaviours, filter.text);
    groupText_ = codesContaining(c.groups, filter.text);
    observerText_ = codesContaining(c.observers, filter.text);
}

bool EncounterFilterOnRecords::accepts(size_t i) const
{
    const core::CompactEncounter& r = records_.record(i);
    if (filter_.from && r.date < *filter_.from) return false;
    if (filter_.to && r.date > *filter_.to) return false;
    if (!filter_.animal.empty() && (animal_ < 0 || (r.winner != animal_ && r.loser != animal_))) return false;
    if (filter_.observer && (observer_ < 0 || r.observer != observer_)) return false;
    if (!filter_.text.empty()) {
        const auto at = [](const std::vector<bool>& has, std::int32_t code) { return has[static_cast<size_t>(code)]; };
        if (!at(animalText_, r.winner) && !at(animalText_, r.loser) && !at(behaviourText_, r.behaviour) &&
            !at(groupText_, r.group) && !at(observerText_, r.observer) &&
            !EncounterFilter::contains(records_.note(i), filter_.text))
            return false;
    }
    return true;
}

} // namespace hierloom::ui
