// SPDX-License-Identifier: GPL-3.0-or-later
#include "core/planning/scenario.h"

#include "core/pedigree/matriline.h"
#include "core/ranks/compact_selection.h"
#include "core/ranks/encounter_selection.h"
#include "core/base/residence_index.h"

#include <algorithm>
#include <cctype>
#include <map>
#include <set>

namespace hierloom::core {

ScenarioError::ScenarioError(std::vector<ScenarioProblem> problems)
    : std::runtime_error(problems.empty() ? std::string("bad scenario") : problems.front().message)
    , problems_(std::move(problems))
{
}

namespace {

bool validId(const std::string& id)
{
    if (id.empty() || id.size() > 32) return false;
    return std::all_of(id.begin(), id.end(), [](unsigned char c) {
        return std::isalnum(c) || c == '_' || c == '-' || c == '.';
    });
}

/// The changed copy of the colony and what the changes did.
struct Applied {
    Colony colony;
    Day at = 0;
    std::vector<ScenarioProblem> problems;
    std::set<std::string> removed;
    std::vector<std::string> added;      // newborns and introduced females, scenario order
    std::vector<std::string> newborns;
    std::vector<std::string> introduced;
    std::vector<std::string> splitGroups; // target groups, first mention first
};

/// Groups with at least one resident on day d, in the index's order.
std::vector<std::string> groupsOn(const ResidenceIndex& where, Day d)
{
    std::vector<bool> used(where.groups().size(), false);
    for (int a = 0; a < where.animalCount(); ++a)
        if (const int g = where.groupOn(a, d); g >= 0) used[static_cast<size_t>(g)] = true;
    std::vector<std::string> out;
    for (size_t g = 0; g < used.size(); ++g)
        if (used[g]) out.push_back(where.groups()[g]);
    return out;
}

/// Moves an animal resident on `at` into `group` from that day on.
void moveResidence(Colony& c, const std::string& id, Day at, const std::string& group)
{
    for (size_t i = 0; i < c.residences.size(); ++i) {
        Residence& r = c.residences[i];
        if (r.animal != id || r.from > at || (r.to && *r.to < at)) continue;
        if (r.from == at) {
            r.group = group;
        } else {
            Residence moved{id, group, at, r.to, {}};
            r.to = at - 1;
            c.residences.push_back(std::move(moved));
        }
        return;
    }
}

/// The scenario's changes applied to a copy of `colony`, whose encounters
/// (if it holds any) are copied but not read: `lastDay` is the date of the
/// record's last encounter.
Applied apply(const Colony& colony, std::optional<Day> lastDay, const Scenario& s)
{
    Applied a;
    a.colony = colony;
    Colony& c = a.colony;
    auto problem = [&](int line, std::string message) { a.problems.push_back({line, std::move(message)}); };
    const std::optional<Day> at = s.at ? s.at : lastDay;
    if (!at) {
        problem(s.dateLine, "no date given and the colony has no encounters to take one from");
        return a;
    }
    a.at = *at;
    const std::string date = formatDate(*at);
    {
        const ResidenceIndex where(colony.animals, colony.residences);
        if (!s.group.empty() && where.group(s.group) < 0) problem(s.groupLine, "no group named '" + s.group + "'");
        const Matrilines lines(colony);
        std::set<std::string> seen;
        for (const std::string& id : s.matrilineOrder) {
            const int m = lines.index(id);
            if (m < 0)
                problem(s.matrilineOrderLine, "matriline order: no animal '" + id + "'");
            else if (lines.mother(m) >= 0)
                problem(s.matrilineOrderLine, "matriline order: " + id + " is not a matriarch (her matriarch is " +
                                                  lines.id(lines.matriarch(m)) + ")");
            else if (!seen.insert(id).second)
                problem(s.matrilineOrderLine, "matriline order: " + id + " is listed twice");
        }
        if (s.maturityYears < 0) problem(0, "the maturity age cannot be negative");
        if (s.recentDays < 1) problem(0, "the window of observed dyads needs at least one day");
    }
    int generated = 0;
    for (const ScenarioChange& ch : s.changes) {
        // Each change sees the colony as the changes before it left it.
        const ResidenceIndex where(c.animals, c.residences);
        auto groupOf = [&](const std::string& id) {
            const int k = where.animal(id);
            const int g = k < 0 ? -1 : where.groupOn(k, *at);
            return g < 0 ? std::string() : where.groups()[static_cast<size_t>(g)];
        };
        auto newIdOk = [&](const std::string& id) {
            if (!validId(id)) {
                problem(ch.line, "'" + id + "' is not a valid id (1-32 letters, digits, _, - or .)");
                return false;
            }
            if (c.animalIndex(id) >= 0) {
                problem(ch.line, "the id " + id + " is already taken");
                return false;
            }
            return true;
        };
        switch (ch.kind) {
        case ScenarioChange::Kind::Remove: {
            const int k = c.animalIndex(ch.animal);
            if (k < 0) {
                problem(ch.line, "no animal '" + ch.animal + "' in the colony");
            } else if (a.removed.count(ch.animal)) {
                problem(ch.line, ch.animal + " is already removed");
            } else if (groupOf(ch.animal).empty()) {
                problem(ch.line, ch.animal + " is not resident on " + date);
            } else {
                Animal& an = c.animals[static_cast<size_t>(k)];
                an.exit = *at - 1;
                an.exitType = ExitType::Removed;
                a.removed.insert(ch.animal);
            }
            break;
        }
        case ScenarioChange::Kind::Birth: {
            const int m = c.animalIndex(ch.animal);
            const std::string id = ch.newId.empty() ? "new-" + std::to_string(++generated) : ch.newId;
            if (m < 0) {
                problem(ch.line, "no animal '" + ch.animal + "' in the colony");
            } else if (c.animals[static_cast<size_t>(m)].sex != Sex::Female) {
                problem(ch.line, "the mother " + ch.animal + " is not recorded as female");
            } else if (groupOf(ch.animal).empty()) {
                problem(ch.line, "the mother " + ch.animal + " is not resident on " + date);
            } else if (newIdOk(id)) {
                Animal an;
                an.id = id;
                an.sex = ch.sex;
                an.birth = *at;
                an.mother = ch.animal;
                an.entry = *at;
                an.entryType = EntryType::Born;
                c.residences.push_back({id, groupOf(ch.animal), *at, std::nullopt, {}});
                c.animals.push_back(std::move(an));
                a.added.push_back(id);
                a.newborns.push_back(id);
            }
            break;
        }
        case ScenarioChange::Kind::Introduce: {
            std::string group = s.group;
            if (group.empty()) {
                const std::vector<std::string> groups = groupsOn(where, *at);
                if (groups.size() == 1) group = groups.front();
            }
            if (group.empty()) {
                problem(ch.line, "introduce needs a `group` line when the colony has no single group on " + date);
            } else if (newIdOk(ch.animal)) {
                Animal an;
                an.id = ch.animal;
                an.sex = Sex::Female;
                an.entry = *at;
                an.entryType = EntryType::Introduced;
                c.residences.push_back({ch.animal, group, *at, std::nullopt, {}});
                c.animals.push_back(std::move(an));
                a.added.push_back(ch.animal);
                a.introduced.push_back(ch.animal);
            }
            break;
        }
        case ScenarioChange::Kind::Split: {
            const Matrilines lines(c);
            std::set<int> heads;
            bool ok = !ch.matriarchs.empty();
            if (!ok) problem(ch.line, "split names no matriarch");
            if (ch.toGroup.empty()) {
                problem(ch.line, "split needs a target group after '->'");
                ok = false;
            }
            for (const std::string& id : ch.matriarchs) {
                const int m = lines.index(id);
                if (m < 0 || !lines.recorded(m)) {
                    problem(ch.line, "no animal '" + id + "' in the colony");
                    ok = false;
                } else if (lines.mother(m) >= 0) {
                    problem(ch.line, id + " is not a matriarch (her matriarch is " + lines.id(lines.matriarch(m)) + ")");
                    ok = false;
                } else {
                    heads.insert(m);
                }
            }
            if (!ok) break;
            int moved = 0;
            for (int i = 0; i < lines.recordedCount(); ++i) {
                if (!heads.count(lines.matriarch(i))) continue;
                const std::string g = groupOf(lines.id(i));
                if (g.empty() || (!s.group.empty() && g != s.group) || g == ch.toGroup) continue;
                moveResidence(c, lines.id(i), *at, ch.toGroup);
                ++moved;
            }
            if (moved == 0)
                problem(ch.line, "no resident member of these matrilines to move on " + date);
            else if (std::find(a.splitGroups.begin(), a.splitGroups.end(), ch.toGroup) == a.splitGroups.end())
                a.splitGroups.push_back(ch.toGroup);
            break;
        }
        }
    }
    return a;
}

} // namespace

std::vector<ScenarioProblem> checkScenario(const Colony& colony, const Scenario& scenario)
{
    return apply(colony, lastEncounterDay(colony), scenario).problems;
}

std::vector<ScenarioProblem> checkScenario(const CompactEncounters& encounters, const Colony& pedigree,
                                           const Scenario& scenario)
{
    return apply(pedigree, lastEncounterDay(encounters), scenario).problems;
}

Colony scenarioColony(const Colony& colony, const Scenario& s)
{
    Applied a = apply(colony, lastEncounterDay(colony), s);
    if (!a.problems.empty()) throw ScenarioError(std::move(a.problems));
    return std::move(a.colony);
}

namespace {

/// runScenario of the changes applied to `colony` (whose animals and
/// residences are read, not its encounters); `scoresAt(where, day, elo)` and
/// `select(where, options)` read the encounters in either form.
template <class ScoresAt, class Select>
ScenarioResult resultOf(const Colony& colony, const Applied& a, const Scenario& s, ScoresAt scoresAt, Select select)
{
    ScenarioResult out;
    out.at = a.at;
    out.addedAnimals = a.added;
    const ResidenceIndex where0(colony.animals, colony.residences);
    const Matrilines lines0(colony);
    const ResidenceIndex where1(a.colony.animals, a.colony.residences);
    const Matrilines lines1(a.colony);
    // Observed standing from every encounter, so that moved lines carry their ratings.
    const ObservedScores observed = scoresAt(where0, a.at, s.elo);

    const std::vector<std::string> before = s.group.empty() ? groupsOn(where0, a.at) : std::vector<std::string>{s.group};
    std::vector<std::string> groups = before;
    for (const std::string& g : a.splitGroups)
        if (std::find(groups.begin(), groups.end(), g) == groups.end()) groups.push_back(g);
    const std::set<std::string> introduced(a.introduced.begin(), a.introduced.end());
    for (const std::string& g : groups) {
        ScenarioGroup sg;
        sg.group = g;
        if (std::find(before.begin(), before.end(), g) != before.end()) {
            sg.before = predictOrder(lines0, rankedFemalesOn(lines0, where0, a.at, g, s.maturityYears), observed, s.rule,
                                     s.matrilineOrder);
        }
        sg.before.at = a.at;
        RankedFemales ranked = rankedFemalesOn(lines1, where1, a.at, g, s.maturityYears);
        const int gi = where1.group(g);
        if (s.newbornsAsAdults) {
            for (const std::string& id : a.newborns) {
                const int k = where1.animal(id);
                if (lines1.sex(lines1.index(id)) == Sex::Female && where1.groupOn(k, a.at) == gi)
                    ranked.ranked[static_cast<size_t>(lines1.index(id))] = true;
            }
        }
        std::erase_if(ranked.unknownBirth, [&](const std::string& id) { return introduced.count(id) > 0; });
        // The observed (or explicit) order of the existing lines, then the newcomers' lines.
        const InheritancePrediction first = predictOrder(lines1, ranked, observed, s.rule, s.matrilineOrder);
        std::vector<std::string> order;
        for (const std::string& m : first.matrilineOrder)
            if (!introduced.count(m)) order.push_back(m);
        for (const std::string& id : a.introduced)
            if (std::find(first.matrilineOrder.begin(), first.matrilineOrder.end(), id) != first.matrilineOrder.end())
                order.push_back(id);
        sg.after = predictOrder(lines1, ranked, observed, s.rule, order);
        sg.after.at = a.at;
        out.groups.push_back(std::move(sg));
    }

    // Moves: every animal ranked before or after.
    struct Place {
        std::string group;
        int rank = 0;
        std::string matriarch;
    };
    std::map<std::string, Place> was, is;
    std::vector<std::string> animals;
    for (const ScenarioGroup& sg : out.groups) {
        for (const PredictedFemale& f : sg.before.females) {
            was[f.animal] = {sg.group, f.predictedRank, f.matriarch};
            animals.push_back(f.animal);
        }
        for (const PredictedFemale& f : sg.after.females) {
            is[f.animal] = {sg.group, f.predictedRank, f.matriarch};
            animals.push_back(f.animal);
        }
    }
    std::sort(animals.begin(), animals.end());
    animals.erase(std::unique(animals.begin(), animals.end()), animals.end());
    const std::set<std::string> added(a.added.begin(), a.added.end());
    for (const std::string& id : animals) {
        ScenarioMove m;
        m.animal = id;
        const auto w = was.find(id);
        const auto i = is.find(id);
        if (w != was.end()) {
            m.groupBefore = w->second.group;
            m.rankBefore = w->second.rank;
            m.matriarch = w->second.matriarch;
        }
        if (i != is.end()) {
            m.groupAfter = i->second.group;
            m.rankAfter = i->second.rank;
            m.matriarch = i->second.matriarch;
        }
        if (a.removed.count(id)) m.status = "removed";
        else if (added.count(id)) m.status = "new";
        else if (!m.rankBefore || !m.rankAfter) m.status = m.rankAfter ? "joined" : "left";
        else if (m.groupBefore != m.groupAfter) m.status = "moved";
        else if (*m.rankAfter < *m.rankBefore) m.status = "rises";
        else if (*m.rankAfter > *m.rankBefore) m.status = "falls";
        else m.status = "unchanged";
        out.moves.push_back(std::move(m));
    }
    auto groupPos = [&](const std::string& g) {
        return g.empty() ? groups.size() : static_cast<size_t>(std::find(groups.begin(), groups.end(), g) - groups.begin());
    };
    std::stable_sort(out.moves.begin(), out.moves.end(), [&](const ScenarioMove& x, const ScenarioMove& y) {
        const size_t gx = groupPos(x.groupAfter), gy = groupPos(y.groupAfter);
        if (gx != gy) return gx < gy;
        return x.rankAfter.value_or(0) < y.rankAfter.value_or(0);
    });

    // Observed dyads of the recent window that the prediction after the change reverses.
    SelectionOptions window;
    window.from = a.at - s.recentDays + 1;
    window.to = a.at;
    window.draws = DrawPolicy::Ignore;
    const EncounterSelection sel = select(where0, window);
    std::map<std::pair<std::string, std::string>, int> wins;
    for (const Bout& b : sel.bouts)
        if (!b.draw) ++wins[{sel.ids[static_cast<size_t>(b.winner)], sel.ids[static_cast<size_t>(b.loser)]}];
    auto winsOf = [&](const std::string& x, const std::string& y) {
        const auto it = wins.find({x, y});
        return it == wins.end() ? 0 : it->second;
    };
    for (const ScenarioGroup& sg : out.groups) {
        for (size_t i = 0; i < sg.after.females.size(); ++i) {
            for (size_t j = i + 1; j < sg.after.females.size(); ++j) {
                const std::string& hi = sg.after.females[i].animal;
                const std::string& lo = sg.after.females[j].animal;
                const int up = winsOf(hi, lo), down = winsOf(lo, hi);
                if (down <= up) continue;
                ScenarioReversal r{sg.group, hi, lo, up, down, false};
                const auto wh = was.find(hi), wl = was.find(lo);
                r.againstPredictionBefore = wh != was.end() && wl != was.end() && wh->second.group == wl->second.group &&
                                            wh->second.rank < wl->second.rank;
                out.reversals.push_back(std::move(r));
            }
        }
    }
    return out;
}

} // namespace

ScenarioResult runScenario(const Colony& colony, const Scenario& s)
{
    Applied a = apply(colony, lastEncounterDay(colony), s);
    if (!a.problems.empty()) throw ScenarioError(std::move(a.problems));
    return resultOf(
        colony, a, s,
        [&](const ResidenceIndex& where, Day at, const EloSettings& elo) { return eloScoresAt(colony, where, at, {}, elo); },
        [&](const ResidenceIndex& where, const SelectionOptions& o) { return selectEncounters(colony, where, o); });
}

ScenarioResult runScenario(const CompactEncounters& encounters, const Colony& pedigree, const Scenario& s)
{
    Applied a = apply(pedigree, lastEncounterDay(encounters), s);
    if (!a.problems.empty()) throw ScenarioError(std::move(a.problems));
    return resultOf(
        pedigree, a, s,
        [&](const ResidenceIndex& where, Day at, const EloSettings& elo) {
            return eloScoresAt(encounters, pedigree.animals, where, at, {}, elo);
        },
        [&](const ResidenceIndex& where, const SelectionOptions& o) {
            return selectEncounters(encounters, pedigree.animals, where, o);
        });
}

} // namespace hierloom::core
