// SPDX-License-Identifier: GPL-3.0-or-later
#include "ui/document/background_encounter_load.h"

#include "core/store/colony_store.h"
#include "core/store/query_cancel.h"

#include <algorithm>

namespace hierloom::ui {


BackgroundEncounterLoad::BackgroundEncounterLoad(std::string path, std::vector<std::string> groups,
                                                 std::int64_t expected, Progress progress, Done done)
{
    thread_ = std::thread(&BackgroundEncounterLoad::run, this, std::move(path), std::move(groups), expected,
                          std::move(progress), std::move(done));
}

BackgroundEncounterLoad::~BackgroundEncounterLoad() { cancel(); }

void BackgroundEncounterLoad::cancel()
{
    cancelled_ = true;
    if (thread_.joinable()) thread_.join();
}

void BackgroundEncounterLoad::run(std::string path, std::vector<std::string> groups, std::int64_t expected,
                                  Progress progress, Done done)
{
    try {
        core::ColonyStore store = core::ColonyStore::open(path, core::ColonyStore::Mode::ReadOnly);
        core::stopQueriesWhen(store, cancelled_);
        if (expected < 0) {
            done(nullptr, {}); // the check alone
            return;
        }
        auto all = std::make_shared<std::vector<core::Encounter>>();
        all->reserve(static_cast<size_t>(std::max<std::int64_t>(expected, 0)) + 4096);
        const int total = static_cast<int>(groups.size());
        for (int i = 0; i < total; ++i) {
            if (cancelled_) return;
            std::vector<core::Encounter> part = store.loadEncounters(core::EncounterScope{.group = groups[static_cast<size_t>(i)]});
            std::move(part.begin(), part.end(), std::back_inserter(*all));
            progress(i + 1, total);
        }
        if (cancelled_) return;
        // A row without a group is in the scope of every group its winner lived in: keep one.
        const auto bySeq = [](const core::Encounter& a, const core::Encounter& b) { return a.seq < b.seq; };
        std::sort(all->begin(), all->end(), bySeq);
        all->erase(std::unique(all->begin(), all->end(),
                               [](const core::Encounter& a, const core::Encounter& b) { return a.seq == b.seq; }),
                   all->end());
        // The groups did not reach every row (or the file changed meanwhile): read it whole.
        if (static_cast<std::int64_t>(all->size()) != store.encounterCount()) {
            all->clear();
            *all = store.loadEncounters();
        }
        if (cancelled_) return;
        done(std::move(all), {});
    } catch (const std::exception& error) {
        if (!cancelled_) done(nullptr, error.what());
    }
}

} // namespace hierloom::ui
