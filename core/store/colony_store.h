// SPDX-License-Identifier: GPL-3.0-or-later
#pragma once
#include "core/base/colony.h"
#include "core/base/colony_file_error.h"
#include "core/base/encounter_records.h"
#include "core/store/check_cache.h"

#include <cstdint>
#include <functional>
#include <optional>
#include <utility>
#include <string>
#include <unordered_set>
#include <vector>

struct sqlite3;

namespace hierloom::core {

/// Which encounters a question needs: those that may belong to `group` (its
/// own rows, and rows without a group whose winner ever lived in it; empty:
/// every group) dated within [from, to]. A superset of what the selection of
/// docs/methods.md keeps, read through the encounter_by_group index.
struct EncounterScope {
    std::string group;
    std::optional<Day> from;
    std::optional<Day> to;
    /// false: every uid is left empty (analyses never read them; at millions
    /// of encounters the 36-character texts are a sixth of the memory).
    bool uids = true;

    bool everything() const { return group.empty() && !from && !to; }
};

/// A colony file: one SQLite database (WAL journal, foreign keys on) holding
/// the animals, residences, encounters, observers, behaviour codes and
/// settings. Every write runs in one transaction, so a write is whole or absent.
/// A store may move between threads but is used by one thread at a time.
class ColonyStore {
public:
    /// Above this many encounters a write is a bulk load (see WriteTransaction).
    static constexpr std::size_t kBulkEncounters = 10000;

    enum class Mode { ReadOnly, ReadWrite };

    /// Creates a new colony file; fails if the path exists. The file is built
    /// under a partial name beside `path` (the schema, then `fill`), closed and
    /// only then renamed to `path`, so a killed program leaves nothing at
    /// `path`; abandoned partial files of earlier runs are removed.
    static ColonyStore create(const std::string& path, const std::function<void(ColonyStore&)>& fill = {});
    /// Opens an existing colony file, migrating an older schema (ReadWrite only).
    /// ReadWrite refuses (ColonyFileError::Kind::ReadOnly) a file or folder
    /// this program may not write. ReadOnly opens the file read-only, and with
    /// SQLite's `immutable` flag when its folder is not writable (no -shm or
    /// -wal file is needed then). Both refuse a -wal file written for another
    /// file (checkWalBelongs) and a file failing `PRAGMA quick_check`; ReadOnly
    /// skips that check when the file is unchanged since it last passed
    /// (requireIntactOnce, integrity_check.h).
    static ColonyStore open(const std::string& path, Mode mode = Mode::ReadWrite);
    /// Opens read-only like open(), running SQLite's full `PRAGMA
    /// integrity_check` whatever an earlier check found (requireIntactFully).
    static ColonyStore openVerified(const std::string& path);
    /// Opens read-only like open() but without the whole-file check, for a
    /// caller that runs that check on a connection of its own meanwhile
    /// (BackgroundCheck, background_check.h) and shows or writes nothing read
    /// here before it has passed.
    static ColonyStore openCheckedElsewhere(const std::string& path);

    ColonyStore(ColonyStore&& other) noexcept;
    ColonyStore& operator=(ColonyStore&& other) noexcept;
    ColonyStore(const ColonyStore&) = delete;
    ColonyStore& operator=(const ColonyStore&) = delete;
    ~ColonyStore();

    const std::string& path() const { return path_; }
    int schemaVersion() const;
    /// SQLite's `PRAGMA data_version` of this connection: it changes when
    /// another connection (another program, another window) has committed a
    /// change to the file since it was last asked, and never for this
    /// connection's own writes. Equal values mean nobody else wrote.
    std::int64_t dataVersion() const;

    std::vector<Animal> loadAnimals() const;
    std::vector<Residence> loadResidences() const;
    /// Encounters in entry order (seq ascending).
    std::vector<Encounter> loadEncounters() const;
    /// The encounters of a scope, in entry order (seq ascending).
    std::vector<Encounter> loadEncounters(const EncounterScope& scope) const;
    /// The encounters whose seq lies in [first, last], in entry order, WITHOUT
    /// their supporters: a whole file read in parts along its primary key (no
    /// sort, no scope), then loadSupporters once over all the parts (a read of
    /// the supporters costs the whole support table, whatever the part).
    std::vector<Encounter> loadEncounterRangeWithoutSupporters(std::int64_t first, std::int64_t last) const;
    /// Fills the supporters of `encounters` (in seq order, none yet): one pass over the file's supporters.
    void loadSupporters(std::vector<Encounter>& encounters) const;
    /// The same for compact records (in seq order, no supporters yet).
    void loadSupporters(EncounterRecords& records) const;
    /// The lowest and the highest seq of the file's encounters; none when it has none.
    std::optional<std::pair<std::int64_t, std::int64_t>> encounterSeqRange() const;
    /// The date of the file's latest encounter (every group), if any.
    std::optional<Day> lastEncounterDay() const;
    /// Everything: animals, residences and encounters.
    Colony load() const;
    std::int64_t encounterCount() const;
    /// Uids of every encounter (for checking a re-imported export).
    std::unordered_set<std::string> encounterUids() const;

    /// Appends validated records in one transaction; new uids are assigned
    /// to records without one (written back) and encounters get consecutive
    /// seq numbers (written back).
    /// Inside a transaction already open on this connection it runs as a
    /// savepoint of that transaction. A bulk append (more than
    /// kBulkEncounters encounters) is audited as one 'import' row naming
    /// `source` and the seq range instead of one row per encounter.
    void append(std::vector<Animal>& animals, std::vector<Residence>& residences, std::vector<Encounter>& encounters,
                const std::string& source = {});
    void append(std::vector<Animal>&& animals, std::vector<Residence>&& residences, std::vector<Encounter>&& encounters,
                const std::string& source = {})
    {
        append(animals, residences, encounters, source);
    }

    /// Observers and behaviour codes kept in the file.
    std::vector<std::string> observers() const;
    void addObserver(const std::string& name);
    struct BehaviourCode {
        std::string code;
        int severity = 1;
        std::string description;
    };
    std::vector<BehaviourCode> behaviourCodes() const;

    /// Key-value settings (species, gestation length, maturity age, ...).
    std::string setting(const std::string& key, const std::string& fallback = {}) const;
    void setSetting(const std::string& key, const std::string& value);

    /// The name stamped on audit rows of this connection's changes (default:
    /// the USER environment variable, else "unknown").
    void setUserName(const std::string& name);
    std::string userName() const;

    /// How long a write waits for another program's write to finish before
    /// failing with ColonyFileError::Kind::Busy (default 5000 ms).
    void setBusyTimeout(int milliseconds);

    /// The raw handle, for the few store modules (edits, backups, merges).
    sqlite3* handle() const { return db_; }

    /// Runs `sql` (no results) or throws ColonyFileError naming the file.
    void exec(const char* sql) const;

    /// Called by WriteTransaction when it begins, under the write lock: runs
    /// `PRAGMA quick_check` unless it passed on this connection and no other
    /// connection has committed since (`PRAGMA data_version`) or the file is
    /// unchanged since it last passed (requireIntactBeforeWrite), and makes
    /// sure the file has its identity (file_identity.h). Throws
    /// ColonyFileError(Damaged) naming the newest good backup.
    void checkBeforeWrite();
    /// Called by WriteTransaction to end the outermost transaction: COMMIT,
    /// and when the checked-files cache vouched for the file as this write
    /// began, the pass is carried over to the state the commit leaves, unless
    /// the file changed meanwhile in a way this write does not explain (its
    /// main file touched during the transaction, another connection's commit
    /// since). The close carries it over the final checkpoint likewise.
    void commitWrite();
    /// Another connection of this program passed `PRAGMA quick_check` on the
    /// file after this one's dataVersion() was `version` (a background read):
    /// the next checkBeforeWrite skips the check when no other connection has
    /// committed since, so the first write after opening a large file does not
    /// read it all again.
    void trustIntegrityCheckedAt(std::int64_t version) { checkedElsewhereAt_ = version; }

private:
    ColonyStore(sqlite3* db, std::string path) : db_(db), path_(std::move(path)) {}
    enum class Check { Once, Fully, Elsewhere };
    static ColonyStore openAs(const std::string& path, Mode mode, Check check);
    void migrate(int fromVersion);
    void ensureEncounterIndex();
    void startSession();
    void close() noexcept;

    sqlite3* db_ = nullptr;
    std::string path_;
    std::optional<std::int64_t> intactAtVersion_; // data_version when quick_check last passed
    std::optional<std::int64_t> checkedElsewhereAt_; // see trustIntegrityCheckedAt
    /// The state the checked-files cache vouches for, and this connection's
    /// data_version when the file was in it (commitWrite, close).
    struct VouchedState {
        ColonyFileState state;
        std::int64_t dataVersion = 0;
    };
    std::optional<VouchedState> vouched_;
};

/// Reads the schema version and application id of a file without changing it;
/// throws ColonyFileError when it is not a colony file.
int probeColonyFile(const std::string& path);

} // namespace hierloom::core
