// SPDX-License-Identifier: GPL-3.0-or-later
#include "core/pedigree/inheritance_prediction.h"

#include "core/ranks/compact_selection.h"
#include "core/ranks/encounter_selection.h"
#include "core/ranks/ordinal_ranks.h"

#include <algorithm>
#include <set>
#include <stdexcept>

namespace hierloom::core {

std::optional<SiblingRule> parseSiblingRule(std::string_view t)
{
    if (t == "youngest") return SiblingRule::Youngest;
    if (t == "eldest") return SiblingRule::Eldest;
    return std::nullopt;
}

const char* toString(SiblingRule rule) { return rule == SiblingRule::Youngest ? "youngest" : "eldest"; }

int InheritancePrediction::find(std::string_view id) const
{
    for (size_t i = 0; i < females.size(); ++i)
        if (females[i].animal == id) return static_cast<int>(i);
    return -1;
}

std::vector<FemaleCandidate> rankedFemaleCandidates(const Matrilines& lines, const ResidenceIndex& where,
                                                    const std::string& group)
{
    std::vector<FemaleCandidate> out;
    const int g = group.empty() ? -1 : where.group(group);
    if (!group.empty() && g < 0) return out;
    for (int i = 0; i < lines.recordedCount(); ++i) {
        if (lines.sex(i) != Sex::Female) continue;
        const int k = where.animal(lines.id(i));
        if (k < 0) continue;
        const auto& stints = where.stints(k);
        if (g < 0 || std::any_of(stints.begin(), stints.end(), [&](const auto& s) { return s.group == g; }))
            out.push_back({i, k});
    }
    return out;
}

RankedFemales rankedFemalesOn(const Matrilines& lines, const ResidenceIndex& where, Day d, const std::string& group,
                              int maturityYears)
{
    return rankedFemalesOn(lines, where, rankedFemaleCandidates(lines, where, group), d, group, maturityYears);
}

RankedFemales rankedFemalesOn(const Matrilines& lines, const ResidenceIndex& where,
                              const std::vector<FemaleCandidate>& candidates, Day d, const std::string& group,
                              int maturityYears)
{
    RankedFemales out;
    out.ranked.assign(static_cast<size_t>(lines.size()), false);
    const int g = group.empty() ? -1 : where.group(group);
    if (!group.empty() && g < 0) return out;
    for (const FemaleCandidate& c : candidates) {
        const int on = where.groupOn(c.animal, d);
        if (on < 0 || (g >= 0 && on != g)) continue;
        const std::optional<Day> birth = lines.birth(c.node);
        if (birth && d < anniversary(*birth, maturityYears)) continue;
        out.ranked[static_cast<size_t>(c.node)] = true;
        if (!birth) out.unknownBirth.push_back(lines.id(c.node));
    }
    std::sort(out.unknownBirth.begin(), out.unknownBirth.end());
    return out;
}

std::vector<int> orderSiblings(const Matrilines& lines, std::vector<int> siblings, SiblingRule rule)
{
    std::sort(siblings.begin(), siblings.end(), [&](int a, int b) {
        const std::optional<Day> ba = lines.birth(a), bb = lines.birth(b);
        if (ba.has_value() != bb.has_value()) {
            // An unknown birth date counts as the eldest: last when the youngest lead.
            const bool aFirst = rule == SiblingRule::Youngest ? ba.has_value() : !ba.has_value();
            return aFirst;
        }
        if (ba && *ba != *bb) return rule == SiblingRule::Youngest ? *ba > *bb : *ba < *bb;
        return lines.id(a) < lines.id(b);
    });
    return siblings;
}

std::vector<int> matrilineWalk(const Matrilines& lines, int matriarch, const std::vector<bool>& ranked,
                               SiblingRule rule)
{
    std::vector<int> out;
    // Explicit stack (children pushed in reverse) keeps long lines off the call stack.
    std::vector<int> stack{matriarch};
    while (!stack.empty()) {
        const int at = stack.back();
        stack.pop_back();
        if (ranked[static_cast<size_t>(at)]) out.push_back(at);
        const std::vector<int> kids = orderSiblings(lines, lines.offspring(at), rule);
        for (auto it = kids.rbegin(); it != kids.rend(); ++it) stack.push_back(*it);
    }
    return out;
}

InheritancePrediction predictOrder(const Matrilines& lines, const RankedFemales& ranked, const ObservedScores& observed,
                                   SiblingRule rule, const std::vector<std::string>& explicitOrder)
{
    InheritancePrediction p;
    p.rule = rule;
    p.unknownBirthCountedMature = ranked.unknownBirth;
    const int n = lines.size();
    // Observed ranks: ranked females with a score, ordered by score, ties by id.
    std::vector<int> scored;
    for (int i = 0; i < n; ++i)
        if (ranked.ranked[static_cast<size_t>(i)] && observed.count(lines.id(i))) scored.push_back(i);
    std::sort(scored.begin(), scored.end(), [&](int a, int b) { return lines.id(a) < lines.id(b); });
    std::vector<double> scores;
    for (int i : scored) scores.push_back(observed.find(lines.id(i))->second);
    const std::vector<int> ordinal = ordinalRanks(scores, std::vector<bool>(scores.size(), true));
    std::vector<int> observedRank(static_cast<size_t>(n), 0);
    for (size_t k = 0; k < scored.size(); ++k) observedRank[static_cast<size_t>(scored[k])] = ordinal[k];

    // Each line with ranked members and its best observed rank (0: none).
    // A vector by matriarch, not a map: this runs at every checkpoint of a timeline.
    std::vector<int> best(static_cast<size_t>(n), -1); // matriarch -> best observed rank (-1: no ranked member)
    std::vector<int> order;
    for (int i = 0; i < n; ++i) {
        if (!ranked.ranked[static_cast<size_t>(i)]) continue;
        const int m = lines.matriarch(i);
        const int r = observedRank[static_cast<size_t>(i)];
        int& b = best[static_cast<size_t>(m)];
        if (b < 0) {
            b = r;
            order.push_back(m);
        } else if (r > 0 && (b == 0 || r < b)) {
            b = r;
        }
    }
    std::sort(order.begin(), order.end(), [&](int a, int b) {
        const int ra = best[static_cast<size_t>(a)], rb = best[static_cast<size_t>(b)];
        if ((ra > 0) != (rb > 0)) return ra > 0;
        if (ra > 0 && ra != rb) return ra < rb;
        return lines.id(a) < lines.id(b);
    });
    if (!explicitOrder.empty()) {
        std::vector<int> listed;
        std::set<int> seen;
        for (const std::string& id : explicitOrder) {
            const int m = lines.index(id);
            if (m < 0) throw std::invalid_argument("matriline order: no animal '" + id + "' in the pedigree");
            if (lines.mother(m) >= 0)
                throw std::invalid_argument("matriline order: " + id + " is not a matriarch (her matriarch is " +
                                            lines.id(lines.matriarch(m)) + ")");
            if (!seen.insert(m).second) throw std::invalid_argument("matriline order: " + id + " is listed twice");
            if (best[static_cast<size_t>(m)] >= 0) listed.push_back(m);
        }
        for (int m : order)
            if (!seen.count(m)) listed.push_back(m);
        order = std::move(listed);
    }
    for (int m : order) {
        p.matrilineOrder.push_back(lines.id(m));
        for (int f : matrilineWalk(lines, m, ranked.ranked, rule)) {
            PredictedFemale row;
            row.animal = lines.id(f);
            row.matriarch = lines.id(m);
            row.predictedRank = static_cast<int>(p.females.size()) + 1;
            if (observedRank[static_cast<size_t>(f)] > 0) {
                row.observedRank = observedRank[static_cast<size_t>(f)];
                row.observedScore = observed.find(row.animal)->second;
            }
            p.females.push_back(std::move(row));
            if (!lines.birth(f) && !lines.sisters(f).empty()) p.unorderable.push_back(lines.id(f));
        }
    }
    std::sort(p.unorderable.begin(), p.unorderable.end());
    // Discordant dyads: both observed, observed order the reverse of the predicted one.
    for (size_t i = 0; i < p.females.size(); ++i) {
        if (!p.females[i].observedRank) continue;
        for (size_t j = i + 1; j < p.females.size(); ++j) {
            if (p.females[j].observedRank && *p.females[j].observedRank < *p.females[i].observedRank) {
                ++p.females[i].discordantDyads;
                ++p.females[j].discordantDyads;
            }
        }
    }
    return p;
}

namespace {

/// Elo ratings of every rated animal of a selection.
ObservedScores ratedScores(const EncounterSelection& sel, const EloSettings& settings)
{
    const EloRun run = runElo(sel.size(), sel.bouts, settings);
    ObservedScores out;
    for (int i = 0; i < sel.size(); ++i)
        if (run.rated[static_cast<size_t>(i)]) out.emplace(sel.ids[static_cast<size_t>(i)], run.rating[static_cast<size_t>(i)]);
    return out;
}

SelectionOptions scoresSelection(Day d, const std::string& group, const EloSettings& settings)
{
    SelectionOptions s;
    s.to = d;
    s.group = group;
    s.draws = settings.draws;
    return s;
}

/// The prediction once the date and the observed scores are known.
InheritancePrediction predictWith(const ResidenceIndex& where, const Matrilines& lines, const InheritanceOptions& o,
                                  Day at, const ObservedScores& observed)
{
    const RankedFemales ranked = rankedFemalesOn(lines, where, at, o.group, o.maturityYears);
    InheritancePrediction p = predictOrder(lines, ranked, observed, o.rule, o.matrilineOrder);
    p.at = at;
    return p;
}

} // namespace

ObservedScores eloScoresAt(const Colony& colony, const ResidenceIndex& where, Day d, const std::string& group,
                           const EloSettings& settings)
{
    return ratedScores(selectEncounters(colony, where, scoresSelection(d, group, settings)), settings);
}

ObservedScores eloScoresAt(const CompactEncounters& encounters, const std::vector<Animal>& animals,
                           const ResidenceIndex& where, Day d, const std::string& group, const EloSettings& settings)
{
    return ratedScores(selectEncounters(encounters, animals, where, scoresSelection(d, group, settings)), settings);
}

std::optional<Day> lastEncounterDay(const Colony& colony)
{
    std::optional<Day> last;
    for (const Encounter& e : colony.encounters)
        if (!last || e.date > *last) last = e.date;
    return last;
}

std::optional<Day> lastEncounterDay(const CompactEncounters& encounters)
{
    std::optional<Day> last;
    for (const CompactEncounter& e : encounters.records)
        if (!last || e.date > *last) last = e.date;
    return last;
}

InheritancePrediction predictInheritance(const Colony& colony, const ResidenceIndex& where, const Matrilines& lines,
                                         const InheritanceOptions& o)
{
    const std::optional<Day> at = o.at ? o.at : lastEncounterDay(colony);
    if (!at) throw std::invalid_argument("the colony has no encounters; give a date");
    return predictWith(where, lines, o, *at, eloScoresAt(colony, where, *at, o.group, o.elo));
}

InheritancePrediction predictInheritance(const CompactEncounters& encounters, const std::vector<Animal>& animals,
                                         const ResidenceIndex& where, const Matrilines& lines,
                                         const InheritanceOptions& o)
{
    const std::optional<Day> at = o.at ? o.at : lastEncounterDay(encounters);
    if (!at) throw std::invalid_argument("the colony has no encounters; give a date");
    return predictWith(where, lines, o, *at, eloScoresAt(encounters, animals, where, *at, o.group, o.elo));
}

} // namespace hierloom::core
