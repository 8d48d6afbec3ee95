// SPDX-License-Identifier: GPL-3.0-or-later
#include "core/store/check_cache.h"
#include "core/store/database_header.h"

#include "core/store/partial_files.h"

#include <algorithm>
#include <cerrno>
#include <chrono>
#include <cstdio>
#include <cstdlib>
#include <fcntl.h>
#include <filesystem>
#include <fstream>
#include <sstream>
#include <sys/stat.h>
#include <unistd.h>

namespace hierloom::core {

namespace fs = std::filesystem;

namespace {

constexpr const char* kFileName = "checked-files.tsv";
constexpr const char* kFirstLine = "hierloom checked files\t1";
constexpr const char* kHeader = "checked_at\tdevice\tinode\tsize\tmtime_ns\tctime_ns\twal_device\twal_inode\twal_size\t"
                                "wal_mtime_ns\twal_ctime_ns\tchange_counter\tschema_version\tpath";
constexpr std::int64_t kNs = 1'000'000'000;

std::optional<FileStamp> stampOf(const std::string& path)
{
    struct stat st {};
    if (::stat(path.c_str(), &st) != 0) return std::nullopt;
    FileStamp s;
    s.device = static_cast<std::uint64_t>(st.st_dev);
    s.inode = static_cast<std::uint64_t>(st.st_ino);
    s.size = static_cast<std::int64_t>(st.st_size);
    s.mtimeNs = static_cast<std::int64_t>(st.st_mtim.tv_sec) * kNs + st.st_mtim.tv_nsec;
    s.ctimeNs = static_cast<std::int64_t>(st.st_ctim.tv_sec) * kNs + st.st_ctim.tv_nsec;
    return s;
}

/// The name a colony file is remembered under: absolute, symbolic links resolved.
std::string keyOf(const std::string& path)
{
    std::error_code ec;
    fs::path p = fs::weakly_canonical(fs::absolute(path, ec), ec);
    if (ec) p = fs::absolute(path, ec).lexically_normal();
    return p.string();
}

std::string escaped(const std::string& text)
{
    std::string out;
    for (const char c : text) {
        if (c == '\\') out += "\\\\";
        else if (c == '\t') out += "\\t";
        else if (c == '\n') out += "\\n";
        else if (c == '\r') out += "\\r";
        else out += c;
    }
    return out;
}

std::optional<std::string> unescaped(const std::string& text)
{
    std::string out;
    for (std::size_t i = 0; i < text.size(); ++i) {
        if (text[i] != '\\') {
            out += text[i];
            continue;
        }
        if (++i == text.size()) return std::nullopt;
        if (text[i] == '\\') out += '\\';
        else if (text[i] == 't') out += '\t';
        else if (text[i] == 'n') out += '\n';
        else if (text[i] == 'r') out += '\r';
        else return std::nullopt;
    }
    return out;
}

std::vector<std::string> fieldsOf(const std::string& line)
{
    std::vector<std::string> out;
    std::size_t start = 0;
    for (;;) {
        const auto tab = line.find('\t', start);
        out.push_back(line.substr(start, tab - start));
        if (tab == std::string::npos) return out;
        start = tab + 1;
    }
}

bool wholeNumber(const std::string& text, std::int64_t& out)
{
    if (text.empty() || text.size() > 20) return false;
    char* end = nullptr;
    errno = 0;
    const long long v = std::strtoll(text.c_str(), &end, 10);
    if (errno != 0 || *end != '\0') return false;
    out = v;
    return true;
}

std::string environment(const char* name)
{
    const char* v = std::getenv(name);
    return v ? std::string(v) : std::string();
}

} // namespace

std::optional<ColonyFileState> colonyFileState(const std::string& path)
{
    ColonyFileState s;
    const auto file = stampOf(path);
    if (!file) return std::nullopt;
    s.file = *file;
    // Through SQLite, never a descriptor of ours: this process may hold a
    // connection to the file (database_header.h says why that matters).
    const auto header = readDatabaseHeader(path);
    if (!header || s.file.size < 64) return std::nullopt; // too short to hold the fields read below
    const unsigned char* h = header->data();
    auto be32 = [&](int at) {
        return (std::uint32_t{h[at]} << 24) | (std::uint32_t{h[at + 1]} << 16) | (std::uint32_t{h[at + 2]} << 8) |
               std::uint32_t{h[at + 3]};
    };
    s.changeCounter = be32(24);
    s.schemaVersion = be32(60);
    // A -wal of no more than its 32-byte header holds no transaction.
    if (const auto wal = stampOf(path + "-wal"); wal && wal->size > 32) s.wal = *wal;
    return s;
}

bool settledBefore(const ColonyFileState& state, std::int64_t nowNs)
{
    std::int64_t latest = std::max(state.file.mtimeNs, state.file.ctimeNs);
    bool fractions = state.file.ctimeNs % kNs != 0 || state.file.mtimeNs % kNs != 0;
    if (state.wal) {
        latest = std::max({latest, state.wal->mtimeNs, state.wal->ctimeNs});
        fractions = fractions || state.wal->ctimeNs % kNs != 0 || state.wal->mtimeNs % kNs != 0;
    }
    const std::int64_t margin = fractions ? kNs / 10 : 3 * kNs;
    return nowNs - latest >= margin;
}

CheckCache CheckCache::fromEnvironment()
{
    if (const std::string every = environment("HIERLOOM_CHECK_EVERY_OPEN"); !every.empty() && every != "0")
        return CheckCache({});
    if (std::string dir = environment("HIERLOOM_CACHE_DIR"); !dir.empty()) return CheckCache(dir);
    if (const std::string xdg = environment("XDG_CACHE_HOME"); !xdg.empty() && fs::path(xdg).is_absolute())
        return CheckCache((fs::path(xdg) / "hierloom").string());
    if (const std::string home = environment("HOME"); !home.empty())
        return CheckCache((fs::path(home) / ".cache" / "hierloom").string());
    return CheckCache({});
}

CheckCache::CheckCache(std::string folder) : folder_(std::move(folder)) {}

std::string CheckCache::filePath() const
{
    return folder_.empty() ? std::string() : (fs::path(folder_) / kFileName).string();
}

std::vector<CheckCache::Entry> CheckCache::read() const
{
    std::vector<Entry> out;
    if (folder_.empty()) return out;
    std::ifstream in(filePath(), std::ios::binary);
    std::string line;
    if (!std::getline(in, line) || line != kFirstLine) return out;
    if (!std::getline(in, line) || line != kHeader) return out;
    while (std::getline(in, line)) {
        const std::vector<std::string> f = fieldsOf(line);
        if (f.size() != 14) continue; // a line this version cannot read is left out
        std::int64_t n[13] = {};
        bool ok = true;
        for (int i = 0; i < 13 && ok; ++i) {
            if (i >= 6 && i <= 10 && f[static_cast<std::size_t>(i)] == "-") continue;
            ok = wholeNumber(f[static_cast<std::size_t>(i)], n[i]);
        }
        const auto path = unescaped(f[13]);
        if (!ok || !path || path->empty()) continue;
        Entry e;
        e.path = *path;
        e.checkedAt = n[0];
        e.state.file = {static_cast<std::uint64_t>(n[1]), static_cast<std::uint64_t>(n[2]), n[3], n[4], n[5]};
        if (f[6] != "-")
            e.state.wal = FileStamp{static_cast<std::uint64_t>(n[6]), static_cast<std::uint64_t>(n[7]), n[8], n[9], n[10]};
        e.state.changeCounter = static_cast<std::uint32_t>(n[11]);
        e.state.schemaVersion = static_cast<std::uint32_t>(n[12]);
        out.push_back(std::move(e));
    }
    return out;
}

void CheckCache::write(const std::vector<Entry>& entries) const
{
    std::ostringstream text;
    text << kFirstLine << '\n' << kHeader << '\n';
    for (const Entry& e : entries) {
        const FileStamp& f = e.state.file;
        text << e.checkedAt << '\t' << f.device << '\t' << f.inode << '\t' << f.size << '\t' << f.mtimeNs << '\t'
             << f.ctimeNs << '\t';
        if (e.state.wal)
            text << e.state.wal->device << '\t' << e.state.wal->inode << '\t' << e.state.wal->size << '\t'
                 << e.state.wal->mtimeNs << '\t' << e.state.wal->ctimeNs << '\t';
        else
            text << "-\t-\t-\t-\t-\t";
        text << e.state.changeCounter << '\t' << e.state.schemaVersion << '\t' << escaped(e.path) << '\n';
    }
    const std::string data = text.str();
    std::error_code ec;
    fs::create_directories(folder_, ec);
    const std::string target = filePath();
    removeAbandonedPartials(folder_, std::string(kFileName) + ".", std::chrono::system_clock::now());
    // Written beside its name and renamed over it: a reader sees the old or the new file, never half of one.
    const std::string partial = partialPathFor(target);
    const int fd = ::open(partial.c_str(), O_WRONLY | O_CREAT | O_EXCL | O_CLOEXEC, 0600);
    if (fd < 0) return;
    std::size_t done = 0;
    while (done < data.size()) {
        const ssize_t n = ::write(fd, data.data() + done, data.size() - done);
        if (n < 0 && errno == EINTR) continue;
        if (n <= 0) break;
        done += static_cast<std::size_t>(n);
    }
    const bool written = done == data.size() && ::close(fd) == 0;
    if (!written || std::rename(partial.c_str(), target.c_str()) != 0) ::unlink(partial.c_str());
}

bool CheckCache::vouches(const Entry& entry, const ColonyFileState& state, std::int64_t nowSeconds)
{
    return entry.state == state && entry.checkedAt <= nowSeconds && nowSeconds - entry.checkedAt < kCheckTrustSeconds;
}

bool CheckCache::vouchesFor(const std::string& colonyPath, const ColonyFileState& state, std::int64_t nowSeconds) const
{
    if (folder_.empty()) return false;
    const std::string key = keyOf(colonyPath);
    for (const Entry& e : read())
        if (e.path == key) return vouches(e, state, nowSeconds);
    return false;
}

void CheckCache::record(const std::string& colonyPath, const ColonyFileState& state, std::int64_t checkedAtSeconds) const
{
    if (folder_.empty()) return;
    const std::string key = keyOf(colonyPath);
    std::vector<Entry> entries = read();
    std::erase_if(entries, [&](const Entry& e) { return e.path == key; });
    entries.insert(entries.begin(), Entry{key, state, checkedAtSeconds});
    if (entries.size() > kCheckCacheEntries) entries.resize(kCheckCacheEntries);
    write(entries);
}

bool CheckCache::carryOver(const std::string& colonyPath, const ColonyFileState& before, const ColonyFileState& after,
                           std::int64_t nowSeconds) const
{
    if (folder_.empty()) return false;
    const std::string key = keyOf(colonyPath);
    std::vector<Entry> entries = read();
    const auto e = std::find_if(entries.begin(), entries.end(), [&](const Entry& x) { return x.path == key; });
    if (e == entries.end() || !vouches(*e, before, nowSeconds)) return false;
    if (before == after) return true;
    e->state = after;
    write(entries);
    return true;
}

void CheckCache::forget(const std::string& colonyPath) const
{
    if (folder_.empty()) return;
    const std::string key = keyOf(colonyPath);
    std::vector<Entry> entries = read();
    const auto before = entries.size();
    std::erase_if(entries, [&](const Entry& e) { return e.path == key; });
    if (entries.size() != before) write(entries);
}

} // namespace hierloom::core
