// SPDX-License-Identifier: GPL-3.0-or-later
#include "core/store/colony_csv_export.h"
#include "core/base/csv_writer.h"

#include <algorithm>
#include <numeric>

namespace hierloom::core {
namespace {

/// The uid column is written, last, only when the records carry uids (an
/// exported colony does; the generated demo files do not), so that
/// importing an export keeps every record's identity for later merges.
template <typename Record>
bool hasUids(const std::vector<Record>& records)
{
    return std::any_of(records.begin(), records.end(), [](const Record& r) { return !r.uid.empty(); });
}

std::vector<std::string> withUid(std::vector<std::string> row, bool uids, const std::string& uid)
{
    if (uids) row.push_back(uid);
    return row;
}

} // namespace

void writeAnimalsCsv(std::ostream& out, const Colony& colony)
{
    CsvWriter csv(out);
    const bool uids = hasUids(colony.animals);
    csv.writeRow(withUid({"id", "name", "sex", "birth_date", "mother", "father", "entry_date", "entry_type",
                          "exit_date", "exit_type"},
                         uids, "uid"));
    for (const Animal& a : colony.animals)
        csv.writeRow(withUid({a.id, a.name, toString(a.sex), formatDate(a.birth), a.mother, a.father,
                              formatDate(a.entry), toString(a.entryType), formatDate(a.exit), toString(a.exitType)},
                             uids, a.uid));
}

void writeResidencesCsv(std::ostream& out, const Colony& colony)
{
    CsvWriter csv(out);
    const bool uids = hasUids(colony.residences);
    csv.writeRow(withUid({"animal", "group", "from", "to"}, uids, "uid"));
    for (const Residence& r : colony.residences)
        csv.writeRow(withUid({r.animal, r.group, formatDate(r.from), formatDate(r.to)}, uids, r.uid));
}

void writeEncountersCsv(std::ostream& out, const Colony& colony)
{
    CsvWriter csv(out);
    const bool uids = hasUids(colony.encounters);
    // The supporter columns come after the uid, and only when some encounter
    // has supporters, so a colony without them exports as it always did.
    const bool support = hasSupporters(colony.encounters);
    std::vector<std::string> header =
        withUid({"date", "time", "winner", "loser", "outcome", "behaviour", "group", "observer", "note"}, uids, "uid");
    if (support) header.insert(header.end(), {"winner_support", "loser_support"});
    csv.writeRow(header);
    // Entry order: seq ascending, ties (equal seq) kept as stored.
    std::vector<size_t> order(colony.encounters.size());
    std::iota(order.begin(), order.end(), size_t{0});
    std::stable_sort(order.begin(), order.end(), [&](size_t x, size_t y) {
        return colony.encounters[x].seq < colony.encounters[y].seq;
    });
    for (size_t i : order) {
        const Encounter& e = colony.encounters[i];
        std::vector<std::string> row =
            withUid({formatDate(e.date), e.time ? formatTimeOfDay(*e.time) : std::string(), e.winner, e.loser,
                     toString(e.outcome), e.behaviour, e.group, e.observer, e.note},
                    uids, e.uid);
        if (support) row.insert(row.end(), {joinSupporters(e.winnerSupport), joinSupporters(e.loserSupport)});
        csv.writeRow(row);
    }
}

} // namespace hierloom::core
