// SPDX-License-Identifier: GPL-3.0-or-later
#pragma once
#include <QDialog>

class QLabel;
class QTableWidget;

namespace hierloom::ui {

class ColonyEditFacade;

/// Edits the colony's behaviour codes (code, severity 0-5, description) or
/// its observers as a small table; OK saves the whole list through the edit
/// facade as one undoable step.
class ListEditorDialog : public QDialog {
    Q_OBJECT
public:
    enum class List { BehaviourCodes, Observers };
    ListEditorDialog(ColonyEditFacade* facade, List list, QWidget* parent = nullptr);
    void accept() override;

    QTableWidget* table() const { return table_; }
    QString message() const;

private:
    ColonyEditFacade* facade_;
    List list_;
    QTableWidget* table_;
    QLabel* message_;
};

} // namespace hierloom::ui
