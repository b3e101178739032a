// The connection as plain data: everything the later stages need, already
// resolved (no expressions left) and in N·mm·MPa. Angles are in degrees,
// measured counter-clockwise from the plate's +x axis.
#pragma once

#include "core/units.hpp"

#include <map>
#include <optional>
#include <string>
#include <vector>

namespace lapwing::model {

struct Point {
    double x = 0.0; // mm
    double y = 0.0; // mm
    friend bool operator==(const Point&, const Point&) = default;
};

// Title-block data, printed on every sheet of the calc record.
struct Job {
    std::string title;
    std::string project;
    std::string mark; // connection mark on the drawings
    std::string prepared_by;
    std::string checked_by;
    std::string revision;
    std::string notes;
};

struct Material {
    std::string grade;   // free label, printed as given
    double E = 200000.0; // MPa
    double nu = 0.3;     // Poisson's ratio
    double Fy = 0.0;     // yield stress, MPa
    double Fu = 0.0;     // tensile strength, MPa
};

// How a plate corner is finished: left sharp, cut straight (chamfer: the
// cut starts `size` from the corner along both edges) or rounded (fillet of
// radius `size`, tangent to both edges).
enum class CornerKind { sharp, chamfer, fillet };

struct Corner {
    Point at;
    CornerKind kind = CornerKind::sharp;
    double size = 0.0;     // mm: chamfer leg or fillet radius
    std::string edge_name; // optional name of the segment from this corner to the next
};

struct Cutout {
    std::string name;
    std::vector<Point> points; // polygon, as typed (either orientation)
};

// Outline segment i runs from corner i to corner (i+1) mod n; supports and
// edge loads name edges by that index (or by the segment's name).
struct Plate {
    double thickness = 0.0;      // mm
    std::vector<Corner> outline; // counter-clockwise
    std::vector<Cutout> cutouts;
};

enum class HoleKind { standard, oversized, short_slot, long_slot };
enum class HoleRule { metric, inch };       // which clearance table resolved the hole
enum class SlotDirection { across, along }; // long side across or along the group axis

// The hole every bolt of a group sits in, resolved from its kind and the
// stated clearance rule (or the user's explicit sizes).
struct Hole {
    HoleKind kind = HoleKind::standard;
    double width = 0.0;  // mm: the hole diameter, or the slot's short side
    double length = 0.0; // mm: equal to width for round holes
    SlotDirection direction = SlotDirection::across;
    bool user_given = false; // sizes entered by the user rather than from the rule
    HoleRule rule = HoleRule::metric;
};

// How the bolt's node is tied to its hole edge (DESIGN: connection modelling).
enum class TieKind {
    spread,  // distributing tie over the whole hole edge; lets the hole deform
    bearing, // contact on the loaded half only
    cosine,  // no tie: the classical equal share of the member's force, put on the hole as a
             // cosine bearing pressure (members only; analysis/bearing_share.hpp)
};

enum class StiffnessKind { formula, given, rigid };

// A rectangular pattern: `rows` along the group axis at `pitch`, `lines`
// across it at `gauge`. Row 0, line 0 sits at `origin`; the axis points at
// `angle`, lines step to its left (+90°). With `stagger`, odd lines shift by
// half a pitch along the axis.
struct BoltGroup {
    std::string name;
    Point origin;
    double angle = 0.0; // degrees
    int rows = 1;
    int lines = 1;
    double pitch = 0.0; // mm, along the axis
    double gauge = 0.0; // mm, across the axis
    bool stagger = false;
    double diameter = 0.0; // mm, nominal bolt diameter
    Hole hole;
    int shear_planes = 1;
    TieKind tie = TieKind::spread;
    StiffnessKind stiffness = StiffnessKind::formula;
    double spring = 0.0; // N/mm, only for StiffnessKind::given
};

struct BoltPosition {
    Point centre; // plate coordinates, mm
    int row = 0;
    int line = 0;
};

// Member end forces for one load case, acting on the plate through the
// member's bolts or welds: axial along the member axis (+ = tension, pulling
// away from the joint), shear at +90° to it, moment counter-clockwise about
// `moment_point`.
struct MemberForces {
    double axial = 0.0;  // N
    double shear = 0.0;  // N
    double moment = 0.0; // N·mm
    Point moment_point;  // mm
};

struct Member {
    std::string name;
    std::string bolt_group;                     // carrying group, empty when welded
    std::vector<int> welded_edges;              // outline segments, empty when bolted
    Point work_point;                           // mm
    double angle = 0.0;                         // degrees, from the joint out along the member
    double ply_thickness = 0.0;                 // mm: the member's connected ply (bolt flexibility)
    double ply_modulus = 0.0;                   // MPa
    std::map<std::string, MemberForces> forces; // by load case name
};

enum class SupportKind { welded, bolted, symmetry };

struct Support {
    std::string name;
    SupportKind kind = SupportKind::welded;
    std::vector<int> edges;   // welded: outline segments
    std::string bolt_group;   // bolted: the group fixed to the support
    Point line_from, line_to; // symmetry: the line
};

// A distributed load on one outline segment: either a traction (force per
// unit length along the edge) or a total force spread evenly over it.
struct EdgeLoad {
    int edge = 0;
    std::string load_case;
    bool total = false; // true: `value` is the total force, else force per length
    double fx = 0.0;    // N/mm, or N when total
    double fy = 0.0;
};

struct LoadCase {
    std::string name;
    std::string description;
};

struct Combination {
    std::string name;
    std::map<std::string, double> factors; // load case → factor
};

// A capacity entered by the user: a resolved number and the text it came
// from, so the calc sheet can print "0.9*Fy = 310.5 MPa".
struct Allowable {
    bool given = false;
    double value = 0.0; // internal units (MPa, N/mm, …)
    std::string source; // the expression as typed; empty for a plain number
};

// Bolt bearing and tear-out. Two published forms; the user chooses one.
//  factor:  Rn = bearing_factor·d·t·Fu, tear-out Rn = tearout_factor·lc·t·Fu,
//           design value resistance_factor·Rn (AISC 360-16 §J3.10 form).
//  partial: Fb = k1·alpha_b·Fu·d·t / gamma_M2 (EN 1993-1-8 Table 3.4 form).
struct BearingAllowable {
    enum class Style { factor, partial } style = Style::factor;
    double bearing_factor = 2.4;
    double tearout_factor = 1.2;
    double resistance_factor = 0.75;
    double k1 = 2.5;
    double alpha_b = 1.0;
    double gamma_M2 = 1.25;
};

// Block shear: factor form Rn = 0.6 Fu Anv + Ubs Fu Ant ≤ 0.6 Fy Agv + Ubs
// Fu Ant times resistance_factor (AISC 360-16 §J4.3), or partial form
// Ubs·Fu·Ant/gamma_M2 + Fy·Anv/(√3·gamma_M0) (EN 1993-1-8 §3.10.2).
struct BlockShearAllowable {
    enum class Style { factor, partial } style = Style::factor;
    double resistance_factor = 0.75;
    double Ubs = 1.0;
    double gamma_M0 = 1.0;
    double gamma_M2 = 1.25;
};

// Whitmore buckling: effective length factor K (commonly 0.5–0.65 for a
// gusset, Thornton 1984; 0.65 by default) and the resistance factor.
struct WhitmoreBuckling {
    double K = 0.65;
    double resistance_factor = 0.9;
};

// Which peaks count as "at a bolt hole": points closer to a bolt hole's edge
// than bolt_hole_zone times its diameter (a slot: its width). 0 puts every
// peak in the one `peak_von_mises` row. See src/check/peaks.hpp.
struct PeakZones {
    double bolt_hole_zone = 0.5;
};

struct Allowables {
    // Peak von Mises outside the bolt-hole zones (check/peaks.hpp), and
    // inside them; the second is usually left unset (information only), as
    // the bearing and tear-out rows check the holes.
    Allowable peak_von_mises;
    Allowable peak_von_mises_at_bolt_holes;
    Allowable section_membrane;
    Allowable membrane_plus_bending;
    Allowable section_shear;
    Allowable whitmore_yield;
    Allowable gross_tension;
    Allowable net_tension;
    Allowable gross_shear;
    Allowable net_shear;
    Allowable weld_per_length; // N/mm
    BearingAllowable bearing;
    BlockShearAllowable block_shear;
    WhitmoreBuckling whitmore_buckling;
    PeakZones peak;
};

// The capacities entered as one number or expression each, with their
// template key, their words in the summary and what they measure; the
// reader, the summary and the resolved writer all walk this table.
struct AllowableEntry {
    const char* key;
    const char* label;
    Allowable Allowables::*member;
    Quantity quantity;
};
inline constexpr AllowableEntry allowable_entries[] = {
    {"peak_von_mises", "peak von Mises away from bolt holes", &Allowables::peak_von_mises,
     Quantity::stress},
    {"peak_von_mises_at_bolt_holes", "peak von Mises at bolt holes",
     &Allowables::peak_von_mises_at_bolt_holes, Quantity::stress},
    {"section_membrane", "section membrane", &Allowables::section_membrane, Quantity::stress},
    {"membrane_plus_bending", "membrane + bending", &Allowables::membrane_plus_bending,
     Quantity::stress},
    {"section_shear", "section average shear", &Allowables::section_shear, Quantity::stress},
    {"whitmore_yield", "Whitmore yielding", &Allowables::whitmore_yield, Quantity::stress},
    {"gross_tension", "gross section tension", &Allowables::gross_tension, Quantity::stress},
    {"net_tension", "net section tension", &Allowables::net_tension, Quantity::stress},
    {"gross_shear", "gross section shear", &Allowables::gross_shear, Quantity::stress},
    {"net_shear", "net section shear", &Allowables::net_shear, Quantity::stress},
    {"weld_per_length", "weld force per length", &Allowables::weld_per_length,
     Quantity::force_per_length},
};

enum class ElementChoice { Q4, Q4i, Q8, Q9 }; // same names as fe::ElementKind

struct MeshControls {
    ElementChoice element = ElementChoice::Q8;
    double size = 0.0;           // mm, target element size
    int around_hole = 16;        // elements around each hole edge
    double near_hole_size = 0.0; // mm, element size next to holes
};

struct SectionLine {
    std::string name;
    Point from, to;
};

struct ReportOptions {
    std::vector<std::string> formats{"html", "json"};
    bool figures = true;
    double deformed_scale = 0.0; // 0: chosen automatically
};

struct Connection {
    Job job;
    UnitSystem units = UnitSystem::n_mm; // the user's choice, for output
    Material material;
    Plate plate;
    std::vector<BoltGroup> bolt_groups;
    std::vector<Member> members;
    std::vector<Support> supports;
    std::vector<EdgeLoad> edge_loads;
    std::vector<LoadCase> load_cases;
    std::vector<Combination> combinations;
    Allowables allowables;
    MeshControls mesh;
    std::vector<SectionLine> section_lines;
    ReportOptions report;
    std::map<std::string, double> parameters; // resolved, in the user's units
};

// The template's words for each enumeration, in enumeration order: the
// reader, the summary and the resolved writer all use these lists.
inline const std::vector<std::string> hole_kind_words{"standard", "oversized", "short_slot",
                                                      "long_slot"};
inline const std::vector<std::string> hole_rule_words{"metric", "inch"};
inline const std::vector<std::string> slot_direction_words{"across", "along"};
inline const std::vector<std::string> tie_words{"spread", "bearing", "cosine"};
inline const std::vector<std::string> stiffness_words{"formula", "given", "rigid"};
inline const std::vector<std::string> support_words{"welded", "bolted", "symmetry"};
inline const std::vector<std::string> style_words{"factor", "partial"};
inline const std::vector<std::string> element_words{"Q4", "Q4i", "Q8", "Q9"};

// The word of one enumerator, e.g. word(tie_words, TieKind::bearing) == "bearing".
template <typename Enum>
const std::string& word(const std::vector<std::string>& words, Enum value) {
    return words.at(static_cast<size_t>(value));
}

const BoltGroup* find_bolt_group(const Connection& connection, const std::string& name);

} // namespace lapwing::model
