// SPDX-License-Identifier: GPL-3.0-or-later
#include "ui/records/animal_summary.h"

#include "ui/document/colony_document.h"
#include "ui/document/qt_convert.h"
#include "ui/widgets/confirm.h"

#include <QCoreApplication>

namespace hierloom::ui {

namespace {
QString tr(const char* text) { return QCoreApplication::translate("hierloom::ui::AnimalSummary", text); }
} // namespace

QString nameAndId(const ColonyDocument* document, const std::string& id)
{
    const core::Colony& colony = document->pedigree();
    const int i = colony.animalIndex(id);
    if (i < 0 || colony.animals[static_cast<size_t>(i)].name.empty()) return toQString(id);
    return toQString(colony.animals[static_cast<size_t>(i)].name) + QStringLiteral(" (") + toQString(id) + ')';
}

QString describeAnimal(const ColonyDocument* document, const std::string& id, core::Day day)
{
    const core::Colony& colony = document->pedigree();
    const int i = colony.animalIndex(id);
    if (i < 0) return {};
    const core::Animal& a = colony.animals[static_cast<size_t>(i)];
    QStringList parts{nameAndId(document, id)};
    parts << (a.sex == core::Sex::Female ? tr("female") : a.sex == core::Sex::Male ? tr("male") : tr("sex unknown"));
    if (a.birth && *a.birth <= day) {
        const int years = core::ageInYears(*a.birth, day);
        parts << (years == 1 ? tr("1 year") : tr("%1 years").arg(years));
    } else {
        parts << tr("age unknown");
    }
    const core::ResidenceIndex& where = document->residences();
    const int w = where.animal(id);
    const int g = w < 0 ? -1 : where.groupOn(w, day);
    parts << (g >= 0 ? tr("group %1").arg(toQString(where.groups()[static_cast<size_t>(g)])) : tr("in no group that day"));
    if (a.exit) parts << tr("left the colony on %1").arg(formatDay(*a.exit));
    return parts.join(QStringLiteral(" · "));
}

QStringList groupNames(const ColonyDocument* document)
{
    QStringList out;
    for (const std::string& g : document->residences().groups()) out << toQString(g);
    out.sort();
    return out;
}

bool confirmGroup(QWidget* parent, const ColonyDocument* document, const QString& group)
{
    if (group.isEmpty() || groupNames(document).contains(group)) return true;
    return confirm(parent, tr("New Group"),
                   tr("There is no group '%1' in the colony. Create a new group named '%1'?").arg(group), false);
}

} // namespace hierloom::ui
