// SPDX-License-Identifier: GPL-3.0-or-later
#include "core/store/partial_files.h"

#include <cerrno>
#include <csignal>
#include <cstdio>
#include <fcntl.h>
#include <filesystem>
#include <system_error>
#include <random>
#include <sys/stat.h>
#include <unistd.h>

namespace hierloom::core {

namespace fs = std::filesystem;

namespace {

constexpr const char* kMarker = ".partial";

std::string hostName()
{
    char buf[256] = {};
    if (::gethostname(buf, sizeof buf - 1) != 0 || !buf[0]) return "host";
    std::string out;
    // '-' separates the name's fields, so it cannot appear inside the host part.
    for (const char* c = buf; *c; ++c) out += (*c == '-' || *c == '/') ? '_' : *c;
    return out;
}

/// True when the name says "written on this host by a process that is gone".
bool writerIsGone(const std::string& name)
{
    const auto at = name.rfind(kMarker);
    if (at == std::string::npos || name.compare(at, 9, std::string(kMarker) + "-") != 0) return false;
    // HOST-PID-RANDOM after ".partial-".
    const std::string rest = name.substr(at + 9);
    const auto firstDash = rest.find('-');
    const auto secondDash = firstDash == std::string::npos ? std::string::npos : rest.find('-', firstDash + 1);
    if (secondDash == std::string::npos) return false;
    if (rest.substr(0, firstDash) != hostName()) return false;
    const std::string pidText = rest.substr(firstDash + 1, secondDash - firstDash - 1);
    if (pidText.empty() || pidText.find_first_not_of("0123456789") != std::string::npos || pidText.size() > 9)
        return false;
    const pid_t pid = static_cast<pid_t>(std::stol(pidText));
    if (pid <= 0 || pid == ::getpid()) return false;
    return ::kill(pid, 0) != 0 && errno == ESRCH;
}

std::string baseOfPartial(const std::string& name)
{
    for (const char* suffix : {"-wal", "-shm", "-journal"}) {
        const std::string s(suffix);
        if (name.size() > s.size() && name.compare(name.size() - s.size(), s.size(), s) == 0)
            return name.substr(0, name.size() - s.size());
    }
    return name;
}

} // namespace

std::string partialPathFor(const std::string& finalPath)
{
    std::random_device rd;
    const unsigned long r = (static_cast<unsigned long>(rd()) << 16) ^ rd();
    char hex[17];
    std::snprintf(hex, sizeof hex, "%08lx", r & 0xFFFFFFFFUL);
    return finalPath + kMarker + "-" + hostName() + "-" + std::to_string(::getpid()) + "-" + hex;
}

bool publishPartial(const std::string& partialPath, const std::string& finalPath)
{
    // renameat2(RENAME_NOREPLACE) fails instead of replacing a file another
    // program put there meanwhile; file systems without it get link + unlink.
    if (::renameat2(AT_FDCWD, partialPath.c_str(), AT_FDCWD, finalPath.c_str(), RENAME_NOREPLACE) == 0) return true;
    if (errno == EEXIST) return false;
    if (errno != EINVAL && errno != ENOSYS) throw std::system_error(errno, std::generic_category(), finalPath);
    if (::link(partialPath.c_str(), finalPath.c_str()) == 0) {
        ::unlink(partialPath.c_str());
        return true;
    }
    if (errno == EEXIST) return false;
    // No hard links either (FAT): check, then rename.
    std::error_code ec;
    if (fs::exists(finalPath, ec)) return false;
    fs::rename(partialPath, finalPath);
    return true;
}

void syncFolder(const std::string& folder) noexcept
{
    const int fd = ::open(folder.empty() ? "." : folder.c_str(), O_RDONLY | O_DIRECTORY);
    if (fd >= 0) {
        ::fsync(fd);
        ::close(fd);
    }
}

void removePartial(const std::string& partialPath) noexcept
{
    std::error_code ec;
    for (const char* suffix : {"", "-wal", "-shm", "-journal"}) fs::remove(partialPath + suffix, ec);
}

std::vector<std::string> removeAbandonedPartials(const std::string& folder, const std::string& namePrefix,
                                                 std::chrono::system_clock::time_point now)
{
    std::vector<std::string> removed;
    std::error_code ec;
    for (const auto& entry : fs::directory_iterator(folder.empty() ? "." : folder, ec)) {
        const std::string name = entry.path().filename().string();
        if (name.rfind(namePrefix, 0) != 0 || name.find(kMarker) == std::string::npos) continue;
        struct stat st {};
        if (::lstat(entry.path().c_str(), &st) != 0 || !S_ISREG(st.st_mode)) continue;
        const auto modified = std::chrono::system_clock::from_time_t(st.st_mtime);
        const std::string base = baseOfPartial(name);
        if (!writerIsGone(base) && now - modified <= partialFileGrace) continue;
        std::error_code rc;
        if (fs::remove(entry.path(), rc)) removed.push_back(entry.path().string());
    }
    return removed;
}

} // namespace hierloom::core
