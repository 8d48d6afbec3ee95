// SPDX-License-Identifier: GPL-3.0-or-later
#pragma once
#include <vector>

namespace hierloom::core {

/// One encounter reduced to what the rank methods need: animal indices into
/// the analysed animal list, and whether it was a draw.
struct Bout {
    int winner = 0;
    int loser = 0;
    bool draw = false;
};

/// How draws count (docs/methods.md): half a win to each side, or not at all.
enum class DrawPolicy { Half, Ignore };

} // namespace hierloom::core
