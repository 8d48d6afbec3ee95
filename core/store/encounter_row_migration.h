// SPDX-License-Identifier: GPL-3.0-or-later
#pragma once

namespace hierloom::core {

class ColonyStore;

/// The step from schema version 4 to 5, run inside the migration's write
/// transaction (and by a new file on its empty tables): the encounters move
/// into `encounter_row` (day numbers, 0/1 outcomes, codes into
/// `encounter_term`) in seq order, the supporters into a table whose key
/// points at it, and `encounter` becomes a view with the old columns and
/// texts. The audit rows are unchanged; the triggers are recreated on the new
/// table and write the same JSON. A date that is not a real date (written by
/// another tool) stops the step with ColonyFileError (Damaged), as reading it
/// would.
void storeEncounterRows(ColonyStore& store);

} // namespace hierloom::core
