// SPDX-License-Identifier: GPL-3.0-or-later
#pragma once
#include "core/pedigree/rank_timeline.h"
#include "core/pedigree/timeline_rank_changes.h"
#include "ui/document/result_cache.h"
#include "ui/widgets/matriline_palette.h"

#include <QWidget>

#include <map>
#include <vector>

class QCPGraph;
class QCPItemStraightLine;
class QCPItemText;
class QComboBox;
class QCustomPlot;
class QLabel;
class QSlider;
class QMouseEvent;

namespace hierloom::ui {

class AnimalSelection;
class ColonyDocument;
class ComputeRunner;
class PedigreeView;
class ProgressStrip;
class RankFlagWatch;

/// The pedigree-and-rank timeline: every ranked female's observed rank (or
/// Elo rating) over the record as a line in her matriline's colour, with her
/// life events and the checkpoints where she is part of a discordant dyad
/// (observed order against the inheritance prediction), the pedigree panel
/// beside it and a date slider below. The timeline is computed off the
/// interface thread (core::computeRankTimeline) whenever the colony changes.
class RankTimelineView : public QWidget {
    Q_OBJECT
public:
    enum class Scale { Rank, Elo };
    /// Age at the selected date; classes start at the maturity age (4 years).
    enum class AgeClass { All, Young, Prime, Old };
    /// Whose discordance markers are drawn: every female's crowd the plot, so
    /// by default only the selected female's.
    enum class Marks { Selected, All, None };
    /// How a step of a line is coloured when rank changes are coloured
    /// (docs/methods.md "Active and passive rank changes").
    enum class ChangeKind { Active, Passive, Both };

    RankTimelineView(ColonyDocument* document, AnimalSelection* selection, QWidget* parent = nullptr);
    ~RankTimelineView() override;

    QCustomPlot* plot() const { return plot_; }
    ComputeRunner* runner() const { return runner_; }
    PedigreeView* pedigree() const { return pedigree_; }
    const core::RankTimeline& timeline() const { return timeline_; }

    void setScale(Scale scale);
    void setStep(core::TimelineStep step);
    /// Shows one matriline (matriarch id) or, with an empty id, every line.
    void setMatriline(const QString& matriarch);
    /// Ranks within one group (recomputes), or the whole colony with an empty name.
    void setGroup(const QString& group);
    void setAgeClass(AgeClass ageClass);
    void setMarks(Marks marks);
    /// Marks each change of rank between checkpoints as active, passive or both
    /// (the selected female's when one is selected, else every shown line's).
    void setChangeColouring(bool on);
    bool changeColouring() const { return colourChanges_; }
    /// The markers of one kind of rank change (nullptr while changes are not coloured).
    QCPGraph* changesOf(ChangeKind kind) const;
    /// Every step between checkpoints of the current timeline with its split.
    const std::vector<core::TimelineRankChange>& rankChanges() const { return rankChanges_; }
    /// The kind of a step that changed rank (total != 0).
    static ChangeKind kindOf(const core::RankChange& change);

    /// Female lines shown after the filters.
    int visibleLineCount() const;
    /// The line of a female, or nullptr.
    QCPGraph* lineOf(const QString& id) const;
    /// The discordance markers of a female (keys in seconds), or nullptr when she has none.
    QCPGraph* discordanceOf(const QString& id) const;
    /// Event markers of one kind (all females).
    QCPGraph* eventsOf(core::LifeEventKind kind) const;
    /// The hover text for a female at the checkpoint nearest `day`, empty if she has no point there.
    QString describe(const QString& id, core::Day day) const;
    /// The data-health flags (docs/methods.md, "Data health") of the window
    /// that ends on the selected date (the analysis settings' default window).
    RankFlagWatch* flags() const { return flags_; }
    /// Rings around the flagged females' points at the selected date (nullptr before a plot).
    QCPGraph* flagMarks() const { return flagMarks_; }
    /// The legend line of the flag under the plot.
    QLabel* flagLegend() const { return flagLegend_; }
    /// Plot key of a day (seconds since 1970, as the date axis counts).
    static double keyOf(core::Day day) { return day * 86400.0; }
    /// True while the plot shows "computing" instead of the lines (a group
    /// or step whose timeline is not computed yet).
    bool isComputing() const { return computingText_ != nullptr; }
    /// How many times a timeline was shown again from the kept results instead of computed.
    int resultsReused() const { return resultsReused_; }
    /// The group whose ranks are shown (empty: every group) and the checkpoint step.
    const QString& timelineGroup() const { return group_; }
    core::TimelineStep step() const { return step_; }

public slots:
    void recompute();

private:
    struct Line {
        int female = 0;           // index in timeline_.females
        QCPGraph* graph = nullptr;
        QCPGraph* marks = nullptr;
        std::vector<int> pointAt; // checkpoint -> point index, or -1
    };
    /// A computed timeline and the colours of its matrilines.
    struct Result {
        core::RankTimeline timeline;
        MatrilinePalette palette;
    };
    void adopt(core::RankTimeline timeline, MatrilinePalette palette);
    /// Empties the plot and says what is being computed (another group or step).
    void showComputing();
    /// The question a result answers (group and step; the settings are in the revision).
    std::string resultKey() const;
    void rebuildPlot();
    void applyFilters();
    void applySelection();
    void fillChangeMarks();
    /// Asks for the flags of the window ending at the selected date.
    void requestFlags();
    /// Rings the flagged females at the selected checkpoint and writes the legend line.
    void fillFlagMarks();
    void showDay(core::Day day);
    void hover(QMouseEvent* event);
    void click(QMouseEvent* event);
    int nearestCheckpoint(double key) const;
    std::optional<double> valueOf(const core::RankTimelinePoint& p) const;
    int lineIndexOf(const QString& id) const;
    bool marksShown(const Line& line) const;

    ColonyDocument* document_;
    AnimalSelection* selection_;
    ComputeRunner* runner_;
    ProgressStrip* progress_;
    QCustomPlot* plot_;
    PedigreeView* pedigree_;
    QComboBox* scaleBox_;
    QComboBox* stepBox_;
    QComboBox* lineBox_;
    QComboBox* groupBox_;
    QComboBox* ageBox_;
    QComboBox* marksBox_;
    QComboBox* changeBox_;
    QSlider* slider_;
    QLabel* dateLabel_;
    QLabel* flagLegend_;
    RankFlagWatch* flags_;
    QCPGraph* flagMarks_ = nullptr;
    QCPItemStraightLine* dayLine_ = nullptr;
    std::map<core::LifeEventKind, QCPGraph*> events_;
    std::map<ChangeKind, QCPGraph*> changes_;
    std::vector<core::TimelineRankChange> rankChanges_;
    bool colourChanges_ = false;

    core::RankTimeline timeline_;
    MatrilinePalette palette_;
    // The timelines computed at the document's current revision, so turning
    // back to a group shows it at once; and which one the plot shows.
    ResultCache<Result> results_;
    std::string shownKey_;
    QCPItemText* computingText_ = nullptr;
    int resultsReused_ = 0;
    std::vector<Line> lines_;
    Scale scale_ = Scale::Rank;
    core::TimelineStep step_ = core::TimelineStep::Month;
    QString matriline_;
    QString group_;
    AgeClass ageClass_ = AgeClass::All;
    Marks marks_ = Marks::Selected;
    double stripValue_ = 0; ///< where events far from her line are drawn (below the lines)
    QPoint pressedAt_;
};

} // namespace hierloom::ui
