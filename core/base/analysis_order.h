// SPDX-License-Identifier: GPL-3.0-or-later
#pragma once
// The analysis order of docs/methods.md (date, then time with untimed last,
// then entry order) over a subset of records, whatever holds them: a vector
// of Encounters (colony.h) or compact records (encounter_records.h).
#include "core/base/civil_date.h"

#include <algorithm>
#include <cstddef>
#include <cstdint>
#include <vector>

namespace hierloom::core {

/// What the analysis order compares of one record.
struct AnalysisOrderKey {
    Day date = 0;
    int time = 0; ///< minutes after midnight; 24 * 60 when untimed (last in its day)
    std::int64_t seq = 0;
};

/// The indices `subset` (ascending) in analysis order, keyOf(i) giving record
/// i's key; records with equal keys keep the order of their indices, as a
/// stable sort would. At the cost of the subset, not of every record.
template <class KeyOf> std::vector<size_t> analysisOrderOf(std::vector<size_t> subset, KeyOf keyOf)
{
    const auto before = [&keyOf](size_t a, size_t b) {
        const AnalysisOrderKey x = keyOf(a);
        const AnalysisOrderKey y = keyOf(b);
        if (x.date != y.date) return x.date < y.date;
        if (x.time != y.time) return x.time < y.time;
        return x.seq < y.seq;
    };
    // Records are mostly entered in date order: check in one pass before sorting.
    if (std::is_sorted(subset.begin(), subset.end(), before)) return subset;
    // Usually the dates already ascend and only times within a day are out
    // of order (groups' records interleaved): each day's run is sorted on its
    // own, small sorts within the cache instead of one sort of every row.
    bool datesAscend = true;
    for (size_t k = 1; k < subset.size() && datesAscend; ++k) datesAscend = keyOf(subset[k - 1]).date <= keyOf(subset[k]).date;
    if (datesAscend) {
        for (size_t first = 0; first < subset.size();) {
            size_t last = first + 1;
            while (last < subset.size() && keyOf(subset[last]).date == keyOf(subset[first]).date) ++last;
            std::sort(subset.begin() + static_cast<std::ptrdiff_t>(first), subset.begin() + static_cast<std::ptrdiff_t>(last),
                      [&](size_t a, size_t b) { return before(a, b) || (!before(b, a) && a < b); });
            first = last;
        }
        return subset;
    }
    // Sorting small keys rather than indices into the records: the same order
    // as a stable sort (the index breaks the remaining ties), without a cache
    // miss per comparison (a third of whole-file `ranks` on 3,000,000
    // encounters went to that comparison).
    struct Key {
        AnalysisOrderKey key;
        size_t index;
    };
    std::vector<Key> keys(subset.size());
    for (size_t k = 0; k < subset.size(); ++k) keys[k] = {keyOf(subset[k]), subset[k]};
    std::sort(keys.begin(), keys.end(), [](const Key& a, const Key& b) {
        if (a.key.date != b.key.date) return a.key.date < b.key.date;
        if (a.key.time != b.key.time) return a.key.time < b.key.time;
        if (a.key.seq != b.key.seq) return a.key.seq < b.key.seq;
        return a.index < b.index;
    });
    for (size_t k = 0; k < keys.size(); ++k) subset[k] = keys[k].index;
    return subset;
}

} // namespace hierloom::core
