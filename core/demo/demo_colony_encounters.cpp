// SPDX-License-Identifier: GPL-3.0-or-later
// The encounter half of the demo colony: outcomes follow a latent order built
// by matrilineal inheritance with youngest ascendancy (Kawamura 1958; Datta 1988).
#include "core/demo/demo_population.h"
#include "core/demo/demo_random.h"

#include <algorithm>
#include <cstdlib>
#include <iterator>

namespace hierloom::core {
namespace {

bool adultNatalMale(const DemoAnimal& a, Day d)
{
    return a.sex == Sex::Male && a.line != 0 && d >= anniversary(a.birth, 5);
}

// Depth-first walk of one matriline: a mother, then her risen daughters
// youngest first with their descendants, then her not yet risen offspring.
void walkLine(const DemoPopulation& pop, int m, Day d, std::vector<int>& out, std::vector<int>& adultSons)
{
    const DemoAnimal& a = pop.animals[static_cast<size_t>(m)];
    if (pop.resident(m, d)) (adultNatalMale(a, d) ? adultSons : out).push_back(m);
    std::vector<int> risen, rest;
    for (int c : a.children) {
        const DemoAnimal& ch = pop.animals[static_cast<size_t>(c)];
        if (ch.birth > d) continue;
        (ch.sex == Sex::Female && ch.rise <= d ? risen : rest).push_back(c);
    }
    auto birthOf = [&](int i) { return pop.animals[static_cast<size_t>(i)].birth; };
    std::stable_sort(risen.begin(), risen.end(), [&](int x, int y) { return birthOf(x) > birthOf(y); });
    std::stable_sort(rest.begin(), rest.end(), [&](int x, int y) { return birthOf(x) < birthOf(y); });
    for (int c : risen) walkLine(pop, c, d, out, adultSons);
    for (int c : rest) walkLine(pop, c, d, out, adultSons);
}

// The latent order on day d, top first: unrelated males, adult natal males,
// then the matrilines in the given order, then the planted reversals.
std::vector<int> latentOrder(const DemoPopulation& pop, Day d, const char* lines)
{
    std::vector<int> out, females, sons;
    for (int m : pop.maleOrder)
        if (pop.resident(m, d)) out.push_back(m);
    for (const char* l = lines; *l; ++l) walkLine(pop, pop.matriarch[*l - 'A'], d, females, sons);
    std::stable_sort(sons.begin(), sons.end(), [&](int x, int y) {
        return pop.animals[static_cast<size_t>(x)].birth < pop.animals[static_cast<size_t>(y)].birth;
    });
    out.insert(out.end(), sons.begin(), sons.end());
    out.insert(out.end(), females.begin(), females.end());
    for (const DemoOverride& o : pop.overrides) {
        auto moved = std::find(out.begin(), out.end(), o.moved);
        if (moved == out.end() || std::find(out.begin(), out.end(), o.anchor) == out.end()) continue;
        out.erase(moved);
        auto anchor = std::find(out.begin(), out.end(), o.anchor);
        out.insert(o.above ? anchor : anchor + 1, o.moved);
    }
    return out;
}

constexpr const char* kBehaviours[] = {"displace", "threat", "avoid", "chase", "grab", "bite"};
constexpr double kUsualWeights[] = {0.38, 0.27, 0.17, 0.11, 0.05, 0.02};
constexpr double kRevoltWeights[] = {0.15, 0.25, 0.10, 0.28, 0.10, 0.12};
constexpr const char* kNotes[] = {
    "partly hidden behind the shelter",
    "at the feeder, after provisioning",
    "loser identity confirmed from video",
    "during heavy rain",
    "\"bite\" without a visible wound",
};

bool adultOn(const DemoAnimal& a, Day d) { return d >= anniversary(a.birth, 4); }

/// The planted maternal-support pattern (demo-colony/README.md): supporters
/// drawn from their own stream, so the encounters themselves do not change.
/// `pos` marks the animals that may take part that day (>= 0).
void addSupporters(const DemoPopulation& pop, const std::vector<int>& pos, int w, int l, Day d, DemoRandom& rng,
                   Encounter& enc)
{
    auto& A = pop.animals;
    auto at = [&](int i) -> const DemoAnimal& { return A[static_cast<size_t>(i)]; };
    auto free = [&](int i) {
        if (i < 0 || i == w || i == l || pos[static_cast<size_t>(i)] < 0) return false;
        const std::string& id = at(i).id;
        return std::find(enc.winnerSupport.begin(), enc.winnerSupport.end(), id) == enc.winnerSupport.end() &&
               std::find(enc.loserSupport.begin(), enc.loserSupport.end(), id) == enc.loserSupport.end();
    };
    auto join = [&](int i, bool winnerSide) { (winnerSide ? enc.winnerSupport : enc.loserSupport).push_back(at(i).id); };
    const int mw = at(w).mother, ml = at(l).mother;
    if (mw >= 0 && mw == ml) {
        // Two of her offspring fighting: the mother backs the younger one.
        if (free(mw) && adultOn(at(mw), d) && rng.chance(0.35)) join(mw, at(w).birth > at(l).birth);
    } else {
        for (int side = 0; side < 2; ++side) {
            const int f = side == 0 ? w : l;
            const int m = at(f).mother;
            // Mothers back their offspring, the young ones (under six) the more.
            const double p = d < anniversary(at(f).birth, 6) ? 0.40 : 0.22;
            if (m >= 0 && free(m) && adultOn(at(m), d) && rng.chance(p)) join(m, side == 0);
        }
    }
    for (int side = 0; side < 2; ++side) {
        const int f = side == 0 ? w : l;
        const int m = at(f).mother;
        if (m < 0) continue;
        // Grandmothers and adult maternal sisters now and then.
        if (const int g = at(m).mother; g >= 0 && free(g) && adultOn(at(g), d) && rng.chance(0.06)) join(g, side == 0);
        for (int s : at(m).children)
            if (s != f && at(s).sex == Sex::Female && free(s) && adultOn(at(s), d) && rng.chance(0.04)) join(s, side == 0);
    }
    // Now and then an unrelated adult joins the winner's side.
    if (rng.chance(0.10)) {
        const int u = static_cast<int>(rng.below(A.size()));
        const char lu = at(u).line;
        if (free(u) && adultOn(at(u), d) && (lu == 0 || (lu != at(w).line && lu != at(l).line))) join(u, true);
    }
}

} // namespace

std::vector<Encounter> generateDemoEncounters(const DemoPopulation& pop, std::uint64_t seed)
{
    DemoRandom rng(splitMix64(seed ^ 0xE2C0E2C0ULL));
    DemoRandom supportRng(splitMix64(seed ^ 0x5A9905E7ULL)); // the supporters' own stream
    const std::vector<std::string> observers = demoObservers();
    const Day start = toDay(demo::kRecordStart);
    const Day end = toDay(demo::kRecordEnd);
    const Day revoltStart = toDay(demo::kRevoltStart);
    const Day revoltEnd = toDay(demo::kRevoltEnd);
    const Day thirdObserverJoins = dayFromCivil(2020, 6, 1);
    const size_t n = pop.animals.size();

    // Each C-line animal turns the tables on the B line on its own day within
    // the revolt, the higher-ranked ones first.
    std::vector<Day> switchDay(n, revoltStart);
    {
        std::vector<int> c;
        for (int i : latentOrder(pop, revoltStart, demo::kLinesBeforeRevolt))
            if (pop.animals[static_cast<size_t>(i)].line == 'C') c.push_back(i);
        for (size_t k = 0; k < c.size(); ++k)
            switchDay[static_cast<size_t>(c[k])] =
                revoltStart + static_cast<Day>((revoltEnd - revoltStart) * static_cast<long>(k + 1) /
                                               static_cast<long>(c.size() + 1));
    }

    std::vector<Encounter> all;
    int observedDays = 0;
    for (Day d = start; d <= end; ++d) {
        const CivilDate c = civilFromDay(d);
        const int weekday = ((d % 7) + 7 + 3) % 7; // 0 = Monday; 1970-01-01 was a Thursday
        if (weekday >= 5) continue;
        if ((c.month == 12 && c.day >= 24) || (c.month == 1 && c.day == 1)) continue; // holidays
        if (rng.chance(0.12)) continue; // some weekdays without observation
        const bool revolt = d >= revoltStart && d <= revoltEnd;
        const std::vector<int> order =
            latentOrder(pop, d, d > revoltEnd ? demo::kLinesAfterRevolt : demo::kLinesBeforeRevolt);
        std::vector<int> pos(n, -1);
        std::vector<int> eligible;
        for (size_t k = 0; k < order.size(); ++k) {
            const DemoAnimal& a = pop.animals[static_cast<size_t>(order[k])];
            // At least a year old, and not on the day of death or removal.
            if (d < anniversary(a.birth, 1) || (a.exit && d >= *a.exit)) continue;
            pos[static_cast<size_t>(order[k])] = static_cast<int>(eligible.size());
            eligible.push_back(order[k]);
        }
        if (eligible.size() < 2) continue;
        std::vector<double> weight;
        std::vector<int> lineB, lineC;
        for (int i : eligible) {
            const DemoAnimal& a = pop.animals[static_cast<size_t>(i)];
            const bool adult = d >= anniversary(a.birth, 4);
            weight.push_back(!adult ? 0.55 : (a.sex == Sex::Male ? 1.3 : 1.0));
            if (adult && a.line == 'B') lineB.push_back(i);
            if (adult && a.line == 'C') lineC.push_back(i);
        }
        const std::string& morning =
            d < thirdObserverJoins ? observers[static_cast<size_t>(observedDays % 2)]
                                   : observers[static_cast<size_t>(observedDays % 3)];
        const std::string& afternoon =
            d < thirdObserverJoins ? observers[static_cast<size_t>((observedDays + 1) % 2)]
                                   : observers[static_cast<size_t>((observedDays + 1) % 3)];
        ++observedDays;

        int count = static_cast<int>(eligible.size()) / 6 + rng.between(1, 5);
        if (revolt) count = count * 17 / 10;
        std::vector<Encounter> day;
        for (int e = 0; e < count; ++e) {
            Encounter enc;
            enc.date = d;
            const int minute = rng.between(7 * 60, 17 * 60);
            if (!rng.chance(0.005)) enc.time = minute;
            int a = -1, b = -1;
            const bool fight = revolt && !lineB.empty() && !lineC.empty() && rng.chance(0.35);
            if (fight) {
                a = lineC[rng.below(lineC.size())];
                b = lineB[rng.below(lineB.size())];
            } else {
                const size_t ia = rng.pick(weight);
                std::vector<double> w2(weight.size());
                for (size_t k = 0; k < weight.size(); ++k) {
                    const int gap = std::abs(static_cast<int>(k) - static_cast<int>(ia));
                    w2[k] = k == ia ? 0.0 : weight[k] * (0.1 + 2.0 / (1.0 + gap * gap));
                }
                a = eligible[ia];
                b = eligible[rng.pick(w2)];
            }
            // Probability that a wins: the higher in the latent order usually
            // does; during the revolt C-line animals contest, then beat, B.
            const int pa = pos[static_cast<size_t>(a)], pb = pos[static_cast<size_t>(b)];
            const double pHigh = std::min(0.96, 0.90 + 0.02 * std::abs(pa - pb));
            double pA = pa < pb ? pHigh : 1.0 - pHigh;
            const char la = pop.animals[static_cast<size_t>(a)].line;
            const char lb = pop.animals[static_cast<size_t>(b)].line;
            const bool cb = (la == 'C' && lb == 'B') || (la == 'B' && lb == 'C');
            if (revolt && cb) {
                const int cAnimal = la == 'C' ? a : b;
                const double pC = d >= switchDay[static_cast<size_t>(cAnimal)] ? 0.8 : 0.3;
                pA = la == 'C' ? pC : 1.0 - pC;
            }
            const bool draw = rng.chance(0.015);
            const bool aWins = rng.uniform() < pA;
            if (draw) {
                enc.outcome = Outcome::Draw;
                enc.behaviour = rng.chance(0.75) ? "threat" : "grab";
            } else {
                enc.behaviour = kBehaviours[revolt && cb ? rng.pick(kRevoltWeights) : rng.pick(kUsualWeights)];
            }
            enc.winner = pop.animals[static_cast<size_t>(draw || aWins ? a : b)].id;
            enc.loser = pop.animals[static_cast<size_t>(draw || aWins ? b : a)].id;
            addSupporters(pop, pos, draw || aWins ? a : b, draw || aWins ? b : a, d, supportRng, enc);
            if (rng.chance(0.006)) enc.note = kNotes[rng.below(std::size(kNotes))];
            enc.group = demo::kGroup;
            enc.observer = minute < 12 * 60 ? morning : afternoon;
            day.push_back(std::move(enc));
        }
        // Rows are entered in time order, untimed ones at the end of the day.
        std::stable_sort(day.begin(), day.end(), [](const Encounter& x, const Encounter& y) {
            return x.time.value_or(24 * 60) < y.time.value_or(24 * 60);
        });
        for (Encounter& enc : day) {
            enc.seq = static_cast<std::int64_t>(all.size()) + 1;
            all.push_back(std::move(enc));
        }
    }
    return all;
}

} // namespace hierloom::core
