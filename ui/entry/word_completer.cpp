// SPDX-License-Identifier: GPL-3.0-or-later
#include "ui/entry/word_completer.h"

#include <QLineEdit>

namespace hierloom::ui {

QStringList WordCompleter::splitPath(const QString& path) const
{
    return {path.mid(path.lastIndexOf(QLatin1Char(' ')) + 1)};
}

QString WordCompleter::pathFromIndex(const QModelIndex& index) const
{
    const auto* edit = qobject_cast<const QLineEdit*>(widget());
    const QString text = edit ? edit->text() : QString();
    return text.left(text.lastIndexOf(QLatin1Char(' ')) + 1) + QCompleter::pathFromIndex(index);
}

} // namespace hierloom::ui
