// SPDX-License-Identifier: GPL-3.0-or-later
#pragma once
#include "core/base/civil_date.h"

#include <iosfwd>
#include <optional>
#include <stdexcept>
#include <string>
#include <utility>
#include <vector>

namespace CLI {
class App;
}

namespace hierloom::cli {

class CheckedOutput;

/// A mistake in the command line or its input, reported with exit status 2.
class BadInputError : public std::runtime_error {
public:
    using std::runtime_error::runtime_error;
};

/// Streams and the output file option shared by every command.
struct CommandContext {
    std::ostream& out;
    std::ostream& err;
    std::string outFile; // --out
    /// The streams' owner, which holds the output while the colony file is
    /// checked alongside the command (cli/checked_output.h); none in a copy for a side file.
    CheckedOutput* checked = nullptr;
};

/// Waits for the whole-file check running alongside the command, if any (the
/// output held meanwhile is written out); throws ColonyFileError when the file
/// is damaged. Called before anything is written to a file.
void passCheck(CommandContext& ctx);

/// Options every analysis command takes (docs/file-formats.md "Common options").
struct WindowOptions {
    std::string from;
    std::string to;
    std::string group;
    std::string draws; // empty: the colony's setting
};

/// Adds --from, --to, --group and --draws to a command.
void addWindowOptions(CLI::App& command, WindowOptions& options);

/// Parses a `YYYY-MM-DD` option value; BadInput naming the option otherwise.
std::optional<hierloom::core::Day> optionDate(const std::string& text, const char* option);

/// Writes `text` to --out FILE (atomically, via a temporary file) or to
/// standard output, once the colony file's check has passed (passCheck).
void emit(CommandContext& ctx, const std::string& text);

/// Writes several files all or nothing: each into a temporary file beside it,
/// then all renamed into place; on any failure no temporary file is left and
/// no target is replaced (BadInputError naming the file).
void writeFilesTogether(const std::vector<std::pair<std::string, std::string>>& pathsAndTexts);

} // namespace hierloom::cli
