// SPDX-License-Identifier: GPL-3.0-or-later
#pragma once
#include <functional>

class QMainWindow;
class QMenu;

namespace hierloom::ui {

/// Adds the Help menu to a window: contents (F1), methods, keyboard
/// shortcuts, import file formats, the demo colony, About boxes.
/// `openDemo` opens the demo colony (the window knows how).
QMenu* addHelpMenu(QMainWindow* window, std::function<void()> openDemo);

} // namespace hierloom::ui
