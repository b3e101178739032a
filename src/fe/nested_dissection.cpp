// Recursive coordinate bisection with vertex separators taken from the graph.
#include "fe/nested_dissection.hpp"

#include <algorithm>
#include <numbers>
#include <numeric>
#include <stdexcept>
#include <utility>

namespace lapwing::fe {

std::vector<int> coordinate_dissection_sets(const AdjacencyGraph& g, std::span<const Vector2> xy,
                                            int leaf_size) {
    const int n = g.n;
    if (static_cast<int>(xy.size()) != n)
        throw std::invalid_argument("coordinate_dissection_sets: one position per vertex needed");
    leaf_size = std::max(leaf_size, 1);
    // The vertices, kept so that every part still to dissect is a contiguous range.
    std::vector<int> v(static_cast<size_t>(n));
    std::iota(v.begin(), v.end(), 0);
    // depth[u]: -1 for a leaf vertex, else the depth of the separator holding u.
    std::vector<int> depth(static_cast<size_t>(n), -1);
    // side[u]: the stamp of the half u belongs to in the current split; a
    // neighbour with any other stamp lies outside the part being cut.
    std::vector<int> side(static_cast<size_t>(n), -1);
    std::vector<char> touches(static_cast<size_t>(n), 0);
    int stamp = 0, depth_max = -1;

    struct Part {
        int begin, end, depth;
    };
    std::vector<Part> stack{{0, n, 0}};
    while (!stack.empty()) {
        const Part p = stack.back();
        stack.pop_back();
        if (p.end - p.begin <= leaf_size) continue;
        const auto first = v.begin() + p.begin, last = v.begin() + p.end;
        // Splits the part at the median along `dir`, marks the vertices of
        // each half that touch the other half, and returns the smaller
        // count (the separator's size) with the split point; {-1, last}
        // when the vertices do not spread along `dir`.
        long count_a = 0, count_b = 0;
        Vector2 lo = xy[static_cast<size_t>(*first)], hi = lo;
        for (auto it = first; it != last; ++it) {
            lo = lo.cwiseMin(xy[static_cast<size_t>(*it)]);
            hi = hi.cwiseMax(xy[static_cast<size_t>(*it)]);
        }
        const double extent = (hi - lo).norm();
        const auto cut = [&](const Vector2& dir) -> std::pair<long, decltype(first)> {
            const auto coord = [&](int u) { return xy[static_cast<size_t>(u)].dot(dir); };
            const auto mid = first + (p.end - p.begin) / 2;
            std::nth_element(first, mid, last, [&](int a, int b) { return coord(a) < coord(b); });
            // Vertices on the median line go wholly to one side, so a row of
            // nodes on an element edge is not split between the halves.
            // A mapped grid puts a row's nodes at coordinates equal only to
            // round-off, hence the tolerance (relative to the part's extent).
            const double c = coord(*mid);
            const double tol = 1e-9 * extent;
            auto split = std::partition(first, last, [&](int u) { return coord(u) <= c + tol; });
            if (split == last)
                split = std::partition(first, last, [&](int u) { return coord(u) < c - tol; });
            if (split == first) return {-1, last};
            const int stamp_a = ++stamp, stamp_b = ++stamp;
            for (auto it = first; it != last; ++it)
                side[static_cast<size_t>(*it)] = it < split ? stamp_a : stamp_b;
            count_a = count_b = 0;
            for (auto it = first; it != last; ++it) {
                const int u = *it;
                const int other = it < split ? stamp_b : stamp_a;
                char t = 0;
                for (int k = g.start[static_cast<size_t>(u)];
                     k < g.start[static_cast<size_t>(u) + 1]; ++k)
                    if (side[static_cast<size_t>(g.adj[static_cast<size_t>(k)])] == other) {
                        t = 1;
                        break;
                    }
                touches[static_cast<size_t>(u)] = t;
                (it < split ? count_a : count_b) += t;
            }
            return {std::min(count_a, count_b), split};
        };
        // Eight cut directions, 22.5° apart: the one with the fewest
        // separator vertices follows the mesh lines best (a mapped mesh
        // around a hole is cut well along a radius, not along an axis).
        static constexpr double h = std::numbers::sqrt2 / 2;
        static constexpr double c1 = 0.92387953251128674, s1 = 0.38268343236508978; // 22.5°
        static const Vector2 directions[] = {{1, 0},   {0, 1},   {h, h},    {h, -h},
                                             {c1, s1}, {s1, c1}, {c1, -s1}, {s1, -c1}};
        int best = -1;
        long best_count = 0;
        for (int d = 0; d < 8; ++d) {
            const long count = cut(directions[d]).first;
            if (count >= 0 && (best < 0 || count < best_count)) best = d, best_count = count;
        }
        if (best < 0) continue; // every vertex at one point: keep as a leaf
        const auto split = cut(directions[best]).second;
        // The smaller boundary is the separator; the rest of its half is a part.
        const bool separator_in_a = count_a <= count_b;
        const auto is_sep = [&](int u) { return touches[static_cast<size_t>(u)] != 0; };
        Part a{p.begin, static_cast<int>(split - v.begin()), p.depth + 1};
        Part b{a.end, p.end, p.depth + 1};
        if (separator_in_a) {
            const auto s = std::stable_partition(first, split, [&](int u) { return !is_sep(u); });
            for (auto it = s; it != split; ++it) depth[static_cast<size_t>(*it)] = p.depth;
            a.end = static_cast<int>(s - v.begin());
        } else {
            const auto s = std::stable_partition(split, last, is_sep);
            for (auto it = split; it != s; ++it) depth[static_cast<size_t>(*it)] = p.depth;
            b.begin = static_cast<int>(s - v.begin());
        }
        if (count_a + count_b > 0) depth_max = std::max(depth_max, p.depth);
        stack.push_back(a);
        stack.push_back(b);
    }
    std::vector<int> sets(static_cast<size_t>(n), 0);
    for (int u = 0; u < n; ++u)
        if (depth[static_cast<size_t>(u)] >= 0)
            sets[static_cast<size_t>(u)] = depth_max + 1 - depth[static_cast<size_t>(u)];
    return sets;
}

} // namespace lapwing::fe
