// SPDX-License-Identifier: GPL-3.0-or-later
// Writes the bundled demo colony as the three import files into a directory:
//   make_demo_colony DIR [SEED]
#include "core/store/colony_csv_export.h"
#include "core/demo/demo_colony.h"

#include <cstdint>
#include <cstdlib>
#include <filesystem>
#include <fstream>
#include <iostream>
#include <string>

int main(int argc, char** argv)
{
    using namespace hierloom::core;
    if (argc < 2 || argc > 3) {
        std::cerr << "usage: make_demo_colony DIR [SEED]\n";
        return 2;
    }
    std::uint64_t seed = demo::kDefaultSeed;
    if (argc == 3) {
        char* end = nullptr;
        seed = std::strtoull(argv[2], &end, 10);
        if (end == argv[2] || *end != '\0') {
            std::cerr << "make_demo_colony: SEED must be a whole number\n";
            return 2;
        }
    }
    const std::filesystem::path dir(argv[1]);
    std::error_code ec;
    std::filesystem::create_directories(dir, ec);
    const Colony colony = generateDemoColony(seed);
    struct File {
        const char* name;
        void (*write)(std::ostream&, const Colony&);
    };
    for (const File& f : {File{"animals.csv", writeAnimalsCsv}, File{"residences.csv", writeResidencesCsv},
                          File{"encounters.csv", writeEncountersCsv}}) {
        std::ofstream out(dir / f.name, std::ios::binary);
        f.write(out, colony);
        out.flush();
        if (!out) {
            std::cerr << "make_demo_colony: cannot write " << (dir / f.name).string() << "\n";
            return 1;
        }
    }
    std::cerr << "wrote " << colony.animals.size() << " animals and " << colony.encounters.size()
              << " encounters to " << dir.string() << "\n";
    return 0;
}
