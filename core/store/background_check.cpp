// SPDX-License-Identifier: GPL-3.0-or-later
#include "core/store/background_check.h"

#include "core/store/colony_store.h"

namespace hierloom::core {

BackgroundCheck::BackgroundCheck(std::string path) : path_(std::move(path))
{
    thread_ = std::thread([this] {
        try {
            ColonyStore::open(path_, ColonyStore::Mode::ReadOnly);
        } catch (...) {
            failure_ = std::current_exception();
        }
    });
}

BackgroundCheck::~BackgroundCheck()
{
    if (thread_.joinable()) thread_.join();
}

void BackgroundCheck::wait()
{
    if (thread_.joinable()) thread_.join();
    if (failure_) std::rethrow_exception(failure_);
}

} // namespace hierloom::core
