// Integration of the FE stresses along a section line: element-edge
// crossings split each piece, a Gauss rule on each sub-piece gives the
// resultants and the linearization, evenly spaced points give the profile.
#include "check/section_integral.hpp"

#include "check/free_body.hpp"
#include "check/linearize.hpp"
#include "fe/isoparametric_map.hpp"
#include "fe/quadrature.hpp"
#include "fe/stress.hpp"

#include <algorithm>
#include <array>
#include <cmath>

namespace lapwing::check {

namespace {

using Eigen::Vector2d;

constexpr int gauss_points = 4;         // per sub-piece: exact to degree 7 along the line
constexpr int profile_budget = 300;     // profile points per line at most
constexpr int max_profile_per_sub = 8;  // per sub-piece
constexpr double nudge_fraction = 1e-7; // of the line's length, for points on the boundary

struct Frame {
    Vector2d from, tangent, normal;
    double length = 0;
    double tol = 0;
};

std::array<Vector2d, 9> element_coords(const fe::Model& model, int e) {
    const fe::Element& el = model.elements[static_cast<size_t>(e)];
    std::array<Vector2d, 9> x;
    for (int i = 0; i < fe::node_count(el.kind); ++i)
        x[static_cast<size_t>(i)] =
            model.nodes[static_cast<size_t>(el.nodes[static_cast<size_t>(i)])];
    return x;
}

// Distances along the line where it crosses an element edge (straight, or
// the quadratic x(t) = Σ N_i(t) x_i of a curved edge), plus the ends of
// edges lying on the line.
std::vector<double> edge_crossings(const fe::Model& model, const Frame& f) {
    const Vector2d lo = f.from.cwiseMin(f.from + f.length * f.tangent);
    const Vector2d hi = f.from.cwiseMax(f.from + f.length * f.tangent);
    std::vector<double> out;
    for (int e = 0; e < static_cast<int>(model.elements.size()); ++e) {
        const fe::Element& el = model.elements[static_cast<size_t>(e)];
        const auto x = element_coords(model, e);
        const int n = fe::node_count(el.kind);
        Vector2d blo = x[0], bhi = x[0];
        for (int i = 1; i < n; ++i) {
            blo = blo.cwiseMin(x[static_cast<size_t>(i)]);
            bhi = bhi.cwiseMax(x[static_cast<size_t>(i)]);
        }
        const Vector2d pad = Vector2d::Constant(f.tol) + 0.1 * (bhi - blo); // curved edges bulge
        if ((blo - pad).x() > hi.x() || (blo - pad).y() > hi.y() || (bhi + pad).x() < lo.x() ||
            (bhi + pad).y() < lo.y())
            continue;
        for (int edge = 0; edge < 4; ++edge) {
            const auto local = fe::edge_nodes(el.kind, edge);
            const Vector2d& x0 = x[static_cast<size_t>(local[0])];
            const Vector2d& x1 = x[static_cast<size_t>(local[fe::is_quadratic(el.kind) ? 2 : 1])];
            const Vector2d xm = fe::is_quadratic(el.kind) ? x[static_cast<size_t>(local[1])]
                                                          : Vector2d(0.5 * (x0 + x1));
            const double g0 = f.normal.dot(x0 - f.from), g1 = f.normal.dot(x1 - f.from),
                         gm = f.normal.dot(xm - f.from);
            auto s_at = [&](double t) {
                const Vector2d p =
                    0.5 * t * (t - 1) * x0 + (1 - t * t) * xm + 0.5 * t * (t + 1) * x1;
                return f.tangent.dot(p - f.from);
            };
            if (std::max({std::abs(g0), std::abs(g1), std::abs(gm)}) <= f.tol) {
                out.push_back(s_at(-1));
                out.push_back(s_at(1));
                continue;
            }
            // f(t) = a t² + b t + c on t ∈ [−1, 1] (a = 0 for a straight edge).
            const double a = 0.5 * (g0 + g1) - gm, b = 0.5 * (g1 - g0), c = gm;
            std::array<double, 2> roots{};
            int n_roots = 0;
            if (std::abs(a) <= 1e-12 * (std::abs(b) + std::abs(c))) {
                if (b != 0) roots[static_cast<size_t>(n_roots++)] = -c / b;
            } else {
                const double disc = b * b - 4 * a * c;
                if (disc >= 0) {
                    const double q = -0.5 * (b + std::copysign(std::sqrt(disc), b));
                    roots[static_cast<size_t>(n_roots++)] = q / a;
                    if (q != 0) roots[static_cast<size_t>(n_roots++)] = c / q;
                }
            }
            for (int r = 0; r < n_roots; ++r) {
                const double t = roots[static_cast<size_t>(r)];
                if (t >= -1 - 1e-9 && t <= 1 + 1e-9) out.push_back(s_at(std::clamp(t, -1.0, 1.0)));
            }
        }
    }
    return out;
}

struct Located {
    int element = -1;
    Vector2d reference{0, 0};
};

// The element and reference point at s; nudged off the boundary if the
// locator misses it, else extrapolated from `hint`'s element.
std::optional<Located> locate(const fe::Model& model, const fe::PointLocator& locator,
                              const Frame& f, double s, int hint, bool& extrapolated) {
    extrapolated = false;
    const Vector2d p = f.from + s * f.tangent;
    const double nudge = nudge_fraction * f.length;
    for (const Vector2d& q : {p, Vector2d(p + nudge * f.normal), Vector2d(p - nudge * f.normal)})
        if (const auto at = locator.locate(q)) return Located{at->element, at->reference};
    if (hint < 0) return std::nullopt;
    const fe::Element& el = model.elements[static_cast<size_t>(hint)];
    const auto x = element_coords(model, hint);
    const auto xi = fe::inverse_map(
        el.kind, std::span<const Vector2d>(x.data(), static_cast<size_t>(fe::node_count(el.kind))),
        p, 0.5);
    if (!xi) return std::nullopt;
    extrapolated = true;
    return Located{hint, *xi};
}

struct LineStress {
    double normal = 0, shear = 0, von_mises = 0;
};

LineStress resolve(const fe::Stress& s, const Frame& f) {
    Eigen::Matrix2d sigma;
    sigma << s(0), s(2), s(2), s(1);
    const Vector2d traction = sigma * f.normal;
    return {f.normal.dot(traction), f.tangent.dot(traction), fe::von_mises(s)};
}

} // namespace

double material_centroid(const SectionLine& line) {
    double length = 0, moment = 0;
    for (const Interval& i : line.material) {
        length += i.length();
        moment += i.length() * 0.5 * (i.begin + i.end);
    }
    return length > 0 ? moment / length : 0.5 * line.length();
}

namespace {

// A point of the line where the stress is evaluated: a Gauss point of a
// sub-piece (weight > 0 on the integral) or a profile point.
struct LinePoint {
    double s = 0, w = 0;
    bool profile = false;
    bool outside = false; // extrapolated from the sub-piece's element
    Located at;
};

// Where a line's stresses are evaluated: mesh geometry only, shared by every
// load case.
struct LinePoints {
    Frame frame;
    double centre = 0;
    std::vector<std::vector<LinePoint>> pieces; // per SectionLine::material interval
    std::optional<FreeBodyCut> cut;
};

LinePoints line_points(const SectionLine& line, const fe::Model& model,
                       const fe::PointLocator& locator, const ElementNeighbours* neighbours) {
    LinePoints out;
    Frame& f = out.frame;
    f = Frame{line.from, line.tangent(), line.normal(), line.length(), 0};
    f.tol = 1e-9 * std::max(f.length, 1.0);
    out.centre = material_centroid(line);
    if (f.length <= 0) return out;

    const std::vector<double> crossings = edge_crossings(model, f);
    // Sub-pieces of every material piece, each inside one element.
    std::vector<std::vector<double>> breaks;
    size_t n_sub = 0;
    for (const Interval& piece : line.material) {
        std::vector<double> b{piece.begin, piece.end};
        for (const double s : crossings)
            if (s > piece.begin + f.tol && s < piece.end - f.tol) b.push_back(s);
        std::sort(b.begin(), b.end());
        b.erase(std::unique(b.begin(), b.end(), [&](double x, double y) { return y - x <= f.tol; }),
                b.end());
        n_sub += b.size() - 1;
        breaks.push_back(std::move(b));
    }
    const int per_sub = std::clamp(profile_budget / std::max<int>(static_cast<int>(n_sub), 1), 1,
                                   max_profile_per_sub);
    const fe::LineRule& rule = fe::gauss_legendre(gauss_points);

    int hint = -1;
    for (size_t p = 0; p < line.material.size(); ++p) {
        std::vector<LinePoint> points;
        const auto& b = breaks[p];
        for (size_t k = 0; k + 1 < b.size(); ++k) {
            const double s0 = b[k], s1 = b[k + 1], half = 0.5 * (s1 - s0);
            // Find the sub-piece's element first, from its middle.
            bool extrapolated = false;
            if (const auto mid = locate(model, locator, f, s0 + half, hint, extrapolated))
                hint = mid->element;
            auto add = [&](double s, double w, bool profile) {
                bool outside = false;
                const auto at = locate(model, locator, f, s, hint, outside);
                if (at) points.push_back({s, w, profile, outside, *at});
            };
            for (int g = 0; g < rule.n; ++g)
                add(s0 + half * (1 + rule.x[static_cast<size_t>(g)]),
                    half * rule.w[static_cast<size_t>(g)], false);
            // Profile points, evenly spaced; the ends just inside the
            // sub-piece so that each shows its own element's value.
            for (int q = 0; q < per_sub; ++q) {
                const double r = per_sub == 1 ? 0.5 : static_cast<double>(q) / (per_sub - 1);
                add(s0 + (s1 - s0) * std::clamp(r, 1e-6, 1 - 1e-6), 0.0, true);
            }
        }
        out.pieces.push_back(std::move(points));
    }
    out.cut = neighbours ? free_body_cut(line, model, *neighbours, out.centre)
                         : free_body_cut(line, model, out.centre);
    return out;
}

SectionStress integrate(const SectionLine& line, const LinePoints& points, const fe::Model& model,
                        const Eigen::VectorXd& u, double thickness) {
    SectionStress out;
    const Frame& f = points.frame;
    const double centre = points.centre;
    if (f.length <= 0) return out;
    for (size_t p = 0; p < line.material.size(); ++p) {
        const Interval& piece = line.material[p];
        std::vector<StressSample> samples;
        for (const LinePoint& pt : points.pieces[p]) {
            if (pt.outside) ++out.extrapolated_points;
            const LineStress st =
                resolve(fe::element_stress(model, pt.at.element, u, pt.at.reference.x(),
                                           pt.at.reference.y()),
                        f);
            if (!pt.profile) {
                out.N += st.normal * thickness * pt.w;
                out.V += st.shear * thickness * pt.w;
                out.M += st.normal * (pt.s - centre) * thickness * pt.w;
                samples.push_back({pt.s - piece.begin, st.normal, pt.w});
            } else {
                out.profile.push_back({pt.s, st.normal, st.shear, st.von_mises});
                samples.push_back({pt.s - piece.begin, st.normal, 0.0});
            }
        }
        const Linearized lin = linearize(piece.length(), samples);
        out.pieces.push_back(lin);
        out.max_membrane = std::max(out.max_membrane, std::abs(lin.membrane));
        out.max_membrane_plus_bending =
            std::max(out.max_membrane_plus_bending, std::abs(lin.membrane) + std::abs(lin.bending));
        out.max_peak = std::max(out.max_peak, lin.peak);
    }
    std::sort(out.profile.begin(), out.profile.end(),
              [](const ProfilePoint& a, const ProfilePoint& b) { return a.s < b.s; });
    const double area = line.material_length() * thickness;
    if (area > 0) {
        out.average_normal = out.N / area;
        out.average_shear = out.V / area;
    }
    if (points.cut) {
        const FreeBodyResultant fb = free_body_resultant(*points.cut, model, u);
        out.free_body = true;
        out.N_free_body = fb.N;
        out.V_free_body = fb.V;
        out.M_free_body = fb.M;
    }
    return out;
}

} // namespace

std::vector<SectionStress> integrate_section(const SectionLine& line, const fe::Model& model,
                                             const fe::PointLocator& locator,
                                             std::span<const Eigen::VectorXd* const> u,
                                             double thickness,
                                             const ElementNeighbours* neighbours) {
    const LinePoints points = line_points(line, model, locator, neighbours);
    std::vector<SectionStress> out;
    out.reserve(u.size());
    for (const Eigen::VectorXd* one : u)
        out.push_back(integrate(line, points, model, *one, thickness));
    return out;
}

SectionStress integrate_section(const SectionLine& line, const fe::Model& model,
                                const fe::PointLocator& locator, const Eigen::VectorXd& u,
                                double thickness) {
    const Eigen::VectorXd* one = &u;
    return integrate_section(line, model, locator, std::span(&one, 1), thickness).front();
}

} // namespace lapwing::check
