// SPDX-License-Identifier: GPL-3.0-or-later
#include "core/store/saved_scenarios.h"

#include "core/store/sqlite_statement.h"
#include "core/store/write_transaction.h"

#include <stdexcept>

namespace hierloom::core {

std::vector<std::string> savedScenarioNames(const ColonyStore& store)
{
    // substr/length rather than LIKE: names may hold % or _.
    SqliteStatement st(store.handle(),
                       "SELECT substr(key, length(?1) + 1) FROM setting WHERE substr(key, 1, length(?1)) = ?1 "
                       "ORDER BY key");
    st.bind(1, kScenarioKeyPrefix);
    std::vector<std::string> names;
    while (st.step()) names.push_back(st.text(0));
    return names;
}

std::optional<std::string> savedScenarioText(const ColonyStore& store, const std::string& name)
{
    SqliteStatement st(store.handle(), "SELECT value FROM setting WHERE key = ?1");
    st.bind(1, kScenarioKeyPrefix + name);
    if (!st.step()) return std::nullopt;
    return st.text(0);
}

void saveScenarioText(ColonyStore& store, const std::string& name, const std::string& text)
{
    if (name.empty()) throw std::invalid_argument("a saved scenario needs a name");
    store.setSetting(kScenarioKeyPrefix + name, text);
}

void deleteSavedScenario(ColonyStore& store, const std::string& name)
{
    WriteTransaction tx(store);
    {
        SqliteStatement st(store.handle(), "DELETE FROM setting WHERE key = ?1");
        st.bind(1, kScenarioKeyPrefix + name);
        st.run();
    }
    tx.commit();
}

} // namespace hierloom::core
