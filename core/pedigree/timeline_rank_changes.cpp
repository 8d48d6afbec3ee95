// SPDX-License-Identifier: GPL-3.0-or-later
#include "core/pedigree/timeline_rank_changes.h"

#include <algorithm>
#include <unordered_map>

namespace hierloom::core {

std::vector<TimelineRankChange> timelineRankChanges(const RankTimeline& t)
{
    const size_t nCheck = t.checkpoints.size();
    // Per checkpoint: (rank, female, point) of every female with a rank there.
    struct Entry {
        int rank;
        int female;
        int point;
    };
    std::vector<std::vector<Entry>> at(nCheck);
    for (size_t f = 0; f < t.females.size(); ++f) {
        const auto& points = t.females[f].points;
        for (size_t p = 0; p < points.size(); ++p) {
            if (!points[p].rank) continue;
            const auto it = std::lower_bound(t.checkpoints.begin(), t.checkpoints.end(), points[p].day);
            if (it == t.checkpoints.end() || *it != points[p].day) continue;
            at[static_cast<size_t>(it - t.checkpoints.begin())].push_back(
                {*points[p].rank, static_cast<int>(f), static_cast<int>(p)});
        }
    }
    std::vector<TimelineRankChange> out;
    std::vector<std::string> before, after;
    for (size_t k = 0; k < nCheck; ++k) {
        std::sort(at[k].begin(), at[k].end(), [](const Entry& a, const Entry& b) { return a.rank < b.rank; });
        after.clear();
        std::unordered_map<std::string, const Entry*> byId;
        for (const Entry& e : at[k]) {
            after.push_back(t.females[static_cast<size_t>(e.female)].animal);
            byId.emplace(after.back(), &e);
        }
        if (k > 0)
            for (RankChange& c : splitRankChanges(before, after)) {
                const Entry* e = byId.at(c.animal);
                out.push_back({e->female, e->point, static_cast<int>(k), std::move(c)});
            }
        std::swap(before, after);
    }
    return out;
}

} // namespace hierloom::core
