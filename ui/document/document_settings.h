// SPDX-License-Identifier: GPL-3.0-or-later
#pragma once
#include "core/ranks/analysis_settings.h"

namespace hierloom::ui {

class ColonyDocument;

/// The open colony's analysis settings (core/store/analysis_settings_store.h);
/// the defaults when no colony is open. Every view starts from these; they are
/// written only by ColonyEditFacade::setAnalysisSettings.
core::AnalysisSettings documentAnalysisSettings(const ColonyDocument* document);

} // namespace hierloom::ui
