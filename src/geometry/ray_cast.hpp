// Distances through a plate region along a straight ray: from a point in a
// given direction to the first boundary it meets (outline edge, chamfer or
// fillet, cut-out edge, hole), and which boundary piece that is. The check
// stage measures bolt clear distances (tear-out lc, edge distances e1/e2),
// block shear path lengths and Thornton's buckling lengths with it.
#pragma once

#include "geometry/curve.hpp"
#include "geometry/plate_region.hpp"

namespace lapwing::geometry {

struct RayHit {
    bool hit = false;         // false: the ray leaves every loop without meeting one (or d = 0)
    double distance = 0.0;    // from the ray's start to `at`, mm
    Point at = Point::Zero(); // the point met
    BoundaryTag tag;          // what was met: outline edge / corner, hole, cut-out edge
};

struct RayOptions {
    bool stop_at_holes = true; // false: the ray passes through every hole
    int excluded_hole = -1;    // a hole the ray passes through (e.g. the bolt's own hole)
};

// First boundary met by the ray from + s·direction, s > 0 (direction need not
// be unit length). Meetings closer than the boundary's tolerance (a
// billionth of its size) are ignored, so a ray may start on the boundary and
// leave it. A zero direction gives no hit.
RayHit cast_ray(const RegionBoundary& boundary, const Point& from, const Point& direction,
                const RayOptions& options = {});

// Convenience form that builds (and so checks) the boundary first; throws
// lapwing::InputError for a region that cannot be built.
RayHit cast_ray(const PlateRegion& region, const Point& from, const Point& direction,
                const RayOptions& options = {});

// How far hole `hole`'s own edge lies from `inside` (a point inside the
// hole, normally its centre) along `direction`: d0/2 for a round hole from
// its centre, half the length or width for a slot along its axes. 0 when
// the hole is not in the boundary.
double hole_extent(const RegionBoundary& boundary, int hole, const Point& inside,
                   const Point& direction);

// Clear distance from the edge of hole `hole` (centre `centre`) along
// `direction` to the next boundary: the ray from the centre past its own
// hole, minus the hole's own extent in that direction (AISC 360-16 §J3.10
// "lc": clear distance in the direction of the force to the edge of the
// adjacent hole or of the material).
struct ClearDistance {
    double clear = 0.0;      // mm
    double own_extent = 0.0; // hole_extent of the own hole, mm
    RayHit hit;              // the boundary met, with distance from the centre
};
ClearDistance clear_distance(const RegionBoundary& boundary, int hole, const Point& centre,
                             const Point& direction);

} // namespace lapwing::geometry
