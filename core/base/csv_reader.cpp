// SPDX-License-Identifier: GPL-3.0-or-later
#include "core/base/csv_reader.h"

#include <cerrno>
#include <cstdint>
#include <cstdio>
#include <cstring>
#include <stdexcept>

namespace hierloom::core {

CsvReader::CsvReader(std::string_view text, char delimiter) : text_(text), delimiter_(delimiter)
{
    if (text_.substr(0, 3) == "\xEF\xBB\xBF") pos_ = 3;
}

bool CsvReader::next(std::vector<std::string_view>& fields)
{
    fields.clear();
    if (!error_.empty()) return false;
    // Skip blank lines.
    while (pos_ < text_.size() && (text_[pos_] == '\n' || text_[pos_] == '\r')) {
        if (text_[pos_] == '\n') ++lineNo_;
        ++pos_;
    }
    if (pos_ >= text_.size()) return false;
    recordLine_ = lineNo_;
    size_t scratchUsed = 0;
    const size_t n = text_.size();
    while (true) {
        if (pos_ < n && text_[pos_] == '"') {
            // Quoted field: copy into scratch, undoubling quotes.
            ++pos_;
            if (scratchUsed == scratch_.size()) scratch_.emplace_back();
            std::string& buf = scratch_[scratchUsed++];
            buf.clear();
            while (true) {
                const size_t q = text_.find('"', pos_);
                if (q == std::string_view::npos) {
                    error_ = "a quoted field is not closed";
                    return false;
                }
                for (size_t i = pos_; i < q; ++i)
                    if (text_[i] == '\n') ++lineNo_;
                buf.append(text_.data() + pos_, q - pos_);
                if (buf.size() > maxFieldBytes) {
                    error_ = "a field is longer than " + std::to_string(maxFieldBytes) + " bytes";
                    return false;
                }
                pos_ = q + 1;
                if (pos_ < n && text_[pos_] == '"') {
                    buf.push_back('"');
                    ++pos_;
                    continue;
                }
                break;
            }
            fields.emplace_back(buf);
            if (pos_ < n && text_[pos_] != delimiter_ && text_[pos_] != '\n' && text_[pos_] != '\r') {
                error_ = "unexpected text after a closing quote";
                return false;
            }
        } else {
            size_t end = pos_;
            while (end < n && text_[end] != delimiter_ && text_[end] != '\n' && text_[end] != '\r') {
                if (text_[end] == '"') {
                    error_ = "a quote inside an unquoted field (quote the whole field and double the quote)";
                    return false;
                }
                ++end;
                if (end - pos_ > maxFieldBytes) {
                    error_ = "a field is longer than " + std::to_string(maxFieldBytes) + " bytes";
                    return false;
                }
            }
            fields.emplace_back(text_.data() + pos_, end - pos_);
            pos_ = end;
        }
        if (pos_ >= n) return true;
        if (text_[pos_] == delimiter_) {
            ++pos_;
            continue;
        }
        // End of record: \n, \r\n or lone \r.
        if (text_[pos_] == '\r') ++pos_;
        if (pos_ < n && text_[pos_] == '\n') ++pos_;
        ++lineNo_;
        return true;
    }
}

bool isValidUtf8(std::string_view s)
{
    const auto* p = reinterpret_cast<const unsigned char*>(s.data());
    const size_t n = s.size();
    size_t i = 0;
    while (i < n) {
        // Eight ASCII bytes at a time: the usual import file is all ASCII.
        std::uint64_t eight = 0;
        while (i + 8 <= n && (std::memcpy(&eight, p + i, 8), (eight & 0x8080808080808080ULL) == 0)) i += 8;
        if (i >= n) break;
        const unsigned char c = p[i];
        if (c < 0x80) {
            ++i;
            continue;
        }
        size_t len;
        unsigned cp;
        if ((c & 0xE0) == 0xC0) { len = 2; cp = c & 0x1F; }
        else if ((c & 0xF0) == 0xE0) { len = 3; cp = c & 0x0F; }
        else if ((c & 0xF8) == 0xF0) { len = 4; cp = c & 0x07; }
        else return false;
        if (i + len > n) return false;
        for (size_t k = 1; k < len; ++k) {
            if ((p[i + k] & 0xC0) != 0x80) return false;
            cp = (cp << 6) | (p[i + k] & 0x3F);
        }
        if ((len == 2 && cp < 0x80) || (len == 3 && cp < 0x800) || (len == 4 && cp < 0x10000)) return false;
        if (cp > 0x10FFFF || (cp >= 0xD800 && cp <= 0xDFFF)) return false;
        i += len;
    }
    return true;
}

bool moreLinesThan(std::string_view text, std::size_t n)
{
    // n line ends mean n + 1 lines.
    const char* at = text.data();
    const char* end = at + text.size();
    for (std::size_t found = 0; found < n; ++found) {
        const void* next = std::memchr(at, '\n', static_cast<std::size_t>(end - at));
        if (!next) return false;
        at = static_cast<const char*>(next) + 1;
    }
    return true;
}

std::string readWholeFile(const std::string& path)
{
    std::FILE* f = std::fopen(path.c_str(), "rb");
    if (!f) throw std::runtime_error(path + ": cannot open: " + std::strerror(errno));
    std::string data;
    if (std::fseek(f, 0, SEEK_END) == 0) {
        const long size = std::ftell(f);
        if (size > 0) data.reserve(static_cast<size_t>(size));
        std::rewind(f);
    }
    char buf[1 << 16];
    size_t got;
    while ((got = std::fread(buf, 1, sizeof buf, f)) > 0) data.append(buf, got);
    const bool bad = std::ferror(f) != 0;
    std::fclose(f);
    if (bad) throw std::runtime_error(path + ": read error");
    return data;
}

} // namespace hierloom::core
