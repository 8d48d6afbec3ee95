// SPDX-License-Identifier: GPL-3.0-or-later
#pragma once
#include <QList>
#include <QString>

class QWidget;

namespace hierloom::ui {

/// One key of a widget's own, for the help's shortcut sheet.
struct KeySheetRow {
    QString keys;
    QString where;
    QString what;
};

/// Publishes the keys a widget handles itself (not through menu actions), so
/// the help's shortcut sheet (help_browser.h) lists them under `title`
/// whenever the widget is inside the window the help belongs to.
void publishKeySheet(QWidget* widget, const QString& title, const QList<KeySheetRow>& rows);

/// Every sheet published inside `window`, as HTML (a heading and a table each).
QString keySheetsHtml(const QWidget* window);

} // namespace hierloom::ui
