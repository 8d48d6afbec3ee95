// SPDX-License-Identifier: GPL-3.0-or-later
#pragma once
#include <cstdint>
#include <string>
#include <string_view>

namespace hierloom::core {

/// A uid computed from a key instead of drawn at random: the same key gives
/// the same uid on every computer. It has the UUID text form, version 8
/// (custom) and the RFC 9562 variant, its 122 free bits taken from the
/// 128-bit FNV-1a hash of the key. Used for records created by an import, so
/// that the same import file read into two copies of a colony gives the same
/// records the same identities (docs/file-formats.md, "Identities").
std::string derivedUid(std::string_view key);

/// The canonical text form (lower-case hex, dashed 8-4-4-4-12) of 16 bytes.
std::string uuidTextOf(const unsigned char* bytes);

/// A derived uid for the `row`-th record (from 0) of one load: 48 bits from
/// the hash of `place` (the same for the whole load), then `row` in 34 bits,
/// then 40 bits from the hash of `key`; version 8, RFC 9562 variant. The uids
/// of one load sort in row order, so a million of them go into the uid index
/// one after the other, as random time-ordered uids do, instead of at random
/// places (which made a large import about 1.5 times slower).
std::string derivedRowUid(std::string_view place, std::uint64_t row, std::string_view key);

} // namespace hierloom::core
