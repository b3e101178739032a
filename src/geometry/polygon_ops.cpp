// Polygon helpers and the region-minus-polygon difference. The difference
// classifies edge pieces rather than walking intersections (the approach of
// Greiner & Hormann 1998 breaks on shared vertices and collinear edges, which
// are common here: a cope drawn flush with the plate edge).
#include "geometry/polygon_ops.hpp"

#include <algorithm>
#include <cmath>

namespace lapwing::geometry {

namespace {
double cross(const Point& a, const Point& b) {
    return a.x() * b.y() - a.y() * b.x();
}
double orient(const Point& a, const Point& b, const Point& c) {
    return cross(b - a, c - a);
}
} // namespace

double polygon_signed_area(const std::vector<Point>& p) {
    double twice = 0.0;
    for (size_t i = 0; i < p.size(); ++i) twice += cross(p[i], p[(i + 1) % p.size()]);
    return 0.5 * twice;
}

double point_segment_distance(const Point& p, const Point& a, const Point& b) {
    const Point d = b - a;
    const double len2 = d.squaredNorm();
    const double t = len2 > 0 ? std::clamp((p - a).dot(d) / len2, 0.0, 1.0) : 0.0;
    return (a + t * d - p).norm();
}

bool segments_intersect(const Point& a, const Point& b, const Point& c, const Point& d,
                        double tol) {
    if (point_segment_distance(a, c, d) <= tol || point_segment_distance(b, c, d) <= tol ||
        point_segment_distance(c, a, b) <= tol || point_segment_distance(d, a, b) <= tol)
        return true;
    const double o1 = orient(a, b, c), o2 = orient(a, b, d);
    const double o3 = orient(c, d, a), o4 = orient(c, d, b);
    return ((o1 > 0) != (o2 > 0)) && ((o3 > 0) != (o4 > 0));
}

double segment_segment_distance(const Point& a, const Point& b, const Point& c, const Point& d) {
    if (segments_intersect(a, b, c, d, 0.0)) return 0.0;
    return std::min({point_segment_distance(a, c, d), point_segment_distance(b, c, d),
                     point_segment_distance(c, a, b), point_segment_distance(d, a, b)});
}

bool point_in_polygon(const Point& p, const std::vector<Point>& pts) {
    bool inside = false;
    for (size_t i = 0, j = pts.size() - 1; i < pts.size(); j = i++) {
        const Point& a = pts[i];
        const Point& b = pts[j];
        if ((a.y() > p.y()) != (b.y() > p.y())) {
            const double x = a.x() + (p.y() - a.y()) * (b.x() - a.x()) / (b.y() - a.y());
            if (p.x() < x) inside = !inside;
        }
    }
    return inside;
}

std::optional<std::pair<int, int>> self_intersection(const std::vector<Point>& p, double tol) {
    const int n = static_cast<int>(p.size());
    for (int i = 0; i < n; ++i) {
        const Point &a = p[i], &b = p[(i + 1) % n];
        for (int j = i + 1; j < n; ++j) {
            const Point &c = p[j], &d = p[(j + 1) % n];
            const bool adjacent = (j == i + 1) || (i == 0 && j == n - 1);
            if (adjacent) {
                // Adjacent edges share a vertex; they are bad only if they fold
                // back (collinear, pointing at each other).
                const Point shared = (j == i + 1) ? b : a;
                const Point u = ((j == i + 1) ? a : b) - shared;
                const Point v = ((j == i + 1) ? d : c) - shared;
                if (std::abs(cross(u, v)) <= tol * std::max(u.norm(), v.norm()) && u.dot(v) > 0)
                    return std::pair{i, j};
                continue;
            }
            if (n == 3) continue;
            if (segments_intersect(a, b, c, d, tol)) return std::pair{i, j};
        }
    }
    return std::nullopt;
}

namespace {

struct Piece {
    Point a, b;
    BoundaryTag tag;
    int a_vertex = -1; // outline vertex at a, if any
};

// Parameters along ab where cd crosses or touches it (including collinear
// overlap end points), within tol.
void cut_parameters(const Point& a, const Point& b, const Point& c, const Point& d, double tol,
                    std::vector<double>& ts) {
    const Point r = b - a, s = d - c;
    const double len = r.norm();
    if (len == 0) return;
    auto param = [&](const Point& q) { return (q - a).dot(r) / (len * len); };
    for (const Point& q : {c, d}) {
        if (point_segment_distance(q, a, b) <= tol) ts.push_back(param(q));
    }
    const double denom = cross(r, s);
    if (std::abs(denom) > 1e-14 * len * s.norm()) {
        const double t = cross(c - a, s) / denom;
        const double u = cross(c - a, r) / denom;
        if (t > 0 && t < 1 && u >= 0 && u <= 1) ts.push_back(t);
    }
}

std::vector<Piece> split_edges(const std::vector<Piece>& edges, const std::vector<Piece>& by,
                               double tol) {
    std::vector<Piece> out;
    for (const Piece& e : edges) {
        std::vector<double> ts{0.0, 1.0};
        for (const Piece& f : by) cut_parameters(e.a, e.b, f.a, f.b, tol, ts);
        std::sort(ts.begin(), ts.end());
        const double len = (e.b - e.a).norm();
        double last = 0.0;
        Point last_point = e.a;
        int last_vertex = e.a_vertex;
        for (double t : ts) {
            if (t <= last || (t - last) * len <= tol) continue;
            if ((1.0 - t) * len <= tol) t = 1.0;
            const Point q = t >= 1.0 ? e.b : Point(e.a + t * (e.b - e.a));
            out.push_back({last_point, q, e.tag, last_vertex});
            last = t;
            last_point = q;
            last_vertex = -1;
            if (t >= 1.0) break;
        }
    }
    return out;
}

bool on_any(const Point& p, const std::vector<Piece>& edges, double tol, Point* direction) {
    for (const Piece& e : edges) {
        if (point_segment_distance(p, e.a, e.b) <= tol) {
            if (direction) *direction = e.b - e.a;
            return true;
        }
    }
    return false;
}

bool inside_region(const Point& p, const std::vector<TaggedLoop>& loops) {
    int count = 0;
    for (const TaggedLoop& l : loops) count += point_in_polygon(p, l.points) ? 1 : 0;
    return count % 2 == 1;
}

} // namespace

std::vector<TaggedLoop> subtract_polygon(const std::vector<TaggedLoop>& region,
                                         const std::vector<Point>& cut,
                                         const std::vector<BoundaryTag>& cut_tags, double tol) {
    std::vector<Piece> region_edges, cut_edges;
    for (const TaggedLoop& l : region) {
        for (size_t i = 0; i < l.points.size(); ++i)
            region_edges.push_back(
                {l.points[i], l.points[(i + 1) % l.points.size()], l.tags[i], l.outline_vertex[i]});
    }
    // The cut's edges run clockwise in the result (region on their left).
    for (size_t j = 0; j < cut.size(); ++j)
        cut_edges.push_back({cut[(j + 1) % cut.size()], cut[j], cut_tags[j], -1});

    const std::vector<Piece> region_pieces = split_edges(region_edges, cut_edges, tol);
    const std::vector<Piece> cut_pieces = split_edges(cut_edges, region_edges, tol);

    std::vector<Piece> kept;
    for (const Piece& e : region_pieces) {
        const Point m = 0.5 * (e.a + e.b);
        Point dir;
        if (on_any(m, cut_edges, tol, &dir)) {
            // Shared boundary: keep it when the cut lies on the other side,
            // i.e. the cut's own edge runs against this edge (its reversed
            // copy, stored here, runs along it).
            if (dir.dot(e.b - e.a) > 0) kept.push_back(e);
        } else if (!point_in_polygon(m, cut)) {
            kept.push_back(e);
        }
    }
    for (const Piece& e : cut_pieces) {
        const Point m = 0.5 * (e.a + e.b);
        if (on_any(m, region_edges, tol, nullptr)) continue;
        if (inside_region(m, region)) kept.push_back(e);
    }

    // Chain the directed pieces into closed loops. At a vertex with several
    // outgoing pieces (the boundary touching itself at a point: a cut-out
    // whose corner touches the outline, or one that pinches the plate) take
    // the sharpest left turn: it stays in the wedge of region the incoming
    // piece bounds, so each loop bounds one connected piece (a cut-out
    // touching the outline from inside opens the outer loop, which then
    // visits the point twice) and a plate pinched into two pieces at a point
    // gives two outer loops.
    std::vector<bool> used(kept.size(), false);
    std::vector<TaggedLoop> loops;
    for (size_t first = 0; first < kept.size(); ++first) {
        if (used[first]) continue;
        TaggedLoop loop;
        size_t cur = first;
        for (size_t guard = 0; guard <= kept.size(); ++guard) {
            used[cur] = true;
            loop.points.push_back(kept[cur].a);
            loop.tags.push_back(kept[cur].tag);
            loop.outline_vertex.push_back(kept[cur].a_vertex);
            const Point end = kept[cur].b;
            const Point in_dir = (kept[cur].b - kept[cur].a).normalized();
            if ((end - kept[first].a).norm() <= tol) break;
            long best = -1;
            double best_turn = -10.0;
            for (size_t k = 0; k < kept.size(); ++k) {
                if (used[k] || (kept[k].a - end).norm() > tol) continue;
                const Point out_dir = (kept[k].b - kept[k].a).normalized();
                const double turn = std::atan2(cross(in_dir, out_dir), in_dir.dot(out_dir));
                if (turn > best_turn) {
                    best_turn = turn;
                    best = static_cast<long>(k);
                }
            }
            if (best < 0) break; // open chain: cannot happen for valid input
            cur = static_cast<size_t>(best);
        }
        // Merge collinear pieces of one original edge.
        TaggedLoop merged;
        const size_t n = loop.points.size();
        for (size_t i = 0; i < n; ++i) {
            const size_t prev = (i + n - 1) % n;
            const Point& p0 = loop.points[prev];
            const Point& p1 = loop.points[i];
            const Point& p2 = loop.points[(i + 1) % n];
            const bool same = loop.tags[prev] == loop.tags[i] && loop.outline_vertex[i] < 0 &&
                              std::abs(orient(p0, p1, p2)) <= tol * (p2 - p0).norm();
            if (same && n > 3) continue;
            merged.points.push_back(p1);
            merged.tags.push_back(loop.tags[i]);
            merged.outline_vertex.push_back(loop.outline_vertex[i]);
        }
        if (merged.points.size() >= 3 && std::abs(polygon_signed_area(merged.points)) > tol * tol)
            loops.push_back(std::move(merged));
    }
    std::stable_sort(loops.begin(), loops.end(), [](const TaggedLoop& x, const TaggedLoop& y) {
        return polygon_signed_area(x.points) > 0 && polygon_signed_area(y.points) <= 0;
    });
    return loops;
}

} // namespace lapwing::geometry
