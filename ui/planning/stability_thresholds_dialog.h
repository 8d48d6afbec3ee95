// SPDX-License-Identifier: GPL-3.0-or-later
#pragma once
#include "core/planning/stability_watch.h"

#include <QDialog>

class QDoubleSpinBox;
class QSpinBox;

namespace hierloom::ui {

/// Edits the stability-watch thresholds (kept in the colony file's settings).
class StabilityThresholdsDialog : public QDialog {
    Q_OBJECT
public:
    StabilityThresholdsDialog(const core::StabilityThresholds& current, QWidget* parent = nullptr);
    core::StabilityThresholds thresholds() const;
    void setThresholds(const core::StabilityThresholds& t);

private:
    QDoubleSpinBox* counterShare_;
    QSpinBox* minDecided_;
    QDoubleSpinBox* linePair_;
    QDoubleSpinBox* rankChange_;
    QSpinBox* severeAtLeast_;
    QDoubleSpinBox* severeFactor_;
    QSpinBox* minSevere_;
};

} // namespace hierloom::ui
