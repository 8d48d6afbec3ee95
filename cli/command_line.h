// SPDX-License-Identifier: GPL-3.0-or-later
#pragma once
#include <iosfwd>

namespace hierloom::cli {

/// Exit statuses of docs/file-formats.md: success, internal failure, bad input.
enum ExitStatus { Success = 0, InternalFailure = 1, BadInput = 2 };

/// Runs `hierloom-cli` with its arguments; output to `out`, messages to `err`.
int run(int argc, const char* const* argv, std::ostream& out, std::ostream& err);
/// Same, on the process's standard streams.
int run(int argc, char** argv);

} // namespace hierloom::cli
