// SPDX-License-Identifier: GPL-3.0-or-later
#pragma once

namespace hierloom::core {

/// Marks the upper halves of the AVX registers clean (`vzeroupper`) on x86
/// processors that have them; nothing elsewhere. Some code that Qt's GUI
/// module runs (its start, laying out text offscreen) leaves them dirty, and
/// until they are cleaned every SSE instruction of that thread, and of the
/// threads it starts (they inherit the registers), waits on them: `exp` in
/// the Elo loop measured 15 to 20 times slower. Heavy numeric loops call this
/// once before they start; it never changes a result.
void clearUpperVectorState();

} // namespace hierloom::core
