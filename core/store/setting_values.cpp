// SPDX-License-Identifier: GPL-3.0-or-later
#include "core/store/setting_values.h"

#include "core/base/number_format.h"
#include "core/research/species_profile.h"
#include "core/store/colony_store.h"
#include "core/store/saved_scenarios.h"
#include "core/store/sqlite_statement.h"
#include "core/store/stability_settings.h"
#include "core/store/write_transaction.h"

#include <stdexcept>

namespace hierloom::core {

SettingValues readSettingValues(const ColonyStore& store, const SettingValues& keys)
{
    SettingValues out;
    SqliteStatement st(store.handle(), "SELECT value FROM setting WHERE key = ?1");
    for (const auto& [key, ignored] : keys) {
        st.reset();
        st.bind(1, key);
        out[key] = st.step() ? std::optional<std::string>(st.text(0)) : std::nullopt;
    }
    return out;
}

void writeSettingValues(ColonyStore& store, const SettingValues& values)
{
    WriteTransaction tx(store);
    for (const auto& [key, value] : values) {
        if (value) {
            store.setSetting(key, *value);
        } else {
            SqliteStatement st(store.handle(), "DELETE FROM setting WHERE key = ?1");
            st.bind(1, key);
            st.run();
        }
    }
    tx.commit();
}

SettingValues stabilityThresholdValues(const StabilityThresholds& t)
{
    using namespace stability_keys;
    return {{kCounterShare, formatNumber(t.counterShare)},
            {kMinDecided, std::to_string(t.minDecided)},
            {kLinePairPerWeek, formatNumber(t.linePairPerWeek)},
            {kRankChange, formatNumber(t.rankChangePerAnimal)},
            {kSevereAtLeast, std::to_string(t.severeAtLeast)},
            {kSevereFactor, formatNumber(t.severeFactor)},
            {kMinSevere, std::to_string(t.minSevere)}};
}

SettingValues speciesSettingValues(const std::string& species, std::optional<int> gestationDays,
                                   std::optional<int> maturityYears)
{
    const auto text = [](std::optional<int> v) { return v ? std::optional<std::string>(std::to_string(*v)) : std::nullopt; };
    const SettingValues values{{kSpeciesSettingKey, species},
                               {kGestationSettingKey, text(gestationDays)},
                               {kMaturitySettingKey, text(maturityYears)}};
    // Validates species and overrides (throws std::invalid_argument).
    resolveSpeciesSettings(species, values.at(kGestationSettingKey).value_or(""),
                           values.at(kMaturitySettingKey).value_or(""));
    return values;
}

SettingValues savedScenarioValue(const std::string& name, std::optional<std::string> text)
{
    if (name.empty()) throw std::invalid_argument("a saved scenario needs a name");
    return {{kScenarioKeyPrefix + name, std::move(text)}};
}

} // namespace hierloom::core
