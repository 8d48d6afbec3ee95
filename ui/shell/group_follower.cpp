// SPDX-License-Identifier: GPL-3.0-or-later
#include "ui/shell/group_follower.h"

#include "ui/analysis/hierarchy_plots_view.h"
#include "ui/analysis/matrix_view.h"
#include "ui/analysis/rank_timeline_view.h"
#include "ui/analysis/sex_ratio_view.h"
#include "ui/analysis/support_view.h"
#include "ui/document/colony_document.h"
#include "ui/planning/health_view.h"
#include "ui/planning/stability_view.h"

#include <QTabWidget>

namespace hierloom::ui {

namespace {

// The views with a group choice, each turned through its own setGroup.
bool turnToGroup(QWidget* view, const QString& group)
{
    if (auto* v = qobject_cast<RankTimelineView*>(view)) v->setGroup(group);
    else if (auto* v = qobject_cast<MatrixView*>(view)) v->setGroup(group);
    else if (auto* v = qobject_cast<HierarchyPlotsView*>(view)) v->setGroup(group);
    else if (auto* v = qobject_cast<SexRatioView*>(view)) v->setGroup(group);
    else if (auto* v = qobject_cast<SupportView*>(view)) v->setGroup(group);
    else if (auto* v = qobject_cast<StabilityView*>(view)) v->setGroup(group);
    else if (auto* v = qobject_cast<HealthView*>(view)) v->setGroup(group);
    else return false;
    return true;
}

} // namespace

GroupFollower::GroupFollower(ColonyDocument* document, QTabWidget* tabs) : QObject(tabs), tabs_(tabs)
{
    connect(document, &ColonyDocument::groupShown, this, &GroupFollower::follow);
    connect(tabs_, &QTabWidget::currentChanged, this, &GroupFollower::catchUp);
}

void GroupFollower::follow(const QString& group)
{
    group_ = group;
    behind_.clear();
    for (int i = 0; i < tabs_->count(); ++i) behind_.insert(tabs_->widget(i));
    catchUp(tabs_->currentIndex());
}

void GroupFollower::catchUp(int tab)
{
    QWidget* view = tabs_->widget(tab);
    if (!view || !behind_.remove(view)) return;
    turnToGroup(view, group_);
}

} // namespace hierloom::ui
