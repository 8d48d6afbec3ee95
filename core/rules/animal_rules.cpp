// SPDX-License-Identifier: GPL-3.0-or-later
#include "core/rules/animal_rules.h"

#include "core/rules/identifier_rules.h"
#include "core/base/residence_index.h"

#include <unordered_map>
#include <unordered_set>

namespace hierloom::core {

namespace {

void futureDate(const std::optional<Day>& d, Day today, const char* field, FieldProblems& out)
{
    if (d && *d > today) out.push_back({field, quotedValue(formatDate(*d)) + " is in the future"});
}

} // namespace

// Wording follows core/store/colony_import.cpp (planAnimals) so that a refused edit
// reads like the same row refused by an import.
FieldProblems checkAnimal(const Animal& a, const std::vector<Animal>& colony, Day today)
{
    FieldProblems out;
    std::unordered_map<std::string_view, const Animal*> byId;
    for (const Animal& other : colony)
        if (a.uid.empty() || other.uid != a.uid) byId.emplace(other.id, &other);

    if (a.id.empty()) out.push_back({"id", "is empty; every animal needs an id"});
    else if (!isValidAnimalId(a.id)) out.push_back({"id", quotedValue(a.id) + " must be 1-32 letters, digits, '_', '-' or '.'"});
    else if (byId.count(a.id)) out.push_back({"id", quotedValue(a.id) + " is already in the colony"});

    futureDate(a.birth, today, "birth_date", out);
    futureDate(a.entry, today, "entry_date", out);
    futureDate(a.exit, today, "exit_date", out);
    if (a.exit && a.exitType == ExitType::None)
        out.push_back({"exit_type", "is required when exit_date is given (died or removed)"});
    if (!a.exit && a.exitType != ExitType::None) out.push_back({"exit_date", "is required when exit_type is given"});
    if (!a.birth && !a.entry)
        out.push_back({"entry_date", "is needed when birth_date is empty (the day the animal joined)"});
    if (a.birth && a.entry && *a.entry < *a.birth)
        out.push_back({"entry_date", formatDate(*a.entry) + " is before the birth date " + formatDate(*a.birth)});
    const auto start = lifeStart(a);
    if (a.exit && start && *a.exit < *start)
        out.push_back({"exit_date", formatDate(*a.exit) + " is before the entry date " + formatDate(*start)});

    struct Parent {
        const std::string& id;
        const char* field;
        Sex sex;
        const char* word;
        const char* pronoun;
    };
    for (const Parent& p : {Parent{a.mother, "mother", Sex::Female, "female", "her"},
                            Parent{a.father, "father", Sex::Male, "male", "his"}}) {
        if (p.id.empty()) continue;
        auto it = byId.find(p.id);
        if (p.id == a.id) out.push_back({p.field, quotedValue(p.id) + " is the animal itself"});
        else if (it == byId.end()) out.push_back({p.field, quotedValue(p.id) + " is not an animal of the colony"});
        else if (it->second->sex != p.sex) out.push_back({p.field, quotedValue(p.id) + " is not recorded as " + p.word});
        else if (it->second->birth && a.birth && *it->second->birth >= *a.birth)
            out.push_back({p.field, quotedValue(p.id) + " was born on " + formatDate(*it->second->birth) + ", not before " +
                                        p.pronoun + " offspring (" + formatDate(*a.birth) + ")"});
    }

    // A loop of parent links can only pass through `a`: walk its ancestors.
    if (!a.id.empty()) {
        // Each ancestor remembers which of a's columns it was reached through, which is the one reported.
        std::vector<std::pair<const std::string*, const char*>> todo{{&a.mother, "mother"}, {&a.father, "father"}};
        std::unordered_set<std::string_view> seen;
        const char* loop = nullptr;
        while (!todo.empty() && !loop) {
            const auto [id, column] = todo.back();
            todo.pop_back();
            if (id->empty() || !seen.insert(*id).second) continue;
            if (*id == a.id) {
                loop = column;
                break;
            }
            auto it = byId.find(*id);
            if (it == byId.end()) continue;
            todo.push_back({&it->second->mother, column});
            todo.push_back({&it->second->father, column});
        }
        if (loop && a.mother != a.id && a.father != a.id)
            out.push_back({loop, quotedValue(a.id) + " would be its own ancestor (a loop of parent links)"});
    }

    // Edits must keep the animal a valid parent of its recorded offspring.
    for (const Animal& child : colony) {
        if (child.uid == a.uid && !a.uid.empty()) continue;
        const bool mother = child.mother == a.id;
        const bool father = child.father == a.id;
        if (!mother && !father) continue;
        const Sex needed = mother ? Sex::Female : Sex::Male;
        if (a.sex != needed) {
            out.push_back({"sex", quotedValue(a.id) + " is the " + (mother ? "mother" : "father") + " of " +
                                      quotedValue(child.id) + " and must stay " + (mother ? "female" : "male")});
            break;
        }
        if (a.birth && child.birth && *a.birth >= *child.birth) {
            out.push_back({"birth_date", formatDate(*a.birth) + " is not before the birth of " + quotedValue(child.id) +
                                             " (" + formatDate(*child.birth) + "), whose parent " + a.id + " is"});
            break;
        }
    }
    return out;
}

// Wording follows core/store/colony_import.cpp (planResidences).
FieldProblems checkResidence(const Residence& r, const Animal& a, const std::vector<Residence>& otherStays, Day today)
{
    FieldProblems out;
    if (r.group.empty()) out.push_back({"group", "is empty"});
    futureDate(r.from, today, "from", out);
    futureDate(r.to, today, "to", out);
    if (r.to && *r.to < r.from) out.push_back({"to", formatDate(*r.to) + " is before from " + formatDate(r.from)});
    if (!out.empty()) return out;
    const auto start = lifeStart(a);
    if (start && r.from < *start)
        out.push_back({"from", formatDate(r.from) + " is before " + a.id + " joined the colony (" + formatDate(*start) + ")"});
    else if (a.exit && r.from > *a.exit)
        out.push_back({"from", formatDate(r.from) + " is after " + a.id + " left the colony (" + formatDate(*a.exit) + ")"});
    else if (a.exit && r.to && *r.to > *a.exit)
        out.push_back({"to", formatDate(*r.to) + " is after " + a.id + " left the colony (" + formatDate(*a.exit) + ")"});
    if (!out.empty()) return out;
    const Day to = r.to.value_or(ResidenceIndex::openEnd);
    for (const Residence& s : otherStays) {
        if ((!r.uid.empty() && s.uid == r.uid) || s.animal != r.animal) continue;
        if (s.from <= to && r.from <= s.to.value_or(ResidenceIndex::openEnd)) {
            out.push_back({"from", "this stay of " + r.animal +
                                       " overlaps one already in the colony (an animal lives in one group at a time)"});
            break;
        }
    }
    return out;
}

} // namespace hierloom::core
