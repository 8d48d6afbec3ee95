// SPDX-License-Identifier: GPL-3.0-or-later
#include "core/base/encounter_records.h"

#include "core/base/analysis_order.h"

#include <algorithm>
#include <stdexcept>

namespace hierloom::core {

namespace {

constexpr UidBytes kNoUid{};

/// A code of `from` as a code of `to` (interned there when new).
class CodeTranslation {
public:
    CodeTranslation(const CodeTable& from, CodeTable& to, std::int32_t limit) : from_(from), to_(to), limit_(limit) {}
    std::int32_t operator()(std::int32_t code)
    {
        const auto c = static_cast<size_t>(code);
        if (c >= codes_.size()) codes_.resize(static_cast<size_t>(from_.size()), -1);
        if (codes_[c] < 0) {
            codes_[c] = to_.intern(from_.name(code));
            if (codes_[c] > limit_) throw std::length_error("more than 32767 different groups, behaviour codes or observers");
        }
        return codes_[c];
    }

private:
    const CodeTable& from_;
    CodeTable& to_;
    std::int32_t limit_;
    std::vector<std::int32_t> codes_;
};

} // namespace

EncounterRecords::EncounterRecords(const std::vector<Encounter>& encounters)
{
    reserve(encounters.size());
    for (const Encounter& e : encounters) append(e);
}

EncounterRecords::EncounterRecords(CompactEncounters compact, std::vector<UidBytes> uids,
                                   std::unordered_map<std::int64_t, std::string> otherUids,
                                   std::unordered_map<std::int64_t, std::string> notes)
    : compact_(std::move(compact)), uids_(std::move(uids)), otherUids_(std::move(otherUids)), notes_(std::move(notes))
{
    if (uids_.size() != compact_.records.size())
        throw std::invalid_argument("EncounterRecords: one uid per record");
    for (size_t i = 1; i < size(); ++i)
        if (compact_.records[i - 1].seq >= compact_.records[i].seq)
            throw std::invalid_argument("EncounterRecords: records not in seq order");
}

void EncounterRecords::reserve(size_t records)
{
    compact_.records.reserve(records);
    uids_.reserve(records);
}

const std::string& EncounterRecords::note(size_t i) const
{
    static const std::string none;
    const auto it = notes_.find(compact_.records[i].seq);
    return it == notes_.end() ? none : it->second;
}

std::vector<size_t> EncounterRecords::chronologicalOrder(std::vector<size_t> subset) const
{
    // Records are held in seq order, so the index breaks ties as seq does:
    // date, time and index pack into one 64-bit key when the dates span less
    // than 2^21 days and the indices fit 32 bits (a whole centre's log sorts
    // 8 bytes per row, not a 32-byte key).
    const auto& r = compact_.records;
    if (!subset.empty() && size() <= UINT32_MAX) {
        Day low = r[subset.front()].date;
        Day high = low;
        for (size_t i : subset) {
            low = std::min(low, r[i].date);
            high = std::max(high, r[i].date);
        }
        if (static_cast<std::int64_t>(high) - low < (std::int64_t{1} << 21)) {
            std::vector<std::uint64_t> keys(subset.size());
            for (size_t k = 0; k < subset.size(); ++k) {
                const CompactEncounter& e = r[subset[k]];
                const auto day = static_cast<std::uint64_t>(static_cast<std::int64_t>(e.date) - low);
                const auto time = static_cast<std::uint64_t>(e.time < 0 ? 24 * 60 : e.time); // 11 bits
                keys[k] = day << 43 | time << 32 | static_cast<std::uint64_t>(subset[k]);
            }
            if (!std::is_sorted(keys.begin(), keys.end())) std::sort(keys.begin(), keys.end());
            for (size_t k = 0; k < keys.size(); ++k) subset[k] = static_cast<size_t>(keys[k] & 0xffffffffU);
            return subset;
        }
    }
    return analysisOrderOf(std::move(subset), [this](size_t i) {
        const CompactEncounter& r = compact_.records[i];
        return AnalysisOrderKey{r.date, r.time < 0 ? 24 * 60 : r.time, r.seq};
    });
}

Encounter EncounterRecords::at(size_t i) const
{
    Encounter e = compact_.expand(i);
    const std::int64_t seq = compact_.records[i].seq;
    if (auto it = otherUids_.find(seq); it != otherUids_.end()) e.uid = it->second;
    else e.uid = uuidTextOf(uids_[i].data());
    if (auto it = notes_.find(seq); it != notes_.end()) e.note = it->second;
    return e;
}

std::vector<Encounter> EncounterRecords::expand() const
{
    std::vector<Encounter> out;
    out.reserve(size());
    for (size_t i = 0; i < size(); ++i) out.push_back(at(i));
    return out;
}

std::vector<Encounter> EncounterRecords::expandScope(std::string_view group) const
{
    std::vector<Encounter> out;
    const std::int32_t code = group.empty() ? -1 : compact_.groups.find(group);
    if (group.empty()) out.reserve(size());
    for (size_t i = 0; i < size(); ++i) {
        const std::int16_t g = compact_.records[i].group;
        if (group.empty() || g == 0 || g == code) out.push_back(compact_.expand(i));
    }
    return out;
}

std::vector<Encounter> EncounterRecords::expandTakingPart(std::string_view animal) const
{
    std::vector<Encounter> out;
    const std::int32_t code = compact_.animals.find(animal);
    if (code < 0) return out;
    std::vector<bool> supported(size(), false);
    for (const CompactSupport& s : compact_.supporters)
        if (s.animal == code) supported[s.encounter] = true;
    for (size_t i = 0; i < size(); ++i) {
        const CompactEncounter& r = compact_.records[i];
        if (r.winner == code || r.loser == code || supported[i]) out.push_back(at(i));
    }
    return out;
}

size_t EncounterRecords::lowerBound(std::int64_t seq) const
{
    const auto& r = compact_.records;
    return static_cast<size_t>(
        std::lower_bound(r.begin(), r.end(), seq, [](const CompactEncounter& e, std::int64_t s) { return e.seq < s; }) -
        r.begin());
}

size_t EncounterRecords::find(std::int64_t seq) const
{
    const size_t i = lowerBound(seq);
    return i < size() && compact_.records[i].seq == seq ? i : size();
}

Day EncounterRecords::lastDay() const
{
    if (lastDay_) return *lastDay_;
    Day last = 0;
    bool any = false;
    for (const CompactEncounter& r : compact_.records) {
        if (!any || r.date > last) last = r.date;
        any = true;
    }
    lastDay_ = last;
    return last;
}

void EncounterRecords::noteAdded(Day date)
{
    if (lastDay_ && (size() == 1 || date > *lastDay_)) lastDay_ = date;
}

void EncounterRecords::setTexts(size_t index, const Encounter& e)
{
    if (const auto bytes = canonicalUidBytes(e.uid)) {
        uids_[index] = *bytes;
    } else {
        uids_[index] = kNoUid;
        otherUids_[e.seq] = e.uid;
    }
    if (!e.note.empty()) notes_[e.seq] = e.note;
}

void EncounterRecords::append(const Encounter& e)
{
    if (!empty() && e.seq <= compact_.records.back().seq)
        throw std::invalid_argument("EncounterRecords::append: seq not above the last one");
    compact_.add(e);
    uids_.push_back(kNoUid);
    setTexts(size() - 1, e);
    noteAdded(e.date);
}

std::pair<size_t, size_t> EncounterRecords::supportersOf(size_t index) const
{
    const auto& s = compact_.supporters;
    const auto at = static_cast<std::uint32_t>(index);
    const auto first = std::lower_bound(s.begin(), s.end(), at,
                                        [](const CompactSupport& x, std::uint32_t i) { return x.encounter < i; });
    const auto last = std::upper_bound(first, s.end(), at,
                                       [](std::uint32_t i, const CompactSupport& x) { return i < x.encounter; });
    return {static_cast<size_t>(first - s.begin()), static_cast<size_t>(last - s.begin())};
}

void EncounterRecords::put(const Encounter& e)
{
    const size_t i = lowerBound(e.seq);
    auto& s = compact_.supporters;
    const bool replace = i < size() && compact_.records[i].seq == e.seq;
    const auto [first, last] = supportersOf(i);
    if (replace) {
        otherUids_.erase(e.seq);
        notes_.erase(e.seq);
        s.erase(s.begin() + static_cast<std::ptrdiff_t>(first), s.begin() + static_cast<std::ptrdiff_t>(last));
        compact_.records[i] = compact_.recordOf(e);
        lastDay_.reset(); // the replaced record may have been the latest
    } else {
        for (size_t k = first; k < s.size(); ++k) ++s[k].encounter; // records from i on move one up
        compact_.records.insert(compact_.records.begin() + static_cast<std::ptrdiff_t>(i), compact_.recordOf(e));
        uids_.insert(uids_.begin() + static_cast<std::ptrdiff_t>(i), kNoUid);
    }
    const std::vector<CompactSupport> added = compact_.supportersOf(e, static_cast<std::uint32_t>(i));
    s.insert(s.begin() + static_cast<std::ptrdiff_t>(first), added.begin(), added.end());
    setTexts(i, e);
    noteAdded(e.date);
}

bool EncounterRecords::remove(std::int64_t seq)
{
    const size_t i = find(seq);
    if (i == size()) return false;
    auto& s = compact_.supporters;
    const auto [first, last] = supportersOf(i);
    s.erase(s.begin() + static_cast<std::ptrdiff_t>(first), s.begin() + static_cast<std::ptrdiff_t>(last));
    for (size_t k = first; k < s.size(); ++k) --s[k].encounter;
    compact_.records.erase(compact_.records.begin() + static_cast<std::ptrdiff_t>(i));
    uids_.erase(uids_.begin() + static_cast<std::ptrdiff_t>(i));
    otherUids_.erase(seq);
    notes_.erase(seq);
    lastDay_.reset();
    return true;
}

void EncounterRecords::appendSupporter(size_t index, std::string_view animal, SupportSide side)
{
    auto& s = compact_.supporters;
    if (index >= size() || (!s.empty() && s.back().encounter > index))
        throw std::invalid_argument("EncounterRecords::appendSupporter: out of order");
    s.push_back({static_cast<std::uint32_t>(index), compact_.animals.intern(animal), side});
}

void EncounterRecords::keepOnly(const std::vector<bool>& kept)
{
    std::vector<std::uint32_t> newIndex(size());
    size_t to = 0;
    for (size_t i = 0; i < size(); ++i) {
        newIndex[i] = static_cast<std::uint32_t>(to);
        if (kept[i]) {
            compact_.records[to] = compact_.records[i];
            uids_[to] = uids_[i];
            ++to;
        } else {
            otherUids_.erase(compact_.records[i].seq);
            notes_.erase(compact_.records[i].seq);
        }
    }
    compact_.records.resize(to);
    uids_.resize(to);
    lastDay_.reset();
    auto& s = compact_.supporters;
    s.erase(std::remove_if(s.begin(), s.end(), [&](const CompactSupport& x) { return !kept[x.encounter]; }), s.end());
    for (CompactSupport& x : s) x.encounter = newIndex[x.encounter];
}

EncounterRecords EncounterRecords::merged(const EncounterRecords& a, const EncounterRecords& b)
{
    // The result starts with a's code tables, so a's records keep their codes
    // and only b's are translated.
    EncounterRecords out;
    out.compact_.animals = a.compact_.animals;
    out.compact_.groups = a.compact_.groups;
    out.compact_.behaviours = a.compact_.behaviours;
    out.compact_.observers = a.compact_.observers;
    out.reserve(a.size() + b.size());
    constexpr std::int32_t noLimit = INT32_MAX;
    constexpr std::int32_t small = CompactEncounters::kMaxCodes;
    CodeTranslation animal(b.compact_.animals, out.compact_.animals, noLimit);
    CodeTranslation group(b.compact_.groups, out.compact_.groups, small);
    CodeTranslation behaviour(b.compact_.behaviours, out.compact_.behaviours, small);
    CodeTranslation observer(b.compact_.observers, out.compact_.observers, small);
    auto& records = out.compact_.records;
    auto& supporters = out.compact_.supporters;
    size_t i = 0;
    size_t j = 0;
    size_t si = 0; // next supporter of a
    size_t sj = 0; // next supporter of b
    const auto& as = a.compact_.supporters;
    const auto& bs = b.compact_.supporters;
    while (i < a.size() || j < b.size()) {
        const auto index = static_cast<std::uint32_t>(records.size());
        const bool fromA = j == b.size() || (i < a.size() && a.seq(i) <= b.seq(j));
        if (fromA) {
            if (j < b.size() && b.seq(j) == a.seq(i)) { // the same record: a's stays
                while (sj < bs.size() && bs[sj].encounter == j) ++sj;
                ++j;
            }
            records.push_back(a.compact_.records[i]);
            out.uids_.push_back(a.uids_[i]);
            for (; si < as.size() && as[si].encounter == i; ++si) supporters.push_back({index, as[si].animal, as[si].side});
            ++i;
        } else {
            CompactEncounter r = b.compact_.records[j];
            r.winner = animal(r.winner);
            r.loser = animal(r.loser);
            r.group = static_cast<std::int16_t>(group(r.group));
            r.behaviour = static_cast<std::int16_t>(behaviour(r.behaviour));
            r.observer = observer(r.observer);
            records.push_back(r);
            out.uids_.push_back(b.uids_[j]);
            for (; sj < bs.size() && bs[sj].encounter == j; ++sj)
                supporters.push_back({index, animal(bs[sj].animal), bs[sj].side});
            ++j;
        }
    }
    out.otherUids_ = a.otherUids_;
    out.notes_ = a.notes_;
    for (const auto& [seq, uid] : b.otherUids_)
        if (a.find(seq) == a.size()) out.otherUids_.emplace(seq, uid);
    for (const auto& [seq, note] : b.notes_)
        if (a.find(seq) == a.size()) out.notes_.emplace(seq, note);
    return out;
}

size_t EncounterRecords::bytesHeld() const
{
    // An unordered_map node: the pair, the next pointer and the cached hash.
    constexpr size_t node = sizeof(std::pair<const std::int64_t, std::string>) + 2 * sizeof(void*);
    size_t bytes = compact_.bytesHeld() + uids_.capacity() * sizeof(UidBytes);
    for (const auto* texts : {&otherUids_, &notes_}) {
        bytes += texts->bucket_count() * sizeof(void*) + texts->size() * node;
        for (const auto& [seq, text] : *texts) bytes += text.capacity() > 15 ? text.capacity() + 1 : 0;
    }
    return bytes;
}

} // namespace hierloom::core
