// SPDX-License-Identifier: GPL-3.0-or-later
// A generated breeding centre for measuring how costs grow: `groups` social
// groups of `animalsPerGroup` animals each (founder females, each the
// matriarch of her line, then daughters and sons born over the years; sons
// leave at four, one founder in ten dies), and `encounters` agonistic
// encounters spread over `years` years, five days a week, every group
// observed every day. Deterministic from the seed (its own integer draws, so
// every standard library gives the same centre). Only the size and shape of
// the data matter; the latent order behind the outcomes is crude.
#pragma once
#include "core/base/civil_date.h"
#include "core/base/colony.h"

#include <algorithm>
#include <cstdint>
#include <cstdio>
#include <functional>
#include <string>
#include <vector>

namespace hierloom::tools {

struct CentreSpec {
    int groups = 40;
    int animalsPerGroup = 125;
    long long encounters = 3000000;
    int years = 15;
    std::uint64_t seed = 1;
    int firstYear = 2011;
};

/// splitmix64: small, fast and the same everywhere.
class CentreRandom {
public:
    explicit CentreRandom(std::uint64_t seed) : state_(seed) {}
    std::uint64_t next()
    {
        std::uint64_t z = (state_ += 0x9E3779B97F4A7C15ULL);
        z = (z ^ (z >> 30)) * 0xBF58476D1CE4E5B9ULL;
        z = (z ^ (z >> 27)) * 0x94D049BB133111EBULL;
        return z ^ (z >> 31);
    }
    /// 0 <= value < n
    std::uint64_t below(std::uint64_t n) { return next() % n; }
    /// 0 <= value < 1
    double unit() { return static_cast<double>(next() >> 11) / 9007199254740992.0; }

private:
    std::uint64_t state_;
};

inline std::string centreGroupName(int g)
{
    char buf[16];
    std::snprintf(buf, sizeof buf, "G%02d", g + 1);
    return buf;
}

/// The animals and residences of the centre (one residence per animal, in its
/// birth group from entry to exit) and the latent strength of each animal.
struct CentrePopulation {
    std::vector<core::Animal> animals;
    std::vector<core::Residence> residences;
    std::vector<double> strength; // higher wins
    std::vector<int> groupOf;
};

inline CentrePopulation generateCentrePopulation(const CentreSpec& spec)
{
    CentreRandom rng(spec.seed * 2 + 1);
    const core::Day start = core::dayFromCivil(spec.firstYear, 1, 1);
    const core::Day end = core::dayFromCivil(spec.firstYear + spec.years - 1, 12, 31);
    CentrePopulation p;
    for (int g = 0; g < spec.groups; ++g) {
        const std::string group = centreGroupName(g);
        const size_t first = p.animals.size();
        auto add = [&](core::Sex sex, core::Day birth, const std::string& mother, core::Day entry, double strength) {
            core::Animal a;
            char id[32];
            std::snprintf(id, sizeof id, "%sA%03d", group.c_str(), static_cast<int>(p.animals.size() - first + 1));
            a.id = id;
            a.name = "Animal " + a.id;
            a.sex = sex;
            a.birth = birth;
            a.mother = mother;
            a.entry = entry;
            a.entryType = mother.empty() ? core::EntryType::Founder : core::EntryType::Born;
            p.animals.push_back(a);
            p.strength.push_back(strength);
            p.groupOf.push_back(g);
            return p.animals.size() - 1;
        };
        const int founders = std::max(2, spec.animalsPerGroup / 5);
        for (int i = 0; i < founders; ++i)
            add(core::Sex::Female, start - 365 * (5 + static_cast<int>(rng.below(12))), {}, start,
                (founders - i) * 10.0 + rng.unit());
        const int births = spec.animalsPerGroup - founders;
        const int pairs = births / 2;
        for (int k = 0; k < pairs + births % 2; ++k) {
            const core::Day birth =
                start + static_cast<core::Day>((end - start - 400) * (k + 0.5) / std::max(1, pairs + births % 2));
            std::vector<size_t> mothers;
            for (size_t a = first; a < p.animals.size(); ++a)
                if (p.animals[a].sex == core::Sex::Female && *p.animals[a].birth + 4 * 365 <= birth &&
                    (!p.animals[a].exit || *p.animals[a].exit > birth))
                    mothers.push_back(a);
            if (mothers.empty()) mothers.push_back(first);
            const size_t m = mothers[rng.below(mothers.size())];
            const std::string mother = p.animals[m].id;
            const double s = p.strength[m] - 0.5 + rng.unit() * 0.4;
            add(core::Sex::Female, birth, mother, birth, s);
            if (k < pairs) {
                const size_t son = add(core::Sex::Male, birth + 3, mother, birth + 3, s - 0.1);
                p.animals[son].exit = birth + 3 + 4 * 365;
                p.animals[son].exitType = core::ExitType::Removed;
            }
            if (k % 10 == 0) {
                const size_t f = first + static_cast<size_t>(k % founders);
                if (!p.animals[f].exit) {
                    p.animals[f].exit = birth;
                    p.animals[f].exitType = core::ExitType::Died;
                }
            }
        }
    }
    for (const core::Animal& a : p.animals) {
        core::Residence r;
        r.animal = a.id;
        r.group = centreGroupName(p.groupOf[static_cast<size_t>(&a - p.animals.data())]);
        r.from = *a.entry;
        r.to = a.exit;
        p.residences.push_back(r);
    }
    return p;
}

/// Calls `emit` for each encounter in entry order (date ascending; within a
/// day group by group). Winner beats loser by latent strength, one upset in
/// twelve, one draw in a hundred; nine in ten have a time of day.
inline void generateCentreEncounters(const CentreSpec& spec, const CentrePopulation& p,
                                     const std::function<void(core::Encounter&)>& emit)
{
    CentreRandom rng(spec.seed * 2 + 2);
    const core::Day start = core::dayFromCivil(spec.firstYear, 1, 1);
    const core::Day end = core::dayFromCivil(spec.firstYear + spec.years - 1, 12, 31);
    std::vector<core::Day> days;
    for (core::Day d = start; d <= end; ++d)
        if ((d + 4) % 7 < 5) days.push_back(d); // Monday to Friday (1970-01-01 was a Thursday)
    static const char* const behaviours[] = {"displace", "avoid", "threat", "grab", "chase", "bite"};
    static const char* const observers[] = {"ana", "ben", "chloe", "dev", "eli", "fay"};
    std::vector<std::vector<size_t>> present(static_cast<size_t>(spec.groups));
    std::vector<std::string> groupNames;
    for (int g = 0; g < spec.groups; ++g) groupNames.push_back(centreGroupName(g));
    const long long slots = static_cast<long long>(days.size()) * spec.groups;
    long long made = 0;
    core::Encounter e;
    for (size_t di = 0; di < days.size(); ++di) {
        const core::Day d = days[di];
        {
            for (auto& list : present) list.clear();
            for (size_t a = 0; a < p.animals.size(); ++a) {
                const core::Animal& x = p.animals[a];
                if (*x.entry <= d && (!x.exit || *x.exit >= d) && *x.birth + 365 <= d)
                    present[static_cast<size_t>(p.groupOf[a])].push_back(a);
            }
        }
        for (int g = 0; g < spec.groups; ++g) {
            const long long slot = static_cast<long long>(di) * spec.groups + g + 1;
            const long long due = spec.encounters * slot / slots;
            const auto& here = present[static_cast<size_t>(g)];
            while (made < due) {
                ++made;
                if (here.size() < 2) continue;
                const size_t a = here[rng.below(here.size())];
                size_t b = here[rng.below(here.size())];
                while (a == b) b = here[rng.below(here.size())];
                const bool upset = rng.below(12) == 0;
                const bool aWins = (p.strength[a] > p.strength[b]) != upset;
                e.date = d;
                e.time.reset();
                if (rng.below(10) != 0) e.time = 420 + static_cast<int>(rng.below(600));
                e.winner = p.animals[aWins ? a : b].id;
                e.loser = p.animals[aWins ? b : a].id;
                e.outcome = rng.below(100) == 0 ? core::Outcome::Draw : core::Outcome::Decided;
                e.behaviour = behaviours[rng.below(6)];
                e.group = groupNames[static_cast<size_t>(g)];
                e.observer = observers[rng.below(6)];
                e.note.clear();
                e.seq = 0;
                e.uid.clear();
                emit(e);
            }
        }
    }
}

} // namespace hierloom::tools
