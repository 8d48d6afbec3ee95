// SPDX-License-Identifier: GPL-3.0-or-later
#include "ui/records/animal_table_model.h"

#include "core/pedigree/matriline.h"
#include "ui/document/colony_document.h"
#include "ui/document/qt_convert.h"

#include <limits>

namespace hierloom::ui {

AnimalTableModel::AnimalTableModel(const ColonyDocument* document, QObject* parent)
    : QAbstractTableModel(parent), document_(document)
{
    connect(document_, &ColonyDocument::changed, this, [this](ColonyDocument::ChangeKind kind) {
        // Nothing in a row comes from encounters, lists or settings: an
        // evening's lines leave the table alone (at a million encounters a
        // rebuild per Enter cost a third of the time to the visible row).
        if (kind == ColonyDocument::ChangeKind::Reset || kind == ColonyDocument::ChangeKind::AnimalsChanged) rebuild();
    });
    rebuild();
}

void AnimalTableModel::setReferenceDay(core::Day day)
{
    referenceDay_ = day;
    rebuild();
}

void AnimalTableModel::rebuild()
{
    beginResetModel();
    const core::Colony& colony = document_->pedigree();
    const core::ResidenceIndex& residences = document_->residences();
    const core::Day today = referenceDay_.value_or(core::today());
    rows_.clear();
    rows_.reserve(colony.animals.size());
    // The same matriarchs as every other view (a looping mother link is dropped there, not here).
    const core::Matrilines lines(colony);
    for (const core::Animal& a : colony.animals) {
        Row row;
        const int node = lines.index(a.id);
        // A male with no recorded mother heads no matriline: no matriarch, rather than himself.
        if (node >= 0 && !(a.sex == core::Sex::Male && lines.matriarch(node) == node))
            row.founder = toQString(lines.id(lines.matriarch(node)));
        const bool gone = a.exit && *a.exit <= today;
        row.present = !gone;
        if (a.birth) row.age = core::ageInYears(*a.birth, gone ? *a.exit : today);
        if (gone) {
            row.status = a.exitType == core::ExitType::Removed ? tr("removed %1").arg(formatDay(*a.exit))
                                                                : tr("died %1").arg(formatDay(*a.exit));
        } else {
            row.status = tr("present");
            const int index = residences.animal(a.id);
            const int group = index < 0 ? -1 : residences.groupOn(index, today);
            if (group >= 0) row.group = toQString(residences.groups()[static_cast<size_t>(group)]);
        }
        rows_.push_back(std::move(row));
    }
    endResetModel();
}

int AnimalTableModel::rowCount(const QModelIndex& parent) const
{
    return parent.isValid() ? 0 : static_cast<int>(rows_.size());
}

int AnimalTableModel::columnCount(const QModelIndex& parent) const { return parent.isValid() ? 0 : ColumnCount; }

QVariant AnimalTableModel::data(const QModelIndex& index, int role) const
{
    if (!index.isValid() || index.row() >= rowCount()) return {};
    const auto row = static_cast<size_t>(index.row());
    switch (role) {
    case Qt::DisplayRole: return display(row, index.column());
    case SortRole: return sortValue(row, index.column());
    case PresentRole: return rows_[row].present;
    case SearchTextRole: {
        const core::Animal& a = document_->pedigree().animals[row];
        return QStringList{toQString(a.id), toQString(a.name), toQString(a.mother), rows_[row].founder}.join(u'\n');
    }
    case Qt::TextAlignmentRole:
        if (index.column() == Age) return QVariant(Qt::AlignRight | Qt::AlignVCenter);
        return {};
    default: return {};
    }
}

QVariant AnimalTableModel::display(size_t row, int column) const
{
    const core::Animal& a = document_->pedigree().animals[row];
    switch (column) {
    case Id: return toQString(a.id);
    case Name: return toQString(a.name);
    case Sex:
        switch (a.sex) {
        case core::Sex::Female: return tr("F");
        case core::Sex::Male: return tr("M");
        default: return tr("?");
        }
    case Birth: return a.birth ? formatDay(*a.birth) : QString();
    case Age: return rows_[row].age ? QVariant(*rows_[row].age) : QVariant();
    case Mother: return toQString(a.mother);
    case Founder: return rows_[row].founder;
    case Group: return rows_[row].group;
    case Status: return rows_[row].status;
    default: return {};
    }
}

QVariant AnimalTableModel::sortValue(size_t row, int column) const
{
    const core::Animal& a = document_->pedigree().animals[row];
    switch (column) {
    // Unknown birth dates and ages sort before every known one.
    case Birth: return a.birth ? *a.birth : std::numeric_limits<int>::min();
    case Age: return rows_[row].age.value_or(-1);
    case Status: return rows_[row].present ? std::numeric_limits<int>::max() : a.exit.value_or(0);
    default: return display(row, column).toString().toLower();
    }
}

QVariant AnimalTableModel::headerData(int section, Qt::Orientation orientation, int role) const
{
    if (orientation != Qt::Horizontal || role != Qt::DisplayRole) return {};
    switch (section) {
    case Id: return tr("ID");
    case Name: return tr("Name");
    case Sex: return tr("Sex");
    case Birth: return tr("Born");
    case Age: return tr("Age");
    case Mother: return tr("Mother");
    case Founder: return tr("Matriarch");
    case Group: return tr("Group now");
    case Status: return tr("Status");
    default: return {};
    }
}

} // namespace hierloom::ui
