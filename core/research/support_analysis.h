// SPDX-License-Identifier: GPL-3.0-or-later
#pragma once
#include "core/base/colony.h"
#include "core/base/compact_encounters.h"
#include "core/base/residence_index.h"
#include "core/pedigree/inheritance_prediction.h"
#include "core/pedigree/matriline.h"
#include "core/ranks/randomisation_test.h"

#include <cstdint>
#include <optional>
#include <string>
#include <vector>

namespace hierloom::core {

/// Kin classes of a supporter and a beneficiary (docs/methods.md "Kin
/// support"), by the coefficient of relatedness r (Wright 1922, the
/// project's core/pedigree/relatedness.h).
enum class KinClass {
    Mother,     ///< the supporter is the beneficiary's mother
    HalfOrMore, ///< r >= 0.5 otherwise (full sibs, offspring for their mother)
    Quarter,    ///< 0.25 <= r < 0.5 (grandmother, half-sibs, aunts)
    Eighth,     ///< 0.125 <= r < 0.25 (first cousins, great-grandmothers)
    Unrelated,  ///< r < 0.125, also when the pedigree knows no common ancestor
    Count
};

/// Short code of a class, as the tables print it: mother, r>=0.5,
/// 0.25<=r<0.5, 0.125<=r<0.25, r<0.125.
const char* toString(KinClass k);

/// The class of a pair with relatedness r.
KinClass kinClassOf(bool supporterIsMother, double r);

/// One supporter and one beneficiary over the window.
struct SupportPair {
    std::string supporter;
    std::string beneficiary;
    double r = 0;
    KinClass kin = KinClass::Unrelated;
    int opportunities = 0; ///< encounters of the beneficiary the supporter was present at, not fighting
    int given = 0;         ///< of those, on the beneficiary's side
    std::optional<double> rate;
};

/// Pooled over every pair of one class.
struct KinClassRate {
    KinClass kin = KinClass::Unrelated;
    int pairs = 0;
    int opportunities = 0;
    int given = 0;
    std::optional<double> rate;
};

/// A daughter, the day she reached her predicted place among her sisters and
/// the support her mother gave her before it.
struct DaughterSupport {
    std::string daughter;
    std::string mother;
    int olderSisters = 0;
    std::optional<Day> reached; ///< the last first-above day over her older sisters; empty: not (yet) above all
    int maternalOpportunities = 0; ///< her encounters with her mother present, up to `reached` (or the window's end)
    int maternalSupport = 0;       ///< of those, with her mother on her side
};

/// What support_analysis computes for one window.
struct SupportAnalysis {
    int encounters = 0; ///< encounters of the window (in the group, if one is chosen)
    int acts = 0;       ///< supporter entries of those encounters
    std::vector<SupportPair> pairs; ///< pairs with at least one opportunity, by supporter then beneficiary
    std::vector<KinClassRate> classes; ///< one per KinClass, in enum order
    std::optional<double> nepotismIndex; ///< pooled rate r >= 0.25 over pooled rate r < 0.125
    RandomisationTest test;              ///< of the nepotism index, right-tailed
    int motherActsAgainstFemales = 0;    ///< a mother for her daughter against a female, both in the predicted order
    int motherActsAgainstBelow = 0;      ///< of those, against a female the rule puts below the daughter
    std::optional<double> motherShareAgainstBelow;
    std::vector<DaughterSupport> daughters;
    std::vector<std::string> order;      ///< animals of the pairs by Elo at the window's end, highest first
    std::vector<std::string> matriarchs; ///< each ordered animal's matriarch (matriline strip)
};

/// Settings of the analysis; the defaults are those of docs/methods.md.
struct SupportOptions {
    std::string group; ///< empty: every group (each encounter in its own)
    std::optional<Day> from;
    std::optional<Day> to;
    int iterations = 1000; ///< permutations of the test (0: no test)
    std::uint64_t seed = 1;
    unsigned threads = 1;
    SiblingRule rule = SiblingRule::Youngest;
    int maturityYears = kDefaultMaturityYears;
    EloSettings elo;
};

/// Opportunities, support given, kin classes, the nepotism index and its
/// permutation test, mothers against the rule, daughters' rank acquisition
/// with their mothers' support, and the rank order for the support matrix.
SupportAnalysis analyseSupport(const Colony& colony, const ResidenceIndex& where, const SupportOptions& options);
/// The same from compact records (the desktop's, without expanding them);
/// `pedigree`'s animals are read, not its encounters.
SupportAnalysis analyseSupport(const CompactEncounters& encounters, const Colony& pedigree, const ResidenceIndex& where,
                               const SupportOptions& options);

} // namespace hierloom::core
