// Free-body resultant across a section line: split the elements at the line
// by their centroids, grow each side through uncut element edges, and sum
// the element nodal forces k_e u_e at the nodes the two sides share.
#include "check/free_body.hpp"

#include "fe/element_matrix.hpp"
#include "fe/material.hpp"

#include <algorithm>
#include <cmath>
#include <numeric>
#include <set>

namespace lapwing::check {

namespace {

using Eigen::Vector2d;

double cross(const Vector2d& a, const Vector2d& b) {
    return a.x() * b.y() - a.y() * b.x();
}

int find_root(std::vector<int>& parent, int i) {
    while (parent[static_cast<size_t>(i)] != i) {
        parent[static_cast<size_t>(i)] =
            parent[static_cast<size_t>(parent[static_cast<size_t>(i)])];
        i = parent[static_cast<size_t>(i)];
    }
    return i;
}

// Σ over the cut's elements of their weight times their nodal forces k_e u_e
// at the cut's nodes, as a force and its moment about the cut's centre.
void add_nodal_forces(const fe::Model& model, const Eigen::VectorXd& u, const FreeBodyCut& cut,
                      Vector2d& force, double& moment) {
    Eigen::VectorXd u_e(18), f(18);
    for (size_t k = 0; k < cut.elements.size(); ++k) {
        const int e = cut.elements[k];
        const fe::Element& el = model.elements[static_cast<size_t>(e)];
        const int n = fe::node_count(el.kind);
        const fe::Matrix3 D = fe::plane_stress_D(model.materials[static_cast<size_t>(el.material)]);
        u_e.resize(2 * n);
        f.resize(2 * n);
        for (int i = 0; i < n; ++i) {
            const int node = el.nodes[static_cast<size_t>(i)];
            u_e(2 * i) = u(fe::dof_ux(node));
            u_e(2 * i + 1) = u(fe::dof_uy(node));
        }
        fe::element_forces(model, e, D, u_e, f);
        f *= cut.weight[k];
        for (int i = 0; i < n; ++i) {
            const int node = el.nodes[static_cast<size_t>(i)];
            if (!cut.cut[static_cast<size_t>(node)]) continue;
            const Vector2d fi(f(2 * i), f(2 * i + 1));
            force += fi;
            moment += cross(model.nodes[static_cast<size_t>(node)] - cut.centre, fi);
        }
    }
}

// Keeps the elements of `candidates` that touch a cut node, with their weight.
template <typename Weight>
void keep_touching(const fe::Model& model, int n_candidates, const Weight& weight,
                   FreeBodyCut& out) {
    for (int e = 0; e < n_candidates; ++e) {
        const fe::Element& el = model.elements[static_cast<size_t>(e)];
        bool touches = false;
        for (int i = 0; i < fe::node_count(el.kind); ++i)
            touches = touches || out.cut[static_cast<size_t>(el.nodes[static_cast<size_t>(i)])];
        if (!touches) continue;
        out.elements.push_back(e);
        out.weight.push_back(weight(e));
    }
}

} // namespace

ElementNeighbours element_neighbours(const fe::Model& model) {
    // Element edges by their corner pair, sorted so that an interior edge's
    // two elements sit next to each other.
    struct EdgeOf {
        std::pair<int, int> corners;
        int element;
    };
    std::vector<EdgeOf> edges;
    edges.reserve(4 * model.elements.size());
    for (int e = 0; e < static_cast<int>(model.elements.size()); ++e) {
        const fe::Element& el = model.elements[static_cast<size_t>(e)];
        for (int j = 0; j < 4; ++j)
            edges.push_back({std::minmax(el.nodes[static_cast<size_t>(j)],
                                         el.nodes[static_cast<size_t>((j + 1) % 4)]),
                             e});
    }
    std::sort(edges.begin(), edges.end(), [](const EdgeOf& x, const EdgeOf& y) {
        return x.corners < y.corners || (x.corners == y.corners && x.element < y.element);
    });
    ElementNeighbours out;
    for (size_t k = 0; k + 1 < edges.size(); ++k)
        if (edges[k].corners == edges[k + 1].corners)
            out.pairs.emplace_back(edges[k].element, edges[k + 1].element);
    return out;
}

std::optional<FreeBodyCut> free_body_cut(const SectionLine& line, const fe::Model& model,
                                         double about) {
    // A weld line (the whole plate) or an empty one needs no neighbours.
    if (line.kind == SectionKind::weld || line.length() <= 0)
        return free_body_cut(line, model, ElementNeighbours{}, about);
    return free_body_cut(line, model, element_neighbours(model), about);
}

std::optional<FreeBodyCut> free_body_cut(const SectionLine& line, const fe::Model& model,
                                         const ElementNeighbours& neighbours, double about) {
    const double length = line.length();
    if (length <= 0 || model.elements.empty()) return std::nullopt;
    const Vector2d tangent = line.tangent(), normal = line.normal();
    const Vector2d centre = line.from + about * tangent;
    const double tol = 1e-8 * length;
    const auto n_elements = static_cast<int>(model.elements.size());
    FreeBodyCut out;
    out.centre = centre;
    out.tangent = tangent;
    out.normal = normal;
    std::vector<char>& cut = out.cut;
    cut.assign(model.nodes.size(), 0);

    if (line.kind == SectionKind::weld) {
        // The whole plate; the nodes on the line carry the support's reaction.
        for (size_t i = 0; i < model.nodes.size(); ++i) {
            const Vector2d r = model.nodes[i] - line.from;
            const double s = r.dot(tangent);
            cut[i] = std::abs(r.dot(normal)) <= tol && s >= -tol && s <= length + tol;
        }
        // No node on the line: no force to sum (and none was found before).
        if (std::none_of(cut.begin(), cut.end(), [](char c) { return c != 0; }))
            return std::nullopt;
        out.weld = true;
        out.body_elements = n_elements;
        keep_touching(
            model, n_elements, [](int) { return 1.0; }, out);
        return out;
    }

    // Which side of the line each element's centroid lies on.
    std::vector<Vector2d> centroid(static_cast<size_t>(n_elements));
    std::vector<double> offset(static_cast<size_t>(n_elements));
    for (int e = 0; e < n_elements; ++e) {
        const fe::Element& el = model.elements[static_cast<size_t>(e)];
        Vector2d c(0, 0);
        for (int i = 0; i < 4; ++i)
            c += model.nodes[static_cast<size_t>(el.nodes[static_cast<size_t>(i)])];
        centroid[static_cast<size_t>(e)] = 0.25 * c;
        offset[static_cast<size_t>(e)] = normal.dot(0.25 * c - line.from);
    }
    // An edge between centroids on opposite sides is cut when the segment
    // joining the centroids crosses the line between its ends.
    std::vector<int> parent(static_cast<size_t>(n_elements));
    std::iota(parent.begin(), parent.end(), 0);
    std::vector<std::pair<int, int>> cut_edges; // (element on −n side, element on +n side)
    for (const auto& [e, o] : neighbours.pairs) {
        const double de = offset[static_cast<size_t>(e)], dn = offset[static_cast<size_t>(o)];
        bool crosses = false;
        if ((de > 0) != (dn > 0)) {
            const double lambda = de / (de - dn);
            const Vector2d x =
                centroid[static_cast<size_t>(e)] +
                lambda * (centroid[static_cast<size_t>(o)] - centroid[static_cast<size_t>(e)]);
            const double s = (x - line.from).dot(tangent);
            crosses = s >= -tol && s <= length + tol;
        }
        if (crosses)
            cut_edges.push_back(de > 0 ? std::pair{o, e} : std::pair{e, o});
        else
            parent[static_cast<size_t>(find_root(parent, e))] = find_root(parent, o);
    }
    if (cut_edges.empty()) return std::nullopt;
    std::set<int> minus_side, plus_side;
    for (const auto& [a, b] : cut_edges) {
        minus_side.insert(find_root(parent, a));
        plus_side.insert(find_root(parent, b));
    }
    for (const int r : minus_side)
        if (plus_side.count(r)) return std::nullopt; // the two sides join round an end

    std::vector<char> in_body(static_cast<size_t>(n_elements), 0);
    for (int e = 0; e < n_elements; ++e)
        if (minus_side.count(find_root(parent, e))) {
            in_body[static_cast<size_t>(e)] = 1;
            ++out.body_elements;
        }
    std::vector<char> on_body(model.nodes.size(), 0), off_body(model.nodes.size(), 0);
    for (int e = 0; e < n_elements; ++e) {
        const fe::Element& el = model.elements[static_cast<size_t>(e)];
        for (int i = 0; i < fe::node_count(el.kind); ++i)
            (in_body[static_cast<size_t>(e)]
                 ? on_body
                 : off_body)[static_cast<size_t>(el.nodes[static_cast<size_t>(i)])] = 1;
    }
    for (size_t i = 0; i < cut.size(); ++i) cut[i] = on_body[i] && off_body[i];
    // Force on the body through the shared nodes: Σ_body k_e u_e there. A
    // load applied at a shared node itself (a bolt tie on a hole edge that
    // the line crosses) belongs to neither side; it is shared half and half,
    // its limit as the mesh is refined, by taking the mean of the body's
    // view (Σ_body) and the other side's (−Σ_rest):
    //   F = ½ Σ_shared nodes (Σ_body k_e u_e − Σ_rest k_e u_e).
    keep_touching(
        model, n_elements, [&](int e) { return in_body[static_cast<size_t>(e)] ? 0.5 : -0.5; },
        out);
    return out;
}

FreeBodyResultant free_body_resultant(const FreeBodyCut& cut, const fe::Model& model,
                                      const Eigen::VectorXd& u) {
    Vector2d force(0, 0);
    double moment = 0;
    add_nodal_forces(model, u, cut, force, moment);
    // On a weld line the nodal forces are the support's push on the plate;
    // the traction σ·n with n into the plate acts on the support, hence the
    // sign.
    const double sign = cut.weld ? -1.0 : 1.0;
    return FreeBodyResultant{sign * cut.normal.dot(force), sign * cut.tangent.dot(force),
                             sign * moment, cut.body_elements};
}

std::optional<FreeBodyResultant> free_body_resultant(const SectionLine& line,
                                                     const fe::Model& model,
                                                     const Eigen::VectorXd& u, double about) {
    const auto cut = free_body_cut(line, model, about);
    if (!cut) return std::nullopt;
    return free_body_resultant(*cut, model, u);
}

} // namespace lapwing::check
