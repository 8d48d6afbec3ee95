// SPDX-License-Identifier: GPL-3.0-or-later
#pragma once
#include "core/store/colony_store.h"

#include <string>

namespace hierloom::core {

/// Creates a new colony file holding the bundled demo colony, passed through
/// the real import path so that it obeys every import rule; returns it open.
ColonyStore createDemoColonyFile(const std::string& path);

} // namespace hierloom::core
