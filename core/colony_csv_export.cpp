// SPDX-License-Identifier: GPL-3.0-or-later
#include "core/colony_csv_export.h"
#include "core/csv_writer.h"

#include <algorithm>
#include <numeric>

namespace hierloom::core {
namespace {

std::string dateText(const std::optional<Day>& d) { return d ? formatDate(*d) : std::string(); }

} // namespace

void writeAnimalsCsv(std::ostream& out, const Colony& colony)
{
    CsvWriter csv(out);
    csv.writeRow({"id", "name", "sex", "birth_date", "mother", "father", "entry_date", "entry_type",
                  "exit_date", "exit_type"});
    for (const Animal& a : colony.animals)
        csv.writeRow({a.id, a.name, toString(a.sex), dateText(a.birth), a.mother, a.father,
                      dateText(a.entry), toString(a.entryType), dateText(a.exit), toString(a.exitType)});
}

void writeResidencesCsv(std::ostream& out, const Colony& colony)
{
    CsvWriter csv(out);
    csv.writeRow({"animal", "group", "from", "to"});
    for (const Residence& r : colony.residences)
        csv.writeRow({r.animal, r.group, formatDate(r.from), dateText(r.to)});
}

void writeEncountersCsv(std::ostream& out, const Colony& colony)
{
    CsvWriter csv(out);
    csv.writeRow({"date", "time", "winner", "loser", "outcome", "behaviour", "group", "observer", "note"});
    // Entry order: seq ascending, ties (equal seq) kept as stored.
    std::vector<size_t> order(colony.encounters.size());
    std::iota(order.begin(), order.end(), size_t{0});
    std::stable_sort(order.begin(), order.end(), [&](size_t x, size_t y) {
        return colony.encounters[x].seq < colony.encounters[y].seq;
    });
    for (size_t i : order) {
        const Encounter& e = colony.encounters[i];
        csv.writeRow({formatDate(e.date), e.time ? formatTimeOfDay(*e.time) : std::string(), e.winner, e.loser,
                      toString(e.outcome), e.behaviour, e.group, e.observer, e.note});
    }
}

} // namespace hierloom::core
