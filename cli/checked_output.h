// SPDX-License-Identifier: GPL-3.0-or-later
#pragma once
#include "core/store/background_check.h"
#include "core/store/colony_store.h"

#include <memory>
#include <ostream>
#include <streambuf>
#include <string>
#include <utility>
#include <vector>

namespace hierloom::cli {

/// A command's two output streams while the whole-file check of the colony it
/// reads runs alongside (core::BackgroundCheck): the first open of a file
/// reads and computes during the check, and what the command writes is held,
/// in the order written, until the check has passed. A damaged file is
/// refused as by a check before reading: nothing of the command is shown.
class CheckedOutput {
public:
    CheckedOutput(std::ostream& out, std::ostream& err);
    CheckedOutput(const CheckedOutput&) = delete;
    CheckedOutput& operator=(const CheckedOutput&) = delete;

    std::ostream& out() { return out_; }
    std::ostream& err() { return err_; }

    /// Opens the colony file at `path` read-only. When the checked-files cache
    /// does not vouch for it, its check starts on a thread of its own (once per
    /// file) and the output is held from now until pass().
    core::ColonyStore open(const std::string& path);

    /// Waits for the check, if one runs, and writes out what was held; throws
    /// the check's error, dropping what was held, when it failed.
    void pass();

private:
    /// Passes writes on to its stream, or holds them in the shared log.
    class HeldBuffer : public std::streambuf {
    public:
        HeldBuffer(CheckedOutput& owner, std::ostream& target) : owner_(owner), target_(target) {}

    protected:
        int_type overflow(int_type c) override;
        std::streamsize xsputn(const char* s, std::streamsize n) override;
        int sync() override;

    private:
        CheckedOutput& owner_;
        std::ostream& target_;
    };

    std::vector<std::pair<std::ostream*, std::string>> held_;
    std::unique_ptr<core::BackgroundCheck> check_;
    HeldBuffer outBuffer_;
    HeldBuffer errBuffer_;
    std::ostream out_;
    std::ostream err_;
};

} // namespace hierloom::cli
