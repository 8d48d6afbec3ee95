// SPDX-License-Identifier: GPL-3.0-or-later
#pragma once
#include "core/ranks/rank_table.h"

#include <string>
#include <string_view>
#include <vector>

namespace hierloom::core {

/// What the program says about one rank method. Adding a method is one entry
/// in rankMethods() (and its test); the command line's choices and help, the
/// matrix view's order list, the research export dialog and the help read it.
struct RankMethodInfo {
    RankMethod method;
    const char* code;        ///< command-line code: "elo", "ds", "isi"
    const char* displayName; ///< for people: "Elo rating", "David's score", "I&SI"
    const char* computes;    ///< what it computes, one short phrase
    const char* helpKey;     ///< anchor of its entry in the help's methods page
    bool hasScore;           ///< ranks come with a score (the rank table's score column)
    /// Takes a start rule (docs/methods.md "Rule-informed Elo"); its tables end with `start_rule`.
    bool takesStartRule = false;
};

/// The default order of the win matrix, in the `matrix` command and the
/// desktop's Matrix view alike.
constexpr RankMethod kDefaultMatrixOrder = RankMethod::Isi;

/// Every rank method, in the order offered (the default first).
const std::vector<RankMethodInfo>& rankMethods();

/// The entry of a code, or nullptr.
const RankMethodInfo* findRankMethod(std::string_view code);

/// The entry of a method (every RankMethod has one).
const RankMethodInfo& rankMethodInfo(RankMethod method);

/// The codes in registry order, e.g. {"elo", "ds", "isi"}.
std::vector<std::string> rankMethodCodes();

/// For help texts: "elo (Elo rating), ds (David's score) or isi (I&SI)".
std::string rankMethodChoicesText();

} // namespace hierloom::core
