// SPDX-License-Identifier: GPL-3.0-or-later
#include "ui/document/background_encounter_load.h"

#include "core/store/colony_store.h"
#include "core/store/query_cancel.h"

#include <algorithm>

namespace hierloom::ui {


BackgroundEncounterLoad::BackgroundEncounterLoad(std::string path, std::int64_t expected, Progress progress, Done done)
{
    thread_ = std::thread(&BackgroundEncounterLoad::run, this, std::move(path), expected, std::move(progress),
                          std::move(done));
}

int BackgroundEncounterLoad::partsFor(std::int64_t encounters)
{
    return static_cast<int>(std::clamp<std::int64_t>(encounters / 50000 + 1, 1, 100));
}

BackgroundEncounterLoad::~BackgroundEncounterLoad() { cancel(); }

void BackgroundEncounterLoad::cancel()
{
    cancelled_ = true;
    if (thread_.joinable()) thread_.join();
}

void BackgroundEncounterLoad::run(std::string path, std::int64_t expected, Progress progress, Done done)
{
    try {
        core::ColonyStore store = core::ColonyStore::open(path, core::ColonyStore::Mode::ReadOnly);
        core::stopQueriesWhen(store, cancelled_);
        if (expected < 0) {
            done(nullptr, {}); // the check alone
            return;
        }
        // Held compactly as they arrive: a part's Encounters of strings live
        // only until appended (50,000 rows, not millions).
        auto all = std::make_shared<core::EncounterRecords>();
        all->reserve(static_cast<size_t>(std::max<std::int64_t>(expected, 0)) + 4096);
        // Equal spans of seq: each part is one range of the primary key, its
        // rows already in entry order, so the parts only append (no sort of
        // millions of records, no row read twice).
        const int total = partsFor(expected);
        if (const auto range = store.encounterSeqRange()) {
            const auto [low, high] = *range;
            const std::int64_t span = (high - low) / total + 1;
            for (int i = 0; i < total; ++i) {
                if (cancelled_) return;
                const std::int64_t first = low + span * i;
                const std::vector<core::Encounter> part =
                    store.loadEncounterRangeWithoutSupporters(first, std::min(high, first + span - 1));
                for (const core::Encounter& e : part) all->append(e);
                progress(i + 1, total);
            }
        } else {
            progress(total, total);
        }
        if (cancelled_) return;
        store.loadSupporters(*all);
        // Another program wrote while the parts were read: read it whole.
        if (static_cast<std::int64_t>(all->size()) != store.encounterCount()) {
            *all = core::EncounterRecords(store.loadEncounters());
        }
        if (cancelled_) return;
        done(std::move(all), {});
    } catch (const std::exception& error) {
        if (!cancelled_) done(nullptr, error.what());
    }
}

} // namespace hierloom::ui
