// SPDX-License-Identifier: GPL-3.0-or-later
#pragma once
#include "core/ranks/analysis_settings.h"

namespace hierloom::ui {

class ColonyDocument;

/// The open colony's analysis settings (core/store/analysis_settings_store.h);
/// the defaults when no colony is open. Every view starts from these.
core::AnalysisSettings documentAnalysisSettings(ColonyDocument* document);

/// Stores the analysis settings in the open colony file (one transaction) and
/// announces the change, so every view recomputes with them. Throws
/// std::invalid_argument for a value out of range and core::ColonyFileError
/// when the file cannot be written; nothing is written then.
void writeAnalysisSettings(ColonyDocument* document, const core::AnalysisSettings& settings);

} // namespace hierloom::ui
