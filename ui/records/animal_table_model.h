// SPDX-License-Identifier: GPL-3.0-or-later
#pragma once
#include "core/base/civil_date.h"

#include <QAbstractTableModel>
#include <QString>

#include <optional>
#include <vector>

namespace hierloom::ui {

class ColonyDocument;

/// One row per animal of the open colony: identity, age, matriline, current
/// group and status. Rebuilt when the animals change (or another file is
/// read); encounter, list and settings changes leave it as it is.
class AnimalTableModel : public QAbstractTableModel {
    Q_OBJECT
public:
    enum Column { Id, Name, Sex, Birth, Age, Mother, Founder, Group, Status, ColumnCount };
    enum Role {
        SortRole = Qt::UserRole + 1, ///< a value that sorts naturally (days, years)
        SearchTextRole,              ///< id, name, mother and founder, for the text filter
        PresentRole,                 ///< true while the animal is in the colony
    };

    explicit AnimalTableModel(const ColonyDocument* document, QObject* parent = nullptr);

    int rowCount(const QModelIndex& parent = {}) const override;
    int columnCount(const QModelIndex& parent = {}) const override;
    QVariant data(const QModelIndex& index, int role = Qt::DisplayRole) const override;
    QVariant headerData(int section, Qt::Orientation orientation, int role = Qt::DisplayRole) const override;

    /// The day ages and current groups are computed at (today unless set, for tests).
    void setReferenceDay(core::Day day);

private:
    struct Row {
        QString founder;
        QString group;
        QString status;
        std::optional<int> age;
        bool present = true;
    };
    void rebuild();
    QVariant display(size_t row, int column) const;
    QVariant sortValue(size_t row, int column) const;

    const ColonyDocument* document_;
    std::vector<Row> rows_;
    std::optional<core::Day> referenceDay_;
};

} // namespace hierloom::ui
