// SPDX-License-Identifier: GPL-3.0-or-later
#include "report/report_text.h"

#include <QObject>

namespace hierloom::report {

QString stabilityMethodText(const core::StabilityThresholds& t)
{
    QString text = QObject::tr(
        "Per month: counter-dominance is the share of decided encounters between two rated animals won by the one "
        "rated lower just before the encounter (sequential Elo); rank change is the mean absolute change of Elo rank "
        "per animal between month ends; severe encounters are those coded with severity %1 or more, per animal-day "
        "(residents on the days with observations). Alerts: counter-dominance above %2% over at least %3 decided "
        "encounters with at least %4 of them (per 7 days) between the same two matrilines; severe encounters above %5 "
        "times the record's median rate with at least %6 in the period")
                       .arg(t.severeAtLeast)
                       .arg(t.counterShare * 100, 0, 'g', 3)
                       .arg(t.minDecided)
                       .arg(t.linePairPerWeek, 0, 'g', 3)
                       .arg(t.severeFactor, 0, 'g', 3)
                       .arg(t.minSevere);
    if (t.rankChangePerAnimal > 0)
        text += QObject::tr("; rank change above %1 places per animal").arg(t.rankChangePerAnimal, 0, 'g', 3);
    return text + QStringLiteral(".");
}

QStringList methodsText(const core::EloSettings& elo)
{
    return {
        QObject::tr("Observed ranks: sequential Elo ratings (start %1, k = %2, %3 expectancy curve; draws %4) over the "
                    "group's encounters in date order (Elo 1978; Albers & de Vries 2001; Neumann et al. 2011).")
            .arg(elo.start)
            .arg(elo.k)
            .arg(elo.curve == core::EloCurve::Logistic ? QObject::tr("logistic") : QObject::tr("normal"))
            .arg(elo.draws == core::DrawPolicy::Half ? QObject::tr("count half") : QObject::tr("ignored")),
        QObject::tr("Predicted order: matrilineal rank inheritance - matrilines ordered by their best observed rank, "
                    "each mother directly above her daughters, younger sisters above older ones (youngest "
                    "ascendancy; Kawamura 1958; Datta 1988)."),
        QObject::tr("Agreement: discordant pairs, conformity = 1 - discordant / comparable pairs, and Kendall's tau-b "
                    "between predicted and observed ranks (Kendall 1945)."),
        QObject::tr("Foresight: for each decided encounter, the probability each model gave the winner beforehand - "
                    "the inheritance rule alone with one win probability fitted by maximum likelihood, plain Elo, and "
                    "Elo whose daughters start where the rule places them; log-likelihood, Brier score (Brier 1950) "
                    "and the share of winners predicted."),
        QObject::tr("Stability: counter-dominance, rank changes and severe aggression per period as described above; "
                    "thresholds are the colony file's settings."),
        QObject::tr("References: Albers PCH, de Vries H (2001) Elo-rating as a tool in the sequential estimation of "
                    "dominance strengths. Anim Behav 61:489-495. Datta SB (1988) The acquisition of dominance among "
                    "free-ranging rhesus monkey siblings. Anim Behav 36:754-772. Elo AE (1978) The rating of "
                    "chessplayers, past and present. Arco, New York. Kawamura S (1958) The matriarchal social order "
                    "in the Minoo-B group. Primates 1:149-156. Kendall MG (1945) The treatment of ties in ranking "
                    "problems. Biometrika 33:239-251. Neumann C et al. (2011) Assessing dominance hierarchies: "
                    "validation and advantages of progressive evaluation with Elo-rating. Anim Behav 82:911-921."),
    };
}

} // namespace hierloom::report
