// SPDX-License-Identifier: GPL-3.0-or-later
#include "core/research/support_tables.h"

#include "core/base/number_format.h"

#include <map>

namespace hierloom::core {

namespace {

std::string count(long long n) { return std::to_string(n); }

} // namespace

ExportTable supportPairsTable(const SupportAnalysis& a)
{
    ExportTable t{"support_pairs", {"supporter", "beneficiary", "r", "kin_class", "opportunities", "given", "rate"}, {}};
    for (const SupportPair& p : a.pairs)
        t.rows.push_back({p.supporter, p.beneficiary, formatNumber(p.r), toString(p.kin), count(p.opportunities),
                          count(p.given), formatNumber(p.rate)});
    return t;
}

ExportTable supportSummaryTable(const SupportAnalysis& a)
{
    ExportTable t{"support_summary", {"metric", "value"}, {}};
    t.rows.push_back({"encounters", count(a.encounters)});
    t.rows.push_back({"support_acts", count(a.acts)});
    for (const KinClassRate& c : a.classes) {
        const std::string k = toString(c.kin);
        t.rows.push_back({"pairs " + k, count(c.pairs)});
        t.rows.push_back({"opportunities " + k, count(c.opportunities)});
        t.rows.push_back({"given " + k, count(c.given)});
        t.rows.push_back({"rate " + k, formatNumber(c.rate)});
    }
    t.rows.push_back({"nepotism_index", formatNumber(a.nepotismIndex)});
    t.rows.push_back({"permutation_p", formatNumber(a.test.p)});
    t.rows.push_back({"permutations", count(a.test.iterations)});
    t.rows.push_back({"seed", std::to_string(a.test.seed)});
    t.rows.push_back({"mother_acts_against_females", count(a.motherActsAgainstFemales)});
    t.rows.push_back({"mother_acts_against_below", count(a.motherActsAgainstBelow)});
    t.rows.push_back({"mother_share_against_below", formatNumber(a.motherShareAgainstBelow)});
    return t;
}

ExportTable supportDaughtersTable(const SupportAnalysis& a)
{
    ExportTable t{"support_daughters",
                  {"daughter", "mother", "older_sisters", "reached", "maternal_opportunities", "maternal_support", "rate"},
                  {}};
    for (const DaughterSupport& d : a.daughters)
        t.rows.push_back({d.daughter, d.mother, count(d.olderSisters), formatDate(d.reached),
                          count(d.maternalOpportunities), count(d.maternalSupport),
                          d.maternalOpportunities > 0
                              ? formatNumber(static_cast<double>(d.maternalSupport) / d.maternalOpportunities)
                              : std::string()});
    return t;
}

ExportTable supportMatrixTable(const SupportAnalysis& a)
{
    ExportTable t{"support_matrix", {"supporter", "matriline"}, {}};
    t.header.insert(t.header.end(), a.order.begin(), a.order.end());
    std::map<std::pair<std::string, std::string>, const SupportPair*> byPair;
    for (const SupportPair& p : a.pairs) byPair[{p.supporter, p.beneficiary}] = &p;
    for (size_t i = 0; i < a.order.size(); ++i) {
        std::vector<std::string> row{a.order[i], a.matriarchs[i]};
        for (const std::string& b : a.order) {
            const auto it = byPair.find({a.order[i], b});
            row.push_back(it == byPair.end() ? std::string()
                                             : count(it->second->given) + "/" + count(it->second->opportunities));
        }
        t.rows.push_back(std::move(row));
    }
    return t;
}

} // namespace hierloom::core
