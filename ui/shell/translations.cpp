// SPDX-License-Identifier: GPL-3.0-or-later
#include "ui/shell/translations.h"

#include <QCoreApplication>
#include <QLibraryInfo>
#include <QTranslator>

namespace hierloom::ui {

bool installTranslations(QCoreApplication& app, const QLocale& locale)
{
    // Qt's own strings (standard buttons, file dialogs) come from the system's Qt catalogues.
    auto* qt = new QTranslator(&app);
    if (qt->load(locale, QStringLiteral("qtbase"), QStringLiteral("_"),
                 QLibraryInfo::path(QLibraryInfo::TranslationsPath)))
        QCoreApplication::installTranslator(qt);
    else
        delete qt;

    auto* own = new QTranslator(&app);
    if (own->load(locale, QStringLiteral("hierloom"), QStringLiteral("_"), QString::fromLatin1(translationsResource))) {
        QCoreApplication::installTranslator(own);
        return true;
    }
    delete own;
    return false;
}

} // namespace hierloom::ui
