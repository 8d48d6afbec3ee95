// SPDX-License-Identifier: GPL-3.0-or-later
#include "core/store/encounter_terms.h"

#include "core/base/colony_file_error.h"

namespace hierloom::core {

EncounterTermTexts::EncounterTermTexts(sqlite3* db, const std::string& path) : path_(path)
{
    SqliteStatement q(db, "SELECT code, text FROM encounter_term WHERE code BETWEEN 0 AND 1000000");
    while (q.step()) {
        const auto code = static_cast<size_t>(q.integer(0));
        if (code >= texts_.size()) {
            texts_.resize(code + 1);
            known_.resize(code + 1, false);
        }
        texts_[code] = q.text(1);
        known_[code] = true;
    }
}

void EncounterTermTexts::unknown(std::int64_t code) const
{
    throw ColonyFileError(ColonyFileError::Kind::Damaged,
                          path_ + ": an encounter names the code " + std::to_string(code) + ", which the file lacks");
}

EncounterTermCodes::EncounterTermCodes(sqlite3* db)
    : find_(db, "SELECT code FROM encounter_term WHERE text = ?"), add_(db, "INSERT INTO encounter_term(text) VALUES (?)")
{
}

std::int64_t EncounterTermCodes::operator()(const std::string& text)
{
    if (text.empty()) return 0;
    // Rows in entry order often repeat the text of the row before.
    if (lastText_ && *lastText_ == text) return lastCode_;
    auto it = codes_.find(text);
    if (it == codes_.end()) {
        find_.bind(1, text);
        std::int64_t code = 0;
        if (find_.step()) {
            code = find_.integer(0);
            find_.reset();
        } else {
            find_.reset();
            add_.bind(1, text);
            add_.run();
            find_.bind(1, text);
            find_.step();
            code = find_.integer(0);
            find_.reset();
        }
        it = codes_.emplace(text, code).first;
    }
    lastText_ = &it->first;
    lastCode_ = it->second;
    return lastCode_;
}

std::int32_t storedDay(std::int64_t day, const std::string& path)
{
    // 0000-01-01 and 9999-12-31, the dates a YYYY-MM-DD text can hold.
    if (day < -719528 || day > 2932896)
        throw ColonyFileError(ColonyFileError::Kind::Damaged,
                              path + ": holds an impossible day number " + std::to_string(day));
    return static_cast<std::int32_t>(day);
}

} // namespace hierloom::core
