// SPDX-License-Identifier: GPL-3.0-or-later
#include "core/rules/residence_rules.h"

#include "core/base/residence_index.h"
#include "core/rules/record_messages.h"

namespace hierloom::core {

const char* ruleName(ResidenceRule rule)
{
    switch (rule) {
    case ResidenceRule::AnimalKnown: return "stay of a known animal";
    case ResidenceRule::GroupGiven: return "stay group given";
    case ResidenceRule::GroupText: return "stay group without control characters";
    case ResidenceRule::DatesNotInFuture: return "stay dates not in the future";
    case ResidenceRule::ToNotBeforeFrom: return "stay to not before from";
    case ResidenceRule::WithinLife: return "stay within the animal's life";
    case ResidenceRule::NoOverlap: return "stays do not overlap";
    case ResidenceRule::Count: break;
    }
    return "?";
}

bool checkStay(const Residence& r, const ResidenceContext& ctx, FieldProblems& out, unsigned unread)
{
    // ResidenceRule::AnimalKnown, GroupGiven, DatesNotInFuture, ToNotBeforeFrom
    if (!ctx.animal) out.push_back({"animal", notAnAnimalOf(r.animal, ctx.known)});
    if (r.group.empty()) out.push_back({"group", "is empty"});
    checkPlainText(r.group, "group", out); // ResidenceRule::GroupText
    const bool fromRead = !(unread & ResidenceUnread::from);
    if (fromRead && r.from > ctx.today) out.push_back({"from", inTheFuture(r.from)});
    if (r.to && *r.to > ctx.today) out.push_back({"to", inTheFuture(*r.to)});
    if (fromRead && r.to && *r.to < r.from)
        out.push_back({"to", formatDate(*r.to) + " is before from " + formatDate(r.from)});
    if (!out.empty() || unread) return false; // nothing wrong so far, every date read

    // ResidenceRule::WithinLife
    const Animal& a = *ctx.animal;
    const auto start = lifeStart(a);
    if (start && r.from < *start)
        out.push_back({"from", formatDate(r.from) + " is before " + a.id + " joined the colony (" + formatDate(*start) + ")"});
    else if (a.exit && r.from > *a.exit)
        out.push_back({"from", formatDate(r.from) + " is after " + a.id + " left the colony (" + formatDate(*a.exit) + ")"});
    else if (a.exit && r.to && *r.to > *a.exit)
        out.push_back({"to", formatDate(*r.to) + " is after " + a.id + " left the colony (" + formatDate(*a.exit) + ")"});
    if (!out.empty()) return false;

    // ResidenceRule::NoOverlap
    if (!ctx.others) return true;
    const Day to = r.to.value_or(ResidenceIndex::openEnd);
    for (const StaySpan& s : *ctx.others)
        if (s.from <= to && r.from <= s.to) {
            out.push_back({"from", "this stay of " + r.animal + " overlaps " +
                                       (s.line > 0 ? "the one on line " + std::to_string(s.line)
                                                   : std::string("one already in the colony")) +
                                       " (an animal lives in one group at a time)"});
            break;
        }
    return true;
}

FieldProblems checkResidence(const Residence& r, const Animal& a, const std::vector<Residence>& otherStays, Day today)
{
    std::vector<StaySpan> others;
    for (const Residence& s : otherStays)
        if ((r.uid.empty() || s.uid != r.uid) && s.animal == r.animal)
            others.push_back({s.from, s.to.value_or(ResidenceIndex::openEnd), 0});
    FieldProblems out;
    checkStay(r, {today, &a, &others}, out);
    return out;
}

} // namespace hierloom::core
