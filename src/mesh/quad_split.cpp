// Triangle → three quadrilaterals (centroid plus edge midpoints), a split
// that keeps the mesh conforming and needs no matching (Lo 2015, "Finite
// element mesh generation", §4 on triangle-to-quad conversion).
#include "mesh/quad_split.hpp"

#include <algorithm>

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

    // Edge midpoints: one node per triangle edge, on the curve for segments.
    const size_t n_tri = tri_ids.size();
    std::vector<std::array<int, 3>> mid(n_tri, {-1, -1, -1});
    for (size_t i = 0; i < n_tri; ++i) {
        const Triangle& t = tris[tri_ids[i]];
        for (int e = 0; e < 3; ++e) {
            if (mid[i][e] >= 0) continue;
            const int node = static_cast<int>(mesh.nodes.size());
            const Point& a = pts[t.v[(e + 1) % 3]];
            const Point& b = pts[t.v[(e + 2) % 3]];
            if (t.seg[e] >= 0) {
                const Segment& s = tri.segments()[t.seg[e]];
                mesh.nodes.push_back(tm.curves[s.curve].point_at(0.5 * (s.t0 + s.t1)));
                fixed.push_back(true);
            } else {
                mesh.nodes.push_back(0.5 * (a + b));
                fixed.push_back(false);
            }
            mid[i][e] = node;
            if (t.nbr[e] >= 0) {
                const int j = compact[t.nbr[e]];
                const Triangle& u = tris[t.nbr[e]];
                for (int k = 0; k < 3; ++k)
                    if (u.nbr[k] == tri_ids[i]) mid[j][k] = node;
            }
        }
    }
    const int first_centroid = static_cast<int>(mesh.nodes.size());
    for (int t : tri_ids) {
        const Triangle& tr = tris[t];
        mesh.nodes.push_back((pts[tr.v[0]] + pts[tr.v[1]] + pts[tr.v[2]]) / 3.0);
        fixed.push_back(false);
    }

    // Quadrilateral at corner i of triangle (v0, v1, v2): v_i, midpoint of
    // edge (v_i, v_i+1), centroid, midpoint of edge (v_i-1, v_i). The midpoint
    // of edge (v_i, v_i+1) is the one opposite v_i+2.
    std::vector<int> quads;
    quads.reserve(12 * n_tri);
    std::vector<BoundaryHalf> halves;
    for (size_t i = 0; i < n_tri; ++i) {
        const Triangle& t = tris[tri_ids[i]];
        const int g = first_centroid + static_cast<int>(i);
        for (int c = 0; c < 3; ++c) {
            const int next = (c + 1) % 3, prev = (c + 2) % 3;
            const int q = static_cast<int>(quads.size() / 4);
            quads.insert(quads.end(), {vertex_node[t.v[c]], mid[i][prev], g, mid[i][next]});
            // Edge 0 lies on triangle edge (v_c, v_next) = opposite v_prev; edge 3 on (v_prev,
            // v_c).
            if (t.seg[prev] >= 0) {
                const Segment& s = tri.segments()[t.seg[prev]];
                halves.push_back({q, 0, s.curve, s.t0, 0.5 * (s.t0 + s.t1)});
            }
            if (t.seg[next] >= 0) {
                const Segment& s = tri.segments()[t.seg[next]];
                halves.push_back({q, 3, s.curve, 0.5 * (s.t0 + s.t1), s.t1});
            }
        }
    }

    smooth(mesh.nodes, quads, fixed, smoothing_passes);

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
