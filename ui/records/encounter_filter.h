// SPDX-License-Identifier: GPL-3.0-or-later
#pragma once
#include "core/base/colony.h"
#include "core/base/encounter_records.h"

#include <optional>
#include <string>

namespace hierloom::ui {

/// Which encounters the encounter table shows; an empty field lets all through.
struct EncounterFilter {
    std::optional<core::Day> from; ///< first day shown (inclusive)
    std::optional<core::Day> to;   ///< last day shown (inclusive)
    std::string animal;            ///< shown when this id won or lost
    std::optional<std::string> observer;
    /// Free text, lower case: shown when any of ids, behaviour, group,
    /// observer or note contains it (ignoring the case of ASCII letters).
    std::string text;

    static bool contains(const std::string& field, const std::string& lowerNeedle)
    {
        const auto lower = [](unsigned char c) { return static_cast<char>(c >= 'A' && c <= 'Z' ? c + 32 : c); };
        if (lowerNeedle.size() > field.size()) return false;
        for (size_t i = 0; i + lowerNeedle.size() <= field.size(); ++i) {
            size_t k = 0;
            while (k < lowerNeedle.size() && lower(static_cast<unsigned char>(field[i + k])) == lowerNeedle[k]) ++k;
            if (k == lowerNeedle.size()) return true;
        }
        return false;
    }

    bool accepts(const core::Encounter& e) const
    {
        if (from && e.date < *from) return false;
        if (to && e.date > *to) return false;
        if (!animal.empty() && e.winner != animal && e.loser != animal) return false;
        if (observer && e.observer != *observer) return false;
        if (!text.empty()) {
            bool found = false;
            for (const std::string* field : {&e.winner, &e.loser, &e.behaviour, &e.group, &e.observer, &e.note})
                found = found || contains(*field, text);
            if (!found) return false;
        }
        return true;
    }
    bool operator==(const EncounterFilter&) const = default;
};

/// EncounterFilter::accepts(records.at(i)) without building the Encounter:
/// the filter's ids and texts are looked up in the records' code tables once.
class EncounterFilterOnRecords {
public:
    EncounterFilterOnRecords(const EncounterFilter& filter, const core::EncounterRecords& records);
    bool accepts(size_t i) const;

private:
    const EncounterFilter& filter_;
    const core::EncounterRecords& records_;
    std::int32_t animal_ = -1;   ///< code of filter.animal; -1 when no record has it
    std::int32_t observer_ = -1; ///< code of *filter.observer; -1 when no record has it
    /// Per code of each table: whether its text contains filter.text.
    std::vector<bool> animalText_, behaviourText_, groupText_, observerText_;
};

} // namespace hierloom::ui
