// Random plates: each candidate feature is kept only if the region stays
// valid, so the result always passes geometry::validate.
#include "random_plate.hpp"

#include "core/error.hpp"
#include "geometry/polygon_ops.hpp"
#include "geometry/region_boundary.hpp"

#include <algorithm>
#include <cmath>
#include <numbers>
#include <vector>

namespace lapwing::test {

namespace {

using geometry::Point;
constexpr double pi = std::numbers::pi;

// SplitMix64 (Steele, Lea & Flood 2014): tiny, fully specified.
class Rng {
public:
    explicit Rng(std::uint64_t seed) : state_(seed) {}
    std::uint64_t next() {
        std::uint64_t z = (state_ += 0x9e3779b97f4a7c15ULL);
        z = (z ^ (z >> 30)) * 0xbf58476d1ce4e5b9ULL;
        z = (z ^ (z >> 27)) * 0x94d049bb133111ebULL;
        return z ^ (z >> 31);
    }
    double uniform(double a, double b) {
        return a + (b - a) * static_cast<double>(next() >> 11) * 0x1.0p-53;
    }
    int integer(int a, int b) {
        return a + static_cast<int>(next() % static_cast<std::uint64_t>(b - a + 1));
    }
    bool chance(double p) { return uniform(0, 1) < p; }

private:
    std::uint64_t state_;
};

bool valid(const geometry::PlateRegion& r) {
    try {
        geometry::validate(r);
        return true;
    } catch (const InputError&) {
        return false;
    }
}

double cross(const Point& a, const Point& b) {
    return a.x() * b.y() - a.y() * b.x();
}

// Interior angles >= 40° and edges not much shorter than the plate: shapes a
// plate drawing could have.
bool reasonable(const std::vector<Point>& p, double size) {
    const size_t n = p.size();
    for (size_t i = 0; i < n; ++i) {
        const Point a = p[(i + n - 1) % n], b = p[i], c = p[(i + 1) % n];
        if ((c - b).norm() < 0.2 * size) return false;
        const Point u = a - b, v = c - b;
        double angle = std::atan2(cross(v, u), v.dot(u)) * 180 / pi; // interior, counter-clockwise
        if (angle < 0) angle += 360;
        if (angle < 40 || angle > 320) return false;
    }
    return true;
}

std::vector<Point> outline(Rng& rng, double size) {
    for (;;) {
        const int n = rng.integer(3, 10);
        const bool convex = rng.chance(0.5);
        const double stretch = rng.uniform(0.6, 1.0);
        std::vector<double> angles;
        for (int i = 0; i < n; ++i) angles.push_back(rng.uniform(0, 2 * pi));
        std::sort(angles.begin(), angles.end());
        std::vector<Point> p;
        for (double a : angles) {
            const double r = convex ? size : size * rng.uniform(0.55, 1.0);
            p.push_back(Point(r * std::cos(a), stretch * r * std::sin(a)));
        }
        if (reasonable(p, size)) return p;
    }
}

} // namespace

geometry::PlateRegion random_plate(std::uint64_t seed) {
    Rng rng(seed * 0x2545f4914f6cdd1dULL + 1);
    const double size = rng.uniform(120, 250);
    geometry::PlateRegion r;
    for (const Point& p : outline(rng, size)) r.outline.push_back({p, 0.0, 0.0});
    // Corner treatments on a few corners.
    for (auto& v : r.outline) {
        if (!rng.chance(0.2)) continue;
        geometry::OutlineVertex old = v;
        if (rng.chance(0.5))
            v.fillet_radius = rng.uniform(8, 30);
        else
            v.chamfer = rng.uniform(8, 25);
        if (!valid(r)) v = old;
    }
    // One cut-out: a notch across an outline edge or an opening inside.
    for (int attempt = 0; attempt < 10 && r.cutouts.empty(); ++attempt) {
        geometry::Polygon cut;
        const bool is_notch = rng.chance(0.6);
        if (is_notch) {
            const int e = rng.integer(0, static_cast<int>(r.outline.size()) - 1);
            const Point a = r.outline[e].point, b = r.outline[(e + 1) % r.outline.size()].point;
            const double len = (b - a).norm();
            const double w = rng.uniform(20, std::max(21.0, 0.4 * len)),
                         depth = rng.uniform(12, 40);
            const double s = rng.uniform(0.5 * w + 10, std::max(0.5 * w + 11, len - 0.5 * w - 10));
            const Point u = (b - a) / len, n(-u.y(), u.x()); // n points into the plate
            const Point c = a + s * u;
            cut.points = {c - 0.5 * w * u - 15 * n, c + 0.5 * w * u - 15 * n,
                          c + 0.5 * w * u + depth * n, c - 0.5 * w * u + depth * n};
        } else {
            const Point c(rng.uniform(-0.5, 0.5) * size, rng.uniform(-0.4, 0.4) * size);
            const double w = rng.uniform(15, 50), h = rng.uniform(15, 50), t = rng.uniform(0, pi);
            const Point u(std::cos(t), std::sin(t)), n(-u.y(), u.x());
            cut.points = {c - w * u - h * n, c + w * u - h * n, c + w * u + h * n,
                          c - w * u + h * n};
        }
        r.cutouts.push_back(cut);
        // An opening stays inside the outline (a notch is meant to cross it).
        bool inside = true;
        if (cut.points.size() == 4 && (cut.points[0] - cut.points[1]).norm() > 0) {
            std::vector<Point> poly;
            for (const auto& v : r.outline) poly.push_back(v.point);
            for (const Point& p : cut.points)
                inside = inside && geometry::point_in_polygon(p, poly);
        }
        if (!valid(r) || (!is_notch && !inside)) r.cutouts.clear();
    }
    // Bolt patterns until at least one hole fits; at most 30 holes.
    for (int attempt = 0; attempt < 30 && r.holes.size() < 30; ++attempt) {
        const double d = std::array{14.0, 18.0, 22.0, 26.0}[rng.integer(0, 3)];
        const int rows = rng.integer(1, 5), cols = rng.integer(1, 6);
        const double pitch = rng.uniform(2.7, 3.5) * d, gauge = rng.uniform(2.7, 3.5) * d;
        const double t = rng.uniform(0, pi);
        const Point u(std::cos(t), std::sin(t)), n(-u.y(), u.x());
        const Point c(rng.uniform(-0.6, 0.6) * size, rng.uniform(-0.5, 0.5) * size);
        const bool slots = rng.chance(0.25);
        const double slot_length = d * rng.uniform(1.3, 2.5);
        const double slot_angle = t * 180 / pi + (rng.chance(0.5) ? 90.0 : 0.0);
        for (int i = 0; i < rows && r.holes.size() < 30; ++i) {
            for (int j = 0; j < cols && r.holes.size() < 30; ++j) {
                const Point p =
                    c + (i - 0.5 * (rows - 1)) * pitch * n + (j - 0.5 * (cols - 1)) * gauge * u;
                r.holes.push_back(slots ? geometry::Hole::slot(p, slot_length, d, slot_angle)
                                        : geometry::Hole::circle(p, d));
                if (!valid(r)) r.holes.pop_back();
            }
        }
        if (!r.holes.empty() && rng.chance(0.5)) break;
    }
    // At least one hole: a small one wherever it fits.
    for (int attempt = 0; attempt < 500 && r.holes.empty(); ++attempt) {
        r.holes.push_back(geometry::Hole::circle(
            Point(rng.uniform(-1, 1) * size, rng.uniform(-1, 1) * size), 14.0));
        if (!valid(r)) r.holes.pop_back();
    }
    return r;
}

} // namespace lapwing::test
