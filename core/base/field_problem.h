// SPDX-License-Identifier: GPL-3.0-or-later
#pragma once
#include <string>
#include <vector>

namespace hierloom::core {

/// One thing wrong with a single edited record, named by the field (the import's
/// column name, docs/file-formats.md) so that a form can show it beside that field.
struct FieldProblem {
    std::string field;
    std::string message;

    bool operator==(const FieldProblem&) const = default;
};

using FieldProblems = std::vector<FieldProblem>;

/// The first message about `field`, or empty.
inline std::string problemFor(const FieldProblems& problems, const std::string& field)
{
    for (const FieldProblem& p : problems)
        if (p.field == field) return p.message;
    return {};
}

} // namespace hierloom::core
