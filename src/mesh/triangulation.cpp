// Bowyer–Watson insertion with a visibility walk for point location (Devillers,
// Pion & Teillaud 2002) and cavities that stop at constrained segments, so the
// result is a constrained Delaunay triangulation (Chew 1989).
#include "mesh/triangulation.hpp"

#include "core/error.hpp"

#include <algorithm>
#include <cmath>

namespace lapwing::mesh::detail {

double orient(const Point& a, const Point& b, const Point& c) {
    return (b.x() - a.x()) * (c.y() - a.y()) - (b.y() - a.y()) * (c.x() - a.x());
}

// > 0 when d lies inside the circle through the counter-clockwise a, b, c.
double incircle(const Point& a, const Point& b, const Point& c, const Point& d) {
    const double adx = a.x() - d.x(), ady = a.y() - d.y();
    const double bdx = b.x() - d.x(), bdy = b.y() - d.y();
    const double cdx = c.x() - d.x(), cdy = c.y() - d.y();
    const double ad = adx * adx + ady * ady, bd = bdx * bdx + bdy * bdy, cd = cdx * cdx + cdy * cdy;
    return adx * (bdy * cd - bd * cdy) - ady * (bdx * cd - bd * cdx) + ad * (bdx * cdy - bdy * cdx);
}

Point circumcentre(const Point& a, const Point& b, const Point& c) {
    const Point ab = b - a, ac = c - a;
    const double d = 2.0 * (ab.x() * ac.y() - ab.y() * ac.x());
    const double ab2 = ab.squaredNorm(), ac2 = ac.squaredNorm();
    return a + Point(ac.y() * ab2 - ab.y() * ac2, ab.x() * ac2 - ac.x() * ab2) / d;
}

Triangulation::Triangulation(const Point& lo, const Point& hi) {
    const Point c = 0.5 * (lo + hi);
    const double r = std::max((hi - lo).norm(), 1.0) * 10.0;
    points_ = {c + Point(-2 * r, -r), c + Point(2 * r, -r), c + Point(0.0, 2 * r)};
    vert_tri_ = {0, 0, 0};
    Triangle t;
    t.v = {0, 1, 2};
    t.alive = true;
    tris_.push_back(t);
    mark_.push_back(0);
}

int Triangulation::new_triangle() {
    if (!free_.empty()) {
        const int t = free_.back();
        free_.pop_back();
        tris_[t] = Triangle{};
        tris_[t].alive = true;
        return t;
    }
    tris_.push_back(Triangle{});
    tris_.back().alive = true;
    mark_.push_back(0);
    return static_cast<int>(tris_.size()) - 1;
}

int Triangulation::locate(const Point& p, int start, int* blocked_segment) const {
    int t = (start >= 0 && start < static_cast<int>(tris_.size()) && tris_[start].alive) ? start
                                                                                         : last_;
    if (!tris_[t].alive) {
        for (t = 0; t < static_cast<int>(tris_.size()) && !tris_[t].alive; ++t) {
        }
    }
    const size_t max_steps = tris_.size() + 16;
    for (size_t step = 0; step < max_steps; ++step) {
        const Triangle& tri = tris_[t];
        bool moved = false;
        for (int k = 0; k < 3; ++k) {
            const int e = static_cast<int>((k + step) % 3); // rotate the first edge: no cycles
            const Point& a = points_[tri.v[(e + 1) % 3]];
            const Point& b = points_[tri.v[(e + 2) % 3]];
            // A point on an edge (within round-off) belongs to either side.
            if (orient(a, b, p) < -1e-12 * (b - a).squaredNorm()) {
                if (tri.nbr[e] < 0 || (constrained_ && tri.seg[e] >= 0)) {
                    if (blocked_segment) *blocked_segment = tri.seg[e];
                    return -1;
                }
                t = tri.nbr[e];
                moved = true;
                break;
            }
        }
        if (!moved) return t;
    }
    // The walk failed to converge (round-off): take the triangle that p is
    // least outside of, by the smallest scaled orientation.
    int best = -1;
    double best_score = -HUGE_VAL;
    for (int u = 0; u < static_cast<int>(tris_.size()); ++u) {
        const Triangle& tri = tris_[u];
        if (!tri.alive) continue;
        double score = HUGE_VAL;
        for (int e = 0; e < 3; ++e) {
            const Point& a = points_[tri.v[(e + 1) % 3]];
            const Point& b = points_[tri.v[(e + 2) % 3]];
            score = std::min(score, orient(a, b, p) / (b - a).squaredNorm());
        }
        if (score > best_score) best_score = score, best = u;
    }
    if (best_score > -1e-9) return best;
    if (blocked_segment) *blocked_segment = -1;
    return -1;
}

void Triangulation::grow_cavity(const Point& p, int seed, bool constrained, int split_segment) {
    ++stamp_;
    cavity_.clear();
    cavity_.push_back(seed);
    mark_[seed] = stamp_;
    for (size_t i = 0; i < cavity_.size(); ++i) {
        const Triangle& t = tris_[cavity_[i]];
        for (int e = 0; e < 3; ++e) {
            const int n = t.nbr[e];
            if (n < 0 || mark_[n] == stamp_) continue;
            if (constrained && t.seg[e] >= 0) continue;
            const Triangle& u = tris_[n];
            if (incircle(points_[u.v[0]], points_[u.v[1]], points_[u.v[2]], p) > 0) {
                mark_[n] = stamp_;
                cavity_.push_back(n);
            }
        }
    }
    // Round-off can admit a triangle whose outer edge p cannot see; drop such
    // triangles until the cavity is star-shaped from p.
    for (bool changed = true; changed;) {
        changed = false;
        for (size_t i = 0; i < cavity_.size(); ++i) {
            const int ti = cavity_[i];
            const Triangle& t = tris_[ti];
            for (int e = 0; e < 3; ++e) {
                const int n = t.nbr[e];
                if (n >= 0 && mark_[n] == stamp_) continue;
                if (split_segment >= 0 && t.seg[e] == split_segment) continue;
                const Point& a = points_[t.v[(e + 1) % 3]];
                const Point& b = points_[t.v[(e + 2) % 3]];
                const double scale = (b - a).squaredNorm();
                if (orient(a, b, p) <= 1e-12 * scale) {
                    if (ti == seed) {
                        cavity_.clear();
                        return;
                    }
                    mark_[ti] = stamp_ - 1;
                    cavity_.erase(cavity_.begin() + static_cast<long>(i));
                    changed = true;
                    break;
                }
            }
            if (changed) break;
        }
    }
}

int Triangulation::fill_cavity(const Point& p, int split_segment, double tm) {
    std::vector<Rim>& rim = rim_;
    rim.clear();
    for (int ti : cavity_) {
        const Triangle& t = tris_[ti];
        for (int e = 0; e < 3; ++e) {
            const int n = t.nbr[e];
            if (n >= 0 && mark_[n] == stamp_) continue;
            if (split_segment >= 0 && t.seg[e] == split_segment) continue;
            rim.push_back({t.v[(e + 1) % 3], t.v[(e + 2) % 3], n, t.seg[e]});
        }
    }
    for (int ti : cavity_) {
        tris_[ti].alive = false;
        free_.push_back(ti);
    }
    const int pi = static_cast<int>(points_.size());
    points_.push_back(p);
    vert_tri_.push_back(-1);
    new_tris_.clear();
    for (const Rim& r : rim) {
        const int t = new_triangle();
        Triangle& tri = tris_[t];
        tri.v = {r.a, r.b, pi};
        tri.nbr[2] = r.outer;
        tri.seg[2] = r.seg;
        if (r.outer >= 0) {
            Triangle& o = tris_[r.outer];
            for (int k = 0; k < 3; ++k)
                if (o.v[k] != r.a && o.v[k] != r.b) o.nbr[k] = t;
        }
        if (r.seg >= 0) segs_[r.seg].tri = t;
        vert_tri_[r.a] = t;
        vert_tri_[r.b] = t;
        vert_tri_[pi] = t;
        new_tris_.push_back(t);
    }
    // Link the fan: edge (b, p) meets the triangle starting at b, edge (p, a)
    // the triangle ending at a.
    const size_t n = new_tris_.size();
    for (size_t i = 0; i < n; ++i) {
        Triangle& ti = tris_[new_tris_[i]];
        for (size_t j = 0; j < n; ++j) {
            const Triangle& tj = tris_[new_tris_[j]];
            if (tj.v[0] == ti.v[1]) ti.nbr[0] = new_tris_[j];
            if (tj.v[1] == ti.v[0]) ti.nbr[1] = new_tris_[j];
        }
    }
    if (split_segment >= 0) {
        Segment& s = segs_[split_segment];
        Segment second{pi, s.b, s.curve, tm, s.t1, -1};
        const int s2 = static_cast<int>(segs_.size());
        for (int t : new_tris_) {
            Triangle& tri = tris_[t];
            if (tri.v[1] == s.a) { // (y, a, p): edge (a, p) opposite v[0]
                tri.seg[0] = split_segment;
                s.tri = t;
            }
            if (tri.v[0] == s.b) { // (b, x, p): edge (p, b) opposite v[1]
                tri.seg[1] = s2;
                second.tri = t;
            }
        }
        s.b = pi;
        s.t1 = tm;
        segs_.push_back(second);
    }
    if (!new_tris_.empty()) last_ = new_tris_.back();
    return pi;
}

int Triangulation::insert(const Point& p) {
    const int t = locate(p, last_, nullptr);
    if (t < 0) throw AnalysisError("mesher: a point fell outside the enclosing triangle");
    grow_cavity(p, t, false, -1);
    if (cavity_.empty()) return -1;
    return fill_cavity(p, -1, 0.0);
}

void Triangulation::cavity_segments(const Point& p, int seed, std::vector<int>& segs_out) {
    segs_out.clear();
    grow_cavity(p, seed, true, -1);
    for (int ti : cavity_) {
        const Triangle& t = tris_[ti];
        for (int e = 0; e < 3; ++e) {
            if (t.seg[e] >= 0 && (t.nbr[e] < 0 || mark_[t.nbr[e]] != stamp_))
                segs_out.push_back(t.seg[e]);
        }
    }
}

int Triangulation::insert_constrained(const Point& p, int seed, int split_segment, double tm) {
    grow_cavity(p, seed, true, split_segment);
    if (cavity_.empty()) return -1;
    return fill_cavity(p, split_segment, tm);
}

int Triangulation::vertex_at(const Point& p, double tol) const {
    const int t = locate(p, last_, nullptr);
    if (t < 0) return -1;
    for (int v : tris_[t].v)
        if (v >= 3 && (points_[v] - p).norm() <= tol) return v;
    return -1;
}

bool Triangulation::has_edge(int a, int b) const {
    const int t0 = vert_tri_[a];
    for (int dir = 0; dir < 2; ++dir) {
        int t = t0;
        for (size_t guard = 0; guard < tris_.size(); ++guard) {
            const Triangle& tri = tris_[t];
            int i = 0;
            while (tri.v[i] != a) ++i;
            if (tri.v[(i + 1) % 3] == b || tri.v[(i + 2) % 3] == b) return true;
            const int next = tri.nbr[dir == 0 ? (i + 2) % 3 : (i + 1) % 3];
            if (next < 0) break;
            t = next;
            if (t == t0) return false;
        }
    }
    return false;
}

void Triangulation::constrain_and_carve() {
    // Record each segment on the triangle to its left and on the one to its right.
    for (int s = 0; s < static_cast<int>(segs_.size()); ++s) {
        Segment& seg = segs_[s];
        seg.tri = -1;
        const int t0 = vert_tri_[seg.a];
        for (int dir = 0; dir < 2 && seg.tri < 0; ++dir) {
            int t = t0;
            for (size_t guard = 0; guard < tris_.size(); ++guard) {
                Triangle& tri = tris_[t];
                int i = 0;
                while (tri.v[i] != seg.a) ++i;
                if (tri.v[(i + 1) % 3] == seg.b) { // a → b counter-clockwise: edge opposite v[i+2]
                    const int e = (i + 2) % 3;
                    tri.seg[e] = s;
                    seg.tri = t;
                    if (tri.nbr[e] >= 0) {
                        Triangle& o = tris_[tri.nbr[e]];
                        for (int k = 0; k < 3; ++k)
                            if (o.v[k] != seg.a && o.v[k] != seg.b) o.seg[k] = s;
                    }
                    break;
                }
                const int next = tri.nbr[dir == 0 ? (i + 2) % 3 : (i + 1) % 3];
                if (next < 0 || next == t0) break;
                t = next;
            }
        }
        if (seg.tri < 0)
            throw AnalysisError("mesher: a boundary segment is missing from the triangulation");
    }
    // Inside = reachable from the left of a segment without crossing one.
    ++stamp_;
    std::vector<int> stack;
    for (const Segment& seg : segs_) {
        if (mark_[seg.tri] != stamp_) {
            mark_[seg.tri] = stamp_;
            stack.push_back(seg.tri);
        }
    }
    while (!stack.empty()) {
        const int t = stack.back();
        stack.pop_back();
        const Triangle& tri = tris_[t];
        for (int k = 0; k < 3; ++k) {
            if (tri.v[k] < 3) throw AnalysisError("mesher: the region's boundary is not closed");
        }
        for (int e = 0; e < 3; ++e) {
            const int n = tri.nbr[e];
            if (n < 0 || tri.seg[e] >= 0 || mark_[n] == stamp_) continue;
            mark_[n] = stamp_;
            stack.push_back(n);
        }
    }
    for (int t = 0; t < static_cast<int>(tris_.size()); ++t) {
        if (tris_[t].alive && mark_[t] != stamp_) {
            tris_[t].alive = false;
            free_.push_back(t);
        }
    }
    for (int t = 0; t < static_cast<int>(tris_.size()); ++t) {
        Triangle& tri = tris_[t];
        if (!tri.alive) continue;
        for (int e = 0; e < 3; ++e) {
            if (tri.nbr[e] >= 0 && !tris_[tri.nbr[e]].alive) tri.nbr[e] = -1;
            vert_tri_[tri.v[e]] = t;
        }
        last_ = t;
    }
    std::sort(free_.begin(), free_.end(), std::greater<>()); // reuse low indices first
    constrained_ = true;
}

} // namespace lapwing::mesh::detail
