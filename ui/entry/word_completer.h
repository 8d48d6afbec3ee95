// SPDX-License-Identifier: GPL-3.0-or-later
#pragma once
#include <QCompleter>

namespace hierloom::ui {

/// Completion of the last word of a field holding several animals separated
/// by spaces (the supporters of a side): the word being typed is matched
/// against the same list as the winner and loser fields, and choosing a
/// completion replaces only that word.
class WordCompleter : public QCompleter {
    Q_OBJECT
public:
    WordCompleter(QAbstractItemModel* model, QObject* parent) : QCompleter(model, parent) {}

    QStringList splitPath(const QString& path) const override;
    QString pathFromIndex(const QModelIndex& index) const override;
};

} // namespace hierloom::ui
