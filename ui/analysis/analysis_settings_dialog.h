// SPDX-License-Identifier: GPL-3.0-or-later
#pragma once
#include "core/ranks/analysis_settings.h"

#include <QDialog>

class QComboBox;
class QDoubleSpinBox;
class QSpinBox;

namespace hierloom::ui {

class ColonyDocument;
class ColonyEditFacade;

/// Analysis > Analysis Settings...: the Elo k, start value, curve, draw
/// policy and start rule (docs/methods.md "Rule-informed Elo"), the maturity age and the default window that every view, the
/// report and the command line start from (kept in the colony file).
class AnalysisSettingsDialog : public QDialog {
    Q_OBJECT
public:
    /// `defaults` is what Restore Defaults puts back (the species' maturity age included).
    AnalysisSettingsDialog(const core::AnalysisSettings& current, const core::AnalysisSettings& defaults,
                           bool readOnly, QWidget* parent = nullptr);

    void setSettings(const core::AnalysisSettings& settings);
    core::AnalysisSettings settings() const;

private:
    QDoubleSpinBox* k_;
    QDoubleSpinBox* start_;
    QComboBox* curve_;
    QComboBox* draws_;
    QComboBox* startRule_;
    QSpinBox* maturity_;
    QSpinBox* window_;
};

/// Shows the dialog for the open colony and, when accepted, stores the
/// settings through the edit facade (ColonyEditFacade::setAnalysisSettings); a write failure is reported
/// through the document's writeFailed signal. False when nothing was stored.
bool runAnalysisSettingsDialog(QWidget* parent, ColonyEditFacade* facade);

} // namespace hierloom::ui
