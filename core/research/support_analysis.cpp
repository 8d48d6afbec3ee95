// SPDX-License-Identifier: GPL-3.0-or-later
#include "core/research/support_analysis.h"

#include "core/pedigree/rank_acquisition.h"
#include "core/pedigree/relatedness.h"
#include "core/ranks/compact_selection.h"
#include "core/ranks/elo_rating.h"
#include "core/ranks/encounter_selection.h"
#include "core/ranks/parallel_randomisation.h"

#include <algorithm>
#include <cmath>
#include <limits>
#include <map>
#include <numeric>

namespace hierloom::core {

const char* toString(KinClass k)
{
    switch (k) {
    case KinClass::Mother: return "mother";
    case KinClass::HalfOrMore: return "r>=0.5";
    case KinClass::Quarter: return "0.25<=r<0.5";
    case KinClass::Eighth: return "0.125<=r<0.25";
    case KinClass::Unrelated: return "r<0.125";
    case KinClass::Count: break;
    }
    return "?";
}

KinClass kinClassOf(bool supporterIsMother, double r)
{
    // A small tolerance so that 0.25 computed as a sum of powers of 1/2 stays in its class.
    constexpr double eps = 1e-9;
    if (supporterIsMother) return KinClass::Mother;
    if (r >= 0.5 - eps) return KinClass::HalfOrMore;
    if (r >= 0.25 - eps) return KinClass::Quarter;
    if (r >= 0.125 - eps) return KinClass::Eighth;
    return KinClass::Unrelated;
}

namespace {

bool kinForIndex(KinClass k) { return k == KinClass::Mother || k == KinClass::HalfOrMore || k == KinClass::Quarter; }

/// An unbiased draw from 0..k-1 by rejection, the same with every standard library.
size_t drawBelow(RandomEngine& engine, size_t k)
{
    const std::uint64_t n = k;
    const std::uint64_t limit = std::numeric_limits<std::uint64_t>::max() - std::numeric_limits<std::uint64_t>::max() % n;
    std::uint64_t x = engine();
    while (x >= limit) x = engine();
    return static_cast<size_t>(x % n);
}

/// One encounter of the window as the analysis needs it (colony animal indices).
struct Fight {
    Day date = 0;
    const std::string* group = nullptr; ///< as recorded ("" for none)
    int winner = -1;
    int loser = -1;
    const std::vector<int>* candidates = nullptr; // present in the group that day, participants included
    std::vector<int> winnerSide;
    std::vector<int> loserSide;
};

std::optional<double> ratio(long long num, long long den)
{
    if (den <= 0) return std::nullopt;
    return static_cast<double>(num) / static_cast<double>(den);
}

std::optional<double> indexOf(long long highGiven, long long highOpp, long long lowGiven, long long lowOpp)
{
    if (highOpp <= 0 || lowOpp <= 0 || lowGiven <= 0) return std::nullopt;
    return (static_cast<double>(highGiven) / static_cast<double>(highOpp)) /
           (static_cast<double>(lowGiven) / static_cast<double>(lowOpp));
}

/// Elo ratings of one group after each day (Neumann et al. 2011), from one
/// pass over its encounters: the observed scores predictInheritance reads,
/// without a run from the first encounter for every date asked.
class DailyScores {
public:
    /// `select` makes the selection of given options from the colony's encounters.
    template <class Select> DailyScores(Select select, const std::string& group, const EloSettings& elo)
    {
        SelectionOptions s;
        s.group = group;
        s.draws = elo.draws;
        selection_ = select(s);
        history_ = eloDailyHistory(selection_.size(), selection_.bouts, selection_.days, elo);
    }

    /// The ratings after the last encounter dated on or before d (as eloScoresAt).
    ObservedScores on(Day d) const
    {
        ObservedScores out;
        auto after = std::upper_bound(history_.begin(), history_.end(), d,
                                      [](Day x, const EloDay& day) { return x < day.day; });
        if (after == history_.begin()) return out;
        const EloDay& day = *(after - 1);
        for (int i = 0; i < selection_.size(); ++i)
            if (day.rated[static_cast<size_t>(i)]) out.emplace(selection_.ids[static_cast<size_t>(i)], day.rating[static_cast<size_t>(i)]);
        return out;
    }

private:
    EncounterSelection selection_;
    std::vector<EloDay> history_;
};

/// What the analysis reads of a Colony's encounters: encounter k's fields
/// (texts by reference), its supporters, and the analyses of core it runs
/// on them.
struct ColonyEncounters {
    const Colony& colony;
    const ResidenceIndex& where;

    std::vector<size_t> order() const { return chronologicalOrder(colony.encounters); }
    Day date(size_t k) const { return colony.encounters[k].date; }
    const std::string& group(size_t k) const { return colony.encounters[k].group; }
    const std::string& winner(size_t k) const { return colony.encounters[k].winner; }
    const std::string& loser(size_t k) const { return colony.encounters[k].loser; }
    /// Calls fn(id) for each supporter of one side, in the order recorded.
    template <class Fn> void forSupporters(size_t k, SupportSide side, Fn fn) const
    {
        const Encounter& e = colony.encounters[k];
        for (const std::string& id : side == SupportSide::Winner ? e.winnerSupport : e.loserSupport) fn(id);
    }
    EncounterSelection select(const SelectionOptions& s) const { return selectEncounters(colony, where, s); }
    std::optional<Day> lastDay() const { return lastEncounterDay(colony); }
    std::vector<SisterOvertaking> acquisition(const Matrilines& lines, const EloSettings& elo, const std::string& group,
                                              std::optional<Day> to) const
    {
        return rankAcquisition(colony, where, lines, elo, group, to);
    }
    ObservedScores scoresAt(Day d, const std::string& group, const EloSettings& elo) const
    {
        return eloScoresAt(colony, where, d, group, elo);
    }
};

/// The same of compact records, texts through their code tables.
struct CompactRecords {
    const CompactEncounters& encounters;
    const std::vector<Animal>& animals;
    const ResidenceIndex& where;

    std::vector<size_t> order() const
    {
        const std::vector<std::uint32_t> o = analysisOrder(encounters.records);
        return {o.begin(), o.end()};
    }
    Day date(size_t k) const { return encounters.records[k].date; }
    const std::string& group(size_t k) const { return encounters.groups.name(encounters.records[k].group); }
    const std::string& winner(size_t k) const { return encounters.animals.name(encounters.records[k].winner); }
    const std::string& loser(size_t k) const { return encounters.animals.name(encounters.records[k].loser); }
    template <class Fn> void forSupporters(size_t k, SupportSide side, Fn fn) const
    {
        const auto& all = encounters.supporters;
        auto at = std::lower_bound(all.begin(), all.end(), k,
                                   [](const CompactSupport& s, size_t index) { return s.encounter < index; });
        for (; at != all.end() && at->encounter == k; ++at)
            if (at->side == side) fn(encounters.animals.name(at->animal));
    }
    EncounterSelection select(const SelectionOptions& s) const { return selectEncounters(encounters, animals, where, s); }
    std::optional<Day> lastDay() const { return lastEncounterDay(encounters); }
    std::vector<SisterOvertaking> acquisition(const Matrilines& lines, const EloSettings& elo, const std::string& group,
                                              std::optional<Day> to) const
    {
        return rankAcquisition(encounters, animals, where, lines, elo, group, to);
    }
    ObservedScores scoresAt(Day d, const std::string& group, const EloSettings& elo) const
    {
        return eloScoresAt(encounters, animals, where, d, group, elo);
    }
};

/// The analysis of the encounters `source` reads (either form); `colony`'s
/// animals and pedigree are read, not its encounters.
template <class Source>
SupportAnalysis supportOf(const Source& source, const Colony& colony, const ResidenceIndex& where,
                          const SupportOptions& options)
{
    SupportAnalysis out;
    const int n = static_cast<int>(colony.animals.size());
    const auto cell = [n](int s, int b) { return static_cast<size_t>(s) * static_cast<size_t>(n) + static_cast<size_t>(b); };
    std::vector<int> residenceOf(static_cast<size_t>(n));
    for (int i = 0; i < n; ++i) residenceOf[static_cast<size_t>(i)] = where.animal(colony.animals[static_cast<size_t>(i)].id);

    // The window's encounters and, per day and group, who was there.
    std::map<std::pair<Day, int>, std::vector<int>> present;
    const auto inWindow = [&](size_t k) {
        const Day date = source.date(k);
        return (!options.from || date >= *options.from) && (!options.to || date <= *options.to) &&
               (options.group.empty() || source.group(k) == options.group);
    };
    const std::vector<size_t> order = source.order();
    // Room for every encounter of the window at once (millions on a centre:
    // growing by doubling would hold two lists for a while).
    std::vector<Fight> fights;
    fights.reserve(static_cast<size_t>(std::count_if(order.begin(), order.end(), inWindow)));
    for (size_t k : order) {
        if (!inWindow(k)) continue;
        const Day date = source.date(k);
        const std::string& group = source.group(k);
        Fight f;
        f.date = date;
        f.group = &group;
        f.winner = colony.animalIndex(source.winner(k));
        f.loser = colony.animalIndex(source.loser(k));
        if (f.winner < 0 || f.loser < 0) continue;
        const int wr = residenceOf[static_cast<size_t>(f.winner)];
        const int g = group.empty() ? where.groupOn(wr, date) : where.group(group);
        if (g < 0) continue;
        auto [at, fresh] = present.try_emplace({date, g});
        if (fresh)
            for (int i = 0; i < n; ++i) {
                const int ri = residenceOf[static_cast<size_t>(i)];
                if (ri >= 0 && where.presentOn(ri, date) && where.groupOn(ri, date) == g) at->second.push_back(i);
            }
        f.candidates = &at->second;
        // Supporters the rules would refuse (absent that day, a participant) are left out.
        auto eligible = [&](int s) {
            return s >= 0 && s != f.winner && s != f.loser &&
                   std::find(at->second.begin(), at->second.end(), s) != at->second.end();
        };
        source.forSupporters(k, SupportSide::Winner, [&](const std::string& id) {
            if (const int s = colony.animalIndex(id); eligible(s)) f.winnerSide.push_back(s);
        });
        source.forSupporters(k, SupportSide::Loser, [&](const std::string& id) {
            if (const int s = colony.animalIndex(id); eligible(s)) f.loserSide.push_back(s);
        });
        out.acts += static_cast<int>(f.winnerSide.size() + f.loserSide.size());
        fights.push_back(std::move(f));
    }
    out.encounters = static_cast<int>(fights.size());

    // Opportunities and support given per ordered pair (supporter, beneficiary).
    std::vector<int> opportunities(static_cast<size_t>(n) * static_cast<size_t>(n), 0);
    std::vector<int> given(opportunities.size(), 0);
    for (const Fight& f : fights) {
        for (int s : *f.candidates) {
            if (s == f.winner || s == f.loser) continue;
            ++opportunities[cell(s, f.winner)];
            ++opportunities[cell(s, f.loser)];
        }
        for (int s : f.winnerSide) ++given[cell(s, f.winner)];
        for (int s : f.loserSide) ++given[cell(s, f.loser)];
    }

    // Kin classes from the pedigree.
    const Matrilines lines(colony);
    const std::vector<PedigreeNode> nodes = lines.pedigreeNodes();
    Relatedness relatedness(nodes);
    std::vector<char> kin(opportunities.size(), static_cast<char>(KinClass::Unrelated));
    out.classes.resize(static_cast<size_t>(KinClass::Count));
    for (int k = 0; k < static_cast<int>(KinClass::Count); ++k) out.classes[static_cast<size_t>(k)].kin = static_cast<KinClass>(k);
    std::vector<bool> inPairs(static_cast<size_t>(n), false);
    for (int s = 0; s < n; ++s)
        for (int b = 0; b < n; ++b) {
            const size_t c = cell(s, b);
            if (opportunities[c] == 0) continue;
            const int sn = lines.index(colony.animals[static_cast<size_t>(s)].id);
            const int bn = lines.index(colony.animals[static_cast<size_t>(b)].id);
            SupportPair p;
            p.supporter = colony.animals[static_cast<size_t>(s)].id;
            p.beneficiary = colony.animals[static_cast<size_t>(b)].id;
            p.r = relatedness.relatedness(sn, bn);
            p.kin = kinClassOf(lines.mother(bn) == sn, p.r);
            p.opportunities = opportunities[c];
            p.given = given[c];
            p.rate = ratio(p.given, p.opportunities);
            kin[c] = static_cast<char>(p.kin);
            KinClassRate& pooled = out.classes[static_cast<size_t>(p.kin)];
            ++pooled.pairs;
            pooled.opportunities += p.opportunities;
            pooled.given += p.given;
            inPairs[static_cast<size_t>(s)] = inPairs[static_cast<size_t>(b)] = true;
            out.pairs.push_back(std::move(p));
        }
    std::sort(out.pairs.begin(), out.pairs.end(), [](const SupportPair& x, const SupportPair& y) {
        return std::tie(x.supporter, x.beneficiary) < std::tie(y.supporter, y.beneficiary);
    });
    long long highOpp = 0, highGiven = 0;
    for (KinClassRate& c : out.classes) {
        c.rate = ratio(c.given, c.opportunities);
        if (kinForIndex(c.kin)) {
            highOpp += c.opportunities;
            highGiven += c.given;
        }
    }
    const KinClassRate& low = out.classes[static_cast<size_t>(KinClass::Unrelated)];
    out.nepotismIndex = indexOf(highGiven, highOpp, low.given, low.opportunities);

    // Permutation test: every act's supporter redrawn among the encounter's
    // eligible animals (present, not fighting, not already drawn for it).
    out.test.iterations = std::max(options.iterations, 0);
    out.test.seed = options.seed;
    if (out.nepotismIndex && options.iterations > 0) {
        std::vector<const Fight*> supported;
        for (const Fight& f : fights)
            if (!f.winnerSide.empty() || !f.loserSide.empty()) supported.push_back(&f);
        const std::vector<double> random = runRandomisations<double>(
            options.iterations, options.seed, std::max(1U, options.threads), [&](RandomEngine& engine, int) {
                long long high = 0, lowGiven = 0;
                std::vector<int> drawn;
                for (const Fight* f : supported) {
                    drawn.clear();
                    const std::vector<int>& pool = *f->candidates;
                    auto act = [&](int beneficiary) {
                        int s = -1;
                        do s = pool[drawBelow(engine, pool.size())];
                        while (s == f->winner || s == f->loser || std::find(drawn.begin(), drawn.end(), s) != drawn.end());
                        drawn.push_back(s);
                        const auto k = static_cast<KinClass>(kin[cell(s, beneficiary)]);
                        if (kinForIndex(k)) ++high;
                        else if (k == KinClass::Unrelated) ++lowGiven;
                    };
                    for (size_t i = 0; i < f->winnerSide.size(); ++i) act(f->winner);
                    for (size_t i = 0; i < f->loserSide.size(); ++i) act(f->loser);
                }
                // No act among unrelated pairs: the index is infinite, at least as large as any observed one.
                if (lowGiven == 0) return std::numeric_limits<double>::infinity();
                return *indexOf(high, highOpp, lowGiven, low.opportunities);
            });
        const double observed = *out.nepotismIndex;
        const long long atLeast = std::count_if(random.begin(), random.end(),
                                                [&](double x) { return x >= observed * (1 - 1e-12); });
        out.test.p = rightTailedP(atLeast, options.iterations);
        if (std::all_of(random.begin(), random.end(), [](double x) { return std::isfinite(x); }))
            out.test.meanRandom = std::accumulate(random.begin(), random.end(), 0.0) / static_cast<double>(random.size());
    }

    // Mothers and the rule: a mother's act for her daughter against another
    // female, both placed by the inheritance rule on that day.
    std::map<std::pair<Day, std::string>, InheritancePrediction> predictions;
    std::map<std::string, DailyScores> scoresOf; // by group
    auto isFemale = [&](int a) { return colony.animals[static_cast<size_t>(a)].sex == Sex::Female; };
    auto motherOf = [&](int a) {
        const int node = lines.index(colony.animals[static_cast<size_t>(a)].id);
        const int m = lines.mother(node);
        return m >= 0 && lines.recorded(m) ? colony.animalIndex(lines.id(m)) : -1;
    };
    for (const Fight& f : fights) {
        for (int side = 0; side < 2; ++side) {
            const int daughter = side == 0 ? f.winner : f.loser;
            const int opponent = side == 0 ? f.loser : f.winner;
            const std::vector<int>& helpers = side == 0 ? f.winnerSide : f.loserSide;
            const int mother = motherOf(daughter);
            if (mother < 0 || !isFemale(daughter) || !isFemale(opponent)) continue;
            if (std::find(helpers.begin(), helpers.end(), mother) == helpers.end()) continue;
            auto [at, fresh] = predictions.try_emplace({f.date, *f.group});
            if (fresh) {
                // predictInheritance at that date and group, with one Elo pass per group.
                auto scores = scoresOf.find(*f.group);
                if (scores == scoresOf.end())
                    scores = scoresOf
                                 .try_emplace(*f.group, [&](const SelectionOptions& s) { return source.select(s); },
                                              *f.group, options.elo)
                                 .first;
                const RankedFemales ranked = rankedFemalesOn(lines, where, f.date, *f.group, options.maturityYears);
                at->second = predictOrder(lines, ranked, scores->second.on(f.date), options.rule);
            }
            const int pd = at->second.find(colony.animals[static_cast<size_t>(daughter)].id);
            const int po = at->second.find(colony.animals[static_cast<size_t>(opponent)].id);
            if (pd < 0 || po < 0) continue;
            ++out.motherActsAgainstFemales;
            if (po > pd) ++out.motherActsAgainstBelow;
        }
    }
    out.motherShareAgainstBelow = ratio(out.motherActsAgainstBelow, out.motherActsAgainstFemales);

    // Daughters: the day they had risen above every older sister, and their mothers' support before it.
    std::optional<Day> end = options.to;
    if (!end) end = source.lastDay();
    if (end) {
        std::map<std::string, DaughterSupport> byDaughter;
        for (const SisterOvertaking& o : source.acquisition(lines, options.elo, options.group, end)) {
            auto [at, fresh] = byDaughter.try_emplace(o.daughter);
            DaughterSupport& d = at->second;
            if (fresh) {
                d.daughter = o.daughter;
                d.mother = o.mother;
                d.reached = o.firstAbove;
            }
            ++d.olderSisters;
            d.reached = (d.reached && o.firstAbove) ? std::optional<Day>(std::max(*d.reached, *o.firstAbove)) : std::nullopt;
        }
        for (auto& [id, d] : byDaughter) {
            const int daughter = colony.animalIndex(id);
            const int mother = colony.animalIndex(d.mother);
            if (daughter < 0 || mother < 0) continue;
            for (const Fight& f : fights) {
                if (d.reached && f.date > *d.reached) break;
                if (f.winner != daughter && f.loser != daughter) continue;
                if (mother == f.winner || mother == f.loser) continue;
                const std::vector<int>& pool = *f.candidates;
                if (std::find(pool.begin(), pool.end(), mother) == pool.end()) continue;
                ++d.maternalOpportunities;
                const std::vector<int>& side = f.winner == daughter ? f.winnerSide : f.loserSide;
                if (std::find(side.begin(), side.end(), mother) != side.end()) ++d.maternalSupport;
            }
            out.daughters.push_back(d);
        }
    }

    // Rank order of the support matrix: Elo at the window's end.
    ObservedScores scores;
    if (end) scores = source.scoresAt(*end, options.group, options.elo);
    for (int i = 0; i < n; ++i)
        if (inPairs[static_cast<size_t>(i)]) out.order.push_back(colony.animals[static_cast<size_t>(i)].id);
    std::sort(out.order.begin(), out.order.end(), [&](const std::string& x, const std::string& y) {
        const auto sx = scores.find(x), sy = scores.find(y);
        const bool hx = sx != scores.end(), hy = sy != scores.end();
        if (hx != hy) return hx;
        if (hx && std::abs(sx->second - sy->second) > 1e-9 * std::max(std::abs(sx->second), std::abs(sy->second)))
            return sx->second > sy->second;
        return x < y;
    });
    for (const std::string& id : out.order) out.matriarchs.push_back(lines.id(lines.matriarch(lines.index(id))));
    return out;
}

} // namespace

SupportAnalysis analyseSupport(const Colony& colony, const ResidenceIndex& where, const SupportOptions& options)
{
    return supportOf(ColonyEncounters{colony, where}, colony, where, options);
}

SupportAnalysis analyseSupport(const CompactEncounters& encounters, const Colony& pedigree, const ResidenceIndex& where,
                               const SupportOptions& options)
{
    return supportOf(CompactRecords{encounters, pedigree.animals, where}, pedigree, where, options);
}

} // namespace hierloom::core
