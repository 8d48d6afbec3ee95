// SPDX-License-Identifier: GPL-3.0-or-later
#pragma once
// What the desktop measure tools share: this process's memory and elapsed times.
#include <QApplication>
#include <QElapsedTimer>

#include <fstream>
#include <string>

namespace hierloom::measure {

/// VmHWM (peak) or VmRSS (now) of this process in MiB, from /proc/self/status.
inline double memoryMiB(const std::string& field)
{
    std::ifstream status("/proc/self/status");
    std::string line;
    while (std::getline(status, line))
        if (line.rfind(field + ":", 0) == 0) return std::stod(line.substr(field.size() + 1)) / 1024.0;
    return -1;
}

inline double ms(const QElapsedTimer& t) { return static_cast<double>(t.nsecsElapsed()) / 1e6; }

/// Runs the events until `done` or `limitMs` have passed.
template <class Done> void runUntil(Done done, qint64 limitMs)
{
    QElapsedTimer t;
    t.start();
    while (!done() && t.elapsed() < limitMs) QApplication::processEvents(QEventLoop::AllEvents, 5);
}

} // namespace hierloom::measure
