// SPDX-License-Identifier: GPL-3.0-or-later
#pragma once
#include <QDialog>
#include <QUrl>

class QTextBrowser;

namespace hierloom::ui {

/// The help window: the HTML pages of resources/help (compiled in as
/// qrc:/help/) in a QTextBrowser with back, forward and contents buttons.
/// One per main window, kept open beside it (not modal) so a person can read
/// a method while looking at its figure.
class HelpBrowser : public QDialog {
    Q_OBJECT
public:
    explicit HelpBrowser(QWidget* parent = nullptr);

    /// The help window of `from`'s top-level window, created on first use.
    static HelpBrowser* forWindow(QWidget* from);
    /// The address of a help page (file name in resources/help) and anchor.
    static QUrl pageUrl(const QString& page, const QString& anchor = {});

    /// Shows a page, scrolled to the anchor, and raises the window.
    void showPage(const QString& page, const QString& anchor = {});
    QTextBrowser* browser() const { return browser_; }

private:
    QTextBrowser* browser_;
};

/// Opens the help of `from`'s window at a page and anchor.
void showHelp(QWidget* from, const QString& page, const QString& anchor = {});
/// Opens the methods page at a figure's entry (a key of help_topics.h).
void showFigureHelp(QWidget* from, const QString& key);

/// The menu shortcuts of a window as HTML table rows, menu by menu, for the
/// shortcut sheet; empty when the window has no menu bar.
QString menuShortcutRows(const QWidget* window);

} // namespace hierloom::ui
