// SPDX-License-Identifier: GPL-3.0-or-later
#include "core/store/sheet_import.h"

#include "core/base/csv_columns.h"
#include "core/base/csv_reader.h"
#include "core/base/csv_writer.h"
#include "core/store/colony_store.h"
#include "core/store/record_appender.h"
#include "core/store/saved_mappings.h"
#include "core/store/write_transaction.h"

#include <algorithm>
#include <map>
#include <sstream>
#include <unordered_map>

namespace hierloom::core {

namespace {

const char* kAnimalsSuffix = " (new animals)";
const char* kResidencesSuffix = " (new animals' groups)";
const char* kEncountersSuffix = " (encounters)";

/// The plain import's column for each meaning (actor and recipient become winner or loser row by row).
constexpr std::array<const char*, kColumnMeanings> kImportColumn{
    "date", "time", "winner", "loser", "actor", "recipient", "outcome", "behaviour", "group", "observer", "note"};

std::string lowered(std::string_view s)
{
    s = trimSpaces(s);
    std::string out(s);
    for (char& c : out)
        if (c >= 'A' && c <= 'Z') c = static_cast<char>(c - 'A' + 'a');
    return out;
}

char delimiterOf(SheetDelimiter d, const SheetSource& sheet)
{
    switch (d) {
    case SheetDelimiter::Comma: return ',';
    case SheetDelimiter::Tab: return '\t';
    case SheetDelimiter::Semicolon: return ';';
    case SheetDelimiter::Auto: break;
    }
    // The header line decides: a tab anywhere means a TSV; more semicolons than commas, a semicolon list.
    const std::string_view first = std::string_view(sheet.text).substr(0, sheet.text.find('\n'));
    if (first.find('\t') != std::string_view::npos) return '\t';
    const auto semicolons = std::count(first.begin(), first.end(), ';');
    const auto commas = std::count(first.begin(), first.end(), ',');
    return semicolons > commas ? ';' : ',';
}

/// "HH:MM", "H:MM" and "HH:MM:SS" (seconds dropped) as "HH:MM"; other text unchanged,
/// so the plain import's rule names it.
std::string normalisedTime(std::string_view t)
{
    auto digit = [](char c) { return c >= '0' && c <= '9'; };
    if (t.size() == 4 && digit(t[0]) && t[1] == ':') return "0" + std::string(t);
    if (t.size() == 8 && t[2] == ':' && t[5] == ':' && digit(t[6]) && digit(t[7])) return std::string(t.substr(0, 5));
    return std::string(t);
}

bool listed(const std::vector<std::string>& codes, std::string_view cell)
{
    return std::any_of(codes.begin(), codes.end(), [&](const std::string& c) { return sameSheetText(c, cell); });
}

std::string codeList(const ImportMapping& m)
{
    std::string s;
    auto add = [&](const char* what, const std::vector<std::string>& codes) {
        for (const std::string& c : codes) {
            if (!s.empty()) s += ", ";
            s += quotedValue(c) + " " + what;
        }
    };
    if (m.layout == SheetLayout::ActorRecipient) {
        add("(actor won)", m.winCodes);
        add("(recipient won)", m.lossCodes);
    } else {
        add("(decided)", m.winCodes);
    }
    add("(draw)", m.drawCodes);
    return s.empty() ? std::string("none") : s;
}

/// Finds what a sheet's name or id stands for.
class NameResolver {
public:
    NameResolver(const ImportMapping& m, const std::vector<Animal>& animals) : mapping_(m)
    {
        for (const Animal& a : animals) {
            ids_.emplace(a.id, a.id);
            if (!a.name.empty()) byName_[lowered(a.name)].push_back(a.id);
        }
    }
    enum class Kind { Found, Unknown, Ambiguous };
    struct Answer {
        Kind kind;
        std::string id;
        std::string message;
        const NameChoice* choice = nullptr;
    };
    Answer resolve(std::string_view text) const
    {
        for (const NameChoice& c : mapping_.names)
            if (sameSheetText(c.sheetName, text)) return {Kind::Found, c.animalId, {}, &c};
        if (mapping_.naming == AnimalNaming::Ids) {
            if (auto it = ids_.find(std::string(text)); it != ids_.end()) return {Kind::Found, it->second, {}};
            return {Kind::Unknown, {}, quotedValue(text) + " is not the id of an animal of the colony; map it to an "
                                                           "animal or add it as a new animal"};
        }
        const auto it = byName_.find(lowered(text));
        if (it == byName_.end())
            return {Kind::Unknown, {}, quotedValue(text) + " is not the name of an animal of the colony; map it to "
                                                           "an animal or add it as a new animal"};
        if (it->second.size() > 1) {
            std::string ids;
            for (const std::string& id : it->second) ids += (ids.empty() ? "" : ", ") + id;
            return {Kind::Ambiguous, {}, quotedValue(text) + " is the name of " +
                                             std::to_string(it->second.size()) + " animals (" + ids +
                                             "); map it to one of them"};
        }
        return {Kind::Found, it->second.front(), {}};
    }

private:
    const ImportMapping& mapping_;
    std::unordered_map<std::string, std::string> ids_;
    std::unordered_map<std::string, std::vector<std::string>> byName_;
};

/// True when the text has more than `n` lines (then its import is a bulk load).
std::string withoutSuffix(const std::string& generated, const char* suffix)
{
    return generated.substr(0, generated.size() - std::char_traits<char>::length(suffix));
}

bool endsWith(const std::string& s, const char* suffix)
{
    const size_t n = std::char_traits<char>::length(suffix);
    return s.size() >= n && s.compare(s.size() - n, n, suffix) == 0;
}

} // namespace

std::vector<std::string> sheetHeader(const SheetSource& sheet, SheetDelimiter delimiter)
{
    CsvReader reader(sheet.text, delimiterOf(delimiter, sheet));
    std::vector<std::string_view> f;
    std::vector<std::string> header;
    if (reader.next(f))
        for (std::string_view v : f) header.emplace_back(trimSpaces(v));
    return header;
}

SheetTranslation translateSheet(const ImportMapping& m, const SheetSource& sheet, const std::vector<Animal>& animals)
{
    SheetTranslation t;
    ImportProblems& P = t.problems;
    const std::string& F = sheet.name;
    for (const std::string& p : mappingProblems(m)) P.add(F, 0, "", "the mapping: " + p);
    if (!P.empty()) return t;
    if (!isValidUtf8(sheet.text)) {
        P.add(F, 0, "", "is not UTF-8 text (save the sheet as UTF-8 CSV and import again)");
        return t;
    }
    t.delimiter = delimiterOf(m.delimiter, sheet);
    CsvReader reader(sheet.text, t.delimiter);
    std::vector<std::string_view> f;
    if (!reader.next(f)) {
        P.add(F, reader.line(), "", reader.error().empty() ? "is empty; it needs a header row" : reader.error());
        return t;
    }
    const int headerLine = reader.line();
    for (std::string_view v : f) t.header.emplace_back(trimSpaces(v));

    // Where each meaning's column is.
    std::array<int, kColumnMeanings> at;
    at.fill(-1);
    for (size_t k = 0; k < at.size(); ++k) {
        const std::string& wanted = m.columns[k];
        if (trimSpaces(wanted).empty()) continue;
        for (size_t c = 0; c < t.header.size(); ++c) {
            if (!sameSheetText(t.header[c], wanted)) continue;
            if (at[k] >= 0) P.add(F, headerLine, t.header[c], "appears twice in the header; rename one of them");
            else at[k] = static_cast<int>(c);
        }
        if (at[k] < 0)
            P.add(F, headerLine, std::string(trimSpaces(wanted)),
                  std::string("is not a column of the sheet (the mapping's ") + toString(static_cast<ColumnMeaning>(k)) +
                      " column)");
    }
    if (!P.empty()) return t;
    for (size_t k = 0; k < at.size(); ++k)
        if (at[k] >= 0) t.columnHeader[kImportColumn[k]] = t.header[static_cast<size_t>(at[k])];
    if (at[static_cast<size_t>(ColumnMeaning::Group)] < 0) t.columnHeader["group"] = "group (whole file)";
    const bool actorSheet = m.layout == SheetLayout::ActorRecipient;
    t.firstHeader = t.header[static_cast<size_t>(at[static_cast<size_t>(actorSheet ? ColumnMeaning::Actor : ColumnMeaning::Winner)])];
    t.secondHeader = t.header[static_cast<size_t>(at[static_cast<size_t>(actorSheet ? ColumnMeaning::Recipient : ColumnMeaning::Loser)])];
    auto header = [&](ColumnMeaning k) { return t.header[static_cast<size_t>(at[static_cast<size_t>(k)])]; };
    auto cell = [&](const SheetRow& row, ColumnMeaning k) -> std::string_view {
        const int c = at[static_cast<size_t>(k)];
        return c < 0 ? std::string_view() : trimSpaces(row.cells[static_cast<size_t>(c)]);
    };

    // Every row's cells (a short row is padded: spreadsheets drop trailing empty cells).
    while (reader.next(f)) {
        SheetRow row;
        row.line = reader.line();
        bool extra = false;
        for (size_t c = 0; c < f.size(); ++c) {
            if (c < t.header.size()) row.cells.emplace_back(f[c]);
            else if (!trimSpaces(f[c]).empty()) extra = true;
        }
        row.cells.resize(t.header.size());
        if (extra)
            P.add(F, row.line, "",
                  "has " + std::to_string(f.size()) + " fields but the header has " + std::to_string(t.header.size()));
        t.rows.push_back(std::move(row));
    }
    if (!reader.error().empty()) {
        P.add(F, reader.line(), "", reader.error());
        return t;
    }

    // The date order: the mapping's, else the one the dates decide; never a guess.
    std::vector<std::pair<int, std::string>> dates;
    for (const SheetRow& row : t.rows) dates.emplace_back(row.line, std::string(cell(row, ColumnMeaning::Date)));
    t.dateFinding = findDateOrder(dates);
    const std::string dateHeader = header(ColumnMeaning::Date);
    if (m.dates != DateOrder::Unset) {
        t.dateOrder = m.dates;
    } else if (t.dateFinding.decided) {
        t.dateOrder = t.dateFinding.decided;
    } else if (!t.dateFinding.ambiguousDate.empty()) {
        P.add(F, t.dateFinding.ambiguousLine, dateHeader,
              "the date order cannot be told from the dates: " + bothReadings(t.dateFinding.ambiguousDate) +
                  ", and no date of the sheet reads only one way; choose day-month-year or month-day-year "
                  "(mapping entry 'dates')");
    }

    const NameResolver names(m, animals);
    std::map<std::string, size_t> unknownAt; // lowered name -> index in unknownNames
    struct NewAnimal {
        const NameChoice* choice;
        int line;
        std::string column;
        std::optional<Day> first;
        std::string group;
    };
    std::vector<NewAnimal> newAnimals;

    for (SheetRow& row : t.rows) {
        Encounter& e = row.encounter;
        const std::string_view dateText = cell(row, ColumnMeaning::Date);
        if (dateText.empty()) {
            row.problems.push_back({dateHeader, "is empty"});
        } else if (t.dateOrder) {
            if (const auto d = parseDateAs(dateText, *t.dateOrder)) {
                e.date = *d;
                row.dateRead = true;
            } else {
                row.problems.push_back({dateHeader, quotedValue(dateText) + " is not a real date in the form " +
                                                        datePattern(*t.dateOrder)});
            }
        } else if (t.dateFinding.ambiguousDate.empty()) {
            row.problems.push_back({dateHeader, quotedValue(dateText) +
                                                    " is not a real date in any of the forms YYYY-MM-DD, DD/MM/YYYY, "
                                                    "MM/DD/YYYY"});
        }

        // Who won: winner and loser, or actor and recipient with the outcome code.
        const bool actorLayout = m.layout == SheetLayout::ActorRecipient;
        const ColumnMeaning firstCol = actorLayout ? ColumnMeaning::Actor : ColumnMeaning::Winner;
        const ColumnMeaning secondCol = actorLayout ? ColumnMeaning::Recipient : ColumnMeaning::Loser;
        const std::string_view outcome = cell(row, ColumnMeaning::Outcome);
        bool swap = false;
        if (actorLayout) {
            if (listed(m.winCodes, outcome)) e.outcome = Outcome::Decided;
            else if (listed(m.lossCodes, outcome)) swap = true;
            else if (listed(m.drawCodes, outcome)) e.outcome = Outcome::Draw;
            else
                row.problems.push_back({header(ColumnMeaning::Outcome),
                                        quotedValue(outcome) + " is not an outcome code of the mapping (" +
                                            codeList(m) + ")"});
        } else if (at[static_cast<size_t>(ColumnMeaning::Outcome)] >= 0) {
            if (listed(m.drawCodes, outcome)) e.outcome = Outcome::Draw;
            else if (!outcome.empty() && !listed(m.winCodes, outcome))
                row.problems.push_back({header(ColumnMeaning::Outcome),
                                        quotedValue(outcome) + " is not an outcome code of the mapping (" +
                                            codeList(m) + "; an empty cell is decided)"});
        }
        row.recipientWon = swap;
        const std::string groupCell(cell(row, ColumnMeaning::Group));
        e.group = at[static_cast<size_t>(ColumnMeaning::Group)] >= 0 ? groupCell : m.fileGroup;

        for (const ColumnMeaning col : {firstCol, secondCol}) {
            const std::string_view text = cell(row, col);
            std::string id;
            if (!text.empty()) {
                const NameResolver::Answer a = names.resolve(text);
                if (a.kind == NameResolver::Kind::Found) {
                    id = a.id;
                    if (a.choice && a.choice->addNew) {
                        auto it = std::find_if(newAnimals.begin(), newAnimals.end(),
                                               [&](const NewAnimal& n) { return n.choice == a.choice; });
                        if (it == newAnimals.end()) {
                            newAnimals.push_back({a.choice, row.line, header(col), std::nullopt, e.group});
                            it = newAnimals.end() - 1;
                        }
                        if (row.dateRead && (!it->first || e.date < *it->first)) {
                            it->first = e.date;
                            it->group = e.group;
                        }
                    }
                } else {
                    row.problems.push_back({header(col), a.message});
                    if (a.kind == NameResolver::Kind::Unknown) {
                        const std::string key = lowered(text);
                        auto [it, added] = unknownAt.emplace(key, t.unknownNames.size());
                        if (added) t.unknownNames.push_back({std::string(text), row.line, header(col), 0, std::nullopt});
                        UnknownName& u = t.unknownNames[it->second];
                        ++u.rows;
                        if (row.dateRead && (!u.firstDate || e.date < *u.firstDate)) u.firstDate = e.date;
                    }
                }
            }
            (col == firstCol ? e.winner : e.loser) = id.empty() ? std::string(text) : id;
        }
        if (swap) std::swap(e.winner, e.loser);

        const std::string_view time = cell(row, ColumnMeaning::Time);
        if (!time.empty()) e.time = parseTimeOfDay(normalisedTime(time));
        e.behaviour = std::string(cell(row, ColumnMeaning::Behaviour));
        e.observer = std::string(cell(row, ColumnMeaning::Observer));
        e.note = std::string(cell(row, ColumnMeaning::Note));
        for (const FieldProblem& p : row.problems) P.add(F, row.line, p.field, p.message);
    }

    // The plain import files: new animals (each in the group of its first
    // row, from its first date) and the rows that were read.
    std::ostringstream animalsText, residencesText, encountersText;
    CsvWriter aw(animalsText), rw(residencesText), ew(encountersText);
    aw.writeRow({"id", "name", "sex", "entry_date"});
    rw.writeRow({"animal", "group", "from"});
    int generatedAnimals = 0;
    for (const NewAnimal& n : newAnimals) {
        if (!n.first) continue; // its rows have unreadable dates, already reported
        if (n.group.empty()) {
            P.add(F, n.line, n.column,
                  "new animal " + quotedValue(n.choice->animalId) +
                      " needs a group: map a group column or give one group for the whole file");
            continue;
        }
        aw.writeRow({n.choice->animalId, n.choice->sheetName, toString(n.choice->sex), formatDate(*n.first)});
        rw.writeRow({n.choice->animalId, n.group, formatDate(*n.first)});
        t.newAnimalOrigin.emplace_back(n.line, n.column);
        ++generatedAnimals;
    }
    ew.writeRow({"date", "time", "winner", "loser", "outcome", "behaviour", "group", "observer", "note"});
    for (size_t i = 0; i < t.rows.size(); ++i) {
        const SheetRow& row = t.rows[i];
        if (!row.problems.empty() || !row.dateRead) continue;
        const Encounter& e = row.encounter;
        const std::string_view time = cell(row, ColumnMeaning::Time);
        ew.writeRow({formatDate(e.date), time.empty() ? std::string() : normalisedTime(time), e.winner, e.loser,
                     toString(e.outcome), e.behaviour, e.group, e.observer, e.note});
        t.encounterRow.push_back(i);
    }
    if (generatedAnimals > 0) {
        t.input.animals = ImportSource{F + kAnimalsSuffix, animalsText.str()};
        t.input.residences = ImportSource{F + kResidencesSuffix, residencesText.str()};
    }
    t.input.encounters = ImportSource{F + kEncountersSuffix, encountersText.str()};
    return t;
}

ImportProblems problemsInSheetTerms(const SheetTranslation& t, const ImportProblems& problems)
{
    // Generated lines: encounter rows hold no line breaks but notes might;
    // find each generated row's first line by reading the text again.
    std::map<int, size_t> encounterAt;
    if (t.input.encounters) {
        CsvReader reader(t.input.encounters->text);
        std::vector<std::string_view> f;
        reader.next(f);
        for (size_t i = 0; reader.next(f) && i < t.encounterRow.size(); ++i) encounterAt[reader.line()] = t.encounterRow[i];
    }
    std::vector<ImportProblem> all;
    for (const ImportProblem& p : t.problems.list()) all.push_back(p);
    const std::string sheetName =
        t.input.encounters ? withoutSuffix(t.input.encounters->name, kEncountersSuffix) : std::string();
    for (const ImportProblem& p : problems.list()) {
        ImportProblem q = p;
        if (endsWith(p.file, kEncountersSuffix)) {
            q.file = sheetName;
            if (auto it = encounterAt.find(p.line); it != encounterAt.end()) {
                const SheetRow& row = t.rows[it->second];
                q.line = row.line;
                // The sheet's own header for the column named.
                auto found = t.columnHeader.find(p.column);
                if (p.column == "winner" || p.column == "loser") {
                    const bool winnerIsSecond = row.recipientWon;
                    const bool second = (p.column == "loser") != winnerIsSecond;
                    q.column = second ? t.secondHeader : t.firstHeader;
                } else if (found != t.columnHeader.end()) {
                    q.column = found->second;
                }
            }
        } else if (endsWith(p.file, kAnimalsSuffix) || endsWith(p.file, kResidencesSuffix)) {
            q.file = sheetName;
            const size_t index = p.line >= 2 ? static_cast<size_t>(p.line - 2) : 0;
            if (index < t.newAnimalOrigin.size()) {
                q.line = t.newAnimalOrigin[index].first;
                q.column = t.newAnimalOrigin[index].second;
                q.message = "new animal: " + (p.column.empty() ? std::string() : p.column + ": ") + p.message;
            }
        }
        all.push_back(std::move(q));
    }
    std::stable_sort(all.begin(), all.end(), [](const ImportProblem& a, const ImportProblem& b) { return a.line < b.line; });
    ImportProblems out;
    for (ImportProblem& p : all) out.add(p.file, p.line, std::move(p.column), std::move(p.message));
    return out;
}

ImportPlan planSheetImport(const ImportMapping& mapping, const SheetSource& sheet,
                           const std::vector<Animal>& existingAnimals,
                           const std::vector<Residence>& existingResidences, Day today)
{
    const SheetTranslation t = translateSheet(mapping, sheet, existingAnimals);
    ImportPlan plan;
    if (t.input.encounters) plan = planImport(existingAnimals, existingResidences, t.input, today);
    if (!t.problems.empty() || !plan.ok()) {
        ImportPlan failed;
        failed.problems = problemsInSheetTerms(t, plan.problems);
        return failed;
    }
    return plan;
}

ImportResult importSheet(ColonyStore& store, const ImportMapping& mapping, const std::string& sheetPath, Day today)
{
    SheetImportRequest request;
    request.mapping = mapping;
    request.sheet.name = sheetPath;
    try {
        request.sheet.text = readWholeFile(sheetPath);
    } catch (const std::exception&) {
        ImportResult result;
        result.problems.add(sheetPath, 0, "", "cannot be read (no such file, or no permission to read it)");
        return result;
    }
    return importSheet(store, request, today);
}

ImportResult importSheet(ColonyStore& store, const SheetImportRequest& request, Day today)
{
    ImportResult result;
    ImportInput files = request.files;
    files.encounters.reset();

    // Every check runs on the colony as read inside the write transaction.
    const bool bulk = moreLinesThan(request.sheet.text, ColonyStore::kBulkEncounters);
    WriteTransaction tx(store, bulk ? WriteTransaction::Size::CheckedBulk : WriteTransaction::Size::Small);
    std::vector<Animal> animals = store.loadAnimals();
    std::vector<Residence> residences = store.loadResidences();
    const std::int64_t epoch = importEpoch(store);

    // First the plain files; the sheet is read only when they pass (its names may be their animals).
    ImportPlan first;
    if (files.animals || files.residences) {
        first = planImport(animals, residences, files, today);
        if (!first.ok()) {
            result.problems = std::move(first.problems);
            return result;
        }
        animals.insert(animals.end(), first.animals.begin(), first.animals.end());
        residences.insert(residences.end(), first.residences.begin(), first.residences.end());
    }

    // Then the sheet, against the colony and the files' records.
    const SheetTranslation t = translateSheet(request.mapping, request.sheet, animals);
    ImportPlan second;
    if (t.input.encounters) second = planImport(animals, residences, t.input, today);
    if (!t.problems.empty() || !t.input.encounters || !second.ok()) {
        result.problems = problemsInSheetTerms(t, second.problems);
        return result;
    }

    deriveUids(first, epoch);
    deriveUids(second, epoch);
    insertAnimals(store, first.animals);
    insertAnimals(store, second.animals);
    insertResidences(store, first.residences);
    insertResidences(store, second.residences);
    EncounterAppender out(store, tx);
    for (Encounter& e : second.encounters) out.add(e);
    out.finish("import of " + request.sheet.name);
    if (request.save) {
        try {
            store.setSetting(kMappingKeyPrefix + request.save->name, request.save->text);
        } catch (const std::exception& error) {
            result.problems.add(store.path(), 0, "",
                                "the mapping " + quotedValue(request.save->name) + " could not be saved (" +
                                    error.what() + ")");
            return result; // the transaction rolls back: nothing is imported either
        }
    }
    tx.commit();
    result.animals = first.animals.size() + second.animals.size();
    result.residences = first.residences.size() + second.residences.size();
    result.encounters = static_cast<std::size_t>(out.count());
    return result;
}

} // namespace hierloom::core
