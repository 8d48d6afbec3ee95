// SPDX-License-Identifier: GPL-3.0-or-later
#include "core/store/species_settings.h"

#include "core/store/colony_store.h"
#include "core/store/write_transaction.h"

namespace hierloom::core {

SpeciesSettings readSpeciesSettings(const ColonyStore& store)
{
    return resolveSpeciesSettings(store.setting(kSpeciesSettingKey), store.setting(kGestationSettingKey),
                                  store.setting(kMaturitySettingKey));
}

void writeSpeciesSettings(ColonyStore& store, const std::string& species, std::optional<int> gestationDays,
                          std::optional<int> maturityYears)
{
    const std::string g = gestationDays ? std::to_string(*gestationDays) : std::string();
    const std::string m = maturityYears ? std::to_string(*maturityYears) : std::string();
    resolveSpeciesSettings(species, g, m); // validate before writing anything
    // One transaction, so a species never pairs with a stale override.
    WriteTransaction tx(store);
    store.setSetting(kSpeciesSettingKey, species);
    store.setSetting(kGestationSettingKey, g);
    store.setSetting(kMaturitySettingKey, m);
    tx.commit();
}

} // namespace hierloom::core
