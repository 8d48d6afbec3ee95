// SPDX-License-Identifier: GPL-3.0-or-later
#include "ui/widgets/caution_label.h"

#include "core/planning/planning_caution.h"

#include <QCoreApplication>
#include <QLabel>

namespace hierloom::ui {

QString planningCaution() { return QCoreApplication::translate("hierloom::ui::Caution", core::kPlanningCaution); }

QLabel* makeCautionLabel(QWidget* parent)
{
    auto* label = new QLabel(planningCaution(), parent);
    label->setObjectName(QStringLiteral("planningCaution"));
    label->setWordWrap(true);
    label->setStyleSheet(QStringLiteral("QLabel { background: #fff4d6; color: #5a4000; border: 1px solid #b07a00;"
                                        " border-radius: 3px; padding: 4px 6px; }"));
    return label;
}

} // namespace hierloom::ui
