// SPDX-License-Identifier: GPL-3.0-or-later
#pragma once

namespace hierloom::core {

class ColonyStore;

/// The step from schema version 3 to 4, run inside the migration's write
/// transaction: every stored uid (animal, residence, encounter,
/// encounter_support.encounter) takes its compact form (core/store/uid_storage.h)
/// and the audit triggers are recreated to write uid text into the audit rows.
/// The audit rows themselves are unchanged (they keep text uids).
void storeUidsCompactly(ColonyStore& store);

} // namespace hierloom::core
