// SPDX-License-Identifier: GPL-3.0-or-later
#include "ui/widgets/confirm.h"

#include <QMessageBox>

namespace hierloom::ui {

bool confirm(QWidget* parent, const QString& title, const QString& question, bool yesByDefault)
{
    QMessageBox box(QMessageBox::Question, title, question, QMessageBox::Yes | QMessageBox::No, parent);
    box.setDefaultButton(yesByDefault ? QMessageBox::Yes : QMessageBox::No);
    box.setEscapeButton(QMessageBox::No);
    return box.exec() == QMessageBox::Yes;
}

} // namespace hierloom::ui
