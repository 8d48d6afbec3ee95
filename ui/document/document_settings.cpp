// SPDX-License-Identifier: GPL-3.0-or-later
#include "ui/document/document_settings.h"

#include "core/store/analysis_settings_store.h"
#include "ui/document/colony_document.h"

namespace hierloom::ui {

core::AnalysisSettings documentAnalysisSettings(const ColonyDocument* document)
{
    const core::ColonyStore* store = document ? document->store() : nullptr;
    return store ? core::readAnalysisSettings(*store) : core::AnalysisSettings{};
}

} // namespace hierloom::ui
