// SPDX-License-Identifier: GPL-3.0-or-later
#pragma once
#include "core/demo/demo_colony.h"

namespace hierloom::test {

/// The demo colony, generated once per test executable.
inline const core::Colony& demoColony()
{
    static const core::Colony c = core::generateDemoColony();
    return c;
}

/// The demo colony's scenario facts (planted reversals, revolt, ...).
inline const core::DemoColonyFacts& facts()
{
    static const core::DemoColonyFacts f = core::demoColonyFacts();
    return f;
}

} // namespace hierloom::test
