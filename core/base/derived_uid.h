// SPDX-License-Identifier: GPL-3.0-or-later
#pragma once
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

} // namespace hierloom::core
