// SPDX-License-Identifier: GPL-3.0-or-later
// The pedigree half of the demo colony: who lived in the North Corral, when.
#include "core/demo/demo_population.h"
#include "core/demo/demo_random.h"

#include <algorithm>
#include <iterator>
#include <numeric>
#include <set>

namespace hierloom::core {
namespace {

Day ymd(int y, unsigned m, unsigned d) { return dayFromCivil(y, m, d); }

// Founder animals present on the first day; birth dates are estimates.
struct FounderSpec {
    const char* key;
    const char* name;
    Sex sex;
    int year;
    unsigned month;
    unsigned day;
    const char* mother; // key of the mother, or empty
    char line;
};

// Four matrilines with the daughters and juveniles already there in 2019,
// then three unrelated adult males.
constexpr FounderSpec kFounders[] = {
    {"Ada", "Ada", Sex::Female, 2006, 4, 15, "", 'A'},
    {"A1", "Alba", Sex::Female, 2011, 4, 15, "Ada", 'A'},
    {"A2", "Anise", Sex::Female, 2013, 4, 20, "Ada", 'A'},
    {"A3", "Arlo", Sex::Male, 2015, 5, 10, "Ada", 'A'},
    {"A4", "Aria", Sex::Female, 2016, 4, 25, "Ada", 'A'},
    {"A1a", "Amsel", Sex::Female, 2016, 5, 1, "A1", 'A'},
    {"A5", "Avi", Sex::Female, 2018, 5, 5, "Ada", 'A'},
    {"Bel", "Bel", Sex::Female, 2003, 4, 15, "", 'B'},
    {"B1", "Brisa", Sex::Female, 2009, 4, 20, "Bel", 'B'},
    {"B2", "Bryn", Sex::Female, 2012, 5, 1, "Bel", 'B'},
    {"B1a", "Bibi", Sex::Female, 2014, 5, 2, "B1", 'B'},
    {"B3", "Bonny", Sex::Female, 2015, 4, 12, "Bel", 'B'},
    {"B1b", "Bosco", Sex::Male, 2017, 4, 11, "B1", 'B'},
    {"B4", "Basil", Sex::Male, 2017, 5, 20, "Bel", 'B'},
    {"Cora", "Cora", Sex::Female, 2007, 4, 15, "", 'C'},
    {"C1", "Clio", Sex::Female, 2012, 4, 18, "Cora", 'C'},
    {"C2", "Cressida", Sex::Female, 2014, 5, 6, "Cora", 'C'},
    {"C3", "Cybil", Sex::Female, 2016, 4, 22, "Cora", 'C'},
    {"C1a", "Calla", Sex::Female, 2017, 4, 30, "C1", 'C'},
    {"C4", "Cosmo", Sex::Male, 2018, 4, 9, "Cora", 'C'},
    {"Dita", "Dita", Sex::Female, 2008, 4, 15, "", 'D'},
    {"D1", "Dora", Sex::Female, 2011, 5, 3, "Dita", 'D'},
    {"D2", "Delphine", Sex::Female, 2013, 4, 14, "Dita", 'D'},
    {"D1a", "Dulcie", Sex::Female, 2015, 4, 27, "D1", 'D'},
    {"D3", "Dax", Sex::Male, 2016, 5, 15, "Dita", 'D'},
    {"D4", "Dina", Sex::Female, 2018, 4, 20, "Dita", 'D'},
    {"M1", "Magnus", Sex::Male, 2005, 4, 15, "", 0},
    {"M2", "Otto", Sex::Male, 2010, 4, 15, "", 0},
    {"M3", "Rufus", Sex::Male, 2012, 4, 15, "", 0},
};

// Pronounceable invented names for animals born in the record.
std::string inventName(DemoRandom& rng, std::set<std::string>& used)
{
    static constexpr const char* onsets[] = {"B", "D", "F", "G", "H", "J", "K", "L", "M", "N",
                                             "P", "R", "S", "T", "V", "Z", "Ch", "Sh", "Th"};
    static constexpr const char* vowels[] = {"a", "e", "i", "o", "u", "ai", "ea"};
    static constexpr const char* codas[] = {"", "", "n", "l", "r", "s", "x", "m"};
    for (;;) {
        std::string n = onsets[rng.below(std::size(onsets))];
        n += vowels[rng.below(std::size(vowels))];
        n += onsets[rng.below(std::size(onsets))];
        n += vowels[rng.below(std::size(vowels))];
        n += codas[rng.below(std::size(codas))];
        // Lower-case every letter after the first (onsets such as "Sh" may sit mid-word).
        for (size_t i = 1; i < n.size(); ++i)
            if (n[i] >= 'A' && n[i] <= 'Z') n[i] = static_cast<char>(n[i] + 32);
        if (used.insert(n).second) return n;
    }
}

// Day a daughter rises above her elder sisters: between her third and fourth birthday.
Day riseDay(DemoRandom& rng, Day birth) { return anniversary(birth, 3) + rng.between(0, 364); }

// Birth day in a breeding season: mostly March-June, peaking in April; a few late births.
Day seasonalBirthDay(DemoRandom& rng, int year)
{
    if (rng.chance(0.9)) {
        const int span = ymd(year, 6, 30) - ymd(year, 3, 1);
        const int a = rng.between(0, span), b = rng.between(0, span);
        return ymd(year, 3, 1) + std::min(a, b) + (std::max(a, b) - std::min(a, b)) / 3;
    }
    return ymd(year, 7, 1) + rng.between(0, 76); // July to mid-September
}

// Fate of an animal born in the record: infant mortality, then small yearly hazards.
std::optional<Day> drawDeath(DemoRandom& rng, Day birth, Sex sex, Day recordEnd)
{
    if (rng.chance(0.14)) return birth + rng.between(2, 330);
    for (int age = 1;; ++age) {
        const Day from = anniversary(birth, age);
        if (from > recordEnd) return std::nullopt;
        const double hazard = age < 3 ? 0.03 : (sex == Sex::Male ? 0.04 : 0.015);
        if (rng.chance(hazard)) return from + rng.between(0, 364);
    }
}

} // namespace

std::vector<std::string> demoObservers() { return {"HK", "MO", "PS"}; }

DemoPopulation generateDemoPopulation(std::uint64_t seed)
{
    DemoRandom rng(splitMix64(seed ^ 0x50505050ULL));
    DemoPopulation pop;
    std::vector<DemoAnimal>& an = pop.animals;
    const Day start = toDay(demo::kRecordStart);
    const Day end = toDay(demo::kRecordEnd);
    std::set<std::string> usedNames;

    std::vector<std::string> keys;
    auto byKey = [&](const std::string& key) {
        return static_cast<int>(std::find(keys.begin(), keys.end(), key) - keys.begin());
    };
    for (const FounderSpec& f : kFounders) {
        DemoAnimal a;
        a.name = f.name;
        a.sex = f.sex;
        a.birth = ymd(f.year, f.month, f.day);
        a.entry = start;
        a.entryType = EntryType::Founder;
        a.line = f.line;
        a.mother = *f.mother ? byKey(f.mother) : -1;
        a.rise = anniversary(a.birth, 3) + 180;
        keys.emplace_back(f.key);
        usedNames.insert(a.name);
        if (a.mother >= 0) an[static_cast<size_t>(a.mother)].children.push_back(static_cast<int>(an.size()));
        an.push_back(std::move(a));
    }
    pop.matriarch[0] = byKey("Ada");
    pop.matriarch[1] = byKey("Bel");
    pop.matriarch[2] = byKey("Cora");
    pop.matriarch[3] = byKey("Dita");
    pop.founderMales = {byKey("M1"), byKey("M2"), byKey("M3")};

    // Scripted life events of founders: an old male and an old matriarch die,
    // one B-line female is removed for veterinary care.
    an[static_cast<size_t>(byKey("M1"))].exit = ymd(2021, 2, 11);
    an[static_cast<size_t>(byKey("M1"))].exitType = ExitType::Died;
    an[static_cast<size_t>(byKey("Bel"))].exit = ymd(2024, 8, 19);
    an[static_cast<size_t>(byKey("Bel"))].exitType = ExitType::Died;
    pop.removed = byKey("B2");
    an[static_cast<size_t>(pop.removed)].exit = toDay(demo::kRemoval);
    an[static_cast<size_t>(pop.removed)].exitType = ExitType::Removed;

    // The introduced female and two introduced adult males.
    auto addImmigrant = [&](const char* name, Sex sex, Day birth, Day entry, char line) {
        DemoAnimal a;
        a.name = name;
        a.sex = sex;
        a.birth = birth;
        a.entry = entry;
        a.entryType = EntryType::Introduced;
        a.line = line;
        a.rise = a.birth;
        usedNames.insert(a.name);
        an.push_back(std::move(a));
        return static_cast<int>(an.size()) - 1;
    };
    pop.introducedFemale = addImmigrant("Esme", Sex::Female, ymd(2014, 4, 15), toDay(demo::kIntroduction), 'E');
    pop.matriarch[4] = pop.introducedFemale;
    pop.introducedMales.push_back(addImmigrant("Tobias", Sex::Male, ymd(2013, 4, 15), ymd(2021, 10, 4), 0));
    pop.introducedMales.push_back(addImmigrant("Ivo", Sex::Male, ymd(2016, 4, 15), ymd(2023, 10, 16), 0));
    // Unrelated males by precedence: the old male leads until he dies, the
    // introduced males settle below the resident ones; M3 comes last and is
    // moved into the female order by a planted reversal below.
    pop.maleOrder = {byKey("M1"), byKey("M2"), pop.introducedMales[0], pop.introducedMales[1], byKey("M3")};

    // Planted persistent reversals (see demo_colony.h and demo-colony/README.md).
    pop.overrides = {
        {byKey("A4"), byKey("A2"), false, PlantedReversalKind::SiblingOrder,
         "A-line: a younger daughter never rises over her elder sister"},
        {byKey("D2"), byKey("Dita"), true, PlantedReversalKind::DaughterOverMother,
         "D-line: a daughter outranks her mother (and so also her younger sister once adult)"},
        {byKey("M3"), byKey("Ada"), false, PlantedReversalKind::MaleBelowFemale,
         "an adult male ranks just below the A-line matriarch"},
        {pop.introducedFemale, byKey("D1a"), true, PlantedReversalKind::CrossMatriline,
         "the introduced female ranks just above a low D-line female (and her descendants)"},
    };

    // Breeding seasons 2019-2025, year by year so every mother's fate is known.
    for (int year = demo::kRecordStart.year; year <= demo::kRecordEnd.year; ++year) {
        const size_t count = an.size();
        for (size_t m = 0; m < count; ++m) {
            if (an[m].sex != Sex::Female || an[m].line == 0) continue;
            const Day b = seasonalBirthDay(rng, year);
            const double u = rng.uniform();
            const Day conception = b - 165;
            const int age = ageInYears(an[m].birth, b);
            if (b < anniversary(an[m].birth, 3) + 182) continue; // too young to breed
            if (an[m].exit && *an[m].exit <= b) continue;          // dead or removed by then
            // Founders may be pregnant on day one; an introduced female conceives in the group.
            if (b <= an[m].entry || b > end) continue;
            if (an[m].entryType == EntryType::Introduced && conception < an[m].entry) continue;
            const double p = age < 5 ? 0.35 : (age < 20 ? 0.5 : 0.25);
            if (u >= p) continue;
            DemoAnimal baby;
            baby.sex = rng.chance(0.5) ? Sex::Female : Sex::Male;
            baby.birth = b;
            baby.entry = b;
            baby.entryType = EntryType::Born;
            baby.mother = static_cast<int>(m);
            baby.line = an[m].line;
            baby.rise = riseDay(rng, b);
            baby.name = inventName(rng, usedNames);
            baby.exit = drawDeath(rng, b, baby.sex, end);
            if (baby.exit) baby.exitType = ExitType::Died;
            // Father: an unrelated adult male resident at conception, the
            // leading males more often; a few fathers are not known.
            std::vector<int> sires;
            for (int male : pop.maleOrder)
                if (pop.resident(male, std::max(conception, start))) sires.push_back(male);
            if (!sires.empty() && !rng.chance(0.08)) {
                std::vector<double> w;
                for (size_t k = 0; k < sires.size(); ++k) w.push_back(k == 0 ? 3.0 : (k == 1 ? 2.0 : 1.0));
                baby.father = sires[rng.pick(w)];
            }
            an[m].children.push_back(static_cast<int>(an.size()));
            an.push_back(std::move(baby));
        }
    }

    // Row order: founders as listed, then everyone else by entry date.
    std::vector<int> order(an.size());
    std::iota(order.begin(), order.end(), 0);
    std::stable_sort(order.begin(), order.end(), [&](int a, int b) {
        return an[static_cast<size_t>(a)].entry < an[static_cast<size_t>(b)].entry;
    });
    std::vector<int> newIndex(an.size());
    for (size_t k = 0; k < order.size(); ++k) newIndex[static_cast<size_t>(order[k])] = static_cast<int>(k);
    auto remap = [&](int& i) {
        if (i >= 0) i = newIndex[static_cast<size_t>(i)];
    };
    std::vector<DemoAnimal> sorted;
    sorted.reserve(an.size());
    for (int i : order) sorted.push_back(std::move(an[static_cast<size_t>(i)]));
    for (size_t k = 0; k < sorted.size(); ++k) {
        DemoAnimal& a = sorted[k];
        remap(a.mother);
        remap(a.father);
        for (int& c : a.children) remap(c);
        const std::string number = std::to_string(k + 1);
        a.id = "NC" + std::string(number.size() < 3 ? 3 - number.size() : 0, '0') + number;
    }
    an = std::move(sorted);
    for (int& i : pop.matriarch) remap(i);
    for (int& i : pop.maleOrder) remap(i);
    for (int& i : pop.founderMales) remap(i);
    for (int& i : pop.introducedMales) remap(i);
    remap(pop.introducedFemale);
    remap(pop.removed);
    for (DemoOverride& o : pop.overrides) {
        remap(o.moved);
        remap(o.anchor);
    }
    return pop;
}

} // namespace hierloom::core
