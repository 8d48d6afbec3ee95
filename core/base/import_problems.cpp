// SPDX-License-Identifier: GPL-3.0-or-later
#include "core/base/import_problems.h"

namespace hierloom::core {

std::string ImportProblem::text() const
{
    std::string out = file;
    if (line > 0) out += ":" + std::to_string(line);
    out += ": ";
    if (!column.empty()) out += column + ": ";
    return out + message;
}

void ImportProblems::add(const std::string& file, int line, std::string column, std::string message)
{
    if (full()) {
        ++dropped_;
        return;
    }
    list_.push_back({file, line, std::move(column), std::move(message)});
}

std::string ImportProblems::text() const
{
    std::string out;
    for (const auto& p : list_) out += p.text() + "\n";
    if (dropped_ > 0)
        out += "... and " + std::to_string(dropped_) + " more problems not listed; fix these first\n";
    return out;
}

} // namespace hierloom::core
