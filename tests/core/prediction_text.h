// SPDX-License-Identifier: GPL-3.0-or-later
#pragma once
// A predicted order as text, every field, numbers by their bits: for tests
// that compare two paths to the same prediction.
#include "core/pedigree/inheritance_prediction.h"
#include "random_colony.h"

#include <sstream>
#include <string>

namespace hierloom::test {

inline std::string predictionText(const core::InheritancePrediction& p)
{
    std::ostringstream out;
    out << p.at << ' ' << core::toString(p.rule) << '\n';
    for (const core::PredictedFemale& f : p.females)
        out << f.animal << ' ' << f.matriarch << ' ' << f.predictedRank << ' '
            << (f.observedRank ? std::to_string(*f.observedRank) : "-") << ' ' << bits(f.observedScore) << ' '
            << f.discordantDyads << '\n';
    for (const std::string& m : p.matrilineOrder) out << "m " << m << '\n';
    for (const std::string& a : p.unknownBirthCountedMature) out << "u " << a << '\n';
    for (const std::string& a : p.unorderable) out << "o " << a << '\n';
    return out.str();
}

} // namespace hierloom::test
