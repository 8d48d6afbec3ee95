// SPDX-License-Identifier: GPL-3.0-or-later
#pragma once
#include "core/base/civil_date.h"

#include <QString>
#include <QStringList>

#include <string>

class QWidget;

namespace hierloom::ui {

class ColonyDocument;

/// "Cosmo (NC012)", or the id alone for an animal without a name.
QString nameAndId(const ColonyDocument* document, const std::string& id);

/// Who an animal is on `day`, for the life-history dialogs: "Cosmo (NC012) ·
/// female · 7 years · group North"; empty when no such animal.
QString describeAnimal(const ColonyDocument* document, const std::string& id, core::Day day);

/// The colony's groups by name.
QStringList groupNames(const ColonyDocument* document);

/// Asks before a group name that is not yet in the colony makes a new group;
/// true when the name is an existing group or the person confirmed it.
bool confirmGroup(QWidget* parent, const ColonyDocument* document, const QString& group);

} // namespace hierloom::ui
