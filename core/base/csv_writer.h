// SPDX-License-Identifier: GPL-3.0-or-later
#pragma once
#include <ostream>
#include <string>
#include <string_view>
#include <vector>

namespace hierloom::core {

/// One CSV field as RFC 4180 (Shafranovich 2005) writes it: quoted, with
/// quotes doubled, when it contains a comma, a quote, CR or LF; else as is.
std::string csvField(std::string_view text);

/// Writes RFC 4180 records with `\n` line ends to a stream.
class CsvWriter {
public:
    explicit CsvWriter(std::ostream& out) : out_(out) {}

    /// Writes one record: the fields, each quoted when needed, comma-separated.
    void writeRow(const std::vector<std::string>& fields);

private:
    std::ostream& out_;
};

} // namespace hierloom::core
