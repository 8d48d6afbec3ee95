// SPDX-License-Identifier: GPL-3.0-or-later
#pragma once
#include "core/planning/scenario.h"

#include <QWidget>

class QComboBox;
class QDateEdit;
class QLineEdit;
class QListWidget;
class QStackedWidget;

namespace hierloom::ui {

class ColonyDocument;

/// Composes a what-if scenario with widgets (no file format to type): the date,
/// the group, the sibling rule and a list of changes - remove an animal,
/// introduce an unrelated female, add an expected birth, or split the group by
/// moving whole matrilines (chosen by their matriarch) into a new group.
class ScenarioComposer : public QWidget {
    Q_OBJECT
public:
    enum ChangeKind { RemoveAnimal, IntroduceFemale, ExpectedBirth, SplitMatrilines };

    explicit ScenarioComposer(ColonyDocument* document, QWidget* parent = nullptr);

    core::Scenario scenario() const;
    void setScenario(const core::Scenario& scenario);
    void addChange(const core::ScenarioChange& change);
    /// Clears the changes and sets the date and group to the record's last encounter.
    void reset();

    // The widgets, for tests and the planner.
    QDateEdit* dateEdit() const { return date_; }
    QComboBox* groupBox() const { return group_; }
    QComboBox* kindBox() const { return kind_; }
    QComboBox* animalBox() const { return animal_; }
    QComboBox* motherBox() const { return mother_; }
    QListWidget* matriarchList() const { return matriarchs_; }
    QLineEdit* newGroupEdit() const { return newGroup_; }
    QLineEdit* newIdEdit() const { return newId_; }
    QListWidget* changeList() const { return changes_; }
    /// Adds the change the "add" widgets describe; false (and nothing added) when incomplete.
    bool addComposedChange();

signals:
    void changed();

private:
    void refreshChoices();
    void refreshChangeList();
    static QString describe(const core::ScenarioChange& change);

    ColonyDocument* document_;
    QDateEdit* date_;
    QComboBox* group_;
    QComboBox* rule_;
    QComboBox* kind_;
    QStackedWidget* pages_;
    QComboBox* animal_;
    QLineEdit* introduceId_;
    QComboBox* mother_;
    QComboBox* sex_;
    QLineEdit* newId_;
    QListWidget* matriarchs_;
    QLineEdit* newGroup_;
    QListWidget* changes_;
    std::vector<core::ScenarioChange> list_;
    core::Scenario base_; ///< settings without widgets (maturity, window, ...) kept from setScenario
    int newcomers_ = 0;
};

} // namespace hierloom::ui
