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

/// The data health of the open document for a group and window (core/research/data_health.h).
core::DataHealth documentHealth(const ColonyDocument* document, const core::HealthOptions& options);

/// The Health tab: observation effort per animal, observer and month; the
/// residents nobody has seen for N days, with the caution to check on them;
/// animals with too few encounters for a stable rank, with the
/// randomised-Elo interval width; observer agreement. Reads only.
class HealthView : public QWidget {
    Q_OBJECT
public:
    explicit HealthView(ColonyDocument* document, QWidget* parent = nullptr);

    const core::DataHealth& health() const { return health_; }
    void setGroup(const QString& group);
    QTreeWidget* animalList() const { return animals_; }
    QTreeWidget* observerList() const { return observers_; }
    QTreeWidget* monthList() const { return months_; }
    QTreeWidget* unseenList() const { return unseen_; }
    QTreeWidget* agreementList() const { return agreement_; }
    QLabel* unseenBanner() const { return banner_; }
    /// Recomputes with the fields as they are (also run on every change of a field).
    void recompute();

private:
    void refreshGroups();

    ColonyDocument* document_;
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
