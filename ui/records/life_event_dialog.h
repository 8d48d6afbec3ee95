// SPDX-License-Identifier: GPL-3.0-or-later
#pragma once
#include <QDialog>

class QComboBox;
class QLabel;
class QLineEdit;

namespace hierloom::ui {

class ColonyEditFacade;

/// A death, a removal or a move between groups of one animal, through the edit
/// facade. Starts from the animal given (the one selected in a view) or from
/// none, shows who the chosen animal is (name, id, sex, age, group) and asks
/// before writing, naming the event; a move goes to an existing group, and a
/// new group name needs its own confirmation.
class LifeEventDialog : public QDialog {
    Q_OBJECT
public:
    enum class Event { Death, Removal, Move };
    LifeEventDialog(ColonyEditFacade* facade, Event event, const QString& animal = {}, QWidget* parent = nullptr);
    void accept() override;

    QComboBox* animalBox() const { return animal_; }
    QLineEdit* dateEdit() const { return date_; }
    QComboBox* groupBox() const { return group_; }
    /// Who the chosen animal is, as shown under the animal field.
    QString animalText() const;
    QString message() const;

private:
    std::string chosenId() const;
    void updateAnimal();
    void showMessage(const QString& text);

    ColonyEditFacade* facade_;
    Event event_;
    QComboBox* animal_;
    QLabel* who_;
    QLineEdit* date_;
    QComboBox* group_;
    QLabel* message_;
};

} // namespace hierloom::ui
