// SPDX-License-Identifier: GPL-3.0-or-later
#pragma once
#include <QObject>
#include <QSet>
#include <QString>

#include <functional>
#include <vector>

class QTabWidget;
class QWidget;

namespace hierloom::ui {

class ColonyDocument;

/// Turns the views with a group choice to the group of
/// ColonyDocument::groupShown: the view on screen at once, the others when
/// their tab is next shown (so a switch costs one view's work, not every view's).
class GroupFollower : public QObject {
    Q_OBJECT
public:
    GroupFollower(ColonyDocument* document, QTabWidget* tabs);

private:
    void follow(const QString& group);
    void catchUp(int tab);

    QTabWidget* tabs_;
    QString group_;
    QSet<QWidget*> behind_; // views not yet turned to group_
};

} // namespace hierloom::ui
