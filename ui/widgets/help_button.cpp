// SPDX-License-Identifier: GPL-3.0-or-later
#include "ui/widgets/help_button.h"

#include "ui/widgets/help_browser.h"
#include "ui/widgets/help_topics.h"

#include <QCoreApplication>

namespace hierloom::ui {

HelpButton::HelpButton(const QString& figureKey, QWidget* parent)
    : HelpButton(QStringLiteral("methods.html"), figureKey, parent)
{
}

HelpButton::HelpButton(const QString& page, const QString& anchor, QWidget* parent)
    : QToolButton(parent), page_(page), anchor_(anchor)
{
    setUp();
}

void HelpButton::setUp()
{
    setAutoRaise(true);
    setFocusPolicy(Qt::TabFocus);
    setCursor(Qt::WhatsThisCursor);
    const HelpTopic* topic = findHelpTopic(anchor_.toUtf8().constData());
    const QString name = topic ? QCoreApplication::translate("hierloom::ui::HelpTopic", topic->title) : QString();
    // "?" with the figure's name, so a row of them says which is which ("&" is not a shortcut here).
    QString escaped = name;
    escaped.replace(QLatin1Char('&'), QStringLiteral("&&"));
    setText(name.isEmpty() ? QStringLiteral("?") : QStringLiteral("? ") + escaped);
    setToolTip(name.isEmpty() ? tr("Open the help on this") : tr("What is %1? Opens its definition in the help.").arg(name));
    setAccessibleName(name.isEmpty() ? tr("Help") : tr("Help on %1").arg(name));
    connect(this, &QToolButton::clicked, this, [this] { showHelp(this, page_, anchor_); });
}

} // namespace hierloom::ui
