// SPDX-License-Identifier: GPL-3.0-or-later
// One libFuzzer target; HIERLOOM_FUZZ_TARGET names which parser it feeds
// (fuzz_entries.h). Built only with clang and HIERLOOM_BUILD_FUZZERS=ON.
#include "fuzz/fuzz_entries.h"

#include <cstddef>
#include <cstdint>
#include <cstdlib>

extern "C" int LLVMFuzzerTestOneInput(const std::uint8_t* data, std::size_t size)
{
    const std::string_view bytes(reinterpret_cast<const char*>(data), size);
    // A broken invariant is a finding like a crash: abort so libFuzzer keeps the input.
    if (!hierloom::fuzz::fuzzEntry(HIERLOOM_FUZZ_TARGET, bytes)) std::abort();
    return 0;
}
