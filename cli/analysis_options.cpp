// SPDX-License-Identifier: GPL-3.0-or-later
#include "cli/analysis_options.h"

#include "cli/finite_number.h"
#include "core/base/number_format.h"

#include <CLI/CLI.hpp>

#include <algorithm>
#include <ostream>

namespace hierloom::cli {

using namespace hierloom::core;

namespace {

const char* const kColonyDefault = "default: the colony's setting, else ";

} // namespace

void addEloOptions(CLI::App& command, AnalysisOverrides& o, const std::string& prefix)
{
    const EloSettings defaults;
    o.kOption = command
                    .add_option("--k", o.k,
                                prefix + "the k factor (" + kColonyDefault + formatNumber(defaults.k) + ")")
                    ->check(finiteNumber())
                    ->check(CLI::Range(0.0, kMaxEloK));
    o.startOption = command
                        .add_option("--start", o.start,
                                    prefix + "every animal's start rating (" + kColonyDefault +
                                        formatNumber(defaults.start) + ")")
                        ->check(finiteNumber())
                        ->check(CLI::Range(-kMaxAbsEloStart, kMaxAbsEloStart));
    command
        .add_option("--curve", o.curve,
                    prefix + "logistic or normal expectation (" + kColonyDefault + toString(defaults.curve) + ")")
        ->check(CLI::IsMember({"logistic", "normal"}));
}

void addStartRuleOption(CLI::App& command, AnalysisOverrides& o, const std::string& prefix)
{
    command
        .add_option("--start-rule", o.startRule,
                    prefix + "where a daughter whose mother is rated enters the ranking: youngest (just below her "
                             "mother, above her older sisters), eldest (just below her last older sister) or none "
                             "(the start value) (" + kColonyDefault + toString(EloStartRule::None) + ")")
        ->check(CLI::IsMember({"none", "youngest", "eldest"}));
}

void addMaturityOption(CLI::App& command, AnalysisOverrides& o)
{
    o.maturityOption = command
                           .add_option("--maturity-years", o.maturityYears,
                                       "age in whole years from which a female is ranked (default: the colony's "
                                       "setting, else the species default, " +
                                           std::to_string(kDefaultMaturityYears) + " for the default species)")
                           ->check(CLI::Range(0, kMaxMaturityYears));
}

void addDrawsOption(CLI::App& command, std::string& draws)
{
    command
        .add_option("--draws", draws,
                    std::string("draws count half to each side, or are ignored (") + kColonyDefault +
                        toString(EloSettings{}.draws) + ")")
        ->check(CLI::IsMember({"half", "ignore"}));
}

AnalysisSettings analysisSettingsOf(const LoadedColony& loaded, const AnalysisOverrides& o, const std::string& draws)
{
    AnalysisSettings s = loaded.settings;
    if (o.kOption && o.kOption->count() > 0) s.elo.k = o.k;
    if (o.startOption && o.startOption->count() > 0) s.elo.start = o.start;
    if (!o.curve.empty()) s.elo.curve = *parseEloCurve(o.curve);
    if (!o.startRule.empty()) s.startRule = *parseEloStartRule(o.startRule);
    if (o.maturityOption && o.maturityOption->count() > 0) s.maturityYears = o.maturityYears;
    if (!draws.empty()) s.elo.draws = *parseDrawPolicy(draws);
    return s;
}

void reportAnalysisSettings(CommandContext& ctx, const char* command, const AnalysisSettings& s,
                            const AnalysisOverrides* o, const std::string& draws)
{
    std::string given;
    auto add = [&](bool was, const char* name) {
        if (was) given += std::string(given.empty() ? "" : ", ") + name;
    };
    if (o) {
        add(o->kOption && o->kOption->count() > 0, "--k");
        add(o->startOption && o->startOption->count() > 0, "--start");
        add(!o->curve.empty(), "--curve");
        add(!o->startRule.empty(), "--start-rule");
        add(o->maturityOption && o->maturityOption->count() > 0, "--maturity-years");
    }
    add(!draws.empty(), "--draws");
    ctx.err << command << ": settings: " << describeAnalysisSettings(s) << " (the colony's settings"
            << (given.empty() ? "" : "; this run: " + given) << ")\n";
}

SelectionOptions withDefaultWindow(SelectionOptions selection, const AnalysisSettings& settings,
                                   const LoadedColony& loaded)
{
    // The window ends at the file's last encounter, whichever group it belongs to.
    if (selection.from || selection.to || settings.windowDays <= 0 || !loaded.lastDay) return selection;
    selection.from = defaultWindowStart(settings, *loaded.lastDay);
    return selection;
}

} // namespace hierloom::cli
