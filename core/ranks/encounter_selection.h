// SPDX-License-Identifier: GPL-3.0-or-later
#pragma once
#include "core/ranks/bout.h"
#include "core/base/colony.h"
#include "core/base/residence_index.h"

#include <optional>
#include <string>
#include <vector>

namespace hierloom::core {

/// Which encounters and animals an analysis uses (docs/methods.md, "Which
/// encounters, which animals, in which order").
struct SelectionOptions {
    std::optional<Day> from; // inclusive; default: all data
    std::optional<Day> to;   // inclusive
    std::string group;       // empty: every group
    DrawPolicy draws = DrawPolicy::Half;
    /// Also analyse animals resident in the window without any encounter.
    bool includeResidents = false;
};

/// The encounters of a window reduced to bouts between indexed animals.
struct EncounterSelection {
    std::vector<std::string> ids; // analysed animals, id ascending (byte order)
    std::vector<Bout> bouts;      // chronological order
    std::vector<Day> days;        // day of each bout
    std::vector<size_t> source;   // index of each bout's encounter in Colony::encounters
    std::optional<Day> firstDay;  // of the window's counted encounters
    std::optional<Day> lastDay;

    int size() const { return static_cast<int>(ids.size()); }
    /// Index of an id among the analysed animals, or -1.
    int indexOf(const std::string& id) const;
};

/// Selects the window's encounters in analysis order: date, time (untimed
/// last), entry order. Ignored draws are dropped entirely.
EncounterSelection selectEncounters(const Colony& colony, const ResidenceIndex& where, const SelectionOptions& options);

/// Animals of `ids` resident on day d (in `group` if not empty).
std::vector<bool> residentMask(const std::vector<std::string>& ids, const ResidenceIndex& where, Day d,
                               const std::string& group);

} // namespace hierloom::core
