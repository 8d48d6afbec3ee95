// SPDX-License-Identifier: GPL-3.0-or-later
#pragma once
#include "ui/widgets/plot_export.h"
#include "core/research/maternal_rank.h"
#include "core/research/sex_ratio_analysis.h"
#include "core/research/species_profile.h"

#include <QWidget>

class QComboBox;
class QCustomPlot;
class QLabel;
class QPushButton;
class QSpinBox;
class QTableWidget;
class QTreeWidget;

namespace hierloom::ui {

class ColonyDocument;
class ColonyEditFacade;

/// The maternal rank options of the open document for these settings, as the
/// `sex-ratio` command builds them (one code path for screen and exports).
core::MaternalRankOptions documentMaternalOptions(const std::string& group, int gestationDays, int maturityYears,
                                                 const core::EloSettings& elo);

/// The Sex Ratio tab (Trivers & Willard 1973; docs/methods.md "Maternal rank and
/// offspring sex ratio"): the species setting, the `sex-ratio` figures, the
/// births left out with their reasons, the per-birth maternal rank table and
/// the proportion of sons with Wilson 95 % intervals per maternal rank third.
class SexRatioView : public QWidget {
    Q_OBJECT
public:
    explicit SexRatioView(ColonyEditFacade* facade, QWidget* parent = nullptr);

    /// Chooses the species (its defaults fill gestation and maturity) and recomputes.
    void setSpecies(const QString& key);
    void setGestationDays(int days);
    void setMaturityYears(int years);
    /// Empty: every group.
    void setGroup(const QString& group);
    /// Stores species, gestation and maturity in the colony file (overrides only
    /// where they differ from the species default) through the edit facade;
    /// false for a read-only file or a setting that cannot be stored.
    bool saveSpeciesSetting();

    const std::vector<core::MaternalRankRow>& births() const { return births_; }
    const core::SexRatioAnalysis& analysis() const { return analysis_; }
    QTableWidget* figureTable() const { return figures_; }
    QTreeWidget* leftOutList() const { return leftOut_; }
    QTableWidget* maternalTable() const { return maternal_; }
    QCustomPlot* plot() const { return plot_; }
    QLabel* message() const { return message_; }

private:
    void loadSettings();
    PlotFigure figure();
    void refreshGroups();
    void speciesChosen();
    void recompute();
    void showPlot();

    ColonyEditFacade* facade_;
    ColonyDocument* document_;
    QComboBox* species_;
    QSpinBox* gestation_;
    QSpinBox* maturity_;
    QComboBox* group_;
    QPushButton* save_;
    QLabel* message_;
    QTableWidget* figures_;
    QTreeWidget* leftOut_;
    QTableWidget* maternal_;
    QCustomPlot* plot_;
    std::vector<core::MaternalRankRow> births_;
    core::SexRatioAnalysis analysis_;
    bool loading_ = false;
};

} // namespace hierloom::ui
