// SPDX-License-Identifier: GPL-3.0-or-later
#include "core/store/saved_mappings.h"

#include "core/store/sqlite_statement.h"

namespace hierloom::core {

std::vector<std::string> savedMappingNames(const ColonyStore& store)
{
    // substr/length rather than LIKE: names may hold % or _.
    SqliteStatement st(store.handle(),
                       "SELECT substr(key, length(?1) + 1) FROM setting WHERE substr(key, 1, length(?1)) = ?1 "
                       "ORDER BY key");
    st.bind(1, kMappingKeyPrefix);
    std::vector<std::string> names;
    while (st.step()) names.push_back(st.text(0));
    return names;
}

std::optional<std::string> savedMappingText(const ColonyStore& store, const std::string& name)
{
    SqliteStatement st(store.handle(), "SELECT value FROM setting WHERE key = ?1");
    st.bind(1, kMappingKeyPrefix + name);
    if (!st.step()) return std::nullopt;
    return st.text(0);
}

} // namespace hierloom::core
