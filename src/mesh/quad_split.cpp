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

    // Cells: a pair of triangles (quadrilateral) or a lone triangle. (A lone
    // triangle cannot join a neighbouring pair: the three triangles always
    // share a vertex, where the pentagon's angle is near 180°.)
    const Pairing pairing = pair_triangles(tri, tm.curves);
    const size_t n_tri = tri_ids.size();
    std::vector<int> cell(tris.size(), -1);
    std::vector<std::array<int, 2>> members;
    for (int t : tri_ids) {
        if (cell[t] >= 0) continue;
        cell[t] = static_cast<int>(members.size());
        members.push_back({t, -1});
        if (pairing.partner[t] >= 0) {
            cell[pairing.partner[t]] = cell[t];
            members.back()[1] = pairing.partner[t];
        }
    }
    const auto cell_size = [&](int c) { return members[c][1] >= 0 ? 2 : 1; };
    const auto is_internal = [&](int t, int e) {
        return tris[t].nbr[e] >= 0 && cell[tris[t].nbr[e]] == cell[t];
    };
    // Boundary edges (triangle, edge) of a cell, chained counter-clockwise;
    // empty if they do not form one simple loop.
    // Boundary edges (triangle, edge) of a cell, chained counter-clockwise
    // into `chain` (at most 4 for a pair); returns their number.
    using EdgeOf = std::pair<int, int>;
    const auto outline_of = [&](int c, std::array<EdgeOf, 4>& chain) {
        std::array<EdgeOf, 4> edges;
        int n = 0;
        for (int t : members[c]) {
            if (t < 0) continue;
            for (int e = 0; e < 3; ++e)
                if (!is_internal(t, e)) edges[n++] = {t, e};
        }
        const auto from = [&](EdgeOf te) { return tris[te.first].v[(te.second + 1) % 3]; };
        const auto to = [&](EdgeOf te) { return tris[te.first].v[(te.second + 2) % 3]; };
        chain[0] = edges[0];
        for (int k = 1; k < n; ++k) {
            for (int j = 0; j < n; ++j)
                if (from(edges[j]) == to(chain[k - 1])) chain[k] = edges[j];
        }
        return n;
    };
    // Edge split points: one node per triangle edge between cells, on the
    // curve for segments. Mostly at the midpoint; on the edges of a lone
    // triangle the split point slides along the edge so that its three
    // quadrilaterals improve: at midpoints an equilateral triangle's
    // quadrilaterals have a det J ratio of 1/3, split at 0.35 from each
    // edge's start (a pinwheel) 0.47. Each lone triangle tries a few
    // positions per edge it owns (edges shared with another lone triangle
    // stay at the midpoint) and keeps the best by polygon_split_score.
    const auto lone = [&](int t) { return t >= 0 && cell_size(cell[t]) == 1; };
    const auto point_on_edge = [&](int t, int e, double lambda) -> Point {
        const Triangle& tr = tris[t];
        if (tr.seg[e] >= 0) {
            const Segment& s = tri.segments()[tr.seg[e]];
            return tm.curves[s.curve].point_at(s.t0 + lambda * (s.t1 - s.t0));
        }
        return pts[tr.v[(e + 1) % 3]] + lambda * (pts[tr.v[(e + 2) % 3]] - pts[tr.v[(e + 1) % 3]]);
    };
    std::vector<std::array<double, 3>> lambda_of(n_tri,
                                                 {0.5, 0.5, 0.5}); // from the edge's start in t
    {
        constexpr std::array<double, 5> options{0.35, 0.5, 0.65, 0.42, 0.58};
        std::vector<Point> corners(3), points(3);
        for (size_t i = 0; i < n_tri; ++i) {
            const int t = tri_ids[i];
            if (!lone(t)) continue;
            std::array<int, 3> n_opt{};
            for (int e = 0; e < 3; ++e) n_opt[e] = lone(tris[t].nbr[e]) ? 1 : 5;
            for (int c = 0; c < 3; ++c) corners[c] = pts[tris[t].v[c]];
            double best = -HUGE_VAL;
            std::array<double, 3> best_lambda{0.35, 0.35, 0.35};
            for (int a0 = 0; a0 < n_opt[0]; ++a0)
                for (int a1 = 0; a1 < n_opt[1]; ++a1)
                    for (int a2 = 0; a2 < n_opt[2]; ++a2) {
                        const std::array<double, 3> l{n_opt[0] > 1 ? options[a0] : 0.5,
                                                      n_opt[1] > 1 ? options[a1] : 0.5,
                                                      n_opt[2] > 1 ? options[a2] : 0.5};
                        // Cell edge c runs from v_c to v_c+1: the triangle edge opposite v_c+2.
                        for (int c = 0; c < 3; ++c)
                            points[c] = point_on_edge(t, (c + 2) % 3, l[(c + 2) % 3]);
                        const double score = polygon_split_score(corners, points);
                        if (score > best + 1e-12) best = score, best_lambda = l;
                    }
            lambda_of[i] = best_lambda;
        }
    }
    std::vector<std::array<int, 3>> mid(n_tri, {-1, -1, -1});
    std::vector<std::array<double, 3>> split_t(n_tri, {0.5, 0.5, 0.5}); // segment parameter
    for (size_t i = 0; i < n_tri; ++i) {
        const int ti = tri_ids[i];
        const Triangle& t = tris[ti];
        for (int e = 0; e < 3; ++e) {
            if (mid[i][e] >= 0 || is_internal(ti, e)) continue;
            const int node = static_cast<int>(mesh.nodes.size());
            const Point& a = pts[t.v[(e + 1) % 3]];
            const Point& b = pts[t.v[(e + 2) % 3]];
            double lambda = 0.5;
            if (lone(ti)) lambda = lambda_of[i][e];
            if (!lone(ti) && lone(t.nbr[e])) {
                const int j = compact[t.nbr[e]];
                const Triangle& u = tris[t.nbr[e]];
                for (int k = 0; k < 3; ++k)
                    if (u.nbr[k] == ti) lambda = 1.0 - lambda_of[j][k];
            }
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

    // Each cell: corners and edges counter-clockwise, a centre node at the
    // corners' mean, and one quadrilateral per corner.
    std::vector<int> quads;
    quads.reserve(12 * n_tri);
    std::vector<BoundaryHalf> halves;
    struct CellEdge {
        int mid, seg;
        double split_t;
    };
    std::vector<int> corner;
    std::vector<CellEdge> edge;
    for (int c = 0; c < static_cast<int>(members.size()); ++c) {
        std::array<EdgeOf, 4> chain;
        const int n_chain = outline_of(c, chain);
        corner.clear();
        edge.clear();
        for (int k = 0; k < n_chain; ++k) {
            const auto [t, e] = chain[k];
            const int i = compact[t];
            corner.push_back(tris[t].v[(e + 1) % 3]);
            edge.push_back({mid[i][e], tris[t].seg[e], split_t[i][e]});
        }
        const int n_corners = static_cast<int>(corner.size());
        Point centre = Point::Zero();
        for (int k = 0; k < n_corners; ++k) centre += pts[corner[k]];
        const int g = static_cast<int>(mesh.nodes.size());
        mesh.nodes.push_back(centre / n_corners);
        fixed.push_back(false);
        // Quadrilateral at corner k: v_k, split point of cell edge k, centre,
        // split point of cell edge k-1. Its edge 0 lies on cell edge k, its
        // edge 3 on cell edge k-1.
        for (int k = 0; k < n_corners; ++k) {
            const int prev = (k + n_corners - 1) % n_corners;
            const int q = static_cast<int>(quads.size() / 4);
            quads.insert(quads.end(), {vertex_node[corner[k]], edge[k].mid, g, edge[prev].mid});
            if (edge[k].seg >= 0) {
                const Segment& s = tri.segments()[edge[k].seg];
                halves.push_back({q, 0, s.curve, s.t0, edge[k].split_t});
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
    // that meet there. Quadrilateral edges are numbered in the order of their
    // (lower, higher corner, quadrilateral), which is deterministic: bucketed
    // by the lower corner, then each small bucket sorted.
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
        const size_t n_corners = mesh.nodes.size();
        std::vector<int> bucket(n_corners + 1, 0);
        for (int q = 0; q < n_quads; ++q)
            for (int e = 0; e < 4; ++e)
                ++bucket[std::min(quads[4 * q + e], quads[4 * q + (e + 1) % 4]) + 1];
        for (size_t v = 0; v < n_corners; ++v) bucket[v + 1] += bucket[v];
        std::vector<EdgeRef> edges(4 * static_cast<size_t>(n_quads));
        {
            std::vector<int> fill(bucket.begin(), bucket.end() - 1);
            for (int q = 0; q < n_quads; ++q) {
                for (int e = 0; e < 4; ++e) {
                    const int a = quads[4 * q + e], b = quads[4 * q + (e + 1) % 4];
                    edges[fill[std::min(a, b)]++] = {std::min(a, b), std::max(a, b), q, e};
                }
            }
        }
        for (size_t v = 0; v < n_corners; ++v)
            std::sort(edges.begin() + bucket[v], edges.begin() + bucket[v + 1],
                      [](const EdgeRef& x, const EdgeRef& y) {
                          return x.hi != y.hi ? x.hi < y.hi : x.quad < y.quad;
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
