// Writing, reading and merging sweep.csv.
#include "sweep/csv.hpp"

#include "core/error.hpp"

#include <algorithm>
#include <charconv>
#include <fmt/format.h>
#include <map>

namespace lapwing::sweep {

namespace {

std::string ratio_text(double r) {
    return fmt::format("{}", r); // shortest round-trip form (fmt ≥ 7)
}

[[noreturn]] void bad(std::string_view name, int line, const std::string& why) {
    Diagnostic d;
    d.file = std::string(name);
    d.line = line;
    d.message = why;
    throw InputError(d);
}

} // namespace

std::string csv_header(const std::vector<Axis>& axes, bool with_reports) {
    std::string out = "variant";
    for (const Axis& a : axes) out += "," + csv_field(a.name);
    out += ",built,passes,governing_ratio,governing_check,governing_family";
    for (check::Family f : check::all_families) out += std::string(",") + check::word(f);
    return out + (with_reports ? ",error,report\n" : ",error\n");
}

std::string csv_row(const std::vector<Axis>& axes, const Variant& v, const VariantResult& r,
                    bool with_reports) {
    std::string out = std::to_string(v.index + 1);
    for (size_t k = 0; k < axes.size(); ++k)
        out += "," + csv_field(axes[k].texts[static_cast<size_t>(v.at[k])]);
    out += r.built ? ",yes" : ",no";
    out += r.built ? (r.passes ? ",yes" : ",no") : ",";
    if (r.built && r.has_ratio)
        out += "," + ratio_text(r.governing_ratio) + "," + csv_field(r.governing_id) + "," +
               r.governing_family;
    else
        out += ",,,";
    for (const auto& ratio : r.family_ratio) out += "," + (ratio ? ratio_text(*ratio) : "");
    out += "," + csv_field(r.error);
    if (with_reports)
        out +=
            "," + csv_field(r.report_error.empty() ? r.report : "not written: " + r.report_error);
    return out + "\n";
}

CsvTable parse_sweep_csv(std::string_view text, std::string_view name) {
    CsvTable table;
    int line_no = 0;
    size_t start = 0;
    if (text.empty()) bad(name, 0, "is empty, not a sweep CSV");
    while (start < text.size()) {
        // A quoted field may hold a line end: find the end of the record.
        size_t end = start;
        bool quoted = false;
        while (end < text.size() && (quoted || text[end] != '\n')) {
            if (text[end] == '"') quoted = !quoted;
            ++end;
        }
        std::string line(text.substr(start, end - start));
        if (!line.empty() && line.back() == '\r') line.pop_back();
        ++line_no;
        start = end + 1;
        if (line.empty()) continue;
        if (line_no == 1) {
            if (!line.starts_with("variant,") ||
                line.find(",governing_ratio,") == std::string::npos)
                bad(name, 1, "the first line is not a lapwing sweep header (variant,...)");
            table.header = line;
            continue;
        }
        int variant = 0;
        const auto comma = line.find(',');
        const auto [p, ec] = std::from_chars(line.data(), line.data() + line.find(','), variant);
        if (comma == std::string::npos || ec != std::errc() || p != line.data() + comma ||
            variant < 1)
            bad(name, line_no, "the row does not start with a variant number");
        table.rows.push_back({variant, line});
    }
    if (table.header.empty()) bad(name, 1, "no header line");
    return table;
}

std::string merge_sweep_csvs(const std::vector<NamedCsv>& shards, int expected_total) {
    if (shards.empty()) throw InputError(Diagnostic{"", 0, 0, "", "merge: no files given", ""});
    std::string header;
    std::string header_from;
    std::map<int, std::pair<std::string, std::string>> rows; // variant → (line, file)
    for (const NamedCsv& s : shards) {
        const CsvTable t = parse_sweep_csv(s.text, s.name);
        if (header.empty()) {
            header = t.header;
            header_from = s.name;
        } else if (t.header != header) {
            bad(s.name, 1,
                fmt::format("its columns differ from those of {}: not shards of one sweep",
                            header_from));
        }
        for (const auto& [variant, line] : t.rows) {
            const auto [it, fresh] = rows.try_emplace(variant, line, s.name);
            if (!fresh)
                bad(s.name, 0,
                    fmt::format("variant {} is also in {}: shards overlap", variant,
                                it->second.second));
        }
    }
    std::string out = header + "\n";
    int expected = 1;
    std::vector<int> missing;
    for (const auto& [variant, row] : rows) {
        for (; expected < variant; ++expected) missing.push_back(expected);
        expected = variant + 1;
        out += row.first + "\n";
    }
    for (; expected <= expected_total; ++expected) missing.push_back(expected);
    if (expected_total > 0 && !rows.empty() && rows.rbegin()->first > expected_total)
        throw InputError(
            Diagnostic{"", 0, 0, "merge --expect",
                       fmt::format("{}: variant {} is beyond the {} expected", expected_total,
                                   rows.rbegin()->first, expected_total),
                       ""});
    if (!missing.empty()) {
        std::string list;
        for (size_t i = 0; i < std::min<size_t>(missing.size(), 10); ++i)
            list += (i ? ", " : "") + std::to_string(missing[i]);
        if (missing.size() > 10) list += fmt::format(" and {} more", missing.size() - 10);
        throw InputError(
            Diagnostic{"", 0, 0, "",
                       fmt::format("merge: variants {} are in none of the files: a shard "
                                   "is missing or was interrupted",
                                   list),
                       ""});
    }
    return out;
}

} // namespace lapwing::sweep
