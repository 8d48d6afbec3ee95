// SPDX-License-Identifier: GPL-3.0-or-later
// backup, check, restore, merge and history: keeping a colony file's records safe.
#include "cli/commands.h"

#include "core/store/colony_backup.h"
#include "core/store/colony_merge.h"
#include "core/store/colony_store.h"
#include "core/base/csv_writer.h"
#include "core/store/record_history.h"

#include <CLI/CLI.hpp>

#include <chrono>
#include <filesystem>
#include <ostream>
#include <sstream>

namespace hierloom::cli {

using namespace hierloom::core;

namespace {

/// Names each backup whose name carries a time later than now (a wrong clock).
void warnAboutFutureBackups(CommandContext& ctx, const std::string& colony)
{
    for (const BackupFile& b : listBackups(colony))
        if (b.future)
            ctx.err << "warning: " << b.path << " is named with a time in the future (a clock was wrong when it "
                    << "was taken); it is kept, listed last and not used to order or schedule backups\n";
}

} // namespace

void addBackupCommand(CLI::App& app, CommandContext& ctx, CommandAction& action)
{
    auto* cmd = app.add_subcommand("backup", "write a consistent copy of the colony file into NAME.hierloom-backups "
                                             "beside it, keeping the newest ones");
    struct Options {
        std::string colony;
        int keep = 0;
        double every = -1;
        bool list = false;
    };
    auto o = std::make_shared<Options>();
    cmd->add_option("COLONY_FILE", o->colony, "the colony file to back up")->required();
    cmd->add_option("--keep", o->keep, "keep this many backups from now on (stored in the file; default 10)")
        ->check(CLI::Range(1, 100000));
    cmd->add_option("--schedule", o->every,
                    "hours between automatic backups from now on (stored in the file; 0 turns them off; default 24)")
        ->check(CLI::Range(0.0, 100000.0));
    cmd->add_flag("--list", o->list, "list the backups, newest first, instead of taking one");
    cmd->callback([&ctx, &action, o] {
        action = [&ctx, o] {
            if (o->list) {
                std::ostringstream text;
                CsvWriter csv(text);
                csv.writeRow({"backup"});
                for (const BackupFile& b : listBackups(o->colony)) csv.writeRow({b.path});
                emit(ctx, text.str());
                warnAboutFutureBackups(ctx, o->colony);
                return;
            }
            const bool settings = o->keep > 0 || o->every >= 0;
            ColonyStore store =
                ColonyStore::open(o->colony, settings ? ColonyStore::Mode::ReadWrite : ColonyStore::Mode::ReadOnly);
            if (o->keep > 0) store.setSetting("backup_keep", std::to_string(o->keep));
            if (o->every >= 0) store.setSetting("backup_interval_hours", std::to_string(o->every));
            const int keep = std::stoi(store.setting("backup_keep", std::to_string(defaultBackupsKept)));
            const std::string path = backupColony(store, std::chrono::system_clock::now(), keep);
            ctx.out << path << "\n";
            ctx.err << "backed up " << o->colony << " to " << path << " (keeping the newest " << keep << ")\n";
            warnAboutFutureBackups(ctx, o->colony);
        };
    });
}

void addCheckCommand(CLI::App& app, CommandContext& ctx, CommandAction& action)
{
    auto* cmd = app.add_subcommand("check", "check the whole colony file for damage now (SQLite's integrity check), "
                                            "whatever an earlier check found");
    auto path = std::make_shared<std::string>();
    cmd->add_option("COLONY_FILE", *path, "the colony file to check (read only)")->required();
    cmd->callback([&ctx, &action, path] {
        action = [&ctx, path] {
            const ColonyStore store = ColonyStore::openVerified(*path);
            ctx.err << *path << ": intact (SQLite's integrity check of the whole file found no problem)\n";
        };
    });
}

void addRestoreCommand(CLI::App& app, CommandContext& ctx, CommandAction& action)
{
    auto* cmd = app.add_subcommand("restore", "put a backup's records back into the colony file (its present state "
                                              "is backed up first)");
    struct Options {
        std::string colony;
        std::string from;
        bool latest = false;
    };
    auto o = std::make_shared<Options>();
    cmd->add_option("COLONY_FILE", o->colony, "the colony file to restore")->required();
    auto* from = cmd->add_option("--from", o->from, "the backup file to restore");
    cmd->add_flag("--latest", o->latest, "restore the newest backup in NAME.hierloom-backups")->excludes(from);
    cmd->callback([&ctx, &action, o] {
        action = [&ctx, o] {
            std::string backup = o->from;
            if (o->latest) {
                const auto all = listBackups(o->colony);
                if (all.empty()) throw BadInputError("restore: no backups in " + backupFolder(o->colony));
                backup = all.front().path;
            }
            if (backup.empty()) throw BadInputError("restore: name the backup with --from FILE, or give --latest");
            restoreBackup(backup, o->colony, std::chrono::system_clock::now());
            ctx.err << "restored " << o->colony << " from " << backup << "\n";
        };
    });
}

void addMergeCommand(CLI::App& app, CommandContext& ctx, CommandAction& action)
{
    auto* cmd = app.add_subcommand("merge", "bring another colony file's records into this one, all or nothing; "
                                            "lists what was added and any conflicting edits");
    struct Options {
        std::string colony;
        std::string other;
        std::string prefer;
        bool dryRun = false;
    };
    auto o = std::make_shared<Options>();
    cmd->add_option("COLONY_FILE", o->colony, "the colony file to add to")->required();
    cmd->add_option("--from", o->other, "the other colony file (read only)")->required();
    cmd->add_option("--prefer", o->prefer, "settle conflicting edits with this file's version (ours) or the other's (theirs)")
        ->check(CLI::IsMember({"ours", "theirs"}));
    cmd->add_flag("--dry-run", o->dryRun, "check and report, write nothing");
    cmd->callback([&ctx, &action, o] {
        action = [&ctx, o] {
            std::error_code ec;
            if (std::filesystem::equivalent(o->colony, o->other, ec))
                throw BadInputError("merge: --from names the colony file itself");
            const ColonyStore other = ColonyStore::open(o->other, ColonyStore::Mode::ReadOnly);
            ColonyStore store = ColonyStore::open(o->colony);
            MergeOptions options;
            options.prefer = o->prefer == "ours"     ? MergePreference::Ours
                             : o->prefer == "theirs" ? MergePreference::Theirs
                                                     : MergePreference::None;
            options.dryRun = o->dryRun;
            options.today = today();
            const MergeReport r = mergeColonies(store, other, options);
            std::ostringstream text;
            CsvWriter csv(text);
            csv.writeRow({"action", "table", "uid", "record", "detail"});
            // One row per conflicting field, with both values (and the common one when known).
            for (const MergeConflict& c : r.conflicts)
                for (const FieldConflict& f : c.fields)
                    csv.writeRow({"conflict", c.table, c.uid, c.record,
                                  f.field + ": '" + f.ours + "' here, '" + f.theirs + "' in the other file" +
                                      (f.base ? ", '" + *f.base + "' before" : std::string())});
            for (const Animal& a : r.addedAnimals) csv.writeRow({"added", "animal", a.uid, "animal " + a.id, ""});
            for (const Residence& x : r.addedResidences)
                csv.writeRow({"added", "residence", x.uid, x.animal + " in " + x.group + " from " + formatDate(x.from), ""});
            for (const Encounter& e : r.addedEncounters)
                csv.writeRow({"added", "encounter", e.uid, formatDate(e.date) + " " + e.winner + " " + e.loser,
                              "seq " + std::to_string(e.seq)});
            for (const MergeChange& c : r.updated) csv.writeRow({"updated", c.table, c.uid, c.record, c.detail});
            for (const MergeChange& c : r.deleted) csv.writeRow({"deleted", c.table, c.uid, c.record, c.detail});
            for (const MergeChange& c : r.keptDeleted)
                csv.writeRow({"kept deleted", c.table, c.uid, c.record, c.detail});
            for (const MergeChange& c : r.matched) csv.writeRow({"matched", c.table, c.uid, c.record, c.detail});
            for (const std::string& t : r.takenFromOther) csv.writeRow({"taken from other", "", "", t, ""});
            emit(ctx, text.str());
            if (!r.conflicts.empty())
                throw BadInputError("nothing was merged: " + std::to_string(r.conflicts.size()) +
                                    " records were edited differently in the two files (listed); decide with "
                                    "--prefer ours or --prefer theirs");
            if (!r.problems.empty()) {
                ctx.err << r.problems.text();
                throw BadInputError("nothing was merged; " + o->colony + " is unchanged");
            }
            if (!r.backup.empty()) ctx.err << "backed up " << o->colony << " into " << r.backup << "\n";
            ctx.err << (r.written ? "merged: added " : o->dryRun ? "dry run: would add " : "nothing to merge: added ")
                    << r.addedAnimals.size() << " animals, " << r.addedResidences.size() << " residences, "
                    << r.addedEncounters.size() << " encounters; " << (o->dryRun ? "would update " : "updated ")
                    << r.updated.size() << " and " << (o->dryRun ? "would delete " : "deleted ") << r.deleted.size()
                    << " records; skipped " << r.skippedAnimals << " animals, " << r.skippedResidences
                    << " residences, " << r.skippedEncounters << " encounters already here";
            if (!r.keptDeleted.empty()) ctx.err << "; " << r.keptDeleted.size() << " records stay deleted";
            if (!r.matched.empty())
                ctx.err << "; " << r.matched.size() << " records recognised by content under another uid";
            if (!r.takenFromOther.empty()) ctx.err << "; took " << r.takenFromOther.size() << " records from the other file";
            ctx.err << "\n";
        };
    });
}

void addHistoryCommand(CLI::App& app, CommandContext& ctx, CommandAction& action)
{
    auto* cmd = app.add_subcommand("history", "list who changed a record and when (the audit trail)");
    struct Options {
        std::string colony;
        std::string uid;
        std::string animal;
    };
    auto o = std::make_shared<Options>();
    cmd->add_option("COLONY_FILE", o->colony, "the colony file to read")->required();
    auto* uid = cmd->add_option("--uid", o->uid, "the record's uid (any animal, residence or encounter)");
    cmd->add_option("--animal", o->animal, "an animal id instead of a uid")->excludes(uid);
    cmd->add_option("--out", ctx.outFile, "write the CSV to FILE instead of standard output");
    cmd->callback([&ctx, &action, o] {
        action = [&ctx, o] {
            if (o->uid.empty() && o->animal.empty()) throw BadInputError("history: give --uid UID or --animal ID");
            const ColonyStore store = ColonyStore::open(o->colony, ColonyStore::Mode::ReadOnly);
            std::string uid = o->uid;
            if (!o->animal.empty()) {
                const auto found = animalUid(store, o->animal);
                if (!found) throw BadInputError("history: no animal '" + o->animal + "' in " + o->colony);
                uid = *found;
            }
            std::ostringstream text;
            CsvWriter csv(text);
            csv.writeRow({"time", "user", "table", "uid", "action", "old_values", "new_values"});
            for (const AuditEntry& e : recordHistory(store, uid))
                csv.writeRow({e.time, e.user, e.table, e.uid, e.action, e.oldValues, e.newValues});
            emit(ctx, text.str());
        };
    });
}

} // namespace hierloom::cli
