// SPDX-License-Identifier: GPL-3.0-or-later
#include "ui/widgets/help_browser.h"

#include "ui/widgets/key_sheet.h"

#include <QAction>
#include <QDialogButtonBox>
#include <QFile>
#include <QHBoxLayout>
#include <QKeySequence>
#include <QMainWindow>
#include <QMenu>
#include <QMenuBar>
#include <QPointer>
#include <QPushButton>
#include <QTextBrowser>
#include <QToolButton>
#include <QVBoxLayout>

namespace hierloom::ui {

namespace {

const char* const objectNameOfHelp = "hierloomHelpBrowser";
const char* const sheetStart = "<!-- HIERLOOM_MENU_SHORTCUTS";
const char* const sheetEnd = "<!-- /HIERLOOM_MENU_SHORTCUTS -->";

/// A text browser whose shortcut sheet lists the window's real menu
/// shortcuts and the keys its views publish (key_sheet.h), so the sheet stays
/// true when a menu gains an action or a view a key.
class HelpTextBrowser : public QTextBrowser {
public:
    HelpTextBrowser(QWidget* window, QWidget* parent) : QTextBrowser(parent), window_(window) {}

    QVariant loadResource(int type, const QUrl& name) override
    {
        if (type == QTextDocument::HtmlResource && name.fileName() == QLatin1String("shortcuts.html") && window_) {
            const QString rows = menuShortcutRows(window_);
            QFile file(QStringLiteral(":/help/shortcuts.html"));
            if (!rows.isEmpty() && file.open(QIODevice::ReadOnly)) {
                QString html = QString::fromUtf8(file.readAll());
                const qsizetype start = html.indexOf(QLatin1String(sheetStart));
                const qsizetype end = html.indexOf(QLatin1String(sheetEnd));
                if (start >= 0 && end > start) {
                    // The menus' keys, then the keys views handle themselves (the evening entry's).
                    const QString table = QStringLiteral("<table border=\"1\" cellpadding=\"4\" cellspacing=\"0\">") +
                                          rows + QStringLiteral("</table>") + keySheetsHtml(window_);
                    html.replace(start, end + qsizetype(qstrlen(sheetEnd)) - start, table);
                    return html;
                }
            }
        }
        return QTextBrowser::loadResource(type, name);
    }

private:
    QPointer<QWidget> window_;
};

void addMenuRows(const QMenu* menu, const QString& path, QString& rows)
{
    for (const QAction* action : menu->actions()) {
        if (action->isSeparator()) continue;
        const QString text = action->text().remove(QLatin1Char('&'));
        if (action->menu()) {
            addMenuRows(action->menu(), path + text + QStringLiteral(" \u2192 "), rows);
            continue;
        }
        const QList<QKeySequence> keys = action->shortcuts();
        if (keys.isEmpty()) continue;
        QStringList shown;
        for (const QKeySequence& k : keys) shown << k.toString(QKeySequence::NativeText).toHtmlEscaped();
        rows += QStringLiteral("<tr><td>%1</td><td>%2</td></tr>")
                    .arg(shown.join(QStringLiteral(", ")), (path + text).toHtmlEscaped());
    }
}

} // namespace

HelpBrowser::HelpBrowser(QWidget* parent) : QDialog(parent), browser_(new HelpTextBrowser(parent, this))
{
    setObjectName(QLatin1String(objectNameOfHelp));
    setWindowTitle(tr("Hierloom Help"));
    // A tool window that stays beside the main window without blocking it.
    setModal(false);
    browser_->setOpenExternalLinks(true);
    browser_->setSearchPaths({QStringLiteral(":/help")});

    auto* back = new QToolButton(this);
    back->setText(tr("Back"));
    back->setIcon(QIcon::fromTheme(QStringLiteral("go-previous")));
    back->setToolButtonStyle(Qt::ToolButtonTextBesideIcon);
    back->setShortcut(QKeySequence::Back);
    back->setEnabled(false);
    auto* forward = new QToolButton(this);
    forward->setText(tr("Forward"));
    forward->setIcon(QIcon::fromTheme(QStringLiteral("go-next")));
    forward->setToolButtonStyle(Qt::ToolButtonTextBesideIcon);
    forward->setShortcut(QKeySequence::Forward);
    forward->setEnabled(false);
    auto* home = new QToolButton(this);
    home->setText(tr("Contents"));
    home->setIcon(QIcon::fromTheme(QStringLiteral("go-home")));
    home->setToolButtonStyle(Qt::ToolButtonTextBesideIcon);
    home->setShortcut(QKeySequence(Qt::ALT | Qt::Key_Home));
    auto* methods = new QToolButton(this);
    methods->setText(tr("Methods"));
    auto* formats = new QToolButton(this);
    formats->setText(tr("Import Formats"));
    auto* keys = new QToolButton(this);
    keys->setText(tr("Shortcuts"));
    connect(back, &QToolButton::clicked, browser_, &QTextBrowser::backward);
    connect(forward, &QToolButton::clicked, browser_, &QTextBrowser::forward);
    connect(home, &QToolButton::clicked, this, [this] { showPage(QStringLiteral("index.html")); });
    connect(methods, &QToolButton::clicked, this, [this] { showPage(QStringLiteral("methods.html")); });
    connect(formats, &QToolButton::clicked, this, [this] { showPage(QStringLiteral("import-formats.html")); });
    connect(keys, &QToolButton::clicked, this, [this] { showPage(QStringLiteral("shortcuts.html")); });
    connect(browser_, &QTextBrowser::backwardAvailable, back, &QToolButton::setEnabled);
    connect(browser_, &QTextBrowser::forwardAvailable, forward, &QToolButton::setEnabled);

    auto* bar = new QHBoxLayout;
    for (QToolButton* b : {back, forward, home, methods, formats, keys}) {
        b->setAutoRaise(true);
        bar->addWidget(b);
    }
    bar->addStretch(1);
    auto* buttons = new QDialogButtonBox(QDialogButtonBox::Close, this);
    connect(buttons, &QDialogButtonBox::rejected, this, &QDialog::hide);

    auto* layout = new QVBoxLayout(this);
    layout->addLayout(bar);
    layout->addWidget(browser_, 1);
    layout->addWidget(buttons);
    // Wide enough for the formula lines, in text units so it scales with the font.
    const QFontMetrics fm(font());
    resize(fm.averageCharWidth() * 130, fm.height() * 46);
}

HelpBrowser* HelpBrowser::forWindow(QWidget* from)
{
    QWidget* window = from ? from->window() : nullptr;
    // The help window is itself a top-level window: reuse it when asked from inside.
    if (auto* self = qobject_cast<HelpBrowser*>(window)) return self;
    if (window)
        if (auto* existing = window->findChild<HelpBrowser*>(QLatin1String(objectNameOfHelp),
                                                              Qt::FindDirectChildrenOnly))
            return existing;
    auto* help = new HelpBrowser(window);
    if (!window) help->setAttribute(Qt::WA_DeleteOnClose);
    return help;
}

QUrl HelpBrowser::pageUrl(const QString& page, const QString& anchor)
{
    QUrl url(QStringLiteral("qrc:/help/") + page);
    if (!anchor.isEmpty()) url.setFragment(anchor);
    return url;
}

void HelpBrowser::showPage(const QString& page, const QString& anchor)
{
    browser_->setSource(pageUrl(page, anchor));
    show();
    raise();
    activateWindow();
}

void showHelp(QWidget* from, const QString& page, const QString& anchor)
{
    HelpBrowser::forWindow(from)->showPage(page, anchor);
}

void showFigureHelp(QWidget* from, const QString& key)
{
    showHelp(from, QStringLiteral("methods.html"), key);
}

QString menuShortcutRows(const QWidget* window)
{
    const auto* main = qobject_cast<const QMainWindow*>(window);
    if (!main || !main->menuWidget()) return {};
    const auto* bar = qobject_cast<const QMenuBar*>(main->menuWidget());
    if (!bar) return {};
    QString rows;
    for (const QAction* top : bar->actions())
        if (top->menu()) addMenuRows(top->menu(), top->text().remove(QLatin1Char('&')) + QStringLiteral(" \u2192 "), rows);
    if (rows.isEmpty()) return {};
    return QStringLiteral("<tr><th>%1</th><th>%2</th></tr>")
               .arg(HelpBrowser::tr("Keys"), HelpBrowser::tr("Menu command")) +
           rows;
}

} // namespace hierloom::ui
