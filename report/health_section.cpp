// SPDX-License-Identifier: GPL-3.0-or-later
#include "report/health_section.h"

#include "core/base/number_format.h"
#include "report/report_text.h"

#include <QObject>

namespace hierloom::report {

using namespace hierloom::core;

namespace {

QString date(const std::optional<Day>& d) { return d ? qs(formatDate(*d)) : QString(); }
QString fixed(const std::optional<double>& v, int digits) { return v ? QString::number(*v, 'f', digits) : QString(); }

} // namespace

HealthSection healthSection(const DataHealth& h)
{
    HealthSection s;
    s.animals.header = {QObject::tr("Animal"), QObject::tr("Encounters"), QObject::tr("Days seen"),
                        QObject::tr("Last seen"), QObject::tr("Rank"), QObject::tr("Elo interval")};
    s.animals.widths = {1.2, 1, 1, 1.3, 1, 1};
    for (const AnimalEffort& a : h.animals) {
        s.animals.rows.push_back({qs(a.animal), QString::number(a.encounters), QString::number(a.daysSeen),
                                  date(a.lastSeen), a.fewEncounters ? QObject::tr("too few data") : QString(),
                                  fixed(a.intervalWidth, 0)});
        s.animals.highlighted.push_back(a.fewEncounters);
    }
    s.observers.header = {QObject::tr("Observer"), QObject::tr("Encounters"), QObject::tr("Days")};
    for (const ObserverEffort& e : h.observers)
        s.observers.rows.push_back({e.observer.empty() ? QObject::tr("(none)") : qs(e.observer),
                                    QString::number(e.encounters), QString::number(e.days)});
    s.months.header = {QObject::tr("Month"), QObject::tr("Encounters"), QObject::tr("Days"), QObject::tr("Animals")};
    const size_t first = h.months.size() > 12 ? h.months.size() - 12 : 0;
    for (size_t i = first; i < h.months.size(); ++i) {
        const MonthEffort& m = h.months[i];
        s.months.rows.push_back({QStringLiteral("%1-%2").arg(m.year, 4, 10, QLatin1Char('0')).arg(m.month, 2, 10, QLatin1Char('0')),
                                 QString::number(m.encounters), QString::number(m.days), QString::number(m.animals)});
    }
    s.unseen.header = {QObject::tr("Animal"), QObject::tr("Last seen"), QObject::tr("Since"), QObject::tr("Days")};
    for (const UnseenAnimal& u : h.unseen)
        s.unseen.rows.push_back({qs(u.animal), date(u.lastSeen), qs(formatDate(u.since)), QString::number(u.days)});
    s.agreement.header = {QObject::tr("Observers"), QObject::tr("Days"), QObject::tr("Matched"), QObject::tr("Unmatched"),
                          QObject::tr("Agreement"), QObject::tr("Kappa")};
    s.agreement.widths = {2, 0.7, 0.9, 1, 1, 0.8};
    for (const ObserverAgreement& a : h.agreement)
        s.agreement.rows.push_back({qs(a.first) + QStringLiteral(" / ") + qs(a.second), QString::number(a.sharedDays),
                                    QString::number(a.matched), QString::number(a.onlyFirst + a.onlySecond),
                                    a.share ? QString::number(*a.share * 100, 'f', 0) + QStringLiteral("%") : QString(),
                                    fixed(a.kappa, 2)});
    return s;
}

void paintHealthSection(ReportLayout& doc, const DataHealth& h, const QString& group)
{
    const HealthSection s = healthSection(h);
    doc.heading(QObject::tr("Data health"));
    doc.paragraph(QObject::tr("Observation effort of %1 in the report's window, up to %2. An animal with fewer than "
                              "%3 encounters has a rank resting on too few data (tinted), shown with the width of "
                              "its randomised-Elo interval (97.5 % minus 2.5 % quantile of its rating).")
                      .arg(group, qs(formatDate(h.reference)))
                      .arg(h.minEncounters),
                  true);
    doc.table(s.animals);
    doc.sideBySide(s.observers, QObject::tr("Per observer"), s.months, QObject::tr("Per month (last twelve)"));
    if (s.unseen.rows.empty()) {
        doc.paragraph(QObject::tr("Every resident was seen within %1 days of %2.")
                          .arg(h.unseenDays)
                          .arg(qs(formatDate(h.reference))),
                      true);
    } else {
        doc.paragraph(QObject::tr("Residents not seen for more than %1 days on %2:")
                          .arg(h.unseenDays)
                          .arg(qs(formatDate(h.reference))),
                      true);
        doc.table(s.unseen);
        doc.caution(qs(kUnseenCaution));
    }
    if (s.agreement.rows.empty()) {
        doc.paragraph(QObject::tr("No two observers recorded this group on the same day."), true);
    } else {
        doc.paragraph(QObject::tr("Observer agreement: encounters of the same dyad on the same day matched within %1 "
                                  "minutes; agreement on who won, and Cohen's kappa.")
                          .arg(kDefaultMatchMinutes),
                      true);
        doc.table(s.agreement);
    }
}

} // namespace hierloom::report
