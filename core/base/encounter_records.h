// SPDX-License-Identifier: GPL-3.0-or-later
#pragma once
// Every field of a set of encounters, held compactly: the 32-byte records of
// compact_encounters.h, each uid as its 16 bytes beside them, and the notes
// (which most encounters lack) keyed by seq. What the desktop keeps of a
// colony file's encounters (DEVELOPERS.md, "The desktop's records held
// compactly"): about 50 bytes per encounter where an Encounter of strings
// takes about 350.
#include "core/base/colony.h"
#include "core/base/compact_encounters.h"
#include "core/base/derived_uid.h"

#include <cstddef>
#include <cstdint>
#include <optional>
#include <string>
#include <string_view>
#include <unordered_map>
#include <vector>

namespace hierloom::core {

/// Encounters in seq order (each seq once), every field kept: at(i) gives
/// back the Encounter that was put in, supporters, note and uid included.
class EncounterRecords {
public:
    EncounterRecords() = default;
    /// The records of `encounters`, which are in seq order.
    explicit EncounterRecords(const std::vector<Encounter>& encounters);
    /// Records read as their parts (a loader's): `compact` in seq order, the
    /// uid bytes beside each record (zero where `otherUids` holds the uid by
    /// seq), the notes that are not empty by seq.
    EncounterRecords(CompactEncounters compact, std::vector<UidBytes> uids,
                     std::unordered_map<std::int64_t, std::string> otherUids,
                     std::unordered_map<std::int64_t, std::string> notes);

    size_t size() const { return compact_.records.size(); }
    bool empty() const { return compact_.records.empty(); }
    /// The records as the rank engines read them (no notes, no uids).
    const CompactEncounters& compact() const { return compact_; }
    const CompactEncounter& record(size_t i) const { return compact_.records[i]; }
    std::int64_t seq(size_t i) const { return compact_.records[i].seq; }
    /// The group of record i ("" for none).
    const std::string& group(size_t i) const { return compact_.groups.name(compact_.records[i].group); }

    /// The note of record i ("" for none).
    const std::string& note(size_t i) const;
    /// The indices `subset` (ascending) in analysis order (core/base/analysis_order.h).
    std::vector<size_t> chronologicalOrder(std::vector<size_t> subset) const;

    /// The whole encounter of record i.
    Encounter at(size_t i) const;
    /// Every encounter, in seq order (small sets and tests).
    std::vector<Encounter> expand() const;
    /// The encounters an analysis of `group` may read, in seq order: those
    /// of the group and those recorded without one (whose scope depends on
    /// where the animals lived, ColonyStore::loadEncounters); every
    /// encounter when `group` is empty. Without notes and uids, which no
    /// analysis reads (CompactEncounters::expand).
    std::vector<Encounter> expandScope(std::string_view group) const;
    /// The encounters in which `animal` takes part (takesPart), in seq order.
    std::vector<Encounter> expandTakingPart(std::string_view animal) const;

    /// The index of the record with this seq, or size().
    size_t find(std::int64_t seq) const;
    /// The index of the first record whose seq is not below `seq`.
    size_t lowerBound(std::int64_t seq) const;
    /// The latest date of any record; 0 when empty. Kept as records are
    /// added, found again by one pass after a removal.
    Day lastDay() const;

    /// Adds `e` after the last record (e.seq above every seq held).
    void append(const Encounter& e);
    /// Puts `e` in by seq; replaces the record with the same seq.
    void put(const Encounter& e);
    /// Removes the record with this seq, if held; true when it was.
    bool remove(std::int64_t seq);
    /// Adds one supporter to record `index`; records' supporters must be
    /// added in index order (as a pass over the file's supporter rows does).
    void appendSupporter(size_t index, std::string_view animal, SupportSide side);
    /// Keeps only the records for which keep(*this, i) is true.
    template <class Keep> void keepIf(Keep keep)
    {
        std::vector<bool> kept(size());
        for (size_t i = 0; i < size(); ++i) kept[i] = keep(*this, i);
        keepOnly(kept);
    }
    /// `a` and `b` joined in seq order; a record in both is taken from `a`.
    static EncounterRecords merged(const EncounterRecords& a, const EncounterRecords& b);

    /// Bytes held (records, supporters, uids, notes, code tables; payload, not allocator slack).
    size_t bytesHeld() const;
    void reserve(size_t records);

private:
    void keepOnly(const std::vector<bool>& kept);
    /// Keeps lastDay_ true after a record of `date` was added.
    void noteAdded(Day date);
    /// Puts the uid and note of `e` beside record `index` (already placed).
    void setTexts(size_t index, const Encounter& e);
    /// The supporters of record `index`: [first, last) of compact_.supporters.
    std::pair<size_t, size_t> supportersOf(size_t index) const;
    /// Copies record i of `from` (every field) to the end of this set.
    void appendFrom(const EncounterRecords& from, size_t i);

    CompactEncounters compact_;
    std::vector<UidBytes> uids_;                               ///< beside each record; zero when kept in otherUids_
    std::unordered_map<std::int64_t, std::string> otherUids_;  ///< by seq: uids not in the canonical form
    std::unordered_map<std::int64_t, std::string> notes_;      ///< by seq: the notes that are not empty
    mutable std::optional<Day> lastDay_;                       ///< lastDay() when known
};

} // namespace hierloom::core
