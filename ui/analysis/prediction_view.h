// SPDX-License-Identifier: GPL-3.0-or-later
#pragma once
#include "core/pedigree/discordance.h"
#include "core/pedigree/foresight.h"
#include "core/pedigree/inheritance_prediction.h"
#include "ui/widgets/matriline_palette.h"

#include <QWidget>

#include <map>
#include <string>
#include <vector>

class QCPGraph;
class QComboBox;
class QCustomPlot;
class QDateEdit;
class QLabel;
class QTableWidget;

namespace hierloom::ui {

class AnimalSelection;
class ColonyDocument;
class ComputeRunner;
class ProgressStrip;
class RankFlagWatch;

/// Predicted against observed order at the selected date: the inheritance
/// rule's order (core::predictInheritance) in the left column, the observed
/// Elo order in the right, a line joining each female's two places; lines of
/// females in a discordant dyad are drawn bold, the others faint, so the
/// crossings stand out. Below, the discordant dyads with their categories
/// (core::summariseDiscordance), and how much the rule explains: the foresight
/// of the rule alone, plain Elo and rule-informed Elo over the record
/// (core::computeForesight), as a table and a plot of the share of winners
/// each model predicted per year.
class PredictionView : public QWidget {
    Q_OBJECT
public:
    PredictionView(ColonyDocument* document, AnimalSelection* selection, QWidget* parent = nullptr);
    ~PredictionView() override;

    QCustomPlot* plot() const { return plot_; }
    ComputeRunner* runner() const { return runner_; }
    QTableWidget* dyadTable() const { return dyads_; }
    QTableWidget* foresightTable() const { return foresightTable_; }
    QCustomPlot* foresightPlot() const { return foresightPlot_; }
    /// The foresight shown; its per-encounter list is not kept.
    const core::Foresight& foresight() const { return foresight_; }
    const core::InheritancePrediction& prediction() const { return prediction_; }
    const core::DiscordanceSummary& summary() const { return summary_; }

    void setRule(core::SiblingRule rule);
    /// The connector of a female, or nullptr when she has no observed rank.
    QCPGraph* connectorOf(const QString& id) const;
    /// Connectors drawn (females with both a predicted and an observed rank).
    int connectorCount() const;
    /// True when her connector is drawn in the discordant (bold) style.
    bool isEmphasised(const QString& id) const;
    /// The data-health flags (docs/methods.md, "Data health") behind the
    /// observed order: the default analysis window ending on the date.
    RankFlagWatch* flags() const { return flags_; }
    /// The observed-order labels as drawn (a flagged female's name ends with the mark).
    QStringList observedLabels() const;
    /// The legend line of the flag.
    QLabel* flagLegend() const { return flagLegend_; }

public slots:
    void recompute();

protected:
    /// Every group's record: a large file not read whole is read (in the
    /// background) when this view is first shown; it computes again once complete.
    void showEvent(QShowEvent* event) override;

private:
    void adopt(core::InheritancePrediction prediction, core::DiscordanceSummary summary, MatrilinePalette palette,
               std::vector<std::string> names);
    void adoptForesight(core::Foresight foresight);
    void rebuildPlot();

    ColonyDocument* document_;
    AnimalSelection* selection_;
    ComputeRunner* runner_;
    ProgressStrip* progress_;
    QCustomPlot* plot_;
    QTableWidget* dyads_;
    QComboBox* ruleBox_;
    QDateEdit* dateEdit_;
    QLabel* summaryLabel_;
    QLabel* flagLegend_;
    RankFlagWatch* flags_;
    QLabel* foresightLabel_;
    QTableWidget* foresightTable_;
    QCustomPlot* foresightPlot_;

    core::SiblingRule rule_ = core::SiblingRule::Youngest;
    core::InheritancePrediction prediction_;
    core::DiscordanceSummary summary_;
    core::Foresight foresight_; ///< without its per-encounter list (decidedEncounters_ counts it)
    size_t decidedEncounters_ = 0;
    MatrilinePalette palette_;
    std::vector<std::string> names_; ///< display name of each female of prediction_
    std::map<std::string, std::string> lineNames_; ///< matriarch id -> name
    std::vector<QCPGraph*> connectors_; ///< per female of prediction_, nullptr without an observed rank
    QStringList observedLabels_;
};

} // namespace hierloom::ui
