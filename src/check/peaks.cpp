// Peak von Mises and principal stresses with their locations.
#include "check/peaks.hpp"

#include "check/unit_text.hpp"
#include "fe/stress.hpp"

#include <cmath>
#include <fmt/format.h>
#include <limits>

namespace lapwing::check {

namespace {

// Clear distance from a point to a hole's edge (negative inside the hole).
double distance_to_hole(const geometry::Hole& h, const Eigen::Vector2d& p) {
    if (h.shape == geometry::HoleShape::circle) return (p - h.centre).norm() - 0.5 * h.diameter;
    // A slot: distance to the segment between the two half-circle centres.
    const double a = h.angle_deg * std::acos(-1.0) / 180.0;
    const Eigen::Vector2d axis(std::cos(a), std::sin(a));
    const double half = 0.5 * (h.length - h.width);
    const double along = std::clamp((p - h.centre).dot(axis), -half, half);
    return (p - (h.centre + along * axis)).norm() - 0.5 * h.width;
}

double distance_to_segment(const Eigen::Vector2d& a, const Eigen::Vector2d& b,
                           const Eigen::Vector2d& p) {
    const Eigen::Vector2d d = b - a;
    const double s =
        d.squaredNorm() > 0 ? std::clamp((p - a).dot(d) / d.squaredNorm(), 0.0, 1.0) : 0.0;
    return (p - (a + s * d)).norm();
}

struct Candidate {
    double value;
    Eigen::Vector2d at;
};

} // namespace

std::string describe_location(const analysis::PlateLayout& layout, const model::Connection& c,
                              const Eigen::Vector2d& at) {
    double best = std::numeric_limits<double>::infinity();
    std::string words;
    for (size_t h = 0; h < layout.region.holes.size(); ++h) {
        const double d = std::abs(distance_to_hole(layout.region.holes[h], at));
        if (d < best) {
            best = d;
            const analysis::BoltRef& ref = layout.bolts[h];
            words = fmt::format("edge of hole {}[{}]",
                                c.bolt_groups[static_cast<size_t>(ref.group)].name, ref.bolt);
        }
    }
    const auto& outline = layout.region.outline;
    for (size_t i = 0; i < outline.size(); ++i) {
        const double d =
            distance_to_segment(outline[i].point, outline[(i + 1) % outline.size()].point, at);
        if (d < best) {
            best = d;
            const std::string& name = c.plate.outline[i].edge_name;
            words = name.empty() ? fmt::format("outline edge {}", i)
                                 : fmt::format("outline edge {} ({})", i, name);
        }
    }
    for (size_t k = 0; k < layout.region.cutouts.size(); ++k) {
        const auto& pts = layout.region.cutouts[k].points;
        for (size_t j = 0; j < pts.size(); ++j) {
            const double d = distance_to_segment(pts[j], pts[(j + 1) % pts.size()], at);
            if (d < best) {
                best = d;
                const std::string& name = c.plate.cutouts[k].name;
                words = name.empty() ? fmt::format("edge of cut-out {}", k)
                                     : fmt::format("edge of cut-out {}", name);
            }
        }
    }
    const std::string point = point_text(at, c.units);
    // Within a millimetre or two counts as "at" the feature; else name the point only.
    const double near = std::max(2.0, 0.5 * c.mesh.size);
    return best <= near ? fmt::format("{}, {}", words, point) : point;
}

PeakStress find_peaks(const analysis::FeProblem& problem, const analysis::PlateLayout& layout,
                      const model::Connection& connection, const analysis::CaseResult& result,
                      const fe::SampledStresses& g) {
    const double lowest = -std::numeric_limits<double>::infinity();
    Candidate vm{lowest, {0, 0}}, s1{lowest, {0, 0}},
        s2{std::numeric_limits<double>::infinity(), {0, 0}};
    Candidate away{lowest, {0, 0}}, at_holes{lowest, {0, 0}};
    const double zone = connection.allowables.peak.bolt_hole_zone;
    const auto in_hole_zone = [&](const Eigen::Vector2d& at) {
        if (zone <= 0) return false; // one search over the whole plate
        for (const geometry::Hole& h : layout.region.holes) {
            const double size = h.shape == geometry::HoleShape::circle ? h.diameter : h.width;
            if (distance_to_hole(h, at) < zone * size) return true;
        }
        return false;
    };
    const auto consider = [&](const fe::Stress& s, const Eigen::Vector2d& at) {
        const double v = fe::von_mises(s);
        const fe::PrincipalValues p = fe::principal_values(s);
        if (v > vm.value) vm = {v, at};
        if (p.s1 > s1.value) s1 = {p.s1, at};
        if (p.s2 < s2.value) s2 = {p.s2, at};
        // Which zone a point lies in matters only where it would raise that
        // zone's peak: most points are below both and skip the hole search.
        if (v <= away.value && v <= at_holes.value) return;
        Candidate& part = in_hole_zone(at) ? at_holes : away;
        if (v > part.value) part = {v, at};
    };
    const fe::Model& model = problem.model;
    for (size_t n = 0; n < result.nodal_stress.size(); ++n)
        consider(result.nodal_stress[n], model.nodes[n]);
    for (size_t i = 0; i < g.stress.size(); ++i) consider(g.stress[i], g.point[i]);

    PeakStress peak;
    peak.von_mises = vm.value;
    peak.von_mises_at = vm.at;
    peak.max_principal = s1.value;
    peak.max_principal_at = s1.at;
    peak.min_principal = s2.value;
    peak.min_principal_at = s2.at;
    peak.near = describe_location(layout, connection, vm.at);
    // A plate whose every sample point lies in some hole zone (absurdly
    // dense bolts) has no "away" peak: the overall one stands in for it.
    if (away.value == lowest) away = vm;
    peak.von_mises_away = away.value;
    peak.von_mises_away_at = away.at;
    peak.near_away = describe_location(layout, connection, away.at);
    peak.has_hole_zone = at_holes.value != lowest;
    if (peak.has_hole_zone) {
        peak.von_mises_at_holes = at_holes.value;
        peak.von_mises_at_holes_at = at_holes.at;
        peak.near_at_holes = describe_location(layout, connection, at_holes.at);
    }
    return peak;
}

} // namespace lapwing::check
