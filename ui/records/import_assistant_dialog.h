// SPDX-License-Identifier: GPL-3.0-or-later
#pragma once
#include "core/store/sheet_import.h"

#include <QDialog>

#include <array>

class QCheckBox;
class QComboBox;
class QLabel;
class QLineEdit;
class QPlainTextEdit;
class QPushButton;
class QTableWidget;

namespace hierloom::ui {

class ColonyDocument;
class ColonyEditFacade;

/// The import assistant: a team's own spreadsheet (CSV or TSV) read through
/// an import mapping chosen here (what each column means, the date order,
/// names or ids, the outcome codes, the group), with a live preview of the
/// first rows, a table for names that match no animal (map them, or add them
/// as new animals), the mapping saved by name in the colony file, and the
/// import itself through the edit facade: the plain import's rules, all or nothing.
class ImportAssistantDialog : public QDialog {
    Q_OBJECT
public:
    explicit ImportAssistantDialog(ColonyEditFacade* facade, QWidget* parent = nullptr);

    /// The mapping as the fields say now.
    core::ImportMapping mapping() const;
    /// Fills the fields from a mapping.
    void setMapping(const core::ImportMapping& mapping);
    const core::SheetTranslation& translation() const { return translation_; }

    QLineEdit* pathField() const { return path_; }
    QComboBox* columnField(core::ColumnMeaning meaning) const { return columns_[static_cast<size_t>(meaning)]; }
    QComboBox* dateOrderField() const { return dates_; }
    QComboBox* layoutField() const { return layout_; }
    QComboBox* namingField() const { return naming_; }
    QComboBox* savedField() const { return saved_; }
    QLineEdit* nameField() const { return name_; }
    QCheckBox* saveWithImportField() const { return saveWith_; }
    QLineEdit* groupField() const { return group_; }
    QTableWidget* previewTable() const { return preview_; }
    QTableWidget* unknownTable() const { return unknown_; }
    QLabel* dateNote() const { return dateNote_; }
    QPlainTextEdit* problemText() const { return problems_; }
    QPushButton* importButton() const { return import_; }
    QPushButton* saveButton() const { return save_; }
    QPushButton* checkButton() const { return check_; }

    /// Reads the sheet again and refreshes the preview (also run on every change of a field).
    void refresh();
    /// Checks the whole sheet under the import's rules without writing; true when it would import.
    bool check();
    /// Imports (and, when ticked, saves the mapping in the same transaction);
    /// true when the records were written (then the dialog's result is
    /// Accepted; it stays open showing what was imported).
    bool runImport();
    /// Saves the mapping under its name in the colony file.
    bool saveMapping();

private:
    void loadSheet();
    void refreshHeaders();
    void refreshUnknownNames();
    void useSavedMapping();

    ColonyEditFacade* facade_;
    ColonyDocument* document_;
    QLineEdit* path_;
    QPushButton* browse_;
    QComboBox* saved_;
    QLineEdit* name_;
    QCheckBox* saveWith_; ///< save the mapping in the import's own transaction
    QComboBox* layout_;
    QComboBox* naming_;
    QComboBox* dates_;
    QComboBox* delimiter_;
    std::array<QComboBox*, core::kColumnMeanings> columns_;
    QLineEdit* group_;
    QLineEdit* winCodes_;
    QLineEdit* lossCodes_;
    QLineEdit* drawCodes_;
    QLabel* dateNote_;
    QTableWidget* preview_;
    QTableWidget* unknown_;
    QPlainTextEdit* problems_;
    QPushButton* check_;
    QPushButton* save_;
    QPushButton* import_;
    QPushButton* close_;
    core::SheetSource sheet_;
    core::SheetTranslation translation_;
    std::vector<core::NameChoice> names_; ///< the choices made in the unknown-names table, kept across refreshes
    bool filling_ = false;
};

} // namespace hierloom::ui
