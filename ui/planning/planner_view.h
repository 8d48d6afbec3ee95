// SPDX-License-Identifier: GPL-3.0-or-later
#pragma once
#include "core/planning/scenario.h"

#include <QWidget>

#include <optional>

class QComboBox;
class QLabel;
class QPagedPaintDevice;
class QPushButton;
class QTabWidget;
class QTableWidget;
class QVBoxLayout;

namespace hierloom::ui {

class ColonyDocument;
class ColonyEditFacade;
class ScenarioComposer;

/// The colony manager's planner: compose a what-if scenario, see the observed
/// and predicted order of each resulting group side by side with its size,
/// adult sex ratio and matrilines, each animal's predicted move and the observed
/// relationships that would have to reverse; save scenarios by name in the
/// colony file, reopen, compare two and print. The colony's records are never changed.
class PlannerView : public QWidget {
    Q_OBJECT
public:
    explicit PlannerView(ColonyEditFacade* facade, QWidget* parent = nullptr);

    ScenarioComposer* composer() const { return composer_; }
    /// The result of the scenario as composed now; empty when it cannot run (see problems()).
    const std::optional<core::ScenarioResult>& result() const { return result_; }
    QString problems() const;
    QTabWidget* resultTabs() const { return tabs_; }
    QTableWidget* movesTable() const { return moves_; }
    QTableWidget* reversalsTable() const { return reversals_; }
    QTableWidget* compareTable() const { return compare_; }

    /// Saves the composed scenario under a name in the colony file (setting `scenario:NAME`), through the edit facade.
    bool saveScenario(const QString& name);
    /// Reopens a saved scenario into the composer; false when missing or no longer valid.
    bool openScenario(const QString& name);
    bool deleteScenario(const QString& name);
    QStringList savedNames() const;
    /// Compares two saved scenarios (an empty name: the one being composed).
    void compare(const QString& first, const QString& second);
    /// Paints the composed scenario (or the comparison) for printing; returns pages.
    int paint(QPagedPaintDevice& device, bool comparison);

private:
    /// A scenario predicts from every group's record: a large file not yet read
    /// whole is read first (the status bar shows the progress; the window stays live).
    void waitForEveryEncounter();
    void rerun();
    void refreshSaved();
    void fillOrders(const core::Scenario& scenario);
    std::optional<core::Scenario> savedScenario(const QString& name, QString* error = nullptr) const;
    void printDialog();
    void savePdfDialog();

    ColonyEditFacade* facade_;
    ColonyDocument* document_;
    ScenarioComposer* composer_;
    QComboBox* savedBox_;
    QPushButton* saveButton_;
    QPushButton* deleteButton_;
    QLabel* problems_;
    QTabWidget* tabs_;
    QWidget* ordersPage_;
    QVBoxLayout* ordersLayout_;
    QTableWidget* moves_;
    QTableWidget* reversals_;
    QComboBox* compareA_;
    QComboBox* compareB_;
    QTableWidget* compare_;
    QLabel* compareSummary_;
    std::optional<core::ScenarioResult> result_;
};

} // namespace hierloom::ui
