// Plate-to-pixel mapping and the shared SVG pieces of the figures.
#include "report/svg_canvas.hpp"

#include "report/text_format.hpp"

#include <algorithm>
#include <charconv>
#include <cmath>
#include <fmt/format.h>

namespace lapwing::report {

Canvas::Canvas(Eigen::Vector2d lo, Eigen::Vector2d hi, double width_px, double margin_px,
               double extra_right_px)
    : lo_(lo), hi_(hi), margin_(margin_px), width_(width_px) {
    const double span_x = std::max(hi.x() - lo.x(), 1e-9);
    const double span_y = std::max(hi.y() - lo.y(), 1e-9);
    scale_ = (width_px - 2 * margin_px - extra_right_px) / span_x;
    // Very tall plates: keep the drawing at most 1.3 times as tall as wide.
    const double max_height = 1.3 * width_px;
    if (span_y * scale_ + 2 * margin_px > max_height)
        scale_ = (max_height - 2 * margin_px) / span_y;
    height_ = std::ceil(span_y * scale_ + 2 * margin_px);
}

void append_fixed1(std::string& out, double v) {
    // Beyond 2^50 tenths, or not finite: the general formatter.
    if (!(std::abs(v) < 1e14)) {
        char text[400];
        out.append(text,
                   std::to_chars(text, text + sizeof text, v, std::chars_format::fixed, 1).ptr);
        return;
    }
    // 10 v rounded to an integer, from p = fl(10 v) and its exact error e
    // (p + e = 10 v exactly): round-to-nearest cannot carry p across a
    // half-integer, which is representable here, so only p on a half
    // needs e (and a true tie goes to even).
    const double p = 10 * v, e = std::fma(v, 10, -p);
    const double f = std::floor(p);
    double n;
    if (p - f == 0.5)
        n = e > 0 ? f + 1 : e < 0 ? f : (std::fmod(f, 2) == 0 ? f : f + 1);
    else
        n = std::nearbyint(p);
    const auto tenths = static_cast<long long>(std::abs(n));
    char text[24];
    char* end = text + sizeof text;
    char* at = end;
    *--at = static_cast<char>('0' + tenths % 10);
    *--at = '.';
    long long whole = tenths / 10;
    do {
        *--at = static_cast<char>('0' + whole % 10);
        whole /= 10;
    } while (whole > 0);
    if (std::signbit(v)) *--at = '-';
    out.append(at, end);
}

std::string Canvas::point(const Eigen::Vector2d& p) const {
    std::string s;
    s.reserve(24);
    append_fixed1(s, x(p.x()));
    s.push_back(',');
    append_fixed1(s, y(p.y()));
    return s;
}

std::string Canvas::open(const std::string& title) const {
    return fmt::format("<svg xmlns=\"http://www.w3.org/2000/svg\" viewBox=\"0 0 {:.0f} {:.0f}\" "
                       "width=\"{:.0f}\" height=\"{:.0f}\" font-family=\"Helvetica, Arial, "
                       "sans-serif\" font-size=\"11\">\n<title>{}</title>\n",
                       width_, height_, width_, height_, escape(title));
}

void bounds(const mesh::Mesh& mesh, Eigen::Vector2d& lo, Eigen::Vector2d& hi) {
    lo = Eigen::Vector2d::Constant(0);
    hi = Eigen::Vector2d::Constant(1);
    if (mesh.nodes.empty()) return;
    lo = hi = mesh.nodes.front();
    for (const auto& p : mesh.nodes) {
        lo = lo.cwiseMin(p);
        hi = hi.cwiseMax(p);
    }
}

Eigen::Vector2d placed(const mesh::Mesh& mesh, int n, const Eigen::VectorXd* u, double scale) {
    const Eigen::Vector2d p = mesh.nodes[static_cast<size_t>(n)];
    if (!u || scale == 0 || u->size() < 2 * n + 2) return p;
    return p + scale * Eigen::Vector2d((*u)[2 * n], (*u)[2 * n + 1]);
}

namespace {

// Control point of the quadratic Bézier through a, mid (at the curve's
// middle, t = 1/2) and b: c = 2·mid − (a + b)/2.
Eigen::Vector2d control(const Eigen::Vector2d& a, const Eigen::Vector2d& mid,
                        const Eigen::Vector2d& b) {
    return 2 * mid - 0.5 * (a + b);
}

} // namespace

std::string element_path(const mesh::Mesh& mesh, int e, const Canvas& canvas,
                         const Eigen::VectorXd* u, double scale) {
    const auto el = mesh.element(e);
    const bool quadratic = el.size() >= 8;
    std::string d = "M" + canvas.point(placed(mesh, el[0], u, scale));
    for (int k = 0; k < 4; ++k) {
        const Eigen::Vector2d a = placed(mesh, el[k], u, scale);
        const Eigen::Vector2d b = placed(mesh, el[(k + 1) % 4], u, scale);
        if (quadratic) {
            const Eigen::Vector2d m = placed(mesh, el[4 + k], u, scale);
            d += "Q" + canvas.point(control(a, m, b)) + " " + canvas.point(b);
        } else {
            d += "L" + canvas.point(b);
        }
    }
    return d + "Z";
}

std::string boundary_path(const mesh::Mesh& mesh, const Canvas& canvas, const Eigen::VectorXd* u,
                          double scale) {
    const bool quadratic = fe::node_count(mesh.kind) >= 8;
    std::string d;
    for (const mesh::BoundaryEdge& edge : mesh.boundary_edges) {
        const auto el = mesh.element(edge.element);
        const int k = edge.local_edge;
        const Eigen::Vector2d a = placed(mesh, el[k], u, scale);
        const Eigen::Vector2d b = placed(mesh, el[(k + 1) % 4], u, scale);
        d += "M" + canvas.point(a);
        if (quadratic)
            d += "Q" + canvas.point(control(a, placed(mesh, el[4 + k], u, scale), b)) + " " +
                 canvas.point(b);
        else
            d += "L" + canvas.point(b);
    }
    return d;
}

std::string arrow(Eigen::Vector2d from_px, Eigen::Vector2d to_px, const std::string& colour,
                  double width_px) {
    const Eigen::Vector2d d = to_px - from_px;
    const double length = d.norm();
    if (length < 1e-6) return "";
    const Eigen::Vector2d t = d / length;
    const Eigen::Vector2d n(-t.y(), t.x());
    const double head = std::min(3.5 * width_px + 4, 0.5 * length);
    const Eigen::Vector2d base = to_px - head * t;
    const Eigen::Vector2d l = base + 0.45 * head * n, r = base - 0.45 * head * n;
    return fmt::format("<line x1=\"{:.1f}\" y1=\"{:.1f}\" x2=\"{:.1f}\" y2=\"{:.1f}\" "
                       "stroke=\"{}\" stroke-width=\"{:.1f}\"/>"
                       "<path d=\"M{:.1f},{:.1f}L{:.1f},{:.1f}L{:.1f},{:.1f}Z\" fill=\"{}\"/>\n",
                       from_px.x(), from_px.y(), base.x(), base.y(), colour, width_px, to_px.x(),
                       to_px.y(), l.x(), l.y(), r.x(), r.y(), colour);
}

} // namespace lapwing::report
