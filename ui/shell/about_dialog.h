// SPDX-License-Identifier: GPL-3.0-or-later
#pragma once
#include <QDialog>

namespace hierloom::ui {

/// The About box: version, the program's licence and the licences of the
/// libraries it is built on.
class AboutDialog : public QDialog {
    Q_OBJECT
public:
    explicit AboutDialog(QWidget* parent = nullptr);

    /// The text shown, as HTML (also for tests).
    static QString aboutHtml();
};

/// The application icon (SVG with PNG sizes, from the compiled-in resources).
QIcon applicationIcon();

} // namespace hierloom::ui
