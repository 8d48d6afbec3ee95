// SPDX-License-Identifier: GPL-3.0-or-later
#include "core/pedigree/relatedness.h"

#include <algorithm>
#include <cmath>
#include <stdexcept>
#include <string>

namespace hierloom::core {

Relatedness::Relatedness(std::span<const PedigreeNode> pedigree)
    : mother_(pedigree.size(), -1)
    , father_(pedigree.size(), -1)
    , order_(pedigree.size(), -1)
    , byOrder_(pedigree.size(), -1)
    , generations_(pedigree.size(), 0)
    , inbreeding_(pedigree.size(), 0.0)
    , inbreedingKnown_(pedigree.size(), 0)
    , scratchV_(pedigree.size(), 0.0)
    , scratchU_(pedigree.size(), 0.0)
{
    const int n = static_cast<int>(pedigree.size());
    auto valid = [n](int p) { return p >= 0 && p < n ? p : -1; };
    for (int i = 0; i < n; ++i) {
        mother_[i] = valid(pedigree[i].mother);
        father_[i] = valid(pedigree[i].father);
    }

    // Iterative depth-first search giving parents a smaller order position than
    // their offspring; a link to an animal still on the search path closes a cycle
    // and is dropped. Iterative so that a long line cannot exhaust the stack.
    enum : char { kNew, kOpen, kDone };
    std::vector<char> state(pedigree.size(), kNew);
    std::vector<std::pair<int, int>> stack; // (animal, next parent slot 0/1/2)
    int next = 0;
    for (int root = 0; root < n; ++root) {
        if (state[root] != kNew)
            continue;
        stack.emplace_back(root, 0);
        state[root] = kOpen;
        while (!stack.empty()) {
            auto& [v, slot] = stack.back();
            if (slot < 2) {
                int& parent = slot == 0 ? mother_[v] : father_[v];
                ++slot;
                if (parent < 0)
                    continue;
                if (state[parent] == kOpen) {
                    parent = -1;
                    hadCycle_ = true;
                } else if (state[parent] == kNew) {
                    state[parent] = kOpen;
                    stack.emplace_back(parent, 0); // invalidates v and slot: loop again
                }
                continue;
            }
            const int animal = v;
            int g = 0;
            for (int p : {mother_[animal], father_[animal]})
                if (p >= 0)
                    g = std::max(g, generations_[p] + 1);
            generations_[animal] = g;
            byOrder_[next] = animal;
            order_[animal] = next++;
            state[animal] = kDone;
            stack.pop_back();
        }
    }
    // Cached columns hold at most about 8 million values (64 MB).
    maxColumns_ = std::max<std::size_t>(16, 8'000'000 / std::max<std::size_t>(1, pedigree.size()));
}

void Relatedness::check(int a) const
{
    if (a < 0 || a >= size())
        throw std::out_of_range("Relatedness: no animal with index " + std::to_string(a));
}

double Relatedness::mendelianVariance(int a) const
{
    double d = 1.0;
    for (int p : {mother_[a], father_[a]})
        if (p >= 0)
            d -= 0.25 * (1.0 + inbreeding_[p]);
    return d;
}

void Relatedness::ensureInbreeding(int a)
{
    if (inbreedingKnown_[a])
        return;
    // Ancestors whose F is still unknown, then evaluated ancestors first: F_x =
    // f(mother_x, father_x) needs D, hence F, only of earlier animals.
    std::vector<int> todo;
    std::vector<int> stack{a};
    inbreedingKnown_[a] = 2; // queued
    while (!stack.empty()) {
        const int x = stack.back();
        stack.pop_back();
        todo.push_back(x);
        for (int p : {mother_[x], father_[x]})
            if (p >= 0 && inbreedingKnown_[p] == 0) {
                inbreedingKnown_[p] = 2;
                stack.push_back(p);
            }
    }
    std::sort(todo.begin(), todo.end(), [this](int x, int y) { return order_[x] < order_[y]; });
    for (int x : todo) {
        inbreeding_[x] = mother_[x] >= 0 && father_[x] >= 0 ? pairKinship(mother_[x], father_[x]) : 0.0;
        inbreedingKnown_[x] = 1;
    }
}

void Relatedness::relationshipColumn(int a, int lastPosition)
{
    // v = (I - P)^-T e_a, nonzero only on a and its ancestors: walk back from a,
    // each animal passing half its value to each parent.
    const int top = order_[a];
    scratchV_[a] = 1.0;
    for (int pos = top; pos >= 0; --pos) {
        const int j = byOrder_[pos];
        const double v = scratchV_[j];
        if (v == 0.0)
            continue;
        if (mother_[j] >= 0)
            scratchV_[mother_[j]] += 0.5 * v;
        if (father_[j] >= 0)
            scratchV_[father_[j]] += 0.5 * v;
    }
    // u = (I - P)^-1 D v: u_j = D_j v_j + (u_mother + u_father) / 2, ancestors first.
    for (int pos = 0; pos <= lastPosition; ++pos) {
        const int j = byOrder_[pos];
        double u = scratchV_[j] == 0.0 ? 0.0 : mendelianVariance(j) * scratchV_[j];
        if (mother_[j] >= 0)
            u += 0.5 * scratchU_[mother_[j]];
        if (father_[j] >= 0)
            u += 0.5 * scratchU_[father_[j]];
        scratchU_[j] = u;
    }
    for (int pos = 0; pos <= top; ++pos)
        scratchV_[byOrder_[pos]] = 0.0;
}

double Relatedness::pairKinship(int a, int b)
{
    // A is symmetric: walk back from the later animal, forward only to the earlier.
    if (order_[a] < order_[b])
        std::swap(a, b);
    relationshipColumn(a, order_[b]);
    return 0.5 * scratchU_[b];
}

const std::vector<double>& Relatedness::column(int a)
{
    if (const auto it = columns_.find(a); it != columns_.end())
        return it->second;
    if (columns_.size() >= maxColumns_)
        columns_.clear();
    // F of a's ancestors fixes D wherever v is nonzero.
    ensureInbreeding(a);
    relationshipColumn(a, size() - 1);
    return columns_.emplace(a, scratchU_).first->second;
}

double Relatedness::kinship(int a, int b)
{
    check(a);
    check(b);
    ensureInbreeding(a);
    ensureInbreeding(b);
    if (a == b)
        return 0.5 * (1.0 + inbreeding_[a]);
    if (const auto it = columns_.find(b); it != columns_.end())
        return 0.5 * it->second[static_cast<std::size_t>(a)];
    return 0.5 * column(a)[static_cast<std::size_t>(b)];
}

double Relatedness::inbreeding(int a)
{
    check(a);
    ensureInbreeding(a);
    return inbreeding_[a];
}

double Relatedness::relatedness(int a, int b)
{
    if (a == b) {
        check(a);
        return 1.0;
    }
    const double f = kinship(a, b);
    return 2.0 * f / std::sqrt((1.0 + inbreeding(a)) * (1.0 + inbreeding(b)));
}

int Relatedness::generations(int a) const
{
    check(a);
    return generations_[a];
}

int Relatedness::pedigreeDepth(int a, int b) const
{
    return std::max(generations(a), generations(b));
}

std::vector<double> relatednessMatrix(std::span<const PedigreeNode> pedigree,
                                      std::span<const int> animals)
{
    Relatedness rel(pedigree);
    const std::size_t k = animals.size();
    std::vector<double> m(k * k, 1.0);
    for (std::size_t i = 0; i < k; ++i)
        for (std::size_t j = i + 1; j < k; ++j)
            m[i * k + j] = m[j * k + i] = rel.relatedness(animals[i], animals[j]);
    return m;
}

} // namespace hierloom::core
