// SPDX-License-Identifier: GPL-3.0-or-later
#include "cli/command_line.h"

#include "cli/checked_output.h"
#include "cli/code_help.h"
#include "cli/commands.h"
#include "cli/finite_number.h"
#include "cli/option_defaults.h"
#include "core/base/colony_file_error.h"

#include <CLI/CLI.hpp>

#include <iostream>

namespace hierloom::cli {

int run(int argc, const char* const* argv, std::ostream& out, std::ostream& err)
{
    CLI::App app{"Hierloom: dominance ranks and inherited rank in animal colonies.\n"
                 "Usage: hierloom-cli COMMAND COLONY_FILE [options]; CSV on standard output.",
                 "hierloom-cli"};
    app.set_version_flag("--version", std::string("hierloom-cli ") + HIERLOOM_VERSION);
    app.require_subcommand(1);
    app.fallthrough(false);
    CheckedOutput checked(out, err);
    CommandContext ctx{checked.out(), checked.err(), {}, &checked};
    CommandAction action;
    addInitCommand(app, ctx, action);
    addImportCommand(app, ctx, action);
    addExportCommand(app, ctx, action);
    addDemoCommand(app, ctx, action);
    addRanksCommand(app, ctx, action);
    addMatrixCommand(app, ctx, action);
    addMetricsCommand(app, ctx, action);
    addSexRatioCommand(app, ctx, action);
    addMaternalRanksCommand(app, ctx, action);
    addExportTablesCommand(app, ctx, action);
    addSupportCommand(app, ctx, action);
    addInheritCommand(app, ctx, action);
    addDynamicsCommand(app, ctx, action);
    addScenarioCommand(app, ctx, action);
    addStabilityCommand(app, ctx, action);
    addReportCommand(app, ctx, action);
    addOverviewCommand(app, ctx, action);
    addBackupCommand(app, ctx, action);
    addCheckCommand(app, ctx, action);
    addRestoreCommand(app, ctx, action);
    addMergeCommand(app, ctx, action);
    addHistoryCommand(app, ctx, action);
    addCodesCommand(app, ctx, action);
    addHealthCommand(app, ctx, action);
    describeDefaults(app);
    requireFiniteNumbers(app);
    try {
        app.parse(argc, argv);
    } catch (const CLI::CallForHelp&) {
        out << app.help();
        return Success;
    } catch (const CLI::CallForAllHelp&) {
        out << app.help("", CLI::AppFormatMode::All);
        return Success;
    } catch (const CLI::CallForVersion&) {
        out << std::string("hierloom-cli ") + HIERLOOM_VERSION << "\n";
        return Success;
    } catch (const CLI::ParseError& e) {
        err << "hierloom-cli: " << e.what() << "\n";
        if (e.get_exit_code() == static_cast<int>(CLI::ExitCodes::RequiredError) && app.get_subcommands().empty())
            err << "Run 'hierloom-cli --help' for the list of commands.\n";
        return BadInput;
    }
    std::exception_ptr failure;
    try {
        if (action) action();
    } catch (...) {
        failure = std::current_exception();
    }
    // A colony file checked alongside the command: a damaged file is refused
    // as by a check before reading, whatever the command met while reading it.
    try {
        checked.pass();
    } catch (...) {
        failure = std::current_exception();
    }
    try {
        if (failure) std::rethrow_exception(failure);
        return Success;
    } catch (const BadInputError& e) {
        err << "hierloom-cli: " << e.what() << "\n";
        return BadInput;
    } catch (const core::ColonyFileError& e) {
        err << "hierloom-cli: " << e.what() << "\n";
        return e.kind() == core::ColonyFileError::Kind::Io ? InternalFailure : BadInput;
    } catch (const std::exception& e) {
        err << "hierloom-cli: internal failure: " << e.what() << "\n";
        return InternalFailure;
    }
}

int run(int argc, char** argv) { return run(argc, argv, std::cout, std::cerr); }

} // namespace hierloom::cli
