// Delaunay refinement after Ruppert (1995) with Chew's circumcentre insertion
// in a constrained triangulation (Chew 1989; Shewchuk 2002, "Delaunay
// refinement algorithms for triangular mesh generation"): split every
// encroached boundary segment at its midpoint on the true curve, and replace
// every triangle that is too large for the size field or has an angle below
// the target by its circumcentre, unless that point would encroach a segment.
#include "mesh/refine.hpp"

#include "core/error.hpp"

#include <algorithm>
#include <cmath>
#include <deque>
#include <numbers>

namespace lapwing::mesh::detail {

namespace {

using geometry::Curve;
using geometry::CurveKind;

// A triangle edge of size H splits into quadrilateral edges of H/2.
constexpr double triangle_per_quad = 2.0;
// Target minimum triangle angle: the three quadrilaterals of a triangle with
// angles >= 30° have angles within [30°, 150°] (checked in the tests).
constexpr double min_angle_deg = 30.5;

// Parameters t_0 = 0 < t_1 < … < t_n = 1 spaced so that each step is one
// target triangle edge long: equal increments of ∫ ds / H(s).
std::vector<double> spacing(const Curve& c, const SizeField& size, int fixed_count) {
    std::vector<double> ts;
    if (fixed_count > 0) {
        for (int i = 0; i <= fixed_count; ++i) ts.push_back(static_cast<double>(i) / fixed_count);
        return ts;
    }
    const double len = c.length();
    auto integrate = [&](int m, std::vector<double>& cum) {
        cum.assign(m + 1, 0.0);
        for (int i = 0; i < m; ++i) {
            const double tm = (i + 0.5) / m;
            cum[i + 1] = cum[i] + len / m / (triangle_per_quad * size.at(c.point_at(tm)));
        }
    };
    std::vector<double> cum;
    integrate(64, cum);
    const int m = std::max(64, static_cast<int>(8 * cum.back()));
    if (m > 64) integrate(m, cum);
    int n = std::max(1, static_cast<int>(std::lround(cum.back())));
    if (c.kind == CurveKind::arc) // at most 45° per triangle edge (22.5° per quadrilateral edge)
        n = std::max(
            n, static_cast<int>(std::ceil(std::abs(c.sweep) / (std::numbers::pi / 4) - 1e-9)));
    ts.push_back(0.0);
    int j = 0;
    for (int k = 1; k < n; ++k) {
        const double target = cum.back() * k / n;
        while (cum[j + 1] < target) ++j;
        const double f = (target - cum[j]) / (cum[j + 1] - cum[j]);
        ts.push_back((j + f) / m);
    }
    ts.push_back(1.0);
    return ts;
}

double circumradius(const Point& a, const Point& b, const Point& c) {
    const double la = (b - c).norm(), lb = (c - a).norm(), lc = (a - b).norm();
    const double area2 = std::abs(orient(a, b, c));
    return area2 > 0 ? la * lb * lc / (2.0 * area2) : HUGE_VAL;
}

bool encroaches(const Point& p, const Point& a, const Point& b) {
    return (a - p).dot(b - p) < -1e-12 * (b - a).squaredNorm();
}

} // namespace

TriangleMesh triangulate(const geometry::RegionBoundary& boundary, const SizeField& size,
                         int around) {
    TriangleMesh out{Triangulation(Point::Zero(), Point::Zero()), {}};
    Point lo(HUGE_VAL, HUGE_VAL), hi(-HUGE_VAL, -HUGE_VAL);
    for (const auto& loop : boundary.loops) {
        for (const Point& p : geometry::polyline(loop, 1e-3 * size.smallest())) {
            lo = lo.cwiseMin(p);
            hi = hi.cwiseMax(p);
        }
    }
    out.tri = Triangulation(lo, hi);
    Triangulation& tri = out.tri;
    const double extent = (hi - lo).norm();

    // --- boundary points, loop by loop; every curve end is a vertex. A loop
    // may pass a point twice, or two loops share one (a cut-out touching the
    // outline at a corner): the point is one vertex.
    std::vector<Segment>& segs = tri.segments();
    const double same_point = 1e-9 * std::max(extent, 1.0);
    for (const auto& loop : boundary.loops) {
        const size_t first_segment = segs.size();
        for (size_t k = 0; k < loop.curves.size(); ++k) {
            const Curve& c = loop.curves[k];
            const int curve_id = static_cast<int>(out.curves.size());
            out.curves.push_back(c);
            int fixed = 0;
            if (c.tag.kind == geometry::BoundaryKind::hole && c.kind == CurveKind::arc)
                fixed = static_cast<int>(
                    std::lround(around / 2.0 * std::abs(c.sweep) / (2 * std::numbers::pi)));
            const std::vector<double> ts = spacing(c, size, fixed);
            for (size_t i = 0; i + 1 < ts.size(); ++i) {
                const Point p = c.point_at(ts[i]);
                int v = tri.vertex_at(p, same_point);
                if (v < 0) v = tri.insert(p);
                if (v < 0)
                    throw AnalysisError("mesher: could not insert a boundary point of " +
                                        c.tag.name());
                if (segs.size() > first_segment) segs.back().b = v;
                segs.push_back({v, -1, curve_id, ts[i], ts[i + 1], -1});
            }
        }
        segs.back().b = segs[first_segment].a; // close the loop
    }

    // --- conforming: split segments missing from the triangulation
    for (int pass = 0;; ++pass) {
        bool all_present = true;
        const size_t n = segs.size();
        for (size_t s = 0; s < n; ++s) {
            if (tri.has_edge(segs[s].a, segs[s].b)) continue;
            all_present = false;
            Segment seg = segs[s];
            const double tm = 0.5 * (seg.t0 + seg.t1);
            const int v = tri.insert(out.curves[seg.curve].point_at(tm));
            if (v < 0 || pass > 60)
                throw AnalysisError("mesher: cannot recover the boundary near " +
                                    out.curves[seg.curve].tag.name());
            segs[s].b = v;
            segs[s].t1 = tm;
            segs.push_back({v, seg.b, seg.curve, tm, seg.t1, -1});
        }
        if (all_present) break;
    }
    tri.constrain_and_carve();

    // --- refinement
    const double max_ratio = 1.0 / (2.0 * std::sin(min_angle_deg * std::numbers::pi / 180.0));
    const double min_segment = 1e-4 * size.smallest();
    std::deque<int> seg_queue, tri_queue;
    for (int s = 0; s < static_cast<int>(segs.size()); ++s) seg_queue.push_back(s);
    const auto& tris = tri.triangles();
    for (int t = 0; t < static_cast<int>(tris.size()); ++t)
        if (tris[t].alive) tri_queue.push_back(t);
    const size_t max_points =
        50 * static_cast<size_t>(tri.points().size()) +
        static_cast<size_t>(40.0 * (hi - lo).prod() / std::pow(size.smallest(), 2)) + 10000;
    const auto pts = [&](int v) -> const Point& { return tri.points()[v]; };

    const auto queue_new = [&]() {
        for (int t : tri.new_triangles()) {
            tri_queue.push_back(t);
            for (int e = 0; e < 3; ++e)
                if (tris[t].seg[e] >= 0) seg_queue.push_back(tris[t].seg[e]);
        }
    };
    const auto split_segment = [&](int s) {
        const Segment seg = segs[s];
        if ((pts(seg.b) - pts(seg.a)).norm() < min_segment) return false;
        const double tm = 0.5 * (seg.t0 + seg.t1);
        if (tri.insert_constrained(out.curves[seg.curve].point_at(tm), seg.tri, s, tm) < 0)
            return false;
        queue_new();
        return true;
    };
    const auto segment_encroached = [&](int s) {
        const Segment& seg = segs[s];
        const Triangle& t = tris[seg.tri];
        for (int k = 0; k < 3; ++k) {
            const int v = t.v[k];
            if (v != seg.a && v != seg.b) return encroaches(pts(v), pts(seg.a), pts(seg.b));
        }
        return false;
    };

    std::vector<int> cavity_segs;
    while (!seg_queue.empty() || !tri_queue.empty()) {
        if (tri.points().size() > max_points) break; // safety net; quality figures will show it
        if (!seg_queue.empty()) {
            const int s = seg_queue.front();
            seg_queue.pop_front();
            if (segment_encroached(s)) split_segment(s);
            continue;
        }
        const int t = tri_queue.front();
        tri_queue.pop_front();
        if (!tris[t].alive) continue;
        const Triangle tr = tris[t];
        const Point &a = pts(tr.v[0]), &b = pts(tr.v[1]), &c = pts(tr.v[2]);
        const double r = circumradius(a, b, c);
        const double shortest = std::min({(a - b).norm(), (b - c).norm(), (c - a).norm()});
        const double h = triangle_per_quad * size.at((a + b + c) / 3.0);
        const bool too_big = r > h / std::sqrt(3.0);
        const bool skinny = r > max_ratio * shortest && r > 0.05 * h;
        if (!too_big && !skinny) continue;
        const Point cc = circumcentre(a, b, c);
        int blocked = -1;
        const int host = tri.locate(cc, t, &blocked);
        if (host < 0) {
            if (blocked >= 0 && split_segment(blocked)) tri_queue.push_back(t);
            continue;
        }
        tri.cavity_segments(cc, host, cavity_segs);
        bool split_any = false;
        for (int s : cavity_segs) {
            if (encroaches(cc, pts(segs[s].a), pts(segs[s].b)) && split_segment(s))
                split_any = true;
        }
        if (split_any) {
            tri_queue.push_back(t);
            continue;
        }
        // A circumcentre on top of an existing vertex (round-off) is skipped.
        const Triangle& ht = tris[host];
        bool duplicate = false;
        for (int k = 0; k < 3; ++k) duplicate |= (pts(ht.v[k]) - cc).norm() < 1e-9 * extent;
        if (duplicate) continue;
        if (tri.insert_constrained(cc, host, -1, 0.0) >= 0) queue_new();
    }
    return out;
}

} // namespace lapwing::mesh::detail
