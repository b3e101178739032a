// Lines and arcs: evaluation, length, exact enclosed area, distance.
#include "geometry/curve.hpp"

#include <algorithm>
#include <cmath>
#include <numbers>

namespace lapwing::geometry {

namespace {
Point polar(const Point& c, double r, double angle) {
    return c + r * Point(std::cos(angle), std::sin(angle));
}
double cross(const Point& a, const Point& b) {
    return a.x() * b.y() - a.y() * b.x();
}
} // namespace

Curve Curve::line(Point a, Point b, BoundaryTag tag) {
    Curve c;
    c.kind = CurveKind::line;
    c.start = a;
    c.end = b;
    c.tag = tag;
    return c;
}

Curve Curve::arc(Point centre, double radius, double start_angle, double sweep, BoundaryTag tag) {
    Curve c;
    c.kind = CurveKind::arc;
    c.centre = centre;
    c.radius = radius;
    c.start_angle = start_angle;
    c.sweep = sweep;
    c.start = polar(centre, radius, start_angle);
    c.end = polar(centre, radius, start_angle + sweep);
    c.tag = tag;
    return c;
}

Point Curve::point_at(double t) const {
    if (t <= 0.0) return start;
    if (t >= 1.0) return end;
    if (kind == CurveKind::line) return (1.0 - t) * start + t * end;
    return polar(centre, radius, start_angle + t * sweep);
}

Point Curve::tangent_at(double t) const {
    if (kind == CurveKind::line) return (end - start).normalized();
    const double a = start_angle + t * sweep;
    const double s = sweep > 0 ? 1.0 : -1.0;
    return s * Point(-std::sin(a), std::cos(a));
}

double Curve::length() const {
    if (kind == CurveKind::line) return (end - start).norm();
    return radius * std::abs(sweep);
}

Curve Curve::reversed() const {
    if (kind == CurveKind::line) return line(end, start, tag);
    Curve c = arc(centre, radius, start_angle + sweep, -sweep, tag);
    c.start = end; // keep the exact shared end points
    c.end = start;
    return c;
}

double signed_area(const BoundaryLoop& loop) {
    // Green's theorem: A = ½∮(x dy − y dx). A line contributes ½ a×b; an arc
    // contributes ½ r² Δθ plus ½ c×(end − start) (its chord moved to the centre).
    double twice = 0.0;
    for (const Curve& c : loop.curves) {
        if (c.kind == CurveKind::line) {
            twice += cross(c.start, c.end);
        } else {
            twice += c.radius * c.radius * c.sweep + cross(c.centre, c.end - c.start);
        }
    }
    return 0.5 * twice;
}

double distance_to_curve(const Curve& c, const Point& p) {
    if (c.kind == CurveKind::line) {
        const Point d = c.end - c.start;
        const double len2 = d.squaredNorm();
        const double t = len2 > 0 ? std::clamp((p - c.start).dot(d) / len2, 0.0, 1.0) : 0.0;
        return (c.start + t * d - p).norm();
    }
    // Nearest point on the full circle, if its angle lies within the sweep;
    // otherwise the nearer end point.
    const Point v = p - c.centre;
    double best = std::min((p - c.start).norm(), (p - c.end).norm());
    if (v.norm() > 0) {
        const double two_pi = 2.0 * std::numbers::pi;
        double a = std::atan2(v.y(), v.x()) - c.start_angle;
        if (c.sweep < 0) a = -a;
        a = std::fmod(a, two_pi);
        if (a < 0) a += two_pi;
        if (a <= std::abs(c.sweep)) best = std::min(best, std::abs(v.norm() - c.radius));
    }
    return best;
}

std::vector<Point> polyline(const BoundaryLoop& loop, double sagitta) {
    std::vector<Point> out;
    for (const Curve& c : loop.curves) {
        int n = 1;
        if (c.kind == CurveKind::arc) {
            // Sagitta of a chord spanning angle φ is r(1 − cos φ/2).
            const double s = std::clamp(sagitta / c.radius, 1e-12, 1.0);
            const double phi = 2.0 * std::acos(1.0 - s);
            n = std::max(4, static_cast<int>(std::ceil(std::abs(c.sweep) / phi)));
            n = std::min(n, 4096);
        }
        for (int i = 0; i < n; ++i) out.push_back(c.point_at(static_cast<double>(i) / n));
    }
    return out;
}

} // namespace lapwing::geometry
