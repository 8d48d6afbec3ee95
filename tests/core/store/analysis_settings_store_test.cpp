// SPDX-License-Identifier: GPL-3.0-or-later
// The analysis settings (core/ranks/analysis_settings.h) and their storage in
// the colony file's setting table (core/store/analysis_settings_store.h).
#include "core/store/analysis_settings_store.h"

#include "core/store/colony_store.h"
#include "core/store/species_settings.h"
#include "import_test_support.h"

#include <gtest/gtest.h>

#include <cmath>
#include <limits>
#include <stdexcept>

using namespace hierloom::core;
using hierloom::test::TempDir;

TEST(AnalysisSettings, DefaultsAreThoseOfMethods)
{
    const AnalysisSettings s;
    EXPECT_EQ(s.elo.k, 100);
    EXPECT_EQ(s.elo.start, 1000);
    EXPECT_EQ(s.elo.curve, EloCurve::Logistic);
    EXPECT_EQ(s.elo.draws, DrawPolicy::Half);
    EXPECT_EQ(s.maturityYears, 4);
    EXPECT_EQ(s.windowDays, 0);
    EXPECT_EQ(describeAnalysisSettings(s),
              "k 100, start 1000, start rule none, curve logistic, draws half, maturity 4 years, window all data");
    EXPECT_EQ(s.startRule, EloStartRule::None);
}

TEST(AnalysisSettings, ValidationRefusesNonFiniteAndOutOfRange)
{
    const double nan = std::numeric_limits<double>::quiet_NaN();
    const double inf = std::numeric_limits<double>::infinity();
    for (double k : {nan, inf, -inf, -1.0, 100001.0}) {
        AnalysisSettings s;
        s.elo.k = k;
        EXPECT_THROW(validateAnalysisSettings(s), std::invalid_argument) << k;
    }
    for (double start : {nan, inf, -inf, 2e6}) {
        AnalysisSettings s;
        s.elo.start = start;
        EXPECT_THROW(validateAnalysisSettings(s), std::invalid_argument) << start;
    }
    AnalysisSettings s;
    s.maturityYears = 51;
    EXPECT_THROW(validateAnalysisSettings(s), std::invalid_argument);
    s = {};
    s.windowDays = -1;
    EXPECT_THROW(validateAnalysisSettings(s), std::invalid_argument);
    s = {};
    s.elo.k = 0;
    s.elo.start = -500;
    EXPECT_NO_THROW(validateAnalysisSettings(s));
}

TEST(AnalysisSettings, DefaultWindowEndsOnTheLastDay)
{
    AnalysisSettings s;
    EXPECT_FALSE(defaultWindowStart(s, 1000));
    s.windowDays = 30;
    // 30 days inclusive: 971 .. 1000.
    EXPECT_EQ(defaultWindowStart(s, 1000), 971);
    EXPECT_FALSE(defaultWindowStart(s, std::nullopt));
}

TEST(AnalysisSettingsStore, NewFileReadsTheDefaults)
{
    TempDir dir;
    const ColonyStore store = ColonyStore::create(dir.file("c.hierloom"));
    EXPECT_EQ(readAnalysisSettings(store), AnalysisSettings{});
}

TEST(AnalysisSettingsStore, RoundTripThroughTheFile)
{
    TempDir dir;
    const std::string path = dir.file("c.hierloom");
    AnalysisSettings s;
    s.elo.k = 37.5;
    s.elo.start = 1500;
    s.elo.curve = EloCurve::Normal;
    s.elo.draws = DrawPolicy::Ignore;
    s.maturityYears = 6;
    s.windowDays = 365;
    s.startRule = EloStartRule::Eldest;
    {
        ColonyStore store = ColonyStore::create(path);
        writeAnalysisSettings(store, s);
    }
    const ColonyStore again = ColonyStore::open(path, ColonyStore::Mode::ReadOnly);
    EXPECT_EQ(readAnalysisSettings(again), s);
    EXPECT_EQ(again.setting(analysis_keys::kEloK), "37.5");
    EXPECT_EQ(again.setting(analysis_keys::kEloCurve), "normal");
    EXPECT_EQ(again.setting(analysis_keys::kEloStartRule), "eldest");
    // The maturity age is the species setting's override, not a second copy.
    EXPECT_EQ(again.setting(kMaturitySettingKey), "6");
    EXPECT_EQ(readSpeciesSettings(again).maturityYears, 6);
}

TEST(AnalysisSettingsStore, BadStoredValuesFallBackOneByOne)
{
    TempDir dir;
    ColonyStore store = ColonyStore::create(dir.file("c.hierloom"));
    store.setSetting(analysis_keys::kEloK, "nan");
    store.setSetting(analysis_keys::kEloStart, "1200");
    store.setSetting(analysis_keys::kEloCurve, "cubic");
    store.setSetting(analysis_keys::kDraws, "ignore");
    store.setSetting(analysis_keys::kWindowDays, "-3");
    AnalysisSettings s = readAnalysisSettings(store);
    EXPECT_EQ(s.elo.k, 100);
    EXPECT_EQ(s.elo.start, 1200);
    EXPECT_EQ(s.elo.curve, EloCurve::Logistic);
    EXPECT_EQ(s.elo.draws, DrawPolicy::Ignore);
    EXPECT_EQ(s.windowDays, 0);
    for (const char* bad : {"inf", "-inf", "1e999", "12abc", "-5", "200000"}) {
        store.setSetting(analysis_keys::kEloK, bad);
        EXPECT_EQ(readAnalysisSettings(store).elo.k, 100) << bad;
    }
}

TEST(AnalysisSettingsStore, RefusedSettingsWriteNothing)
{
    TempDir dir;
    ColonyStore store = ColonyStore::create(dir.file("c.hierloom"));
    AnalysisSettings s;
    s.elo.start = 900; // valid, but in the same write as a bad k
    s.elo.k = std::numeric_limits<double>::quiet_NaN();
    EXPECT_THROW(writeAnalysisSettings(store, s), std::invalid_argument);
    s.elo.k = std::numeric_limits<double>::infinity();
    EXPECT_THROW(writeAnalysisSettings(store, s), std::invalid_argument);
    EXPECT_EQ(store.setting(analysis_keys::kEloStart), "");
    EXPECT_EQ(readAnalysisSettings(store), AnalysisSettings{});
}

TEST(AnalysisSettingsStore, MaturityFollowsTheSpecies)
{
    TempDir dir;
    ColonyStore store = ColonyStore::create(dir.file("c.hierloom"));
    writeSpeciesSettings(store, "japanese_macaque", std::nullopt, std::nullopt);
    const int speciesDefault = readSpeciesSettings(store).maturityYears;
    EXPECT_EQ(readAnalysisSettings(store).maturityYears, speciesDefault);
    EXPECT_EQ(defaultAnalysisSettings(store).maturityYears, speciesDefault);
    AnalysisSettings s = readAnalysisSettings(store);
    s.elo.k = 80;
    writeAnalysisSettings(store, s); // maturity unchanged: stays the species default, no override
    EXPECT_EQ(store.setting(kMaturitySettingKey), "");
    s.maturityYears = speciesDefault + 1;
    writeAnalysisSettings(store, s);
    EXPECT_EQ(readSpeciesSettings(store).maturityYears, speciesDefault + 1);
    EXPECT_TRUE(readSpeciesSettings(store).maturityOverridden);
    EXPECT_EQ(readAnalysisSettings(store).elo.k, 80);
}
