// SPDX-License-Identifier: GPL-3.0-or-later
#pragma once
#include "core/pedigree/matriline.h"

#include <QColor>
#include <QPen>
#include <QString>

#include <map>
#include <string>
#include <vector>

namespace hierloom::ui {

/// Colours of the matrilines, the same in every view. The palette is the
/// eight-colour set of Okabe & Ito (2008, "Color Universal Design"), which
/// stays distinguishable under the common colour-vision deficiencies, without
/// its black (kept for markers) and with its yellow darkened to read on
/// white: blue, orange, bluish green, reddish purple, sky blue, vermillion,
/// dark yellow. Lines 8-14 take the same hues darkened, lines 15-21 the hues
/// halfway to white (the hue tells the family apart, the lightness the
/// line), and lines beyond 21 repeat them dashed. Males heading a line of
/// their own (unrelated males) are grey.
class MatrilinePalette {
public:
    MatrilinePalette() = default;
    /// Numbers the lines with a female member by matriarch id.
    explicit MatrilinePalette(const core::Matrilines& lines);

    /// Line number of a matriarch id, or -1 (a male's own line, or unknown).
    int lineOf(const std::string& matriarch) const;
    int lineCount() const { return static_cast<int>(matriarchs_.size()); }
    const std::vector<std::string>& matriarchs() const { return matriarchs_; }

    QColor colour(const std::string& matriarch) const { return colourAt(lineOf(matriarch)); }
    QPen pen(const std::string& matriarch, double width) const { return penAt(lineOf(matriarch), width); }

    static QColor colourAt(int line);
    static QPen penAt(int line, double width);

private:
    std::vector<std::string> matriarchs_;
    std::map<std::string, int, std::less<>> index_;
};

/// Marker colour for discordance and wins against the order: black, the one
/// Okabe-Ito colour no matriline uses.
inline QColor discordanceColour() { return QColor(0x00, 0x00, 0x00); }

} // namespace hierloom::ui
