// SPDX-License-Identifier: GPL-3.0-or-later
#include "ui/analysis/analysis_settings_dialog.h"

#include "core/store/analysis_settings_store.h"
#include "ui/document/colony_document.h"
#include "ui/document/colony_edit_facade.h"

#include <QComboBox>
#include <QDialogButtonBox>
#include <QDoubleSpinBox>
#include <QFormLayout>
#include <QLabel>
#include <QPushButton>
#include <QSpinBox>
#include <QVBoxLayout>

#include <stdexcept>

namespace hierloom::ui {

AnalysisSettingsDialog::AnalysisSettingsDialog(const core::AnalysisSettings& current,
                                               const core::AnalysisSettings& defaults, bool readOnly, QWidget* parent)
    : QDialog(parent),
      k_(new QDoubleSpinBox(this)),
      start_(new QDoubleSpinBox(this)),
      curve_(new QComboBox(this)),
      draws_(new QComboBox(this)),
      startRule_(new QComboBox(this)),
      maturity_(new QSpinBox(this)),
      window_(new QSpinBox(this))
{
    setWindowTitle(tr("Analysis Settings"));
    k_->setObjectName(QStringLiteral("eloK"));
    k_->setRange(0, core::kMaxEloK);
    k_->setDecimals(2);
    start_->setObjectName(QStringLiteral("eloStart"));
    start_->setRange(-core::kMaxAbsEloStart, core::kMaxAbsEloStart);
    start_->setDecimals(2);
    curve_->addItem(tr("Logistic"), static_cast<int>(core::EloCurve::Logistic));
    curve_->addItem(tr("Normal"), static_cast<int>(core::EloCurve::Normal));
    draws_->addItem(tr("Count half to each side"), static_cast<int>(core::DrawPolicy::Half));
    draws_->addItem(tr("Ignore"), static_cast<int>(core::DrawPolicy::Ignore));
    startRule_->setObjectName(QStringLiteral("eloStartRule"));
    startRule_->addItem(tr("Start value for everyone"), static_cast<int>(core::EloStartRule::None));
    startRule_->addItem(tr("Youngest ascendancy: just below her mother"), static_cast<int>(core::EloStartRule::Youngest));
    startRule_->addItem(tr("Eldest first: just below her last older sister"), static_cast<int>(core::EloStartRule::Eldest));
    startRule_->setToolTip(tr("Where a daughter whose mother is rated enters the Elo ranking: between the animal the "
                              "rule puts just above her and the one rated below that animal (docs: Rule-informed Elo). "
                              "Used by rank tables, rank changes and the report; the comparisons with the "
                              "inheritance rule keep the plain start."));
    maturity_->setRange(0, core::kMaxMaturityYears);
    maturity_->setSuffix(tr(" years"));
    window_->setRange(0, core::kMaxWindowDays);
    window_->setSuffix(tr(" days"));
    window_->setSpecialValueText(tr("All data"));

    auto* form = new QFormLayout;
    form->addRow(tr("Elo &k factor:"), k_);
    form->addRow(tr("Elo &start value:"), start_);
    form->addRow(tr("Expectation &curve:"), curve_);
    form->addRow(tr("&Draws:"), draws_);
    form->addRow(tr("Daughters' Elo sta&rt:"), startRule_);
    form->addRow(tr("&Maturity age:"), maturity_);
    form->addRow(tr("Default &window (last days):"), window_);
    const core::AnalysisSettings d = defaults;
    auto* note = new QLabel(tr("Kept in the colony file and used by every view, the report and hierloom-cli (whose "
                               "options override them for one run). Defaults: %1.")
                                .arg(QString::fromStdString(core::describeAnalysisSettings(d))),
                            this);
    note->setWordWrap(true);
    auto* buttons = new QDialogButtonBox(QDialogButtonBox::Ok | QDialogButtonBox::Cancel |
                                         QDialogButtonBox::RestoreDefaults, this);
    buttons->button(QDialogButtonBox::Ok)->setDefault(true); // Enter in any field stores the settings
    connect(buttons, &QDialogButtonBox::accepted, this, &QDialog::accept);
    connect(buttons, &QDialogButtonBox::rejected, this, &QDialog::reject);
    connect(buttons->button(QDialogButtonBox::RestoreDefaults), &QPushButton::clicked, this,
            [this, d] { setSettings(d); });
    if (readOnly) {
        buttons->button(QDialogButtonBox::Ok)->setEnabled(false);
        note->setText(note->text() + QLatin1Char(' ') + tr("The colony is open read-only, so they cannot be changed."));
    }
    auto* layout = new QVBoxLayout(this);
    layout->addLayout(form);
    layout->addWidget(note);
    layout->addWidget(buttons);
    setSettings(current);
    k_->setFocus();
    k_->selectAll();
}

void AnalysisSettingsDialog::setSettings(const core::AnalysisSettings& s)
{
    k_->setValue(s.elo.k);
    start_->setValue(s.elo.start);
    curve_->setCurrentIndex(curve_->findData(static_cast<int>(s.elo.curve)));
    draws_->setCurrentIndex(draws_->findData(static_cast<int>(s.elo.draws)));
    startRule_->setCurrentIndex(startRule_->findData(static_cast<int>(s.startRule)));
    maturity_->setValue(s.maturityYears);
    window_->setValue(s.windowDays);
}

core::AnalysisSettings AnalysisSettingsDialog::settings() const
{
    core::AnalysisSettings s;
    s.elo.k = k_->value();
    s.elo.start = start_->value();
    s.elo.curve = static_cast<core::EloCurve>(curve_->currentData().toInt());
    s.elo.draws = static_cast<core::DrawPolicy>(draws_->currentData().toInt());
    s.startRule = static_cast<core::EloStartRule>(startRule_->currentData().toInt());
    s.maturityYears = maturity_->value();
    s.windowDays = window_->value();
    return s;
}

bool runAnalysisSettingsDialog(QWidget* parent, ColonyEditFacade* facade)
{
    const core::ColonyStore* store = facade->document()->store();
    if (!store) return false;
    AnalysisSettingsDialog dialog(core::readAnalysisSettings(*store), core::defaultAnalysisSettings(*store),
                                  facade->document()->isReadOnly(), parent);
    if (dialog.exec() != QDialog::Accepted) return false;
    const core::FieldProblems problems = facade->setAnalysisSettings(dialog.settings());
    if (!problems.empty()) {
        emit facade->document()->writeFailed(QString::fromStdString(problems.front().message));
        return false;
    }
    return true;
}

} // namespace hierloom::ui
