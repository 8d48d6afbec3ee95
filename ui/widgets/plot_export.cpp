// SPDX-License-Identifier: GPL-3.0-or-later
#include "ui/widgets/plot_export.h"

#include <QApplication>
#include <QClipboard>
#include <QFileDialog>
#include <QMenu>
#include <QMessageBox>
#include <QPageSize>
#include <QPdfWriter>
#include <QSettings>
#include <QToolButton>

#include <qcustomplot.h>

#include <cmath>

namespace hierloom::ui {

namespace {

// Plots are laid out at screen scale (96 logical pixels per inch) so fonts and
// pens keep their on-screen proportions; only the output is scaled up.
constexpr double layoutDpi = 96.0;

int logical(double mm) { return static_cast<int>(std::lround(mm / 25.4 * layoutDpi)); }

QString exportFolder()
{
    return QSettings().value(QStringLiteral("plotExportFolder"), QDir::homePath()).toString();
}

} // namespace

bool exportPng(QCustomPlot* plot, const QString& path, const FigureSize& size)
{
    return plot->savePng(path, logical(size.widthMm), logical(size.heightMm), size.dpi / layoutDpi, -1, size.dpi,
                         QCP::ruDotsPerInch);
}

bool exportPdf(QCustomPlot* plot, const QString& path, const FigureSize& size)
{
    // Written through QPdfWriter so the page is exactly the figure size in mm.
    QPdfWriter pdf(path);
    if (!pdf.setPageSize(QPageSize(QSizeF(size.widthMm, size.heightMm), QPageSize::Millimeter))) return false;
    pdf.setPageMargins(QMarginsF(0, 0, 0, 0));
    pdf.setResolution(static_cast<int>(layoutDpi));
    pdf.setCreator(QStringLiteral("Hierloom"));
    QCPPainter painter;
    if (!painter.begin(&pdf)) return false;
    painter.setMode(QCPPainter::pmVectorized);
    painter.setMode(QCPPainter::pmNoCaching);
    plot->toPainter(&painter, logical(size.widthMm), logical(size.heightMm));
    return painter.end();
}

void copyPlot(QCustomPlot* plot, const FigureSize& size)
{
    QApplication::clipboard()->setPixmap(
        plot->toPixmap(logical(size.widthMm), logical(size.heightMm), size.dpi / layoutDpi));
}

QToolButton* makeExportButton(QCustomPlot* plot, const QString& baseName, QWidget* parent)
{
    auto* button = new QToolButton(parent);
    button->setText(QObject::tr("Export"));
    button->setToolTip(QObject::tr("Save the plot as a 180 mm, 300 dpi figure, or copy it"));
    button->setPopupMode(QToolButton::InstantPopup);
    auto* menu = new QMenu(button);
    auto save = [plot, baseName, parent](const QString& suffix) {
        const QString filter = suffix == QLatin1String("png") ? QObject::tr("PNG images (*.png)")
                                                              : QObject::tr("PDF documents (*.pdf)");
        QString path = QFileDialog::getSaveFileName(parent, QObject::tr("Export Plot"),
                                                    exportFolder() + QLatin1Char('/') + baseName + QLatin1Char('.') + suffix,
                                                    filter);
        if (path.isEmpty()) return;
        if (QFileInfo(path).suffix().isEmpty()) path += QLatin1Char('.') + suffix;
        QSettings().setValue(QStringLiteral("plotExportFolder"), QFileInfo(path).absolutePath());
        const bool ok = suffix == QLatin1String("png") ? exportPng(plot, path) : exportPdf(plot, path);
        if (!ok)
            QMessageBox::warning(parent, QObject::tr("Export Failed"),
                                 QObject::tr("%1 could not be written.").arg(QDir::toNativeSeparators(path)));
    };
    menu->addAction(QObject::tr("Save as &PNG..."), button, [save] { save(QStringLiteral("png")); });
    menu->addAction(QObject::tr("Save as P&DF..."), button, [save] { save(QStringLiteral("pdf")); });
    menu->addAction(QObject::tr("&Copy to Clipboard"), button, [plot] { copyPlot(plot); });
    button->setMenu(menu);
    return button;
}

} // namespace hierloom::ui
