// SPDX-License-Identifier: GPL-3.0-or-later
#include "core/base/csv_columns.h"

#include <cctype>

namespace hierloom::core {

std::string_view trimSpaces(std::string_view s)
{
    while (!s.empty() && (s.front() == ' ' || s.front() == '\t')) s.remove_prefix(1);
    while (!s.empty() && (s.back() == ' ' || s.back() == '\t')) s.remove_suffix(1);
    return s;
}

static std::string lower(std::string_view s)
{
    std::string out(s);
    for (char& c : out) c = static_cast<char>(std::tolower(static_cast<unsigned char>(c)));
    return out;
}

bool CsvColumns::matchHeader(const std::vector<std::string_view>& header, const std::string& file,
                             ImportProblems& problems)
{
    bool ok = true;
    width_ = header.size();
    std::string known;
    for (const auto& s : specs_) known += std::string(known.empty() ? "" : ", ") + s.name;
    for (size_t col = 0; col < header.size(); ++col) {
        const std::string name = lower(trimSpaces(header[col]));
        size_t found = specs_.size();
        for (size_t s = 0; s < specs_.size(); ++s)
            if (name == specs_[s].name) found = s;
        if (found == specs_.size()) {
            problems.add(file, 1, std::string(header[col]),
                         "unknown column (this file takes: " + known + ")");
            ok = false;
        } else if (position_[found] >= 0) {
            problems.add(file, 1, std::string(header[col]), "column appears twice");
            ok = false;
        } else {
            position_[found] = static_cast<int>(col);
        }
    }
    for (size_t s = 0; s < specs_.size(); ++s)
        if (specs_[s].required && position_[s] < 0) {
            problems.add(file, 1, specs_[s].name, "required column is missing");
            ok = false;
        }
    return ok;
}

std::string_view CsvColumns::field(const std::vector<std::string_view>& row, size_t spec) const
{
    const int p = position_[spec];
    if (p < 0 || static_cast<size_t>(p) >= row.size()) return {};
    return trimSpaces(row[static_cast<size_t>(p)]);
}

} // namespace hierloom::core
