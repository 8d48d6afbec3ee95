// SPDX-License-Identifier: GPL-3.0-or-later
#include "core/pedigree/foresight.h"

#include "core/pedigree/matriline.h"
#include "core/ranks/compact_selection.h"
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

/// Judges each day's bouts by the rule's order of that day, in pedigree nodes
/// (the ids are matched once, not at every bout): what predictOrder would
/// give for the ratings before the day, read without building its strings.
class DayJudge {
public:
    DayJudge(const Matrilines& lines, const ResidenceIndex& where, const SelectionOptions& selection,
             const ForesightOptions& o, const EncounterSelection& sel)
        : lines_(lines), where_(where), group_(selection.group), maturityYears_(o.maturityYears), sel_(sel),
          walks_(lines, o.rule), candidates_(rankedFemaleCandidates(lines, where, selection.group)),
          nodeOf_(sel.ids.size()), selOf_(static_cast<size_t>(lines.size()), -1),
          place_(static_cast<size_t>(lines.size()), -1), placed_(static_cast<size_t>(lines.size()), false)
    {
        for (size_t i = 0; i < sel.ids.size(); ++i) {
            nodeOf_[i] = lines.index(sel.ids[i]);
            if (nodeOf_[i] >= 0) selOf_[static_cast<size_t>(nodeOf_[i])] = static_cast<int>(i);
        }
    }

    /// Whether the rule's order of day d puts each pair's winner higher, for the
    /// bouts [first, last) of that day; `rating` and `rated` are plain Elo before the day.
    void judge(const std::vector<double>& rating, const std::vector<unsigned char>& rated, size_t first, size_t last,
               std::vector<ForesightEncounter>& out)
    {
        const RankedFemales ranked =
            rankedFemalesOn(lines_, where_, candidates_, sel_.days[first], group_, maturityYears_);
        std::vector<int> rankedNodes;
        std::vector<std::optional<double>> score;
        for (const FemaleCandidate& c : candidates_) {
            if (!ranked.ranked[static_cast<size_t>(c.node)]) continue;
            rankedNodes.push_back(c.node);
            const int i = selOf_[static_cast<size_t>(c.node)];
            score.push_back(i >= 0 && rated[static_cast<size_t>(i)] ? std::optional<double>(rating[static_cast<size_t>(i)])
                                                                     : std::nullopt);
        }
        const PredictedNodes p = predictNodes(lines_, walks_, ranked.ranked, rankedNodes, score);
        for (size_t k = 0; k < p.females.size(); ++k) {
            place_[static_cast<size_t>(p.females[k])] = static_cast<int>(k);
            // A line is placed by an observed rank of one of its females.
            if (p.observedRank[static_cast<size_t>(p.females[k])] > 0) placed_[static_cast<size_t>(p.femaleLine[k])] = true;
        }
        for (size_t b = first; b < last; ++b) {
            const int w = placeOf(sel_.bouts[b].winner);
            const int l = placeOf(sel_.bouts[b].loser);
            if (w < 0 || l < 0) continue;
            const int mw = p.femaleLine[static_cast<size_t>(w)];
            const int ml = p.femaleLine[static_cast<size_t>(l)];
            if (mw != ml && (!placed_[static_cast<size_t>(mw)] || !placed_[static_cast<size_t>(ml)])) continue;
            out[b].ruleConforms = w < l;
        }
        for (size_t k = 0; k < p.females.size(); ++k) {
            place_[static_cast<size_t>(p.females[k])] = -1;
            placed_[static_cast<size_t>(p.femaleLine[k])] = false;
        }
    }

private:
    /// Place in the day's predicted order of an analysed animal, or -1.
    int placeOf(int animal) const
    {
        const int node = nodeOf_[static_cast<size_t>(animal)];
        return node >= 0 ? place_[static_cast<size_t>(node)] : -1;
    }

    const Matrilines& lines_;
    const ResidenceIndex& where_;
    const std::string& group_;
    int maturityYears_;
    const EncounterSelection& sel_;
    MatrilineWalks walks_;
    std::vector<FemaleCandidate> candidates_; ///< the females that can be ranked in the group
    std::vector<int> nodeOf_;                 ///< per analysed animal: its node, or -1
    std::vector<int> selOf_;                  ///< per node: its analysed animal, or -1
    std::vector<int> place_;                  ///< per node: place in the day's order, -1 outside it
    std::vector<bool> placed_;                ///< per matriarch: her line placed by an observed rank today
};

} // namespace

namespace {

/// The foresight of a selection made from the colony's encounters in either
/// form; `colony`'s animals and pedigree are read, not its encounters.
Foresight foresightOf(const EncounterSelection& sel, const Colony& colony, const ResidenceIndex& where,
                      const SelectionOptions& selection, const ForesightOptions& o)
{
    Foresight result;
    result.rule = o.rule;
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
    DayJudge dayJudge(lines, where, selection, o, sel);
    const EloObserver judge = [&](size_t b, const std::vector<double>& rating, const std::vector<unsigned char>& rated) {
        if (b > 0 && sel.days[b] == sel.days[b - 1]) return;
        size_t last = b + 1;
        while (last < sel.days.size() && sel.days[last] == sel.days[b]) ++last;
        dayJudge.judge(rating, rated, b, last, all);
    };
    const EloTrace plain = traceElo(n, sel.bouts, sel.days, elo, EloStartRule::None, family, present, {}, judge);
    const EloTrace informed = traceElo(n, sel.bouts, sel.days, elo, startRuleOf(o.rule), family, present, {});
    for (size_t b = 0; b < sel.bouts.size(); ++b) {
        all[b].elo = plain.winnerChance[b];
        all[b].informedElo = informed.winnerChance[b];
    }
    // Decided encounters only, kept in place (one list of every encounter
    // at a time); the rule's probability fitted on them.
    size_t kept = 0;
    for (size_t b = 0; b < sel.bouts.size(); ++b) {
        if (sel.bouts[b].draw) continue;
        if (all[b].ruleConforms) {
            ++result.comparable;
            if (*all[b].ruleConforms) ++result.conforming;
        }
        if (kept != b) all[kept] = std::move(all[b]);
        ++kept;
    }
    all.resize(kept);
    result.encounters = std::move(all);
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

} // namespace

Foresight computeForesight(const Colony& colony, const ResidenceIndex& where, const SelectionOptions& selection,
                           const ForesightOptions& o)
{
    return foresightOf(selectEncounters(colony, where, selection), colony, where, selection, o);
}

Foresight computeForesight(const CompactEncounters& encounters, const Colony& pedigree, const ResidenceIndex& where,
                           const SelectionOptions& selection, const ForesightOptions& o)
{
    return foresightOf(selectEncounters(encounters, pedigree.animals, where, selection), pedigree, where, selection, o);
}

} // namespace hierloom::core
