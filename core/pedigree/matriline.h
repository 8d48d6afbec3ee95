// SPDX-License-Identifier: GPL-3.0-or-later
#pragma once
#include "core/base/colony.h"
#include "core/pedigree/relatedness.h"
#include "core/base/residence_index.h"

#include <optional>
#include <string>
#include <string_view>
#include <vector>

namespace hierloom::core {

/// A pedigree record that could not be used as it stands, with what was done instead.
struct PedigreeProblem {
    std::string animal;
    std::string message;
};

/// Maternal pedigree of a colony (docs/methods.md "Matrilineal rank prediction", after
/// Kawamura 1958 and Datta 1988): every animal's mother, offspring, sisters,
/// grandmother, its matriarch (the end of its chain of mother links) and its
/// maternal-line generation. Dead and departed animals are part of the pedigree.
///
/// Nodes 0..recordedCount()-1 are the colony's animals in colony order. A mother
/// id without a record of its own becomes an extra, unrecorded node after them
/// (so that her daughters still share one mother and one matriline); this is
/// reported as a problem. A mother link that would close a cycle is dropped and
/// reported, so that no query loops.
class Matrilines {
public:
    explicit Matrilines(const Colony& colony);

    /// Number of nodes (recorded animals and unrecorded mothers).
    int size() const { return static_cast<int>(ids_.size()); }
    /// Number of the colony's own animals (the first nodes).
    int recordedCount() const { return recorded_; }
    bool recorded(int a) const { return a < recorded_; }
    /// Node of an id, or -1.
    int index(std::string_view id) const;
    const std::string& id(int a) const { return ids_.at(static_cast<size_t>(a)); }

    /// Mother node, or -1 when none is recorded.
    int mother(int a) const { return mother_.at(static_cast<size_t>(a)); }
    /// Grandmother (mother's mother), or -1.
    int grandmother(int a) const;
    /// The matriarch heading a's matriline: the end of its mother links (a itself without a mother).
    int matriarch(int a) const { return matriarch_.at(static_cast<size_t>(a)); }
    /// Steps from the matriarch down to a along mother links (0 = the matriarch).
    int generation(int a) const { return generation_.at(static_cast<size_t>(a)); }
    /// Every offspring recorded with a as mother, ids ascending.
    const std::vector<int>& offspring(int a) const { return offspring_.at(static_cast<size_t>(a)); }
    /// Female offspring, ids ascending.
    std::vector<int> daughters(int a) const;
    /// Other females with the same recorded mother (maternal sisters), ids ascending.
    std::vector<int> sisters(int a) const;
    /// Every matriarch (node without a recorded mother; a founder male heads a line of his own), ids ascending.
    std::vector<int> matriarchs() const;
    /// Members of the matriline headed by `matriarch`, the matriarch included, ids ascending.
    std::vector<int> members(int matriarch) const;

    /// Sex of a node (Unknown for an unrecorded mother).
    Sex sex(int a) const { return sex_.at(static_cast<size_t>(a)); }
    /// Birth date of a node, if known.
    std::optional<Day> birth(int a) const { return birth_.at(static_cast<size_t>(a)); }

    /// Unknown or male mothers, dropped cyclic links, unknown fathers.
    const std::vector<PedigreeProblem>& problems() const { return problems_; }

    /// Mother and father links as plain pedigree nodes (fathers missing from the
    /// colony count as unknown), for Wright's coefficient of relatedness.
    std::vector<PedigreeNode> pedigreeNodes() const;

private:
    std::vector<std::string> ids_;
    IdIndex index_;
    int recorded_ = 0;
    std::vector<int> mother_;
    std::vector<int> father_;
    std::vector<Sex> sex_;
    std::vector<std::optional<Day>> birth_;
    std::vector<int> matriarch_;
    std::vector<int> generation_;
    std::vector<std::vector<int>> offspring_;
    std::vector<PedigreeProblem> problems_;
};

/// Wright's (1922) coefficient of relatedness of a dyad together with the pedigree
/// depth it rests on (generations of known ancestry behind the deeper of the two).
struct DyadRelatedness {
    double r = 0;
    int pedigreeDepth = 0;
};

/// Coefficient of relatedness r between any two animals of a colony's recorded
/// pedigree (mother and father links; Wright 1922 path method, through
/// core/pedigree/relatedness.h). Keeps computed columns, so one object answers many dyads;
/// not safe to share between threads.
class PedigreeKinship {
public:
    explicit PedigreeKinship(const Matrilines& lines);
    /// r and pedigree depth of two nodes of `lines`; throws std::out_of_range for a bad node.
    DyadRelatedness of(int a, int b);
    /// Same by id; empty when either id is not in the pedigree.
    std::optional<DyadRelatedness> of(std::string_view a, std::string_view b);

private:
    const Matrilines* lines_;
    Relatedness relatedness_;
};

} // namespace hierloom::core
