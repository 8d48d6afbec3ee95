// SPDX-License-Identifier: GPL-3.0-or-later
#include "core/matriline_founder.h"

namespace hierloom::core {

std::string matrilineFounder(const Colony& colony, const std::string& id)
{
    int at = colony.animalIndex(id);
    if (at < 0) return {};
    // A chain longer than the number of animals must revisit one: a cycle.
    for (size_t steps = 0; steps <= colony.animals.size(); ++steps) {
        const Animal& animal = colony.animals[static_cast<size_t>(at)];
        if (animal.mother.empty()) return animal.id;
        const int mother = colony.animalIndex(animal.mother);
        if (mother < 0) return animal.mother;
        at = mother;
    }
    return {};
}

} // namespace hierloom::core
