// SPDX-License-Identifier: GPL-3.0-or-later
// The rule model of computeForesight (core/pedigree/foresight.h), judged in
// pedigree nodes, against a frozen copy of the string-keyed day judge it replaced.
#include "core/pedigree/foresight.h"

#include "core/ranks/informed_elo.h"
#include "pedigree_test_support.h"

#include <gtest/gtest.h>

#include <random>
#include <set>

using namespace hierloom::core;
using hierloom::test::PedigreeBuilder;

namespace {

/// Each bout's ruleConforms as computeForesight found it before the nodes (kept frozen here).
std::vector<std::optional<bool>> frozenRuleConforms(const Colony& colony, const ResidenceIndex& where,
                                                    const SelectionOptions& selection, const ForesightOptions& o)
{
    const EncounterSelection sel = selectEncounters(colony, where, selection);
    EloSettings elo = o.elo;
    elo.draws = selection.draws;
    const EloFamily family = eloFamilyOf(colony, sel.ids);
    const PresentOn present = residencePresence(sel.ids, where, selection.group);
    const Matrilines lines(colony);
    std::vector<std::optional<bool>> out(sel.bouts.size());
    const EloObserver judge = [&](size_t first, const std::vector<double>& rating,
                                  const std::vector<unsigned char>& rated) {
        if (first > 0 && sel.days[first] == sel.days[first - 1]) return;
        size_t last = first + 1;
        while (last < sel.days.size() && sel.days[last] == sel.days[first]) ++last;
        ObservedScores observed;
        for (int i = 0; i < sel.size(); ++i)
            if (rated[static_cast<size_t>(i)]) observed.emplace(sel.ids[static_cast<size_t>(i)], rating[static_cast<size_t>(i)]);
        const RankedFemales ranked = rankedFemalesOn(lines, where, sel.days[first], selection.group, o.maturityYears);
        const InheritancePrediction p = predictOrder(lines, ranked, observed, o.rule);
        std::set<std::string> placed;
        for (const PredictedFemale& f : p.females)
            if (f.observedScore) placed.insert(f.matriarch);
        for (size_t b = first; b < last; ++b) {
            const int w = p.find(sel.ids[static_cast<size_t>(sel.bouts[b].winner)]);
            const int l = p.find(sel.ids[static_cast<size_t>(sel.bouts[b].loser)]);
            if (w < 0 || l < 0) continue;
            const std::string& mw = p.females[static_cast<size_t>(w)].matriarch;
            const std::string& ml = p.females[static_cast<size_t>(l)].matriarch;
            if (mw != ml && (!placed.count(mw) || !placed.count(ml))) continue;
            out[b] = w < l;
        }
    };
    traceElo(sel.size(), sel.bouts, sel.days, elo, EloStartRule::None, family, present, {}, judge);
    return out;
}

std::string date(int year, int month, int day)
{
    char text[16];
    std::snprintf(text, sizeof text, "%04d-%02d-%02d", year, month, day);
    return text;
}

/// Four matriarchs, daughters and granddaughters maturing during the record,
/// some males and deaths, and random encounters on shared days.
Colony randomCentre(std::mt19937& gen)
{
    PedigreeBuilder b;
    std::vector<std::string> females, everyone;
    for (int m = 0; m < 4; ++m) {
        females.push_back("M" + std::to_string(m));
        b.female(females.back(), date(1995, 1 + m, 1));
    }
    for (int i = 0; i < 26; ++i) {
        const std::string mother = females[gen() % females.size()];
        const std::string id = (gen() % 2 ? "D" : "A") + std::to_string(i);
        const std::string born = date(2000 + static_cast<int>(gen() % 12), 1 + static_cast<int>(gen() % 12), 1);
        if (gen() % 5 == 0) {
            b.male(id, born, mother);
        } else {
            b.female(id, born, mother);
            females.push_back(id);
        }
        if (gen() % 9 == 0) b.died(id, date(2016, 6, 1));
    }
    everyone = females;
    for (int i = 0; i < 400; ++i) {
        const std::string& w = everyone[gen() % everyone.size()];
        const std::string& l = everyone[gen() % everyone.size()];
        if (w != l) b.win(date(2012 + static_cast<int>(gen() % 8), 1 + static_cast<int>(gen() % 12), 1), w, l);
    }
    return b.build();
}

} // namespace

TEST(ForesightJudge, RuleConformsSameAsTheFrozenStringJudge)
{
    std::mt19937 gen(41);
    int judged = 0;
    for (int round = 0; round < 8; ++round) {
        const Colony c = randomCentre(gen);
        const ResidenceIndex where(c.animals, c.residences);
        ForesightOptions o;
        o.rule = round % 2 ? SiblingRule::Eldest : SiblingRule::Youngest;
        o.maturityYears = 3 + round % 3;
        const std::vector<std::optional<bool>> expected = frozenRuleConforms(c, where, SelectionOptions{}, o);
        const Foresight f = computeForesight(c, where, SelectionOptions{}, o);
        ASSERT_EQ(f.encounters.size(), expected.size()); // every bout decided
        for (size_t b = 0; b < expected.size(); ++b) {
            EXPECT_EQ(f.encounters[b].ruleConforms, expected[b]) << "round " << round << ", bout " << b;
            judged += expected[b] ? 1 : 0;
        }
    }
    EXPECT_GT(judged, 500); // most encounters are comparable, so the check means something
}
