// SPDX-License-Identifier: GPL-3.0-or-later
#pragma once
#include <cstddef>
#include <cstdint>
#include <memory>
#include <string>
#include <utility>
#include <vector>

namespace hierloom::ui {

/// A view's last few computed results, each under the question it answers
/// (`key`: the group and the view's own choices) and the document revision
/// it was computed at (ColonyDocument::revision()). A result is found only
/// for the same key at the same revision, so an edit, an undo or a re-read
/// makes every older result unreachable; they are dropped as newer ones
/// arrive (at most `capacity` kept, the least recently used first out).
template <class Value>
class ResultCache {
public:
    explicit ResultCache(std::size_t capacity = 8) : capacity_(capacity) {}

    /// The result for `key` at `revision`, or nullptr.
    std::shared_ptr<const Value> find(const std::string& key, std::uint64_t revision)
    {
        for (std::size_t i = 0; i < entries_.size(); ++i) {
            if (entries_[i].key != key || entries_[i].revision != revision) continue;
            // Now the most recently used (the back of the list).
            Entry hit = std::move(entries_[i]);
            entries_.erase(entries_.begin() + static_cast<std::ptrdiff_t>(i));
            entries_.push_back(std::move(hit));
            return entries_.back().value;
        }
        return nullptr;
    }

    void store(const std::string& key, std::uint64_t revision, std::shared_ptr<const Value> value)
    {
        // Results of older revisions can never be found again.
        std::erase_if(entries_, [&](const Entry& e) { return e.key == key || e.revision < revision; });
        entries_.push_back({key, revision, std::move(value)});
        if (entries_.size() > capacity_) entries_.erase(entries_.begin());
    }

    void clear() { entries_.clear(); }
    std::size_t size() const { return entries_.size(); }

private:
    struct Entry {
        std::string key;
        std::uint64_t revision = 0;
        std::shared_ptr<const Value> value;
    };
    std::size_t capacity_;
    std::vector<Entry> entries_;
};

} // namespace hierloom::ui
