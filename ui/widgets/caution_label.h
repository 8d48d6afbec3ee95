// SPDX-License-Identifier: GPL-3.0-or-later
#pragma once
class QLabel;
class QString;
class QWidget;

namespace hierloom::ui {

/// The planning caution (core::kPlanningCaution) as a framed label, for every
/// planner and alert screen.
QLabel* makeCautionLabel(QWidget* parent);

/// The caution text itself, translated.
QString planningCaution();

} // namespace hierloom::ui
