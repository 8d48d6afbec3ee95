// SPDX-License-Identifier: GPL-3.0-or-later
#pragma once
#include "core/research/export_tables.h"
#include "core/research/support_analysis.h"

namespace hierloom::core {

// The kin-support figures (docs/methods.md "Kin support") as research tables:
// the `support` command prints them, the research export writes them and the
// desktop's Support view shows them, from the same cells.

/// One row per supporter and beneficiary: supporter, beneficiary, r, kin_class,
/// opportunities, given, rate.
ExportTable supportPairsTable(const SupportAnalysis& a);
/// One row per kin class, then the nepotism index, its permutation p and the
/// mothers' share against females below their daughter (metric, value rows).
ExportTable supportSummaryTable(const SupportAnalysis& a);
/// One row per daughter with older sisters: reached date, maternal opportunities and support before it.
ExportTable supportDaughtersTable(const SupportAnalysis& a);
/// The support matrix: rows supporters, columns beneficiaries, both in rank
/// order; cells `given/opportunities`, empty without an opportunity; the
/// second column is each row animal's matriarch.
ExportTable supportMatrixTable(const SupportAnalysis& a);

} // namespace hierloom::core
