// SPDX-License-Identifier: GPL-3.0-or-later
#pragma once
#include <optional>
#include <string>

namespace hierloom::core {

/// Shortest text that reads back as the same double (docs/file-formats.md: numbers round-trip).
std::string formatNumber(double value);
/// Empty text for an undefined figure (never "nan" or "0").
std::string formatNumber(const std::optional<double>& value);

} // namespace hierloom::core
