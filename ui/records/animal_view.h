// SPDX-License-Identifier: GPL-3.0-or-later
#pragma once
#include <QWidget>

class QComboBox;
class QLabel;
class QLineEdit;
class QTableView;

namespace hierloom::ui {

class AnimalFilterProxy;
class AnimalTableModel;
class ColonyDocument;

/// The animal list: a search box, a status choice and the sortable table.
class AnimalView : public QWidget {
    Q_OBJECT
public:
    explicit AnimalView(ColonyDocument* document, QWidget* parent = nullptr);

    /// Rows shown after filtering.
    int visibleRowCount() const;
    void setFilterText(const QString& text);
    void setPresentOnly(bool presentOnly);

    AnimalTableModel* model() const { return model_; }
    QTableView* table() const { return table_; }

private:
    void updateSummary();

    AnimalTableModel* model_;
    AnimalFilterProxy* proxy_;
    QLineEdit* search_;
    QComboBox* status_;
    QLabel* summary_;
    QTableView* table_;
};

} // namespace hierloom::ui
