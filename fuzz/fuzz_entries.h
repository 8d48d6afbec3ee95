// SPDX-License-Identifier: GPL-3.0-or-later
#pragma once
// The functions each fuzz target feeds its bytes to. Header-only, so that the
// GoogleTest replay of tests/fuzz-regressions/ runs exactly the same code in
// the normal test suite. Each returns false when an invariant of its parser's
// result is broken (the fuzz targets turn that into a crash).
#include "core/store/colony_import.h"
#include "core/planning/scenario_file.h"

#include <string>
#include <string_view>
#include <unordered_set>

namespace hierloom::fuzz {

/// A small fixed colony: two groups, a mother and daughter, a male, an animal that died.
inline const core::Colony& fixedColony()
{
    static const core::Colony colony = [] {
        using namespace hierloom::core;
        Colony c;
        auto day = [](const char* t) { return *parseDate(t); };
        auto animal = [&](const char* id, Sex sex, const char* birth, const char* mother, const char* uid) {
            Animal a;
            a.id = id;
            a.sex = sex;
            a.birth = day(birth);
            a.entry = day(birth);
            a.entryType = *mother ? EntryType::Born : EntryType::Founder;
            a.mother = mother;
            a.uid = uid;
            return a;
        };
        c.animals = {animal("F1", Sex::Female, "2000-01-01", "", "00000000-0000-4000-8000-000000000001"),
                     animal("M1", Sex::Male, "2001-03-01", "", "00000000-0000-4000-8000-000000000002"),
                     animal("F2", Sex::Female, "2005-06-01", "F1", "00000000-0000-4000-8000-000000000003"),
                     animal("X1", Sex::Female, "2002-02-02", "", "00000000-0000-4000-8000-000000000004")};
        c.animals[3].exit = day("2010-05-05");
        c.animals[3].exitType = ExitType::Died;
        c.residences = {{"F1", "main", day("2000-01-01"), std::nullopt, "00000000-0000-4000-8000-000000000011"},
                        {"M1", "main", day("2001-03-01"), std::nullopt, "00000000-0000-4000-8000-000000000012"},
                        {"F2", "main", day("2005-06-01"), std::nullopt, "00000000-0000-4000-8000-000000000013"},
                        {"X1", "north", day("2002-02-02"), day("2010-05-05"), "00000000-0000-4000-8000-000000000014"}};
        for (int i = 0; i < 6; ++i) {
            Encounter e;
            e.date = day("2012-01-01") + i;
            e.winner = i % 2 ? "F1" : "M1";
            e.loser = i % 3 ? "F2" : (i % 2 ? "M1" : "F1");
            if (e.winner == e.loser) e.loser = "F2";
            e.group = "main";
            e.seq = i + 1;
            e.uid = "00000000-0000-4000-8000-00000000002" + std::to_string(i);
            c.encounters.push_back(e);
        }
        c.reindex();
        return c;
    }();
    return colony;
}

/// The day the fuzzed imports take as today (dates after it are refused).
inline core::Day fuzzToday() { return *core::parseDate("2024-01-01"); }

/// A refused plan carries no records; an accepted one has sane records.
inline bool planInvariantsHold(const core::ImportPlan& plan)
{
    if (!plan.ok()) return plan.animals.empty() && plan.residences.empty() && plan.encounters.empty();
    for (const auto& e : plan.encounters)
        if (e.winner == e.loser || e.date > fuzzToday()) return false;
    for (const auto& r : plan.residences)
        if (r.to && *r.to < r.from) return false;
    for (const auto& a : plan.animals)
        if (!core::isValidAnimalId(a.id)) return false;
    return true;
}

enum class ImportFile { Animals, Residences, Encounters };

/// Plans an import of `bytes` as one import file against the fixed colony.
inline bool fuzzImportFile(ImportFile which, std::string_view bytes)
{
    const core::Colony& c = fixedColony();
    core::ImportInput input;
    core::ImportSource src{"fuzz.csv", std::string(bytes)};
    if (which == ImportFile::Animals) input.animals = src;
    if (which == ImportFile::Residences) input.residences = src;
    if (which == ImportFile::Encounters) input.encounters = src;
    std::unordered_set<std::string> uids;
    for (const auto& e : c.encounters) uids.insert(e.uid);
    const core::ImportPlan plan = core::planImport(c.animals, c.residences, input, fuzzToday(), uids);
    return planInvariantsHold(plan) && !plan.problems.text().empty() == !plan.ok();
}

/// Parses `bytes` as a scenario file against the fixed colony.
inline bool fuzzScenarioFile(std::string_view bytes)
{
    const core::ScenarioFileResult r = core::parseScenarioText(bytes, "fuzz.scenario", fixedColony());
    return r.scenario.has_value() == r.errors.empty();
}

/// Runs the entry function of a fuzz target by its name (fuzz_<name>).
inline bool fuzzEntry(const std::string& target, std::string_view bytes)
{
    if (target == "import_animals") return fuzzImportFile(ImportFile::Animals, bytes);
    if (target == "import_residences") return fuzzImportFile(ImportFile::Residences, bytes);
    if (target == "import_encounters") return fuzzImportFile(ImportFile::Encounters, bytes);
    if (target == "scenario_file") return fuzzScenarioFile(bytes);
    return false;
}

} // namespace hierloom::fuzz
