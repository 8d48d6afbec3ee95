// SPDX-License-Identifier: GPL-3.0-or-later
#include "core/pedigree/matriline.h"

#include <algorithm>

namespace hierloom::core {

Matrilines::Matrilines(const Colony& colony)
{
    recorded_ = static_cast<int>(colony.animals.size());
    for (const Animal& a : colony.animals) {
        index_.emplace(a.id, static_cast<int>(ids_.size()));
        ids_.push_back(a.id);
        sex_.push_back(a.sex);
        birth_.push_back(a.birth);
    }
    mother_.assign(ids_.size(), -1);
    father_.assign(ids_.size(), -1);
    for (int i = 0; i < recorded_; ++i) {
        const Animal& a = colony.animals[static_cast<size_t>(i)];
        if (!a.father.empty()) {
            const auto f = index_.find(a.father);
            if (f == index_.end())
                problems_.push_back({a.id, "father " + a.father + " has no record; treated as unknown"});
            else
                father_[static_cast<size_t>(i)] = f->second;
        }
        if (a.mother.empty()) continue;
        auto m = index_.find(a.mother);
        if (m == index_.end()) {
            // Her daughters must still be sisters of one matriline: an unrecorded node.
            problems_.push_back({a.id, "mother " + a.mother + " has no record of her own"});
            m = index_.emplace(a.mother, static_cast<int>(ids_.size())).first;
            ids_.push_back(a.mother);
            sex_.push_back(Sex::Unknown);
            birth_.push_back(std::nullopt);
            mother_.push_back(-1);
            father_.push_back(-1);
        } else if (sex_[static_cast<size_t>(m->second)] != Sex::Female) {
            problems_.push_back({a.id, "mother " + a.mother + " is not recorded as female"});
        }
        mother_[static_cast<size_t>(i)] = m->second;
    }
    // Drop a mother link that closes a cycle: walk up from each node, colouring
    // the nodes of the current walk; meeting one of them again is a cycle.
    const size_t n = ids_.size();
    std::vector<char> state(n, 0); // 0 unseen, 1 on the current walk, 2 done
    for (size_t start = 0; start < n; ++start) {
        std::vector<int> walk;
        int at = static_cast<int>(start);
        while (at >= 0 && state[static_cast<size_t>(at)] == 0) {
            state[static_cast<size_t>(at)] = 1;
            walk.push_back(at);
            const int m = mother_[static_cast<size_t>(at)];
            if (m >= 0 && state[static_cast<size_t>(m)] == 1) {
                problems_.push_back({ids_[static_cast<size_t>(at)],
                                     "mother link to " + ids_[static_cast<size_t>(m)] +
                                         " makes the animal its own ancestor; link ignored"});
                mother_[static_cast<size_t>(at)] = -1;
                break;
            }
            at = m;
        }
        for (int w : walk) state[static_cast<size_t>(w)] = 2;
    }
    matriarch_.assign(n, -1);
    generation_.assign(n, 0);
    offspring_.assign(n, {});
    for (size_t i = 0; i < n; ++i) {
        int at = static_cast<int>(i);
        int steps = 0;
        while (mother_[static_cast<size_t>(at)] >= 0) {
            at = mother_[static_cast<size_t>(at)];
            ++steps;
        }
        matriarch_[i] = at;
        generation_[i] = steps;
        if (mother_[i] >= 0) offspring_[static_cast<size_t>(mother_[i])].push_back(static_cast<int>(i));
    }
    for (auto& list : offspring_)
        std::sort(list.begin(), list.end(), [this](int a, int b) { return id(a) < id(b); });
}

int Matrilines::index(std::string_view id) const
{
    const auto it = index_.find(id);
    return it == index_.end() ? -1 : it->second;
}

int Matrilines::grandmother(int a) const
{
    const int m = mother(a);
    return m < 0 ? -1 : mother(m);
}

std::vector<int> Matrilines::daughters(int a) const
{
    std::vector<int> out;
    for (int c : offspring(a))
        if (sex(c) == Sex::Female) out.push_back(c);
    return out;
}

std::vector<int> Matrilines::sisters(int a) const
{
    const int m = mother(a);
    if (m < 0) return {};
    std::vector<int> out;
    for (int d : daughters(m))
        if (d != a) out.push_back(d);
    return out;
}

std::vector<int> Matrilines::matriarchs() const
{
    std::vector<int> out;
    for (int i = 0; i < size(); ++i)
        if (mother(i) < 0) out.push_back(i);
    std::sort(out.begin(), out.end(), [this](int a, int b) { return id(a) < id(b); });
    return out;
}

std::vector<int> Matrilines::members(int m) const
{
    std::vector<int> out;
    for (int i = 0; i < size(); ++i)
        if (matriarch(i) == m) out.push_back(i);
    std::sort(out.begin(), out.end(), [this](int a, int b) { return id(a) < id(b); });
    return out;
}

std::vector<PedigreeNode> Matrilines::pedigreeNodes() const
{
    std::vector<PedigreeNode> out(ids_.size());
    for (size_t i = 0; i < out.size(); ++i) out[i] = PedigreeNode{mother_[i], father_[i]};
    return out;
}

PedigreeKinship::PedigreeKinship(const Matrilines& lines)
    : lines_(&lines)
    , relatedness_(lines.pedigreeNodes())
{
}

DyadRelatedness PedigreeKinship::of(int a, int b)
{
    return DyadRelatedness{relatedness_.relatedness(a, b), relatedness_.pedigreeDepth(a, b)};
}

std::optional<DyadRelatedness> PedigreeKinship::of(std::string_view a, std::string_view b)
{
    const int i = lines_->index(a);
    const int j = lines_->index(b);
    if (i < 0 || j < 0) return std::nullopt;
    return of(i, j);
}

} // namespace hierloom::core
