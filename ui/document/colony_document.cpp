// SPDX-License-Identifier: GPL-3.0-or-later
#include "ui/document/colony_document.h"

#include "ui/document/background_encounter_load.h"
#include "core/store/compact_encounter_loader.h"
#include "ui/document/qt_convert.h"

#include <QEventLoop>
#include <QFileInfo>
#include <QLocale>
#include <QUndoStack>

#include <algorithm>
#include <cassert>
#include <utility>

namespace hierloom::ui {

namespace {

/// Every encounter of group `g` (with its uid: the desktop edits by uid).
core::EncounterScope groupScope(const std::string& g)
{
    core::EncounterScope scope;
    scope.group = g;
    return scope;
}

} // namespace

ColonyDocument::ColonyDocument(QObject* parent)
    : QObject(parent), colony_(std::make_shared<core::Colony>()), records_(std::make_shared<core::EncounterRecords>()),
      undoStack_(new QUndoStack(this))
{
}

ColonyDocument::~ColonyDocument() { stopBackgroundLoad(); }

void ColonyDocument::open(const QString& path, bool readOnly)
{
    using Mode = core::ColonyStore::Mode;
    adopt(core::ColonyStore::open(toStdString(path), readOnly ? Mode::ReadOnly : Mode::ReadWrite), path, readOnly);
}

void ColonyDocument::create(const QString& path)
{
    adopt(core::ColonyStore::create(toStdString(path)), path, false);
}

ColonyDocument::Read ColonyDocument::readFile(const core::ColonyStore& store, std::vector<std::string> groups) const
{
    Read read;
    read.encounters = store.encounterCount();
    if (read.encounters < progressiveFrom_) {
        read.colony = store.load();
        read.records = core::EncounterRecords(read.colony.encounters);
        read.colony.encounters = {};
        return read;
    }
    // A large file: animals, residences and the encounters of some groups now, the rest later.
    read.complete = false;
    read.colony.animals = store.loadAnimals();
    read.colony.residences = store.loadResidences();
    if (groups.empty()) {
        const core::ResidenceIndex where(read.colony.animals, read.colony.residences);
        if (!where.groups().empty()) groups.push_back(where.groups().front());
    }
    for (const std::string& g : groups) {
        read.records = core::EncounterRecords::merged(
            read.records, core::loadEncounterRecords(store, groupScope(g)));
    }
    read.groups = std::move(groups);
    return read;
}

void ColonyDocument::adopt(core::ColonyStore store, const QString& path, bool readOnly)
{
    // Load before replacing anything, so a file that fails to load leaves
    // the previous colony open and intact.
    // Asked before loading: a write by another program after this is noticed later.
    const std::int64_t version = store.dataVersion();
    Read read = readFile(store, {});
    // The commands of the previous file would write to this one.
    clearHistory(tr("another colony file was opened"));
    stopBackgroundLoad();
    store_.emplace(std::move(store));
    path_ = path;
    readOnly_ = readOnly;
    knownVersion_ = version;
    const std::vector<std::string> shown = read.groups;
    take(std::move(read));
    emitChange({});
    // A partial cache: the views turn to the group it holds, not to "all groups".
    if (!shown.empty()) emit groupShown(toQString(shown.front()));
}

void ColonyDocument::take(Read read)
{
    stopBackgroundLoad();
    residences_ = core::ResidenceIndex(read.colony.animals, read.colony.residences);
    colony_ = std::make_shared<core::Colony>(std::move(read.colony));
    colony_->reindex();
    records_ = std::make_shared<core::EncounterRecords>(std::move(read.records));
    snapshot_ = {};
    complete_ = read.complete;
    heldGroups_ = std::move(read.groups);
    keptFromSeq_ = records_->empty() ? 0 : records_->seq(records_->size() - 1);
    if (!complete_ && read.encounters <= readEverythingUpTo_) startBackgroundLoad();
    else if (!complete_) startBackgroundCheck();
}

void ColonyDocument::startBackgroundCheck()
{
    const std::uint64_t generation = ++checkGeneration_;
    const std::int64_t version = store_->dataVersion();
    auto done = [this, generation, version](BackgroundEncounterLoad::Encounters, const std::string& error) {
        QMetaObject::invokeMethod(
            this,
            [this, generation, version, error] {
                if (generation != checkGeneration_) return;
                checker_.reset(); // its thread has ended
                if (!error.empty()) {
                    emit loadFailed(QString::fromUtf8(error.c_str()));
                    return;
                }
                if (store_) store_->trustIntegrityCheckedAt(version);
            },
            Qt::QueuedConnection);
    };
    checker_ = std::make_unique<BackgroundEncounterLoad>(store_->path(), -1,
                                                         [](int, int) {}, std::move(done));
}

void ColonyDocument::readEverything()
{
    if (!store_ || complete_ || loader_) return;
    startBackgroundLoad();
    emit loadProgress(0, BackgroundEncounterLoad::partsFor(store_->encounterCount()));
}

std::vector<std::string> ColonyDocument::dropOldGroups()
{
    if (loader_ || heldGroups_.size() <= heldGroupLimit_) return {};
    const auto keep = heldGroups_.end() - static_cast<std::ptrdiff_t>(heldGroupLimit_);
    std::vector<std::string> dropped(heldGroups_.begin(), keep);
    heldGroups_.erase(heldGroups_.begin(), keep);
    return dropped;
}

void ColonyDocument::startBackgroundLoad()
{
    const std::uint64_t generation = ++loadGeneration_;
    journal_.clear();
    // The load's connection checks the whole file (quick_check) as it opens;
    // this one may then skip that check before its first write.
    const std::int64_t version = store_->dataVersion();
    // The callbacks run on the load's thread: each is passed to this one, and
    // dropped there when the load was replaced or stopped meanwhile.
    auto progress = [this, generation](int done, int total) {
        QMetaObject::invokeMethod(
            this,
            [this, generation, done, total] {
                if (generation == loadGeneration_) emit loadProgress(done, total);
            },
            Qt::QueuedConnection);
    };
    auto finished = [this, generation, version](BackgroundEncounterLoad::Encounters all, const std::string& error) {
        QMetaObject::invokeMethod(
            this,
            [this, generation, version, all, error] {
                if (generation != loadGeneration_) return;
                if (all) {
                    store_->trustIntegrityCheckedAt(version);
                    backgroundLoaded(all);
                }
                else {
                    stopBackgroundLoad();
                    emit loadFailed(tr("Not every encounter of %1 could be read: %2")
                                        .arg(QFileInfo(path_).fileName(), QString::fromUtf8(error.c_str())));
                }
            },
            Qt::QueuedConnection);
    };
    loader_ = std::make_unique<BackgroundEncounterLoad>(store_->path(), store_->encounterCount(),
                                                        std::move(progress), std::move(finished));
}

void ColonyDocument::stopBackgroundLoad()
{
    ++loadGeneration_;
    ++checkGeneration_;
    checker_.reset();
    loader_.reset(); // cancels and waits for its thread
    journal_.clear();
}

void ColonyDocument::backgroundLoaded(std::shared_ptr<core::EncounterRecords> all)
{
    // The load read the file while this window may have written to it: its
    // own changes are applied again, by seq, whether the load saw them or not.
    for (const auto& [removed, inserted] : journal_) {
        for (const core::Encounter& r : removed) all->remove(r.seq);
        for (const core::Encounter& e : inserted) all->put(e);
    }
    stopBackgroundLoad();
    snapshot_ = {};
    records_ = std::move(all);
    complete_ = true;
    heldGroups_.clear();
    emitChange({ChangeKind::EncountersChanged, 0}, false);
    emit loadFinished();
}

bool ColonyDocument::holdsGroup(const std::string& group) const
{
    return complete_ || std::find(heldGroups_.begin(), heldGroups_.end(), group) != heldGroups_.end();
}

bool ColonyDocument::holdGroup(const QString& group)
{
    const std::string g = toStdString(group);
    if (!store_ || g.empty() || complete_) return false;
    if (auto at = std::find(heldGroups_.begin(), heldGroups_.end(), g); at != heldGroups_.end()) {
        std::rotate(at, at + 1, heldGroups_.end()); // now the most recently asked for
        return false;
    }
    // Read straight into compact records: no Encounter of strings per row.
    const core::EncounterRecords part = core::loadEncounterRecords(*store_, groupScope(g));
    heldGroups_.push_back(g);
    const std::vector<std::string> dropped = dropOldGroups();
    snapshot_ = {};
    core::EncounterRecords kept = *records_; // compact: a copy of a few groups is cheap
    if (!dropped.empty()) {
        // Rows without a group stay (they may be in a held group's scope too), and so do new ones.
        kept.keepIf([&](const core::EncounterRecords& r, size_t i) {
            return r.seq(i) > keptFromSeq_ || r.group(i).empty() ||
                   std::find(dropped.begin(), dropped.end(), r.group(i)) == dropped.end();
        });
    }
    // This window's own new rows of the group may be held already: the held one stays.
    records_ = std::make_shared<core::EncounterRecords>(core::EncounterRecords::merged(kept, part));
    // The rows read are the file's as this window knows it, unless another
    // program wrote since (then results of the same revision may differ).
    emitChange({ChangeKind::EncountersChanged, 0}, writtenElsewhere());
    return true;
}

void ColonyDocument::showGroup(const QString& group)
{
    // The views turn first and read the group as they do (one computation,
    // not one for the old group and one for the new); then whatever no view read.
    emit groupShown(group);
    holdGroup(group);
}

std::int64_t ColonyDocument::encountersInFile() const
{
    if (complete_ || !store_) return static_cast<std::int64_t>(records_->size());
    return store_->encounterCount();
}

void ColonyDocument::finishLoading()
{
    if (complete_ || !loader_) return;
    QEventLoop loop;
    connect(this, &ColonyDocument::loadFinished, &loop, &QEventLoop::quit);
    connect(this, &ColonyDocument::loadFailed, &loop, &QEventLoop::quit);
    loop.exec();
}

core::Colony& ColonyDocument::editPedigree()
{
    snapshot_ = {};
    if (colony_.use_count() > 1) colony_ = std::make_shared<core::Colony>(*colony_);
    return *colony_;
}

core::EncounterRecords& ColonyDocument::editRecords()
{
    snapshot_ = {};
    if (records_.use_count() > 1) records_ = std::make_shared<core::EncounterRecords>(*records_);
    return *records_;
}

void ColonyDocument::close()
{
    clearHistory(tr("the colony was closed"));
    stopBackgroundLoad();
    complete_ = true;
    heldGroups_.clear();
    store_.reset();
    colony_ = std::make_shared<core::Colony>();
    records_ = std::make_shared<core::EncounterRecords>();
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
    // A partial cache reads the groups it held again (the rest in the background).
    Read read = readFile(*store_, complete_ ? std::vector<std::string>{} : heldGroups_);
    knownVersion_ = version;
    take(std::move(read));
    emitChange({});
}

bool ColonyDocument::writtenElsewhere() const { return store_ && store_->dataVersion() != knownVersion_; }

bool ColonyDocument::catchUpWithFile()
{
    if (!writtenElsewhere()) return false;
    const QLocale locale;
    const auto count = [&locale](size_t n) { return locale.toString(static_cast<qulonglong>(n)); };
    const size_t animals = colony_->animals.size();
    const auto encounters = static_cast<size_t>(encountersInFile());
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
                            .arg(file, count(encounters), count(static_cast<size_t>(encountersInFile())), count(animals),
                                 count(colony_->animals.size())));
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
    core::Colony& colony = editPedigree();
    colony.animals = store_->loadAnimals();
    colony.residences = store_->loadResidences();
    colony.reindex();
    residences_ = core::ResidenceIndex(colony.animals, colony.residences);
    emitChange({ChangeKind::AnimalsChanged, 0});
}

void ColonyDocument::applyEncounterChange(const std::vector<core::Encounter>& removed,
                                          const std::vector<core::Encounter>& inserted)
{
    if (loader_) journal_.emplace_back(removed, inserted);
    // The cache is in seq order, so each record is found by binary search.
    core::EncounterRecords& cache = editRecords();
    for (const core::Encounter& r : removed) cache.remove(r.seq);
    const size_t first = cache.size();
    bool appendedOnly = removed.empty();
    std::vector<core::Encounter> sorted = inserted;
    std::sort(sorted.begin(), sorted.end(), [](const auto& a, const auto& b) { return a.seq < b.seq; });
    for (const core::Encounter& e : sorted) {
        if (cache.empty() || e.seq > cache.seq(cache.size() - 1)) {
            cache.append(e);
        } else {
            appendedOnly = false;
            cache.put(e);
        }
    }
    emitChange(appendedOnly ? Change{ChangeKind::EncountersAppended, first} : Change{ChangeKind::EncountersChanged, 0});
}

void ColonyDocument::announce(ChangeKind kind) { emitChange({kind, 0}); }

void ColonyDocument::emitChange(Change change, bool recordsChanged)
{
    lastChange_ = change;
    if (recordsChanged) ++revision_;
    snapshot_ = {};
    emit changed(change.kind);
}

ColonyDocument::Snapshot ColonyDocument::snapshot() const
{
    if (!snapshot_.pedigree) {
        // Shared: the next change copies what it changes first if a job still holds it.
        snapshot_.pedigree = colony_;
        snapshot_.encounters = records_;
        snapshot_.residences = std::make_shared<const core::ResidenceIndex>(residences_);
    }
    return snapshot_;
}

core::Colony ColonyDocument::colonyFor(std::string_view group) const { return snapshot().colonyFor(group); }

core::Colony ColonyDocument::colonyWithAnimal(std::string_view animal) const
{
    core::Colony colony = *colony_;
    colony.encounters = records_->expandTakingPart(animal);
    return colony;
}

std::optional<core::Day> ColonyDocument::lastEncounterDay() const
{
    if (records_->empty()) return std::nullopt;
    return records_->lastDay();
}

std::shared_ptr<const core::CompactEncounters> ColonyDocument::Snapshot::takeScope(std::string_view group)
{
    if (group.empty()) return {encounters, &encounters->compact()}; // shares ownership of the records
    auto scope = std::make_shared<const core::CompactEncounters>(core::scopeOf(encounters->compact(), group));
    encounters.reset();
    return scope;
}

core::Colony ColonyDocument::Snapshot::colonyFor(std::string_view group) const
{
    core::Colony colony = *pedigree;
    colony.reindex();
    colony.encounters = encounters->expandScope(group);
    return colony;
}

} // namespace hierloom::ui
