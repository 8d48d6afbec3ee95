// SPDX-License-Identifier: GPL-3.0-or-later
#pragma once
#include "core/ranks/bout.h"
#include "core/ranks/encounter_selection.h"

#include <cstdint>
#include <optional>
#include <string>
#include <utility>
#include <vector>

namespace hierloom::core {

/// The hierarchy figures of the `metrics` command, in docs/file-formats.md's order:
/// Landau's h and de Vries' h' with its test (de Vries 1995), directional
/// consistency (van Hooff & Wensing 1987), steepness and its test (de Vries,
/// Stevens & Vervaecke 2006), triangle transitivity and its test (Shizuka &
/// McDonald 2012), optimised Elo k (Foerster et al. 2016). Empty = undefined.
struct HierarchyMetrics {
    int animals = 0;
    long long encounters = 0;
    long long dyads = 0;
    long long knownDyads = 0;
    std::optional<double> unknownShare;
    std::optional<double> landauH;
    std::optional<double> hPrime;
    std::optional<double> hPrimeP;
    std::optional<double> dci;
    std::optional<double> steepness;
    std::optional<double> steepnessP;
    std::optional<double> tTri;
    std::optional<double> tTriP;
    std::optional<double> eloKOptimal;
    std::optional<double> eloLogLikelihood;
    std::uint64_t seed = 0;
    int randomisations = 0;
};

/// Computes every figure over the selection; `randomisations` = 0 skips the tests.
HierarchyMetrics computeHierarchyMetrics(const EncounterSelection& selection, DrawPolicy draws, int randomisations,
                                         std::uint64_t seed, unsigned threads);

/// The figures as (metric, value) rows in the order of docs/file-formats.md, values
/// in round-trip form and empty where undefined.
std::vector<std::pair<std::string, std::string>> metricRows(const HierarchyMetrics& m);

} // namespace hierloom::core
