// SPDX-License-Identifier: GPL-3.0-or-later
#pragma once
// Encounters as the rank engines read them: interned ids and one fixed-size
// record per encounter instead of one string per field (DEVELOPERS.md,
// "Compact encounters"). 32 bytes per encounter, supporters in a side table
// holding only the encounters that have them.
#include "core/base/colony.h"

#include <cstddef>
#include <cstdint>
#include <string>
#include <string_view>
#include <vector>

namespace hierloom::core {

/// Texts interned once each: code i stands for names()[i]. Lookups take a
/// string_view, so reading a row builds no std::string for a known text; the
/// index is an open-addressing table of codes (a loader looks up four or
/// five texts per row, millions of times).
class CodeTable {
public:
    /// The code of `text`, added when new.
    std::int32_t intern(std::string_view text);
    /// The code of `text`, or -1 when it was never interned.
    std::int32_t find(std::string_view text) const;
    const std::string& name(std::int32_t code) const { return names_[static_cast<size_t>(code)]; }
    const std::vector<std::string>& names() const { return names_; }
    std::int32_t size() const { return static_cast<std::int32_t>(names_.size()); }
    /// Bytes held by the texts and the index (approximate: payload, not allocator slack).
    size_t bytesHeld() const;

private:
    /// The slot holding `text`'s code, or the empty slot where it would go.
    size_t slotOf(std::string_view text, std::uint64_t hash) const;
    void rehash(size_t slots);

    std::vector<std::string> names_;
    std::vector<std::uint64_t> hashes_; ///< of each name
    std::vector<std::int32_t> slots_;   ///< codes, -1 empty; size a power of two, at most half full
};

/// One encounter in 32 bytes. Animals are codes of CompactEncounters::animals;
/// group, behaviour and observer codes of their tables, where code 0 is the
/// empty text (no group, no behaviour, no observer). The note and the uid are
/// not held: no analysis reads them.
struct CompactEncounter {
    std::int64_t seq = 0;        ///< order of entry or import
    Day date = 0;
    std::int32_t winner = 0;
    std::int32_t loser = 0;
    std::int32_t observer = 0;
    std::int16_t time = -1;      ///< minutes after midnight; -1 untimed
    std::int16_t group = 0;
    std::int16_t behaviour = 0;
    bool draw = false;           ///< Outcome::Draw
};
static_assert(sizeof(CompactEncounter) == 32);

/// Which side a supporter joined.
enum class SupportSide : std::uint8_t { Winner, Loser };

/// One supporter of one encounter (coalitionary support).
struct CompactSupport {
    std::uint32_t encounter = 0; ///< index into CompactEncounters::records
    std::int32_t animal = 0;     ///< code of CompactEncounters::animals
    SupportSide side = SupportSide::Winner;
};

/// A set of encounters as compact records, in entry order (seq ascending).
struct CompactEncounters {
    /// Most groups, behaviour codes and observers a file may use here
    /// (the int16 codes); a loader refuses more.
    static constexpr std::int32_t kMaxCodes = 32767;

    CodeTable animals;
    CodeTable groups;     ///< code 0: ""
    CodeTable behaviours; ///< code 0: ""
    CodeTable observers;  ///< code 0: ""
    std::vector<CompactEncounter> records;
    /// Supporters by encounter index, each encounter's in the order recorded.
    std::vector<CompactSupport> supporters;

    CompactEncounters();
    size_t size() const { return records.size(); }
    /// Bytes held by the records, the supporters and the code tables.
    size_t bytesHeld() const;
    /// Adds one encounter (in seq order), interning its texts.
    void add(const Encounter& e);
    /// The record of `e` (its texts interned), not added; supporters aside.
    CompactEncounter recordOf(const Encounter& e);
    /// The supporters of `e` as rows of record `index` (ids interned), winner's side first.
    std::vector<CompactSupport> supportersOf(const Encounter& e, std::uint32_t index);
    /// The encounter of one record, without note and uid.
    Encounter expand(size_t index) const;
};

/// The compact form of encounters given in seq order (the old API's records).
CompactEncounters compactEncounters(const std::vector<Encounter>& encounters);

/// The records of `group` and those recorded without a group (the rows a
/// scope of `group` may select), with every code table of `all` as it is, so
/// each code means what it means in `all` and an analysis gives the same
/// result on either. A worker's own copy of the group it checks.
CompactEncounters scopeOf(const CompactEncounters& all, std::string_view group);
/// scopeOf for each of `groups` at once, in that order, by one pass over
/// `all`: a worker's own copies of the groups it checks, after which it may
/// let go of `all`. A group with no record gets the rows without a group.
std::vector<CompactEncounters> scopesOf(const CompactEncounters& all, const std::vector<std::string>& groups);

/// True when the records are already in analysis order (date, then time
/// with untimed last, then entry order): encounterBefore of docs/methods.md.
bool inAnalysisOrder(const std::vector<CompactEncounter>& records);

/// Record indices in analysis order (date, time with untimed last, seq).
std::vector<std::uint32_t> analysisOrder(const std::vector<CompactEncounter>& records);

} // namespace hierloom::core
