// sweep.csv: one row per variant (RFC 4180 quoting), in variant order:
//   variant, each varied key, built, passes, governing_ratio, governing_check,
//   governing_family, one ratio column per check family, error, and with
//   --reports a last column `report`: the variant's folder (relative to the
//   sweep's), "not written: WHY" when its files failed, empty when not built
// Ratios are written in the shortest form that reads back to the same
// double, so a merged sweep is byte-identical to a sweep run in one piece.
// `lapwing merge` joins shard files by the variant column.
#pragma once

#include "report/text_format.hpp"
#include "sweep/grid.hpp"
#include "sweep/runner.hpp"

#include <string>
#include <string_view>
#include <vector>

namespace lapwing::sweep {

std::string csv_header(const std::vector<Axis>& axes, bool with_reports = false);
// `values` are written with the axis texts, so 12 stays "12", not "12.0".
std::string csv_row(const std::vector<Axis>& axes, const Variant& variant,
                    const VariantResult& result, bool with_reports = false);

struct CsvTable {
    std::string header;                            // the header line, without its line end
    std::vector<std::pair<int, std::string>> rows; // (variant, the line without its end)
};

// Parses a sweep CSV (named `name` in messages): header, then rows whose
// first field is the variant number. Throws InputError naming the file
// and line.
CsvTable parse_sweep_csv(std::string_view text, std::string_view name);

// Joins shard tables into one, in variant order. Throws InputError when the
// headers differ, a variant appears twice, or a variant between 1 and the
// last (or expected_total, when > 0) is missing.
struct NamedCsv {
    std::string name;
    std::string text;
};
std::string merge_sweep_csvs(const std::vector<NamedCsv>& shards, int expected_total = 0);

// One CSV field, quoted when it holds a comma, a quote or a line end.
using report::csv_field;

} // namespace lapwing::sweep
