// SPDX-License-Identifier: GPL-3.0-or-later
#pragma once
#include <string>
#include <vector>

namespace hierloom::core {

/// One thing wrong with an import file, located as `FILE:LINE: column: message`.
struct ImportProblem {
    std::string file;
    int line = 0; // 0 when it concerns the whole file
    std::string column;
    std::string message;

    std::string text() const;
};

/// The problems of one import, capped so a wholly wrong file gives a readable list.
class ImportProblems {
public:
    static constexpr size_t cap = 200;

    void add(const std::string& file, int line, std::string column, std::string message);
    bool empty() const { return list_.empty() && dropped_ == 0; }
    bool full() const { return list_.size() >= cap; }
    const std::vector<ImportProblem>& list() const { return list_; }
    size_t dropped() const { return dropped_; }
    /// All problems as lines of text, with a closing line if some were dropped.
    std::string text() const;

private:
    std::vector<ImportProblem> list_;
    size_t dropped_ = 0;
};

} // namespace hierloom::core
