// SPDX-License-Identifier: GPL-3.0-or-later
#include "cli/command_line.h"

#include <iostream>

namespace hierloom::cli {

int run(int argc, const char* const* argv, std::ostream& out, std::ostream& err)
{
    (void)argc; (void)argv; (void)out;
    err << "hierloom-cli: no command given\n";
    return BadInput;
}

int run(int argc, char** argv) { return run(argc, argv, std::cout, std::cerr); }

} // namespace hierloom::cli
