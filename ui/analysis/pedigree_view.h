// SPDX-License-Identifier: GPL-3.0-or-later
#pragma once
#include "core/base/civil_date.h"
#include "core/pedigree/matriline.h"
#include "ui/widgets/matriline_palette.h"

#include <QScrollArea>
#include <QSizeF>
#include <QString>

#include <memory>
#include <optional>
#include <vector>

namespace hierloom::ui {

class AnimalSelection;
class ColonyDocument;

/// The matrilines as family trees: each line a block headed by its matriarch,
/// mothers above their offspring, sisters left to right in birth order
/// (females round, males square). Animals alive in the colony on the
/// selected date are filled in their line's colour, the others hollow; a
/// click selects an animal in the shared AnimalSelection. Ctrl + wheel,
/// Ctrl++ and Ctrl+- zoom, Ctrl+0 returns to actual size, and the context
/// menu also fits the whole width into the view.
class PedigreeView : public QScrollArea {
    Q_OBJECT
public:
    PedigreeView(ColonyDocument* document, AnimalSelection* selection, QWidget* parent = nullptr);
    ~PedigreeView() override;

    /// One drawn animal.
    struct Node {
        QString id;
        QString label;
        int parent = -1; ///< index of the mother's node, or -1
        int line = -1;   ///< palette line number
        bool female = true;
        bool recorded = true;
        QPointF at;      ///< centre, in canvas coordinates
        bool present = false; ///< alive in the colony on the selected date
    };
    const std::vector<Node>& nodes() const { return nodes_; }
    /// Node index of an id, or -1.
    int find(const QString& id) const;
    /// Number of animals drawn as present on the selected date.
    int presentCount() const;
    /// Centre of a node in the view's viewport coordinates (tests click there).
    QPoint viewportPosition(const QString& id) const;
    /// Selects the animal drawn at a viewport point, if any (what a click does).
    bool clickAt(QPoint viewportPoint);

    static constexpr double minZoom = 0.2;
    static constexpr double maxZoom = 3.0;
    double zoom() const { return zoom_; }
    /// Scales the drawing (clamped to minZoom..maxZoom); 1 is actual size.
    void setZoom(double zoom);
    /// Shrinks the drawing so its whole width fits the view (never enlarges it).
    void zoomToFitWidth();
    /// Shrinks the drawing so all of it fits the view (never enlarges it). The
    /// view does this by itself until the person zooms.
    void zoomToFit();

protected:
    void wheelEvent(QWheelEvent* event) override;
    void resizeEvent(QResizeEvent* event) override;

private:
    class Canvas;
    void rebuild();
    void updatePresence();

    ColonyDocument* document_;
    AnimalSelection* selection_;
    Canvas* canvas_;
    std::unique_ptr<core::Matrilines> lines_;
    MatrilinePalette palette_;
    std::vector<Node> nodes_;
    std::vector<std::pair<QString, QPointF>> titles_; ///< line headings
    QSizeF natural_;   ///< the drawing's size at zoom 1
    double zoom_ = 1.0;
    bool zoomChosen_ = false; ///< the person zoomed: no more fitting by itself
    friend class Canvas;
};

} // namespace hierloom::ui
