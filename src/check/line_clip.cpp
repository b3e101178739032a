// Line against lines and arcs: every crossing parameter, then each span
// between crossings classified by the winding number at its middle.
#include "check/line_clip.hpp"

#include <algorithm>
#include <cmath>
#include <numbers>

namespace lapwing::check {

namespace {

using Eigen::Vector2d;
using geometry::Curve;
using geometry::CurveKind;

double cross(const Vector2d& a, const Vector2d& b) {
    return a.x() * b.y() - a.y() * b.x();
}

// Signed angle subtended at p by the straight segment a → b, in (−π, π].
double chord_angle(const Vector2d& a, const Vector2d& b, const Vector2d& p) {
    const Vector2d u = a - p, v = b - p;
    return std::atan2(cross(u, v), u.dot(v));
}

// Signed angle swept by the direction from p to a point travelling along the
// arc. It equals the chord's angle unless p lies in the circular segment
// between the chord and the arc, where the closed loop arc + chord winds once
// round p (in the sense of the sweep). Arcs of more than a quarter-turn are
// split, so that the segment is the part of the disc beyond the chord and the
// centre never lies on a chord.
double arc_angle(const Curve& c, const Vector2d& p) {
    if (std::abs(c.sweep) > 0.5 * std::numbers::pi) {
        const double half = 0.5 * c.sweep;
        return arc_angle(Curve::arc(c.centre, c.radius, c.start_angle, half, c.tag), p) +
               arc_angle(Curve::arc(c.centre, c.radius, c.start_angle + half, half, c.tag), p);
    }
    double angle = chord_angle(c.start, c.end, p);
    const Vector2d mid = c.point_at(0.5);
    const Vector2d chord = c.end - c.start;
    const bool in_disc = (p - c.centre).norm() < c.radius;
    const bool beyond_chord = cross(chord, p - c.start) * cross(chord, mid - c.start) > 0;
    if (in_disc && beyond_chord) angle += (c.sweep > 0 ? 2.0 : -2.0) * std::numbers::pi;
    return angle;
}

// Whether the angle φ (radians) lies on the arc, within `slack` radians.
bool on_arc(const Curve& c, double phi, double slack) {
    const double two_pi = 2.0 * std::numbers::pi;
    double rel = (phi - c.start_angle) * (c.sweep >= 0 ? 1.0 : -1.0);
    rel = std::fmod(rel, two_pi);
    if (rel < 0) rel += two_pi;
    const double span = std::abs(c.sweep);
    return rel <= span + slack || rel >= two_pi - slack;
}

void crossings(const Curve& c, const Vector2d& origin, const Vector2d& d, double tol,
               std::vector<double>& out) {
    if (c.kind == CurveKind::line) {
        const Vector2d e = c.end - c.start;
        const double len = e.norm();
        const double denom = cross(d, e);
        const Vector2d w = c.start - origin;
        if (std::abs(denom) <= 1e-12 * len) {
            // Parallel: only a collinear edge matters, through both its ends.
            if (std::abs(cross(d, w)) <= tol) {
                out.push_back(w.dot(d));
                out.push_back((c.end - origin).dot(d));
            }
            return;
        }
        const double t = cross(w, d) / denom;
        if (t < -tol / len || t > 1 + tol / len) return;
        out.push_back(cross(w, e) / denom);
        return;
    }
    // |origin + s d − centre|² = r²  ⇒  s² + 2 b s + q = 0.
    const Vector2d w = origin - c.centre;
    const double b = w.dot(d), q = w.squaredNorm() - c.radius * c.radius;
    const double disc = b * b - q;
    if (disc < -2.0 * tol * c.radius) return;
    const double root = std::sqrt(std::max(disc, 0.0));
    for (const double s : {-b - root, -b + root}) {
        const Vector2d x = origin + s * d - c.centre;
        if (on_arc(c, std::atan2(x.y(), x.x()), tol / c.radius)) out.push_back(s);
    }
}

} // namespace

int winding_number(const geometry::RegionBoundary& boundary, const Vector2d& p) {
    double total = 0;
    for (const auto& loop : boundary.loops)
        for (const Curve& c : loop.curves)
            total += c.kind == CurveKind::line ? chord_angle(c.start, c.end, p) : arc_angle(c, p);
    return static_cast<int>(std::lround(total / (2.0 * std::numbers::pi)));
}

std::vector<Interval> pieces_inside(const geometry::RegionBoundary& boundary,
                                    const Vector2d& origin, const Vector2d& direction, double s_min,
                                    double s_max, double tolerance) {
    std::vector<double> s{s_min, s_max};
    for (const auto& loop : boundary.loops)
        for (const Curve& c : loop.curves) crossings(c, origin, direction, tolerance, s);
    std::erase_if(s, [&](double v) { return v < s_min || v > s_max; });
    std::sort(s.begin(), s.end());

    std::vector<Interval> out;
    for (size_t i = 0; i + 1 < s.size(); ++i) {
        const double a = s[i], b = s[i + 1];
        if (b - a <= tolerance) continue;
        const Vector2d mid = origin + 0.5 * (a + b) * direction;
        if (winding_number(boundary, mid) <= 0) continue;
        if (!out.empty() && a - out.back().end <= tolerance)
            out.back().end = b; // a touching point or a collinear edge's end: no gap
        else
            out.push_back({a, b});
    }
    return out;
}

} // namespace lapwing::check
