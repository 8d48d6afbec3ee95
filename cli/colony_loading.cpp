// SPDX-License-Identifier: GPL-3.0-or-later
#include "cli/colony_loading.h"

#include "cli/checked_output.h"

#include "core/store/analysis_settings_store.h"
#include "core/store/colony_store.h"
#include "core/store/compact_encounter_loader.h"

namespace hierloom::cli {

using namespace hierloom::core;

ColonyStore openColony(CommandContext& ctx, const std::string& path)
{
    return ctx.checked ? ctx.checked->open(path) : ColonyStore::open(path, ColonyStore::Mode::ReadOnly);
}

LoadedColony loadColony(CommandContext& ctx, const std::string& path)
{
    return loadColony(ctx, path, EncounterScope{});
}

LoadedColony loadColony(CommandContext& ctx, const std::string& path, EncounterScope scope, bool needLastDay)
{
    const ColonyStore store = openColony(ctx, path);
    LoadedColony out;
    out.colony.animals = store.loadAnimals();
    out.colony.residences = store.loadResidences();
    scope.uids = false; // no command that analyses prints or compares encounter uids
    out.colony.encounters = store.loadEncounters(scope);
    out.colony.reindex();
    out.where = ResidenceIndex(out.colony.animals, out.colony.residences);
    out.settings = readAnalysisSettings(store);
    if (scope.everything()) {
        for (const Encounter& e : out.colony.encounters)
            if (!out.lastDay || e.date > *out.lastDay) out.lastDay = e.date;
    } else if (needLastDay || out.settings.windowDays > 0) {
        out.lastDay = store.lastEncounterDay();
    }
    return out;
}

LoadedColony loadCompactColony(CommandContext& ctx, const std::string& path, EncounterScope scope, bool needLastDay)
{
    const ColonyStore store = openColony(ctx, path);
    LoadedColony out;
    out.colony.animals = store.loadAnimals();
    out.colony.residences = store.loadResidences();
    out.compact = loadCompactEncounters(store, scope);
    out.colony.reindex();
    out.where = ResidenceIndex(out.colony.animals, out.colony.residences);
    out.settings = readAnalysisSettings(store);
    if (scope.everything()) {
        for (const CompactEncounter& e : out.compact.records)
            if (!out.lastDay || e.date > *out.lastDay) out.lastDay = e.date;
    } else if (needLastDay || out.settings.windowDays > 0) {
        out.lastDay = store.lastEncounterDay();
    }
    return out;
}

EncounterScope scopeOf(const WindowOptions& o)
{
    EncounterScope scope;
    scope.group = o.group;
    scope.from = parseDate(o.from);
    scope.to = parseDate(o.to);
    return scope;
}

SelectionOptions selectionOf(const WindowOptions& o, const LoadedColony& loaded)
{
    SelectionOptions s;
    s.from = optionDate(o.from, "--from");
    s.to = optionDate(o.to, "--to");
    if (s.from && s.to && *s.from > *s.to) throw BadInputError("--from " + o.from + " is after --to " + o.to);
    s.group = o.group;
    if (!s.group.empty() && loaded.where.group(s.group) < 0) {
        std::string known;
        for (const auto& g : loaded.where.groups()) known += (known.empty() ? "" : ", ") + g;
        throw BadInputError("--group: no group named '" + s.group + "' (groups: " + (known.empty() ? "none" : known) + ")");
    }
    s.draws = o.draws.empty() ? loaded.settings.elo.draws : *parseDrawPolicy(o.draws);
    return s;
}

} // namespace hierloom::cli
