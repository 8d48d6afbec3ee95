// SPDX-License-Identifier: GPL-3.0-or-later
// A checked-files cache of this test process's own (tests/core/private_cache_folder.h).
#include "tests/core/private_cache_folder.h"

namespace {

[[maybe_unused]] ::testing::Environment* const privateCache =
    ::testing::AddGlobalTestEnvironment(new hierloom::test::PrivateCacheFolder);

} // namespace
