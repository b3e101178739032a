// A 2D Delaunay triangulation that grows by point insertion (Bowyer 1981,
// Watson 1981), optionally constrained by boundary segments that a cavity never
// crosses: the working structure of the mesher, not part of the Mesh it returns.
#pragma once

#include <Eigen/Core>
#include <array>
#include <cstdint>
#include <vector>

namespace lapwing::mesh::detail {

using Point = Eigen::Vector2d;

struct Triangle {
    std::array<int, 3> v{-1, -1, -1};   // counter-clockwise
    std::array<int, 3> nbr{-1, -1, -1}; // neighbour across the edge opposite v[i]
    std::array<int, 3> seg{-1, -1, -1}; // boundary segment on that edge, or -1
    bool alive = false;
};

// A boundary segment: a piece [t0, t1] of curve `curve`, from vertex a to b,
// with the region on its left.
struct Segment {
    int a = -1, b = -1;
    int curve = -1;
    double t0 = 0.0, t1 = 1.0;
    int tri = -1; // triangle on its left (once segments are constrained)
};

class Triangulation {
public:
    // A triangle enclosing the box [lo, hi] (its vertices are 0, 1, 2).
    Triangulation(const Point& lo, const Point& hi);

    const std::vector<Point>& points() const { return points_; }
    const std::vector<Triangle>& triangles() const { return tris_; }
    std::vector<Segment>& segments() { return segs_; }
    const std::vector<Segment>& segments() const { return segs_; }

    // Unconstrained insertion (before segments are constrained). Returns the
    // vertex id.
    int insert(const Point& p);

    // An existing vertex within `tol` of p, or -1 (before segments are
    // constrained).
    int vertex_at(const Point& p, double tol) const;

    // True if a and b are joined by an edge.
    bool has_edge(int a, int b) const;

    // Records every segment on its triangle edges and deletes the triangles
    // that lie outside the region (right of the segments) with the enclosing
    // triangle. From here on cavities do not cross segments.
    void constrain_and_carve();

    // Locates p starting from triangle `start`. Returns the triangle holding
    // p, or -1 with *blocked_segment set when a segment (or the hull) lies
    // between start and p.
    int locate(const Point& p, int start, int* blocked_segment) const;

    // Cavity of p grown from triangle `seed` (constrained). Fills the
    // segments on the cavity's boundary.
    void cavity_segments(const Point& p, int seed, std::vector<int>& segs_out);

    // Constrained insertion of p into the cavity grown from `seed`; when
    // split_segment >= 0, p splits that segment (which the cavity's seed
    // triangle must hold) into [t0, tm] and [tm, t1]. Returns the vertex id
    // or -1 if the cavity is not star-shaped from p.
    int insert_constrained(const Point& p, int seed, int split_segment, double tm);

    // Triangles created by the latest insertion.
    const std::vector<int>& new_triangles() const { return new_tris_; }

private:
    void grow_cavity(const Point& p, int seed, bool constrained, int split_segment);
    int fill_cavity(const Point& p, int split_segment, double tm);
    int new_triangle();

    std::vector<Point> points_;
    std::vector<Triangle> tris_;
    std::vector<Segment> segs_;
    std::vector<int> vert_tri_; // one triangle touching each vertex
    std::vector<int> free_;
    struct Rim {
        int a, b, outer, seg; // cavity boundary edge a → b, the triangle beyond, its segment
    };
    std::vector<int> cavity_, new_tris_;
    std::vector<Rim> rim_;
    std::vector<std::uint32_t> mark_; // cavity membership stamp per triangle
    std::uint32_t stamp_ = 0;
    bool constrained_ = false;
    int last_ = 0;
};

double orient(const Point& a, const Point& b, const Point& c);
double incircle(const Point& a, const Point& b, const Point& c, const Point& d);
Point circumcentre(const Point& a, const Point& b, const Point& c);

} // namespace lapwing::mesh::detail
