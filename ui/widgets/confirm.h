// SPDX-License-Identifier: GPL-3.0-or-later
#pragma once
#include <QString>

class QWidget;

namespace hierloom::ui {

/// Asks a yes/no question in a modal box; Y or Enter on "Yes" says yes, N or
/// Escape says no. `yesByDefault` false keeps a tired Enter from confirming.
bool confirm(QWidget* parent, const QString& title, const QString& question, bool yesByDefault = true);

} // namespace hierloom::ui
