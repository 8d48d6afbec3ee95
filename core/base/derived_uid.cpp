// SPDX-License-Identifier: GPL-3.0-or-later
#include "core/base/derived_uid.h"

namespace hierloom::core {

namespace {

UidBytes withVersionAndVariant(UidBytes b)
{
    b[6] = static_cast<unsigned char>((b[6] & 0x0f) | 0x80); // version 8
    b[8] = static_cast<unsigned char>((b[8] & 0x3f) | 0x80); // variant 10
    return b;
}

} // namespace

UidBytes KeyHash::bytes() const
{
    U128 h = h_;
    UidBytes b{};
    for (int i = 15; i >= 0; --i) {
        b[static_cast<size_t>(i)] = static_cast<unsigned char>(h & 0xff);
        h >>= 8;
    }
    return b;
}

std::string uuidTextOf(const unsigned char* b)
{
    static const char* hex = "0123456789abcdef";
    std::string out(36, '-');
    size_t at = 0;
    for (size_t i = 0; i < 16; ++i) {
        if (i == 4 || i == 6 || i == 8 || i == 10) ++at; // the dash
        out[at++] = hex[b[i] >> 4];
        out[at++] = hex[b[i] & 0x0f];
    }
    return out;
}

namespace {

int hexValue(char c)
{
    if (c >= '0' && c <= '9') return c - '0';
    if (c >= 'a' && c <= 'f') return c - 'a' + 10;
    return -1; // upper case is not canonical: kept as text so it reads back as written
}

} // namespace

std::optional<UidBytes> canonicalUidBytes(std::string_view u)
{
    if (u.size() != 36) return std::nullopt;
    UidBytes out{};
    size_t at = 0;
    for (size_t i = 0; i < 36;) {
        if (i == 8 || i == 13 || i == 18 || i == 23) {
            if (u[i] != '-') return std::nullopt;
            ++i;
            continue;
        }
        const int hi = hexValue(u[i]);
        const int lo = hexValue(u[i + 1]);
        if (hi < 0 || lo < 0) return std::nullopt;
        out[at++] = static_cast<unsigned char>(hi << 4 | lo);
        i += 2;
    }
    return out;
}

std::string derivedUid(std::string_view key) { return uuidTextOf(withVersionAndVariant(KeyHash().add(key).bytes()).data()); }

UidBytes derivedRowUidBytes(const UidBytes& p, std::uint64_t row, const UidBytes& k)
{
    UidBytes b{};
    for (size_t i = 0; i < 6; ++i) b[i] = p[i];
    // The row's 34 bits around the version nibble (byte 6) and variant bits (byte 8).
    b[6] = static_cast<unsigned char>((row >> 30) & 0x0f);
    b[7] = static_cast<unsigned char>((row >> 22) & 0xff);
    b[8] = static_cast<unsigned char>((row >> 16) & 0x3f);
    b[9] = static_cast<unsigned char>((row >> 8) & 0xff);
    b[10] = static_cast<unsigned char>(row & 0xff);
    for (size_t i = 11; i < 16; ++i) b[i] = k[i];
    return withVersionAndVariant(b);
}

std::string derivedRowUid(std::string_view place, std::uint64_t row, std::string_view key)
{
    return uuidTextOf(derivedRowUidBytes(KeyHash().add(place).bytes(), row, KeyHash().add(key).bytes()).data());
}

} // namespace hierloom::core
