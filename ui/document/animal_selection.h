// SPDX-License-Identifier: GPL-3.0-or-later
#pragma once
#include "core/base/civil_date.h"

#include <QObject>
#include <QString>

#include <optional>

namespace hierloom::ui {

/// The animal and the date the linked views (timeline, pedigree, prediction)
/// show; each view sets and follows it, so a click in one shows in the others.
class AnimalSelection : public QObject {
    Q_OBJECT
public:
    using QObject::QObject;

    QString animal() const { return animal_; }
    std::optional<core::Day> day() const { return day_; }

    /// Empty id: nothing selected. Emits only on a change.
    void setAnimal(const QString& id)
    {
        if (id == animal_) return;
        animal_ = id;
        emit animalChanged(id);
    }
    void setDay(core::Day d)
    {
        if (day_ == d) return;
        day_ = d;
        emit dayChanged(d);
    }

signals:
    void animalChanged(const QString& id);
    void dayChanged(core::Day day);

private:
    QString animal_;
    std::optional<core::Day> day_;
};

} // namespace hierloom::ui
