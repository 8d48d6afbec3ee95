// SPDX-License-Identifier: GPL-3.0-or-later
#include "core/store/colony_import.h"

#include "core/base/derived_uid.h"

#include "core/store/colony_store.h"
#include "core/base/csv_columns.h"
#include "core/base/bounded_queue.h"
#include "core/base/csv_reader.h"
#include "core/store/record_appender.h"
#include "core/base/residence_index.h"
#include "core/store/write_transaction.h"
#include "core/rules/animal_rules.h"
#include "core/rules/encounter_rules.h"
#include "core/rules/residence_rules.h"

#include <algorithm>
#include <exception>
#include <functional>
#include <thread>
#include <unordered_set>

namespace hierloom::core {

namespace {


/// Checks an optional uid cell: its form, and that no record already has it.
void checkUid(std::string_view uid, std::unordered_set<std::string>& seen, FieldProblems& row, std::string& out)
{
    if (uid.empty()) return;
    if (!isValidUid(uid)) {
        row.push_back({"uid", quotedValue(uid) + " is not a record uid (36 characters: 8-4-4-4-12 hex digits)"});
        return;
    }
    if (!seen.insert(std::string(uid)).second) {
        row.push_back({"uid", quotedValue(uid) + " is already in the colony or earlier in this file"});
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

/// Parses an optional date field: empty -> nullopt; not a date -> problem and
/// `unread |= flag` (whether it lies in the future is a rule, checked later).
std::optional<Day> dateField(std::string_view text, const char* column, FieldProblems& row, unsigned& unread,
                             unsigned flag)
{
    if (text.empty()) return std::nullopt;
    auto d = parseDate(text);
    if (!d) {
        row.push_back({column, quotedValue(text) + " is not a real date in the form YYYY-MM-DD"});
        unread |= flag;
    }
    return d;
}

/// Moves a row's problems into the import's list, located at file:line.
void report(FieldProblems& row, const std::string& file, int line, ImportProblems& problems)
{
    for (FieldProblem& p : row) problems.add(file, line, std::move(p.field), std::move(p.message));
    row.clear();
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
    AnimalContext ctx(existing, today);
    ctx.useFile(plan.animals, "this file or the colony");
    std::vector<int> lines;
    FieldProblems row;

    // The text of each row, then the rules about the record itself (core/rules/animal_rules.h).
    forEachRow(src, cols, P, [&](const std::vector<std::string_view>& f, int line) {
        Animal a;
        unsigned unread = 0;
        a.id = std::string(cols.field(f, Id));
        a.name = std::string(cols.field(f, Name));
        const auto sex = parseSex(cols.field(f, SexCol));
        if (!sex || cols.field(f, SexCol).empty()) row.push_back({"sex", quotedValue(cols.field(f, SexCol)) + " must be F, M or U"});
        else a.sex = *sex;
        a.birth = dateField(cols.field(f, Birth), "birth_date", row, unread, AnimalUnread::birth);
        a.mother = std::string(cols.field(f, Mother));
        a.father = std::string(cols.field(f, Father));
        a.entry = dateField(cols.field(f, Entry), "entry_date", row, unread, AnimalUnread::entry);
        if (!a.entry) a.entry = a.birth;
        if (const auto et = parseEntryType(cols.field(f, EntryTypeCol))) a.entryType = *et;
        else row.push_back({"entry_type", quotedValue(cols.field(f, EntryTypeCol)) + " must be born, introduced or founder"});
        a.exit = dateField(cols.field(f, Exit), "exit_date", row, unread, AnimalUnread::exit);
        if (const auto xt = parseExitType(cols.field(f, ExitTypeCol))) a.exitType = *xt;
        else {
            row.push_back({"exit_type", quotedValue(cols.field(f, ExitTypeCol)) + " must be died or removed"});
            unread |= AnimalUnread::exitType;
        }
        checkAnimalRow(a, ctx, row, unread);
        checkUid(cols.field(f, Uid), uids, row, a.uid);
        report(row, F, line, P);
        lines.push_back(line);
        plan.animals.push_back(std::move(a));
        if (!plan.animals.back().id.empty()) ctx.addFileRow(plan.animals.size() - 1, line);
        return true;
    });

    // Parents and loops, once every row is known.
    for (size_t i = 0; i < plan.animals.size() && !P.full(); ++i) {
        checkAnimalLinks(plan.animals[i], ctx, row);
        report(row, F, lines[i], P);
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
    std::vector<std::vector<StaySpan>> spans(allAnimals.size());
    for (const Residence& r : existing)
        if (auto it = ids.find(r.animal); it != ids.end())
            spans[static_cast<size_t>(it->second)].push_back({r.from, r.to.value_or(ResidenceIndex::openEnd), 0});
    FieldProblems row;

    // The text of each row, then the rules about the stay (core/rules/residence_rules.h).
    forEachRow(src, cols, P, [&](const std::vector<std::string_view>& f, int line) {
        Residence r;
        unsigned unread = 0;
        r.animal = std::string(cols.field(f, AnimalCol));
        r.group = std::string(cols.field(f, GroupCol));
        const auto from = dateField(cols.field(f, From), "from", row, unread, ResidenceUnread::from);
        if (cols.field(f, From).empty()) {
            row.push_back({"from", "is empty; the first day in the group is required"});
            unread |= ResidenceUnread::from;
        }
        if (from) r.from = *from;
        r.to = dateField(cols.field(f, To), "to", row, unread, ResidenceUnread::to);
        auto it = ids.find(r.animal);
        ResidenceContext ctx{today, nullptr, nullptr, "the colony or of the animals file"};
        if (it != ids.end()) {
            ctx.animal = &allAnimals[static_cast<size_t>(it->second)];
            ctx.others = &spans[static_cast<size_t>(it->second)];
        }
        checkUid(cols.field(f, Uid), uids, row, r.uid);
        if (checkStay(r, ctx, row, unread))
            spans[static_cast<size_t>(it->second)].push_back({r.from, r.to.value_or(ResidenceIndex::openEnd), line});
        report(row, F, line, P);
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
    enum { DateCol, Time, Winner, Loser, OutcomeCol, Behaviour, GroupCol, Observer, Note, Uid, WinnerSupport, LoserSupport };
    CsvColumns cols({{"date", true}, {"time", false}, {"winner", true}, {"loser", true}, {"outcome", false},
                     {"behaviour", false}, {"group", false}, {"observer", false}, {"note", false}, {"uid", false},
                     {"winner_support", false}, {"loser_support", false}});
    const std::string& F = src.name;
    FieldProblems row; // reused: no allocation while rows pass
    forEachRow(src, cols, P, [&](const std::vector<std::string_view>& f, int line) {
        Encounter e;
        constexpr unsigned dateUnread = 1; // the only cell whose reading the encounter rules need to know of
        unsigned unread = 0;
        const std::string_view dateText = cols.field(f, DateCol);
        if (dateText.empty()) {
            row.push_back({"date", "is empty"});
            unread = dateUnread;
        } else if (const auto date = dateField(dateText, "date", row, unread, dateUnread)) {
            e.date = *date;
        }
        const std::string_view timeText = cols.field(f, Time);
        if (!timeText.empty() && !(e.time = parseTimeOfDay(timeText))) row.push_back({"time", notATimeOfDay(timeText)});
        if (const auto outcome = parseOutcome(cols.field(f, OutcomeCol))) e.outcome = *outcome;
        else row.push_back({"outcome", notAnOutcome(cols.field(f, OutcomeCol))});
        e.winner = std::string(cols.field(f, Winner));
        e.loser = std::string(cols.field(f, Loser));
        e.group = std::string(cols.field(f, GroupCol));
        if (const std::string_view cell = cols.field(f, WinnerSupport); !cell.empty()) e.winnerSupport = splitSupporters(cell);
        if (const std::string_view cell = cols.field(f, LoserSupport); !cell.empty()) e.loserSupport = splitSupporters(cell);
        e.behaviour = std::string(cols.field(f, Behaviour));
        e.observer = std::string(cols.field(f, Observer));
        e.note = std::string(cols.field(f, Note));
        const std::string* shared = checkEncounterRow(e, where, today, row, unread == 0);
        if (shared) e.group = *shared;
        checkUid(cols.field(f, Uid), uids, row, e.uid);
        if (!row.empty()) report(row, F, line, P);
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

std::int64_t importEpoch(const ColonyStore& store)
{
    if (!hasTable(store.handle(), "audit")) return 0;
    SqliteStatement q(store.handle(), "SELECT coalesce(max(id), 0) FROM audit");
    return q.step() ? q.integer(0) : 0;
}

UidBytes encounterUidPlace(std::int64_t epoch)
{
    return KeyHash().add("encounter\x1f").add(std::to_string(epoch)).bytes();
}

UidBytes encounterUidBytes(const Encounter& e, const UidBytes& place, std::size_t row)
{
    // The key: each field's text followed by a unit separator.
    constexpr char sep = '\x1f';
    KeyHash key;
    key.add(formatDate(e.date)).add(sep);
    if (e.time) key.add(formatTimeOfDay(*e.time));
    key.add(sep).add(e.winner).add(sep).add(e.loser).add(sep).add(toString(e.outcome)).add(sep);
    key.add(e.behaviour).add(sep).add(e.group).add(sep).add(e.observer).add(sep).add(e.note).add(sep);
    return derivedRowUidBytes(place, row, key.bytes());
}

std::string encounterUid(const Encounter& e, std::int64_t epoch, std::size_t row)
{
    return uuidTextOf(encounterUidBytes(e, encounterUidPlace(epoch), row).data());
}

void deriveUids(ImportPlan& plan, std::int64_t epoch)
{
    const std::string prefix = '\x1f' + std::to_string(epoch) + '\x1f';
    for (Animal& a : plan.animals)
        if (a.uid.empty()) a.uid = derivedUid("animal" + prefix + a.id);
    for (Residence& r : plan.residences)
        if (r.uid.empty()) r.uid = derivedUid("residence" + prefix + r.animal + '\x1f' + formatDate(r.from));
    for (std::size_t i = 0; i < plan.encounters.size(); ++i)
        if (plan.encounters[i].uid.empty()) plan.encounters[i].uid = encounterUid(plan.encounters[i], epoch, i);
}

namespace {

/// Checks the encounters file on a second thread while this one writes the
/// rows that passed, in batches, through `out`. Rows stop flowing at the first
/// problem; the caller then rolls the transaction back.
void checkAndAppendEncounters(const ResidenceIndex& where, std::unordered_set<std::string>& uids,
                              const ImportSource& src, Day today, ImportProblems& problems, EncounterAppender& out,
                              std::int64_t epoch)
{
    constexpr std::size_t batchRows = 4096;
    /// Rows that passed, each with its derived uid (unused for a row whose file gave one).
    struct Batch {
        std::vector<Encounter> rows;
        std::vector<UidBytes> uids;
        Batch()
        {
            rows.reserve(batchRows);
            uids.reserve(batchRows);
        }
    };
    BoundedQueue<Batch> queue(8);
    std::exception_ptr checkFailed; // an exception must not escape the thread (std::terminate)
    std::thread checker([&] {
        try {
            Batch batch;
            const UidBytes place = encounterUidPlace(epoch);
            std::size_t row = 0;
            checkEncounters(where, uids, src, today, problems, [&](Encounter& e) {
                // The uid is derived here, off the writing thread, as the 16 bytes the file keeps.
                batch.uids.push_back(e.uid.empty() ? encounterUidBytes(e, place, row) : UidBytes{});
                ++row;
                batch.rows.push_back(std::move(e));
                if (batch.rows.size() < batchRows) return true;
                const bool open = queue.push(std::move(batch));
                batch = Batch();
                return open;
            });
            if (!batch.rows.empty()) queue.push(std::move(batch));
        } catch (...) {
            checkFailed = std::current_exception();
        }
        queue.close();
    });
    try {
        while (auto batch = queue.pop())
            out.add(batch->rows, batch->uids);
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
    return importInput(store, std::move(input), today);
}

ImportResult importInput(ColonyStore& store, ImportInput input, Day today)
{
    ImportResult result;
    std::optional<ImportSource> encounters = std::move(input.encounters);
    input.encounters.reset();

    const bool bulk = encounters && moreLinesThan(encounters->text, ColonyStore::kBulkEncounters);
    // The colony is read inside the write transaction, so what the checks saw
    // is what the rows are written against (no other program writes
    // meanwhile): the checks of this file cover every rule of the schema.
    WriteTransaction tx(store, bulk ? WriteTransaction::Size::CheckedBulk : WriteTransaction::Size::Small);
    const std::vector<Animal> existingAnimals = store.loadAnimals();
    const std::vector<Residence> existingResidences = store.loadResidences();
    const std::int64_t epoch = importEpoch(store);
    ImportPlan plan = planImport(existingAnimals, existingResidences, input, today);
    if (plan.ok()) {
        deriveUids(plan, epoch);
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
                                     today, plan.problems, out, epoch);
            if (plan.ok()) out.finish("import of " + encounters->name);
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
