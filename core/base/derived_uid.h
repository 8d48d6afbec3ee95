// SPDX-License-Identifier: GPL-3.0-or-later
#pragma once
#include <array>
#include <cstdint>
#include <optional>
#include <string>
#include <string_view>

namespace hierloom::core {

/// The 16 bytes of a uid in the canonical UUID form (core/store/uid_storage.h).
using UidBytes = std::array<unsigned char, 16>;

/// FNV-1a with 128 bits, fed in pieces: the hash of all the pieces one after
/// the other, as if they were one text (nothing is joined).
class KeyHash {
public:
    KeyHash& add(std::string_view text)
    {
        for (unsigned char c : text) {
            h_ ^= c;
            h_ *= prime();
        }
        return *this;
    }
    KeyHash& add(char c) { return add(std::string_view(&c, 1)); }
    /// The hash, most significant byte first.
    UidBytes bytes() const;

private:
    __extension__ typedef unsigned __int128 U128;
    static U128 prime() { return (static_cast<U128>(1) << 88) | 0x13b; }
    /// The published FNV offset basis for 128 bits.
    U128 h_ = (static_cast<U128>(0x6c62272e07bb0142ULL) << 64) | 0x62b821756295c58dULL;
};

/// A uid computed from a key instead of drawn at random: the same key gives
/// the same uid on every computer. It has the UUID text form, version 8
/// (custom) and the RFC 9562 variant, its 122 free bits taken from the
/// 128-bit FNV-1a hash of the key. Used for records created by an import, so
/// that the same import file read into two copies of a colony gives the same
/// records the same identities (docs/file-formats.md, "Identities").
std::string derivedUid(std::string_view key);

/// The canonical text form (lower-case hex, dashed 8-4-4-4-12) of 16 bytes.
std::string uuidTextOf(const unsigned char* bytes);

/// The 16 bytes of a uid in the canonical form (36 characters, lower-case
/// hex, dashes at 8-13-18-23); nothing for any other text (upper case, a
/// hand-made value), which is kept as text wherever uids are stored.
std::optional<UidBytes> canonicalUidBytes(std::string_view uid);

/// A derived uid for the `row`-th record (from 0) of one load: 48 bits from
/// the hash of `place` (the same for the whole load), then `row` in 34 bits,
/// then 40 bits from the hash of `key`; version 8, RFC 9562 variant. The uids
/// of one load sort in row order, so a million of them go into the uid index
/// one after the other, as random time-ordered uids do, instead of at random
/// places (which made a large import about 1.5 times slower).
std::string derivedRowUid(std::string_view place, std::uint64_t row, std::string_view key);

/// The 16 bytes of derivedRowUid from the hashes (KeyHash) of its place and
/// key: derivedRowUid's text is uuidTextOf these bytes. A load hashes its
/// place once.
UidBytes derivedRowUidBytes(const UidBytes& placeHash, std::uint64_t row, const UidBytes& keyHash);

} // namespace hierloom::core
