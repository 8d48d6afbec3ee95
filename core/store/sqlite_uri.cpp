// SPDX-License-Identifier: GPL-3.0-or-later
#include "core/store/sqlite_uri.h"

#include <cstdio>
#include <filesystem>

namespace hierloom::core {

std::string sqliteUri(const std::string& path, const std::string& query)
{
    // Absolute, so that "file://" is followed by an empty authority and the path.
    std::error_code ec;
    std::string abs = std::filesystem::absolute(path, ec).string();
    if (ec) abs = path;
    std::string out = "file://";
    for (const unsigned char c : abs) {
        if (c == '%' || c == '?' || c == '#' || c <= 0x20 || c >= 0x7F) {
            char buf[4];
            std::snprintf(buf, sizeof buf, "%%%02X", c);
            out += buf;
        } else {
            out += static_cast<char>(c);
        }
    }
    return query.empty() ? out : out + "?" + query;
}

} // namespace hierloom::core
