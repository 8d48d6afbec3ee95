// SPDX-License-Identifier: GPL-3.0-or-later
#include "ui/entry/undo_keys.h"

#include <QEvent>
#include <QKeyEvent>
#include <QUndoStack>
#include <QWidget>

namespace hierloom::ui {

namespace {

enum class Step { None, Undo, Redo };

Step stepOf(const QKeyEvent* key)
{
    const auto mods = key->modifiers() & (Qt::ControlModifier | Qt::ShiftModifier | Qt::AltModifier | Qt::MetaModifier);
    if (key->key() == Qt::Key_Z && mods == Qt::ControlModifier) return Step::Undo;
    if (key->key() == Qt::Key_Z && mods == (Qt::ControlModifier | Qt::ShiftModifier)) return Step::Redo;
    if (key->key() == Qt::Key_Y && mods == Qt::ControlModifier) return Step::Redo;
    return Step::None;
}

} // namespace

UndoKeys::UndoKeys(QWidget* area, QUndoStack* stack) : QObject(area), stack_(stack) { watch(area); }

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
    if (step == Step::Undo) stack_->undo();
    else stack_->redo();
    return true;
}

} // namespace hierloom::ui
