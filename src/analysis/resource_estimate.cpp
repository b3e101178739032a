// Element, node, dof and memory estimate from the size field, and the guard.
//
// The mesher aims for a quadrilateral edge h(x) = min(H, min over sources of
// h0 + g·d), d the distance from a hole edge or a re-entrant corner
// (mesh/size_field.hpp). A region meshed at size h holds about
// c·∫ dA / h² elements; c is calibrated on the shipped templates (below).
// Each source adds its refined zone, ∫ (1/h² − 1/H²) dA over the ring where
// h < H, in closed form; overlapping zones of neighbouring holes are counted
// twice, which errs on the large side (the guard refuses early rather than
// late).
#include "analysis/resource_estimate.hpp"

#include "analysis/plate_region.hpp"
#include "model/bolts.hpp"

#include <algorithm>
#include <cmath>
#include <fmt/format.h>
#include <numbers>

namespace lapwing::analysis {

namespace {

constexpr double pi = std::numbers::pi;

// Quadrilaterals per h² of area, measured: the mesher pairs triangles and
// splits them, so its quads are smaller than the target edge. Every shipped
// template, at its own size and at half of it, gave 2.2–2.5 (1.3 × the
// ratio mesh / estimate of 0.53–0.59 measured with 1.3).
constexpr double elements_per_h2 = 2.3;

double polygon_area(const std::vector<Eigen::Vector2d>& p) {
    double a = 0;
    for (size_t i = 0; i < p.size(); ++i) {
        const auto& u = p[i];
        const auto& v = p[(i + 1) % p.size()];
        a += u.x() * v.y() - u.y() * v.x();
    }
    return 0.5 * a;
}

// Same rule as the mesher (mesh/size_field.cpp): default 24 for quadratic,
// 32 for linear elements, at least 8, rounded up to a multiple of 4.
int around_hole(const mesh::MeshSettings& s) {
    int n = s.elements_around_hole;
    if (n <= 0) n = fe::is_quadratic(s.kind) ? 24 : 32;
    n = std::max(n, 8);
    return (n + 3) / 4 * 4;
}

// ∫ (1/h² − 1/H²) dA over the zone round a source of perimeter P, where
// h = h0 + g·d < H: with the offset perimeter P + 2πd and d = (h − h0)/g,
// ∫₀^{d*} (P + 2πd)/h² dd = (1/g)[(P − 2πh0/g)(1/h0 − 1/H) + (2π/g) ln(H/h0)],
// less the zone's own area (P d* + π d*²) / H².
double zone_excess(double P, double h0, double H, double g) {
    if (!(h0 < H)) return 0;
    const double d_star = (H - h0) / g;
    const double in_zone =
        ((P - 2 * pi * h0 / g) * (1 / h0 - 1 / H) + (2 * pi / g) * std::log(H / h0)) / g;
    return std::max(0.0, in_zone - (P * d_star + pi * d_star * d_star) / (H * H));
}

} // namespace

ResourceEstimate estimate_resources(const geometry::PlateRegion& region,
                                    const mesh::MeshSettings& settings, int n_extra_dofs) {
    ResourceEstimate e;
    if (region.outline.size() < 3) return e;
    std::vector<Eigen::Vector2d> outline;
    Eigen::Vector2d lo = region.outline.front().point, hi = lo;
    for (const auto& v : region.outline) {
        outline.push_back(v.point);
        lo = lo.cwiseMin(v.point);
        hi = hi.cwiseMax(v.point);
    }
    // Mesher default: a tenth of the outline's smaller bounding-box side.
    const double H = settings.element_size > 0 ? settings.element_size
                                               : std::max((hi - lo).minCoeff() / 10.0, 1e-6);
    const double g = std::max(settings.grading, 0.05);
    const int n_around = around_hole(settings);
    e.element_size = H;

    double area = std::abs(polygon_area(outline));
    double perimeter = 0, boundary_edges = 0, excess = 0;
    for (size_t i = 0; i < outline.size(); ++i)
        perimeter += (outline[(i + 1) % outline.size()] - outline[i]).norm();
    boundary_edges += perimeter / H;

    // Re-entrant corners of the outline (counter-clockwise: a right turn),
    // and the corners of each cut-out that point into the plate.
    const double corner_h0 = std::clamp(settings.corner_size_ratio, 0.01, 1.0) * H;
    auto corner_sources = [&](const std::vector<Eigen::Vector2d>& p, bool cutout) {
        const double orientation = polygon_area(p) >= 0 ? 1.0 : -1.0;
        for (size_t i = 0; i < p.size(); ++i) {
            const auto& a = p[(i + p.size() - 1) % p.size()];
            const auto& b = p[i];
            const auto& c = p[(i + 1) % p.size()];
            const Eigen::Vector2d u = b - a, v = c - b;
            const double turn = orientation * (u.x() * v.y() - u.y() * v.x());
            if (cutout ? turn > 0 : turn < 0) excess += zone_excess(0, corner_h0, H, g);
        }
    };
    corner_sources(outline, false);
    for (const auto& c : region.cutouts) {
        if (c.points.size() < 3) continue;
        const double a = std::abs(polygon_area(c.points));
        area -= a; // a cut-out may overlap the outline: this errs on the small side
        double len = 0;
        for (size_t i = 0; i < c.points.size(); ++i)
            len += (c.points[(i + 1) % c.points.size()] - c.points[i]).norm();
        boundary_edges += len / H;
        corner_sources(c.points, true);
    }
    for (const geometry::Hole& h : region.holes) {
        const bool slot = h.shape == geometry::HoleShape::slot;
        const double w = slot ? h.width : h.diameter;
        const double straight = slot ? std::max(0.0, h.length - h.width) : 0.0;
        const double P = pi * w + 2 * straight;
        area -= pi * w * w / 4 + straight * w;
        const double h0 = std::min(H, 2 * pi * (w / 2) / n_around);
        excess += zone_excess(P, h0, H, g);
        boundary_edges += n_around + 2 * straight / h0;
    }
    area = std::max(area, 0.0);

    e.elements = elements_per_h2 * (area / (H * H) + excess);
    // Quadrilateral meshes by Euler's formula: corner nodes ≈ elements +
    // boundary edges / 2; quadratic elements add one node per edge (2 per
    // element + boundary / 2), Q9 one more at each centre.
    const double corners = e.elements + boundary_edges / 2;
    switch (settings.kind) {
    case fe::ElementKind::Q4:
    case fe::ElementKind::Q4i:
        e.nodes = corners;
        break;
    case fe::ElementKind::Q8:
        e.nodes = corners + 2 * e.elements + boundary_edges / 2;
        break;
    case fe::ElementKind::Q9:
        e.nodes = corners + 3 * e.elements + boundary_edges / 2;
        break;
    }
    e.dofs = 2 * e.nodes + n_extra_dofs;
    e.bytes = bytes_per_dof * e.dofs;
    if (!std::isfinite(e.dofs)) e.dofs = e.nodes = e.elements = e.bytes = HUGE_VAL;
    return e;
}

ResourceEstimate estimate_resources(const model::Connection& c,
                                    const mesh::MeshSettings& settings) {
    // A bolt adds its own node (2 dofs); a member end adds a rigid body (3).
    long extra = 3L * static_cast<long>(c.members.size());
    for (const auto& g : c.bolt_groups) extra += 2L * g.rows * g.lines;
    return estimate_resources(plate_layout(c).region, settings,
                              static_cast<int>(std::min(extra, 1'000'000'000L)));
}

void check_resources(const ResourceEstimate& e, const mesh::MeshSettings& settings, long max_dofs,
                     std::string_view subject) {
    if (e.dofs <= static_cast<double>(max_dofs)) return;
    throw ResourceLimitError(fmt::format(
        "{} is too large: about {:.3g} dofs ({:.3g} {} elements at element size {:.3g} mm, "
        "about {:.3g} GiB of memory), above the limit of {} dofs. Use a larger mesh.size or a "
        "smaller mesh.around_hole, or raise the limit with --max-dofs N if this machine has the "
        "memory (about {:.2g} kB per dof)",
        subject, e.dofs, e.elements, fe::name(settings.kind), e.element_size,
        e.bytes / (1024.0 * 1024 * 1024), max_dofs, bytes_per_dof / 1000));
}

} // namespace lapwing::analysis
