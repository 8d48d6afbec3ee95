// SPDX-License-Identifier: GPL-3.0-or-later
#include "core/ranks/rank_method_registry.h"

#include <stdexcept>

namespace hierloom::core {

const std::vector<RankMethodInfo>& rankMethods()
{
    static const std::vector<RankMethodInfo> methods = {
        {RankMethod::Elo, "elo", "Elo rating",
         "sequential Elo ratings, updated encounter by encounter (daughters may start where the inheritance rule "
         "places them)",
         "elo", true, true},
        {RankMethod::DavidsScore, "ds", "David's score",
         "David's score from the proportions of wins in each dyad", "davids_score", true},
        {RankMethod::Isi, "isi", "I&SI", "the order with the fewest inconsistencies and least total strength of them",
         "isi", false},
    };
    return methods;
}

const RankMethodInfo* findRankMethod(std::string_view code)
{
    for (const RankMethodInfo& m : rankMethods())
        if (code == m.code) return &m;
    return nullptr;
}

const RankMethodInfo& rankMethodInfo(RankMethod method)
{
    for (const RankMethodInfo& m : rankMethods())
        if (m.method == method) return m;
    throw std::logic_error("a rank method without a registry entry");
}

std::vector<std::string> rankMethodCodes()
{
    std::vector<std::string> out;
    for (const RankMethodInfo& m : rankMethods()) out.emplace_back(m.code);
    return out;
}

std::string rankMethodChoicesText()
{
    const std::vector<RankMethodInfo>& all = rankMethods();
    std::string out;
    for (size_t i = 0; i < all.size(); ++i) {
        if (i > 0) out += i + 1 == all.size() ? " or " : ", ";
        out += std::string(all[i].code) + " (" + all[i].displayName + ")";
    }
    return out;
}

} // namespace hierloom::core
