// SPDX-License-Identifier: GPL-3.0-or-later
#include "ui/shell/about_dialog.h"

#include <QApplication>
#include <QDialogButtonBox>
#include <QHBoxLayout>
#include <QIcon>
#include <QLabel>
#include <QVBoxLayout>

#include <qcustomplot.h>

namespace hierloom::ui {

QIcon applicationIcon()
{
    QIcon icon;
    // The PNG sizes keep small icons crisp; the SVG covers every other size and scale.
    for (int size : {16, 22, 24, 32, 48, 64, 128, 256})
        icon.addFile(QStringLiteral(":/icons/hierloom-%1.png").arg(size), QSize(size, size));
    icon.addFile(QStringLiteral(":/icons/hierloom.svg"));
    return icon;
}

QString AboutDialog::aboutHtml()
{
    const QString row = QStringLiteral("<tr><td>%1</td><td>%2</td><td>%3</td></tr>");
    QString libraries = row.arg(tr("Qt %1").arg(QString::fromLatin1(qVersion())), tr("LGPL-3.0"),
                                tr("windows, tables, help"));
    libraries += row.arg(tr("QCustomPlot %1").arg(QStringLiteral(QCUSTOMPLOT_VERSION_STR)), tr("GPL-3.0"), tr("plots"));
    libraries += row.arg(tr("SQLite"), tr("public domain"), tr("the colony file"));
    libraries += row.arg(tr("CLI11"), tr("BSD-3-Clause"), tr("command-line options"));
    libraries += row.arg(tr("GoogleTest"), tr("BSD-3-Clause"), tr("tests only, not shipped"));
    return tr("<h2>Hierloom %1</h2>"
              "<p>Dominance ranks and their inheritance in animal colonies.</p>"
              "<p>Copyright &copy; the Hierloom authors.<br>"
              "This program is free software: you can redistribute it and/or modify it under the terms of the "
              "GNU General Public License as published by the Free Software Foundation, either version 3 of the "
              "License, or (at your option) any later version (GPL-3.0-or-later). It comes with ABSOLUTELY NO "
              "WARRANTY.</p>"
              "<p>Built with:</p>")
               .arg(QApplication::applicationVersion()) +
           QStringLiteral("<table cellpadding=\"3\">") +
           QStringLiteral("<tr><th align=\"left\">%1</th><th align=\"left\">%2</th><th align=\"left\">%3</th></tr>")
               .arg(tr("Library"), tr("Licence"), tr("Used for")) +
           libraries + QStringLiteral("</table>");
}

AboutDialog::AboutDialog(QWidget* parent) : QDialog(parent)
{
    setWindowTitle(tr("About Hierloom"));
    auto* icon = new QLabel(this);
    icon->setPixmap(applicationIcon().pixmap(QSize(96, 96), devicePixelRatio()));
    icon->setAlignment(Qt::AlignTop);
    auto* text = new QLabel(aboutHtml(), this);
    text->setObjectName(QStringLiteral("aboutText"));
    text->setWordWrap(true);
    text->setTextInteractionFlags(Qt::TextBrowserInteraction);
    text->setOpenExternalLinks(true);
    text->setMinimumWidth(text->fontMetrics().averageCharWidth() * 60);
    auto* buttons = new QDialogButtonBox(QDialogButtonBox::Close, this);
    connect(buttons, &QDialogButtonBox::rejected, this, &QDialog::reject);

    auto* top = new QHBoxLayout;
    top->addWidget(icon);
    top->addSpacing(12);
    top->addWidget(text, 1);
    auto* layout = new QVBoxLayout(this);
    layout->addLayout(top);
    layout->addWidget(buttons);
}

} // namespace hierloom::ui
