// SPDX-License-Identifier: GPL-3.0-or-later
#include "core/rules/support_rules.h"

#include "core/rules/encounter_rules.h"
#include "core/rules/record_messages.h"

#include <algorithm>

namespace hierloom::core {

const char* ruleName(SupportRule rule)
{
    switch (rule) {
    case SupportRule::SupporterKnown: return "supporters known";
    case SupportRule::NotAParticipant: return "supporter not the winner or the loser";
    case SupportRule::ListedOnce: return "supporter listed once";
    case SupportRule::OneSide: return "supporter on one side only";
    case SupportRule::PresentInGroup: return "supporter in the encounter's group that day";
    case SupportRule::Count: break;
    }
    return "?";
}

namespace {

bool listed(const std::vector<std::string>& ids, size_t before, const std::string& id)
{
    return std::find(ids.begin(), ids.begin() + static_cast<std::ptrdiff_t>(before), id) !=
           ids.begin() + static_cast<std::ptrdiff_t>(before);
}

void checkSide(const Encounter& e, const ResidenceIndex& where, const std::string* group, bool loserSide,
               FieldProblems& out)
{
    const std::vector<std::string>& ids = loserSide ? e.loserSupport : e.winnerSupport;
    const char* column = loserSide ? "loser_support" : "winner_support";
    for (size_t i = 0; i < ids.size(); ++i) {
        const std::string& id = ids[i];
        // SupportRule::SupporterKnown
        if (where.animal(id) < 0) {
            out.push_back({column, notAnAnimalOf(id, "the colony")});
            continue;
        }
        // SupportRule::NotAParticipant
        if (id == e.winner || id == e.loser) {
            out.push_back({column, quotedValue(id) + " is the " + (id == e.winner ? "winner" : "loser") +
                                       " of this encounter, not a supporter"});
            continue;
        }
        // SupportRule::ListedOnce
        if (listed(ids, i, id)) {
            out.push_back({column, quotedValue(id) + " is listed twice"});
            continue;
        }
        // SupportRule::OneSide
        if (loserSide && listed(e.winnerSupport, e.winnerSupport.size(), id)) {
            out.push_back({column, quotedValue(id) + " also supports the winner; a supporter takes one side"});
            continue;
        }
        // SupportRule::PresentInGroup: in the encounter rules' words
        if (group)
            if (auto problem = checkEncounterAnimal(id, *group, e.date, where)) out.push_back({column, *problem});
    }
}

} // namespace

void checkSupporters(const Encounter& e, const ResidenceIndex& where, const std::string* group, FieldProblems& out)
{
    checkSide(e, where, group, false, out);
    checkSide(e, where, group, true, out);
}

} // namespace hierloom::core
