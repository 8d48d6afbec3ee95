// SPDX-License-Identifier: GPL-3.0-or-later
#pragma once
#include <QDialog>

class QDialogButtonBox;
class QGridLayout;
class QPushButton;
class QLabel;
class QLineEdit;
class QPlainTextEdit;

namespace hierloom::ui {

class ColonyDocument;
class ColonyEditFacade;

/// Chooses animals.csv, residences.csv and encounters.csv and imports them
/// all or nothing; on failure lists every problem, on success the counts.
class ImportDialog : public QDialog {
    Q_OBJECT
public:
    explicit ImportDialog(ColonyEditFacade* facade, QWidget* parent = nullptr);

    void setAnimalsPath(const QString& path);
    void setResidencesPath(const QString& path);
    void setEncountersPath(const QString& path);
    /// The folder the Browse buttons start in.
    void setStartFolder(const QString& folder) { startFolder_ = folder; }
    QString startFolder() const { return startFolder_; }

    /// Problems listed by the last import (0 after a success).
    int problemCount() const { return problemCount_; }
    QString problemText() const;
    QString resultText() const;

public slots:
    /// Runs the import with the chosen files; true when everything was written.
    bool runImport();

private:
    QLineEdit* addFileRow(QGridLayout* grid, int row, const QString& label);
    void updateButtons();

    ColonyEditFacade* facade_;
    ColonyDocument* document_;
    QLineEdit* animals_;
    QLineEdit* residences_;
    QLineEdit* encounters_;
    QLabel* result_;
    QPlainTextEdit* problems_;
    QDialogButtonBox* buttons_;
    QPushButton* importButton_;
    QString startFolder_;
    int problemCount_ = 0;
};

} // namespace hierloom::ui
