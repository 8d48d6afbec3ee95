// SPDX-License-Identifier: GPL-3.0-or-later
#include "core/store/import_mapping.h"

#include "core/base/csv_columns.h"
#include "core/base/csv_reader.h"
#include "core/base/csv_writer.h"

#include <algorithm>
#include <sstream>

namespace hierloom::core {

namespace {

constexpr std::array<const char*, kColumnMeanings> kMeaningNames{
    "date", "time", "winner", "loser", "actor", "recipient", "outcome", "behaviour", "group", "observer", "note"};

char lower(char c) { return (c >= 'A' && c <= 'Z') ? static_cast<char>(c - 'A' + 'a') : c; }

template <typename E, size_t N>
std::optional<E> parseWord(std::string_view text, const std::array<E, N>& values)
{
    for (E v : values)
        if (sameSheetText(text, toString(v))) return v;
    return std::nullopt;
}

} // namespace

bool sameSheetText(std::string_view a, std::string_view b)
{
    a = trimSpaces(a);
    b = trimSpaces(b);
    if (a.size() != b.size()) return false;
    for (size_t i = 0; i < a.size(); ++i)
        if (lower(a[i]) != lower(b[i])) return false;
    return true;
}

const char* toString(ColumnMeaning meaning) { return kMeaningNames[static_cast<size_t>(meaning)]; }

std::optional<ColumnMeaning> parseColumnMeaning(std::string_view text)
{
    for (size_t i = 0; i < kMeaningNames.size(); ++i)
        if (sameSheetText(text, kMeaningNames[i])) return static_cast<ColumnMeaning>(i);
    return std::nullopt;
}

const char* toString(SheetLayout layout)
{
    return layout == SheetLayout::ActorRecipient ? "actor-recipient" : "winner-loser";
}

const char* toString(AnimalNaming naming) { return naming == AnimalNaming::Names ? "names" : "ids"; }

const char* toString(SheetDelimiter delimiter)
{
    switch (delimiter) {
    case SheetDelimiter::Comma: return "comma";
    case SheetDelimiter::Tab: return "tab";
    case SheetDelimiter::Semicolon: return "semicolon";
    case SheetDelimiter::Auto: break;
    }
    return "auto";
}

bool ImportMapping::operator==(const ImportMapping& o) const
{
    auto sameNames = [](const std::vector<NameChoice>& a, const std::vector<NameChoice>& b) {
        return std::equal(a.begin(), a.end(), b.begin(), b.end(), [](const NameChoice& x, const NameChoice& y) {
            return x.sheetName == y.sheetName && x.animalId == y.animalId && x.addNew == y.addNew && x.sex == y.sex;
        });
    };
    return name == o.name && delimiter == o.delimiter && layout == o.layout && naming == o.naming &&
           dates == o.dates && columns == o.columns && fileGroup == o.fileGroup && winCodes == o.winCodes &&
           lossCodes == o.lossCodes && drawCodes == o.drawCodes && sameNames(names, o.names);
}

std::vector<std::string> mappingProblems(const ImportMapping& m)
{
    std::vector<std::string> out;
    auto need = [&](ColumnMeaning meaning, const char* why) {
        if (trimSpaces(m.column(meaning)).empty())
            out.push_back(std::string("no column is the ") + toString(meaning) + " (" + why + ")");
    };
    auto unused = [&](ColumnMeaning meaning) {
        if (!trimSpaces(m.column(meaning)).empty())
            out.push_back(std::string("a ") + toString(meaning) + " column is not used in a " + toString(m.layout) +
                          " sheet");
    };
    need(ColumnMeaning::Date, "every encounter needs its date");
    if (m.layout == SheetLayout::WinnerLoser) {
        need(ColumnMeaning::Winner, "a winner-loser sheet needs both");
        need(ColumnMeaning::Loser, "a winner-loser sheet needs both");
        unused(ColumnMeaning::Actor);
        unused(ColumnMeaning::Recipient);
        if (!m.lossCodes.empty()) out.push_back("loss codes mean nothing in a winner-loser sheet");
    } else {
        need(ColumnMeaning::Actor, "an actor-recipient sheet needs the actor, the recipient and the outcome");
        need(ColumnMeaning::Recipient, "an actor-recipient sheet needs the actor, the recipient and the outcome");
        need(ColumnMeaning::Outcome, "an actor-recipient sheet needs the actor, the recipient and the outcome");
        unused(ColumnMeaning::Winner);
        unused(ColumnMeaning::Loser);
        if (m.winCodes.empty() && m.lossCodes.empty() && m.drawCodes.empty())
            out.push_back("no outcome codes are given (which codes mean the actor won, lost or drew)");
    }
    // A header given two meanings.
    for (size_t i = 0; i < m.columns.size(); ++i)
        for (size_t j = i + 1; j < m.columns.size(); ++j)
            if (!trimSpaces(m.columns[i]).empty() && sameSheetText(m.columns[i], m.columns[j]))
                out.push_back("column " + quotedValue(m.columns[i]) + " is given two meanings, " + kMeaningNames[i] +
                              " and " + kMeaningNames[j]);
    if (!trimSpaces(m.column(ColumnMeaning::Group)).empty() && !trimSpaces(m.fileGroup).empty())
        out.push_back("both a group column and one group for the whole file are given");
    // A code in two lists.
    const std::array<std::pair<const char*, const std::vector<std::string>*>, 3> lists{
        {{"win", &m.winCodes}, {"loss", &m.lossCodes}, {"draw", &m.drawCodes}}};
    for (size_t i = 0; i < lists.size(); ++i)
        for (size_t j = i; j < lists.size(); ++j)
            for (size_t a = 0; a < lists[i].second->size(); ++a)
                for (size_t b = (i == j ? a + 1 : 0); b < lists[j].second->size(); ++b)
                    if (sameSheetText((*lists[i].second)[a], (*lists[j].second)[b]))
                        out.push_back("outcome code " + quotedValue((*lists[i].second)[a]) + " is listed as " +
                                      lists[i].first + " and as " + lists[j].first);
    for (size_t i = 0; i < m.names.size(); ++i) {
        if (trimSpaces(m.names[i].sheetName).empty()) out.push_back("a name choice has no name");
        if (trimSpaces(m.names[i].animalId).empty())
            out.push_back("name " + quotedValue(m.names[i].sheetName) + " is given no animal id");
        for (size_t j = i + 1; j < m.names.size(); ++j)
            if (sameSheetText(m.names[i].sheetName, m.names[j].sheetName))
                out.push_back("name " + quotedValue(m.names[i].sheetName) + " is chosen for twice");
    }
    return out;
}

MappingFile readMappingFile(const std::string& fileName, std::string_view text)
{
    MappingFile result;
    ImportMapping& m = result.mapping;
    ImportProblems& P = result.problems;
    if (!isValidUtf8(text)) {
        P.add(fileName, 0, "", "is not UTF-8 text");
        return result;
    }
    enum { Entry, Key, Value, Extra };
    CsvColumns cols({{"entry", true}, {"key", true}, {"value", true}, {"extra", false}});
    CsvReader reader(text);
    std::vector<std::string_view> f;
    if (!reader.next(f)) {
        P.add(fileName, reader.line(), "", reader.error().empty() ? "is empty; it needs a header row" : reader.error());
        return result;
    }
    if (!cols.matchHeader(f, fileName, P)) return result;
    while (reader.next(f)) {
        const int line = reader.line();
        if (f.size() != cols.width()) {
            P.add(fileName, line, "",
                  "has " + std::to_string(f.size()) + " fields but the header has " + std::to_string(cols.width()));
            continue;
        }
        const std::string entry(cols.field(f, Entry));
        const std::string key(cols.field(f, Key));
        const std::string value(cols.field(f, Value));
        const std::string extra(cols.field(f, Extra));
        auto bad = [&](const char* column, const std::string& message) { P.add(fileName, line, column, message); };
        if (entry == "mapping") {
            m.name = value;
        } else if (entry == "delimiter") {
            constexpr std::array<SheetDelimiter, 4> all{SheetDelimiter::Auto, SheetDelimiter::Comma,
                                                        SheetDelimiter::Tab, SheetDelimiter::Semicolon};
            if (auto d = parseWord(value, all)) m.delimiter = *d;
            else bad("value", quotedValue(value) + " must be auto, comma, tab or semicolon");
        } else if (entry == "layout") {
            constexpr std::array<SheetLayout, 2> all{SheetLayout::WinnerLoser, SheetLayout::ActorRecipient};
            if (auto l = parseWord(value, all)) m.layout = *l;
            else bad("value", quotedValue(value) + " must be winner-loser or actor-recipient");
        } else if (entry == "animals") {
            constexpr std::array<AnimalNaming, 2> all{AnimalNaming::Ids, AnimalNaming::Names};
            if (auto n = parseWord(value, all)) m.naming = *n;
            else bad("value", quotedValue(value) + " must be ids or names");
        } else if (entry == "dates") {
            if (auto d = parseDateOrder(value)) m.dates = *d;
            else bad("value", quotedValue(value) + " must be iso, day-month-year, month-day-year or ask");
        } else if (entry == "column") {
            if (auto meaning = parseColumnMeaning(key)) {
                if (value.empty()) bad("value", "is empty; name the sheet's column header");
                else m.column(*meaning) = value;
            } else {
                bad("key", quotedValue(key) +
                               " is not a column meaning (date, time, winner, loser, actor, recipient, outcome, "
                               "behaviour, group, observer, note)");
            }
        } else if (entry == "group") {
            m.fileGroup = value;
        } else if (entry == "code") {
            if (key == "win") m.winCodes.push_back(value);
            else if (key == "loss") m.lossCodes.push_back(value);
            else if (key == "draw") m.drawCodes.push_back(value);
            else bad("key", quotedValue(key) + " must be win, loss or draw");
        } else if (entry == "animal" || entry == "new_animal") {
            NameChoice c{key, value, entry == "new_animal", Sex::Unknown};
            if (c.addNew) {
                const auto sex = parseSex(extra);
                if (!sex || extra.empty()) bad("extra", quotedValue(extra) + " must be F, M or U (the new animal's sex)");
                else c.sex = *sex;
            }
            m.names.push_back(std::move(c));
        } else {
            bad("entry", quotedValue(entry) +
                             " is not a mapping entry (mapping, delimiter, layout, animals, dates, column, group, "
                             "code, animal, new_animal)");
        }
    }
    if (!reader.error().empty()) P.add(fileName, reader.line(), "", reader.error());
    if (P.empty())
        for (const std::string& problem : mappingProblems(m)) P.add(fileName, 0, "", problem);
    return result;
}

std::string writeMappingFile(const ImportMapping& m)
{
    std::ostringstream out;
    CsvWriter w(out);
    w.writeRow({"entry", "key", "value", "extra"});
    w.writeRow({"mapping", "", m.name, ""});
    w.writeRow({"delimiter", "", toString(m.delimiter), ""});
    w.writeRow({"layout", "", toString(m.layout), ""});
    w.writeRow({"animals", "", toString(m.naming), ""});
    w.writeRow({"dates", "", toString(m.dates), ""});
    for (size_t i = 0; i < m.columns.size(); ++i)
        if (!m.columns[i].empty()) w.writeRow({"column", kMeaningNames[i], m.columns[i], ""});
    if (!m.fileGroup.empty()) w.writeRow({"group", "", m.fileGroup, ""});
    for (const std::string& c : m.winCodes) w.writeRow({"code", "win", c, ""});
    for (const std::string& c : m.lossCodes) w.writeRow({"code", "loss", c, ""});
    for (const std::string& c : m.drawCodes) w.writeRow({"code", "draw", c, ""});
    for (const NameChoice& c : m.names)
        w.writeRow({c.addNew ? "new_animal" : "animal", c.sheetName, c.animalId, c.addNew ? toString(c.sex) : ""});
    return out.str();
}

} // namespace hierloom::core
