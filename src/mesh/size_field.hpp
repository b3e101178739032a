// Target element size over the plate: fine at holes (so many elements round
// each hole) and at re-entrant corners, growing linearly with distance to the
// global size.
#pragma once

#include "geometry/curve.hpp"
#include "mesh/mesh.hpp"

#include <vector>

namespace lapwing::mesh::detail {

class SizeField {
public:
    SizeField(const geometry::PlateRegion& region, const geometry::RegionBoundary& boundary,
              const MeshSettings& settings, double element_size, int around);
    // Target quadrilateral edge length at p (mm).
    double at(const Eigen::Vector2d& p) const;
    double smallest() const { return smallest_; }

private:
    struct Source { // points within `radius` of segment a–b, size h0 at their edge
        Eigen::Vector2d a, b;
        double radius, h0;
    };
    std::vector<Source> sources_;
    double h_max_, grading_, smallest_;
};

// Element edges round a hole: settings value or the default, rounded up to a
// multiple of 4.
int elements_around_hole(const MeshSettings& settings);

// Target element size: settings value or the default.
double element_size(const geometry::PlateRegion& region, const MeshSettings& settings);

} // namespace lapwing::mesh::detail
