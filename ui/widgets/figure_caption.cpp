// SPDX-License-Identifier: GPL-3.0-or-later
#include "ui/widgets/figure_caption.h"

#include "core/base/display_names.h"
#include "core/ranks/rank_method_registry.h"
#include "ui/document/qt_convert.h"

#include <QCoreApplication>

namespace hierloom::ui::caption {

namespace {
QString tr(const char* text) { return QCoreApplication::translate("hierloom::ui::caption", text); }

QString draws(core::DrawPolicy d)
{
    return d == core::DrawPolicy::Ignore ? tr("draws ignored") : tr("draws count half to each");
}
} // namespace

QString group(const QString& name) { return name.isEmpty() ? tr("all groups") : tr("group %1").arg(name); }

QString window(std::optional<core::Day> from, std::optional<core::Day> to)
{
    return tr("%1 to %2")
        .arg(from ? toQString(core::formatDate(*from)) : tr("start of record"),
             to ? toQString(core::formatDate(*to)) : tr("end of record"));
}

QString elo(const core::EloSettings& e)
{
    return tr("Elo rating (k %1, start %2, %3 curve, %4)")
        .arg(e.k)
        .arg(e.start)
        .arg(e.curve == core::EloCurve::Normal ? tr("normal") : tr("logistic"), draws(e.draws));
}

QString method(core::RankMethod m, const core::EloSettings& e)
{
    if (m == core::RankMethod::Elo) return elo(e);
    const QString name = QCoreApplication::translate(
        "hierloom::core::DisplayName",
        core::displayName(core::CodeKind::Method, core::rankMethodInfo(m).code).c_str());
    return tr("%1 (%2)").arg(name, draws(e.draws));
}

QString join(const QStringList& parts)
{
    QStringList kept;
    for (const QString& p : parts)
        if (!p.isEmpty()) kept << p;
    return kept.join(QStringLiteral(" \u00b7 "));
}

} // namespace hierloom::ui::caption
