// SPDX-License-Identifier: GPL-3.0-or-later
#pragma once
#include "core/base/colony.h"
#include "core/base/date_order.h"
#include "core/base/import_problems.h"

#include <array>
#include <optional>
#include <string>
#include <string_view>
#include <vector>

namespace hierloom::core {

/// What a column of a team's spreadsheet holds (docs/file-formats.md,
/// "Import mapping files"). Columns with no meaning are left out.
enum class ColumnMeaning { Date, Time, Winner, Loser, Actor, Recipient, Outcome, Behaviour, Group, Observer, Note };
inline constexpr int kColumnMeanings = 11;

/// "date", "time", "winner", ... (the mapping file's words).
const char* toString(ColumnMeaning meaning);
std::optional<ColumnMeaning> parseColumnMeaning(std::string_view text);

/// Winner and loser columns, or an actor, a recipient and an outcome code
/// saying which of the two won.
enum class SheetLayout { WinnerLoser, ActorRecipient };
/// Whether the sheet names animals by their id or by their name.
enum class AnimalNaming { Ids, Names };
/// How fields are separated; Auto looks at the header line.
enum class SheetDelimiter { Auto, Comma, Tab, Semicolon };

const char* toString(SheetLayout layout);
const char* toString(AnimalNaming naming);
const char* toString(SheetDelimiter delimiter);

/// What a name (or id) written in the sheet stands for, chosen by the user.
struct NameChoice {
    std::string sheetName;     ///< as written (matched trimmed, ignoring ASCII case)
    std::string animalId;      ///< the animal it is, or the id of the new animal
    bool addNew = false;       ///< add it as a new animal (through the animal rules)
    Sex sex = Sex::Unknown;    ///< of a new animal
};

/// How one team's spreadsheet turns into encounters: plain data, saved by
/// name in a mapping file or in the colony file, and reused.
struct ImportMapping {
    std::string name;
    SheetDelimiter delimiter = SheetDelimiter::Auto;
    SheetLayout layout = SheetLayout::WinnerLoser;
    AnimalNaming naming = AnimalNaming::Ids;
    DateOrder dates = DateOrder::Unset;
    /// The header of the column holding each meaning; empty when none does.
    std::array<std::string, kColumnMeanings> columns;
    /// One group for the whole file when no column holds the group.
    std::string fileGroup;
    /// Outcome codes: win (the actor won; in winner-loser sheets: decided),
    /// loss (the recipient won), draw.
    std::vector<std::string> winCodes, lossCodes, drawCodes;
    std::vector<NameChoice> names;

    std::string& column(ColumnMeaning m) { return columns[static_cast<size_t>(m)]; }
    const std::string& column(ColumnMeaning m) const { return columns[static_cast<size_t>(m)]; }
    bool operator==(const ImportMapping&) const;
};

/// Structural problems of a mapping alone (missing meanings, codes listed
/// twice, a column given two meanings), each a sentence; empty when usable.
std::vector<std::string> mappingProblems(const ImportMapping& mapping);

/// A mapping read from a mapping file, or the problems with the file.
struct MappingFile {
    ImportMapping mapping;
    ImportProblems problems;
    bool ok() const { return problems.empty(); }
};

/// Reads a mapping file (CSV: entry,key,value,extra); `fileName` names it in messages.
MappingFile readMappingFile(const std::string& fileName, std::string_view text);
/// Writes a mapping as a mapping file's text; readMappingFile reads it back equal.
std::string writeMappingFile(const ImportMapping& mapping);

/// True when two texts are equal after trimming spaces and ignoring ASCII case.
bool sameSheetText(std::string_view a, std::string_view b);

} // namespace hierloom::core
