// SPDX-License-Identifier: GPL-3.0-or-later
#include "ui/colony_document.h"

#include "ui/qt_convert.h"

namespace hierloom::ui {

ColonyDocument::ColonyDocument(QObject* parent) : QObject(parent) {}

ColonyDocument::~ColonyDocument() = default;

void ColonyDocument::open(const QString& path, bool readOnly)
{
    using Mode = core::ColonyStore::Mode;
    adopt(core::ColonyStore::open(toStdString(path), readOnly ? Mode::ReadOnly : Mode::ReadWrite), path, readOnly);
}

void ColonyDocument::create(const QString& path)
{
    adopt(core::ColonyStore::create(toStdString(path)), path, false);
}

void ColonyDocument::adopt(core::ColonyStore store, const QString& path, bool readOnly)
{
    // Load before replacing anything, so a file that fails to load leaves
    // the previous colony open and intact.
    core::Colony colony = store.load();
    core::ResidenceIndex residences(colony.animals, colony.residences);
    store_.emplace(std::move(store));
    colony_ = std::move(colony);
    colony_.reindex();
    residences_ = std::move(residences);
    path_ = path;
    readOnly_ = readOnly;
    emit changed();
}

void ColonyDocument::close()
{
    store_.reset();
    colony_ = core::Colony{};
    residences_ = core::ResidenceIndex{};
    path_.clear();
    readOnly_ = false;
    emit changed();
}

void ColonyDocument::reload()
{
    if (!store_) return;
    core::Colony colony = store_->load();
    residences_ = core::ResidenceIndex(colony.animals, colony.residences);
    colony_ = std::move(colony);
    colony_.reindex();
    emit changed();
}

} // namespace hierloom::ui
