// summarize(): the resolved model as readable, stable text in the user's
// units (what `lapwing validate` prints).
#include "input/load_connection.hpp"
#include "model/bolts.hpp"

#include <fmt/format.h>

namespace lapwing::input {

namespace {

class Writer {
public:
    explicit Writer(UnitSystem units) : units_(units) {}

    // A value in the user's units with its label, 6 significant digits.
    std::string q(double internal, Quantity quantity) const {
        const auto label = unit_label(quantity, units_);
        const std::string v = fmt::format("{:.6g}", from_internal(internal, quantity, units_));
        return label.empty() ? v : v + " " + std::string(label);
    }
    std::string point(model::Point p) const {
        return fmt::format("({:.6g}, {:.6g}) {}", from_internal(p.x, Quantity::length, units_),
                           from_internal(p.y, Quantity::length, units_),
                           unit_label(Quantity::length, units_));
    }
    void line(int indent, const std::string& text) {
        out_ += std::string(static_cast<size_t>(indent) * 2, ' ') + text + "\n";
    }
    std::string str() const { return out_; }

private:
    UnitSystem units_;
    std::string out_;
};

std::string edge_label(const model::Plate& plate, int edge) {
    const auto& name = plate.outline[static_cast<size_t>(edge)].edge_name;
    return name.empty() ? fmt::format("segment {}", edge)
                        : fmt::format("segment {} \"{}\"", edge, name);
}

std::string edges_label(const model::Plate& plate, const std::vector<int>& edges) {
    std::string out;
    for (int e : edges) out += (out.empty() ? "" : ", ") + edge_label(plate, e);
    return out;
}

void allowable(Writer& w, const char* name, const model::Allowable& a, Quantity quantity) {
    if (!a.given) {
        w.line(1, fmt::format("{}: not given (check not made)", name));
        return;
    }
    w.line(1, a.source.empty()
                  ? fmt::format("{}: {}", name, w.q(a.value, quantity))
                  : fmt::format("{}: {} = {}", name, a.source, w.q(a.value, quantity)));
}

} // namespace

std::string summarize(const model::Connection& c) {
    Writer w(c.units);
    const auto& j = c.job;
    if (!(j.title + j.project + j.mark + j.prepared_by + j.checked_by + j.revision + j.notes)
             .empty())
        w.line(0, "job");
    for (const auto& [key, value] : {std::pair{"title", j.title},
                                     {"project", j.project},
                                     {"mark", j.mark},
                                     {"prepared by", j.prepared_by},
                                     {"checked by", j.checked_by},
                                     {"revision", j.revision},
                                     {"notes", j.notes}}) {
        if (!value.empty()) w.line(1, fmt::format("{}: {}", key, value));
    }
    w.line(0, fmt::format(
                  "units: {} (length {}, force {}, stress {}, moment {})", name(c.units),
                  unit_label(Quantity::length, c.units), unit_label(Quantity::force, c.units),
                  unit_label(Quantity::stress, c.units), unit_label(Quantity::moment, c.units)));
    if (!c.parameters.empty()) {
        w.line(0, "parameters");
        for (const auto& [key, value] : c.parameters)
            w.line(1, fmt::format("{} = {:.6g}", key, value));
    }
    const auto& m = c.material;
    w.line(0, fmt::format("material{}", m.grade.empty() ? "" : " \"" + m.grade + "\""));
    w.line(1, fmt::format("E = {}, nu = {:.6g}, Fy = {}, Fu = {}", w.q(m.E, Quantity::stress), m.nu,
                          w.q(m.Fy, Quantity::stress), w.q(m.Fu, Quantity::stress)));

    const auto& p = c.plate;
    w.line(0, fmt::format("plate: thickness {}, {} corners, {} cut-outs",
                          w.q(p.thickness, Quantity::length), p.outline.size(), p.cutouts.size()));
    for (size_t i = 0; i < p.outline.size(); ++i) {
        const auto& k = p.outline[i];
        std::string finish;
        if (k.kind == model::CornerKind::chamfer)
            finish = ", chamfer " + w.q(k.size, Quantity::length);
        if (k.kind == model::CornerKind::fillet)
            finish = ", fillet radius " + w.q(k.size, Quantity::length);
        w.line(1, fmt::format("corner {} at {}{}; then {}", i, w.point(k.at), finish,
                              edge_label(p, static_cast<int>(i))));
    }
    for (const auto& cut : p.cutouts) {
        std::string pts;
        for (const auto& q : cut.points)
            pts += fmt::format("{}{}", pts.empty() ? "" : " ", w.point(q));
        w.line(1, fmt::format("cut-out \"{}\": {}", cut.name, pts));
    }

    for (const auto& g : c.bolt_groups) {
        w.line(0, fmt::format("bolt group \"{}\": {} rows x {} lines{}, {} bolts", g.name, g.rows,
                              g.lines, g.stagger ? " staggered" : "", g.rows * g.lines));
        std::string spacing;
        if (g.rows > 1) spacing += ", pitch " + w.q(g.pitch, Quantity::length);
        if (g.lines > 1) spacing += ", gauge " + w.q(g.gauge, Quantity::length);
        w.line(1, fmt::format("origin {}, axis {:.6g}°{}", w.point(g.origin), g.angle, spacing));
        const bool round = g.hole.length == g.hole.width;
        const std::string hole =
            round
                ? "diameter " + w.q(g.hole.width, Quantity::length)
                : fmt::format("{} x {}, long side {} the axis", w.q(g.hole.width, Quantity::length),
                              w.q(g.hole.length, Quantity::length),
                              model::word(model::slot_direction_words, g.hole.direction));
        w.line(1, fmt::format("bolt diameter {}; {} hole {} ({})",
                              w.q(g.diameter, Quantity::length), model::name(g.hole.kind), hole,
                              g.hole.user_given                        ? "as given"
                              : g.hole.rule == model::HoleRule::metric ? "metric clearance rule"
                                                                       : "inch clearance rule"));
        const char* stiffness = g.stiffness == model::StiffnessKind::formula
                                    ? "from the flexibility formula"
                                : g.stiffness == model::StiffnessKind::rigid ? "rigid"
                                                                             : "given";
        w.line(1, fmt::format("shear planes {}, tie {}, stiffness {}{}", g.shear_planes,
                              model::word(model::tie_words, g.tie), stiffness,
                              g.stiffness == model::StiffnessKind::given
                                  ? fmt::format(" {}", w.q(g.spring, Quantity::force_per_length))
                                  : std::string()));
        for (const auto& b : model::bolt_positions(g))
            w.line(2, fmt::format("bolt row {} line {} at {}", b.row, b.line, w.point(b.centre)));
    }

    w.line(0, "load cases");
    for (const auto& lc : c.load_cases)
        w.line(1,
               lc.description.empty() ? lc.name : fmt::format("{}: {}", lc.name, lc.description));
    for (const auto& combo : c.combinations) {
        std::string terms;
        for (const auto& [name, factor] : combo.factors)
            terms += fmt::format("{}{:.6g} x {}", terms.empty() ? "" : " + ", factor, name);
        w.line(0, fmt::format("combination \"{}\" = {}", combo.name, terms));
    }
    for (const auto& mem : c.members) {
        w.line(0,
               fmt::format("member \"{}\": carried by {}", mem.name,
                           mem.bolt_group.empty() ? "welds on " + edges_label(p, mem.welded_edges)
                                                  : "bolt group \"" + mem.bolt_group + "\""));
        w.line(1, fmt::format("work point {}, axis {:.6g}°, ply {} thick, E {}",
                              w.point(mem.work_point), mem.angle,
                              w.q(mem.ply_thickness, Quantity::length),
                              w.q(mem.ply_modulus, Quantity::stress)));
        for (const auto& [lc, f] : mem.forces) {
            w.line(1, fmt::format("{}: axial {}, shear {}, moment {} about {}", lc,
                                  w.q(f.axial, Quantity::force), w.q(f.shear, Quantity::force),
                                  w.q(f.moment, Quantity::moment), w.point(f.moment_point)));
        }
    }
    for (const auto& s : c.supports) {
        const std::string label = s.name.empty() ? "" : " \"" + s.name + "\"";
        if (s.kind == model::SupportKind::welded)
            w.line(0, fmt::format("support{}: welded along {}", label, edges_label(p, s.edges)));
        else if (s.kind == model::SupportKind::bolted)
            w.line(0, fmt::format("support{}: bolt group \"{}\" fixed", label, s.bolt_group));
        else
            w.line(0, fmt::format("support{}: symmetry line {} to {}", label, w.point(s.line_from),
                                  w.point(s.line_to)));
    }
    for (const auto& e : c.edge_loads) {
        const Quantity q = e.total ? Quantity::force : Quantity::force_per_length;
        w.line(0, fmt::format("edge load on {} in \"{}\": {} [{}, {}]", edge_label(p, e.edge),
                              e.load_case, e.total ? "total" : "traction", w.q(e.fx, q),
                              w.q(e.fy, q)));
    }

    const auto& a = c.allowables;
    w.line(0, "allowables");
    for (const auto& entry : model::allowable_entries)
        allowable(w, entry.label, a.*entry.member, entry.quantity);
    const auto& b = a.bearing;
    if (b.style == model::BearingAllowable::Style::factor)
        w.line(1, fmt::format(
                      "bolt bearing: factor form, bearing {:.6g}·d·t·Fu, tear-out {:.6g}·lc·t·Fu, "
                      "resistance factor {:.6g}",
                      b.bearing_factor, b.tearout_factor, b.resistance_factor));
    else
        w.line(1,
               fmt::format(
                   "bolt bearing: partial-factor form, k1 {:.6g}, alpha_b {:.6g}, gamma_M2 {:.6g}",
                   b.k1, b.alpha_b, b.gamma_M2));
    const auto& bs = a.block_shear;
    if (bs.style == model::BlockShearAllowable::Style::factor)
        w.line(1, fmt::format("block shear: factor form, Ubs {:.6g}, resistance factor {:.6g}",
                              bs.Ubs, bs.resistance_factor));
    else
        w.line(1,
               fmt::format(
                   "block shear: partial-factor form, Ubs {:.6g}, gamma_M0 {:.6g}, gamma_M2 {:.6g}",
                   bs.Ubs, bs.gamma_M0, bs.gamma_M2));
    w.line(1, fmt::format("Whitmore buckling: K {:.6g}, resistance factor {:.6g}",
                          a.whitmore_buckling.K, a.whitmore_buckling.resistance_factor));
    w.line(1, fmt::format("peak zones: bolt holes within {:.6g} hole diameters of the edge",
                          a.peak.bolt_hole_zone));

    w.line(0, fmt::format("mesh: {} elements, size {}, {} around each hole, {} next to holes",
                          model::word(model::element_words, c.mesh.element),
                          w.q(c.mesh.size, Quantity::length), c.mesh.around_hole,
                          w.q(c.mesh.near_hole_size, Quantity::length)));
    for (const auto& s : c.section_lines)
        w.line(0, fmt::format("section \"{}\": {} to {}", s.name, w.point(s.from), w.point(s.to)));
    std::string formats;
    for (const auto& f : c.report.formats) formats += (formats.empty() ? "" : ", ") + f;
    w.line(0,
           fmt::format("report: {}; figures {}; deformed scale {}",
                       formats.empty() ? "no files" : formats, c.report.figures ? "on" : "off",
                       c.report.deformed_scale > 0 ? fmt::format("{:.6g}", c.report.deformed_scale)
                                                   : "automatic"));
    return w.str();
}

} // namespace lapwing::input
