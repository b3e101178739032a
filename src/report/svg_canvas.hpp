// The drawing surface every figure shares: plate coordinates (mm, y up) to
// SVG pixels (y down), fitted to a width with a margin, and the few SVG
// pieces the figures reuse (element outlines, the plate boundary, arrows).
#pragma once

#include "mesh/mesh.hpp"

#include <Eigen/Core>
#include <string>

namespace lapwing::report {

// Appends `v` as "{:.1f}" would (fmt, printf: the exact binary value
// rounded to one decimal, ties to even, "-0.0" for a negative value that
// rounds to zero), in a few dozen instructions rather than the several
// hundred of a general fixed-precision formatter; figures hold ~10⁶ numbers.
void append_fixed1(std::string& out, double v);

class Canvas {
public:
    // Fits the box [lo, hi] (mm) into `width_px`, leaving `margin_px` round it
    // and `extra_right_px` on the right (for a legend).
    Canvas(Eigen::Vector2d lo, Eigen::Vector2d hi, double width_px, double margin_px,
           double extra_right_px = 0);

    double x(double model_x) const { return margin_ + (model_x - lo_.x()) * scale_; }
    double y(double model_y) const { return margin_ + (hi_.y() - model_y) * scale_; }
    std::string point(const Eigen::Vector2d& p) const; // "x,y" with 0.1 px resolution
    double scale() const { return scale_; }            // px per mm
    double width() const { return width_; }
    double height() const { return height_; }

    // <svg ...> with a viewBox, a title for screen readers, and </svg>.
    std::string open(const std::string& title) const;
    static std::string close() { return "</svg>\n"; }

private:
    Eigen::Vector2d lo_, hi_;
    double scale_ = 1, margin_ = 0, width_ = 0, height_ = 0;
};

// Bounding box of the mesh nodes, mm.
void bounds(const mesh::Mesh& mesh, Eigen::Vector2d& lo, Eigen::Vector2d& hi);

// Position of node `n` moved by `scale` times its displacement in `u`
// (interleaved dofs; empty `u` or scale 0 gives the node itself).
Eigen::Vector2d placed(const mesh::Mesh& mesh, int n, const Eigen::VectorXd* u, double scale);

// SVG path data of element e's outline: straight for Q4, quadratic Bézier
// curves through the mid-side nodes for Q8/Q9.
std::string element_path(const mesh::Mesh& mesh, int e, const Canvas& canvas,
                         const Eigen::VectorXd* u = nullptr, double scale = 0);

// Path data of every boundary edge of the mesh (outline, holes, cut-outs).
std::string boundary_path(const mesh::Mesh& mesh, const Canvas& canvas,
                          const Eigen::VectorXd* u = nullptr, double scale = 0);

// An arrow from `from` to `to` (pixels) as a line and a filled head.
std::string arrow(Eigen::Vector2d from_px, Eigen::Vector2d to_px, const std::string& colour,
                  double width_px);

} // namespace lapwing::report
