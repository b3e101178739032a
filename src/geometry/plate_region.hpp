// The plate region as plain input data: an outline, holes and cut-outs, each
// with a stable id (BoundaryTag) that later stages use to name supports, bolts
// and edge loads. Units: mm (N·mm·MPa inside lapwing).
#pragma once

#include <Eigen/Core>
#include <string>
#include <vector>

namespace lapwing::geometry {

using Point = Eigen::Vector2d;

// One outline corner. At most one of chamfer and fillet_radius is > 0.
struct OutlineVertex {
    Point point = Point::Zero();
    double chamfer = 0.0;       // equal-leg chamfer: length cut from each adjoining edge
    double fillet_radius = 0.0; // tangent arc radius (convex or re-entrant corner)
};

enum class HoleShape { circle, slot };

// A circular hole (diameter) or a slotted hole: two half-circles of diameter
// `width` joined by straight edges; `length` is the overall length, tip to tip
// (common practice for slotted-hole sizes), `angle_deg` the direction of the
// long axis measured counter-clockwise from +x.
struct Hole {
    HoleShape shape = HoleShape::circle;
    Point centre = Point::Zero();
    double diameter = 0.0; // circle only
    double length = 0.0;   // slot only
    double width = 0.0;    // slot only
    double angle_deg = 0.0;

    static Hole circle(Point c, double d) { return {HoleShape::circle, c, d, 0.0, 0.0, 0.0}; }
    static Hole slot(Point c, double length, double width, double angle_deg) {
        return {HoleShape::slot, c, 0.0, length, width, angle_deg};
    }
};

// A polygon to remove (cope, notch, opening); it may overlap the outline.
struct Polygon {
    std::vector<Point> points; // counter-clockwise or clockwise, no repeated closing point
};

struct PlateRegion {
    std::vector<OutlineVertex> outline; // counter-clockwise; edge i runs from vertex i to i+1
    std::vector<Hole> holes;
    std::vector<Polygon> cutouts;
    // Smallest allowed clear distance between a hole and another hole or the
    // region's boundary; a thinner ligament is an input error.
    double min_ligament = 1.0;
};

// Where a boundary piece comes from; the stable ids of the region.
enum class BoundaryKind {
    outline_edge,   // index = outline edge i (vertex i to i+1)
    outline_corner, // index = outline vertex i (its chamfer or fillet)
    hole,           // index = hole number; part = piece of a slot (0..3), 0 for a circle
    cutout,         // index = cut-out number; part = its edge j (point j to j+1)
};

struct BoundaryTag {
    BoundaryKind kind = BoundaryKind::outline_edge;
    int index = 0;
    int part = 0;

    // "outline.edge[2]", "outline.corner[3]", "holes[1]", "cutouts[0].edge[2]"
    std::string name() const;
    friend bool operator==(const BoundaryTag&, const BoundaryTag&) = default;
};

} // namespace lapwing::geometry
