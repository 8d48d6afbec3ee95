// SPDX-License-Identifier: GPL-3.0-or-later
#pragma once
#include "core/base/colony.h"

#include <optional>
#include <string>

namespace hierloom::ui {

/// Which encounters the encounter table shows; an empty field lets all through.
struct EncounterFilter {
    std::optional<core::Day> from; ///< first day shown (inclusive)
    std::optional<core::Day> to;   ///< last day shown (inclusive)
    std::string animal;            ///< shown when this id won or lost
    std::optional<std::string> observer;

    bool accepts(const core::Encounter& e) const
    {
        if (from && e.date < *from) return false;
        if (to && e.date > *to) return false;
        if (!animal.empty() && e.winner != animal && e.loser != animal) return false;
        if (observer && e.observer != *observer) return false;
        return true;
    }
    bool operator==(const EncounterFilter&) const = default;
};

} // namespace hierloom::ui
