// SPDX-License-Identifier: GPL-3.0-or-later
#include "core/base/vector_state.h"

namespace hierloom::core {

#if defined(__x86_64__) || defined(__i386__)
void clearUpperVectorState()
{
    // vzeroupper is an illegal instruction without AVX; ask the processor once.
    static const bool avx = [] {
        __builtin_cpu_init();
        return __builtin_cpu_supports("avx") != 0;
    }();
    // Keeps the low 128 bits of every register, so no value the compiler holds changes.
    if (avx) asm volatile("vzeroupper" ::: "memory");
}
#else
void clearUpperVectorState() {}
#endif

} // namespace hierloom::core
