// SPDX-License-Identifier: GPL-3.0-or-later
#include "ui/planning/stability_thresholds_dialog.h"

#include <QDialogButtonBox>
#include <QDoubleSpinBox>
#include <QFormLayout>
#include <QLabel>
#include <QPushButton>
#include <QSpinBox>
#include <QVBoxLayout>

namespace hierloom::ui {

StabilityThresholdsDialog::StabilityThresholdsDialog(const core::StabilityThresholds& current, QWidget* parent)
    : QDialog(parent),
      counterShare_(new QDoubleSpinBox(this)),
      minDecided_(new QSpinBox(this)),
      linePair_(new QDoubleSpinBox(this)),
      rankChange_(new QDoubleSpinBox(this)),
      severeAtLeast_(new QSpinBox(this)),
      severeFactor_(new QDoubleSpinBox(this)),
      minSevere_(new QSpinBox(this))
{
    setWindowTitle(tr("Stability Thresholds"));
    counterShare_->setRange(0, 100);
    counterShare_->setSuffix(tr(" %"));
    counterShare_->setDecimals(1);
    minDecided_->setRange(0, 100000);
    linePair_->setRange(0, 10000);
    linePair_->setDecimals(1);
    rankChange_->setRange(0, 1000);
    rankChange_->setDecimals(2);
    rankChange_->setSpecialValueText(tr("off"));
    severeAtLeast_->setRange(0, 5);
    severeFactor_->setRange(0, 1000);
    severeFactor_->setDecimals(1);
    severeFactor_->setSuffix(tr(" x median"));
    minSevere_->setRange(0, 100000);

    auto* form = new QFormLayout;
    form->addRow(tr("Counter-dominance share above"), counterShare_);
    form->addRow(tr("... over at least (decided encounters)"), minDecided_);
    form->addRow(tr("... with at least this many between two matrilines, per week"), linePair_);
    form->addRow(tr("Rank change per animal above"), rankChange_);
    form->addRow(tr("Severe behaviour: severity at least"), severeAtLeast_);
    form->addRow(tr("Severe encounters per animal-day above"), severeFactor_);
    form->addRow(tr("... with at least (severe encounters)"), minSevere_);
    auto* buttons = new QDialogButtonBox(QDialogButtonBox::Ok | QDialogButtonBox::Cancel |
                                         QDialogButtonBox::RestoreDefaults, this);
    connect(buttons, &QDialogButtonBox::accepted, this, &QDialog::accept);
    connect(buttons, &QDialogButtonBox::rejected, this, &QDialog::reject);
    connect(buttons->button(QDialogButtonBox::RestoreDefaults), &QPushButton::clicked, this,
            [this] { setThresholds(core::StabilityThresholds{}); });
    const core::StabilityThresholds d;
    auto* note = new QLabel(tr("Defaults: counter-dominance above %1 % over at least %2 decided encounters with at "
                               "least %3 a week between the same two matrilines; severe (severity %4 or more) above "
                               "%5 times the record's median rate with at least %6 in the period; rank changes off. "
                               "Kept in the colony file.")
                                .arg(d.counterShare * 100)
                                .arg(d.minDecided)
                                .arg(d.linePairPerWeek)
                                .arg(d.severeAtLeast)
                                .arg(d.severeFactor)
                                .arg(d.minSevere),
                            this);
    note->setWordWrap(true);
    auto* layout = new QVBoxLayout(this);
    layout->addLayout(form);
    layout->addWidget(note);
    layout->addWidget(buttons);
    setThresholds(current);
}

void StabilityThresholdsDialog::setThresholds(const core::StabilityThresholds& t)
{
    counterShare_->setValue(t.counterShare * 100);
    minDecided_->setValue(t.minDecided);
    linePair_->setValue(t.linePairPerWeek);
    rankChange_->setValue(t.rankChangePerAnimal);
    severeAtLeast_->setValue(t.severeAtLeast);
    severeFactor_->setValue(t.severeFactor);
    minSevere_->setValue(t.minSevere);
}

core::StabilityThresholds StabilityThresholdsDialog::thresholds() const
{
    core::StabilityThresholds t;
    t.counterShare = counterShare_->value() / 100;
    t.minDecided = minDecided_->value();
    t.linePairPerWeek = linePair_->value();
    t.rankChangePerAnimal = rankChange_->value();
    t.severeAtLeast = severeAtLeast_->value();
    t.severeFactor = severeFactor_->value();
    t.minSevere = minSevere_->value();
    return t;
}

} // namespace hierloom::ui
