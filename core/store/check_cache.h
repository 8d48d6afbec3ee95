// SPDX-License-Identifier: GPL-3.0-or-later
#pragma once
#include <cstdint>
#include <optional>
#include <string>
#include <vector>

namespace hierloom::core {

// "Checked once, trusted until it changes": the record of colony files that
// passed SQLite's check over the whole file, kept outside them in a small
// per-user cache file, so that opening an unchanged file again need not read
// all of it. The rule that uses it is requireIntactOnce (integrity_check.h);
// the format is in docs/file-formats.md ("Checked-files cache").

/// What the file system says about one file: enough to notice any change made
/// through it. The status-change time (ctime) moves with every write, truncate,
/// rename and time stamp change and cannot be set back by a program.
struct FileStamp {
    std::uint64_t device = 0;
    std::uint64_t inode = 0;
    std::int64_t size = 0;
    std::int64_t mtimeNs = 0; // last modification, nanoseconds since 1970
    std::int64_t ctimeNs = 0; // last status change, nanoseconds since 1970
    bool operator==(const FileStamp&) const = default;
};

/// A colony file as it lies on disk: its stamp, the stamp of its -wal file
/// when that holds any transaction (an empty or header-only -wal adds no
/// content and comes and goes with readers), and two numbers of the SQLite
/// header: the file change counter (offset 24) and the schema version
/// (user_version, offset 60).
struct ColonyFileState {
    FileStamp file;
    std::optional<FileStamp> wal;
    std::uint32_t changeCounter = 0;
    std::uint32_t schemaVersion = 0;
    bool operator==(const ColonyFileState&) const = default;
};

/// The state of the colony file at `path`; nothing when it cannot be read.
std::optional<ColonyFileState> colonyFileState(const std::string& path);

/// Whether `state` was last changed long enough before `nowNs` that a later
/// change must show in its time stamps: 100 ms when the file system keeps
/// fractions of a second (ext4, xfs, btrfs, tmpfs: a clock tick of at most
/// 10 ms), 3 s when it keeps whole seconds (FAT keeps two). A state changed
/// within the same tick as a check could change again without a new stamp.
bool settledBefore(const ColonyFileState& state, std::int64_t nowNs);

/// How long a pass is trusted at most, however unchanged the file looks:
/// decay of the disk itself changes no time stamp.
constexpr std::int64_t kCheckTrustSeconds = 7 * 24 * 3600;

/// How many colony files the cache remembers (the most recently checked).
constexpr std::size_t kCheckCacheEntries = 64;

/// The checked-files cache: FOLDER/checked-files.tsv, one line per colony file
/// (its absolute path, state and the time of the check), replaced whole by a
/// rename when it changes. Two programs recording at once may lose one line,
/// which costs only a check. A cache that cannot be read or written is no
/// cache: every open checks.
class CheckCache {
public:
    /// FOLDER from the environment: HIERLOOM_CACHE_DIR, else
    /// $XDG_CACHE_HOME/hierloom, else $HOME/.cache/hierloom. No cache when
    /// HIERLOOM_CHECK_EVERY_OPEN is set to anything but "" or "0", or no
    /// folder can be named.
    static CheckCache fromEnvironment();

    /// The cache in `folder`; an empty folder remembers nothing.
    explicit CheckCache(std::string folder);

    /// FOLDER/checked-files.tsv; empty when there is no cache.
    std::string filePath() const;

    /// True when a check of `colonyPath` passed while it was in `state`, less
    /// than kCheckTrustSeconds before `nowSeconds` (and not after it).
    bool vouchesFor(const std::string& colonyPath, const ColonyFileState& state, std::int64_t nowSeconds) const;

    /// Records that `colonyPath` passed a check in `state` at `checkedAtSeconds`.
    void record(const std::string& colonyPath, const ColonyFileState& state, std::int64_t checkedAtSeconds) const;

    /// This program changed `colonyPath` from `before` to `after` and nobody
    /// else wrote meanwhile: when the cache vouches for `before` (at
    /// `nowSeconds`), the same pass is recorded for `after`, keeping the time
    /// of the check (kCheckTrustSeconds still counts from it). Returns whether it did.
    bool carryOver(const std::string& colonyPath, const ColonyFileState& before, const ColonyFileState& after,
                   std::int64_t nowSeconds) const;

    /// Forgets `colonyPath` (it changed in a way this program cannot vouch for, or is damaged).
    void forget(const std::string& colonyPath) const;

private:
    struct Entry {
        std::string path;
        ColonyFileState state;
        std::int64_t checkedAt = 0;
    };
    static bool vouches(const Entry& entry, const ColonyFileState& state, std::int64_t nowSeconds);
    std::vector<Entry> read() const;
    void write(const std::vector<Entry>& entries) const;

    std::string folder_;
};

} // namespace hierloom::core
