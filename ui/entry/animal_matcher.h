// SPDX-License-Identifier: GPL-3.0-or-later
#pragma once
#include "core/base/civil_date.h"

#include <QCoreApplication>
#include <QStringList>

#include <optional>
#include <string>
#include <vector>

namespace hierloom::ui {

class ColonyDocument;

/// Finds the animal meant by what is typed in an animal field of the evening
/// entry: an exact id wins (resident or not, so the residence check can say
/// where it was); otherwise a unique id or name, whole or as a prefix,
/// ignoring case, among the animals resident in the session's group on the
/// session's day.
class AnimalMatcher {
    Q_DECLARE_TR_FUNCTIONS(AnimalMatcher)
public:
    struct Match {
        std::string id;       // the animal meant, or the text as typed
        QString hint;         // "id name", shown beside the field when fine
        std::optional<QString> error;
        bool partial = false; // a prefix of several residents: keep typing
    };

    explicit AnimalMatcher(const ColonyDocument* document) : document_(document) {}

    /// Takes the residents of `group` on `day`; returns their ids and names,
    /// sorted ignoring case, for the fields' completion.
    QStringList setSession(const std::string& group, core::Day day);
    /// True when the session's group had nobody on its day.
    bool noResidents() const { return residents_.empty(); }

    Match resolve(const QString& typed) const;

private:
    struct Resident {
        std::string id;
        std::string name;
    };
    const ColonyDocument* document_;
    core::Day day_ = 0;
    std::vector<Resident> residents_;
};

} // namespace hierloom::ui
