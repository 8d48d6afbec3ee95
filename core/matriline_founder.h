// SPDX-License-Identifier: GPL-3.0-or-later
#pragma once
#include "core/colony.h"

#include <string>

namespace hierloom::core {

/// The matriarch heading an animal's matriline (methods.md, "Matrilineal rank
/// prediction", after Kawamura 1958; Datta 1988): follow mother links up to the
/// first animal whose own mother is not recorded.
/// The animal itself when it has no recorded mother; a mother id that has no
/// record of its own ends the walk and is returned. Empty for an unknown id or
/// when the mother links form a cycle (the import forbids one; a damaged file
/// must not hang the program).
std::string matrilineFounder(const Colony& colony, const std::string& id);

} // namespace hierloom::core
