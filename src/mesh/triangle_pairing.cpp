// Greedy best-first pairing of triangles, then augmenting paths that move an
// unpaired triangle through paired ones until it meets another unpaired one
// (the alternating paths of matching theory; Edmonds 1965 adds blossoms for
// the general case, which this search does without).
#include "mesh/triangle_pairing.hpp"

#include <algorithm>
#include <array>
#include <cmath>

namespace lapwing::mesh::detail {

double polygon_split_score(std::span<const Point> p, std::span<const Point> edge_point) {
    const size_t n = p.size();
    Point o = Point::Zero();
    for (const Point& x : p) o += x;
    o /= static_cast<double>(n);
    double worst = 1.0;
    for (size_t k = 0; k < n; ++k) {
        const std::array<Point, 4> q{p[k], edge_point[k], o, edge_point[(k + n - 1) % n]};
        double lo = HUGE_VAL, hi = -HUGE_VAL, sine = 1.0;
        for (int c = 0; c < 4; ++c) {
            const Point a = q[(c + 1) % 4] - q[c], b = q[(c + 3) % 4] - q[c];
            const double cr = a.x() * b.y() - a.y() * b.x();
            lo = std::min(lo, cr);
            hi = std::max(hi, cr);
            sine = std::min(sine, cr / (a.norm() * b.norm()));
        }
        if (hi <= 0) return -1.0;
        if (sine < 0.5) return -1.0; // an angle outside [30°, 150°]
        worst = std::min(worst, lo / hi);
    }
    return worst;
}

namespace {

// Split point of the edge opposite v[e] of triangle t: its midpoint, or
// the curve point at the segment's middle parameter.
Point edge_point(const Triangulation& tri, const std::vector<geometry::Curve>& curves, int t,
                 int e) {
    const auto& T = tri.triangles()[t];
    if (T.seg[e] >= 0) {
        const Segment& s = tri.segments()[T.seg[e]];
        return curves[s.curve].point_at(0.5 * (s.t0 + s.t1));
    }
    return 0.5 * (tri.points()[T.v[(e + 1) % 3]] + tri.points()[T.v[(e + 2) % 3]]);
}

// Score of merging t with its neighbour across the edge opposite v[e]:
// quadrilateral (v_e, v_e+1, w, v_e+2), w the neighbour's far vertex.
double merge_score(const Triangulation& tri, const std::vector<geometry::Curve>& curves, int t,
                   int e) {
    const auto& T = tri.triangles()[t];
    const int u = T.nbr[e];
    const auto& U = tri.triangles()[u];
    int w = 0;
    while (U.nbr[w] != t) ++w;
    const int a = T.v[(e + 1) % 3], b = T.v[(e + 2) % 3];
    int ua = 0, ub = 0;
    while (U.v[ua] != a) ++ua;
    while (U.v[ub] != b) ++ub;
    const auto& P = tri.points();
    const std::array<Point, 4> corners{P[T.v[e]], P[a], P[U.v[w]], P[b]};
    const std::array<Point, 4> splits{
        edge_point(tri, curves, t, (e + 2) % 3), edge_point(tri, curves, u, ub),
        edge_point(tri, curves, u, ua), edge_point(tri, curves, t, (e + 1) % 3)};
    return polygon_split_score(corners, splits);
}

} // namespace

Pairing pair_triangles(const Triangulation& tri, const std::vector<geometry::Curve>& curves) {
    const auto& tris = tri.triangles();
    const int n = static_cast<int>(tris.size());
    Pairing p{std::vector<int>(n, -1), std::vector<int>(n, -1)};
    // A merge is worth it only if the split quadrilateral beats a split
    // triangle clearly.
    constexpr double min_score = 0.35;
    struct Candidate {
        double score;
        int t, e;
    };
    std::vector<Candidate> cands;
    std::vector<double> score_of(3 * static_cast<size_t>(n), -1.0);
    for (int t = 0; t < n; ++t) {
        if (!tris[t].alive) continue;
        for (int e = 0; e < 3; ++e) {
            const int u = tris[t].nbr[e];
            if (u < 0 || tris[t].seg[e] >= 0) continue;
            const double s = merge_score(tri, curves, t, e);
            score_of[3 * t + e] = s;
            if (u > t && s >= min_score) cands.push_back({s, t, e});
        }
    }
    std::sort(cands.begin(), cands.end(), [](const Candidate& a, const Candidate& b) {
        return a.score != b.score ? a.score > b.score : a.t != b.t ? a.t < b.t : a.e < b.e;
    });
    const auto link = [&](int t, int e) {
        const int u = tris[t].nbr[e];
        int w = 0;
        while (tris[u].nbr[w] != t) ++w;
        p.partner[t] = u, p.partner_edge[t] = e;
        p.partner[u] = t, p.partner_edge[u] = w;
    };
    for (const Candidate& c : cands) {
        const int u = tris[c.t].nbr[c.e];
        if (p.partner[c.t] < 0 && p.partner[u] < 0) link(c.t, c.e);
    }

    // Augmenting paths: from an unpaired triangle, step to a neighbour across
    // a good edge; if that neighbour is paired, continue from its partner.
    std::vector<int> from(n, -1), via(n, -1), seen(n, -1);
    std::vector<int> queue;
    for (int start = 0; start < n; ++start) {
        if (!tris[start].alive || p.partner[start] >= 0) continue;
        queue.assign(1, start);
        seen[start] = start;
        int found = -1;
        for (size_t qi = 0; qi < queue.size() && qi < 400 && found < 0; ++qi) {
            const int t = queue[qi]; // t is "free" along the path
            for (int e = 0; e < 3 && found < 0; ++e) {
                const int u = tris[t].nbr[e];
                if (u < 0 || score_of[3 * t + e] < min_score || seen[u] == start) continue;
                seen[u] = start;
                from[u] = t, via[u] = e;
                if (p.partner[u] < 0) {
                    found = u;
                } else {
                    const int w = p.partner[u];
                    if (seen[w] == start) continue;
                    seen[w] = start;
                    from[w] = u, via[w] = -1; // reached through the pair (u, w)
                    queue.push_back(w);
                }
            }
        }
        if (found < 0) continue;
        // Flip the path start —e0→ u1 = w1 —e1→ u2 = … —→ found: every
        // unpaired step becomes a pair and every pair is broken.
        int u = found;
        while (true) {
            const int t = from[u];
            const int e = via[u];
            const int old = p.partner[t]; // the triangle t was paired with, -1 at the start
            link(t, e);
            if (t == start) break;
            u = old;
        }
    }
    return p;
}

} // namespace lapwing::mesh::detail
