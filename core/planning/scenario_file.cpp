// SPDX-License-Identifier: GPL-3.0-or-later
#include "core/planning/scenario_file.h"

#include <charconv>
#include <fstream>
#include <set>
#include <sstream>

namespace hierloom::core {

namespace {

std::string_view trim(std::string_view s)
{
    const auto space = [](char c) { return c == ' ' || c == '\t' || c == '\r' || c == '\n'; };
    while (!s.empty() && space(s.front())) s.remove_prefix(1);
    while (!s.empty() && space(s.back())) s.remove_suffix(1);
    return s;
}

std::vector<std::string> words(std::string_view s)
{
    std::vector<std::string> out;
    std::string cur;
    for (char c : s) {
        if (c == ' ' || c == '\t') {
            if (!cur.empty()) out.push_back(std::move(cur));
            cur.clear();
        } else {
            cur += c;
        }
    }
    if (!cur.empty()) out.push_back(std::move(cur));
    return out;
}

std::optional<int> wholeNumber(const std::string& s)
{
    int v = 0;
    const auto r = std::from_chars(s.data(), s.data() + s.size(), v);
    if (r.ec != std::errc() || r.ptr != s.data() + s.size()) return std::nullopt;
    return v;
}

/// parseScenarioText with `check` finding the scenario's problems against the colony.
template <class Check>
ScenarioFileResult parseChecked(std::string_view text, const std::string& file, const Scenario& defaults, Check check)
{
    ScenarioFileResult result;
    Scenario s = defaults;
    s.changes.clear();
    auto error = [&](int line, const std::string& what) {
        result.errors.push_back(line > 0 ? file + ":" + std::to_string(line) + ": " + what : file + ": " + what);
    };
    if (text.substr(0, 3) == "\xEF\xBB\xBF") text.remove_prefix(3);
    std::set<std::string> settingsSeen;
    int lineNo = 0;
    size_t pos = 0;
    while (pos <= text.size()) {
        const size_t end = std::min(text.find('\n', pos), text.size());
        std::string_view line = text.substr(pos, end - pos);
        pos = end + 1;
        ++lineNo;
        if (const size_t hash = line.find('#'); hash != std::string_view::npos) line = line.substr(0, hash);
        line = trim(line);
        if (line.empty()) continue;
        const std::vector<std::string> w = words(line);
        const std::string& key = w[0];
        const std::string rest(trim(line.substr(key.size())));
        const bool setting = key == "date" || key == "group" || key == "rule" || key == "maturity" || key == "window" ||
                             key == "newborns" || key == "matrilines";
        if (setting && !settingsSeen.insert(key).second) {
            error(lineNo, "'" + key + "' is given twice");
            continue;
        }
        auto arity = [&](size_t lo, size_t hi, const char* usage) {
            if (w.size() - 1 < lo || w.size() - 1 > hi) {
                error(lineNo, std::string("expected: ") + usage);
                return false;
            }
            return true;
        };
        if (key == "date") {
            if (!arity(1, 1, "date YYYY-MM-DD")) continue;
            s.at = parseDate(w[1]);
            s.dateLine = lineNo;
            if (!s.at) error(lineNo, "'" + w[1] + "' is not a date YYYY-MM-DD");
        } else if (key == "group") {
            if (rest.empty()) error(lineNo, "expected: group NAME");
            s.group = rest;
            s.groupLine = lineNo;
        } else if (key == "rule") {
            if (!arity(1, 1, "rule youngest|eldest")) continue;
            if (const auto r = parseSiblingRule(w[1])) s.rule = *r;
            else error(lineNo, "rule must be youngest or eldest, not '" + w[1] + "'");
        } else if (key == "maturity") {
            if (!arity(1, 1, "maturity YEARS")) continue;
            const auto y = wholeNumber(w[1]);
            if (!y || *y < 0 || *y > 100) error(lineNo, "maturity must be a whole number of years, not '" + w[1] + "'");
            else s.maturityYears = *y;
        } else if (key == "window") {
            if (!arity(1, 1, "window DAYS")) continue;
            const auto d = wholeNumber(w[1]);
            if (!d || *d < 1) error(lineNo, "window must be a positive whole number of days, not '" + w[1] + "'");
            else s.recentDays = *d;
        } else if (key == "newborns") {
            if (!arity(1, 1, "newborns adult|infant")) continue;
            if (w[1] == "adult") s.newbornsAsAdults = true;
            else if (w[1] == "infant") s.newbornsAsAdults = false;
            else error(lineNo, "newborns must be adult or infant, not '" + w[1] + "'");
        } else if (key == "matrilines") {
            if (w.size() < 2) error(lineNo, "expected: matrilines MATRIARCH [MATRIARCH ...]");
            s.matrilineOrder.assign(w.begin() + 1, w.end());
            s.matrilineOrderLine = lineNo;
        } else if (key == "remove") {
            if (!arity(1, 1, "remove ANIMAL")) continue;
            ScenarioChange c;
            c.kind = ScenarioChange::Kind::Remove;
            c.animal = w[1];
            c.line = lineNo;
            s.changes.push_back(std::move(c));
        } else if (key == "birth") {
            if (!arity(2, 3, "birth MOTHER F|M|U [NEW_ID]")) continue;
            const auto sex = parseSex(w[2]);
            if (!sex) {
                error(lineNo, "sex must be F, M or U, not '" + w[2] + "'");
                continue;
            }
            ScenarioChange c;
            c.kind = ScenarioChange::Kind::Birth;
            c.animal = w[1];
            c.sex = *sex;
            if (w.size() == 4) c.newId = w[3];
            c.line = lineNo;
            s.changes.push_back(std::move(c));
        } else if (key == "introduce") {
            if (!arity(1, 1, "introduce NEW_ID")) continue;
            ScenarioChange c;
            c.kind = ScenarioChange::Kind::Introduce;
            c.animal = w[1];
            c.line = lineNo;
            s.changes.push_back(std::move(c));
        } else if (key == "split") {
            const size_t arrow = rest.find("->");
            if (arrow == std::string::npos) {
                error(lineNo, "expected: split MATRIARCH [MATRIARCH ...] -> GROUP");
                continue;
            }
            ScenarioChange c;
            c.kind = ScenarioChange::Kind::Split;
            c.matriarchs = words(std::string_view(rest).substr(0, arrow));
            c.toGroup = std::string(trim(std::string_view(rest).substr(arrow + 2)));
            c.line = lineNo;
            if (c.matriarchs.empty() || c.toGroup.empty()) {
                error(lineNo, "expected: split MATRIARCH [MATRIARCH ...] -> GROUP");
                continue;
            }
            s.changes.push_back(std::move(c));
        } else {
            error(lineNo, "unknown directive '" + key +
                              "' (expected date, group, rule, maturity, window, newborns, matrilines, remove, birth, "
                              "introduce or split)");
        }
    }
    if (!result.errors.empty()) return result;
    for (const ScenarioProblem& p : check(s)) error(p.line, p.message);
    if (result.errors.empty()) result.scenario = std::move(s);
    return result;
}

} // namespace

ScenarioFileResult parseScenarioText(std::string_view text, const std::string& file, const Colony& colony,
                                     const Scenario& defaults)
{
    return parseChecked(text, file, defaults, [&](const Scenario& s) { return checkScenario(colony, s); });
}

ScenarioFileResult parseScenarioText(std::string_view text, const std::string& file,
                                     const CompactEncounters& encounters, const Colony& pedigree,
                                     const Scenario& defaults)
{
    return parseChecked(text, file, defaults,
                        [&](const Scenario& s) { return checkScenario(encounters, pedigree, s); });
}

std::string formatScenarioText(const Scenario& s)
{
    std::ostringstream out;
    if (s.at) out << "date " << formatDate(*s.at) << "\n";
    if (!s.group.empty()) out << "group " << s.group << "\n";
    out << "rule " << toString(s.rule) << "\n";
    out << "maturity " << s.maturityYears << "\n";
    out << "window " << s.recentDays << "\n";
    out << "newborns " << (s.newbornsAsAdults ? "adult" : "infant") << "\n";
    if (!s.matrilineOrder.empty()) {
        out << "matrilines";
        for (const std::string& m : s.matrilineOrder) out << ' ' << m;
        out << "\n";
    }
    for (const ScenarioChange& c : s.changes) {
        switch (c.kind) {
        case ScenarioChange::Kind::Remove: out << "remove " << c.animal << "\n"; break;
        case ScenarioChange::Kind::Birth:
            out << "birth " << c.animal << ' ' << toString(c.sex);
            if (!c.newId.empty()) out << ' ' << c.newId;
            out << "\n";
            break;
        case ScenarioChange::Kind::Introduce: out << "introduce " << c.animal << "\n"; break;
        case ScenarioChange::Kind::Split:
            out << "split";
            for (const std::string& m : c.matriarchs) out << ' ' << m;
            out << " -> " << c.toGroup << "\n";
            break;
        }
    }
    return out.str();
}

ScenarioFileResult readScenarioFile(const std::string& path, const Colony& colony, const Scenario& defaults)
{
    std::ifstream in(path, std::ios::binary);
    if (!in) {
        ScenarioFileResult r;
        r.errors.push_back(path + ": cannot be read");
        return r;
    }
    std::ostringstream text;
    text << in.rdbuf();
    return parseScenarioText(text.str(), path, colony, defaults);
}

} // namespace hierloom::core
