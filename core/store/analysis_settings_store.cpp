// SPDX-License-Identifier: GPL-3.0-or-later
#include "core/store/analysis_settings_store.h"

#include "core/base/number_format.h"
#include "core/research/species_profile.h"
#include "core/store/colony_store.h"
#include "core/store/species_settings.h"
#include "core/store/write_transaction.h"

#include <charconv>
#include <cmath>
#include <stdexcept>

namespace hierloom::core {

namespace {

template <typename T>
std::optional<T> parsed(const std::string& text)
{
    if (text.empty()) return std::nullopt;
    T v{};
    const auto r = std::from_chars(text.data(), text.data() + text.size(), v);
    if (r.ec != std::errc() || r.ptr != text.data() + text.size()) return std::nullopt;
    if constexpr (std::is_floating_point_v<T>)
        if (!std::isfinite(v)) return std::nullopt;
    return v;
}

/// The species' maturity default, or the methods.md default when the stored species is unknown.
int speciesMaturityDefault(const ColonyStore& store)
{
    const std::string species = store.setting(kSpeciesSettingKey);
    const SpeciesProfile* p = findSpecies(species.empty() ? kDefaultSpeciesKey : species);
    return p ? p->maturityYears : kDefaultMaturityYears;
}

} // namespace

AnalysisSettings readAnalysisSettings(const ColonyStore& store)
{
    using namespace analysis_keys;
    AnalysisSettings s;
    // Each value alone: one bad value falls back without discarding the others.
    auto accept = [&](auto apply) {
        const AnalysisSettings before = s;
        apply();
        try {
            validateAnalysisSettings(s);
        } catch (const std::invalid_argument&) {
            s = before;
        }
    };
    if (const auto k = parsed<double>(store.setting(kEloK))) accept([&] { s.elo.k = *k; });
    if (const auto start = parsed<double>(store.setting(kEloStart))) accept([&] { s.elo.start = *start; });
    if (const auto curve = parseEloCurve(store.setting(kEloCurve))) s.elo.curve = *curve;
    if (const auto draws = parseDrawPolicy(store.setting(kDraws))) s.elo.draws = *draws;
    if (const auto days = parsed<int>(store.setting(kWindowDays))) accept([&] { s.windowDays = *days; });
    try {
        s.maturityYears = readSpeciesSettings(store).maturityYears;
    } catch (const std::invalid_argument&) {
        // An unknown species or a bad override: the default of the stored species, if any.
        s.maturityYears = speciesMaturityDefault(store);
        if (const auto y = parsed<int>(store.setting(kMaturitySettingKey)))
            accept([&] { s.maturityYears = *y; });
    }
    return s;
}

AnalysisSettings defaultAnalysisSettings(const ColonyStore& store)
{
    AnalysisSettings s;
    s.maturityYears = speciesMaturityDefault(store);
    return s;
}

void writeAnalysisSettings(ColonyStore& store, const AnalysisSettings& s)
{
    using namespace analysis_keys;
    validateAnalysisSettings(s);
    WriteTransaction tx(store);
    store.setSetting(kEloK, formatNumber(s.elo.k));
    store.setSetting(kEloStart, formatNumber(s.elo.start));
    store.setSetting(kEloCurve, toString(s.elo.curve));
    store.setSetting(kDraws, toString(s.elo.draws));
    store.setSetting(kWindowDays, std::to_string(s.windowDays));
    const int speciesDefault = speciesMaturityDefault(store);
    store.setSetting(kMaturitySettingKey, s.maturityYears == speciesDefault ? std::string() : std::to_string(s.maturityYears));
    tx.commit();
}

} // namespace hierloom::core
