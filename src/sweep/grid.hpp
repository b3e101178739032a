// What a sweep varies: `--vary KEY=START:STOP:STEP` or `--vary KEY=A,B,C`
// parsed into axes, the grid of every combination (the first axis varies
// slowest), and the shard of it one machine runs.
#pragma once

#include <string>
#include <string_view>
#include <vector>

namespace lapwing::sweep {

struct Axis {
    std::string name;               // as typed, e.g. "t" or "plate.thickness"
    std::string key;                // the --set key: a bare name means parameters.NAME
    std::vector<double> values;     // in the order given (ranges ascending)
    std::vector<std::string> texts; // each value as written into --set
};

// Parses one --vary argument. Throws InputError naming the argument and what
// is wrong (no '=', a step ≤ 0, a stop below the start, a value that is not
// a number, more than max_values values).
Axis parse_axis(std::string_view argument);
inline constexpr int max_values = 100000;

struct Variant {
    int index = 0;                 // position in the full grid, 0-based
    std::vector<int> at;           // value index per axis
    std::vector<double> values;    // value per axis
    std::vector<std::string> sets; // "key=value" per axis, applied after the user's --set
};

// Every combination, first axis slowest. Throws InputError when two axes
// set the same key or the grid exceeds max_values variants.
std::vector<Variant> make_grid(const std::vector<Axis>& axes);

// The folder name of a variant's calc sheet (--reports), from its number and
// values: "07_t-20" or "12_t-12.5_pitch-70", the number zero-padded to the
// width of the grid's size so names sort in variant order. Only letters,
// digits, '.', '+' and '-' are kept from names and values (others become
// '_'), so the name is safe on every common file system; the number makes
// it unique even when two keys differ only in such characters.
std::string variant_folder_name(const std::vector<Axis>& axes, const Variant& variant,
                                size_t grid_size);

// `--shard I/N` (1 ≤ I ≤ N): the variants whose index ≡ I−1 (mod N).
struct Shard {
    int part = 1, of = 1;
};
Shard parse_shard(std::string_view argument); // throws InputError
std::vector<Variant> shard_of(const std::vector<Variant>& grid, Shard shard);

} // namespace lapwing::sweep
