// SPDX-License-Identifier: GPL-3.0-or-later
#include "ui/shell/edit_menus.h"

#include "ui/records/animal_editor_dialog.h"
#include "ui/records/animal_table_model.h"
#include "ui/records/animal_view.h"
#include "ui/records/life_event_dialog.h"
#include "ui/document/colony_document.h"
#include "ui/document/colony_edit_facade.h"
#include "ui/records/list_editor_dialog.h"

#include <QAction>
#include <QMainWindow>
#include <QMenu>
#include <QMenuBar>
#include <QItemSelectionModel>
#include <QTableView>
#include <QUndoStack>

namespace hierloom::ui {

namespace {

template <typename Dialog, typename Kind>
void runDialog(ColonyEditFacade* facade, Kind kind, const QString& animal, QWidget* parent)
{
    Dialog dialog(facade, kind, parent);
    dialog.startFrom(animal);
    dialog.exec();
}

} // namespace

QString EditMenus::selectedAnimal() const
{
    // The animal selected in the Animals view, if one is; the dialogs start from it.
    const auto* view = window_->findChild<AnimalView*>();
    if (!view || !view->table()->selectionModel()) return {};
    const QModelIndexList rows = view->table()->selectionModel()->selectedRows(AnimalTableModel::Id);
    if (rows.size() != 1) return {};
    return rows.front().data().toString();
}

EditMenus::EditMenus(QMainWindow* window, ColonyEditFacade* facade, std::function<void()> showEntry)
    : QObject(window), window_(window), facade_(facade)
{
    QUndoStack* stack = facade->document()->undoStack();
    // The Edit menu goes right after File, as on every desktop.
    QMenuBar* bar = window->menuBar();
    QAction* before = bar->actions().value(1);
    auto* edit = new QMenu(tr("&Edit"), bar);
    bar->insertMenu(before, edit);
    undo_ = stack->createUndoAction(edit, tr("&Undo"));
    undo_->setShortcuts({QKeySequence(Qt::CTRL | Qt::Key_Z)});
    redo_ = stack->createRedoAction(edit, tr("&Redo"));
    redo_->setShortcuts({QKeySequence(Qt::CTRL | Qt::SHIFT | Qt::Key_Z), QKeySequence(Qt::CTRL | Qt::Key_Y)});
    // Through the document, which first notices another program's writes (and then undoes nothing).
    ColonyDocument* document = facade->document();
    disconnect(undo_, &QAction::triggered, stack, &QUndoStack::undo);
    disconnect(redo_, &QAction::triggered, stack, &QUndoStack::redo);
    connect(undo_, &QAction::triggered, document, &ColonyDocument::undo);
    connect(redo_, &QAction::triggered, document, &ColonyDocument::redo);
    edit->addAction(undo_);
    edit->addAction(redo_);
    edit->addSeparator();
    QAction* entry = edit->addAction(tr("Evening &Entry"), this, [showEntry] { showEntry(); });
    // Not Ctrl+E or Ctrl+B: text fields on Linux take those (end of line, back one character).
    entry->setShortcut(QKeySequence(Qt::Key_F6));
    edit->addSeparator();
    QAction* codes = edit->addAction(tr("&Behaviour Codes..."), this, [this] {
        ListEditorDialog(facade_, ListEditorDialog::List::BehaviourCodes, window_).exec();
    });
    QAction* observers = edit->addAction(tr("&Observers..."), this, [this] {
        ListEditorDialog(facade_, ListEditorDialog::List::Observers, window_).exec();
    });
    writeActions_ << entry << codes << observers;

    auto* pedigree = new QMenu(tr("&Pedigree"), bar);
    bar->insertMenu(bar->actions().value(2), pedigree);
    using Mode = AnimalEditorDialog::Mode;
    using Event = LifeEventDialog::Event;
    struct Item {
        QString text;
        QKeySequence keys;
        std::function<void()> run;
    };
    const QList<Item> items{
        {tr("&Add Animal..."), QKeySequence(Qt::CTRL | Qt::SHIFT | Qt::Key_N),
         [this] { AnimalEditorDialog(facade_, Mode::Add, window_).exec(); }},
        {tr("&Edit Animal..."), QKeySequence(Qt::CTRL | Qt::SHIFT | Qt::Key_E),
         [this] { runDialog<AnimalEditorDialog>(facade_, Mode::Edit, selectedAnimal(), window_); }},
        {tr("Record &Birth..."), QKeySequence(Qt::CTRL | Qt::SHIFT | Qt::Key_B),
         [this] { runDialog<AnimalEditorDialog>(facade_, Mode::Birth, selectedAnimal(), window_); }},
        {tr("Record &Death..."), QKeySequence(Qt::CTRL | Qt::SHIFT | Qt::Key_D),
         [this] { LifeEventDialog(facade_, Event::Death, selectedAnimal(), window_).exec(); }},
        {tr("Record &Removal..."), QKeySequence(Qt::CTRL | Qt::SHIFT | Qt::Key_R),
         [this] { LifeEventDialog(facade_, Event::Removal, selectedAnimal(), window_).exec(); }},
        {tr("Record &Introduction..."), QKeySequence(Qt::CTRL | Qt::SHIFT | Qt::Key_I),
         [this] { AnimalEditorDialog(facade_, Mode::Introduction, window_).exec(); }},
        {tr("&Move Between Groups..."), QKeySequence(Qt::CTRL | Qt::SHIFT | Qt::Key_M),
         [this] { LifeEventDialog(facade_, Event::Move, selectedAnimal(), window_).exec(); }},
    };
    for (const Item& item : items) {
        QAction* a = pedigree->addAction(item.text, this, item.run);
        a->setShortcut(item.keys);
        writeActions_ << a;
    }
    connect(facade->document(), &ColonyDocument::changed, this, &EditMenus::updateEnabled);
    updateEnabled();
}

void EditMenus::updateEnabled()
{
    const ColonyDocument* d = facade_->document();
    const bool writable = d->isOpen() && !d->isReadOnly();
    for (QAction* a : writeActions_) a->setEnabled(writable);
}

} // namespace hierloom::ui
