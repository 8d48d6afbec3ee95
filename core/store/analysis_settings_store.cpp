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

/// The species' maturity default, or the docs/methods.md default when the stored species is unknown.
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
    if (const auto rule = parseEloStartRule(store.setting(kEloStartRule))) s.startRule = *rule;
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

SettingValues analysisSettingValues(const ColonyStore& store, const AnalysisSettings& s)
{
    using namespace analysis_keys;
    validateAnalysisSettings(s);
    const int speciesDefault = speciesMaturityDefault(store);
    return {
        {kEloK, formatNumber(s.elo.k)},
        {kEloStart, formatNumber(s.elo.start)},
        {kEloCurve, std::string(toString(s.elo.curve))},
        {kDraws, std::string(toString(s.elo.draws))},
        // No start rule (the default) is no row, so files written before the option read the same.
        {kEloStartRule, s.startRule == EloStartRule::None ? std::optional<std::string>()
                                                          : std::optional<std::string>(toString(s.startRule))},
        {kWindowDays, std::to_string(s.windowDays)},
        // A maturity age equal to the species' default is no override.
        {kMaturitySettingKey, s.maturityYears == speciesDefault ? std::optional<std::string>()
                                                                : std::optional<std::string>(std::to_string(s.maturityYears))},
    };
}

void writeAnalysisSettings(ColonyStore& store, const AnalysisSettings& s)
{
    writeSettingValues(store, analysisSettingValues(store, s));
}

} // namespace hierloom::core
