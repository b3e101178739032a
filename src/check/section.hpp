// Section lines and the stresses along them (DESIGN: Checks): Whitmore
// lines, net sections through bolt rows, welded interfaces and the user's
// cut lines; along each, the force resultants, the average stresses, the
// linearized membrane / bending / peak stresses and the profile.
#pragma once

#include <Eigen/Core>
#include <string>
#include <vector>

namespace lapwing::check {

enum class SectionKind {
    whitmore, // 30° spread from the first bolt row, measured at the last row (Whitmore 1952)
    net,      // through one bolt row, normal to the member axis, edge to edge
    weld,     // along a welded interface (a welded support or a welded member edge)
    user,     // a cut line from the template ([[section]])
};
const char* word(SectionKind kind);

// A piece of the line inside plate material, as distances from `from`, mm.
struct Interval {
    double begin = 0, end = 0;
    double length() const { return end - begin; }
};

struct SectionLine {
    std::string id; // stable, e.g. "whitmore-brace", "net-brace-row1", "weld-base", "user-cut1"
    SectionKind kind = SectionKind::user;
    std::string label; // words for the calc sheet, e.g. "Whitmore section of member brace"
    Eigen::Vector2d from{0, 0}, to{0, 0}; // the line's ends after clipping to the plate, mm
    std::vector<Interval> material;       // pieces inside the plate (holes and cut-outs removed)
    int member = -1;                      // Connection::members index it belongs to, or -1
    int group = -1;                       // Connection::bolt_groups index, or -1
    int support = -1;                     // Connection::supports index (weld lines), or -1
    int row = -1;                         // bolt row of a net section, or -1
    double unclipped_length = 0; // whitmore: g + 2 L tan 30° before clipping, mm; else the length
    double whitmore_gauge = 0;   // whitmore: g, the first row's outer bolt lines apart, mm
    double whitmore_length = 0;  // whitmore: L, first row to last row along the member, mm

    double length() const { return (to - from).norm(); }
    double material_length() const {
        double sum = 0;
        for (const Interval& i : material) sum += i.length();
        return sum;
    }
    // Unit vector along the line and the unit normal 90° counter-clockwise
    // from it; the normal stress on the line is n·σ·n, the shear t·σ·n.
    Eigen::Vector2d tangent() const { return (to - from).normalized(); }
    Eigen::Vector2d normal() const {
        const Eigen::Vector2d t = tangent();
        return {-t.y(), t.x()};
    }
};

// Linearized stresses over one piece (ASME BPVC VIII-2 Annex 5-A form):
// σm = (1/ℓ)∫σ ds, σb = (6/ℓ²)∫σ (ℓ/2 − s) ds, peak = max |σ − σm − σb(1 − 2s/ℓ)|.
struct Linearized {
    double membrane = 0;
    double bending = 0; // at the piece's start (s = 0); the other end has −bending
    double peak = 0;    // largest |non-linear part|
};

struct ProfilePoint {
    double s = 0;      // distance from SectionLine::from, mm
    double normal = 0; // n·σ·n, MPa
    double shear = 0;  // t·σ·n, MPa
    double von_mises = 0;
};

// One section in one load case or combination.
struct SectionStress {
    int section = -1; // index into the section list
    double N = 0;     // ∫ n·σ·n t ds: force normal to the line, tension positive, N
    double V = 0;     // ∫ t·σ·n t ds: force along the line, N
    double M = 0;     // ∫ n·σ·n (s − s_c) t ds about the material's centroid s_c, N·mm
    double average_normal = 0;            // N / (material length · t), MPa
    double average_shear = 0;             // V / (material length · t), MPa
    std::vector<Linearized> pieces;       // per SectionLine::material interval
    double max_membrane = 0;              // largest |membrane| over the pieces, MPa
    double max_membrane_plus_bending = 0; // largest |membrane| + |bending|, MPa
    double max_peak = 0;
    std::vector<ProfilePoint> profile; // ordered by s, for the calc sheet's plots
    // Stress points outside the mesh (true material beyond a straight Q4
    // edge, or beyond a quadratic edge between its nodes on an arc) whose
    // stress was extrapolated from the element next to them.
    int extrapolated_points = 0;
    // The same resultants from the element nodal forces k_e u_e on one side
    // of the cut (a free body, exact to round-off by equilibrium), when the
    // line cuts the plate in two or lies on its edge (weld lines); the
    // difference from N, V, M is a figure of the stress integral's quality.
    bool free_body = false;
    double N_free_body = 0, V_free_body = 0, M_free_body = 0;
};

} // namespace lapwing::check
