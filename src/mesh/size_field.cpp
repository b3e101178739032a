// Size field: the minimum over sources of h0 + grading × distance, capped by
// the global size. A linear growth rate bounds the size ratio of neighbouring
// elements, the "smooth grading" the quality targets need.
#include "mesh/size_field.hpp"

#include <algorithm>
#include <cmath>
#include <numbers>

namespace lapwing::mesh::detail {

namespace {
double point_segment_distance(const Eigen::Vector2d& p, const Eigen::Vector2d& a,
                              const Eigen::Vector2d& b) {
    const Eigen::Vector2d d = b - a;
    const double len2 = d.squaredNorm();
    const double t = len2 > 0 ? std::clamp((p - a).dot(d) / len2, 0.0, 1.0) : 0.0;
    return (a + t * d - p).norm();
}
} // namespace

int elements_around_hole(const MeshSettings& settings) {
    int n = settings.elements_around_hole;
    if (n <= 0) n = fe::is_quadratic(settings.kind) ? 24 : 32;
    n = std::max(n, 8);
    return (n + 3) / 4 * 4;
}

double element_size(const geometry::PlateRegion& region, const MeshSettings& settings) {
    if (settings.element_size > 0) return settings.element_size;
    Eigen::Vector2d lo = region.outline.front().point, hi = lo;
    for (const auto& v : region.outline) {
        lo = lo.cwiseMin(v.point);
        hi = hi.cwiseMax(v.point);
    }
    return std::max((hi - lo).minCoeff() / 10.0, 1e-6);
}

SizeField::SizeField(const geometry::PlateRegion& region, const geometry::RegionBoundary& boundary,
                     const MeshSettings& settings, double element_size, int around)
    : h_max_(element_size), grading_(std::max(settings.grading, 0.05)), smallest_(element_size) {
    for (const geometry::Hole& h : region.holes) {
        Source s;
        if (h.shape == geometry::HoleShape::circle) {
            s.a = s.b = h.centre;
            s.radius = h.diameter / 2;
        } else {
            const double half = (h.length - h.width) / 2;
            const double angle = h.angle_deg * std::numbers::pi / 180.0;
            const Eigen::Vector2d u(std::cos(angle), std::sin(angle));
            s.a = h.centre - half * u;
            s.b = h.centre + half * u;
            s.radius = h.width / 2;
        }
        // Both half-circles of a slot together carry `around` edges, like a circle.
        s.h0 = std::min(element_size, 2.0 * std::numbers::pi * s.radius / around);
        sources_.push_back(s);
    }
    const double corner = std::clamp(settings.corner_size_ratio, 0.01, 1.0) * element_size;
    for (const Eigen::Vector2d& c : boundary.reentrant_corners)
        sources_.push_back({c, c, 0.0, corner});
    // Boundary pieces shorter than the local size (a notch that meets the
    // outline just short of a fillet or chamfer end, a short chamfer) become
    // one triangle edge that is much shorter than its neighbours; Delaunay
    // refinement does not grade away from such a small feature (it skips
    // skinny triangles far below the local size), which left lone sliver
    // triangles. A source of half the piece's length grades the mesh from it.
    std::vector<Source> pieces;
    for (const auto& loop : boundary.loops) {
        for (const geometry::Curve& c : loop.curves) {
            const double len = c.length();
            if (len < at(0.5 * (c.start + c.end))) pieces.push_back({c.start, c.end, 0.0, len / 2});
        }
    }
    sources_.insert(sources_.end(), pieces.begin(), pieces.end());
    for (const Source& s : sources_) smallest_ = std::min(smallest_, s.h0);
}

double SizeField::at(const Eigen::Vector2d& p) const {
    double h = h_max_;
    for (const Source& s : sources_) {
        const double d = std::max(0.0, point_segment_distance(p, s.a, s.b) - s.radius);
        h = std::min(h, s.h0 + grading_ * d);
    }
    return h;
}

} // namespace lapwing::mesh::detail
