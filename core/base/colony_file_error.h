// SPDX-License-Identifier: GPL-3.0-or-later
#pragma once
#include <stdexcept>
#include <string>

namespace hierloom::core {

/// A colony file that cannot be opened or written, with a message a person can act on.
class ColonyFileError : public std::runtime_error {
public:
    /// ReadOnly: a write to a file (or folder) this program may not change.
    enum class Kind { Missing, NotAColonyFile, Damaged, NewerVersion, Busy, Io, AlreadyExists, ReadOnly };
    ColonyFileError(Kind kind, const std::string& message) : std::runtime_error(message), kind_(kind) {}
    Kind kind() const { return kind_; }

private:
    Kind kind_;
};

} // namespace hierloom::core
