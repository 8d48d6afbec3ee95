// SPDX-License-Identifier: GPL-3.0-or-later
#include "report/scenario_report.h"

#include "core/pedigree/group_composition.h"
#include "core/planning/planning_caution.h"
#include "core/planning/scenario_file.h"
#include "report/report_layout.h"
#include "report/report_text.h"

#include <QDate>
#include <QObject>

#include <algorithm>

namespace hierloom::report {

using namespace hierloom::core;

namespace {

QString ratioText(const GroupComposition& g)
{
    return g.adultSexRatio ? QString::number(*g.adultSexRatio, 'f', 2) : QObject::tr("no adult male");
}

void oneScenario(ReportLayout& doc, const CompactEncounters& encounters, const Colony& colony, const NamedScenario& named,
                 const QString& colonyName)
{
    const ScenarioResult r = runScenario(encounters, colony, named.scenario);
    // The changed pedigree; dated as the result, as the scenario's own date or the record's last.
    Scenario dated = named.scenario;
    dated.at = r.at;
    const Colony after = scenarioColony(colony, dated);
    const ResidenceIndex where0(colony.animals, colony.residences), where1(after.animals, after.residences);
    doc.title(QObject::tr("What-if scenario: %1").arg(named.name),
              QObject::tr("%1 - at %2 - printed %3; the colony's records are not changed")
                  .arg(colonyName, qs(formatDate(r.at)), QDate::currentDate().toString(Qt::ISODate)));
    doc.caution(qs(kPlanningCaution));
    doc.heading(QObject::tr("Changes"));
    doc.paragraph(qs(formatScenarioText(named.scenario)).trimmed().replace(QLatin1Char('\n'), QStringLiteral("; ")),
                  true);
    std::vector<std::string> groups;
    for (const ScenarioGroup& g : r.groups) groups.push_back(g.group);
    const auto before = groupComposition(colony, where0, r.at, groups, named.scenario.maturityYears);
    const auto afterComp = groupComposition(after, where1, r.at, groups, named.scenario.maturityYears);
    ReportTable comp;
    comp.header = {QObject::tr("Group"), QObject::tr("Animals"), QObject::tr("Adult F / M"), QObject::tr("Sex ratio F:M"),
                   QObject::tr("Matrilines")};
    comp.widths = {2, 1.4, 1.4, 1.4, 1.2};
    for (size_t i = 0; i < groups.size(); ++i) {
        const GroupComposition& b = before[i];
        const GroupComposition& a = afterComp[i];
        comp.rows.push_back({qs(groups[i]), QStringLiteral("%1 -> %2").arg(b.animals).arg(a.animals),
                             QStringLiteral("%1/%2 -> %3/%4").arg(b.adultFemales).arg(b.adultMales).arg(a.adultFemales).arg(a.adultMales),
                             QStringLiteral("%1 -> %2").arg(ratioText(b), ratioText(a)),
                             QStringLiteral("%1 -> %2").arg(b.matrilines).arg(a.matrilines)});
    }
    doc.heading(QObject::tr("Resulting groups (before -> after)"));
    doc.table(comp);
    for (const ScenarioGroup& g : r.groups) {
        ReportTable obs, pred;
        obs.header = {QObject::tr("#"), QObject::tr("Female"), QObject::tr("Matriline")};
        obs.widths = {0.5, 1.4, 1.4};
        std::vector<PredictedFemale> observed;
        for (const PredictedFemale& f : g.before.females)
            if (f.observedRank) observed.push_back(f);
        std::sort(observed.begin(), observed.end(),
                  [](const PredictedFemale& a, const PredictedFemale& b) { return *a.observedRank < *b.observedRank; });
        for (const PredictedFemale& f : observed)
            obs.rows.push_back({QString::number(*f.observedRank), qs(f.animal), qs(f.matriarch)});
        pred.header = {QObject::tr("#"), QObject::tr("Female"), QObject::tr("Matriline")};
        pred.widths = {0.5, 1.4, 1.4};
        for (const PredictedFemale& f : g.after.females)
            pred.rows.push_back({QString::number(f.predictedRank), qs(f.animal), qs(f.matriarch)});
        doc.heading(QObject::tr("Group %1").arg(qs(g.group)));
        doc.sideBySide(obs, QObject::tr("Observed order now (Elo)"), pred, QObject::tr("Predicted order after the changes"));
    }
    ReportTable moves;
    moves.header = {QObject::tr("Animal"), QObject::tr("Matriline"), QObject::tr("Before"), QObject::tr("After"),
                    QObject::tr("Predicted move")};
    for (const ScenarioMove& m : r.moves) {
        if (m.status == "unchanged") continue;
        auto place = [](const std::string& g, const std::optional<int>& rank) {
            return rank ? QStringLiteral("%1 #%2").arg(qs(g)).arg(*rank) : QString();
        };
        moves.rows.push_back({qs(m.animal), qs(m.matriarch), place(m.groupBefore, m.rankBefore),
                              place(m.groupAfter, m.rankAfter), qs(m.status)});
    }
    doc.heading(QObject::tr("Predicted moves (unchanged places left out)"));
    if (moves.rows.empty()) doc.paragraph(QObject::tr("No female changes place."), true);
    else doc.table(moves);
    doc.heading(QObject::tr("Observed relationships that would have to reverse"));
    if (r.reversals.empty()) {
        doc.paragraph(QObject::tr("None: no observed pair contradicts the predicted order."), true);
    } else {
        ReportTable rev;
        rev.header = {QObject::tr("Group"), QObject::tr("Predicted above"), QObject::tr("Predicted below"),
                      QObject::tr("Wins above/below"), QObject::tr("Already so before")};
        for (const ScenarioReversal& v : r.reversals)
            rev.rows.push_back({qs(v.group), qs(v.predictedAbove), qs(v.predictedBelow),
                                QStringLiteral("%1 / %2").arg(v.winsPredictedAbove).arg(v.winsPredictedBelow),
                                v.againstPredictionBefore ? QObject::tr("yes") : QObject::tr("no")});
        doc.table(rev);
    }
}

} // namespace

int paintScenarioReport(QPagedPaintDevice& device, const CompactEncounters& encounters, const Colony& colony,
                        const std::vector<NamedScenario>& scenarios, const QString& colonyName)
{
    ReportLayout doc(device);
    for (size_t i = 0; i < scenarios.size(); ++i) {
        if (i > 0) doc.newPage();
        oneScenario(doc, encounters, colony, scenarios[i], colonyName);
    }
    doc.finish();
    return doc.pages();
}

} // namespace hierloom::report
