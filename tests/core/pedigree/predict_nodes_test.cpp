// SPDX-License-Identifier: GPL-3.0-or-later
// predictOrder through predictNodes and kept walks (core/pedigree/inheritance_prediction.h)
// against a frozen copy of the string-keyed code it replaced, on random pedigrees.
#include "core/pedigree/inheritance_prediction.h"

#include "core/ranks/ordinal_ranks.h"

#include <gtest/gtest.h>

#include <algorithm>
#include <random>
#include <set>
#include <stdexcept>

using namespace hierloom::core;

namespace {

/// predictOrder as it was before predictNodes (kept frozen here).
InheritancePrediction frozenPredictOrder(const Matrilines& lines, const RankedFemales& ranked,
                                         const ObservedScores& observed, SiblingRule rule,
                                         const std::vector<std::string>& explicitOrder)
{
    InheritancePrediction p;
    p.rule = rule;
    p.unknownBirthCountedMature = ranked.unknownBirth;
    const int n = lines.size();
    std::vector<int> scored;
    for (int i = 0; i < n; ++i)
        if (ranked.ranked[static_cast<size_t>(i)] && observed.count(lines.id(i))) scored.push_back(i);
    std::sort(scored.begin(), scored.end(), [&](int a, int b) { return lines.id(a) < lines.id(b); });
    std::vector<double> scores;
    for (int i : scored) scores.push_back(observed.find(lines.id(i))->second);
    const std::vector<int> ordinal = ordinalRanks(scores, std::vector<bool>(scores.size(), true));
    std::vector<int> observedRank(static_cast<size_t>(n), 0);
    for (size_t k = 0; k < scored.size(); ++k) observedRank[static_cast<size_t>(scored[k])] = ordinal[k];
    std::vector<int> best(static_cast<size_t>(n), -1);
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
            if (lines.mother(m) >= 0) throw std::invalid_argument("not a matriarch");
            if (!seen.insert(m).second) throw std::invalid_argument("listed twice");
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
    for (size_t i = 0; i < p.females.size(); ++i) {
        if (!p.females[i].observedRank) continue;
        for (size_t j = i + 1; j < p.females.size(); ++j)
            if (p.females[j].observedRank && *p.females[j].observedRank < *p.females[i].observedRank) {
                ++p.females[i].discordantDyads;
                ++p.females[j].discordantDyads;
            }
    }
    return p;
}

/// A random pedigree: ids in shuffled colony order, mothers among earlier
/// females, some birth dates unknown, equal dates among sisters.
Colony randomPedigree(std::mt19937& gen, int size)
{
    Colony c;
    std::vector<int> females;
    for (int i = 0; i < size; ++i) {
        Animal a;
        a.id = "X" + std::to_string(gen() % 1000) + "_" + std::to_string(i);
        a.sex = gen() % 4 == 0 ? Sex::Male : Sex::Female;
        if (gen() % 6 != 0) a.birth = dayFromCivil(1990 + static_cast<int>(gen() % 4), 1, 1);
        if (!females.empty() && gen() % 3 != 0) a.mother = c.animals[static_cast<size_t>(females[gen() % females.size()])].id;
        if (a.sex == Sex::Female) females.push_back(i);
        c.animals.push_back(a);
    }
    std::shuffle(c.animals.begin(), c.animals.end(), gen);
    return c;
}

bool samePrediction(const InheritancePrediction& a, const InheritancePrediction& b)
{
    if (a.matrilineOrder != b.matrilineOrder || a.unorderable != b.unorderable ||
        a.unknownBirthCountedMature != b.unknownBirthCountedMature || a.females.size() != b.females.size())
        return false;
    for (size_t i = 0; i < a.females.size(); ++i) {
        const PredictedFemale &x = a.females[i], &y = b.females[i];
        if (x.animal != y.animal || x.matriarch != y.matriarch || x.predictedRank != y.predictedRank ||
            x.observedRank != y.observedRank || x.observedScore != y.observedScore || x.discordantDyads != y.discordantDyads)
            return false;
    }
    return true;
}

} // namespace

TEST(PredictNodes, PredictOrderSameAsTheFrozenStringCode)
{
    std::mt19937 gen(17);
    int compared = 0;
    for (int round = 0; round < 60; ++round) {
        const Colony c = randomPedigree(gen, 5 + static_cast<int>(gen() % 40));
        const Matrilines lines(c);
        RankedFemales ranked;
        ranked.ranked.assign(static_cast<size_t>(lines.size()), false);
        ObservedScores observed;
        for (int i = 0; i < lines.recordedCount(); ++i) {
            if (lines.sex(i) == Sex::Female && gen() % 4 != 0) ranked.ranked[static_cast<size_t>(i)] = true;
            // Scores on a coarse grid, so ties occur; some animals unranked but scored.
            if (gen() % 3 != 0) observed[lines.id(i)] = static_cast<double>(gen() % 6) * 10.0;
        }
        std::vector<std::string> explicitOrder;
        if (round % 3 == 0)
            for (int m : lines.matriarchs())
                if (gen() % 2 == 0) explicitOrder.push_back(lines.id(m));
        std::shuffle(explicitOrder.begin(), explicitOrder.end(), gen);
        for (SiblingRule rule : {SiblingRule::Youngest, SiblingRule::Eldest}) {
            const InheritancePrediction expected = frozenPredictOrder(lines, ranked, observed, rule, explicitOrder);
            EXPECT_TRUE(samePrediction(predictOrder(lines, ranked, observed, rule, explicitOrder), expected))
                << "round " << round;
            compared += static_cast<int>(expected.females.size());
        }
    }
    EXPECT_GT(compared, 500); // the cases rank enough females to mean something
}

TEST(PredictNodes, KeptWalksAreTheWalksWithoutUnrankedNodes)
{
    std::mt19937 gen(5);
    const Colony c = randomPedigree(gen, 60);
    const Matrilines lines(c);
    std::vector<bool> ranked(static_cast<size_t>(lines.size()));
    for (size_t i = 0; i < ranked.size(); ++i) ranked[i] = gen() % 2 == 0;
    MatrilineWalks walks(lines, SiblingRule::Eldest);
    for (int m : lines.matriarchs()) {
        std::vector<int> filtered;
        for (int f : walks.walk(m))
            if (ranked[static_cast<size_t>(f)]) filtered.push_back(f);
        EXPECT_EQ(filtered, matrilineWalk(lines, m, ranked, SiblingRule::Eldest));
        EXPECT_EQ(walks.walk(m).size(), lines.members(m).size()); // every member, once
    }
}
