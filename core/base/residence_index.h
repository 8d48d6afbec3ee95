// SPDX-License-Identifier: GPL-3.0-or-later
#pragma once
#include "core/base/colony.h"

#include <string>
#include <string_view>
#include <unordered_map>
#include <vector>

namespace hierloom::core {

/// Hash for string keys that also accepts string_view lookups without copying.
struct StringHash {
    using is_transparent = void;
    size_t operator()(std::string_view s) const { return std::hash<std::string_view>{}(s); }
};
using IdIndex = std::unordered_map<std::string, int, StringHash, std::equal_to<>>;

/// Answers "where was this animal on day D": its life span (entry or birth
/// to exit) and its group memberships, each residence ending no later than
/// the exit (docs/methods.md, "Residence": both end days count).
class ResidenceIndex {
public:
    struct Stint {
        int group; // index into groups()
        Day from;
        Day to; // inclusive; a large value while open
    };
    static constexpr Day openEnd = 1 << 29;

    ResidenceIndex() = default;
    ResidenceIndex(const std::vector<Animal>& animals, const std::vector<Residence>& residences);

    /// Index of an animal id, or -1.
    int animal(std::string_view id) const;
    /// Group index of the animal on day d, or -1 when it was in none.
    int groupOn(int animal, Day d) const;
    /// True when the animal was alive and in the colony on day d.
    bool presentOn(int animal, Day d) const;
    /// First and last day of its life in the colony.
    Day start(int animal) const { return life_[static_cast<size_t>(animal)].first; }
    Day end(int animal) const { return life_[static_cast<size_t>(animal)].second; }
    const std::vector<Stint>& stints(int animal) const { return stints_[static_cast<size_t>(animal)]; }
    /// True when the animal was in some group at any day of [from, to].
    bool residentDuring(int animal, Day from, Day to, int group = -1) const;

    const std::vector<std::string>& groups() const { return groups_; }
    int group(std::string_view name) const;
    int animalCount() const { return static_cast<int>(life_.size()); }

private:
    IdIndex ids_;
    std::vector<std::pair<Day, Day>> life_;
    std::vector<std::vector<Stint>> stints_;
    std::vector<std::string> groups_;
    IdIndex groupIds_;
};

/// First day of an animal's life in the colony: entry date, else birth date.
std::optional<Day> lifeStart(const Animal& a);

} // namespace hierloom::core
