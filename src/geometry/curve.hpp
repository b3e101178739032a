// Boundary curves of a plate region (straight lines and circular arcs) and the
// closed loops they form, oriented with the region on the left.
#pragma once

#include "geometry/plate_region.hpp"

#include <vector>

namespace lapwing::geometry {

enum class CurveKind { line, arc };

struct Curve {
    CurveKind kind = CurveKind::line;
    Point start = Point::Zero();
    Point end = Point::Zero();
    // Arcs only: centre, radius, polar angle of `start`, signed sweep
    // (positive counter-clockwise).
    Point centre = Point::Zero();
    double radius = 0.0;
    double start_angle = 0.0;
    double sweep = 0.0;
    BoundaryTag tag;

    static Curve line(Point a, Point b, BoundaryTag tag);
    static Curve arc(Point centre, double radius, double start_angle, double sweep,
                     BoundaryTag tag);

    // Point at parameter t in [0, 1], uniform in arc length.
    Point point_at(double t) const;
    // Unit tangent at t, in the direction of travel.
    Point tangent_at(double t) const;
    double length() const;
    // Curve traversed the other way.
    Curve reversed() const;
};

struct BoundaryLoop {
    std::vector<Curve> curves; // consecutive: curves[i].end == curves[i+1].start
};

// The region's boundary: loops[0] is the outer boundary (counter-clockwise),
// the others bound cut-outs and holes (clockwise), so the region is always on
// the left of the direction of travel.
struct RegionBoundary {
    std::vector<BoundaryLoop> loops;
    // Corners where the region's interior angle exceeds 180° (stress raisers
    // that the mesher refines towards).
    std::vector<Point> reentrant_corners;
};

// Area enclosed by a loop (signed: positive counter-clockwise), exact for arcs.
double signed_area(const BoundaryLoop& loop);

// Distance from p to the nearest point of the curve.
double distance_to_curve(const Curve& curve, const Point& p);

// Points along the loop, no arc deviating from its chord by more than
// `sagitta` (for point-in-region tests and drawings).
std::vector<Point> polyline(const BoundaryLoop& loop, double sagitta);

} // namespace lapwing::geometry
