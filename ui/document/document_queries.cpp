// SPDX-License-Identifier: GPL-3.0-or-later
#include "ui/document/document_queries.h"

#include "ui/document/colony_document.h"
#include "ui/document/qt_convert.h"

#include <set>

namespace hierloom::ui {

std::vector<std::string> groupsWithEncounters(const core::EncounterRecords& encounters, const core::ResidenceIndex& where)
{
    const core::CompactEncounters& compact = encounters.compact();
    std::vector<bool> used(static_cast<size_t>(compact.groups.size()), false);
    for (const core::CompactEncounter& r : compact.records) used[static_cast<size_t>(r.group)] = true;
    std::set<std::string> names;
    for (std::int32_t g = 1; g < compact.groups.size(); ++g) // code 0: no group
        if (used[static_cast<size_t>(g)]) names.insert(compact.groups.name(g));
    std::vector<std::string> out;
    for (const std::string& g : names)
        if (where.group(g) >= 0) out.push_back(g);
    return out;
}

QStringList groupsWithEncounters(ColonyDocument* document)
{
    QStringList out;
    // A large file still loading: which groups have encounters is known once
    // every one is read; until then every group is offered (and read when chosen).
    if (!document->isComplete()) {
        for (const std::string& g : document->residences().groups()) out << toQString(g);
        return out;
    }
    for (const std::string& g : groupsWithEncounters(document->encounters(), document->residences())) out << toQString(g);
    return out;
}

} // namespace hierloom::ui
