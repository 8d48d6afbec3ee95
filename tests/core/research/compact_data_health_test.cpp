// SPDX-License-Identifier: GPL-3.0-or-later
// Data health from compact records against data health from a Colony's
// encounters (the older path is the reference), on random colonies: every
// group, one group and a group nobody lives in, open and closed windows,
// every field of the result compared, numbers by their bits.
#include "core/research/data_health.h"

#include "random_colony.h"

#include <gtest/gtest.h>

#include <sstream>

using namespace hierloom::core;

namespace {

using hierloom::test::bits;

std::string day(const std::optional<Day>& d) { return d ? std::to_string(*d) : "-"; }

std::string text(const DataHealth& h)
{
    std::ostringstream out;
    out << h.reference << ' ' << static_cast<int>(h.referenceKind) << ' ' << h.minEncounters << ' ' << h.unseenDays
        << '\n';
    for (const AnimalEffort& a : h.animals)
        out << "a " << a.animal << ' ' << a.encounters << ' ' << a.daysSeen << ' ' << day(a.lastSeen) << ' '
            << a.fewEncounters << ' ' << bits(a.intervalWidth) << '\n';
    for (const ObserverEffort& o : h.observers) out << "o " << o.observer << ' ' << o.encounters << ' ' << o.days << '\n';
    for (const MonthEffort& m : h.months)
        out << "m " << m.year << ' ' << m.month << ' ' << m.encounters << ' ' << m.days << ' ' << m.animals << '\n';
    for (const UnseenAnimal& u : h.unseen)
        out << "u " << u.animal << ' ' << day(u.lastSeen) << ' ' << u.since << ' ' << u.days << '\n';
    for (const ObserverAgreement& a : h.agreement)
        out << "g " << a.first << ' ' << a.second << ' ' << a.sharedDays << ' ' << a.matched << ' ' << a.onlyFirst
            << ' ' << a.onlySecond << ' ' << a.agreeing << ' ' << bits(a.share) << ' ' << bits(a.kappa) << '\n';
    return out.str();
}

} // namespace

TEST(CompactDataHealth, RandomColoniesGiveTheSameHealth)
{
    size_t agreements = 0, widths = 0, unseen = 0;
    for (std::uint64_t seed = 1; seed <= 50; ++seed) {
        hierloom::test::RandomColonyShape shape;
        shape.animals = 6 + static_cast<int>(seed % 11);
        shape.encounters = 30 + static_cast<int>(seed * 13 % 400);
        shape.days = 20 + static_cast<int>(seed % 40);
        const Colony colony = hierloom::test::randomColony(seed, shape);
        const ResidenceIndex where(colony.animals, colony.residences);
        const CompactEncounters compact = compactEncounters(colony.encounters);
        for (const std::string& group : {std::string(), std::string("G1"), std::string("G2"), std::string("G9")}) {
            for (int window = 0; window < 3; ++window) {
                HealthOptions o;
                o.group = group;
                o.today = 18000 + 30;
                if (window == 1) o.from = 18000 + 5;
                if (window == 2) {
                    o.from = 18000 + 3;
                    o.to = 18000 + 15;
                }
                o.unseenDays = 1 + static_cast<int>(seed % 5);
                o.minEncounters = 5 + static_cast<int>(seed % 10);
                o.matchMinutes = static_cast<int>(seed % 3);
                o.randomisations = 20;
                o.seed = seed;
                o.threads = 1;
                if (seed % 7 == 0) o.elo.draws = DrawPolicy::Ignore;
                const DataHealth reference = dataHealth(colony, where, o);
                const DataHealth fromCompact = dataHealth(compact, colony.animals, where, o);
                EXPECT_EQ(text(reference), text(fromCompact))
                    << "seed " << seed << ", group '" << group << "', window " << window;
                agreements += reference.agreement.size();
                unseen += reference.unseen.size();
                for (const AnimalEffort& a : reference.animals) widths += a.intervalWidth.has_value();
            }
        }
    }
    // The colonies exercise every part of the result.
    EXPECT_GT(agreements, 100U);
    EXPECT_GT(widths, 1000U);
    EXPECT_GT(unseen, 50U);
}
