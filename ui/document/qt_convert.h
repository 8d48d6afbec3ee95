// SPDX-License-Identifier: GPL-3.0-or-later
#pragma once
// The few conversions between core's plain values and Qt's types.
#include "core/base/civil_date.h"

#include <QDate>
#include <QString>

#include <string>

namespace hierloom::ui {

inline QString toQString(const std::string& s) { return QString::fromUtf8(s.data(), static_cast<qsizetype>(s.size())); }

inline std::string toStdString(const QString& s) { return s.toUtf8().toStdString(); }

inline QDate toQDate(core::Day d)
{
    const core::CivilDate c = core::civilFromDay(d);
    return QDate(c.year, static_cast<int>(c.month), static_cast<int>(c.day));
}

inline core::Day toDay(const QDate& d)
{
    return core::dayFromCivil(d.year(), static_cast<unsigned>(d.month()), static_cast<unsigned>(d.day()));
}

inline QString formatDay(core::Day d) { return toQString(core::formatDate(d)); }

} // namespace hierloom::ui
