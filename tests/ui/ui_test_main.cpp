// SPDX-License-Identifier: GPL-3.0-or-later
// One QApplication for the whole ui test executable.
#include <QApplication>
#include <QStandardPaths>

#include <gtest/gtest.h>

int main(int argc, char* argv[])
{
    ::testing::InitGoogleTest(&argc, argv);
    // Test discovery at build time runs this without CTest's environment:
    // default to the offscreen platform so no display is ever needed.
    if (qEnvironmentVariableIsEmpty("QT_QPA_PLATFORM")) qputenv("QT_QPA_PLATFORM", "offscreen");
    // Keep the person's own settings (recent files, window geometry) untouched.
    QStandardPaths::setTestModeEnabled(true);
    QApplication::setOrganizationName(QStringLiteral("HierloomTests"));
    QApplication::setApplicationName(QStringLiteral("HierloomUiTests"));
    QApplication app(argc, argv);
    return RUN_ALL_TESTS();
}
