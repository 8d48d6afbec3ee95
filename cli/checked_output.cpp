// SPDX-License-Identifier: GPL-3.0-or-later
#include "cli/checked_output.h"

#include "core/store/integrity_check.h"

namespace hierloom::cli {

CheckedOutput::CheckedOutput(std::ostream& out, std::ostream& err)
    : outBuffer_(*this, out), errBuffer_(*this, err), out_(&outBuffer_), err_(&errBuffer_)
{
}

core::ColonyStore CheckedOutput::open(const std::string& path)
{
    using core::ColonyStore;
    if (check_ && check_->path() == path) return ColonyStore::openCheckedElsewhere(path); // being checked
    if (core::checkVouchedFor(path)) return ColonyStore::open(path, ColonyStore::Mode::ReadOnly);
    pass(); // another file's check first
    ColonyStore store = ColonyStore::openCheckedElsewhere(path);
    check_ = std::make_unique<core::BackgroundCheck>(path);
    return store;
}

void CheckedOutput::pass()
{
    if (!check_) return;
    try {
        check_->wait();
    } catch (...) {
        held_.clear();
        check_.reset();
        throw;
    }
    check_.reset();
    for (auto& [stream, text] : held_) {
        stream->write(text.data(), static_cast<std::streamsize>(text.size()));
        stream->flush();
    }
    held_.clear();
}

CheckedOutput::HeldBuffer::int_type CheckedOutput::HeldBuffer::overflow(int_type c)
{
    if (traits_type::eq_int_type(c, traits_type::eof())) return traits_type::not_eof(c);
    const char ch = traits_type::to_char_type(c);
    return xsputn(&ch, 1) == 1 ? c : traits_type::eof();
}

std::streamsize CheckedOutput::HeldBuffer::xsputn(const char* s, std::streamsize n)
{
    if (!owner_.check_) {
        target_.write(s, n);
        return target_ ? n : 0;
    }
    auto& held = owner_.held_;
    if (held.empty() || held.back().first != &target_) held.emplace_back(&target_, std::string());
    held.back().second.append(s, static_cast<std::size_t>(n));
    return n;
}

int CheckedOutput::HeldBuffer::sync()
{
    if (!owner_.check_) target_.flush();
    return 0;
}

} // namespace hierloom::cli
