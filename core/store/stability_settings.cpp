// SPDX-License-Identifier: GPL-3.0-or-later
#include "core/store/stability_settings.h"

#include "core/base/number_format.h"

#include <charconv>
#include <cmath>

namespace hierloom::core {

namespace {

template <typename T>
T settingNumber(const ColonyStore& store, const char* key, T fallback, T lo, T hi)
{
    const std::string text = store.setting(key);
    if (text.empty()) return fallback;
    T v{};
    const auto r = std::from_chars(text.data(), text.data() + text.size(), v);
    if (r.ec != std::errc() || r.ptr != text.data() + text.size()) return fallback;
    if constexpr (std::is_floating_point_v<T>)
        if (!std::isfinite(v)) return fallback;
    return v < lo || v > hi ? fallback : v;
}

} // namespace

StabilityThresholds readStabilityThresholds(const ColonyStore& store)
{
    using namespace stability_keys;
    StabilityThresholds t;
    t.counterShare = settingNumber(store, kCounterShare, t.counterShare, 0.0, 1.0);
    t.minDecided = settingNumber(store, kMinDecided, t.minDecided, 0, 1000000);
    t.linePairPerWeek = settingNumber(store, kLinePairPerWeek, t.linePairPerWeek, 0.0, 1000000.0);
    t.rankChangePerAnimal = settingNumber(store, kRankChange, t.rankChangePerAnimal, 0.0, 1000.0);
    t.severeAtLeast = settingNumber(store, kSevereAtLeast, t.severeAtLeast, 0, 5);
    t.severeFactor = settingNumber(store, kSevereFactor, t.severeFactor, 0.0, 1000.0);
    t.minSevere = settingNumber(store, kMinSevere, t.minSevere, 0, 1000000);
    return t;
}

void writeStabilityThresholds(ColonyStore& store, const StabilityThresholds& t)
{
    using namespace stability_keys;
    store.setSetting(kCounterShare, formatNumber(t.counterShare));
    store.setSetting(kMinDecided, std::to_string(t.minDecided));
    store.setSetting(kLinePairPerWeek, formatNumber(t.linePairPerWeek));
    store.setSetting(kRankChange, formatNumber(t.rankChangePerAnimal));
    store.setSetting(kSevereAtLeast, std::to_string(t.severeAtLeast));
    store.setSetting(kSevereFactor, formatNumber(t.severeFactor));
    store.setSetting(kMinSevere, std::to_string(t.minSevere));
}

std::map<std::string, int, std::less<>> behaviourSeverities(const ColonyStore& store)
{
    std::map<std::string, int, std::less<>> out;
    for (const ColonyStore::BehaviourCode& c : store.behaviourCodes()) out[c.code] = c.severity;
    return out;
}

} // namespace hierloom::core
