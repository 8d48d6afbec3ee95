// SPDX-License-Identifier: GPL-3.0-or-later
#pragma once
#include <QObject>

#include <functional>

class QAction;
class QMainWindow;
class QMenu;

namespace hierloom::ui {

class ColonyEditFacade;

/// The Edit menu (Undo/Redo from the document's QUndoStack, evening entry,
/// behaviour codes, observers) and the Pedigree menu (add/edit animal,
/// birth, death, removal, introduction, move), each with a shortcut shown in
/// the menu; the pedigree dialogs start from the animal selected in the
/// Animals view, if any. Kept out of the main window so it only assembles.
class EditMenus : public QObject {
    Q_OBJECT
public:
    EditMenus(QMainWindow* window, ColonyEditFacade* facade, std::function<void()> showEntry);

    QAction* undoAction() const { return undo_; }
    QAction* redoAction() const { return redo_; }

private:
    void updateEnabled();
    QString selectedAnimal() const;

    QMainWindow* window_;
    ColonyEditFacade* facade_;
    QAction* undo_;
    QAction* redo_;
    QList<QAction*> writeActions_;
};

} // namespace hierloom::ui
