// write_resolved(): the resolved model as a plain template (numbers only, in
// the user's units), which loads back to the same model.
#include "input/load_connection.hpp"

#include <fmt/format.h>

namespace lapwing::input {

namespace {

std::string quote(const std::string& text) {
    std::string out = "\"";
    for (char c : text) {
        switch (c) {
        case '"':
            out += "\\\"";
            break;
        case '\\':
            out += "\\\\";
            break;
        case '\n':
            out += "\\n";
            break;
        case '\t':
            out += "\\t";
            break;
        default:
            if (static_cast<unsigned char>(c) < 0x20)
                out += fmt::format("\\u{:04X}", static_cast<int>(c));
            else
                out += c;
        }
    }
    return out + "\"";
}

// Shortest text that reads back to the same double.
std::string number(double v) {
    return fmt::format("{}", v);
}

class Out {
public:
    explicit Out(UnitSystem units) : units_(units) {}
    std::string q(double internal, Quantity quantity) const {
        return number(from_internal(internal, quantity, units_));
    }
    std::string point(model::Point p) const {
        return fmt::format("[{}, {}]", q(p.x, Quantity::length), q(p.y, Quantity::length));
    }
    void operator()(const std::string& line) { text_ += line + "\n"; }
    template <typename... Args>
    void operator()(fmt::format_string<Args...> f, Args&&... args) {
        text_ += fmt::format(f, std::forward<Args>(args)...) + "\n";
    }
    const std::string& text() const { return text_; }

private:
    UnitSystem units_;
    std::string text_;
};

void allowable(Out& out, const char* key, const model::Allowable& a, Quantity quantity) {
    if (!a.given) return;
    if (a.source.empty())
        out("{} = {}", key, out.q(a.value, quantity));
    else
        out("{} = {}", key, quote(a.source));
}

} // namespace

std::string write_resolved(const model::Connection& c) {
    Out out(c.units);
    out("# Resolved by lapwing: every value as a number in the template's units.");
    out("[job]");
    for (const auto& [key, value] : {std::pair{"title", c.job.title},
                                     {"project", c.job.project},
                                     {"mark", c.job.mark},
                                     {"prepared_by", c.job.prepared_by},
                                     {"checked_by", c.job.checked_by},
                                     {"revision", c.job.revision},
                                     {"notes", c.job.notes}})
        out("{} = {}", key, quote(value));
    out("\n[units]\nsystem = {}", quote(std::string(name(c.units))));
    if (!c.parameters.empty()) {
        out("\n[parameters]");
        for (const auto& [key, value] : c.parameters) out("{} = {}", key, number(value));
    }
    const auto& m = c.material;
    out("\n[material]\ngrade = {}\nE = {}\nnu = {}\nFy = {}\nFu = {}", quote(m.grade),
        out.q(m.E, Quantity::stress), number(m.nu), out.q(m.Fy, Quantity::stress),
        out.q(m.Fu, Quantity::stress));

    out("\n[plate]\nthickness = {}\noutline = [", out.q(c.plate.thickness, Quantity::length));
    for (const auto& k : c.plate.outline) {
        std::string extra;
        if (k.kind == model::CornerKind::chamfer)
            extra += ", chamfer = " + out.q(k.size, Quantity::length);
        if (k.kind == model::CornerKind::fillet)
            extra += ", fillet = " + out.q(k.size, Quantity::length);
        if (!k.edge_name.empty()) extra += ", edge = " + quote(k.edge_name);
        out("  {{ x = {}, y = {}{} }},", out.q(k.at.x, Quantity::length),
            out.q(k.at.y, Quantity::length), extra);
    }
    out("]");
    for (const auto& cut : c.plate.cutouts) {
        std::string points;
        for (const auto& p : cut.points) points += (points.empty() ? "" : ", ") + out.point(p);
        out("\n[[plate.cutout]]\nname = {}\npoints = [{}]", quote(cut.name), points);
    }

    for (const auto& g : c.bolt_groups) {
        out("\n[[bolt_group]]\nname = {}\norigin = {}\nangle = {}", quote(g.name),
            out.point(g.origin), number(g.angle));
        out("rows = {}\nlines = {}", g.rows, g.lines);
        if (g.rows > 1) out("pitch = {}", out.q(g.pitch, Quantity::length));
        if (g.lines > 1) out("gauge = {}", out.q(g.gauge, Quantity::length));
        out("stagger = {}\ndiameter = {}", g.stagger, out.q(g.diameter, Quantity::length));
        const bool slot =
            g.hole.kind == model::HoleKind::short_slot || g.hole.kind == model::HoleKind::long_slot;
        out("hole = \"{}\"\nhole_rule = \"{}\"\nslot_direction = \"{}\"",
            model::word(model::hole_kind_words, g.hole.kind),
            model::word(model::hole_rule_words, g.hole.rule),
            model::word(model::slot_direction_words, g.hole.direction));
        if (g.hole.user_given && slot)
            out("slot_width = {}\nslot_length = {}", out.q(g.hole.width, Quantity::length),
                out.q(g.hole.length, Quantity::length));
        else if (g.hole.user_given)
            out("hole_diameter = {}", out.q(g.hole.width, Quantity::length));
        out("shear_planes = {}\ntie = \"{}\"\nstiffness = \"{}\"", g.shear_planes,
            model::word(model::tie_words, g.tie), model::word(model::stiffness_words, g.stiffness));
        if (g.stiffness == model::StiffnessKind::given)
            out("spring = {}", out.q(g.spring, Quantity::force_per_length));
    }

    for (const auto& lc : c.load_cases)
        out("\n[[load_case]]\nname = {}\ndescription = {}", quote(lc.name), quote(lc.description));
    for (const auto& combo : c.combinations) {
        std::string factors;
        for (const auto& [name, f] : combo.factors)
            factors +=
                fmt::format("{}{} = {}", factors.empty() ? "" : ", ", quote(name), number(f));
        out("\n[[combination]]\nname = {}\nfactors = {{ {} }}", quote(combo.name), factors);
    }
    auto edge_list = [](const std::vector<int>& edges) {
        std::string s;
        for (int e : edges) s += (s.empty() ? "" : ", ") + std::to_string(e);
        return "[" + s + "]";
    };
    for (const auto& mem : c.members) {
        out("\n[[member]]\nname = {}", quote(mem.name));
        if (!mem.bolt_group.empty())
            out("bolt_group = {}", quote(mem.bolt_group));
        else
            out("welded_edges = {}", edge_list(mem.welded_edges));
        out("work_point = {}\nangle = {}\nply_thickness = {}\nply_modulus = {}",
            out.point(mem.work_point), number(mem.angle),
            out.q(mem.ply_thickness, Quantity::length), out.q(mem.ply_modulus, Quantity::stress));
        for (const auto& [lc, f] : mem.forces)
            out("forces.{} = {{ axial = {}, shear = {}, moment = {}, about = {} }}", quote(lc),
                out.q(f.axial, Quantity::force), out.q(f.shear, Quantity::force),
                out.q(f.moment, Quantity::moment), out.point(f.moment_point));
    }
    for (const auto& s : c.supports) {
        out("\n[[support]]\nname = {}", quote(s.name));
        if (s.kind == model::SupportKind::welded)
            out("kind = \"welded\"\nedges = {}", edge_list(s.edges));
        else if (s.kind == model::SupportKind::bolted)
            out("kind = \"bolted\"\nbolt_group = {}", quote(s.bolt_group));
        else
            out("kind = \"symmetry\"\nline = [{}, {}]", out.point(s.line_from),
                out.point(s.line_to));
    }
    for (const auto& e : c.edge_loads) {
        const Quantity q = e.total ? Quantity::force : Quantity::force_per_length;
        out("\n[[edge_load]]\nedge = {}\nload_case = {}\n{} = [{}, {}]", e.edge, quote(e.load_case),
            e.total ? "total" : "traction", out.q(e.fx, q), out.q(e.fy, q));
    }

    const auto& a = c.allowables;
    out("\n[allowables]");
    for (const auto& entry : model::allowable_entries)
        allowable(out, entry.key, a.*entry.member, entry.quantity);
    const auto& b = a.bearing;
    out("\n[allowables.bearing]\nstyle = \"{}\"\nbearing_factor = {}\ntearout_factor = "
        "{}\nresistance_factor = {}",
        model::word(model::style_words, b.style), number(b.bearing_factor),
        number(b.tearout_factor), number(b.resistance_factor));
    out("k1 = {}\nalpha_b = {}\ngamma_M2 = {}", number(b.k1), number(b.alpha_b),
        number(b.gamma_M2));
    const auto& bs = a.block_shear;
    out("\n[allowables.block_shear]\nstyle = \"{}\"\nresistance_factor = {}\nUbs = {}\ngamma_M0 = "
        "{}\ngamma_M2 = {}",
        model::word(model::style_words, bs.style), number(bs.resistance_factor), number(bs.Ubs),
        number(bs.gamma_M0), number(bs.gamma_M2));
    out("\n[allowables.whitmore_buckling]\nK = {}\nresistance_factor = {}",
        number(a.whitmore_buckling.K), number(a.whitmore_buckling.resistance_factor));
    out("\n[allowables.peak]\nbolt_hole_zone = {}", number(a.peak.bolt_hole_zone));

    out("\n[mesh]\nelement = \"{}\"\nsize = {}\naround_hole = {}\nnear_hole_size = {}",
        model::word(model::element_words, c.mesh.element), out.q(c.mesh.size, Quantity::length),
        c.mesh.around_hole, out.q(c.mesh.near_hole_size, Quantity::length));
    for (const auto& s : c.section_lines)
        out("\n[[section]]\nname = {}\nfrom = {}\nto = {}", quote(s.name), out.point(s.from),
            out.point(s.to));
    std::string formats;
    for (const auto& f : c.report.formats) formats += (formats.empty() ? "" : ", ") + quote(f);
    out("\n[report]\nformats = [{}]\nfigures = {}\ndeformed_scale = {}", formats, c.report.figures,
        number(c.report.deformed_scale));
    return out.text();
}

} // namespace lapwing::input
