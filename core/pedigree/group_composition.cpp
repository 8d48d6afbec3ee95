// SPDX-License-Identifier: GPL-3.0-or-later
#include "core/pedigree/group_composition.h"

#include "core/pedigree/matriline.h"

#include <set>

namespace hierloom::core {


std::vector<GroupComposition> groupComposition(const Colony& colony, const ResidenceIndex& where, Day at,
                                               const std::vector<std::string>& groups, int maturityYears)
{
    const Matrilines lines(colony);
    std::vector<GroupComposition> out;
    for (const std::string& g : groups) {
        GroupComposition gc;
        gc.group = g;
        const int gi = where.group(g);
        std::set<std::string> heads;
        for (const Animal& a : colony.animals) {
            const int k = where.animal(a.id);
            if (gi < 0 || k < 0 || where.groupOn(k, at) != gi) continue;
            ++gc.animals;
            const bool adult = !a.birth || at >= anniversary(*a.birth, maturityYears);
            if (!adult) ++gc.immature;
            else if (a.sex == Sex::Female) ++gc.adultFemales;
            else if (a.sex == Sex::Male) ++gc.adultMales;
            else ++gc.unknownSex;
            if (a.sex == Sex::Female) heads.insert(lines.id(lines.matriarch(lines.index(a.id))));
        }
        if (gc.adultMales > 0) gc.adultSexRatio = static_cast<double>(gc.adultFemales) / gc.adultMales;
        gc.matriarchs.assign(heads.begin(), heads.end());
        gc.matrilines = static_cast<int>(heads.size());
        out.push_back(std::move(gc));
    }
    return out;
}

} // namespace hierloom::core
