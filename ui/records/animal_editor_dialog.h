// SPDX-License-Identifier: GPL-3.0-or-later
#pragma once
#include "core/base/colony.h"
#include "core/base/field_problem.h"

#include <QDialog>
#include <QMap>

class QComboBox;
class QFormLayout;
class QLabel;
class QLineEdit;

namespace hierloom::ui {

class ColonyEditFacade;

/// Adds or edits one animal, records a birth or an introduction, through the
/// edit facade (each undoable). Mother and father are offered only among valid
/// candidates (females, resp. males, born before the animal); problems appear
/// beside their field in the import's words and the dialog stays open. A birth
/// or an introduction is confirmed by name before it is written; a group name
/// not in the colony needs its own confirmation.
class AnimalEditorDialog : public QDialog {
    Q_OBJECT
public:
    enum class Mode { Add, Edit, Birth, Introduction };
    AnimalEditorDialog(ColonyEditFacade* facade, Mode mode, QWidget* parent = nullptr);

    /// Edit mode: loads an animal by id.
    void loadAnimal(const QString& id);
    /// Starts from the animal selected in a view: the mother of a birth, the animal to edit.
    void startFrom(const QString& id);
    /// Who the chosen mother is (Birth): name, id, sex, age, group.
    QString motherText() const;
    /// Saves through the facade; closes on success, else shows the problems.
    void accept() override;

    QString fieldMessage(const QString& field) const;
    QLineEdit* idEdit() const { return id_; }
    QLineEdit* nameEdit() const { return name_; }
    QComboBox* sexBox() const { return sex_; }
    QLineEdit* birthEdit() const { return birth_; }
    QComboBox* motherBox() const { return mother_; }
    QComboBox* fatherBox() const { return father_; }
    QLineEdit* entryEdit() const { return entry_; }
    QComboBox* groupBox() const { return group_; }
    QLineEdit* exitEdit() const { return exit_; }
    QComboBox* exitTypeBox() const { return exitType_; }

private:
    void refillParents();
    void addRow(const QString& label, QWidget* field, const QString& key);
    std::optional<core::Day> dateOf(QLineEdit* edit, const char* field, core::FieldProblems& problems) const;
    void show(const core::FieldProblems& problems);
    void updateMotherInfo();
    bool confirmEvent(const core::Animal& a, const QString& group);

    ColonyEditFacade* facade_;
    Mode mode_;
    std::string uid_; // Edit mode: the record being edited
    core::Animal loaded_;
    QLineEdit* id_;
    QLineEdit* name_;
    QComboBox* sex_;
    QLineEdit* birth_;
    QComboBox* mother_;
    QComboBox* father_;
    QLineEdit* entry_;
    QComboBox* entryType_;
    QComboBox* group_;
    QLineEdit* exit_;
    QComboBox* exitType_;
    QLabel* general_;
    QLabel* motherInfo_;
    QMap<QString, QLabel*> messages_;
    QFormLayout* form_;
};

} // namespace hierloom::ui
