// SPDX-License-Identifier: GPL-3.0-or-later
#pragma once
#include <QtGlobal>

#include <iterator>

namespace hierloom::ui {

/// One figure the program shows and its entry in the methods help page
/// (resources/help/methods.html, anchor = key). A test walks this list and
/// checks that every key has its anchor, so add a figure here when a view
/// starts to show it and give it a HelpButton.
struct HelpTopic {
    const char* key;   ///< anchor in methods.html, also used by HelpButton
    const char* title; ///< translatable name, for tooltips (context "hierloom::ui::HelpTopic")
};

inline constexpr HelpTopic figureHelpTopics[] = {
    {"order", QT_TRANSLATE_NOOP("hierloom::ui::HelpTopic", "Which encounters, in which order")},
    {"elo", QT_TRANSLATE_NOOP("hierloom::ui::HelpTopic", "Elo rating")},
    {"elo_optimised_k", QT_TRANSLATE_NOOP("hierloom::ui::HelpTopic", "Optimised k")},
    {"randomised_elo", QT_TRANSLATE_NOOP("hierloom::ui::HelpTopic", "Randomised Elo")},
    {"informed_elo", QT_TRANSLATE_NOOP("hierloom::ui::HelpTopic", "Rule-informed Elo")},
    {"davids_score", QT_TRANSLATE_NOOP("hierloom::ui::HelpTopic", "David's score")},
    {"normalised_ds", QT_TRANSLATE_NOOP("hierloom::ui::HelpTopic", "Normalised David's score")},
    {"steepness", QT_TRANSLATE_NOOP("hierloom::ui::HelpTopic", "Steepness")},
    {"steepness_test", QT_TRANSLATE_NOOP("hierloom::ui::HelpTopic", "Steepness test")},
    {"isi", QT_TRANSLATE_NOOP("hierloom::ui::HelpTopic", "I&SI order")},
    {"win_matrix", QT_TRANSLATE_NOOP("hierloom::ui::HelpTopic", "Win matrix")},
    {"landau_h", QT_TRANSLATE_NOOP("hierloom::ui::HelpTopic", "Landau's h")},
    {"h_prime", QT_TRANSLATE_NOOP("hierloom::ui::HelpTopic", "Improved linearity h'")},
    {"linearity_test", QT_TRANSLATE_NOOP("hierloom::ui::HelpTopic", "Linearity test")},
    {"dci", QT_TRANSLATE_NOOP("hierloom::ui::HelpTopic", "Directional consistency")},
    {"ttri", QT_TRANSLATE_NOOP("hierloom::ui::HelpTopic", "Triangle transitivity")},
    {"ttri_test", QT_TRANSLATE_NOOP("hierloom::ui::HelpTopic", "Transitivity test")},
    {"matrilineal_prediction", QT_TRANSLATE_NOOP("hierloom::ui::HelpTopic", "Matrilineal rank prediction")},
    {"conformity", QT_TRANSLATE_NOOP("hierloom::ui::HelpTopic", "Conformity")},
    {"discordant_dyads", QT_TRANSLATE_NOOP("hierloom::ui::HelpTopic", "Discordant pairs")},
    {"tau_b", QT_TRANSLATE_NOOP("hierloom::ui::HelpTopic", "Kendall's tau-b")},
    {"rank_acquisition", QT_TRANSLATE_NOOP("hierloom::ui::HelpTopic", "Rank acquisition")},
    {"active_passive", QT_TRANSLATE_NOOP("hierloom::ui::HelpTopic", "Active and passive rank changes")},
    {"foresight", QT_TRANSLATE_NOOP("hierloom::ui::HelpTopic", "Foresight of the rule and Elo")},
    {"maternal_rank", QT_TRANSLATE_NOOP("hierloom::ui::HelpTopic", "Maternal relative rank")},
    {"sex_ratio", QT_TRANSLATE_NOOP("hierloom::ui::HelpTopic", "Sex ratio of births")},
    {"sex_ratio_logistic", QT_TRANSLATE_NOOP("hierloom::ui::HelpTopic", "Offspring sex and maternal rank")},
    {"fisher", QT_TRANSLATE_NOOP("hierloom::ui::HelpTopic", "Fisher's exact test")},
    {"wilson", QT_TRANSLATE_NOOP("hierloom::ui::HelpTopic", "Wilson interval")},
    {"counter_dominance", QT_TRANSLATE_NOOP("hierloom::ui::HelpTopic", "Counter-dominance")},
    {"rank_changes", QT_TRANSLATE_NOOP("hierloom::ui::HelpTopic", "Rank changes")},
    {"severe_aggression", QT_TRANSLATE_NOOP("hierloom::ui::HelpTopic", "Severe aggression")},
    {"relatedness", QT_TRANSLATE_NOOP("hierloom::ui::HelpTopic", "Coefficient of relatedness")},
    {"kin_support", QT_TRANSLATE_NOOP("hierloom::ui::HelpTopic", "Kin support and the nepotism index")},
    {"data_health", QT_TRANSLATE_NOOP("hierloom::ui::HelpTopic", "Data health")},
};

inline constexpr int figureHelpTopicCount = static_cast<int>(std::size(figureHelpTopics));

/// The topic with this key, or nullptr.
inline const HelpTopic* findHelpTopic(const char* key)
{
    for (const HelpTopic& t : figureHelpTopics)
        if (qstrcmp(t.key, key) == 0) return &t;
    return nullptr;
}

} // namespace hierloom::ui
