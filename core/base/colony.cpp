// SPDX-License-Identifier: GPL-3.0-or-later
#include "core/base/colony.h"

#include "core/base/analysis_order.h"

#include <algorithm>
#include <chrono>
#include <numeric>
#include <random>

namespace hierloom::core {

int Colony::animalIndex(const std::string& id) const
{
    if (index_.size() != animals.size()) const_cast<Colony*>(this)->reindex();
    auto it = index_.find(id);
    return it == index_.end() ? -1 : it->second;
}

void Colony::reindex()
{
    index_.clear();
    index_.reserve(animals.size());
    for (size_t i = 0; i < animals.size(); ++i) index_.emplace(animals[i].id, static_cast<int>(i));
}

bool takesPart(const Encounter& e, std::string_view id)
{
    if (e.winner == id || e.loser == id) return true;
    return std::find(e.winnerSupport.begin(), e.winnerSupport.end(), id) != e.winnerSupport.end() ||
           std::find(e.loserSupport.begin(), e.loserSupport.end(), id) != e.loserSupport.end();
}

bool hasSupporters(const std::vector<Encounter>& encounters)
{
    return std::any_of(encounters.begin(), encounters.end(),
                       [](const Encounter& e) { return !e.winnerSupport.empty() || !e.loserSupport.empty(); });
}

std::vector<std::string> splitSupporters(std::string_view cell)
{
    std::vector<std::string> out;
    size_t i = 0;
    while (i < cell.size()) {
        while (i < cell.size() && (cell[i] == ' ' || cell[i] == '\t')) ++i;
        size_t j = i;
        while (j < cell.size() && cell[j] != ' ' && cell[j] != '\t') ++j;
        if (j > i) out.emplace_back(cell.substr(i, j - i));
        i = j;
    }
    return out;
}

std::string joinSupporters(const std::vector<std::string>& ids)
{
    std::string out;
    for (const std::string& id : ids) {
        if (!out.empty()) out += ' ';
        out += id;
    }
    return out;
}

bool encounterBefore(const Encounter& a, const Encounter& b)
{
    if (a.date != b.date) return a.date < b.date;
    const int ta = a.time.value_or(24 * 60);
    const int tb = b.time.value_or(24 * 60);
    if (ta != tb) return ta < tb;
    return a.seq < b.seq;
}

std::vector<size_t> chronologicalOrder(const std::vector<Encounter>& encounters)
{
    std::vector<size_t> all(encounters.size());
    std::iota(all.begin(), all.end(), size_t{0});
    return chronologicalOrder(encounters, std::move(all));
}

std::vector<size_t> chronologicalOrder(const std::vector<Encounter>& encounters, std::vector<size_t> subset)
{
    return analysisOrderOf(std::move(subset), [&encounters](size_t i) {
        const Encounter& e = encounters[i];
        return AnalysisOrderKey{e.date, e.time.value_or(24 * 60), e.seq};
    });
}

const char* toString(Sex s)
{
    switch (s) {
    case Sex::Female: return "F";
    case Sex::Male: return "M";
    default: return "U";
    }
}
const char* toString(EntryType t)
{
    switch (t) {
    case EntryType::Born: return "born";
    case EntryType::Introduced: return "introduced";
    case EntryType::Founder: return "founder";
    default: return "";
    }
}
const char* toString(ExitType t)
{
    switch (t) {
    case ExitType::Died: return "died";
    case ExitType::Removed: return "removed";
    default: return "";
    }
}
const char* toString(Outcome o) { return o == Outcome::Draw ? "draw" : "decided"; }

std::optional<Sex> parseSex(std::string_view s)
{
    if (s == "F" || s == "f") return Sex::Female;
    if (s == "M" || s == "m") return Sex::Male;
    if (s == "U" || s == "u") return Sex::Unknown;
    return std::nullopt;
}
std::optional<EntryType> parseEntryType(std::string_view s)
{
    if (s.empty()) return EntryType::None;
    if (s == "born") return EntryType::Born;
    if (s == "introduced") return EntryType::Introduced;
    if (s == "founder") return EntryType::Founder;
    return std::nullopt;
}
std::optional<ExitType> parseExitType(std::string_view s)
{
    if (s.empty()) return ExitType::None;
    if (s == "died") return ExitType::Died;
    if (s == "removed") return ExitType::Removed;
    return std::nullopt;
}
std::optional<Outcome> parseOutcome(std::string_view s)
{
    if (s.empty() || s == "decided") return Outcome::Decided;
    if (s == "draw") return Outcome::Draw;
    return std::nullopt;
}

std::string newUid()
{
    // Time-ordered (version 7 layout): 48 bits of Unix milliseconds, then a
    // per-process counter and random bits, so bulk inserts append to the
    // uid index instead of scattering across it.
    static thread_local std::mt19937_64 rng{std::random_device{}()};
    static thread_local std::uint64_t lastMs = 0;
    static thread_local std::uint64_t counter = 0;
    const auto ms = static_cast<std::uint64_t>(std::chrono::duration_cast<std::chrono::milliseconds>(
                                                   std::chrono::system_clock::now().time_since_epoch())
                                                   .count());
    if (ms == lastMs) ++counter;
    else { lastMs = ms; counter = rng() & 0x3FF; }
    const std::uint64_t hi = (ms << 16) | 0x7000ULL | ((counter >> 20) & 0x0FFFULL);
    const std::uint64_t lo = 0x8000000000000000ULL | ((counter & 0xFFFFFULL) << 42) | (rng() >> 22);
    static const char* hex = "0123456789abcdef";
    std::string out(36, '-');
    int pos = 0;
    auto put = [&](std::uint64_t v) {
        for (int i = 15; i >= 0; --i) {
            if (pos == 8 || pos == 13 || pos == 18 || pos == 23) ++pos;
            out[static_cast<size_t>(pos++)] = hex[(v >> (4 * i)) & 0xF];
        }
    };
    put(hi);
    put(lo);
    return out;
}

} // namespace hierloom::core
