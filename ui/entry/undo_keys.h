// SPDX-License-Identifier: GPL-3.0-or-later
#pragma once
#include <QObject>

class QWidget;

namespace hierloom::ui {

class ColonyDocument;

/// Makes Ctrl+Z and Ctrl+Shift+Z (or Ctrl+Y) undo and redo whole edits of the
/// colony from any field inside `area`: a text field would otherwise take the
/// keys for its own typing history (it accepts the ShortcutOverride), so the
/// Edit menu never saw them. The steps go through ColonyDocument::undo() and
/// redo(), which first notice another program's writes. Fields added later
/// are covered by watch().
class UndoKeys : public QObject {
    Q_OBJECT
public:
    UndoKeys(QWidget* area, ColonyDocument* document);
    /// Installs the filter on `w` and all its descendants.
    void watch(QWidget* w);

protected:
    bool eventFilter(QObject* watched, QEvent* event) override;

private:
    ColonyDocument* document_;
};

} // namespace hierloom::ui
