// SPDX-License-Identifier: GPL-3.0-or-later
#pragma once
#include <QWidget>

class QCheckBox;
class QComboBox;
class QDateEdit;
class QLabel;
class QLineEdit;
class QTableView;

namespace hierloom::ui {

class ColonyDocument;
class EncounterTableModel;

/// The encounter log, newest first, with a date range, an animal and an observer filter.
class EncounterView : public QWidget {
    Q_OBJECT
public:
    explicit EncounterView(ColonyDocument* document, QWidget* parent = nullptr);

    int visibleRowCount() const;
    EncounterTableModel* model() const { return model_; }
    QTableView* table() const { return table_; }

    /// Filter setters for scripts and tests; each drives the matching control.
    void setDateRange(const QDate& from, const QDate& to);
    void setAnimal(const QString& id);
    void setObserver(const QString& name);
    /// The search box over ids, behaviour, group, observer and notes.
    QLineEdit* searchBox() const { return search_; }

private:
    void refillChoices();
    void applyFilter();
    void updateSummary();

    ColonyDocument* document_;
    EncounterTableModel* model_;
    QCheckBox* fromCheck_;
    QDateEdit* from_;
    QCheckBox* toCheck_;
    QDateEdit* to_;
    QComboBox* animal_;
    QComboBox* observer_;
    QLineEdit* search_;
    QLabel* summary_;
    QTableView* table_;
};

} // namespace hierloom::ui
