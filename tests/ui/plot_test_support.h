// SPDX-License-Identifier: GPL-3.0-or-later
// The demo colony opened once for the plot view tests.
#pragma once
#include "core/demo/demo_colony.h"
#include "core/demo/demo_colony_file.h"
#include "tests/core/import_test_support.h"
#include "ui/document/colony_document.h"
#include "ui/document/colony_edit_facade.h"
#include "ui/document/compute_runner.h"

#include <QString>

#include <memory>

namespace hierloom::test {

/// A writable copy of the demo colony in a temporary folder, opened in a document.
class DemoDocument {
public:
    DemoDocument() : path_(dir_.file("demo.hierloom"))
    {
        core::createDemoColonyFile(path_);
        document_.open(QString::fromStdString(path_));
    }
    ui::ColonyDocument* document() { return &document_; }
    /// The one writer of the document, for views that store settings.
    ui::ColonyEditFacade* facade() { return &facade_; }
    const std::string& path() const { return path_; }

private:
    TempDir dir_;
    std::string path_;
    ui::ColonyDocument document_;
    ui::ColonyEditFacade facade_{&document_};
};

/// Lets a view's computation end and its result be shown, as the event loop would.
inline void finish(ui::ComputeRunner* runner) { runner->wait(); }

} // namespace hierloom::test
