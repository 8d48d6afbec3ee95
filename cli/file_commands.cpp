// SPDX-License-Identifier: GPL-3.0-or-later
// init, import, export and demo: the commands that move records in and out.
#include "cli/commands.h"

#include "core/store/colony_backup.h"
#include "core/store/colony_csv_export.h"
#include "core/store/colony_import.h"
#include "core/store/colony_schema.h"
#include "core/store/colony_store.h"
#include "core/base/csv_reader.h"
#include "core/store/saved_mappings.h"
#include "core/store/sheet_import.h"
#include "core/demo/demo_colony_file.h"

#include <CLI/CLI.hpp>

#include <chrono>
#include <filesystem>
#include <fstream>
#include <ostream>
#include <sstream>

namespace hierloom::cli {

using namespace hierloom::core;

namespace {

/// What a refused import says of the colony file. Its records are always as
/// they were; a file of an older version was updated by the open for writing
/// (as every such open does) and its old form kept beside it, which the
/// message says instead of "unchanged".
std::string nothingImported(const std::string& colony, int versionBefore)
{
    if (versionBefore >= currentSchemaVersion) return "nothing was imported; " + colony + " is unchanged";
    return "nothing was imported; the records of " + colony + " are unchanged (the file was first updated from file "
           "version " + std::to_string(versionBefore) + " to " + std::to_string(currentSchemaVersion) +
           "; the file as it was is kept as " + colony + ".v" + std::to_string(versionBefore) + ".bak)";
}

} // namespace

void addInitCommand(CLI::App& app, CommandContext& ctx, CommandAction& action)
{
    auto* cmd = app.add_subcommand("init", "create an empty colony file");
    auto path = std::make_shared<std::string>();
    cmd->add_option("COLONY_FILE", *path, "the colony file to create (.hierloom)")->required();
    cmd->callback([&ctx, &action, path] {
        action = [&ctx, path] {
            ColonyStore::create(*path);
            ctx.err << "created " << *path << "\n";
        };
    });
}

void addImportCommand(CLI::App& app, CommandContext& ctx, CommandAction& action)
{
    auto* cmd = app.add_subcommand("import", "add animals, residences and encounters from CSV files, all or nothing");
    struct Options {
        std::string colony;
        ImportPaths paths;
        std::string mapping;
        std::string savedMapping;
        std::string saveAs;
        std::string dates;
    };
    auto o = std::make_shared<Options>();
    cmd->add_option("COLONY_FILE", o->colony, "the colony file to add to")->required();
    cmd->add_option("--animals", o->paths.animals, "animals.csv (id, sex, birth_date, mother, ...)");
    cmd->add_option("--residences", o->paths.residences,
                    "residences.csv (animal, group, from, to); without it new animals live in group 'main'");
    cmd->add_option("--encounters", o->paths.encounters,
                    "encounters.csv (date, time, winner, loser, ...); with --mapping, the team's own sheet (CSV or TSV), "
                    "whose names may be animals of --animals");
    cmd->add_option("--mapping", o->mapping,
                    "an import mapping file (docs/file-formats.md) saying what the --encounters sheet's columns mean "
                    "(default: none, the plain columns)");
    cmd->add_option("--saved-mapping", o->savedMapping,
                    "use the import mapping saved in the colony file under this name (default: none)");
    cmd->add_option("--save-mapping", o->saveAs,
                    "save the --mapping file in the colony file under this name, in the import's own transaction "
                    "(saved only when the import succeeds; default: not saved)");
    cmd->add_option("--dates", o->dates, "the sheet's date order, overriding the mapping's: iso, day-month-year or "
                                         "month-day-year (default: the mapping's)")
        ->check(CLI::IsMember({"iso", "day-month-year", "month-day-year"}));
    cmd->callback([&ctx, &action, o] {
        action = [&ctx, o] {
            const bool mapped = !o->mapping.empty() || !o->savedMapping.empty();
            if (o->paths.animals.empty() && o->paths.residences.empty() && o->paths.encounters.empty())
                throw BadInputError("import: name at least one of --animals, --residences, --encounters");
            if (!o->mapping.empty() && !o->savedMapping.empty())
                throw BadInputError("import: give --mapping or --saved-mapping, not both");
            if (mapped && o->paths.encounters.empty())
                throw BadInputError("import: a mapping reads one sheet, given as --encounters");
            if (!mapped && (!o->dates.empty() || !o->saveAs.empty()))
                throw BadInputError("import: --dates and --save-mapping need --mapping");
            if (!o->saveAs.empty() && o->mapping.empty())
                throw BadInputError("import: --save-mapping saves a --mapping file");
            const int versionBefore = probeColonyFile(o->colony);
            ColonyStore store = ColonyStore::open(o->colony);
            ImportMapping mapping;
            std::string mappingText;
            if (mapped) {
                std::string name = o->mapping;
                if (!o->mapping.empty()) {
                    try {
                        mappingText = readWholeFile(o->mapping);
                    } catch (const std::exception&) {
                        throw BadInputError(o->mapping + ": cannot be read (no such file, or no permission to read it)");
                    }
                } else {
                    const auto text = savedMappingText(store, o->savedMapping);
                    if (!text) {
                        std::string names;
                        for (const std::string& n : savedMappingNames(store)) names += (names.empty() ? "" : ", ") + n;
                        throw BadInputError("import: " + o->colony + " holds no mapping named '" + o->savedMapping +
                                            "' (saved: " + (names.empty() ? std::string("none") : names) + ")");
                    }
                    mappingText = *text;
                    name = o->colony + " (mapping '" + o->savedMapping + "')";
                }
                MappingFile file = readMappingFile(name, mappingText);
                if (!file.ok()) {
                    ctx.err << file.problems.text();
                    throw BadInputError(nothingImported(o->colony, versionBefore));
                }
                mapping = std::move(file.mapping);
                if (!o->dates.empty()) mapping.dates = *parseDateOrder(o->dates);
            }
            // The scheduled backup (backup_interval_hours) is taken before the file changes.
            if (backupIfDue(store, std::chrono::system_clock::now()))
                ctx.err << "backed up " << o->colony << " into " << backupFolder(o->colony) << "\n";
            ImportResult result;
            if (mapped) {
                SheetImportRequest request;
                request.mapping = mapping;
                auto read = [&](const std::string& path, auto& slot) {
                    if (path.empty()) return;
                    try {
                        slot = {path, readWholeFile(path)};
                    } catch (const std::exception&) {
                        result.problems.add(path, 0, "", "cannot be read (no such file, or no permission to read it)");
                    }
                };
                read(o->paths.animals, request.files.animals);
                read(o->paths.residences, request.files.residences);
                read(o->paths.encounters, request.sheet);
                if (!o->saveAs.empty()) request.save = MappingToSave{o->saveAs, mappingText};
                if (result.ok()) result = importSheet(store, request, today());
            } else {
                result = importFiles(store, o->paths, today());
            }
            if (!result.ok()) {
                ctx.err << result.problems.text();
                throw BadInputError(nothingImported(o->colony, versionBefore));
            }
            if (!o->saveAs.empty()) ctx.err << "saved the mapping as '" << o->saveAs << "' in " << o->colony << "\n";
            ctx.err << "imported " << result.animals << " animals, " << result.residences
                    << " residences, " << result.encounters << " encounters into " << o->colony << "\n";
        };
    });
}

void addExportCommand(CLI::App& app, CommandContext& ctx, CommandAction& action)
{
    auto* cmd = app.add_subcommand("export", "write the colony as animals.csv, residences.csv and encounters.csv");
    struct Options {
        std::string colony;
        std::string dir = ".";
    };
    auto o = std::make_shared<Options>();
    cmd->add_option("COLONY_FILE", o->colony, "the colony file to read")->required();
    cmd->add_option("--dir", o->dir, "folder to write the three files into (default: the current folder)");
    cmd->callback([&ctx, &action, o] {
        action = [&ctx, o] {
            const ColonyStore store = ColonyStore::open(o->colony, ColonyStore::Mode::ReadOnly);
            const Colony colony = store.load();
            std::error_code ec;
            std::filesystem::create_directories(o->dir, ec);
            if (ec) throw BadInputError("--dir: cannot create " + o->dir + ": " + ec.message());
            // All three or none: written beside their names first, renamed together.
            std::vector<std::pair<std::string, std::string>> files;
            auto add = [&](const char* name, void (*writer)(std::ostream&, const Colony&)) {
                std::ostringstream text;
                writer(text, colony);
                files.emplace_back((std::filesystem::path(o->dir) / name).string(), text.str());
            };
            add("animals.csv", writeAnimalsCsv);
            add("residences.csv", writeResidencesCsv);
            add("encounters.csv", writeEncountersCsv);
            writeFilesTogether(files);
            ctx.err << "wrote " << colony.animals.size() << " animals, " << colony.residences.size()
                    << " residences, " << colony.encounters.size() << " encounters to " << o->dir << "\n";
        };
    });
}

void addDemoCommand(CLI::App& app, CommandContext& ctx, CommandAction& action)
{
    auto* cmd = app.add_subcommand("demo", "write the bundled demo colony (an invented macaque group) into a new colony file");
    auto path = std::make_shared<std::string>();
    cmd->add_option("COLONY_FILE", *path, "the colony file to create")->required();
    cmd->callback([&ctx, &action, path] {
        action = [&ctx, path] {
            const ColonyStore store = createDemoColonyFile(*path);
            ctx.err << "wrote the demo colony (" << store.loadAnimals().size() << " animals, "
                    << store.encounterCount() << " encounters) to " << *path << "\n";
        };
    });
}

} // namespace hierloom::cli
