// SPDX-License-Identifier: GPL-3.0-or-later
#include "core/base/compact_encounters.h"

#include <algorithm>
#include <numeric>
#include <stdexcept>

namespace hierloom::core {

namespace {

/// FNV-1a, 64 bits: ids and codes are short texts.
std::uint64_t hashOf(std::string_view text)
{
    std::uint64_t h = 14695981039346656037ULL;
    for (const char c : text) h = (h ^ static_cast<unsigned char>(c)) * 1099511628211ULL;
    return h;
}

} // namespace

size_t CodeTable::slotOf(std::string_view text, std::uint64_t hash) const
{
    const size_t mask = slots_.size() - 1;
    for (size_t i = static_cast<size_t>(hash) & mask;; i = (i + 1) & mask) {
        const std::int32_t code = slots_[i];
        if (code < 0) return i;
        const auto c = static_cast<size_t>(code);
        if (hashes_[c] == hash && names_[c] == text) return i;
    }
}

void CodeTable::rehash(size_t slots)
{
    slots_.assign(slots, -1);
    const size_t mask = slots - 1;
    for (size_t c = 0; c < names_.size(); ++c) {
        size_t i = static_cast<size_t>(hashes_[c]) & mask;
        while (slots_[i] >= 0) i = (i + 1) & mask;
        slots_[i] = static_cast<std::int32_t>(c);
    }
}

std::int32_t CodeTable::intern(std::string_view text)
{
    if (slots_.empty()) rehash(16);
    const std::uint64_t hash = hashOf(text);
    const size_t slot = slotOf(text, hash);
    if (slots_[slot] >= 0) return slots_[slot];
    const auto code = static_cast<std::int32_t>(names_.size());
    names_.emplace_back(text);
    hashes_.push_back(hash);
    slots_[slot] = code;
    if (names_.size() * 2 > slots_.size()) rehash(slots_.size() * 2);
    return code;
}

std::int32_t CodeTable::find(std::string_view text) const
{
    if (slots_.empty()) return -1;
    return slots_[slotOf(text, hashOf(text))];
}

size_t CodeTable::bytesHeld() const
{
    size_t bytes = names_.capacity() * sizeof(std::string) + hashes_.capacity() * sizeof(std::uint64_t) +
                   slots_.capacity() * sizeof(std::int32_t);
    for (const std::string& s : names_) bytes += s.capacity() > 15 ? s.capacity() + 1 : 0;
    return bytes;
}

CompactEncounters::CompactEncounters()
{
    groups.intern("");
    behaviours.intern("");
    observers.intern("");
}

size_t CompactEncounters::bytesHeld() const
{
    return records.capacity() * sizeof(CompactEncounter) + supporters.capacity() * sizeof(CompactSupport) +
           animals.bytesHeld() + groups.bytesHeld() + behaviours.bytesHeld() + observers.bytesHeld();
}

namespace {

std::int16_t smallCode(CodeTable& table, std::string_view text, const char* what)
{
    const std::int32_t code = table.intern(text);
    if (code > CompactEncounters::kMaxCodes)
        throw std::length_error(std::string("more than 32767 different ") + what + " in one set of encounters");
    return static_cast<std::int16_t>(code);
}

} // namespace

void CompactEncounters::add(const Encounter& e)
{
    const auto index = static_cast<std::uint32_t>(records.size());
    records.push_back(recordOf(e));
    for (const CompactSupport& s : supportersOf(e, index)) supporters.push_back(s);
}

std::vector<CompactSupport> CompactEncounters::supportersOf(const Encounter& e, std::uint32_t index)
{
    std::vector<CompactSupport> out;
    for (const std::string& id : e.winnerSupport) out.push_back({index, animals.intern(id), SupportSide::Winner});
    for (const std::string& id : e.loserSupport) out.push_back({index, animals.intern(id), SupportSide::Loser});
    return out;
}

CompactEncounter CompactEncounters::recordOf(const Encounter& e)
{
    CompactEncounter r;
    r.seq = e.seq;
    r.date = e.date;
    r.winner = animals.intern(e.winner);
    r.loser = animals.intern(e.loser);
    r.observer = observers.intern(e.observer);
    r.time = static_cast<std::int16_t>(e.time ? *e.time : -1);
    r.group = smallCode(groups, e.group, "groups");
    r.behaviour = smallCode(behaviours, e.behaviour, "behaviour codes");
    r.draw = e.outcome == Outcome::Draw;
    return r;
}

Encounter CompactEncounters::expand(size_t index) const
{
    const CompactEncounter& r = records.at(index);
    Encounter e;
    e.seq = r.seq;
    e.date = r.date;
    if (r.time >= 0) e.time = r.time;
    e.winner = animals.name(r.winner);
    e.loser = animals.name(r.loser);
    e.outcome = r.draw ? Outcome::Draw : Outcome::Decided;
    e.behaviour = behaviours.name(r.behaviour);
    e.group = groups.name(r.group);
    e.observer = observers.name(r.observer);
    const auto at = static_cast<std::uint32_t>(index);
    auto it = std::lower_bound(supporters.begin(), supporters.end(), at,
                               [](const CompactSupport& s, std::uint32_t i) { return s.encounter < i; });
    for (; it != supporters.end() && it->encounter == at; ++it)
        (it->side == SupportSide::Winner ? e.winnerSupport : e.loserSupport).push_back(animals.name(it->animal));
    return e;
}

CompactEncounters compactEncounters(const std::vector<Encounter>& encounters)
{
    CompactEncounters out;
    out.records.reserve(encounters.size());
    for (const Encounter& e : encounters) out.add(e);
    return out;
}

CompactEncounters scopeOf(const CompactEncounters& all, std::string_view group)
{
    return std::move(scopesOf(all, {std::string(group)}).front());
}

std::vector<CompactEncounters> scopesOf(const CompactEncounters& all, const std::vector<std::string>& groups)
{
    // slot[code]: the scope of a group's code, -1 for groups not asked; rows
    // without a group (code 0) go to every scope.
    // A group asked twice is cut once and copied (sameAs).
    std::vector<int> slot(static_cast<size_t>(all.groups.size()), -1);
    std::vector<std::pair<size_t, size_t>> sameAs;
    for (size_t k = 0; k < groups.size(); ++k) {
        const std::int32_t code = all.groups.find(groups[k]);
        if (code <= 0) continue;
        int& s = slot[static_cast<size_t>(code)];
        if (s >= 0) sameAs.emplace_back(k, static_cast<size_t>(s));
        else s = static_cast<int>(k);
    }
    // Counted first so that each scope is allocated once, at its size.
    std::vector<size_t> records(groups.size(), 0), supporters(groups.size(), 0);
    size_t noGroup = 0, noGroupSupporters = 0;
    for (const CompactEncounter& r : all.records) {
        if (r.group == 0) ++noGroup;
        else if (slot[static_cast<size_t>(r.group)] >= 0) ++records[static_cast<size_t>(slot[static_cast<size_t>(r.group)])];
    }
    for (const CompactSupport& s : all.supporters) {
        const std::int16_t g = all.records[s.encounter].group;
        if (g == 0) ++noGroupSupporters;
        else if (slot[static_cast<size_t>(g)] >= 0) ++supporters[static_cast<size_t>(slot[static_cast<size_t>(g)])];
    }
    std::vector<CompactEncounters> out(groups.size());
    for (size_t k = 0; k < groups.size(); ++k) {
        out[k].animals = all.animals;
        out[k].groups = all.groups;
        out[k].behaviours = all.behaviours;
        out[k].observers = all.observers;
        out[k].records.reserve(records[k] + noGroup);
        out[k].supporters.reserve(supporters[k] + noGroupSupporters);
    }
    // One pass over the records, each followed by its supporters (which are
    // in encounter order), so no index map from old to new is needed.
    size_t next = 0;
    const auto place = [&](CompactEncounters& scope, size_t i) {
        const auto index = static_cast<std::uint32_t>(scope.records.size());
        scope.records.push_back(all.records[i]);
        for (size_t s = next; s < all.supporters.size() && all.supporters[s].encounter == i; ++s)
            scope.supporters.push_back({index, all.supporters[s].animal, all.supporters[s].side});
    };
    for (size_t i = 0; i < all.records.size(); ++i) {
        const std::int16_t g = all.records[i].group;
        if (g == 0)
            for (CompactEncounters& scope : out) place(scope, i);
        else if (slot[static_cast<size_t>(g)] >= 0)
            place(out[static_cast<size_t>(slot[static_cast<size_t>(g)])], i);
        while (next < all.supporters.size() && all.supporters[next].encounter == i) ++next;
    }
    for (const auto& [k, first] : sameAs) out[k] = out[first];
    return out;
}

namespace {

/// encounterBefore of core/base/colony.h on compact records.
struct AnalysisKey {
    Day date;
    int time; // untimed last
    std::int64_t seq;
    std::uint32_t index;

    static AnalysisKey of(const CompactEncounter& r, std::uint32_t index)
    {
        return {r.date, r.time < 0 ? 24 * 60 : r.time, r.seq, index};
    }
    bool operator<(const AnalysisKey& o) const
    {
        if (date != o.date) return date < o.date;
        if (time != o.time) return time < o.time;
        if (seq != o.seq) return seq < o.seq;
        return index < o.index;
    }
};

} // namespace

bool inAnalysisOrder(const std::vector<CompactEncounter>& records)
{
    for (size_t i = 1; i < records.size(); ++i) {
        const AnalysisKey a = AnalysisKey::of(records[i - 1], 0);
        const AnalysisKey b = AnalysisKey::of(records[i], 0);
        if (b < a) return false;
    }
    return true;
}

std::vector<std::uint32_t> analysisOrder(const std::vector<CompactEncounter>& records)
{
    if (records.size() > UINT32_MAX) throw std::length_error("more than 4,294,967,295 encounters");
    std::vector<std::uint32_t> order(records.size());
    std::iota(order.begin(), order.end(), std::uint32_t{0});
    if (inAnalysisOrder(records)) return order;
    // Usually the dates already ascend and only the times within a day are
    // out of order: each day's run of records is sorted on its own, within
    // the cache and without keys.
    bool datesAscend = true;
    for (size_t i = 1; i < records.size() && datesAscend; ++i) datesAscend = records[i - 1].date <= records[i].date;
    if (datesAscend) {
        // When seq ascends with the index too (records as loaded), time and
        // index decide the order within a day: one 64-bit key each.
        bool seqAscends = true;
        for (size_t i = 1; i < records.size() && seqAscends; ++i) seqAscends = records[i - 1].seq <= records[i].seq;
        std::vector<std::uint64_t> keys;
        for (size_t first = 0; first < records.size();) {
            size_t last = first + 1;
            while (last < records.size() && records[last].date == records[first].date) ++last;
            const auto from = order.begin() + static_cast<std::ptrdiff_t>(first);
            const auto to = order.begin() + static_cast<std::ptrdiff_t>(last);
            if (seqAscends) {
                keys.clear();
                for (auto i = static_cast<std::uint32_t>(first); i < last; ++i)
                    keys.push_back(static_cast<std::uint64_t>(AnalysisKey::of(records[i], i).time) << 32 | i);
                std::sort(keys.begin(), keys.end());
                for (size_t k = 0; k < keys.size(); ++k) order[first + k] = static_cast<std::uint32_t>(keys[k]);
            } else {
                std::sort(from, to, [&](std::uint32_t a, std::uint32_t b) {
                    return AnalysisKey::of(records[a], a) < AnalysisKey::of(records[b], b);
                });
            }
            first = last;
        }
        return order;
    }
    // Sorting small keys rather than indices into the records (no cache miss
    // per comparison); the index breaks the remaining ties, as a stable sort would.
    std::vector<AnalysisKey> keys(records.size());
    for (std::uint32_t i = 0; i < keys.size(); ++i) keys[i] = AnalysisKey::of(records[i], i);
    std::sort(keys.begin(), keys.end());
    for (size_t i = 0; i < keys.size(); ++i) order[i] = keys[i].index;
    return order;
}

} // namespace hierloom::core
