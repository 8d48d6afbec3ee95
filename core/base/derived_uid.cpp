// SPDX-License-Identifier: GPL-3.0-or-later
#include "core/base/derived_uid.h"

#include <array>

namespace hierloom::core {

namespace {

using Bytes = std::array<unsigned char, 16>;

/// FNV-1a, 128 bits: offset basis 0x6c62272e07bb014262b821756295c58d,
/// prime 2^88 + 0x13b (the published FNV parameters for 128 bits).
Bytes fnv1a128(std::string_view key)
{
    unsigned __int128 h = (static_cast<unsigned __int128>(0x6c62272e07bb0142ULL) << 64) | 0x62b821756295c58dULL;
    const unsigned __int128 prime = (static_cast<unsigned __int128>(1) << 88) | 0x13b;
    for (unsigned char c : key) {
        h ^= c;
        h *= prime;
    }
    Bytes b{};
    for (int i = 15; i >= 0; --i) {
        b[static_cast<size_t>(i)] = static_cast<unsigned char>(h & 0xff);
        h >>= 8;
    }
    return b;
}

std::string uuidText(Bytes b)
{
    b[6] = static_cast<unsigned char>((b[6] & 0x0f) | 0x80); // version 8
    b[8] = static_cast<unsigned char>((b[8] & 0x3f) | 0x80); // variant 10
    return uuidTextOf(b.data());
}

} // namespace

std::string uuidTextOf(const unsigned char* b)
{
    static const char* hex = "0123456789abcdef";
    std::string out;
    out.reserve(36);
    for (size_t i = 0; i < 16; ++i) {
        if (i == 4 || i == 6 || i == 8 || i == 10) out += '-';
        out += hex[b[i] >> 4];
        out += hex[b[i] & 0x0f];
    }
    return out;
}

std::string derivedUid(std::string_view key) { return uuidText(fnv1a128(key)); }

std::string derivedRowUid(std::string_view place, std::uint64_t row, std::string_view key)
{
    const Bytes p = fnv1a128(place);
    const Bytes k = fnv1a128(key);
    Bytes b{};
    for (size_t i = 0; i < 6; ++i) b[i] = p[i];
    // The row's 34 bits around the version nibble (byte 6) and variant bits (byte 8).
    b[6] = static_cast<unsigned char>((row >> 30) & 0x0f);
    b[7] = static_cast<unsigned char>((row >> 22) & 0xff);
    b[8] = static_cast<unsigned char>((row >> 16) & 0x3f);
    b[9] = static_cast<unsigned char>((row >> 8) & 0xff);
    b[10] = static_cast<unsigned char>(row & 0xff);
    for (size_t i = 11; i < 16; ++i) b[i] = k[i];
    return uuidText(b);
}

} // namespace hierloom::core
