// SPDX-License-Identifier: GPL-3.0-or-later
#include "core/pedigree/foresight.h"

#include "core/pedigree/matriline.h"
#include "core/ranks/informed_elo.h"

#include <cmath>
#include <map>
#include <set>
#include <unordered_map>

namespace hierloom::core {

const char* toString(ForesightModel model)
{
    switch (model) {
    case ForesightModel::Elo: return "elo";
    case ForesightModel::InformedElo: return "informed_elo";
    case ForesightModel::Rule: break;
    }
    return "rule";
}

double ForesightEncounter::chance(ForesightModel model) const
{
    switch (model) {
    case ForesightModel::Elo: return elo;
    case ForesightModel::InformedElo: return informedElo;
    case ForesightModel::Rule: break;
    }
    return rule;
}

ForesightScore scoreForesight(const std::vector<double>& chances)
{
    ForesightScore s;
    double squares = 0;
    for (double p : chances) {
        ++s.encounters;
        if (p != 0.5) ++s.called;
        if (p > 0.5) ++s.predicted;
        s.logLikelihood += std::log(p);
        squares += (1 - p) * (1 - p);
    }
    if (s.encounters > 0) {
        s.brier = squares / s.encounters;
        s.sharePredicted = static_cast<double>(s.predicted) / s.encounters;
    }
    return s;
}

std::optional<double> fitRuleWinProbability(int conforming, int comparable)
{
    if (comparable <= 0) return std::nullopt;
    return static_cast<double>(conforming) / comparable;
}

namespace {

EloStartRule startRuleOf(SiblingRule rule)
{
    return rule == SiblingRule::Eldest ? EloStartRule::Eldest : EloStartRule::Youngest;
}

/// Whether the rule's order of day d puts each pair's winner higher, for the
/// bouts [first, last) of that day; `rating` and `rated` are plain Elo before the day.
void judgeDay(const Matrilines& lines, const ResidenceIndex& where, const std::vector<FemaleCandidate>& candidates,
              const SelectionOptions& selection, const ForesightOptions& o, const EncounterSelection& sel,
              const std::vector<double>& rating, const std::vector<unsigned char>& rated, size_t first, size_t last,
              std::vector<ForesightEncounter>& out)
{
    const Day d = sel.days[first];
    ObservedScores observed;
    for (int i = 0; i < sel.size(); ++i)
        if (rated[static_cast<size_t>(i)]) observed.emplace(sel.ids[static_cast<size_t>(i)], rating[static_cast<size_t>(i)]);
    const RankedFemales ranked = rankedFemalesOn(lines, where, candidates, d, selection.group, o.maturityYears);
    const InheritancePrediction p = predictOrder(lines, ranked, observed, o.rule);
    std::set<std::string, std::less<>> placed; // matrilines placed by an observed rank
    for (const PredictedFemale& f : p.females)
        if (f.observedScore) placed.insert(f.matriarch);
    for (size_t b = first; b < last; ++b) {
        ForesightEncounter& e = out[b];
        const int w = p.find(e.winner);
        const int l = p.find(e.loser);
        if (w < 0 || l < 0) continue;
        const std::string& mw = p.females[static_cast<size_t>(w)].matriarch;
        const std::string& ml = p.females[static_cast<size_t>(l)].matriarch;
        if (mw != ml && (!placed.count(mw) || !placed.count(ml))) continue;
        e.ruleConforms = w < l;
    }
}

} // namespace

Foresight computeForesight(const Colony& colony, const ResidenceIndex& where, const SelectionOptions& selection,
                           const ForesightOptions& o)
{
    Foresight result;
    result.rule = o.rule;
    const EncounterSelection sel = selectEncounters(colony, where, selection);
    EloSettings elo = o.elo;
    elo.draws = selection.draws;
    const int n = sel.size();
    const EloFamily family = eloFamilyOf(colony, sel.ids);
    const PresentOn present = residencePresence(sel.ids, where, selection.group);
    std::vector<ForesightEncounter> all(sel.bouts.size());
    for (size_t b = 0; b < sel.bouts.size(); ++b) {
        all[b].day = sel.days[b];
        all[b].winner = sel.ids[static_cast<size_t>(sel.bouts[b].winner)];
        all[b].loser = sel.ids[static_cast<size_t>(sel.bouts[b].loser)];
    }
    // Plain Elo: the rule's matriline order is judged from its ratings before each day's first bout.
    const Matrilines lines(colony);
    // The females that can be ranked in the group, found once instead of on every day.
    const std::vector<FemaleCandidate> candidates = rankedFemaleCandidates(lines, where, selection.group);
    const EloObserver judge = [&](size_t b, const std::vector<double>& rating, const std::vector<unsigned char>& rated) {
        if (b > 0 && sel.days[b] == sel.days[b - 1]) return;
        size_t last = b + 1;
        while (last < sel.days.size() && sel.days[last] == sel.days[b]) ++last;
        judgeDay(lines, where, candidates, selection, o, sel, rating, rated, b, last, all);
    };
    const EloTrace plain = traceElo(n, sel.bouts, sel.days, elo, EloStartRule::None, family, present, {}, judge);
    const EloTrace informed = traceElo(n, sel.bouts, sel.days, elo, startRuleOf(o.rule), family, present, {});
    for (size_t b = 0; b < sel.bouts.size(); ++b) {
        all[b].elo = plain.winnerChance[b];
        all[b].informedElo = informed.winnerChance[b];
    }
    // Decided encounters only; the rule's probability fitted on them.
    for (size_t b = 0; b < sel.bouts.size(); ++b) {
        if (sel.bouts[b].draw) continue;
        if (all[b].ruleConforms) {
            ++result.comparable;
            if (*all[b].ruleConforms) ++result.conforming;
        }
        result.encounters.push_back(std::move(all[b]));
    }
    result.ruleWinProbability = fitRuleWinProbability(result.conforming, result.comparable);
    const double p = result.ruleWinProbability.value_or(0.5);
    for (ForesightEncounter& e : result.encounters)
        if (e.ruleConforms) e.rule = *e.ruleConforms ? p : 1 - p;

    std::map<int, std::vector<size_t>> byYear;
    for (size_t i = 0; i < result.encounters.size(); ++i) byYear[civilFromDay(result.encounters[i].day).year].push_back(i);
    for (ForesightModel model : kForesightModels) {
        auto chances = [&](const std::vector<size_t>* subset) {
            std::vector<double> c;
            if (subset)
                for (size_t i : *subset) c.push_back(result.encounters[i].chance(model));
            else
                for (const ForesightEncounter& e : result.encounters) c.push_back(e.chance(model));
            return c;
        };
        for (const auto& [year, indices] : byYear) result.rows.push_back({model, year, scoreForesight(chances(&indices))});
        result.rows.push_back({model, std::nullopt, scoreForesight(chances(nullptr))});
    }
    return result;
}

} // namespace hierloom::core
