// SPDX-License-Identifier: GPL-3.0-or-later
#pragma once
#include <string>
#include <string_view>
#include <vector>

namespace hierloom::core {

/// What a machine code names.
enum class CodeKind {
    Method,   ///< a rank method or ordering: elo, ds, isi, id
    Metric,   ///< a figure of a metric,value table or a series: h_prime, lr_chisq, counter_share...
    Category, ///< a kind of discordant dyad: daughter_over_mother, cross_matriline...
    Reason,   ///< why a birth is left out of the sex-ratio analysis: mother_not_resident...
    Signal,   ///< a stability alert: counter_dominance, rank_changes, severe_aggression
    Column,   ///< a column of a table the program writes: mother_rank_at_conception...
};

/// One code with the words people read for it. The command line and the
/// files keep the code; views, reports, help and the headers of tables shown
/// to people use the name.
struct CodeName {
    CodeKind kind;
    const char* code;
    const char* name;
};

/// Every code the program writes, with its display name: the one table of the
/// program's vocabulary (docs/file-formats.md, "Codes and their names").
const std::vector<CodeName>& codeNames();

/// The display name of a code, or the code itself when the table has none.
std::string displayName(CodeKind kind, std::string_view code);

/// "method", "metric", "category", "reason", "signal", "column".
const char* toString(CodeKind kind);

} // namespace hierloom::core
