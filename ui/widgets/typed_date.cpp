// SPDX-License-Identifier: GPL-3.0-or-later
#include "ui/widgets/typed_date.h"

#include "ui/document/qt_convert.h"

#include <QCoreApplication>
#include <QRegularExpression>

namespace hierloom::ui {

std::optional<core::Day> parseTypedDate(const QString& typed)
{
    const QString t = typed.trimmed();
    static const QRegularExpression dashed(QStringLiteral("^(\\d{4})-(\\d{2})-(\\d{2})$"));
    static const QRegularExpression digits(QStringLiteral("^(\\d{4})(\\d{2})(\\d{2})$"));
    QRegularExpressionMatch m = dashed.match(t);
    if (!m.hasMatch()) m = digits.match(t);
    if (!m.hasMatch()) return std::nullopt;
    // core::parseDate refuses impossible days (2026-02-30), so nothing rolls over.
    return core::parseDate(toStdString(m.captured(1) + '-' + m.captured(2) + '-' + m.captured(3)));
}

QString typedDateProblem(const QString& typed)
{
    if (typed.trimmed().isEmpty())
        return QCoreApplication::translate("hierloom::ui::TypedDate", "Type the date as YYYY-MM-DD or YYYYMMDD");
    return QCoreApplication::translate("hierloom::ui::TypedDate",
                                       "'%1' is not a real date; type it as YYYY-MM-DD or YYYYMMDD")
        .arg(typed.trimmed());
}

} // namespace hierloom::ui
