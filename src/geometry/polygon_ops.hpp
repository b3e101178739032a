// Straight-edged polygon helpers: areas, intersections, point location, and
// the boolean difference that removes cut-outs from the outline.
#pragma once

#include "geometry/plate_region.hpp"

#include <optional>
#include <vector>

namespace lapwing::geometry {

double polygon_signed_area(const std::vector<Point>& points);

// Proper or touching intersection of segments ab and cd (within tol).
bool segments_intersect(const Point& a, const Point& b, const Point& c, const Point& d, double tol);

double point_segment_distance(const Point& p, const Point& a, const Point& b);
double segment_segment_distance(const Point& a, const Point& b, const Point& c, const Point& d);

// Crossing-number test; points on the boundary give an unspecified answer.
bool point_in_polygon(const Point& p, const std::vector<Point>& points);

// First pair (i, j), i < j, of non-adjacent edges of a closed polygon that
// intersect, or two adjacent edges that fold back onto each other.
std::optional<std::pair<int, int>> self_intersection(const std::vector<Point>& points, double tol);

// A closed polygon whose edge i (point i to i+1) carries tags[i].
struct TaggedLoop {
    std::vector<Point> points;
    std::vector<BoundaryTag> tags;
    std::vector<int> outline_vertex; // per point: outline vertex it is, or -1
};

// Region (loops[0] counter-clockwise outer, others clockwise) minus the
// counter-clockwise polygon `cut` whose edge j is tagged cut_tags[j]. The
// result lists counter-clockwise loops first. Touching and collinear edges
// are resolved with the distance tolerance `tol`.
std::vector<TaggedLoop> subtract_polygon(const std::vector<TaggedLoop>& region,
                                         const std::vector<Point>& cut,
                                         const std::vector<BoundaryTag>& cut_tags, double tol);

} // namespace lapwing::geometry
