// SPDX-License-Identifier: GPL-3.0-or-later
#include "report/hierarchy_report.h"

#include "core/base/compact_encounters.h"
#include "core/base/display_names.h"

#include "core/pedigree/discordance.h"
#include "core/pedigree/foresight.h"
#include "core/pedigree/matriline.h"
#include "core/planning/planning_caution.h"
#include "core/ranks/compact_selection.h"
#include "core/ranks/rank_table.h"
#include "core/base/residence_index.h"
#include "core/base/vector_state.h"
#include "core/research/data_health.h"
#include "report/health_section.h"
#include "report/report_layout.h"
#include "report/report_text.h"

#include <QDate>
#include <QObject>
#include <QPageLayout>
#include <QPdfWriter>

#include <algorithm>
#include <cmath>
#include <exception>
#include <future>
#include <iterator>
#include <optional>
#include <stdexcept>

namespace hierloom::report {

using namespace hierloom::core;

namespace {

std::string lineOf(const Matrilines& lines, const std::string& id)
{
    const int k = lines.index(id);
    return k >= 0 ? lines.id(lines.matriarch(k)) : std::string();
}

/// The colony's pedigree (its encounters not read) and its encounters as
/// compact records, which every computation of the report reads.
struct ReportColony {
    const Colony& colony;
    const ResidenceIndex& where;
    const CompactEncounters& compact;
};

EncounterSelection selectionOf(const ReportColony& c, const SelectionOptions& sel)
{
    return selectEncounters(c.compact, c.colony.animals, c.where, sel);
}

std::map<std::string, int> eloRanks(const ReportColony& c, const std::string& group, Day at,
                                    const EloSettings& elo, EloStartRule startRule, std::vector<RankRow>* rows = nullptr)
{
    clearUpperVectorState(); // the text painted before left them dirty (vector_state.h)
    SelectionOptions sel;
    sel.group = group;
    sel.to = at;
    sel.draws = elo.draws;
    RankOptions ro;
    ro.elo = elo;
    ro.startRule = startRule;
    ro.at = at;
    const RankTable t = computeRanks(selectionOf(c, sel), c.colony, c.where, sel, ro);
    std::map<std::string, int> out;
    for (const RankRow& r : t.rows) out[r.animal] = r.rank;
    if (rows) *rows = t.rows;
    return out;
}

void observedAndPredicted(ReportLayout& doc, const ReportColony& c, const Matrilines& lines,
                          const HierarchyReportOptions& o, Day at, const InheritancePrediction& p, const DataHealth& health)
{
    std::vector<RankRow> rows;
    eloRanks(c, o.group, at, o.elo, o.startRule, &rows);
    const Colony& colony = c.colony;
    ReportTable observed;
    observed.header = {QObject::tr("#"), QObject::tr("Animal"), QObject::tr("Sex"), QObject::tr("Matriline"),
                       QObject::tr("Elo"), QObject::tr("Enc."), QObject::tr("Int.")};
    observed.widths = {0.6, 1.4, 0.6, 1.4, 1, 0.7, 0.7};
    // Data health: the encounters behind each rank, too few tinted, and the
    // randomised-Elo interval width beside them (docs/methods.md, "Data health").
    std::map<std::string, const AnimalEffort*> effort;
    for (const AnimalEffort& e : health.animals) effort[e.animal] = &e;
    for (const RankRow& r : rows) {
        const int a = colony.animalIndex(r.animal);
        const auto flag = effort.find(r.animal);
        const AnimalEffort* e = flag != effort.end() ? flag->second : nullptr;
        const int n = e ? e->encounters : 0;
        observed.rows.push_back({QString::number(r.rank), qs(r.animal),
                                 a >= 0 ? qs(toString(colony.animals[static_cast<size_t>(a)].sex)) : QString(),
                                 qs(lineOf(lines, r.animal)), r.score ? QString::number(*r.score, 'f', 0) : QString(),
                                 QString::number(n),
                                 e && e->intervalWidth ? QString::number(*e->intervalWidth, 'f', 0) : QString()});
        observed.highlighted.push_back(tooFewEncounters(n, health.minEncounters));
    }
    ReportTable predicted;
    predicted.header = {QObject::tr("#"), QObject::tr("Female"), QObject::tr("Matriline"), QObject::tr("Obs."),
                        QObject::tr("Disc.")};
    predicted.widths = {0.6, 1.4, 1.4, 0.7, 0.7};
    for (const PredictedFemale& f : p.females) {
        predicted.rows.push_back({QString::number(f.predictedRank), qs(f.animal), qs(f.matriarch),
                                  f.observedRank ? QString::number(*f.observedRank) : QString(),
                                  QString::number(f.discordantDyads)});
        predicted.highlighted.push_back(f.discordantDyads > 0);
    }
    doc.heading(QObject::tr("Observed and predicted order"));
    doc.paragraph(QObject::tr("Left: every resident of the group with an Elo rating on %1 (start rule %4), highest "
                              "first, with the matriline (named after its matriarch). Right: the order the matrilineal inheritance "
                              "rule predicts for the mature females (%2 ascendancy, maturity %3 years); Obs. = her "
                              "observed rank among them, Disc. = pairs whose observed order reverses the "
                              "prediction (tinted). Enc. = encounters behind the rank; tinted on the left: fewer "
                              "than %5, too few for a stable rank; Int. = width of its randomised-Elo interval "
                              "(500 orders).")
                      .arg(qs(formatDate(at)), qs(toString(o.rule)))
                      .arg(o.maturityYears)
                      .arg(qs(toString(o.startRule)))
                      .arg(health.minEncounters),
                  true);
    doc.sideBySide(observed, QObject::tr("Observed order (Elo)"), predicted, QObject::tr("Predicted order (inheritance)"));
}

void discordances(ReportLayout& doc, const Matrilines& lines, const InheritancePrediction& p)
{
    const DiscordanceSummary s = summariseDiscordance(lines, p);
    doc.heading(QObject::tr("Discordances"));
    doc.paragraph(QObject::tr("%1 ranked females, %2 with an observed rank: %3 of %4 comparable pairs are discordant; "
                              "conformity %5, Kendall's tau-b %6.")
                      .arg(s.ranked)
                      .arg(s.observed)
                      .arg(s.discordant)
                      .arg(s.comparable)
                      .arg(s.conformity ? QString::number(*s.conformity, 'f', 3) : QObject::tr("undefined"),
                           s.tauB ? QString::number(*s.tauB, 'f', 3) : QObject::tr("undefined")));
    if (s.dyads.empty()) return;
    ReportTable t;
    t.header = {QObject::tr("Observed above"), QObject::tr("Observed below (predicted above)"), QObject::tr("Kind")};
    t.widths = {1, 1.3, 1.2};
    const size_t shown = std::min<size_t>(s.dyads.size(), 24);
    for (size_t i = 0; i < shown; ++i)
        t.rows.push_back({qs(s.dyads[i].above), qs(s.dyads[i].below),
                          qs(displayName(CodeKind::Category, toString(s.dyads[i].category)))});
    doc.table(t);
    if (shown < s.dyads.size())
        doc.paragraph(QObject::tr("... and %1 more discordant pairs (hierloom-cli inherit --dyads lists them all).")
                          .arg(s.dyads.size() - shown),
                      true);
}

void rankChanges(ReportLayout& doc, const ReportColony& c, const Matrilines& lines,
                 const HierarchyReportOptions& o, Day at)
{
    const Day before = at - o.changeDays;
    const auto now = eloRanks(c, o.group, at, o.elo, o.startRule);
    std::map<std::string, int> then;
    try {
        then = eloRanks(c, o.group, before, o.elo, o.startRule);
    } catch (const std::exception&) {
        // No encounters that early: nothing to compare.
    }
    doc.heading(QObject::tr("Recent rank changes"));
    // Re-rank both among the animals present at both dates, so arrivals do not count as moves.
    std::vector<std::string> common;
    for (const auto& [id, r] : now)
        if (then.count(id)) common.push_back(id);
    auto order = [&](const std::map<std::string, int>& m) {
        std::vector<std::string> v = common;
        std::sort(v.begin(), v.end(), [&](const std::string& a, const std::string& b) { return m.at(a) < m.at(b); });
        std::map<std::string, int> r;
        for (size_t i = 0; i < v.size(); ++i) r[v[i]] = static_cast<int>(i) + 1;
        return r;
    };
    const auto r0 = order(then), r1 = order(now);
    std::vector<std::pair<int, std::string>> moved;
    for (const std::string& id : common)
        if (r0.at(id) != r1.at(id)) moved.push_back({r0.at(id) - r1.at(id), id});
    std::stable_sort(moved.begin(), moved.end(),
                     [](const auto& a, const auto& b) { return std::abs(a.first) > std::abs(b.first); });
    doc.paragraph(QObject::tr("Elo ranks on %1 against %2 days earlier (%3), among the %4 animals ranked on both "
                              "days: %5 changed place.")
                      .arg(qs(formatDate(at)))
                      .arg(o.changeDays)
                      .arg(qs(formatDate(before)))
                      .arg(common.size())
                      .arg(moved.size()),
                  true);
    if (moved.empty()) return;
    ReportTable t;
    t.header = {QObject::tr("Animal"), QObject::tr("Matriline"), QObject::tr("Rank then"), QObject::tr("Rank now"),
                QObject::tr("Change")};
    for (size_t i = 0; i < std::min<size_t>(moved.size(), 15); ++i) {
        const std::string& id = moved[i].second;
        t.rows.push_back({qs(id), qs(lineOf(lines, id)), QString::number(r0.at(id)), QString::number(r1.at(id)),
                          (moved[i].first > 0 ? QStringLiteral("+") : QString()) + QString::number(moved[i].first)});
    }
    doc.table(t);
}

/// A section's figures computed ahead of its painting, or what stopped them
/// (thrown again where the section is painted, so errors keep their order).
template <typename T>
struct Computed {
    std::optional<T> value;
    std::exception_ptr error;

    template <typename F>
    static Computed of(F compute)
    {
        Computed c;
        try {
            c.value.emplace(compute());
        } catch (...) {
            c.error = std::current_exception();
        }
        return c;
    }
    const T& get() const
    {
        if (error) std::rethrow_exception(error);
        return *value;
    }
};

Foresight foresightOf(const ReportColony& c, const HierarchyReportOptions& o, Day at)
{
    clearUpperVectorState();
    SelectionOptions sel;
    sel.group = o.group;
    sel.to = at;
    sel.draws = o.elo.draws;
    ForesightOptions fo;
    fo.rule = o.rule;
    fo.maturityYears = o.maturityYears;
    fo.elo = o.elo;
    return computeForesight(c.compact, c.colony, c.where, sel, fo);
}

void foresight(ReportLayout& doc, const HierarchyReportOptions& o, Day at, const Foresight& f)
{
    doc.heading(QObject::tr("How much does inheritance explain"));
    doc.paragraph(QObject::tr("For each decided encounter up to %1, the chance each model gave the winner beforehand: "
                              "the %2 inheritance rule alone (the animal it places higher wins with one probability, "
                              "fitted: %3, on %4 of %5 encounters it could compare), plain Elo, and Elo whose "
                              "daughters start where the rule places them. Higher log-likelihood and lower Brier "
                              "score are better; a coin scores %6 per encounter and a Brier score of 0.25.")
                      .arg(qs(formatDate(at)), qs(toString(o.rule)),
                           f.ruleWinProbability ? QString::number(*f.ruleWinProbability, 'f', 3) : QObject::tr("undefined"))
                      .arg(f.comparable)
                      .arg(f.encounters.size())
                      .arg(std::log(0.5), 0, 'f', 3),
                  true);
    auto modelName = [](ForesightModel m) {
        switch (m) {
        case ForesightModel::Elo: return QObject::tr("Elo");
        case ForesightModel::InformedElo: return QObject::tr("Rule-informed Elo");
        case ForesightModel::Rule: break;
        }
        return QObject::tr("Rule alone");
    };
    ReportTable t;
    t.header = {QObject::tr("Model"), QObject::tr("Encounters"), QObject::tr("Log-likelihood"),
                QObject::tr("Per encounter"), QObject::tr("Brier"), QObject::tr("Winners predicted")};
    t.widths = {1.6, 1, 1.2, 1.1, 0.8, 1.3};
    for (const ForesightRow& r : f.rows) {
        if (r.year) continue;
        const ForesightScore& s = r.score;
        t.rows.push_back({modelName(r.model), QString::number(s.encounters),
                          s.encounters ? QString::number(s.logLikelihood, 'f', 1) : QString(),
                          s.encounters ? QString::number(s.logLikelihood / s.encounters, 'f', 3) : QString(),
                          s.brier ? QString::number(*s.brier, 'f', 3) : QString(),
                          s.sharePredicted ? QString::number(*s.sharePredicted * 100, 'f', 1) + QStringLiteral("%")
                                           : QString()});
    }
    doc.table(t);
    // Share of winners predicted per year, one line per model.
    std::vector<int> years;
    for (const ForesightRow& r : f.rows)
        if (r.model == ForesightModel::Rule && r.year) years.push_back(*r.year);
    if (years.size() < 2) return;
    const QColor colours[] = {QColor(0xe6, 0x9f, 0x00), QColor(0x00, 0x72, 0xb2), QColor(0x00, 0x9e, 0x73)};
    std::vector<ChartSeries> series;
    for (size_t m = 0; m < std::size(kForesightModels); ++m) {
        ChartSeries c{modelName(kForesightModels[m]), colours[m], {}, std::nullopt, {}};
        for (const ForesightRow& r : f.rows)
            if (r.model == kForesightModels[m] && r.year) c.values.push_back(r.score.sharePredicted);
        series.push_back(std::move(c));
    }
    QStringList labels;
    for (int y : years) labels << QString::number(y);
    doc.chart(QObject::tr("Share of winners each model predicted, per year"), series, labels);
}

StabilitySeries stabilityOf(const ReportColony& c, const Matrilines& lines, const HierarchyReportOptions& o, Day at)
{
    clearUpperVectorState();
    StabilityOptions so;
    so.group = o.group;
    so.length = PeriodLength::Month;
    so.to = at;
    so.elo = o.elo;
    so.severity = o.severity;
    so.thresholds = o.thresholds;
    return stabilityWatch(c.compact, c.colony.animals, c.where, lines, so);
}

void stability(ReportLayout& doc, const HierarchyReportOptions& o, Day at, const StabilitySeries& s)
{
    doc.heading(QObject::tr("Stability"));
    doc.paragraph(stabilityMethodText(o.thresholds), true);
    std::vector<bool> alerted(s.periods.size(), false);
    for (const StabilityAlert& a : s.alerts) alerted[a.period] = true;
    ReportTable t;
    t.header = {QObject::tr("Month"), QObject::tr("Decided"), QObject::tr("Counter-dom."), QObject::tr("Busiest line pair"),
                QObject::tr("Rank change"), QObject::tr("Severe"), QObject::tr("Severe rate / median"), QObject::tr("Alert")};
    t.widths = {1, 0.8, 1, 2, 0.9, 0.7, 0.8, 0.7};
    const size_t first = s.periods.size() > 12 ? s.periods.size() - 12 : 0;
    for (size_t i = first; i < s.periods.size(); ++i) {
        const StabilityPeriod& p = s.periods[i];
        const QString ratio = p.severePerAnimalDay && s.medianSevereRate && *s.medianSevereRate > 0
                                  ? QString::number(*p.severePerAnimalDay / *s.medianSevereRate, 'f', 1)
                                  : QString();
        t.rows.push_back({qs(formatDate(p.period.start)).left(7), QString::number(p.decided),
                          p.counterShare ? QString::number(*p.counterShare * 100, 'f', 1) + QStringLiteral("%") : QString(),
                          p.topLinePair ? QObject::tr("%1 / %2: %3")
                                              .arg(qs(p.topLinePair->winnerLine), qs(p.topLinePair->loserLine))
                                              .arg(p.topLinePair->count)
                                        : QString(),
                          p.rankChangePerAnimal && p.encounters > 0 ? QString::number(*p.rankChangePerAnimal, 'f', 2)
                                                                    : QString(),
                          QString::number(p.severe), ratio, alerted[i] ? QObject::tr("yes") : QString()});
        t.highlighted.push_back(alerted[i]);
    }
    doc.table(t);
    std::vector<const StabilityAlert*> recent;
    for (const StabilityAlert& a : s.alerts)
        if (s.periods[a.period].period.end >= at - 365) recent.push_back(&a);
    if (recent.empty()) {
        doc.paragraph(QObject::tr("No stability alert in the twelve months up to %1.").arg(qs(formatDate(at))), true);
    } else {
        doc.paragraph(QObject::tr("Alerts in the twelve months up to %1:").arg(qs(formatDate(at))), true);
        for (const StabilityAlert* a : recent) doc.paragraph(QStringLiteral("- ") + qs(describeAlert(s, *a)), true);
        doc.caution(qs(kPlanningCaution));
    }

    // Plots of the whole record, alert months marked.
    std::vector<std::optional<double>> share, ratio, change;
    std::vector<bool> shareMark(s.periods.size()), severeMark(s.periods.size());
    for (const StabilityAlert& a : s.alerts) {
        if (a.signal == StabilitySignal::CounterDominance) shareMark[a.period] = true;
        if (a.signal == StabilitySignal::SevereAggression) severeMark[a.period] = true;
    }
    QStringList labels;
    for (const StabilityPeriod& p : s.periods) {
        share.push_back(p.counterShare);
        ratio.push_back(p.severePerAnimalDay && s.medianSevereRate && *s.medianSevereRate > 0
                            ? std::optional<double>(*p.severePerAnimalDay / *s.medianSevereRate)
                            : std::nullopt);
        // A month without encounters is a gap in every plot, never a zero.
        change.push_back(p.encounters > 0 ? p.rankChangePerAnimal : std::nullopt);
        const CivilDate c = civilFromDay(p.period.start);
        labels << (c.month == 1 ? QString::number(c.year) : QString());
    }
    doc.newPage();
    doc.heading(QObject::tr("Stability plots (monthly, %1)").arg(qs(o.group)));
    doc.chart(QObject::tr("Counter-dominance: share of decided encounters won by the lower-ranked animal"),
              {{QObject::tr("share"), QColor(0x1f, 0x77, 0xb4), share, o.thresholds.counterShare, shareMark}}, labels);
    doc.chart(QObject::tr("Severe encounters per animal-day, as a multiple of the record's median"),
              {{QObject::tr("multiple of median"), QColor(0xd6, 0x27, 0x28), ratio, o.thresholds.severeFactor, severeMark}},
              labels);
    doc.chart(QObject::tr("Mean rank change per animal between month ends"),
              {{QObject::tr("places per animal"), QColor(0x2c, 0xa0, 0x2c), change,
                o.thresholds.rankChangePerAnimal > 0 ? std::optional<double>(o.thresholds.rankChangePerAnimal)
                                                     : std::nullopt,
                {}}},
              labels);
    doc.paragraph(QObject::tr("Red dots: months that raised an alert."), true);
}

} // namespace

int paintHierarchyReport(QPagedPaintDevice& device, const Colony& colony, const HierarchyReportOptions& o,
                         QStringList* headings)
{
    return paintHierarchyReport(device, compactEncounters(colony.encounters), colony, o, headings);
}

int paintHierarchyReport(QPagedPaintDevice& device, const CompactEncounters& encounters, const Colony& colony,
                         const HierarchyReportOptions& o, QStringList* headings)
{
    // Qt's start and the text painted between the sections leave the vector
    // registers dirty, which slows every computation after it many times over
    // (core/base/vector_state.h): each computing step cleans them first.
    clearUpperVectorState();
    const ResidenceIndex where(colony.animals, colony.residences);
    if (where.group(o.group) < 0) throw std::invalid_argument("no group '" + o.group + "' in the colony");
    SelectionOptions sel;
    sel.group = o.group;
    sel.to = o.at;
    sel.draws = o.elo.draws;
    const ReportColony c{colony, where, encounters};
    const EncounterSelection es = selectionOf(c, sel);
    if (es.bouts.empty())
        throw std::invalid_argument("the group '" + o.group + "' has no encounters" +
                                    (o.at ? " up to " + formatDate(*o.at) : std::string()));
    const Day at = o.at.value_or(*es.lastDay);
    const Matrilines lines(colony);
    InheritanceOptions io;
    io.at = at;
    io.group = o.group;
    io.rule = o.rule;
    io.maturityYears = o.maturityYears;
    io.elo = o.elo;
    const InheritancePrediction p = predictInheritance(c.compact, colony.animals, where, lines, io);

    // Data health (its 500 randomisations on every core) runs on a thread of
    // its own while this one computes the foresight and stability figures;
    // everything is painted afterwards, in the same order as before.
    HealthOptions ho;
    ho.from = es.firstDay;
    ho.to = at;
    ho.group = o.group;
    ho.today = at;
    ho.elo = o.elo;
    ho.randomisations = 500;
    std::future<DataHealth> pendingHealth = std::async(std::launch::async, [&] {
        clearUpperVectorState();
        return dataHealth(encounters, colony.animals, where, ho);
    });
    const auto foresightFigures = Computed<Foresight>::of([&] { return foresightOf(c, o, at); });
    const auto stabilityFigures = Computed<StabilitySeries>::of([&] { return stabilityOf(c, lines, o, at); });

    ReportLayout doc(device);
    doc.title(QObject::tr("Hierarchy report: %1").arg(qs(o.group)),
              QObject::tr("%1 - at %2 - made %3 with Hierloom")
                  .arg(o.colonyName.empty() ? QObject::tr("colony") : qs(o.colonyName), qs(formatDate(at)),
                       QDate::currentDate().toString(Qt::ISODate)));
    int decided = 0;
    for (const Bout& b : es.bouts) decided += b.draw ? 0 : 1;
    doc.heading(QObject::tr("Data window"));
    doc.paragraph(QObject::tr("Encounters of %1 from %2 to %3: %4 (%5 decided, %6 draws) among %7 animals. Ratings "
                              "run over the whole window; ranks are read on %3.")
                      .arg(qs(o.group), qs(formatDate(*es.firstDay)), qs(formatDate(at)))
                      .arg(es.bouts.size())
                      .arg(decided)
                      .arg(static_cast<int>(es.bouts.size()) - decided)
                      .arg(es.size()));
    const DataHealth health = pendingHealth.get();
    observedAndPredicted(doc, c, lines, o, at, p, health);
    doc.caution(qs(kPlanningCaution));
    discordances(doc, lines, p);
    rankChanges(doc, c, lines, o, at);
    foresight(doc, o, at, foresightFigures.get());
    stability(doc, o, at, stabilityFigures.get());
    paintHealthSection(doc, health, qs(o.group));
    doc.heading(QObject::tr("Methods and references"));
    for (const QString& m : methodsText(o.elo)) doc.paragraph(m, true);
    doc.finish();
    if (headings) *headings = doc.headings();
    return doc.pages();
}

int writeHierarchyReportPdf(const QString& path, const Colony& colony, const HierarchyReportOptions& o)
{
    return writeHierarchyReportPdf(path, compactEncounters(colony.encounters), colony, o);
}

int writeHierarchyReportPdf(const QString& path, const CompactEncounters& encounters, const Colony& colony,
                            const HierarchyReportOptions& o)
{
    QPdfWriter writer(path);
    writer.setResolution(300);
    writer.setPageLayout(QPageLayout(QPageSize(QPageSize::A4), QPageLayout::Portrait, QMarginsF(16, 16, 16, 12),
                                     QPageLayout::Millimeter));
    writer.setTitle(QObject::tr("Hierarchy report: %1").arg(qs(o.group)));
    writer.setCreator(QStringLiteral("Hierloom"));
    return paintHierarchyReport(writer, encounters, colony, o);
}

} // namespace hierloom::report
