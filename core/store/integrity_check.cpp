// SPDX-License-Identifier: GPL-3.0-or-later
#include "core/store/integrity_check.h"

#include "core/base/colony_file_error.h"
#include "core/store/check_cache.h"
#include "core/store/colony_backup.h"

#include <sqlite3.h>

#include <chrono>

namespace hierloom::core {

namespace {

std::int64_t nowNs()
{
    return std::chrono::duration_cast<std::chrono::nanoseconds>(std::chrono::system_clock::now().time_since_epoch())
        .count();
}

/// The first problem `pragma` finds, or an empty string.
std::string checkProblem(sqlite3* db, const char* pragma)
{
    // One problem is enough to refuse; stopping there keeps a badly damaged
    // file from being walked to the end.
    sqlite3_stmt* q = nullptr;
    int rc = sqlite3_prepare_v2(db, pragma, -1, &q, nullptr);
    std::string answer;
    if (rc == SQLITE_OK) {
        rc = sqlite3_step(q);
        if (rc == SQLITE_ROW) {
            const auto* text = sqlite3_column_text(q, 0);
            answer = text ? reinterpret_cast<const char*>(text) : "";
        }
    }
    if (rc != SQLITE_ROW && rc != SQLITE_DONE && rc != SQLITE_OK) answer = sqlite3_errstr(rc);
    sqlite3_finalize(q);
    if ((rc & 0xFF) == SQLITE_BUSY || (rc & 0xFF) == SQLITE_LOCKED)
        throw ColonyFileError(ColonyFileError::Kind::Busy, std::string("the check waited too long for another program"));
    if (answer == "ok") return {};
    if (answer.empty()) answer = "no answer from the check";
    // A line of SQLite's own wording is enough to recognise the damage.
    if (const auto nl = answer.find('\n'); nl != std::string::npos) answer.resize(nl);
    if (answer.size() > 120) answer = answer.substr(0, 117) + "...";
    return answer;
}

void refuseDamaged(const std::string& path, const std::string& problem)
{
    const std::string backup = newestGoodBackup(path);
    throw ColonyFileError(ColonyFileError::Kind::Damaged,
                          path + ": is damaged (" + problem + "); nothing was read or changed. " +
                              (backup.empty() ? std::string("No good backup was found beside it.")
                                              : "The newest good backup is " + backup +
                                                    " (hierloom-cli restore " + path + " --from " + backup + ")"));
}

/// Runs `pragma` over the whole file; refuses a damaged file (forgetting it)
/// and records a pass when the file held still during the check.
void checkAndRecord(sqlite3* db, const std::string& path, const char* pragma, const CheckCache& cache)
{
    const auto before = colonyFileState(path);
    const std::int64_t startedNs = nowNs();
    const std::string problem = checkProblem(db, pragma);
    if (!problem.empty()) {
        cache.forget(path);
        refuseDamaged(path, problem);
    }
    const auto after = colonyFileState(path);
    if (before && after && *before == *after && settledBefore(*before, startedNs))
        cache.record(path, *before, startedNs / 1'000'000'000);
}

} // namespace

std::string quickCheckProblem(sqlite3* db) { return checkProblem(db, "PRAGMA quick_check(1)"); }

std::string newestGoodBackup(const std::string& colonyPath)
{
    for (const BackupFile& b : listBackups(colonyPath)) {
        sqlite3* db = nullptr;
        bool good = false;
        if (sqlite3_open_v2(b.path.c_str(), &db, SQLITE_OPEN_READONLY, nullptr) == SQLITE_OK) {
            try {
                good = quickCheckProblem(db).empty();
            } catch (const ColonyFileError&) {
                good = false;
            }
        }
        sqlite3_close(db);
        if (good) return b.path;
    }
    return {};
}

void requireIntact(sqlite3* db, const std::string& path)
{
    const std::string problem = quickCheckProblem(db);
    if (!problem.empty()) refuseDamaged(path, problem);
}

void requireIntactOnce(sqlite3* db, const std::string& path)
{
    if (!checkVouchedFor(path)) checkAndRecord(db, path, "PRAGMA quick_check(1)", CheckCache::fromEnvironment());
}

bool checkVouchedFor(const std::string& path)
{
    const auto state = colonyFileState(path);
    return state && CheckCache::fromEnvironment().vouchesFor(path, *state, nowNs() / 1'000'000'000);
}

std::optional<ColonyFileState> requireIntactBeforeWrite(sqlite3* db, const std::string& path, bool checkedAlready)
{
    const CheckCache cache = CheckCache::fromEnvironment();
    const auto state = colonyFileState(path);
    if (state && cache.vouchesFor(path, *state, nowNs() / 1'000'000'000)) return state;
    if (!checkedAlready) {
        const std::string problem = quickCheckProblem(db);
        if (!problem.empty()) {
            cache.forget(path);
            refuseDamaged(path, problem);
        }
    }
    // The file changed in a way this program cannot vouch for (or was never
    // checked): after this write the next open checks it.
    cache.forget(path);
    return std::nullopt;
}

bool carryCheckOver(const std::string& path, const ColonyFileState& before, const ColonyFileState& after)
{
    return CheckCache::fromEnvironment().carryOver(path, before, after, nowNs() / 1'000'000'000);
}

void requireIntactFully(sqlite3* db, const std::string& path)
{
    checkAndRecord(db, path, "PRAGMA integrity_check(1)", CheckCache::fromEnvironment());
}

} // namespace hierloom::core
