// SPDX-License-Identifier: GPL-3.0-or-later
#include "ui/entry/undo_keys.h"

#include "ui/document/colony_document.h"
#include "ui/entry/entry_keys.h"

#include <QEvent>
#include <QKeyEvent>
#include <QWidget>

namespace hierloom::ui {

namespace {

enum class Step { None, Undo, Redo };

Step stepOf(const QKeyEvent* key)
{
    if (entryKeyMatches(EntryKey::UndoLine, key)) return Step::Undo;
    if (entryKeyMatches(EntryKey::RedoLine, key)) return Step::Redo;
    return Step::None;
}

} // namespace

UndoKeys::UndoKeys(QWidget* area, ColonyDocument* document) : QObject(area), document_(document) { watch(area); }

void UndoKeys::watch(QWidget* w)
{
    w->installEventFilter(this);
    for (QWidget* child : w->findChildren<QWidget*>()) child->installEventFilter(this);
}

bool UndoKeys::eventFilter(QObject* watched, QEvent* event)
{
    if (event->type() != QEvent::ShortcutOverride && event->type() != QEvent::KeyPress)
        return QObject::eventFilter(watched, event);
    const Step step = stepOf(static_cast<QKeyEvent*>(event));
    if (step == Step::None) return QObject::eventFilter(watched, event);
    if (event->type() == QEvent::ShortcutOverride) {
        // Claim the key so that it arrives here as a key press, before the field or a menu action.
        event->accept();
        return true;
    }
    if (step == Step::Undo) document_->undo();
    else document_->redo();
    return true;
}

} // namespace hierloom::ui
