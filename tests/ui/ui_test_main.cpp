// SPDX-License-Identifier: GPL-3.0-or-later
// One QApplication for the whole ui test executable.
#include <QApplication>
#include <QStandardPaths>

#include <gtest/gtest.h>

#include <filesystem>
#include <string>
#include <unistd.h>

int main(int argc, char* argv[])
{
    ::testing::InitGoogleTest(&argc, argv);
    // Test discovery at build time runs this without CTest's environment:
    // default to the offscreen platform so no display is ever needed.
    if (qEnvironmentVariableIsEmpty("QT_QPA_PLATFORM")) qputenv("QT_QPA_PLATFORM", "offscreen");
    // Each test process gets a home of its own, so tests run in parallel by
    // ctest never share settings (recent files, first run) or the demo copy,
    // and the person's own settings stay untouched.
    const std::filesystem::path home =
        std::filesystem::temp_directory_path() / ("hierloom-ui-test-home-" + std::to_string(::getpid()));
    std::filesystem::remove_all(home);
    std::filesystem::create_directories(home);
    qputenv("HOME", QByteArray::fromStdString(home.string()));
    qputenv("XDG_CONFIG_HOME", QByteArray::fromStdString((home / ".config").string()));
    qputenv("XDG_DATA_HOME", QByteArray::fromStdString((home / ".local/share").string()));
    // The checked-files cache (core/store/check_cache.h) too.
    qputenv("HIERLOOM_CACHE_DIR", QByteArray::fromStdString((home / ".cache/hierloom").string()));
    qunsetenv("HIERLOOM_CHECK_EVERY_OPEN");
    QStandardPaths::setTestModeEnabled(true);
    QApplication::setOrganizationName(QStringLiteral("HierloomTests"));
    QApplication::setApplicationName(QStringLiteral("HierloomUiTests"));
    int status = 0;
    {
        QApplication app(argc, argv);
        status = RUN_ALL_TESTS();
    }
    std::filesystem::remove_all(home);
    return status;
}
