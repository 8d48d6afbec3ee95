// SPDX-License-Identifier: GPL-3.0-or-later
#pragma once
#include "core/store/sqlite_statement.h"

#include <cstdint>
#include <string>
#include <unordered_map>
#include <vector>

struct sqlite3;

namespace hierloom::core {

// The texts an encounter row names by code from schema version 5: behaviour,
// group and observer (docs/file-formats.md, "The colony file"). A file holds
// a few dozen, so readers take them all at once and writers keep the codes
// they have met.

/// Every text of `encounter_term` by its code.
class EncounterTermTexts {
public:
    EncounterTermTexts(sqlite3* db, const std::string& path);
    /// The text of `code`; a code the table does not hold means the file was
    /// changed outside the program: ColonyFileError (Damaged).
    const std::string& operator[](std::int64_t code) const
    {
        if (code < 0 || static_cast<std::uint64_t>(code) >= texts_.size() || !known_[static_cast<size_t>(code)])
            unknown(code);
        return texts_[static_cast<size_t>(code)];
    }
    size_t size() const { return texts_.size(); }
    bool has(std::int64_t code) const
    {
        return code >= 0 && static_cast<std::uint64_t>(code) < texts_.size() && known_[static_cast<size_t>(code)];
    }

private:
    [[noreturn]] void unknown(std::int64_t code) const;
    std::string path_;
    std::vector<std::string> texts_;
    std::vector<bool> known_;
};

/// The code of a text, added to `encounter_term` when the file does not
/// have it yet. Use inside one write transaction (a rollback forgets the
/// codes it added, this cache would not).
class EncounterTermCodes {
public:
    explicit EncounterTermCodes(sqlite3* db);
    std::int64_t operator()(const std::string& text);

private:
    SqliteStatement find_;
    SqliteStatement add_;
    std::unordered_map<std::string, std::int64_t> codes_;
    const std::string* lastText_ = nullptr;
    std::int64_t lastCode_ = 0;
};

/// A stored day number as a Day; one outside the years 0-9999 means the file
/// was changed outside the program: ColonyFileError (Damaged) naming `path`.
std::int32_t storedDay(std::int64_t day, const std::string& path);

} // namespace hierloom::core
