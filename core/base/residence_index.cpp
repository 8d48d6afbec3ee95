// SPDX-License-Identifier: GPL-3.0-or-later
#include "core/base/residence_index.h"

#include <algorithm>

namespace hierloom::core {

std::optional<Day> lifeStart(const Animal& a) { return a.entry ? a.entry : a.birth; }

ResidenceIndex::ResidenceIndex(const std::vector<Animal>& animals, const std::vector<Residence>& residences)
{
    ids_.reserve(animals.size());
    life_.reserve(animals.size());
    stints_.resize(animals.size());
    for (size_t i = 0; i < animals.size(); ++i) {
        ids_.emplace(animals[i].id, static_cast<int>(i));
        const Animal& a = animals[i];
        life_.emplace_back(lifeStart(a).value_or(-openEnd), a.exit.value_or(openEnd));
    }
    for (const Residence& r : residences) {
        const int a = animal(r.animal);
        if (a < 0) continue;
        int g = group(r.group);
        if (g < 0) {
            g = static_cast<int>(groups_.size());
            groups_.push_back(r.group);
            groupIds_.emplace(r.group, g);
        }
        const Day to = std::min(r.to.value_or(openEnd), life_[static_cast<size_t>(a)].second);
        stints_[static_cast<size_t>(a)].push_back({g, r.from, to});
    }
    for (auto& s : stints_)
        std::sort(s.begin(), s.end(), [](const Stint& x, const Stint& y) { return x.from < y.from; });
}

int ResidenceIndex::animal(std::string_view id) const
{
    auto it = ids_.find(id);
    return it == ids_.end() ? -1 : it->second;
}

int ResidenceIndex::group(std::string_view name) const
{
    auto it = groupIds_.find(name);
    return it == groupIds_.end() ? -1 : it->second;
}

bool ResidenceIndex::presentOn(int a, Day d) const
{
    const auto& l = life_[static_cast<size_t>(a)];
    return d >= l.first && d <= l.second;
}

int ResidenceIndex::groupOn(int a, Day d) const
{
    if (!presentOn(a, d)) return -1;
    for (const Stint& s : stints_[static_cast<size_t>(a)])
        if (d >= s.from && d <= s.to) return s.group;
    return -1;
}

bool ResidenceIndex::residentDuring(int a, Day from, Day to, int g) const
{
    for (const Stint& s : stints_[static_cast<size_t>(a)])
        if (s.from <= to && s.to >= from && (g < 0 || s.group == g)) return true;
    return false;
}

} // namespace hierloom::core
