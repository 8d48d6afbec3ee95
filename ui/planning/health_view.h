// SPDX-License-Identifier: GPL-3.0-or-later
#pragma once
#include "core/research/data_health.h"

#include <QWidget>

class QComboBox;
class QLabel;
class QLineEdit;
class QSpinBox;
class QTabWidget;
class QTreeWidget;

namespace hierloom::ui {

class ColonyDocument;
class ComputeRunner;
class ProgressStrip;

/// The Health tab: observation effort per animal, observer and month; the
/// residents nobody has seen for N days, with the caution to check on them;
/// animals with too few encounters for a stable rank, with the
/// randomised-Elo interval width; observer agreement. Reads only. Computed
/// on a worker thread (ui/document/compute_runner.h) from the document's
/// snapshot; the lists are empty and a progress strip shows until it ends.
class HealthView : public QWidget {
    Q_OBJECT
public:
    explicit HealthView(ColonyDocument* document, QWidget* parent = nullptr);
    ~HealthView() override;

    const core::DataHealth& health() const { return health_; }
    void setGroup(const QString& group);
    QTreeWidget* animalList() const { return animals_; }
    QTreeWidget* observerList() const { return observers_; }
    QTreeWidget* monthList() const { return months_; }
    QTreeWidget* unseenList() const { return unseen_; }
    QTreeWidget* agreementList() const { return agreement_; }
    QLabel* unseenBanner() const { return banner_; }
    ComputeRunner* runner() const { return runner_; }
    /// The strip shown while the figures are being computed.
    ProgressStrip* progressStrip() const { return progress_; }
    /// Recomputes with the fields as they are (also run on every change of a field).
    void recompute();

private:
    void refreshGroups();
    void adopt(core::DataHealth health);

    ColonyDocument* document_;
    ComputeRunner* runner_;
    ProgressStrip* progress_;
    QComboBox* group_;
    QLineEdit* from_;
    QLineEdit* to_;
    QSpinBox* unseenDays_;
    QSpinBox* minEncounters_;
    QSpinBox* matchMinutes_;
    QLabel* problem_;
    QLabel* banner_;
    QTabWidget* tabs_;
    QTreeWidget* animals_;
    QTreeWidget* observers_;
    QTreeWidget* months_;
    QTreeWidget* unseen_;
    QTreeWidget* agreement_;
    core::DataHealth health_;
};

} // namespace hierloom::ui
