// SPDX-License-Identifier: GPL-3.0-or-later
// Writes a generated breeding centre (tools/centre_generator.h) as a colony
// file through the store's bulk path, and optionally as the three import files:
//   make_centre OUT.hierloom [--groups N] [--animals-per-group N]
//               [--encounters N] [--years N] [--seed N] [--csv DIR]
#include "core/store/colony_csv_export.h"
#include "core/store/colony_store.h"
#include "core/store/record_appender.h"
#include "core/store/write_transaction.h"
#include "tools/centre_generator.h"

#include <chrono>
#include <cstdlib>
#include <filesystem>
#include <fstream>
#include <iostream>
#include <string>

using namespace hierloom;

namespace {

int usage()
{
    std::cerr << "usage: make_centre OUT.hierloom [--groups N] [--animals-per-group N] [--encounters N] "
                 "[--years N] [--seed N] [--csv DIR]\n";
    return 2;
}

bool wholeNumber(const char* text, long long& out)
{
    char* end = nullptr;
    out = std::strtoll(text, &end, 10);
    return end != text && *end == '\0' && out >= 0;
}

/// One encounters.csv row in the import format of docs/file-formats.md.
void writeEncounterRow(std::ostream& out, const core::Encounter& e)
{
    out << core::formatDate(e.date) << ',' << (e.time ? core::formatTimeOfDay(*e.time) : std::string()) << ','
        << e.winner << ',' << e.loser << ',' << core::toString(e.outcome) << ',' << e.behaviour << ',' << e.group
        << ',' << e.observer << ",\n";
}

} // namespace

int main(int argc, char** argv)
{
    if (argc < 2) return usage();
    tools::CentreSpec spec;
    std::string out, csvDir;
    for (int i = 1; i < argc; ++i) {
        const std::string arg = argv[i];
        if (arg.rfind("--", 0) != 0) {
            if (!out.empty()) return usage();
            out = arg;
            continue;
        }
        if (i + 1 >= argc) return usage();
        const char* value = argv[++i];
        long long n = 0;
        if (arg == "--csv") {
            csvDir = value;
            continue;
        }
        if (!wholeNumber(value, n)) {
            std::cerr << "make_centre: " << arg << " needs a whole number, not '" << value << "'\n";
            return 2;
        }
        if (arg == "--groups" && n >= 1 && n <= 99) spec.groups = static_cast<int>(n);
        else if (arg == "--animals-per-group" && n >= 10 && n <= 999) spec.animalsPerGroup = static_cast<int>(n);
        else if (arg == "--encounters") spec.encounters = n;
        else if (arg == "--years" && n >= 2 && n <= 60) spec.years = static_cast<int>(n);
        else if (arg == "--seed") spec.seed = static_cast<std::uint64_t>(n);
        else {
            std::cerr << "make_centre: " << arg << " " << value
                      << ": unknown option or out of range (groups 1-99, animals per group 10-999, years 2-60)\n";
            return 2;
        }
    }
    if (out.empty()) return usage();
    const auto t0 = std::chrono::steady_clock::now();
    tools::CentrePopulation population = tools::generateCentrePopulation(spec);
    std::ofstream csv;
    if (!csvDir.empty()) {
        std::filesystem::create_directories(csvDir);
        core::Colony people;
        people.animals = population.animals;
        people.residences = population.residences;
        std::ofstream a(std::filesystem::path(csvDir) / "animals.csv", std::ios::binary);
        core::writeAnimalsCsv(a, people);
        std::ofstream r(std::filesystem::path(csvDir) / "residences.csv", std::ios::binary);
        core::writeResidencesCsv(r, people);
        csv.open(std::filesystem::path(csvDir) / "encounters.csv", std::ios::binary);
        csv << "date,time,winner,loser,outcome,behaviour,group,observer,note\n";
    }
    long long written = 0;
    try {
        core::ColonyStore::create(out, [&](core::ColonyStore& store) {
            core::WriteTransaction tx(store, core::WriteTransaction::Size::CheckedBulk);
            core::insertAnimals(store, population.animals);
            core::insertResidences(store, population.residences);
            core::EncounterAppender appender(store, tx);
            tools::generateCentreEncounters(spec, population, [&](core::Encounter& e) {
                appender.add(e);
                if (csv.is_open()) writeEncounterRow(csv, e);
            });
            appender.finish("make_centre");
            written = appender.count();
            tx.commit();
        });
    } catch (const std::exception& e) {
        std::cerr << "make_centre: " << e.what() << "\n";
        return 1;
    }
    if (csv.is_open()) csv.close();
    if (!csvDir.empty() && csv.fail()) {
        std::cerr << "make_centre: cannot write the CSV files in " << csvDir << "\n";
        return 1;
    }
    const double s = std::chrono::duration<double>(std::chrono::steady_clock::now() - t0).count();
    std::cerr << "make_centre: " << spec.groups << " groups, " << population.animals.size() << " animals, " << written
              << " encounters over " << spec.years << " years (seed " << spec.seed << ") in " << out << ", "
              << std::filesystem::file_size(out) << " bytes, " << s << " s\n";
    return 0;
}
