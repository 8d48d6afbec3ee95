// SPDX-License-Identifier: GPL-3.0-or-later
#include "ui/widgets/key_sheet.h"

#include <QVariant>
#include <QWidget>

namespace hierloom::ui {

namespace {
const char* const kProperty = "hierloomKeySheet";
}

void publishKeySheet(QWidget* widget, const QString& title, const QList<KeySheetRow>& rows)
{
    QString html = QStringLiteral("<h2>%1</h2><table border=\"1\" cellpadding=\"4\" cellspacing=\"0\">"
                                  "<tr><th>Keys</th><th>Where</th><th>Action</th></tr>")
                       .arg(title.toHtmlEscaped());
    for (const KeySheetRow& r : rows)
        html += QStringLiteral("<tr><td>%1</td><td>%2</td><td>%3</td></tr>")
                    .arg(r.keys.toHtmlEscaped(), r.where.toHtmlEscaped(), r.what.toHtmlEscaped());
    html += QStringLiteral("</table>");
    widget->setProperty(kProperty, html);
}

QString keySheetsHtml(const QWidget* window)
{
    QString out;
    if (!window) return out;
    for (const QWidget* w : window->findChildren<QWidget*>()) {
        const QVariant sheet = w->property(kProperty);
        if (sheet.isValid()) out += sheet.toString();
    }
    return out;
}

} // namespace hierloom::ui
