// SPDX-License-Identifier: GPL-3.0-or-later
#include "core/store/colony_import.h"

#include "core/store/colony_store.h"
#include "core/base/csv_columns.h"
#include "core/base/bounded_queue.h"
#include "core/base/csv_reader.h"
#include "core/store/record_appender.h"
#include "core/base/residence_index.h"
#include "core/store/write_transaction.h"

#include <algorithm>
#include <exception>
#include <functional>
#include <thread>
#include <unordered_set>

namespace hierloom::core {

namespace {


/// Checks an optional uid cell: its form, and that no record already has it.
void checkUid(std::string_view uid, std::unordered_set<std::string>& seen, const std::string& file, int line,
              ImportProblems& problems, std::string& out)
{
    if (uid.empty()) return;
    if (!isValidUid(uid)) {
        problems.add(file, line, "uid", quotedValue(uid) + " is not a record uid (36 characters: 8-4-4-4-12 hex digits)");
        return;
    }
    if (!seen.insert(std::string(uid)).second) {
        problems.add(file, line, "uid", quotedValue(uid) + " is already in the colony or earlier in this file");
        return;
    }
    out = std::string(uid);
}

/// Reports the first non-UTF-8 line of a file; false when the text is not UTF-8.
bool checkUtf8(const ImportSource& src, ImportProblems& problems)
{
    if (isValidUtf8(src.text)) return true;
    // Find the first bad line to point at it.
    int line = 1;
    size_t start = 0;
    while (start <= src.text.size()) {
        size_t end = src.text.find('\n', start);
        if (end == std::string::npos) end = src.text.size();
        if (!isValidUtf8(std::string_view(src.text).substr(start, end - start))) break;
        start = end + 1;
        ++line;
    }
    problems.add(src.name, line, "", "is not UTF-8 text (save the file as UTF-8 and import again)");
    return false;
}

/// Reads every data row of a file, calling `row(fields, line)` until it
/// returns false; reports malformed CSV.
void forEachRow(const ImportSource& src, CsvColumns& columns, ImportProblems& problems,
                const std::function<bool(const std::vector<std::string_view>&, int)>& row)
{
    if (!checkUtf8(src, problems)) return;
    CsvReader reader(src.text);
    std::vector<std::string_view> fields;
    if (!reader.next(fields)) {
        if (!reader.error().empty()) problems.add(src.name, reader.line(), "", reader.error());
        else problems.add(src.name, 0, "", "is empty; it needs a header row");
        return;
    }
    if (!columns.matchHeader(fields, src.name, problems)) return;
    while (reader.next(fields)) {
        if (fields.size() != columns.width()) {
            problems.add(src.name, reader.line(), "",
                         "has " + std::to_string(fields.size()) + " fields but the header has " +
                             std::to_string(columns.width()));
            if (problems.full()) return;
            continue;
        }
        if (!row(fields, reader.line()) || problems.full()) return;
    }
    if (!reader.error().empty()) problems.add(src.name, reader.line(), "", reader.error());
}

/// Parses an optional date field: empty -> nullopt; bad or future -> problem.
std::optional<Day> dateField(std::string_view text, Day today, const std::string& file, int line, const char* column,
                             ImportProblems& problems, bool& bad)
{
    if (text.empty()) return std::nullopt;
    auto d = parseDate(text);
    if (!d) {
        problems.add(file, line, column, quotedValue(text) + " is not a real date in the form YYYY-MM-DD");
        bad = true;
        return std::nullopt;
    }
    if (*d > today) {
        problems.add(file, line, column, quotedValue(text) + " is in the future");
        bad = true;
        return std::nullopt;
    }
    return d;
}

void planAnimals(const std::vector<Animal>& existing, const ImportSource& src, Day today, ImportPlan& plan)
{
    enum { Id, Name, SexCol, Birth, Mother, Father, Entry, EntryTypeCol, Exit, ExitTypeCol, Uid };
    CsvColumns cols({{"id", true}, {"name", false}, {"sex", true}, {"birth_date", false}, {"mother", false},
                     {"father", false}, {"entry_date", false}, {"entry_type", false}, {"exit_date", false},
                     {"exit_type", false}, {"uid", false}});
    std::unordered_set<std::string> uids;
    for (const Animal& a : existing) uids.insert(a.uid);
    ImportProblems& P = plan.problems;
    const std::string& F = src.name;
    IdIndex existingIds;
    for (size_t i = 0; i < existing.size(); ++i) existingIds.emplace(existing[i].id, static_cast<int>(i));
    IdIndex fileIds;
    std::vector<int> lines;

    forEachRow(src, cols, P, [&](const std::vector<std::string_view>& f, int line) {
        Animal a;
        bool bad = false;
        const std::string_view id = cols.field(f, Id);
        if (id.empty()) {
            P.add(F, line, "id", "is empty; every animal needs an id");
            bad = true;
        } else if (!isValidAnimalId(id)) {
            P.add(F, line, "id", quotedValue(id) + " must be 1-32 letters, digits, '_', '-' or '.'");
            bad = true;
        } else if (existingIds.count(id)) {
            P.add(F, line, "id", quotedValue(id) + " is already in the colony");
            bad = true;
        } else if (auto it = fileIds.find(id); it != fileIds.end()) {
            P.add(F, line, "id", quotedValue(id) + " appears twice (first on line " +
                                     std::to_string(lines[static_cast<size_t>(it->second)]) + ")");
            bad = true;
        }
        a.id = std::string(id);
        a.name = std::string(cols.field(f, Name));
        const auto sex = parseSex(cols.field(f, SexCol));
        if (!sex || cols.field(f, SexCol).empty()) {
            P.add(F, line, "sex", quotedValue(cols.field(f, SexCol)) + " must be F, M or U");
            bad = true;
        } else {
            a.sex = *sex;
        }
        a.birth = dateField(cols.field(f, Birth), today, F, line, "birth_date", P, bad);
        a.mother = std::string(cols.field(f, Mother));
        a.father = std::string(cols.field(f, Father));
        a.entry = dateField(cols.field(f, Entry), today, F, line, "entry_date", P, bad);
        if (!a.entry) a.entry = a.birth;
        const auto et = parseEntryType(cols.field(f, EntryTypeCol));
        if (!et) {
            P.add(F, line, "entry_type", quotedValue(cols.field(f, EntryTypeCol)) + " must be born, introduced or founder");
            bad = true;
        } else {
            a.entryType = *et;
        }
        a.exit = dateField(cols.field(f, Exit), today, F, line, "exit_date", P, bad);
        const auto xt = parseExitType(cols.field(f, ExitTypeCol));
        if (!xt) {
            P.add(F, line, "exit_type", quotedValue(cols.field(f, ExitTypeCol)) + " must be died or removed");
            bad = true;
        } else {
            a.exitType = *xt;
        }
        if (!cols.field(f, Exit).empty() && cols.field(f, ExitTypeCol).empty()) {
            P.add(F, line, "exit_type", "is required when exit_date is given (died or removed)");
            bad = true;
        }
        if (cols.field(f, Exit).empty() && !cols.field(f, ExitTypeCol).empty()) {
            P.add(F, line, "exit_date", "is required when exit_type is given");
            bad = true;
        }
        if (!a.birth && !a.entry && !bad) {
            P.add(F, line, "entry_date", "is needed when birth_date is empty (the day the animal joined)");
            bad = true;
        }
        if (a.birth && a.entry && *a.entry < *a.birth) {
            P.add(F, line, "entry_date", formatDate(*a.entry) + " is before the birth date " + formatDate(*a.birth));
            bad = true;
        }
        if (a.exit && a.entry && *a.exit < *a.entry) {
            P.add(F, line, "exit_date", formatDate(*a.exit) + " is before the entry date " + formatDate(*a.entry));
            bad = true;
        }
        checkUid(cols.field(f, Uid), uids, F, line, P, a.uid);
        if (!id.empty() && !fileIds.count(id)) fileIds.emplace(std::string(id), static_cast<int>(plan.animals.size()));
        lines.push_back(line);
        plan.animals.push_back(std::move(a));
        return true;
    });

    // Parents: known, of the right sex, born before their offspring.
    auto find = [&](const std::string& id) -> const Animal* {
        if (auto it = fileIds.find(id); it != fileIds.end()) return &plan.animals[static_cast<size_t>(it->second)];
        if (auto it = existingIds.find(id); it != existingIds.end()) return &existing[static_cast<size_t>(it->second)];
        return nullptr;
    };
    for (size_t i = 0; i < plan.animals.size() && !P.full(); ++i) {
        const Animal& a = plan.animals[i];
        const int line = lines[i];
        struct Parent {
            const std::string& id;
            const char* column;
            Sex sex;
            const char* word;
        };
        for (const Parent& p : {Parent{a.mother, "mother", Sex::Female, "female"},
                                Parent{a.father, "father", Sex::Male, "male"}}) {
            if (p.id.empty()) continue;
            const Animal* parent = find(p.id);
            if (p.id == a.id) P.add(F, line, p.column, quotedValue(p.id) + " is the animal itself");
            else if (!parent) P.add(F, line, p.column, quotedValue(p.id) + " is not an animal of this file or the colony");
            else if (parent->sex != p.sex)
                P.add(F, line, p.column, quotedValue(p.id) + " is not recorded as " + p.word);
            else if (parent->birth && a.birth && *parent->birth >= *a.birth)
                P.add(F, line, p.column, quotedValue(p.id) + " was born on " + formatDate(*parent->birth) +
                                             ", not before her offspring (" + formatDate(*a.birth) + ")");
        }
    }
    // No animal may be its own ancestor: walk parent links with colouring.
    std::vector<int> state(plan.animals.size(), 0);
    std::function<bool(size_t)> cyclic = [&](size_t i) -> bool {
        if (state[i] == 1) return true;
        if (state[i] == 2) return false;
        state[i] = 1;
        for (const std::string* parent : {&plan.animals[i].mother, &plan.animals[i].father}) {
            auto it = fileIds.find(*parent);
            if (it != fileIds.end() && cyclic(static_cast<size_t>(it->second))) return true;
        }
        state[i] = 2;
        return false;
    };
    for (size_t i = 0; i < plan.animals.size() && !P.full(); ++i) {
        if (state[i] != 0) continue;
        // The column whose link leads into the loop is the one reported.
        state[i] = 1;
        const char* column = nullptr;
        for (const auto& [parent, name] : {std::pair{&plan.animals[i].mother, "mother"}, std::pair{&plan.animals[i].father, "father"}}) {
            auto it = fileIds.find(*parent);
            if (it != fileIds.end() && cyclic(static_cast<size_t>(it->second))) {
                column = name;
                break;
            }
        }
        if (!column) state[i] = 2;
        else P.add(F, lines[i], column, quotedValue(plan.animals[i].id) + " would be its own ancestor (a loop of parent links)");
    }
}

void planResidences(const std::vector<Animal>& allAnimals, const std::vector<Residence>& existing,
                    const ImportSource& src, Day today, ImportPlan& plan)
{
    enum { AnimalCol, GroupCol, From, To, Uid };
    CsvColumns cols({{"animal", true}, {"group", true}, {"from", true}, {"to", false}, {"uid", false}});
    std::unordered_set<std::string> uids;
    for (const Residence& r : existing) uids.insert(r.uid);
    ImportProblems& P = plan.problems;
    const std::string& F = src.name;
    IdIndex ids;
    for (size_t i = 0; i < allAnimals.size(); ++i) ids.emplace(allAnimals[i].id, static_cast<int>(i));
    struct Span {
        Day from, to;
        int line; // 0 for rows already in the colony
    };
    std::vector<std::vector<Span>> spans(allAnimals.size());
    for (const Residence& r : existing)
        if (auto it = ids.find(r.animal); it != ids.end())
            spans[static_cast<size_t>(it->second)].push_back({r.from, r.to.value_or(ResidenceIndex::openEnd), 0});

    forEachRow(src, cols, P, [&](const std::vector<std::string_view>& f, int line) {
        bool bad = false;
        Residence r;
        const std::string_view id = cols.field(f, AnimalCol);
        auto it = ids.find(id);
        if (it == ids.end()) {
            P.add(F, line, "animal", quotedValue(id) + " is not an animal of the colony or of the animals file");
            bad = true;
        }
        r.animal = std::string(id);
        r.group = std::string(cols.field(f, GroupCol));
        if (r.group.empty()) {
            P.add(F, line, "group", "is empty");
            bad = true;
        }
        const auto from = dateField(cols.field(f, From), today, F, line, "from", P, bad);
        if (!from && cols.field(f, From).empty()) {
            P.add(F, line, "from", "is empty; the first day in the group is required");
            bad = true;
        }
        r.to = dateField(cols.field(f, To), today, F, line, "to", P, bad);
        if (from) r.from = *from;
        checkUid(cols.field(f, Uid), uids, F, line, P, r.uid);
        if (from && r.to && *r.to < *from) {
            P.add(F, line, "to", formatDate(*r.to) + " is before from " + formatDate(*from));
            bad = true;
        }
        if (!bad) {
            const Animal& a = allAnimals[static_cast<size_t>(it->second)];
            const auto start = lifeStart(a);
            if (start && r.from < *start) {
                P.add(F, line, "from", formatDate(r.from) + " is before " + a.id + " joined the colony (" +
                                           formatDate(*start) + ")");
                bad = true;
            } else if (a.exit && r.from > *a.exit) {
                P.add(F, line, "from", formatDate(r.from) + " is after " + a.id + " left the colony (" +
                                           formatDate(*a.exit) + ")");
                bad = true;
            } else if (a.exit && r.to && *r.to > *a.exit) {
                P.add(F, line, "to", formatDate(*r.to) + " is after " + a.id + " left the colony (" +
                                         formatDate(*a.exit) + ")");
                bad = true;
            }
        }
        if (!bad) {
            auto& mine = spans[static_cast<size_t>(it->second)];
            const Day to = r.to.value_or(ResidenceIndex::openEnd);
            for (const Span& s : mine)
                if (s.from <= to && r.from <= s.to) {
                    P.add(F, line, "from",
                          "this stay of " + r.animal + " overlaps " +
                              (s.line > 0 ? "the one on line " + std::to_string(s.line) : std::string("one already in the colony")) +
                              " (an animal lives in one group at a time)");
                    bad = true;
                    break;
                }
            mine.push_back({r.from, to, line});
        }
        plan.residences.push_back(std::move(r));
        return true;
    });
}

/// Checks every row of an encounters file, reporting problems into `P`.
/// While no problem has been found each good row goes to `accept`, which
/// returns false to stop reading.
void checkEncounters(const ResidenceIndex& where, std::unordered_set<std::string>& uids, const ImportSource& src,
                     Day today, ImportProblems& P, const std::function<bool(Encounter&)>& accept)
{
    enum { DateCol, Time, Winner, Loser, OutcomeCol, Behaviour, GroupCol, Observer, Note, Uid };
    CsvColumns cols({{"date", true}, {"time", false}, {"winner", true}, {"loser", true}, {"outcome", false},
                     {"behaviour", false}, {"group", false}, {"observer", false}, {"note", false}, {"uid", false}});
    const std::string& F = src.name;
    forEachRow(src, cols, P, [&](const std::vector<std::string_view>& f, int line) {
        bool bad = false;
        Encounter e;
        const std::string_view dateText = cols.field(f, DateCol);
        const auto date = dateField(dateText, today, F, line, "date", P, bad);
        if (!date && dateText.empty()) {
            P.add(F, line, "date", "is empty");
            bad = true;
        }
        if (date) e.date = *date;
        const std::string_view timeText = cols.field(f, Time);
        if (!timeText.empty()) {
            e.time = parseTimeOfDay(timeText);
            if (!e.time) {
                P.add(F, line, "time", quotedValue(timeText) + " is not a time of day in the form HH:MM (24 h)");
                bad = true;
            }
        }
        const std::string_view w = cols.field(f, Winner);
        const std::string_view l = cols.field(f, Loser);
        const int wi = where.animal(w);
        const int li = where.animal(l);
        if (wi < 0) P.add(F, line, "winner", w.empty() ? std::string("is empty") : quotedValue(w) + " is not an animal of the colony");
        if (li < 0) P.add(F, line, "loser", l.empty() ? std::string("is empty") : quotedValue(l) + " is not an animal of the colony");
        if (wi >= 0 && wi == li) P.add(F, line, "loser", quotedValue(l) + " is also the winner; an encounter needs two animals");
        bad = bad || wi < 0 || li < 0 || wi == li;
        const auto outcome = parseOutcome(cols.field(f, OutcomeCol));
        if (!outcome) {
            P.add(F, line, "outcome", quotedValue(cols.field(f, OutcomeCol)) + " must be decided or draw");
            bad = true;
        } else {
            e.outcome = *outcome;
        }
        const std::string_view groupText = cols.field(f, GroupCol);
        if (date && wi >= 0 && li >= 0 && wi != li) {
            int groups[2] = {-1, -1};
            const int who[2] = {wi, li};
            const char* column[2] = {"winner", "loser"};
            for (int k = 0; k < 2; ++k) {
                const std::string_view id = k == 0 ? w : l;
                if (!where.presentOn(who[k], *date)) {
                    P.add(F, line, column[k], quotedValue(id) + " was not alive in the colony on " + formatDate(*date));
                    bad = true;
                } else if ((groups[k] = where.groupOn(who[k], *date)) < 0) {
                    P.add(F, line, column[k], quotedValue(id) + " was in no group on " + formatDate(*date));
                    bad = true;
                }
            }
            if (!bad && groups[0] != groups[1]) {
                P.add(F, line, "loser", quotedValue(l) + " was in group " + quotedValue(where.groups()[static_cast<size_t>(groups[1])]) +
                                            " on " + formatDate(*date) + ", not with " + std::string(w) + " in " +
                                            quotedValue(where.groups()[static_cast<size_t>(groups[0])]));
                bad = true;
            }
            if (!bad) {
                const std::string& shared = where.groups()[static_cast<size_t>(groups[0])];
                if (!groupText.empty() && groupText != shared) {
                    P.add(F, line, "group", quotedValue(groupText) + " differs from the group both animals were in on " +
                                                formatDate(*date) + " (" + quotedValue(shared) + ")");
                    bad = true;
                }
                e.group = shared;
            }
        }
        e.winner = std::string(w);
        e.loser = std::string(l);
        e.behaviour = std::string(cols.field(f, Behaviour));
        e.observer = std::string(cols.field(f, Observer));
        e.note = std::string(cols.field(f, Note));
        checkUid(cols.field(f, Uid), uids, F, line, P, e.uid);
        return !P.empty() || accept(e);
    });
}

/// Where every animal, old or new, lived on each day.
ResidenceIndex residenceIndexOf(const std::vector<Animal>& existingAnimals,
                                const std::vector<Residence>& existingResidences, const ImportPlan& plan)
{
    std::vector<Animal> animals = existingAnimals;
    animals.insert(animals.end(), plan.animals.begin(), plan.animals.end());
    std::vector<Residence> residences = existingResidences;
    residences.insert(residences.end(), plan.residences.begin(), plan.residences.end());
    return ResidenceIndex(animals, residences);
}

/// Number of lines of a text (an upper bound on its data rows).
std::size_t lineCount(const std::string& text)
{
    return static_cast<std::size_t>(std::count(text.begin(), text.end(), '\n')) + 1;
}

} // namespace

ImportPlan planImport(const std::vector<Animal>& existingAnimals, const std::vector<Residence>& existingResidences,
                      const ImportInput& input, Day today, const std::unordered_set<std::string>& encounterUids)
{
    ImportPlan plan;
    if (input.animals) planAnimals(existingAnimals, *input.animals, today, plan);
    if (input.residences) {
        std::vector<Animal> all = existingAnimals;
        all.insert(all.end(), plan.animals.begin(), plan.animals.end());
        planResidences(all, existingResidences, *input.residences, today, plan);
    } else {
        // Without a residences file every new animal lives in group "main" from entry to exit.
        for (const Animal& a : plan.animals)
            if (const auto start = lifeStart(a)) plan.residences.push_back({a.id, "main", *start, a.exit, {}});
    }
    if (input.encounters && !plan.problems.full()) {
        std::unordered_set<std::string> uids = encounterUids;
        plan.encounters.reserve(lineCount(input.encounters->text));
        checkEncounters(residenceIndexOf(existingAnimals, existingResidences, plan), uids, *input.encounters, today,
                        plan.problems, [&](Encounter& e) {
                            plan.encounters.push_back(std::move(e));
                            return true;
                        });
    }
    if (!plan.ok()) {
        plan.animals.clear();
        plan.residences.clear();
        plan.encounters.clear();
    }
    return plan;
}

namespace {

/// Checks the encounters file on a second thread while this one writes the
/// rows that passed, in batches, through `out`. Rows stop flowing at the first
/// problem; the caller then rolls the transaction back.
void checkAndAppendEncounters(const ResidenceIndex& where, std::unordered_set<std::string>& uids,
                              const ImportSource& src, Day today, ImportProblems& problems, EncounterAppender& out)
{
    constexpr std::size_t batchRows = 4096;
    BoundedQueue<std::vector<Encounter>> queue(8);
    std::exception_ptr checkFailed; // an exception must not escape the thread (std::terminate)
    std::thread checker([&] {
        try {
            std::vector<Encounter> batch;
            batch.reserve(batchRows);
            checkEncounters(where, uids, src, today, problems, [&](Encounter& e) {
                // The uid is made here, off the writing thread.
                if (e.uid.empty()) e.uid = newUid();
                batch.push_back(std::move(e));
                if (batch.size() < batchRows) return true;
                const bool open = queue.push(std::move(batch));
                batch = {};
                batch.reserve(batchRows);
                return open;
            });
            if (!batch.empty()) queue.push(std::move(batch));
        } catch (...) {
            checkFailed = std::current_exception();
        }
        queue.close();
    });
    try {
        while (auto batch = queue.pop())
            for (Encounter& e : *batch) out.add(e);
    } catch (...) {
        queue.close();
        checker.join();
        throw;
    }
    checker.join();
    if (checkFailed) std::rethrow_exception(checkFailed);
}

} // namespace

ImportResult importFiles(ColonyStore& store, const ImportPaths& paths, Day today)
{
    ImportInput input;
    ImportResult result;
    auto read = [&](const std::string& path, std::optional<ImportSource>& slot) {
        if (path.empty()) return;
        try {
            slot = ImportSource{path, readWholeFile(path)};
        } catch (const std::exception&) {
            result.problems.add(path, 0, "", "cannot be read (no such file, or no permission to read it)");
        }
    };
    read(paths.animals, input.animals);
    read(paths.residences, input.residences);
    read(paths.encounters, input.encounters);
    if (!result.ok()) return result;
    std::optional<ImportSource> encounters = std::move(input.encounters);
    input.encounters.reset();

    const bool bulk = encounters && lineCount(encounters->text) > ColonyStore::kBulkEncounters;
    // The colony is read inside the write transaction, so what the checks saw
    // is what the rows are written against (no other program writes
    // meanwhile): the checks of this file cover every rule of the schema.
    WriteTransaction tx(store, bulk ? WriteTransaction::Size::CheckedBulk : WriteTransaction::Size::Small);
    const std::vector<Animal> existingAnimals = store.loadAnimals();
    const std::vector<Residence> existingResidences = store.loadResidences();
    ImportPlan plan = planImport(existingAnimals, existingResidences, input, today);
    if (plan.ok()) {
        insertAnimals(store, plan.animals);
        insertResidences(store, plan.residences);
    }
    if (encounters && !plan.problems.full()) {
        // Encounter uids are read only when the file carries them (an export being re-imported).
        std::unordered_set<std::string> uids;
        if (std::string_view(encounters->text).substr(0, encounters->text.find('\n')).find("uid") != std::string::npos)
            uids = store.encounterUids();
        if (plan.ok()) {
            EncounterAppender out(store, tx);
            checkAndAppendEncounters(residenceIndexOf(existingAnimals, existingResidences, plan), uids, *encounters,
                                     today, plan.problems, out);
            if (plan.ok()) out.finish("import of " + paths.encounters);
            result.encounters = static_cast<std::size_t>(out.count());
        } else {
            // Only to report every problem in one pass; nothing will be written.
            // planImport's encounter checks see the file's new animals (the
            // failed plan above has dropped them).
            input.encounters = std::move(encounters);
            plan = planImport(existingAnimals, existingResidences, input, today, uids);
        }
    }
    result.problems = std::move(plan.problems);
    if (!result.ok()) {
        result.encounters = 0;
        return result; // the transaction rolls back: nothing is written
    }
    tx.commit();
    result.animals = plan.animals.size();
    result.residences = plan.residences.size();
    return result;
}

} // namespace hierloom::core
