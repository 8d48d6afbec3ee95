// SPDX-License-Identifier: GPL-3.0-or-later
#include "ui/document/colony_document.h"

#include "ui/document/qt_convert.h"

#include <QFileInfo>
#include <QLocale>
#include <QUndoStack>

#include <algorithm>
#include <cassert>

namespace hierloom::ui {

ColonyDocument::ColonyDocument(QObject* parent) : QObject(parent), undoStack_(new QUndoStack(this)) {}

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
    // Asked before loading: a write by another program after this is noticed later.
    const std::int64_t version = store.dataVersion();
    core::Colony colony = store.load();
    core::ResidenceIndex residences(colony.animals, colony.residences);
    // The commands of the previous file would write to this one.
    clearHistory(tr("another colony file was opened"));
    store_.emplace(std::move(store));
    colony_ = std::move(colony);
    colony_.reindex();
    residences_ = std::move(residences);
    path_ = path;
    readOnly_ = readOnly;
    knownVersion_ = version;
    emitChange({});
}

void ColonyDocument::close()
{
    clearHistory(tr("the colony was closed"));
    store_.reset();
    colony_ = core::Colony{};
    residences_ = core::ResidenceIndex{};
    path_.clear();
    readOnly_ = false;
    emitChange({});
}

void ColonyDocument::clearHistory(const QString& reason)
{
    const bool hadHistory = undoStack_->count() > 0;
    undoStack_->clear();
    if (hadHistory) emit historyCleared(reason);
}

void ColonyDocument::reload()
{
    if (!store_) return;
    const std::int64_t version = store_->dataVersion();
    core::Colony colony = store_->load();
    knownVersion_ = version;
    residences_ = core::ResidenceIndex(colony.animals, colony.residences);
    colony_ = std::move(colony);
    colony_.reindex();
    emitChange({});
}

bool ColonyDocument::writtenElsewhere() const { return store_ && store_->dataVersion() != knownVersion_; }

bool ColonyDocument::catchUpWithFile()
{
    if (!writtenElsewhere()) return false;
    const QLocale locale;
    const auto count = [&locale](size_t n) { return locale.toString(static_cast<qulonglong>(n)); };
    const size_t animals = colony_.animals.size();
    const size_t encounters = colony_.encounters.size();
    const QString file = QFileInfo(path_).fileName();
    // First the history: its commands would write records as this window last saw them.
    clearHistory(tr("another program changed %1").arg(file));
    try {
        reload();
    } catch (const std::exception&) {
        emit changedOutside(tr("Another program changed %1 while it was open here, and it cannot be read again; "
                               "the undo history was emptied. Nothing more is written until it can be read.")
                                .arg(file));
        throw;
    }
    // What matters first: a status bar may cut the end off.
    emit changedOutside(tr("Another program changed %1; it was read again and the undo history emptied "
                           "(encounters %2 → %3, animals %4 → %5), so Undo cannot change records this window did not write.")
                            .arg(file, count(encounters), count(colony_.encounters.size()), count(animals),
                                 count(colony_.animals.size())));
    return true;
}

void ColonyDocument::catchUpLater()
{
    QMetaObject::invokeMethod(
        this,
        [this] {
            try {
                catchUpWithFile();
            } catch (const std::exception& error) {
                emit writeFailed(QString::fromUtf8(error.what()));
            }
        },
        Qt::QueuedConnection);
}

void ColonyDocument::undo()
{
    try {
        if (catchUpWithFile()) return;
    } catch (const std::exception& error) {
        emit writeFailed(QString::fromUtf8(error.what()));
        return;
    }
    undoStack_->undo();
}

void ColonyDocument::redo()
{
    try {
        if (catchUpWithFile()) return;
    } catch (const std::exception& error) {
        emit writeFailed(QString::fromUtf8(error.what()));
        return;
    }
    undoStack_->redo();
}

core::ColonyStore& ColonyDocument::writableStore()
{
    assert(store_ && !readOnly_);
    return *store_;
}

void ColonyDocument::setAuditUserName(const std::string& name)
{
    if (store_) store_->setUserName(name);
}

void ColonyDocument::reloadAnimals()
{
    if (!store_) return;
    colony_.animals = store_->loadAnimals();
    colony_.residences = store_->loadResidences();
    colony_.reindex();
    residences_ = core::ResidenceIndex(colony_.animals, colony_.residences);
    emitChange({ChangeKind::AnimalsChanged, 0});
}

void ColonyDocument::applyEncounterChange(const std::vector<core::Encounter>& removed,
                                          const std::vector<core::Encounter>& inserted)
{
    // The cache is in seq order, so each record is found by binary search.
    auto& cache = colony_.encounters;
    const auto bySeq = [](const core::Encounter& e, std::int64_t seq) { return e.seq < seq; };
    for (const core::Encounter& r : removed) {
        auto it = std::lower_bound(cache.begin(), cache.end(), r.seq, bySeq);
        if (it != cache.end() && it->seq == r.seq) cache.erase(it);
    }
    const size_t first = cache.size();
    bool appendedOnly = removed.empty();
    std::vector<core::Encounter> sorted = inserted;
    std::sort(sorted.begin(), sorted.end(), [](const auto& a, const auto& b) { return a.seq < b.seq; });
    for (core::Encounter& e : sorted) {
        if (cache.empty() || e.seq > cache.back().seq) {
            cache.push_back(std::move(e));
        } else {
            appendedOnly = false;
            cache.insert(std::lower_bound(cache.begin(), cache.end(), e.seq, bySeq), std::move(e));
        }
    }
    emitChange(appendedOnly ? Change{ChangeKind::EncountersAppended, first} : Change{ChangeKind::EncountersChanged, 0});
}

void ColonyDocument::announce(ChangeKind kind) { emitChange({kind, 0}); }

void ColonyDocument::emitChange(Change change)
{
    lastChange_ = change;
    snapshot_ = {};
    emit changed(change.kind);
}

ColonyDocument::Snapshot ColonyDocument::snapshot() const
{
    if (!snapshot_.colony) {
        snapshot_.colony = std::make_shared<const core::Colony>(colony_);
        snapshot_.residences = std::make_shared<const core::ResidenceIndex>(residences_);
    }
    return snapshot_;
}

} // namespace hierloom::ui
