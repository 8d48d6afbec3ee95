// SPDX-License-Identifier: GPL-3.0-or-later
#include "core/base/csv_writer.h"

namespace hierloom::core {

std::string csvField(std::string_view text)
{
    if (text.find_first_of(",\"\r\n") == std::string_view::npos) return std::string(text);
    std::string out;
    out.reserve(text.size() + 2);
    out += '"';
    for (char c : text) {
        if (c == '"') out += '"';
        out += c;
    }
    out += '"';
    return out;
}

void CsvWriter::writeRow(const std::vector<std::string>& fields)
{
    for (size_t i = 0; i < fields.size(); ++i) {
        if (i > 0) out_ << ',';
        out_ << csvField(fields[i]);
    }
    out_ << '\n';
}

} // namespace hierloom::core
