// SPDX-License-Identifier: GPL-3.0-or-later
#pragma once
#include <cstdint>
#include <optional>

namespace hierloom::core {

/// The standard normal quantile for a two-sided 95 % interval (docs/methods.md, "Small choices").
inline constexpr double kZ95 = 1.959963984540054;

/// Lower and upper limit of a confidence interval for a proportion.
struct ProportionInterval {
    double low = 0.0;
    double high = 1.0;
};

/// Wilson score interval for k successes of n without continuity correction
/// (Wilson 1927, JASA 22:209-212; Newcombe 1998, Stat. Med. 17:857-872, method 3);
/// empty when n <= 0, k < 0 or k > n.
std::optional<ProportionInterval> wilsonInterval(std::int64_t k, std::int64_t n, double z = kZ95);

} // namespace hierloom::core
