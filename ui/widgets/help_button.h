// SPDX-License-Identifier: GPL-3.0-or-later
#pragma once
#include <QToolButton>

namespace hierloom::ui {

/// The small "?" beside a figure: opens the help window at the figure's
/// methods entry (a key of help_topics.h), or at any page and anchor.
/// Usage: layout->addWidget(new HelpButton(QStringLiteral("steepness"), this));
class HelpButton : public QToolButton {
    Q_OBJECT
public:
    /// A button for a figure's entry in the methods page.
    explicit HelpButton(const QString& figureKey, QWidget* parent = nullptr);
    /// A button for any help page (e.g. "import-formats.html") and anchor.
    HelpButton(const QString& page, const QString& anchor, QWidget* parent);

    QString page() const { return page_; }
    QString anchor() const { return anchor_; }

private:
    void setUp();

    QString page_;
    QString anchor_;
};

} // namespace hierloom::ui
