// SPDX-License-Identifier: GPL-3.0-or-later
#include "ui/analysis/pedigree_view.h"

#include "core/pedigree/inheritance_prediction.h"
#include "ui/document/animal_selection.h"
#include "ui/document/colony_document.h"
#include "ui/document/visible_refresh.h"
#include "ui/document/qt_convert.h"

#include <QAction>
#include <QMouseEvent>
#include <QPainter>
#include <QToolTip>
#include <QWheelEvent>

#include <algorithm>
#include <cmath>
#include <functional>

namespace hierloom::ui {

namespace {
constexpr double slot = 44;    // horizontal room per leaf
constexpr double level = 46;   // vertical distance of generations
constexpr double radius = 6.5; // node size
constexpr double margin = 16;
constexpr double titleHeight = 24;
} // namespace

class PedigreeView::Canvas : public QWidget {
public:
    explicit Canvas(PedigreeView* owner) : QWidget(owner), owner_(owner) { setMouseTracking(true); }

protected:
    void paintEvent(QPaintEvent*) override
    {
        QPainter p(this);
        p.setRenderHint(QPainter::Antialiasing);
        p.fillRect(rect(), palette().base());
        p.scale(owner_->zoom_, owner_->zoom_); // the layout is in unzoomed canvas units
        const auto& nodes = owner_->nodes_;
        QFont small = font();
        small.setPointSizeF(small.pointSizeF() * 0.82);
        QFont bold = font();
        bold.setBold(true);
        p.setFont(bold);
        p.setPen(palette().text().color());
        for (const auto& [title, at] : owner_->titles_) p.drawText(at, title);
        // Elbow links mother -> offspring, drawn first so nodes sit on top.
        for (const Node& n : nodes) {
            if (n.parent < 0) continue;
            const QPointF a = nodes[static_cast<size_t>(n.parent)].at, b = n.at;
            const double mid = (a.y() + b.y()) / 2;
            p.setPen(QPen(QColor(0x88, 0x88, 0x88), 1));
            p.drawPolyline(QPolygonF{QPointF(a.x(), a.y() + radius), QPointF(a.x(), mid), QPointF(b.x(), mid),
                                     QPointF(b.x(), b.y() - radius)});
        }
        p.setFont(small);
        const QString selected = owner_->selection_->animal();
        for (const Node& n : nodes) {
            const QColor colour = MatrilinePalette::colourAt(n.line);
            p.setPen(QPen(n.present ? colour.darker(140) : colour, n.recorded ? 1.5 : 1,
                          n.recorded ? Qt::SolidLine : Qt::DashLine));
            p.setBrush(n.present ? QBrush(colour) : palette().base()); // hollow: no longer present
            const QRectF box(n.at.x() - radius, n.at.y() - radius, 2 * radius, 2 * radius);
            if (n.female) p.drawEllipse(box);
            else p.drawRect(box);
            if (n.id == selected) {
                p.setPen(QPen(palette().text().color(), 2.5));
                p.setBrush(Qt::NoBrush);
                p.drawEllipse(n.at, radius + 4, radius + 4);
            }
            p.setPen(n.present ? palette().text().color() : QColor(0x90, 0x90, 0x90));
            const QRectF text(n.at.x() - slot / 2, n.at.y() + radius + 1, slot, 14);
            p.drawText(text, Qt::AlignHCenter | Qt::AlignTop,
                       QFontMetrics(small).elidedText(n.label, Qt::ElideRight, static_cast<int>(slot) - 2));
        }
    }

    void mousePressEvent(QMouseEvent* e) override
    {
        const int i = nodeAt(e->position());
        if (i >= 0) owner_->selection_->setAnimal(owner_->nodes_[static_cast<size_t>(i)].id);
    }

    void mouseMoveEvent(QMouseEvent* e) override
    {
        const int i = nodeAt(e->position());
        if (i < 0) {
            QToolTip::hideText();
            return;
        }
        const Node& n = owner_->nodes_[static_cast<size_t>(i)];
        QToolTip::showText(e->globalPosition().toPoint(),
                           tr("%1 (%2)%3").arg(n.label, n.id, n.present ? tr(", present") : QString()), this);
    }

public:
    int nodeAt(QPointF pixel) const
    {
        const QPointF at = pixel / owner_->zoom_;
        const auto& nodes = owner_->nodes_;
        for (size_t i = 0; i < nodes.size(); ++i)
            if (QLineF(nodes[i].at, at).length() <= radius + 3) return static_cast<int>(i);
        return -1;
    }

private:
    PedigreeView* owner_;
};

PedigreeView::PedigreeView(ColonyDocument* document, AnimalSelection* selection, QWidget* parent)
    : QScrollArea(parent), document_(document), selection_(selection), canvas_(new Canvas(this))
{
    setWidget(canvas_);
    setWidgetResizable(false);
    setBackgroundRole(QPalette::Base);
    // Recomputed only while on screen; a hidden tab catches up when shown.
    auto* refresh = new VisibleRefresh(this, [this] { rebuild(); });
    connect(document_, &ColonyDocument::changed, refresh, &VisibleRefresh::request);
    connect(selection_, &AnimalSelection::dayChanged, this, &PedigreeView::updatePresence);
    connect(selection_, &AnimalSelection::animalChanged, this, [this](const QString& id) {
        canvas_->update();
        const int i = find(id);
        if (i >= 0) {
            const QPointF at = nodes_[static_cast<size_t>(i)].at * zoom_;
            ensureVisible(static_cast<int>(at.x()), static_cast<int>(at.y()), 60, 60);
        }
    });
    // Zoom: Ctrl + wheel, or the context menu.
    setContextMenuPolicy(Qt::ActionsContextMenu);
    auto addZoomAction = [this](const QString& text, const QKeySequence& keys, std::function<void()> act) {
        auto* a = new QAction(text, this);
        a->setShortcut(keys);
        a->setShortcutContext(Qt::WidgetWithChildrenShortcut);
        connect(a, &QAction::triggered, this, std::move(act));
        addAction(a);
    };
    // (Ctrl+1..9 and Ctrl+0 belong to the window: they switch views; a second Ctrl+0 here would make both ambiguous.)
    addZoomAction(tr("Zoom to Fit"), QKeySequence(), [this] {
        zoomChosen_ = false;
        zoomToFit();
    });
    addZoomAction(tr("Zoom to Fit Width"), QKeySequence(), [this] {
        zoomChosen_ = true;
        zoomToFitWidth();
    });
    addZoomAction(tr("Actual Size"), QKeySequence(Qt::CTRL | Qt::ALT | Qt::Key_0), [this] {
        zoomChosen_ = true;
        setZoom(1.0);
    });
    addZoomAction(tr("Zoom In"), QKeySequence::ZoomIn, [this] {
        zoomChosen_ = true;
        setZoom(zoom_ * 1.25);
    });
    addZoomAction(tr("Zoom Out"), QKeySequence::ZoomOut, [this] {
        zoomChosen_ = true;
        setZoom(zoom_ / 1.25);
    });
    rebuild();
}

void PedigreeView::setZoom(double zoom)
{
    zoom_ = std::clamp(zoom, minZoom, maxZoom);
    canvas_->resize(static_cast<int>(std::ceil(natural_.width() * zoom_)),
                    static_cast<int>(std::ceil(natural_.height() * zoom_)));
    canvas_->update();
}

void PedigreeView::zoomToFitWidth()
{
    if (natural_.width() <= 0) return;
    setZoom(std::min(1.0, (viewport()->width() - 2) / natural_.width()));
}

void PedigreeView::zoomToFit()
{
    if (natural_.width() <= 0 || natural_.height() <= 0) return;
    setZoom(std::min({1.0, (viewport()->width() - 2) / natural_.width(), (viewport()->height() - 2) / natural_.height()}));
}

void PedigreeView::resizeEvent(QResizeEvent* event)
{
    QScrollArea::resizeEvent(event);
    if (!zoomChosen_) zoomToFit();
}

void PedigreeView::wheelEvent(QWheelEvent* event)
{
    if (event->modifiers() & Qt::ControlModifier) {
        zoomChosen_ = true;
        setZoom(zoom_ * std::pow(1.15, event->angleDelta().y() / 120.0));
        event->accept();
        return;
    }
    QScrollArea::wheelEvent(event);
}

PedigreeView::~PedigreeView() = default;

int PedigreeView::find(const QString& id) const
{
    for (size_t i = 0; i < nodes_.size(); ++i)
        if (nodes_[i].id == id) return static_cast<int>(i);
    return -1;
}

int PedigreeView::presentCount() const
{
    return static_cast<int>(std::count_if(nodes_.begin(), nodes_.end(), [](const Node& n) { return n.present; }));
}

QPoint PedigreeView::viewportPosition(const QString& id) const
{
    const int i = find(id);
    if (i < 0) return {};
    return canvas_->mapTo(viewport(), (nodes_[static_cast<size_t>(i)].at * zoom_).toPoint());
}

bool PedigreeView::clickAt(QPoint viewportPoint)
{
    const int i = canvas_->nodeAt(canvas_->mapFrom(viewport(), viewportPoint));
    if (i < 0) return false;
    selection_->setAnimal(nodes_[static_cast<size_t>(i)].id);
    return true;
}

void PedigreeView::rebuild()
{
    nodes_.clear();
    titles_.clear();
    lines_ = std::make_unique<core::Matrilines>(document_->pedigree());
    const core::Matrilines& lines = *lines_;
    palette_ = MatrilinePalette(lines);
    const core::Colony& colony = document_->pedigree();
    double top = margin;
    double widest = 0;
    // Tidy layout: leaves take consecutive slots, a mother sits above the middle of her offspring.
    for (int l = 0; l < palette_.lineCount(); ++l) {
        const int matriarch = lines.index(palette_.matriarchs()[static_cast<size_t>(l)]);
        const int a = colony.animalIndex(lines.id(matriarch));
        const QString name = a >= 0 ? toQString(colony.animals[static_cast<size_t>(a)].name) : QString();
        titles_.emplace_back(tr("Line of %1").arg(name.isEmpty() ? toQString(lines.id(matriarch)) : name),
                             QPointF(margin, top + 14));
        double nextLeaf = margin + slot / 2;
        int deepest = 0;
        const double y0 = top + titleHeight + radius;
        std::function<double(int, int, int)> place = [&](int node, int parent, int depth) -> double {
            Node n;
            n.id = toQString(lines.id(node));
            const int k = colony.animalIndex(lines.id(node));
            n.label = k >= 0 && !colony.animals[static_cast<size_t>(k)].name.empty()
                          ? toQString(colony.animals[static_cast<size_t>(k)].name)
                          : n.id;
            n.parent = parent;
            n.line = l;
            n.female = lines.sex(node) != core::Sex::Male;
            n.recorded = lines.recorded(node);
            const int self = static_cast<int>(nodes_.size());
            nodes_.push_back(n);
            deepest = std::max(deepest, depth);
            const std::vector<int> kids = core::orderSiblings(lines, lines.offspring(node), core::SiblingRule::Eldest);
            double x;
            if (kids.empty()) {
                x = nextLeaf;
                nextLeaf += slot;
            } else {
                double first = 0, last = 0;
                for (size_t c = 0; c < kids.size(); ++c) {
                    const double cx = place(kids[c], self, depth + 1);
                    if (c == 0) first = cx;
                    last = cx;
                }
                x = (first + last) / 2;
            }
            nodes_[static_cast<size_t>(self)].at = QPointF(x, y0 + depth * level);
            return x;
        };
        place(matriarch, -1, 0);
        widest = std::max(widest, nextLeaf);
        top = y0 + deepest * level + radius + 30;
    }
    natural_ = QSizeF(std::max(widest + margin, 200.0), top + margin);
    if (zoomChosen_) setZoom(zoom_);
    else zoomToFit(); // at first the whole pedigree, trees and names, is in view
    updatePresence();
}

void PedigreeView::updatePresence()
{
    const core::ResidenceIndex& where = document_->residences();
    const std::optional<core::Day> day = selection_->day();
    for (Node& n : nodes_) {
        const int a = where.animal(toStdString(n.id));
        n.present = day && a >= 0 && where.presentOn(a, *day);
    }
    canvas_->update();
}

} // namespace hierloom::ui
