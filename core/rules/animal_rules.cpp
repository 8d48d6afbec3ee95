// SPDX-License-Identifier: GPL-3.0-or-later
#include "core/rules/animal_rules.h"

#include "core/rules/identifier_rules.h"
#include "core/rules/record_messages.h"

#include <unordered_set>

namespace hierloom::core {

const char* ruleName(AnimalRule rule)
{
    switch (rule) {
    case AnimalRule::IdGiven: return "animal id given";
    case AnimalRule::IdForm: return "animal id form";
    case AnimalRule::IdUnique: return "animal id unique";
    case AnimalRule::DatesNotInFuture: return "animal dates not in the future";
    case AnimalRule::ExitTypeWithExitDate: return "exit type with exit date";
    case AnimalRule::ExitDateWithExitType: return "exit date with exit type";
    case AnimalRule::EntryKnown: return "entry date known";
    case AnimalRule::EntryNotBeforeBirth: return "entry not before birth";
    case AnimalRule::ExitNotBeforeEntry: return "exit not before entry";
    case AnimalRule::ParentNotItself: return "parent not the animal itself";
    case AnimalRule::ParentKnown: return "parent known";
    case AnimalRule::ParentSex: return "parent of the right sex";
    case AnimalRule::ParentBornBefore: return "parent born before offspring";
    case AnimalRule::NoAncestorLoop: return "no loop of parent links";
    case AnimalRule::ParentKeepsSex: return "parent keeps its sex";
    case AnimalRule::ParentKeepsBirthOrder: return "parent stays born before offspring";
    case AnimalRule::NameText: return "animal name without control characters";
    case AnimalRule::Count: break;
    }
    return "?";
}

AnimalContext::AnimalContext(const std::vector<Animal>& colony, Day today, std::string_view replacedUid)
    : colony_(colony), today_(today), replacedUid_(replacedUid)
{
    for (std::size_t i = 0; i < colony.size(); ++i)
        if (replacedUid_.empty() || colony[i].uid != replacedUid_) ids_.emplace(colony[i].id, static_cast<int>(i));
}

void AnimalContext::useFile(const std::vector<Animal>& rows, std::string_view known)
{
    file_ = &rows;
    known_ = known;
}

void AnimalContext::addFileRow(std::size_t index, int line)
{
    if (lines_.size() <= index) lines_.resize(index + 1, 0);
    lines_[index] = line;
    ids_.emplace((*file_)[index].id, -1 - static_cast<int>(index)); // a repeated id keeps its first row
}

const Animal* AnimalContext::find(std::string_view id) const
{
    auto it = ids_.find(id);
    if (it == ids_.end()) return nullptr;
    if (it->second >= 0) return &colony_[static_cast<std::size_t>(it->second)];
    return &(*file_)[static_cast<std::size_t>(-1 - it->second)];
}

int AnimalContext::lineOf(std::string_view id) const
{
    auto it = ids_.find(id);
    if (it == ids_.end()) return -1;
    return it->second >= 0 ? 0 : lines_[static_cast<std::size_t>(-1 - it->second)];
}

namespace {

void notInFuture(const std::optional<Day>& d, Day today, const char* field, FieldProblems& out)
{
    if (d && *d > today) out.push_back({field, inTheFuture(*d)});
}

/// True when following parent links up from `a` comes back to `a`.
// The column of `a` (mother or father) through which a walk up the parent links
// comes back to `a`, or nullptr when no loop passes through it.
const char* ancestorLoopColumn(const Animal& a, const AnimalContext& ctx)
{
    // Each ancestor remembers which of a's columns it was reached through.
    std::vector<std::pair<const std::string*, const char*>> todo{{&a.mother, "mother"}, {&a.father, "father"}};
    std::unordered_set<std::string_view> seen;
    while (!todo.empty()) {
        const auto [id, column] = todo.back();
        todo.pop_back();
        if (id->empty() || !seen.insert(*id).second) continue;
        if (*id == a.id) return column;
        if (const Animal* up = ctx.find(*id)) {
            todo.push_back({&up->mother, column});
            todo.push_back({&up->father, column});
        }
    }
    return nullptr;
}

} // namespace

void checkAnimalRow(const Animal& a, const AnimalContext& ctx, FieldProblems& out, unsigned unread)
{
    // AnimalRule::IdGiven, IdForm, IdUnique
    if (a.id.empty()) out.push_back({"id", "is empty; every animal needs an id"});
    else if (!isValidAnimalId(a.id)) out.push_back({"id", quotedValue(a.id) + " must be 1-32 letters, digits, '_', '-' or '.'"});
    else if (const int line = ctx.lineOf(a.id); line == 0) out.push_back({"id", quotedValue(a.id) + " is already in the colony"});
    else if (line > 0) out.push_back({"id", quotedValue(a.id) + " appears twice (first on line " + std::to_string(line) + ")"});

    // AnimalRule::DatesNotInFuture
    notInFuture(a.birth, ctx.today(), "birth_date", out);
    notInFuture(a.entry, ctx.today(), "entry_date", out);
    notInFuture(a.exit, ctx.today(), "exit_date", out);

    // AnimalRule::ExitTypeWithExitDate, ExitDateWithExitType (a type that could not be read was given)
    const bool exitGiven = a.exit || (unread & AnimalUnread::exit);
    const bool typeGiven = a.exitType != ExitType::None || (unread & AnimalUnread::exitType);
    if (exitGiven && !typeGiven) out.push_back({"exit_type", "is required when exit_date is given (died or removed)"});
    if (!exitGiven && typeGiven) out.push_back({"exit_date", "is required when exit_type is given"});

    // AnimalRule::EntryKnown, EntryNotBeforeBirth, ExitNotBeforeEntry
    if (!a.birth && !a.entry && !(unread & (AnimalUnread::birth | AnimalUnread::entry)))
        out.push_back({"entry_date", "is needed when birth_date is empty (the day the animal joined)"});
    if (a.birth && a.entry && *a.entry < *a.birth)
        out.push_back({"entry_date", formatDate(*a.entry) + " is before the birth date " + formatDate(*a.birth)});
    const auto start = lifeStart(a);
    if (a.exit && start && *a.exit < *start)
        out.push_back({"exit_date", formatDate(*a.exit) + " is before the entry date " + formatDate(*start)});

    // AnimalRule::NameText
    checkPlainText(a.name, "name", out);
}

void checkAnimalLinks(const Animal& a, const AnimalContext& ctx, FieldProblems& out)
{
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
        const Animal* parent = ctx.find(p.id);
        // AnimalRule::ParentNotItself, ParentKnown, ParentSex, ParentBornBefore
        if (p.id == a.id) out.push_back({p.field, quotedValue(p.id) + " is the animal itself"});
        else if (!parent) out.push_back({p.field, notAnAnimalOf(p.id, ctx.known())});
        else if (parent->sex != p.sex) out.push_back({p.field, quotedValue(p.id) + " is not recorded as " + p.word});
        else if (parent->birth && a.birth && *parent->birth >= *a.birth)
            out.push_back({p.field, quotedValue(p.id) + " was born on " + formatDate(*parent->birth) + ", not before " +
                                        p.pronoun + " offspring (" + formatDate(*a.birth) + ")"});
    }

    // AnimalRule::NoAncestorLoop (a parent that is the animal itself is reported above)
    if (!a.id.empty() && a.mother != a.id && a.father != a.id)
        if (const char* column = ancestorLoopColumn(a, ctx))
            out.push_back({column, quotedValue(a.id) + " would be its own ancestor (a loop of parent links)"});

    // AnimalRule::ParentKeepsSex, ParentKeepsBirthOrder: an edit keeps the animal a valid
    // parent of the offspring already in the colony.
    for (const Animal& child : ctx.colony()) {
        if (!ctx.replacedUid().empty() && child.uid == ctx.replacedUid()) continue;
        const bool mother = child.mother == a.id;
        const bool father = child.father == a.id;
        if (a.id.empty() || (!mother && !father)) continue;
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
}

FieldProblems checkAnimal(const Animal& a, const std::vector<Animal>& colony, Day today)
{
    const AnimalContext ctx(colony, today, a.uid);
    FieldProblems out;
    checkAnimalRow(a, ctx, out);
    checkAnimalLinks(a, ctx, out);
    return out;
}

} // namespace hierloom::core
