// Triangle → three quadrilaterals (centroid plus edge midpoints), a split
// that keeps the mesh conforming and needs no matching (Lo 2015, "Finite
// element mesh generation", §4 on triangle-to-quad conversion).
#include "mesh/quad_split.hpp"

#include "mesh/triangle_pairing.hpp"

#include <algorithm>
#include <cmath>

namespace lapwing::mesh::detail {

namespace {

// One quadrilateral edge on the boundary before quadratic nodes exist.
struct BoundaryHalf {
    int quad, local_edge, curve;
    double t0, t1; // curve parameters of the edge's two end nodes, in edge order
};

} // namespace

Mesh split_into_quads(const TriangleMesh& tm, fe::ElementKind kind, int smoothing_passes,
                      int n_holes) {
    const Triangulation& tri = tm.tri;
    const auto& tris = tri.triangles();
    const auto& pts = tri.points();
    Mesh mesh;
    mesh.kind = kind;

    // Alive triangles in index order; vertices in first-use order of index.
    std::vector<int> tri_ids;
    for (int t = 0; t < static_cast<int>(tris.size()); ++t)
        if (tris[t].alive) tri_ids.push_back(t);
    std::vector<int> compact(tris.size(), -1);
    for (size_t i = 0; i < tri_ids.size(); ++i) compact[tri_ids[i]] = static_cast<int>(i);

    std::vector<int> vertex_node(pts.size(), -1);
    std::vector<bool> fixed;
    for (int t : tri_ids) {
        for (int v : tris[t].v) {
            if (vertex_node[v] >= 0) continue;
            vertex_node[v] = static_cast<int>(mesh.nodes.size());
            mesh.nodes.push_back(pts[v]);
            fixed.push_back(false);
        }
    }
    for (const Segment& s : tri.segments()) {
        fixed[vertex_node[s.a]] = true;
        fixed[vertex_node[s.b]] = true;
    }

    // Pairs of triangles become quadrilaterals; the shared edge of a pair
    // gets no midpoint.
    const Pairing pairing = pair_triangles(tri);
    const size_t n_tri = tri_ids.size();
    const auto is_diagonal = [&](int t, int e) {
        return pairing.partner[t] >= 0 && pairing.partner_edge[t] == e;
    };
    // Edge split points: one node per triangle edge, on the curve for
    // segments. Mostly at the midpoint; an edge of an unpaired triangle is
    // split at 0.35 from its start in that triangle's counter-clockwise order,
    // a pinwheel that lifts the det J ratio of an equilateral triangle's three
    // quadrilaterals from 1/3 (at midpoints) to 0.47.
    constexpr double pinwheel = 0.35;
    const auto unpaired = [&](int t) { return t >= 0 && pairing.partner[t] < 0; };
    std::vector<std::array<int, 3>> mid(n_tri, {-1, -1, -1});
    std::vector<std::array<double, 3>> split_t(n_tri, {0.5, 0.5, 0.5}); // segment parameter
    for (size_t i = 0; i < n_tri; ++i) {
        const int ti = tri_ids[i];
        const Triangle& t = tris[ti];
        for (int e = 0; e < 3; ++e) {
            if (mid[i][e] >= 0 || is_diagonal(ti, e)) continue;
            const int node = static_cast<int>(mesh.nodes.size());
            const Point& a = pts[t.v[(e + 1) % 3]];
            const Point& b = pts[t.v[(e + 2) % 3]];
            double lambda = 0.5;
            if (unpaired(ti) && !unpaired(t.nbr[e])) lambda = pinwheel;
            if (!unpaired(ti) && unpaired(t.nbr[e])) lambda = 1.0 - pinwheel;
            if (t.seg[e] >= 0) {
                const Segment& s = tri.segments()[t.seg[e]];
                split_t[i][e] = s.t0 + lambda * (s.t1 - s.t0);
                mesh.nodes.push_back(tm.curves[s.curve].point_at(split_t[i][e]));
                fixed.push_back(true);
            } else {
                mesh.nodes.push_back(a + lambda * (b - a));
                fixed.push_back(false);
            }
            mid[i][e] = node;
            if (t.nbr[e] >= 0) {
                const int j = compact[t.nbr[e]];
                const Triangle& u = tris[t.nbr[e]];
                for (int k = 0; k < 3; ++k)
                    if (u.nbr[k] == ti) mid[j][k] = node;
            }
        }
    }

    // Cells: a triangle, or a pair as quadrilateral (v_e, v_e+1, w, v_e+2)
    // where w is the partner's far vertex. Each cell edge knows its midpoint
    // node and its boundary segment.
    struct CellEdge {
        int mid, seg;
        double split_t;
    };
    std::vector<int> quads;
    quads.reserve(12 * n_tri);
    std::vector<BoundaryHalf> halves;
    for (size_t i = 0; i < n_tri; ++i) {
        const int ti = tri_ids[i];
        const Triangle& t = tris[ti];
        const int partner = pairing.partner[ti];
        if (partner >= 0 && partner < ti) continue; // cell emitted with its lower triangle
        std::array<int, 4> corner{};
        std::array<CellEdge, 4> edge{};
        int n_corners = 3;
        if (partner < 0) {
            for (int c = 0; c < 3; ++c) {
                corner[c] = t.v[c];
                const int opp = (c + 2) % 3; // edge (v_c, v_c+1) is opposite v_c+2
                edge[c] = {mid[i][opp], t.seg[opp], split_t[i][opp]};
            }
        } else {
            const int e = pairing.partner_edge[ti];
            const int j = compact[partner];
            const Triangle& u = tris[partner];
            const int w = pairing.partner_edge[partner];
            const int a = t.v[(e + 1) % 3], b = t.v[(e + 2) % 3];
            // u holds b → a; its edge (a, w) is opposite b, (w, b) opposite a.
            int ub = 0, ua = 0;
            while (u.v[ub] != b) ++ub;
            while (u.v[ua] != a) ++ua;
            corner = {t.v[e], a, u.v[w], b};
            const int t_opp_b = (e + 2) % 3, t_opp_a = (e + 1) % 3;
            edge = {CellEdge{mid[i][t_opp_b], t.seg[t_opp_b], split_t[i][t_opp_b]},
                    CellEdge{mid[j][ub], u.seg[ub], split_t[j][ub]},
                    CellEdge{mid[j][ua], u.seg[ua], split_t[j][ua]},
                    CellEdge{mid[i][t_opp_a], t.seg[t_opp_a], split_t[i][t_opp_a]}};
            n_corners = 4;
        }
        Point centre = Point::Zero();
        for (int c = 0; c < n_corners; ++c) centre += pts[corner[c]];
        const int g = static_cast<int>(mesh.nodes.size());
        mesh.nodes.push_back(centre / n_corners);
        fixed.push_back(false);
        // Quadrilateral at corner c: v_c, midpoint of cell edge c, centre,
        // midpoint of cell edge c-1. Its edge 0 lies on cell edge c, its edge
        // 3 on cell edge c-1.
        for (int c = 0; c < n_corners; ++c) {
            const int prev = (c + n_corners - 1) % n_corners;
            const int q = static_cast<int>(quads.size() / 4);
            quads.insert(quads.end(), {vertex_node[corner[c]], edge[c].mid, g, edge[prev].mid});
            if (edge[c].seg >= 0) {
                const Segment& s = tri.segments()[edge[c].seg];
                halves.push_back({q, 0, s.curve, s.t0, edge[c].split_t});
            }
            if (edge[prev].seg >= 0) {
                const Segment& s = tri.segments()[edge[prev].seg];
                halves.push_back({q, 3, s.curve, edge[prev].split_t, s.t1});
            }
        }
    }

    std::vector<Eigen::Vector2d> curved_mid;
    if (fe::is_quadratic(kind)) {
        curved_mid.assign(quads.size(), Eigen::Vector2d::Constant(std::nan("")));
        for (const BoundaryHalf& h : halves) {
            const geometry::Curve& c = tm.curves[h.curve];
            if (c.kind == geometry::CurveKind::arc)
                curved_mid[4 * h.quad + h.local_edge] = c.point_at(0.5 * (h.t0 + h.t1));
        }
    }
    smooth(mesh.nodes, quads, fixed, curved_mid, smoothing_passes);

    // Quadratic nodes: one per quadrilateral edge, shared by the two elements
    // that meet there. Quadrilateral edges are numbered by their lower corner
    // pair through a sort, which is deterministic.
    const int n_quads = static_cast<int>(quads.size() / 4);
    const int npe = fe::node_count(kind);
    mesh.connectivity.assign(static_cast<size_t>(n_quads) * npe, -1);
    for (int q = 0; q < n_quads; ++q)
        for (int k = 0; k < 4; ++k)
            mesh.connectivity[static_cast<size_t>(q) * npe + k] = quads[4 * q + k];
    if (fe::is_quadratic(kind)) {
        struct EdgeRef {
            int lo, hi, quad, local;
        };
        std::vector<EdgeRef> edges;
        edges.reserve(4 * static_cast<size_t>(n_quads));
        for (int q = 0; q < n_quads; ++q) {
            for (int e = 0; e < 4; ++e) {
                const int a = quads[4 * q + e], b = quads[4 * q + (e + 1) % 4];
                edges.push_back({std::min(a, b), std::max(a, b), q, e});
            }
        }
        std::sort(edges.begin(), edges.end(), [](const EdgeRef& x, const EdgeRef& y) {
            return x.lo != y.lo ? x.lo < y.lo : x.hi != y.hi ? x.hi < y.hi : x.quad < y.quad;
        });
        // Boundary halves put their mid-side node on the curve.
        std::vector<int> curve_of(static_cast<size_t>(n_quads) * 4, -1);
        std::vector<double> t_mid(static_cast<size_t>(n_quads) * 4, 0.0);
        for (const BoundaryHalf& h : halves) {
            curve_of[4 * h.quad + h.local_edge] = h.curve;
            t_mid[4 * h.quad + h.local_edge] = 0.5 * (h.t0 + h.t1);
        }
        for (size_t i = 0; i < edges.size();) {
            size_t j = i + 1;
            while (j < edges.size() && edges[j].lo == edges[i].lo && edges[j].hi == edges[i].hi)
                ++j;
            const int node = static_cast<int>(mesh.nodes.size());
            const size_t slot = 4 * static_cast<size_t>(edges[i].quad) + edges[i].local;
            if (curve_of[slot] >= 0)
                mesh.nodes.push_back(tm.curves[curve_of[slot]].point_at(t_mid[slot]));
            else
                mesh.nodes.push_back(0.5 * (mesh.nodes[edges[i].lo] + mesh.nodes[edges[i].hi]));
            for (size_t k = i; k < j; ++k)
                mesh.connectivity[static_cast<size_t>(edges[k].quad) * npe + 4 + edges[k].local] =
                    node;
            i = j;
        }
        if (kind == fe::ElementKind::Q9) {
            // Centre at the serendipity map's (0, 0): −¼ Σ corners + ½ Σ mid-sides,
            // which keeps a curved edge's element consistent.
            for (int q = 0; q < n_quads; ++q) {
                int* el = &mesh.connectivity[static_cast<size_t>(q) * npe];
                Eigen::Vector2d c = Eigen::Vector2d::Zero();
                for (int k = 0; k < 4; ++k)
                    c += -0.25 * mesh.nodes[el[k]] + 0.5 * mesh.nodes[el[4 + k]];
                el[8] = static_cast<int>(mesh.nodes.size());
                mesh.nodes.push_back(c);
            }
        }
    }

    // Boundary edges with tags, in quadrilateral order; hole node sets.
    std::sort(halves.begin(), halves.end(), [](const BoundaryHalf& x, const BoundaryHalf& y) {
        return x.quad != y.quad ? x.quad < y.quad : x.local_edge < y.local_edge;
    });
    mesh.hole_nodes.resize(n_holes);
    for (int h = 0; h < n_holes; ++h) mesh.hole_nodes[h].hole = h;
    for (const BoundaryHalf& h : halves) {
        BoundaryEdge be;
        be.element = h.quad;
        be.local_edge = h.local_edge;
        const auto local = fe::edge_nodes(kind, h.local_edge);
        for (int k = 0; k < fe::edge_node_count(kind); ++k)
            be.nodes[k] = mesh.connectivity[static_cast<size_t>(h.quad) * npe + local[k]];
        be.tag = tm.curves[h.curve].tag;
        mesh.boundary_edges.push_back(be);
    }
    // Hole nodes in order round the hole: sort by curve index then parameter.
    std::vector<std::vector<std::pair<double, int>>> ordered(n_holes);
    for (const BoundaryHalf& h : halves) {
        const auto& tag = tm.curves[h.curve].tag;
        if (tag.kind != geometry::BoundaryKind::hole) continue;
        const int* el = &mesh.connectivity[static_cast<size_t>(h.quad) * npe];
        const auto local = fe::edge_nodes(kind, h.local_edge);
        const double base = h.curve;
        ordered[tag.index].push_back({base + h.t0, el[local[0]]});
        if (fe::is_quadratic(kind))
            ordered[tag.index].push_back({base + 0.5 * (h.t0 + h.t1), el[local[1]]});
    }
    for (int h = 0; h < n_holes; ++h) {
        std::sort(ordered[h].begin(), ordered[h].end());
        for (const auto& [t, node] : ordered[h]) mesh.hole_nodes[h].nodes.push_back(node);
    }
    return mesh;
}

} // namespace lapwing::mesh::detail
