// SPDX-License-Identifier: GPL-3.0-or-later
#pragma once
#include <optional>
#include <string>
#include <string_view>
#include <vector>

namespace hierloom::core {

/// Life-history defaults of one species for the maternal-rank analyses
/// (docs/methods.md, "Maternal rank and offspring sex ratio"; Trivers & Willard 1973):
/// gestation length and the whole-year age from which a female is ranked.
struct SpeciesProfile {
    std::string key;            ///< stable code kept in the colony file, e.g. "rhesus_macaque"
    std::string commonName;     ///< e.g. "Rhesus macaque"
    std::string scientificName; ///< e.g. "Macaca mulatta"
    int gestationDays = 0;
    int maturityYears = 0;
};

/// The species offered, rhesus macaque first (the default). Every figure is
/// a typical value recalled from the primate and carnivore literature
/// [from memory]; docs/species.md lists them with the same mark.
const std::vector<SpeciesProfile>& knownSpecies();

/// The profile with this key, common name or scientific name (case, spaces,
/// hyphens and underscores ignored), or nullptr.
const SpeciesProfile* findSpecies(std::string_view key);

/// Key of the default species (docs/methods.md: maturity age default 4 years).
inline constexpr const char* kDefaultSpeciesKey = "rhesus_macaque";

/// Colony-file setting keys.
inline constexpr const char* kSpeciesSettingKey = "species";
inline constexpr const char* kGestationSettingKey = "gestation_days";
inline constexpr const char* kMaturitySettingKey = "maturity_years";

/// The species settings in force for a colony: the chosen species and its
/// gestation length and maturity age, each either the species default or an override.
struct SpeciesSettings {
    std::string species = kDefaultSpeciesKey;
    int gestationDays = 0;
    int maturityYears = 0;
    bool gestationOverridden = false;
    bool maturityOverridden = false;
};

/// Resolves settings from their stored texts (empty = not set): unknown
/// species key, or an override that is not a whole number in range
/// (gestation 1-1000 days, maturity 0-50 years), throws std::invalid_argument.
SpeciesSettings resolveSpeciesSettings(std::string_view species, std::string_view gestationDays,
                                       std::string_view maturityYears);

} // namespace hierloom::core
