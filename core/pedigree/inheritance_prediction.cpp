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

MatrilineWalks::MatrilineWalks(const Matrilines& lines, SiblingRule rule)
    : lines_(&lines), rule_(rule), walks_(static_cast<size_t>(lines.size())),
      walked_(static_cast<size_t>(lines.size()), false)
{
}

const std::vector<int>& MatrilineWalks::walk(int matriarch)
{
    const auto m = static_cast<size_t>(matriarch);
    if (!walked_.at(m)) {
        walks_[m] = matrilineWalk(*lines_, matriarch, std::vector<bool>(walked_.size(), true), rule_);
        walked_[m] = true;
    }
    return walks_[m];
}

namespace {

/// The lines with ranked members, ordered by the best observed rank among
/// them, lines without one last by matriarch id.
std::vector<int> observedLineOrder(const Matrilines& lines, const std::vector<int>& rankedNodes,
                                   const std::vector<int>& observedRank, std::vector<int>& best)
{
    std::vector<int> order;
    for (const int i : rankedNodes) {
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
    return order;
}

/// The explicit matriline order (matriarch ids), then the other lines of `order`.
std::vector<int> explicitLineOrder(const Matrilines& lines, const std::vector<std::string>& explicitOrder,
                                   const std::vector<int>& order, const std::vector<int>& best)
{
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
    return listed;
}

} // namespace

PredictedNodes predictNodes(const Matrilines& lines, MatrilineWalks& walks, const std::vector<bool>& ranked,
                            const std::vector<int>& rankedNodes, const std::vector<std::optional<double>>& score,
                            const std::vector<std::string>& explicitOrder)
{
    const auto n = static_cast<size_t>(lines.size());
    PredictedNodes p;
    // Observed ranks: ranked females with a score, ordered by score, ties by id.
    std::vector<size_t> scored;
    for (size_t k = 0; k < rankedNodes.size(); ++k)
        if (score[k]) scored.push_back(k);
    std::sort(scored.begin(), scored.end(),
              [&](size_t a, size_t b) { return lines.id(rankedNodes[a]) < lines.id(rankedNodes[b]); });
    std::vector<double> scores;
    for (size_t k : scored) scores.push_back(*score[k]);
    const std::vector<int> ordinal = ordinalRanks(scores, std::vector<bool>(scores.size(), true));
    p.observedRank.assign(n, 0);
    for (size_t k = 0; k < scored.size(); ++k) p.observedRank[static_cast<size_t>(rankedNodes[scored[k]])] = ordinal[k];

    // Each line with ranked members and its best observed rank (0: none; -1: no ranked member).
    std::vector<int> best(n, -1);
    p.lines = observedLineOrder(lines, rankedNodes, p.observedRank, best);
    if (!explicitOrder.empty()) p.lines = explicitLineOrder(lines, explicitOrder, p.lines, best);
    for (int m : p.lines)
        for (int f : walks.walk(m))
            if (ranked[static_cast<size_t>(f)]) {
                p.females.push_back(f);
                p.femaleLine.push_back(m);
            }
    return p;
}

InheritancePrediction predictOrder(const Matrilines& lines, const RankedFemales& ranked, const ObservedScores& observed,
                                   SiblingRule rule, const std::vector<std::string>& explicitOrder)
{
    InheritancePrediction p;
    p.rule = rule;
    p.unknownBirthCountedMature = ranked.unknownBirth;
    std::vector<int> rankedNodes;
    std::vector<std::optional<double>> score;
    for (int i = 0; i < lines.size(); ++i) {
        if (!ranked.ranked[static_cast<size_t>(i)]) continue;
        rankedNodes.push_back(i);
        const auto it = observed.find(lines.id(i));
        score.push_back(it != observed.end() ? std::optional<double>(it->second) : std::nullopt);
    }
    MatrilineWalks walks(lines, rule);
    const PredictedNodes nodes = predictNodes(lines, walks, ranked.ranked, rankedNodes, score, explicitOrder);
    for (int m : nodes.lines) p.matrilineOrder.push_back(lines.id(m));
    for (size_t k = 0; k < nodes.females.size(); ++k) {
        const int f = nodes.females[k];
        PredictedFemale row;
        row.animal = lines.id(f);
        row.matriarch = lines.id(nodes.femaleLine[k]);
        row.predictedRank = static_cast<int>(p.females.size()) + 1;
        if (const int r = nodes.observedRank[static_cast<size_t>(f)]; r > 0) {
            row.observedRank = r;
            row.observedScore = observed.find(row.animal)->second;
        }
        p.females.push_back(std::move(row));
        if (!lines.birth(f) && !lines.sisters(f).empty()) p.unorderable.push_back(lines.id(f));
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
