// SPDX-License-Identifier: GPL-3.0-or-later
// Small hand-built colonies for the matriline, prediction and scenario tests.
#pragma once
#include "core/base/civil_date.h"
#include "core/base/colony.h"

#include <string>

namespace hierloom::test {

/// Builds a colony: every animal lives in one group from its birth (or from
/// 2000-01-01 when the birth date is unknown) until its exit.
class PedigreeBuilder {
public:
    PedigreeBuilder& female(const std::string& id, const std::string& birth, const std::string& mother = {},
                            const std::string& father = {}, const std::string& group = "main")
    {
        return add(id, core::Sex::Female, birth, mother, father, group);
    }
    PedigreeBuilder& male(const std::string& id, const std::string& birth, const std::string& mother = {},
                          const std::string& group = "main")
    {
        return add(id, core::Sex::Male, birth, mother, {}, group);
    }
    /// The animal died on `date` (its last day of residence).
    PedigreeBuilder& died(const std::string& id, const std::string& date)
    {
        core::Animal& a = c_.animals[static_cast<size_t>(c_.animalIndex(id))];
        a.exit = core::parseDate(date);
        a.exitType = core::ExitType::Died;
        return *this;
    }
    /// `times` decided encounters won by `winner` over `loser` on `date`.
    PedigreeBuilder& win(const std::string& date, const std::string& winner, const std::string& loser, int times = 1)
    {
        for (int i = 0; i < times; ++i) {
            core::Encounter e;
            e.date = *core::parseDate(date);
            e.winner = winner;
            e.loser = loser;
            e.seq = static_cast<std::int64_t>(c_.encounters.size()) + 1;
            c_.encounters.push_back(e);
        }
        return *this;
    }
    core::Colony build() const
    {
        core::Colony c = c_;
        c.reindex();
        return c;
    }

private:
    PedigreeBuilder& add(const std::string& id, core::Sex sex, const std::string& birth, const std::string& mother,
                         const std::string& father, const std::string& group)
    {
        core::Animal a;
        a.id = id;
        a.sex = sex;
        if (!birth.empty()) a.birth = core::parseDate(birth);
        a.mother = mother;
        a.father = father;
        a.entry = a.birth ? *a.birth : core::dayFromCivil(2000, 1, 1);
        c_.animals.push_back(a);
        c_.residences.push_back({id, group, *a.entry, std::nullopt, {}});
        c_.reindex();
        return *this;
    }
    core::Colony c_;
};

} // namespace hierloom::test
