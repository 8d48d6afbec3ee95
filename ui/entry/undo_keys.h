// SPDX-License-Identifier: GPL-3.0-or-later
#pragma once
#include <QObject>

class QUndoStack;
class QWidget;

namespace hierloom::ui {

/// Makes Ctrl+Z and Ctrl+Shift+Z (or Ctrl+Y) undo and redo whole edits of the
/// colony from any field inside `area`: a text field would otherwise take the
/// keys for its own typing history (it accepts the ShortcutOverride), so the
/// Edit menu never saw them. Fields added later are covered by watch().
class UndoKeys : public QObject {
    Q_OBJECT
public:
    UndoKeys(QWidget* area, QUndoStack* stack);
    /// Installs the filter on `w` and all its descendants.
    void watch(QWidget* w);

protected:
    bool eventFilter(QObject* watched, QEvent* event) override;

private:
    QUndoStack* stack_;
};

} // namespace hierloom::ui
