// SPDX-License-Identifier: GPL-3.0-or-later
#include "core/pedigree/rank_acquisition.h"

#include "core/pedigree/inheritance_prediction.h"
#include "core/ranks/compact_selection.h"
#include "core/ranks/encounter_selection.h"
#include "core/ranks/ordinal_ranks.h"

#include <algorithm>
#include <cmath>

namespace hierloom::core {

namespace {

/// a ranks above b when its rating is higher, or equal within the rank tolerance and its id smaller.
bool ranksAbove(double ra, double rb, const std::string& a, const std::string& b)
{
    const double scale = std::max(std::fabs(ra), std::fabs(rb));
    if (std::fabs(ra - rb) <= kRankTieTolerance * scale) return a < b;
    return ra > rb;
}

SelectionOptions acquisitionSelection(const EloSettings& settings, const std::string& group, std::optional<Day> to)
{
    SelectionOptions s;
    s.group = group;
    s.to = to;
    s.draws = settings.draws;
    return s;
}

/// rankAcquisition of the selection acquisitionSelection made, from either form of the encounters.
std::vector<SisterOvertaking> acquisitionOf(const EncounterSelection& sel, const ResidenceIndex& where,
                                            const Matrilines& lines, const EloSettings& settings)
{
    const std::vector<EloDay> history = eloDailyHistory(sel.size(), sel.bouts, sel.days, settings);

    std::vector<SisterOvertaking> out;
    std::vector<int> mothers;
    for (int m = 0; m < lines.size(); ++m)
        if (lines.daughters(m).size() >= 2) mothers.push_back(m);
    std::sort(mothers.begin(), mothers.end(), [&](int a, int b) { return lines.id(a) < lines.id(b); });
    for (int m : mothers) {
        const std::vector<int> order = orderSiblings(lines, lines.daughters(m), SiblingRule::Youngest);
        std::vector<int> byId = order;
        std::sort(byId.begin(), byId.end(), [&](int a, int b) { return lines.id(a) < lines.id(b); });
        for (int d : byId) {
            const auto pos = std::find(order.begin(), order.end(), d) - order.begin();
            std::vector<int> older(order.begin() + pos + 1, order.end());
            std::sort(older.begin(), older.end(), [&](int a, int b) { return lines.id(a) < lines.id(b); });
            for (int o : older) {
                SisterOvertaking row;
                row.daughter = lines.id(d);
                row.olderSister = lines.id(o);
                row.mother = lines.id(m);
                const int sd = sel.indexOf(row.daughter), so = sel.indexOf(row.olderSister);
                const int wd = where.animal(row.daughter), wo = where.animal(row.olderSister);
                if (sd >= 0 && so >= 0 && wd >= 0 && wo >= 0) {
                    for (const EloDay& day : history) {
                        if (!day.rated[static_cast<size_t>(sd)] || !day.rated[static_cast<size_t>(so)]) continue;
                        if (!where.presentOn(wd, day.day) || !where.presentOn(wo, day.day)) continue;
                        row.compared = true;
                        const bool above = ranksAbove(day.rating[static_cast<size_t>(sd)],
                                                      day.rating[static_cast<size_t>(so)], row.daughter, row.olderSister);
                        row.aboveAtLastComparison = above;
                        if (above && !row.firstAbove) row.firstAbove = day.day;
                    }
                }
                if (row.firstAbove) {
                    if (const std::optional<Day> b = lines.birth(d)) {
                        row.ageYears = ageInYears(*b, *row.firstAbove);
                        row.ageDays = *row.firstAbove - *b;
                    }
                }
                out.push_back(std::move(row));
            }
        }
    }
    return out;
}

} // namespace

std::vector<SisterOvertaking> rankAcquisition(const Colony& colony, const ResidenceIndex& where,
                                              const Matrilines& lines, const EloSettings& settings,
                                              const std::string& group, std::optional<Day> to)
{
    return acquisitionOf(selectEncounters(colony, where, acquisitionSelection(settings, group, to)), where, lines,
                         settings);
}

std::vector<SisterOvertaking> rankAcquisition(const CompactEncounters& encounters, const std::vector<Animal>& animals,
                                              const ResidenceIndex& where, const Matrilines& lines,
                                              const EloSettings& settings, const std::string& group,
                                              std::optional<Day> to)
{
    return acquisitionOf(selectEncounters(encounters, animals, where, acquisitionSelection(settings, group, to)), where,
                         lines, settings);
}

} // namespace hierloom::core
