// SPDX-License-Identifier: GPL-3.0-or-later
#include "ui/document/reading_connection.h"

#include "ui/document/qt_convert.h"

namespace hierloom::ui {

core::ColonyStore openReadingConnection(const QString& path)
{
    return core::ColonyStore::open(toStdString(path), core::ColonyStore::Mode::ReadOnly);
}

} // namespace hierloom::ui
