// SPDX-License-Identifier: GPL-3.0-or-later
#pragma once
#include <deque>
#include <string>
#include <string_view>
#include <vector>

namespace hierloom::core {

/// Reads CSV text as RFC 4180 describes it (quoted fields, doubled quotes,
/// CRLF or LF line ends), after an optional UTF-8 byte-order mark. Fields are
/// views valid until the next call to next().
class CsvReader {
public:
    /// Longest field accepted; a longer one is an error, not a memory hog.
    static constexpr size_t maxFieldBytes = 1 << 16;

    /// `delimiter` separates fields: ',' for CSV, '\t' or ';' for other
    /// spreadsheet exports (the import mapping's sheets).
    explicit CsvReader(std::string_view text, char delimiter = ',');

    /// Reads the next record into `fields`; false at the end or on error.
    /// Blank lines (including trailing ones) are skipped.
    bool next(std::vector<std::string_view>& fields);
    /// Line number (1-based) where the last record read began.
    int line() const { return recordLine_; }
    /// Non-empty when reading stopped on malformed input.
    const std::string& error() const { return error_; }

private:
    std::string_view text_;
    char delimiter_ = ',';
    size_t pos_ = 0;
    int lineNo_ = 1;
    int recordLine_ = 0;
    std::string error_;
    // A deque: adding a buffer for a later quoted field must not move the
    // earlier ones, whose (short-string) bytes the record's views point into.
    std::deque<std::string> scratch_;
};

/// True when `s` is well-formed UTF-8 (no overlongs, no surrogates).
bool isValidUtf8(std::string_view s);

/// True when `text` has more than `n` lines (a last line without a line end
/// counts), reading only as far as it takes to know.
bool moreLinesThan(std::string_view text, std::size_t n);

/// Reads a whole file; throws std::runtime_error naming the file when it cannot.
std::string readWholeFile(const std::string& path);

} // namespace hierloom::core
