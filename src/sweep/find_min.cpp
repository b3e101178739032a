// Bisection for the lightest passing value, with its monotonicity check.
#include "sweep/find_min.hpp"

#include "core/error.hpp"

#include <algorithm>
#include <fmt/format.h>
#include <map>
#include <numeric>

namespace lapwing::sweep {

namespace {

bool passes(const VariantResult& r) {
    return r.built && r.passes;
}

struct Line {
    std::vector<int> order; // grid indices, ascending value of the searched axis
    std::map<int, VariantResult> done;
    int lo = -1, hi = -1; // positions in `order`: lo fails, hi passes
    bool open = true;
    MinimumOnLine result;
};

} // namespace

int axis_index(const std::vector<Axis>& axes, const std::string& param) {
    for (size_t k = 0; k < axes.size(); ++k)
        if (axes[k].name == param || axes[k].key == param) return static_cast<int>(k);
    Diagnostic d;
    d.key_path = "--find-min";
    std::string names;
    for (const Axis& a : axes) names += (names.empty() ? "" : ", ") + a.name;
    d.message =
        fmt::format("{}: not one of the varied keys ({})", param, names.empty() ? "none" : names);
    throw InputError(d);
}

FindMinResult find_min(const std::vector<Axis>& axes, const std::vector<Variant>& grid, int axis,
                       const Evaluate& evaluate) {
    FindMinResult out;
    out.axis = axis;
    const auto a = static_cast<size_t>(axis);

    // Lines: variants that agree on every other axis, in grid order of first appearance.
    std::map<std::vector<int>, size_t> line_of;
    std::vector<Line> lines;
    for (const Variant& v : grid) {
        std::vector<int> others = v.at;
        others.erase(others.begin() + static_cast<long>(a));
        auto [it, fresh] = line_of.try_emplace(others, lines.size());
        if (fresh) {
            lines.emplace_back();
            for (size_t k = 0; k < axes.size(); ++k)
                if (k != a) lines.back().result.others.push_back(v.values[k]);
        }
        lines[it->second].order.push_back(v.index);
    }
    for (Line& line : lines)
        std::stable_sort(line.order.begin(), line.order.end(), [&](int x, int y) {
            return grid[static_cast<size_t>(x)].values[a] < grid[static_cast<size_t>(y)].values[a];
        });

    // Runs a batch of grid indices; false when the run was stopped short.
    auto run = [&](const std::vector<std::pair<size_t, int>>& wanted) {
        std::vector<Variant> batch;
        for (const auto& [l, g] : wanted) batch.push_back(grid[static_cast<size_t>(g)]);
        const std::vector<VariantResult> results = evaluate(batch);
        for (const VariantResult& r : results)
            for (const auto& [l, g] : wanted)
                if (g == r.index) lines[l].done[g] = r;
        return results.size() == batch.size();
    };

    // Round 0: both ends.
    std::vector<std::pair<size_t, int>> wanted;
    for (size_t l = 0; l < lines.size(); ++l) {
        wanted.push_back({l, lines[l].order.front()});
        if (lines[l].order.size() > 1) wanted.push_back({l, lines[l].order.back()});
    }
    bool complete = run(wanted);
    for (Line& line : lines) {
        const int n = static_cast<int>(line.order.size());
        line.lo = 0;
        line.hi = n - 1;
        if (!line.done.count(line.order.front()) || !line.done.count(line.order.back())) {
            line.open = false; // stopped before the ends were run
            line.hi = -1;
            continue;
        }
        const VariantResult& first = line.done.at(line.order.front());
        const VariantResult& last = line.done.at(line.order.back());
        if (passes(first)) {
            line.hi = 0;
            line.open = false;
        } else if (!passes(last) || !first.built) {
            line.open = false; // none passes, or an end did not build: settled by the checks below
            line.hi = -1;
        }
    }
    // Bisection rounds.
    while (complete) {
        wanted.clear();
        for (size_t l = 0; l < lines.size(); ++l) {
            Line& line = lines[l];
            if (!line.open) continue;
            if (line.hi - line.lo <= 1) {
                line.open = false;
                continue;
            }
            wanted.push_back({l, line.order[static_cast<size_t>((line.lo + line.hi) / 2)]});
        }
        if (wanted.empty()) break;
        complete = run(wanted);
        if (!complete) break;
        for (const auto& [l, g] : wanted) {
            Line& line = lines[l];
            const int mid = (line.lo + line.hi) / 2;
            const VariantResult& r = line.done.at(g);
            if (!r.built) {
                line.open = false; // the fallback runs the whole line
            } else if (passes(r)) {
                line.hi = mid;
            } else {
                line.lo = mid;
            }
        }
    }

    // Checks on what was sampled; fallback lines run in one more batch.
    wanted.clear();
    for (size_t l = 0; l < lines.size(); ++l) {
        Line& line = lines[l];
        MinimumOnLine& m = line.result;
        const VariantResult* previous = nullptr;
        double previous_value = 0;
        for (int g : line.order) {
            const auto it = line.done.find(g);
            if (it == line.done.end()) continue;
            const VariantResult& r = it->second;
            const double value = grid[static_cast<size_t>(g)].values[a];
            if (!r.built) {
                m.warning = fmt::format("{} = {} did not build ({})", axes[a].name, value, r.error);
            } else if (previous && r.has_ratio && previous->has_ratio &&
                       r.governing_ratio > previous->governing_ratio * (1 + monotone_tolerance)) {
                m.monotone = false;
                if (m.warning.empty())
                    m.warning = fmt::format(
                        "the governing ratio is not monotone in {}: {:.4g} at {} but {:.4g} at {}",
                        axes[a].name, previous->governing_ratio, previous_value, r.governing_ratio,
                        value);
            }
            if (r.built) previous = &r, previous_value = value;
        }
        m.n_sampled = static_cast<int>(line.done.size());
        if (!m.warning.empty() && complete) {
            m.full_line = true;
            for (int g : line.order)
                if (!line.done.count(g)) wanted.push_back({l, g});
        } else if (line.hi >= 0 && complete) {
            m.smallest =
                grid[static_cast<size_t>(line.order[static_cast<size_t>(line.hi)])].values[a];
        }
    }
    if (!wanted.empty()) complete = run(wanted) && complete;
    for (Line& line : lines) {
        MinimumOnLine& m = line.result;
        if (m.full_line && complete)
            for (int g : line.order)
                if (passes(line.done.at(g))) {
                    m.smallest = grid[static_cast<size_t>(g)].values[a];
                    break;
                }
        m.n_sampled = static_cast<int>(line.done.size());
        for (auto& [g, r] : line.done) out.evaluated.push_back(r);
        out.lines.push_back(std::move(m));
    }
    std::sort(out.evaluated.begin(), out.evaluated.end(),
              [](const VariantResult& x, const VariantResult& y) { return x.index < y.index; });
    return out;
}

} // namespace lapwing::sweep
