// SPDX-License-Identifier: GPL-3.0-or-later
#include "ui/entry/animal_matcher.h"

#include "core/rules/encounter_rules.h"
#include "ui/document/colony_document.h"
#include "ui/document/qt_convert.h"

namespace hierloom::ui {

QStringList AnimalMatcher::setSession(const std::string& group, core::Day day)
{
    day_ = day;
    residents_.clear();
    const auto& where = document_->residences();
    const int g = where.group(group);
    QStringList words;
    if (g >= 0)
        for (const core::Animal& a : document_->pedigree().animals) {
            const int i = where.animal(a.id);
            if (i >= 0 && where.groupOn(i, day) == g) {
                residents_.push_back({a.id, a.name});
                words << toQString(a.id);
                if (!a.name.empty()) words << toQString(a.name);
            }
        }
    words.sort(Qt::CaseInsensitive);
    return words;
}

AnimalMatcher::Match AnimalMatcher::resolve(const QString& typed) const
{
    Match r;
    const QString text = typed.trimmed();
    r.id = toStdString(text);
    if (text.isEmpty()) return r;
    const auto& animals = document_->pedigree().animals;
    auto label = [](const std::string& id, const std::string& name) {
        return name.empty() ? toQString(id) : toQString(id) + QStringLiteral(" ") + toQString(name);
    };
    if (const int i = document_->pedigree().animalIndex(r.id); i >= 0) {
        r.hint = label(r.id, animals[static_cast<size_t>(i)].name);
        return r;
    }
    std::vector<const Resident*> byId, byName, exact;
    for (const Resident& a : residents_) {
        const QString id = toQString(a.id), name = toQString(a.name);
        if (id.compare(text, Qt::CaseInsensitive) == 0 || (!a.name.empty() && name.compare(text, Qt::CaseInsensitive) == 0))
            exact.push_back(&a);
        if (id.startsWith(text, Qt::CaseInsensitive)) byId.push_back(&a);
        else if (!a.name.empty() && name.startsWith(text, Qt::CaseInsensitive)) byName.push_back(&a);
    }
    const std::vector<const Resident*>& hits =
        exact.size() == 1 ? exact : (byId.size() + byName.size() == 1 ? (byId.empty() ? byName : byId) : exact);
    if (hits.size() == 1) {
        r.id = hits.front()->id;
        r.hint = label(r.id, hits.front()->name);
        return r;
    }
    if (byId.size() + byName.size() > 1) {
        QStringList ids;
        for (const auto* list : {&byId, &byName})
            for (const Resident* a : *list) ids << toQString(a->id);
        const qsizetype all = ids.size();
        if (all > 4) ids = ids.mid(0, 4) << tr("... (%1 in all)").arg(all);
        r.partial = true;
        r.error = tr("'%1' matches %2; type more").arg(text, ids.join(QStringLiteral(", ")));
        return r;
    }
    // Same words as the import for an id it does not know.
    r.error = toQString(core::checkEncounterAnimal(r.id, {}, day_, document_->residences()).value_or(""));
    return r;
}

} // namespace hierloom::ui
