// SPDX-License-Identifier: GPL-3.0-or-later
#pragma once
#include "core/base/import_problems.h"

#include <string>
#include <string_view>
#include <vector>

namespace hierloom::core {

/// The columns an import file may have, matched to its header row
/// case-insensitively; unknown, repeated and missing required columns are problems.
class CsvColumns {
public:
    struct Spec {
        const char* name;
        bool required;
    };

    CsvColumns(std::vector<Spec> specs) : specs_(std::move(specs)), position_(specs_.size(), -1) {}

    /// Matches the header; false (with problems added) when it is unusable.
    bool matchHeader(const std::vector<std::string_view>& header, const std::string& file, ImportProblems& problems);

    /// Field of column `spec` in a row, trimmed of surrounding spaces; empty when the column is absent.
    std::string_view field(const std::vector<std::string_view>& row, size_t spec) const;
    bool has(size_t spec) const { return position_[spec] >= 0; }
    size_t width() const { return width_; }
    const char* name(size_t spec) const { return specs_[spec].name; }

private:
    std::vector<Spec> specs_;
    std::vector<int> position_;
    size_t width_ = 0;
};

std::string_view trimSpaces(std::string_view s);

} // namespace hierloom::core
