// SPDX-License-Identifier: GPL-3.0-or-later
#include "core/ranks/analysis_settings.h"

#include "core/base/number_format.h"

#include <cmath>
#include <stdexcept>

namespace hierloom::core {

void validateAnalysisSettings(const AnalysisSettings& s)
{
    if (!std::isfinite(s.elo.k) || s.elo.k < 0 || s.elo.k > kMaxEloK)
        throw std::invalid_argument("the Elo k must be a number from 0 to 100000");
    if (!std::isfinite(s.elo.start) || std::fabs(s.elo.start) > kMaxAbsEloStart)
        throw std::invalid_argument("the Elo start value must be a number from -1000000 to 1000000");
    if (s.maturityYears < 0 || s.maturityYears > kMaxMaturityYears)
        throw std::invalid_argument("the maturity age must be a whole number of years from 0 to 50");
    if (s.windowDays < 0 || s.windowDays > kMaxWindowDays)
        throw std::invalid_argument("the default window must be 0 (all data) to 36500 days");
}

const char* toString(EloCurve curve) { return curve == EloCurve::Normal ? "normal" : "logistic"; }

std::optional<EloCurve> parseEloCurve(std::string_view text)
{
    if (text == "logistic") return EloCurve::Logistic;
    if (text == "normal") return EloCurve::Normal;
    return std::nullopt;
}

const char* toString(DrawPolicy draws) { return draws == DrawPolicy::Ignore ? "ignore" : "half"; }

std::optional<DrawPolicy> parseDrawPolicy(std::string_view text)
{
    if (text == "half") return DrawPolicy::Half;
    if (text == "ignore") return DrawPolicy::Ignore;
    return std::nullopt;
}

std::string describeAnalysisSettings(const AnalysisSettings& s)
{
    return "k " + formatNumber(s.elo.k) + ", start " + formatNumber(s.elo.start) + ", start rule " + toString(s.startRule) + ", curve " + toString(s.elo.curve) +
           ", draws " + toString(s.elo.draws) + ", maturity " + std::to_string(s.maturityYears) + " years, window " +
           (s.windowDays == 0 ? std::string("all data") : "last " + std::to_string(s.windowDays) + " days");
}

std::optional<Day> defaultWindowStart(const AnalysisSettings& s, std::optional<Day> lastDay)
{
    if (s.windowDays <= 0 || !lastDay) return std::nullopt;
    return *lastDay - (s.windowDays - 1);
}

} // namespace hierloom::core
