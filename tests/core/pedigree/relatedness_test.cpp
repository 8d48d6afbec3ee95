// SPDX-License-Identifier: GPL-3.0-or-later
#include "core/pedigree/relatedness.h"

#include <gtest/gtest.h>

#include <cmath>
#include <random>
#include <stdexcept>
#include <vector>

using namespace hierloom::core;

namespace {

PedigreeNode child(int mother, int father = -1)
{
    return PedigreeNode{mother, father};
}

} // namespace

TEST(Relatedness, MaternalPedigreeCheckValues)
{
    // Wright 1922, Am. Nat. 56:330-338; Falconer & Mackay 1996, ch. 5 [from memory for
    // the chapter]; docs/methods.md, "Check values" 11. Without inbreeding r = sum over paths (1/2)^L.
    std::vector<PedigreeNode> p;
    p.push_back({});         // 0 great-grandmother
    p.push_back(child(0));   // 1 grandmother
    p.push_back(child(1));   // 2 mother
    p.push_back(child(2));   // 3 daughter
    p.push_back(child(1));   // 4 maternal half-sister of 2 (fathers unknown)
    p.push_back(child(4));   // 5 daughter of 4: cousin of 3 through half-sister mothers
    p.push_back({});         // 6 sire
    p.push_back(child(2, 6)); // 7 full sister of 8
    p.push_back(child(2, 6)); // 8
    p.push_back(child(7));   // 9 daughter of 7: niece of 8
    Relatedness rel(p);
    EXPECT_DOUBLE_EQ(rel.relatedness(2, 3), 0.5);    // mother-daughter, L = 1
    EXPECT_DOUBLE_EQ(rel.kinship(2, 3), 0.25);       // kinship = r / 2
    EXPECT_DOUBLE_EQ(rel.relatedness(7, 8), 0.5);    // full sisters, two paths of L = 2
    EXPECT_DOUBLE_EQ(rel.relatedness(2, 4), 0.25);   // maternal half-sisters
    EXPECT_DOUBLE_EQ(rel.kinship(2, 4), 0.125);
    EXPECT_DOUBLE_EQ(rel.relatedness(1, 3), 0.25);   // grandmother-granddaughter
    EXPECT_DOUBLE_EQ(rel.relatedness(0, 3), 0.125);  // great-grandmother, L = 3
    EXPECT_DOUBLE_EQ(rel.relatedness(4, 3), 0.125);  // aunt via half-sisters, L = 3
    EXPECT_DOUBLE_EQ(rel.relatedness(8, 9), 0.25);   // full aunt-niece
    EXPECT_DOUBLE_EQ(rel.relatedness(3, 5), 0.0625); // cousins via half-sisters, L = 4
    EXPECT_DOUBLE_EQ(rel.relatedness(3, 6), 0.0);    // unrelated founder
    EXPECT_DOUBLE_EQ(rel.relatedness(3, 3), 1.0);
    EXPECT_DOUBLE_EQ(rel.relatedness(5, 3), rel.relatedness(3, 5)); // symmetric
    EXPECT_DOUBLE_EQ(rel.inbreeding(7), 0.0);
    EXPECT_DOUBLE_EQ(rel.kinship(7, 7), 0.5);
    EXPECT_FALSE(rel.hadCycle());
    // Pedigree depth: generations of known ancestors behind the deeper animal.
    EXPECT_EQ(rel.generations(0), 0);
    EXPECT_EQ(rel.generations(3), 3);
    EXPECT_EQ(rel.generations(9), 4);
    EXPECT_EQ(rel.pedigreeDepth(0, 6), 0);
    EXPECT_EQ(rel.pedigreeDepth(2, 3), 3);
    EXPECT_EQ(rel.pedigreeDepth(9, 4), 4);
    EXPECT_THROW(rel.relatedness(0, 10), std::out_of_range);
    EXPECT_THROW(rel.kinship(-1, 0), std::out_of_range);
}

namespace {

// Brute-force Wright path sums for a small acyclic pedigree: every ancestral line of
// one animal paired with every line of the other that meets it at a common ancestor
// A and shares no other animal with it, weighted (1/2)^L (1 + F_A).
class PathEnumerator {
public:
    explicit PathEnumerator(const std::vector<PedigreeNode>& p) : p_(p) {}

    // Kinship as half the path sum: f(B, C) = sum (1/2)^(L + 1) (1 + F_A).
    double kinship(int b, int c) const
    {
        if (b < 0 || c < 0)
            return 0.0;
        if (b == c)
            return 0.5 * (1.0 + inbreeding(b));
        double sum = 0.0;
        for (const auto& pb : lines(b))
            for (const auto& pc : lines(c)) {
                if (pb.back() != pc.back() || !disjointButEnd(pb, pc))
                    continue;
                const int links = static_cast<int>(pb.size() + pc.size()) - 2;
                sum += std::pow(0.5, links + 1) * (1.0 + inbreeding(pb.back()));
            }
        return sum;
    }

    double inbreeding(int a) const { return kinship(p_[a].mother, p_[a].father); }

    double relatedness(int b, int c) const
    {
        if (b == c)
            return 1.0;
        // Wright 1922: r = sum (1/2)^L (1 + F_A) / sqrt((1 + F_B)(1 + F_C)).
        return 2.0 * kinship(b, c) / std::sqrt((1.0 + inbreeding(b)) * (1.0 + inbreeding(c)));
    }

private:
    // Every line a, parent, grandparent, ... up to each ancestor (a alone included).
    std::vector<std::vector<int>> lines(int a) const
    {
        std::vector<std::vector<int>> out{{a}};
        for (std::size_t i = 0; i < out.size(); ++i) {
            const int last = out[i].back();
            for (int parent : {p_[last].mother, p_[last].father}) {
                if (parent < 0)
                    continue;
                auto line = out[i];
                line.push_back(parent);
                out.push_back(std::move(line));
            }
        }
        return out;
    }

    static bool disjointButEnd(const std::vector<int>& a, const std::vector<int>& b)
    {
        for (std::size_t i = 0; i + 1 < a.size(); ++i)
            for (int v : b)
                if (a[i] == v)
                    return false;
        for (std::size_t j = 0; j + 1 < b.size(); ++j)
            if (b[j] == a.back())
                return false;
        return true;
    }

    const std::vector<PedigreeNode>& p_;
};

} // namespace

TEST(Relatedness, InbredPedigreeMatchesPathEnumeration)
{
    // Brute force: Wright's path sums with inbred common ancestors, on a small pedigree
    // with full-sib, parent-offspring and other close matings.
    std::vector<PedigreeNode> p;
    p.push_back({});         // 0 founder female
    p.push_back({});         // 1 founder male
    p.push_back({});         // 2 founder male
    p.push_back(child(0, 1)); // 3 female
    p.push_back(child(0, 1)); // 4 male, full brother of 3
    p.push_back(child(3, 4)); // 5 female, full-sib mating: F = 1/4
    p.push_back(child(5, 1)); // 6 male, daughter x her grandfather
    p.push_back(child(5, 4)); // 7 female, daughter x her father
    p.push_back(child(7, 2)); // 8 female
    p.push_back(child(7, 6)); // 9 female, half-sib mating of inbred parents
    p.push_back(child(9, 6)); // 10 female
    p.push_back(child(8, 4)); // 11
    Relatedness rel(p);
    // Falconer & Mackay 1996 [from memory]: offspring of full sibs has F = 1/4.
    EXPECT_DOUBLE_EQ(rel.inbreeding(5), 0.25);
    const PathEnumerator brute(p);
    const int n = static_cast<int>(p.size());
    for (int a = 0; a < n; ++a) {
        EXPECT_NEAR(rel.inbreeding(a), brute.inbreeding(a), 1e-14) << a;
        for (int b = 0; b < n; ++b) {
            EXPECT_NEAR(rel.kinship(a, b), brute.kinship(a, b), 1e-14) << a << ' ' << b;
            EXPECT_NEAR(rel.relatedness(a, b), brute.relatedness(a, b), 1e-14) << a << ' ' << b;
        }
    }
    EXPECT_GT(rel.inbreeding(10), rel.inbreeding(5)); // repeated inbreeding accumulates
}

TEST(Relatedness, LargeRandomPedigreeMatchesFullTable)
{
    // Brute force: the full kinship table filled in index order (every parent has a
    // lower index), f(i, j) = (f(m_i, j) + f(s_i, j)) / 2, f(i, i) = (1 + f(m_i, s_i)) / 2,
    // against the on-demand column evaluation and relatednessMatrix.
    const int n = 400;
    std::mt19937 rng(12345);
    std::vector<PedigreeNode> p(n);
    for (int i = 20; i < n; ++i) {
        std::uniform_int_distribution<int> pick(std::max(0, i - 120), i - 1);
        p[i].mother = pick(rng);
        if (rng() % 3 != 0)
            p[i].father = pick(rng);
        if (p[i].father == p[i].mother)
            p[i].father = -1;
    }
    std::vector<double> f(static_cast<std::size_t>(n) * n, 0.0);
    auto at = [&](int i, int j) -> double& { return f[static_cast<std::size_t>(i) * n + j]; };
    auto get = [&](int i, int j) { return i < 0 || j < 0 ? 0.0 : at(i, j); };
    for (int i = 0; i < n; ++i) {
        for (int j = 0; j < i; ++j)
            at(i, j) = at(j, i) = 0.5 * (get(p[i].mother, j) + get(p[i].father, j));
        at(i, i) = 0.5 * (1.0 + get(p[i].mother, p[i].father));
    }
    // Reverse the index order in the calculator's input to make its own ordering work.
    std::vector<PedigreeNode> reversed(n);
    auto rev = [n](int i) { return i < 0 ? -1 : n - 1 - i; };
    for (int i = 0; i < n; ++i)
        reversed[rev(i)] = {rev(p[i].mother), rev(p[i].father)};
    Relatedness rel(reversed);
    std::vector<int> females;
    for (int i = n - 1; i >= n - 60; --i)
        females.push_back(i);
    std::vector<int> females_rev;
    for (int i : females)
        females_rev.push_back(rev(i));
    const std::vector<double> m = relatednessMatrix(reversed, females_rev);
    const std::size_t k = females.size();
    for (std::size_t x = 0; x < k; ++x)
        for (std::size_t y = 0; y < k; ++y) {
            const int i = females[x], j = females[y];
            EXPECT_NEAR(rel.kinship(rev(i), rev(j)), at(i, j), 1e-13);
            const double r = i == j ? 1.0
                                    : 2.0 * at(i, j)
                                          / std::sqrt((1.0 + get(p[i].mother, p[i].father))
                                                      * (1.0 + get(p[j].mother, p[j].father)));
            EXPECT_NEAR(m[x * k + y], r, 1e-13);
        }
}

TEST(Relatedness, CyclesAndBadLinksNeverLoop)
{
    // Callers validate pedigrees; a cycle here must still end. The link closing the
    // cycle is dropped and reported.
    std::vector<PedigreeNode> loop{child(1), child(0), child(1)};
    Relatedness rel(loop);
    EXPECT_TRUE(rel.hadCycle());
    EXPECT_TRUE(std::isfinite(rel.relatedness(0, 2)));
    EXPECT_TRUE(std::isfinite(rel.relatedness(1, 2)));
    EXPECT_GE(rel.pedigreeDepth(0, 2), 1);

    std::vector<PedigreeNode> self{child(0, 0), child(0)};
    Relatedness own(self);
    EXPECT_TRUE(own.hadCycle());
    EXPECT_DOUBLE_EQ(own.relatedness(0, 1), 0.5); // 0 becomes a founder

    // Parent indices outside the pedigree count as unknown.
    std::vector<PedigreeNode> outside{child(7, 42), child(0, -5)};
    Relatedness out(outside);
    EXPECT_FALSE(out.hadCycle());
    EXPECT_EQ(out.generations(0), 0);
    EXPECT_DOUBLE_EQ(out.relatedness(0, 1), 0.5);
}

TEST(Relatedness, LongLineDoesNotExhaustTheStack)
{
    // A maternal line of 200,000 generations: evaluation is iterative, so the answer
    // (1/2)^L, here an underflow to 0, arrives without deep recursion.
    const int n = 200000;
    std::vector<PedigreeNode> line(n);
    for (int i = 1; i < n; ++i)
        line[i].mother = i - 1;
    Relatedness rel(line);
    EXPECT_EQ(rel.generations(n - 1), n - 1);
    EXPECT_DOUBLE_EQ(rel.relatedness(n - 1, n - 11), std::pow(0.5, 10));
    EXPECT_EQ(rel.relatedness(n - 1, 0), 0.0);
}
