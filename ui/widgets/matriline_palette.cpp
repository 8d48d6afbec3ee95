// SPDX-License-Identifier: GPL-3.0-or-later
#include "ui/widgets/matriline_palette.h"

#include <array>

namespace hierloom::ui {

namespace {
// Okabe & Ito (2008) without black; yellow F0E442 darkened to B8A200 for contrast on white.
constexpr std::array<QRgb, 7> okabeIto{0x0072B2, 0xE69F00, 0x009E73, 0xCC79A7, 0x56B4E9, 0xD55E00, 0xB8A200};
}

MatrilinePalette::MatrilinePalette(const core::Matrilines& lines)
{
    for (int m : lines.matriarchs()) {
        bool female = false;
        for (int a : lines.members(m)) female = female || lines.sex(a) == core::Sex::Female;
        if (!female) continue;
        index_.emplace(lines.id(m), static_cast<int>(matriarchs_.size()));
        matriarchs_.push_back(lines.id(m));
    }
}

int MatrilinePalette::lineOf(const std::string& matriarch) const
{
    const auto it = index_.find(matriarch);
    return it == index_.end() ? -1 : it->second;
}

QColor MatrilinePalette::colourAt(int line)
{
    if (line < 0) return QColor(0x99, 0x99, 0x99);
    const QColor base(okabeIto[static_cast<size_t>(line) % okabeIto.size()]);
    switch ((line / static_cast<int>(okabeIto.size())) % 3) {
    case 1: return base.darker(170);
    case 2: { // halfway to white
        return QColor((base.red() + 255) / 2, (base.green() + 255) / 2, (base.blue() + 255) / 2);
    }
    default: return base;
    }
}

QPen MatrilinePalette::penAt(int line, double width)
{
    // Dashes only from the 22nd line on: dashed strokes cost several times a
    // solid one to draw, which shows when hundreds of lines are panned.
    QPen pen(colourAt(line), width);
    if (line >= 3 * static_cast<int>(okabeIto.size())) pen.setStyle(Qt::DashLine);
    return pen;
}

} // namespace hierloom::ui
