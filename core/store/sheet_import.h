// SPDX-License-Identifier: GPL-3.0-or-later
#pragma once
#include "core/base/field_problem.h"
#include "core/store/colony_import.h"
#include "core/store/import_mapping.h"

#include <map>
#include <optional>
#include <string>
#include <vector>

namespace hierloom::core {

class ColonyStore;

/// A spreadsheet export (CSV or TSV): its name for messages and its text.
struct SheetSource {
    std::string name;
    std::string text;
};

/// One data row as a mapping reads it (for the assistant's preview).
struct SheetRow {
    int line = 0;                    ///< where it begins in the sheet
    std::vector<std::string> cells;  ///< as written, one per header column
    Encounter encounter;             ///< date, time, winner and loser ids, outcome, group, ...
    bool dateRead = false;           ///< the date cell was read (else encounter.date means nothing)
    bool recipientWon = false;       ///< the winner came from the recipient column
    FieldProblems problems;          ///< named by the sheet's column headers
};

/// A name (or id) of the sheet that matches no animal of the colony and
/// that the mapping does not map: where it first appears and how often.
struct UnknownName {
    std::string name;
    int firstLine = 0;
    std::string column;              ///< the sheet header it first appears under
    int rows = 0;
    std::optional<Day> firstDate;    ///< earliest date it appears on (when read)
};

/// A sheet read through a mapping: every row, and the import files it
/// becomes (only complete when `problems` is empty).
struct SheetTranslation {
    std::vector<std::string> header;
    char delimiter = ',';
    std::vector<SheetRow> rows;
    DateOrderFinding dateFinding;            ///< what the sheet's dates say about their order
    std::optional<DateOrder> dateOrder;      ///< the order used: the mapping's, or the one the dates decide
    std::vector<UnknownName> unknownNames;
    ImportProblems problems;                 ///< FILE:LINE: column: message, in the sheet's words
    ImportInput input;                       ///< the rows as plain import files (new animals included)

    // Where each generated row came from, to name problems in the sheet's words.
    std::vector<size_t> encounterRow;        ///< index into rows of each generated encounter line
    std::vector<std::pair<int, std::string>> newAnimalOrigin; ///< line and header of each new animal's first row
    std::map<std::string, std::string> columnHeader; ///< plain import column -> the sheet's header
    std::string firstHeader, secondHeader;           ///< winner/actor and loser/recipient headers
};

/// Reads a sheet through a mapping against the colony's animals (for names
/// and ids); writes nothing. Problems of the mapping itself, of the header,
/// of dates, codes and names are collected; the rules of the plain import
/// come later (planSheetImport, importSheet).
SheetTranslation translateSheet(const ImportMapping& mapping, const SheetSource& sheet,
                                const std::vector<Animal>& animals);

/// Only the header of a sheet (for the assistant's column choices).
std::vector<std::string> sheetHeader(const SheetSource& sheet, SheetDelimiter delimiter);

/// Problems of the plain import's files renamed into the sheet's file, line and column.
ImportProblems problemsInSheetTerms(const SheetTranslation& t, const ImportProblems& problems);

/// translateSheet, then the plain import's rules (planImport): the records
/// an import would add, or every problem in the sheet's terms. Writes nothing.
ImportPlan planSheetImport(const ImportMapping& mapping, const SheetSource& sheet,
                           const std::vector<Animal>& existingAnimals,
                           const std::vector<Residence>& existingResidences, Day today);

/// Reads the sheet at `sheetPath` through the mapping and imports it through
/// the plain import (all or nothing, one transaction).
ImportResult importSheet(ColonyStore& store, const ImportMapping& mapping, const std::string& sheetPath, Day today);

/// A named mapping to save in the colony file with an import (saved_mappings.h).
struct MappingToSave {
    std::string name;
    std::string text; ///< the mapping file's text
};

/// Everything one import through a mapping reads and writes.
struct SheetImportRequest {
    ImportMapping mapping;
    SheetSource sheet;
    /// Plain animals and residences files imported first, in the same
    /// transaction: the sheet may name their animals. Their encounters slot is unused.
    ImportInput files;
    /// Saved in the same transaction: a failed import saves nothing, a failed save imports nothing.
    std::optional<MappingToSave> save;
};

/// One transaction, all or nothing: the animals and residences files, then
/// the sheet's new animals and encounters (checked against the colony and the
/// files' records as read inside the transaction), then the mapping to save.
/// Problems of the files stop before the sheet is read; a failure to save the
/// mapping is a problem naming the colony file. On any problem nothing is written.
ImportResult importSheet(ColonyStore& store, const SheetImportRequest& request, Day today);

} // namespace hierloom::core
