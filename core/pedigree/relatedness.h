// SPDX-License-Identifier: GPL-3.0-or-later
#pragma once
#include <cstddef>
#include <span>
#include <unordered_map>
#include <vector>

namespace hierloom::core {

/// One animal of a pedigree given as plain data: indices of its parents in the same
/// vector, -1 when unknown.
struct PedigreeNode {
    int mother = -1;
    int father = -1;
};

/// Kinship, inbreeding and the coefficient of relatedness of animals in a pedigree,
/// equal to Wright's path sum r = sum (1/2)^L (1 + F_A) / sqrt((1 + F_B)(1 + F_C))
/// including inbreeding (Wright 1922, Am. Nat. 56:330-338; Falconer & Mackay 1996,
/// ch. 5). Computed through the decomposition of the relationship matrix
/// A = (I - P)^-1 D (I - P)^-T (Henderson 1976, Biometrics 32:69-83), one column of A
/// in time linear in the pedigree (Colleau 2002, Genet. Sel. Evol. 34:409-421).
///
/// Animals with unknown parents are founders, unrelated and not inbred; maternal
/// siblings of unknown fathers therefore count as half-sibs (a lower bound).
/// Parent indices outside the vector count as unknown. A parent link that closes a
/// cycle (an animal its own ancestor) is dropped so that nothing loops; hadCycle()
/// then reports it. Inbreeding coefficients and columns are computed on demand and
/// kept, so one object answers many dyads quickly; it is not safe to share one
/// object between threads.
class Relatedness {
public:
    explicit Relatedness(std::span<const PedigreeNode> pedigree);

    /// Number of animals.
    int size() const { return static_cast<int>(mother_.size()); }

    /// Kinship (coancestry) f(a, b): the probability that alleles drawn at random from
    /// a and b are identical by descent (Malécot 1948); f(a, a) = (1 + F_a) / 2.
    /// Throws std::out_of_range for an index outside the pedigree.
    double kinship(int a, int b);

    /// Wright's inbreeding coefficient F_a = f(mother, father), 0 when a parent is unknown.
    double inbreeding(int a);

    /// Wright's coefficient of relatedness r(a, b) = 2 f(a, b) / sqrt((1 + F_a)(1 + F_b));
    /// 1 for a == b.
    double relatedness(int a, int b);

    /// Generations of known ancestors behind one animal: 0 without a known parent,
    /// otherwise 1 + the larger of its known parents' counts (the longest known line).
    int generations(int a) const;

    /// Pedigree depth of a dyad: the larger of the two animals' generations(), i.e. how
    /// many generations back the deeper of the two known ancestries reaches.
    int pedigreeDepth(int a, int b) const;

    /// Whether a parent link was dropped because it closed a cycle.
    bool hadCycle() const { return hadCycle_; }

private:
    void check(int a) const;
    // Computes F for `a` and all its ancestors, ancestors first.
    void ensureInbreeding(int a);
    // 1 - sum over known parents of (1 + F_parent) / 4: the Mendelian sampling
    // variance of `a` in the decomposition of A.
    double mendelianVariance(int a) const;
    // Leaves column a of A = 2 f in scratchU_ for order positions 0..lastPosition;
    // needs F of a's ancestors.
    void relationshipColumn(int a, int lastPosition);
    // Kinship of a and b (a != b, F of both ancestries known) via a partial column.
    double pairKinship(int a, int b);
    // Column `a` of the relationship matrix A = 2 f, cached.
    const std::vector<double>& column(int a);

    std::vector<int> mother_;
    std::vector<int> father_;
    std::vector<int> order_;       // position in an ancestors-first order
    std::vector<int> byOrder_;     // animal at each position
    std::vector<int> generations_; // see generations()
    std::vector<double> inbreeding_;
    std::vector<char> inbreedingKnown_; // for the animal and all its ancestors
    std::vector<double> scratchV_;      // (I - P)^-T e_a, zero between uses
    std::vector<double> scratchU_;
    std::unordered_map<int, std::vector<double>> columns_;
    std::size_t maxColumns_ = 16;
    bool hadCycle_ = false;
};

/// Coefficients of relatedness among `animals` (Wright 1922), row-major, size k*k,
/// with 1 on the diagonal; about k passes over the pedigree. Throws std::out_of_range
/// for an index outside the pedigree.
std::vector<double> relatednessMatrix(std::span<const PedigreeNode> pedigree,
                                      std::span<const int> animals);

} // namespace hierloom::core
