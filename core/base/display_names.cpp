// SPDX-License-Identifier: GPL-3.0-or-later
#include "core/base/display_names.h"

namespace hierloom::core {

const std::vector<CodeName>& codeNames()
{
    using K = CodeKind;
    static const std::vector<CodeName> names = {
        // Rank methods and orderings (core/ranks/rank_method_registry.h has the same names).
        {K::Method, "elo", "Elo rating"},
        {K::Method, "ds", "David's score"},
        {K::Method, "isi", "I&SI"},
        {K::Method, "id", "animal id"},
        // Hierarchy figures (`metrics`, the Hierarchy view, the report).
        {K::Metric, "animals", "animals"},
        {K::Metric, "encounters", "encounters"},
        {K::Metric, "dyads", "dyads"},
        {K::Metric, "known_dyads", "known dyads"},
        {K::Metric, "unknown_share", "share of unknown dyads"},
        {K::Metric, "landau_h", "Landau's h"},
        {K::Metric, "h_prime", "h' (de Vries 1995)"},
        {K::Metric, "h_prime_p", "p of h'"},
        {K::Metric, "dci", "directional consistency index"},
        {K::Metric, "steepness", "steepness (David's score, Dij)"},
        {K::Metric, "steepness_p", "p of steepness"},
        {K::Metric, "ttri", "triangle transitivity t_tri"},
        {K::Metric, "ttri_p", "p of t_tri"},
        {K::Metric, "elo_k_optimal", "best-fitting Elo k"},
        {K::Metric, "elo_loglik", "Elo log-likelihood"},
        {K::Metric, "seed", "random seed"},
        {K::Metric, "randomisations", "randomisations"},
        {K::Metric, "conformity", "conformity with the inheritance rule"},
        {K::Metric, "tau_b", "Kendall's tau-b"},
        // Sex ratio (`sex-ratio`, the Sex Ratio view).
        {K::Metric, "births_used", "births used"},
        {K::Metric, "births_left_out", "births left out"},
        {K::Metric, "sons", "sons"},
        {K::Metric, "daughters", "daughters"},
        {K::Metric, "intercept", "intercept (log-odds of a son)"},
        {K::Metric, "slope", "slope (log-odds of a son per unit of relative rank)"},
        {K::Metric, "slope_se", "standard error of the slope"},
        {K::Metric, "slope_z", "Wald z of the slope"},
        {K::Metric, "slope_p", "p of the slope (Wald)"},
        {K::Metric, "slope_ci_low", "slope, 95 % interval, lower end"},
        {K::Metric, "slope_ci_high", "slope, 95 % interval, upper end"},
        {K::Metric, "lr_chisq", "likelihood-ratio chi-square (1 df)"},
        {K::Metric, "lr_p", "p of the likelihood-ratio test"},
        {K::Metric, "fisher_p", "Fisher's exact p (high against low mothers)"},
        // Stability watch (`stability`, the Stability view, the report).
        {K::Metric, "counter_share", "counter-dominance share"},
        {K::Metric, "rank_change_per_animal", "mean rank change per animal"},
        {K::Metric, "severe_per_animal_day", "severe encounters per animal-day"},
        {K::Metric, "severe_factor", "severe rate as a multiple of the group's median rate"},
        {K::Signal, "counter_dominance", "counter-dominance"},
        {K::Signal, "rank_changes", "rank changes"},
        {K::Signal, "severe_aggression", "severe aggression"},
        // Discordant dyads (`inherit --dyads`, the Prediction view, the report).
        {K::Category, "daughter_over_mother", "daughter above her mother"},
        {K::Category, "sibling_order", "sisters out of order"},
        {K::Category, "within_matriline", "within a matriline"},
        {K::Category, "cross_matriline", "across matrilines"},
        // Births left out of the sex-ratio analysis (`maternal-ranks`, `sex-ratio --births`).
        {K::Reason, "unknown_mother", "the mother is not recorded"},
        {K::Reason, "unknown_sex", "the offspring's sex is unknown"},
        {K::Reason, "mother_not_resident", "the mother was not in the colony (or not in the group) at conception"},
        {K::Reason, "mother_not_mature", "the mother was younger than the maturity age at conception"},
        {K::Reason, "no_rating", "the mother had no Elo rating at conception"},
        {K::Reason, "fewer_than_two_ranked", "fewer than two females were ranked at conception"},
        // Columns of the per-birth table (`maternal-ranks`, the Sex Ratio view).
        {K::Column, "offspring", "Offspring"},
        {K::Column, "mother", "Mother"},
        {K::Column, "sex", "Sex"},
        {K::Column, "birth_date", "Born"},
        {K::Column, "conception_date", "Conceived"},
        {K::Column, "mother_rank_at_conception", "Mother's rank at conception"},
        {K::Column, "ranked_females_at_conception", "Ranked females at conception"},
        {K::Column, "relative_rank_at_conception", "Relative rank at conception"},
        {K::Column, "mother_rank_at_birth", "Mother's rank at birth"},
        {K::Column, "ranked_females_at_birth", "Ranked females at birth"},
        {K::Column, "relative_rank_at_birth", "Relative rank at birth"},
        {K::Column, "used", "Used"},
        {K::Column, "left_out_reason", "Reason left out"},
    };
    return names;
}

std::string displayName(CodeKind kind, std::string_view code)
{
    for (const CodeName& c : codeNames())
        if (c.kind == kind && code == c.code) return c.name;
    return std::string(code);
}

const char* toString(CodeKind kind)
{
    switch (kind) {
    case CodeKind::Method: return "method";
    case CodeKind::Metric: return "metric";
    case CodeKind::Category: return "category";
    case CodeKind::Reason: return "reason";
    case CodeKind::Signal: return "signal";
    case CodeKind::Column: return "column";
    }
    return "metric";
}

} // namespace hierloom::core
