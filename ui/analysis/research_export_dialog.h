// SPDX-License-Identifier: GPL-3.0-or-later
#pragma once
#include "core/research/export_tables.h"

#include <QDialog>

#include <optional>

class QCheckBox;
class QComboBox;
class QLabel;
class QMenu;
class QLineEdit;
class QPlainTextEdit;
class QSpinBox;

namespace hierloom::ui {

class ColonyDocument;

/// File > Export Research Tables...: rank tables by period (or custom windows)
/// for a method and group, the win matrix, metrics and discordance by period,
/// the maternal rank table and the sex-ratio figures, written as CSV files by
/// core::researchTables and core::writeTableSet (the `export-tables` command's
/// code path, so the files hold the numbers shown on screen).
class ResearchExportDialog : public QDialog {
    Q_OBJECT
public:
    explicit ResearchExportDialog(ColonyDocument* document, QWidget* parent = nullptr);

    /// "whole", "day", "week", "month", "year" or "custom".
    void setPeriod(const QString& period);
    /// One window "YYYY-MM-DD,YYYY-MM-DD" per line (period "custom").
    void setCustomWindows(const QString& lines);
    /// "elo", "ds" or "isi".
    void setMethod(const QString& method);
    /// Empty: every group.
    void setGroup(const QString& group);
    /// Encounter window (and birth window); empty text: no limit.
    void setWindow(const QString& from, const QString& to);
    void setRandomisations(int n);
    void setFolder(const QString& folder);
    void setSpreadsheet(bool on);

    /// The options chosen, with gestation and maturity from the colony's species
    /// setting; empty with `error` set when an entry is not valid.
    std::optional<core::ResearchExportOptions> options(QString* error) const;
    /// Computes and writes the tables; false (and the reason in report()) on failure.
    bool exportTables();
    /// Paths of the files the last export wrote.
    const QStringList& writtenFiles() const { return written_; }
    QString report() const;

private:
    void chooseFolder();

    ColonyDocument* document_;
    QComboBox* period_;
    QPlainTextEdit* windows_;
    QComboBox* method_;
    QComboBox* group_;
    QLineEdit* from_;
    QLineEdit* to_;
    QSpinBox* randomisations_;
    QLineEdit* folder_;
    QCheckBox* spreadsheet_;
    QCheckBox* health_;
    QLabel* report_;
    QStringList written_;
};

/// Adds "Export Research Tables..." to a menu; the dialog opens for the window's document.
void addResearchExportAction(QMenu* menu, QWidget* window, ColonyDocument* document);

} // namespace hierloom::ui
