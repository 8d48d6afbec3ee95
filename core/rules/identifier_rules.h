// SPDX-License-Identifier: GPL-3.0-or-later
#pragma once
#include <string_view>

namespace hierloom::core {

/// True when a uid has the 8-4-4-4-12 hexadecimal form (docs/file-formats.md, "Identities").
bool isValidUid(std::string_view uid);

/// True when an id has 1-32 letters, digits, '_', '-' or '.' (docs/file-formats.md, "animals.csv").
bool isValidAnimalId(std::string_view id);

} // namespace hierloom::core
