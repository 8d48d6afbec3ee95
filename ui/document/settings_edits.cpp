// SPDX-License-Identifier: GPL-3.0-or-later
#include "ui/document/settings_edits.h"

#include "core/base/colony_file_error.h"
#include "core/store/analysis_settings_store.h"
#include "ui/document/colony_document.h"

namespace hierloom::ui {

core::AnalysisSettings documentAnalysisSettings(ColonyDocument* document)
{
    core::ColonyStore* store = document ? document->store() : nullptr;
    return store ? core::readAnalysisSettings(*store) : core::AnalysisSettings{};
}

void writeAnalysisSettings(ColonyDocument* document, const core::AnalysisSettings& settings)
{
    core::ColonyStore* store = document ? document->store() : nullptr;
    if (!store) throw core::ColonyFileError(core::ColonyFileError::Kind::Io, "no colony is open");
    core::writeAnalysisSettings(*store, settings);
    // Records are unchanged; the lists-changed signal makes every view recompute without re-reading them.
    document->listsChanged();
}

} // namespace hierloom::ui
