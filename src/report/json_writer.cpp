// results.json: everything on the calc sheet as data, every value in the
// user's unit system (the "units" object names them). Keys are stable and
// documented in docs/results.md; docs/results.schema.json is the schema.
#include "report/figures.hpp"
#include "report/outputs.hpp"

#include <nlohmann/json.hpp>

namespace lapwing::report {

namespace {

using nlohmann::json;

const char* quantity_word(Quantity q) {
    switch (q) {
    case Quantity::none:
        return "none";
    case Quantity::length:
        return "length";
    case Quantity::force:
        return "force";
    case Quantity::stress:
        return "stress";
    case Quantity::moment:
        return "moment";
    case Quantity::force_per_length:
        return "force_per_length";
    }
    return "none";
}

// Stable words for section kinds in results.json (kept here so the file's
// keys do not change if the check stage's own words do).
const char* kind_word(check::SectionKind kind) {
    switch (kind) {
    case check::SectionKind::whitmore:
        return "whitmore";
    case check::SectionKind::net:
        return "net";
    case check::SectionKind::weld:
        return "weld";
    case check::SectionKind::user:
        return "user";
    }
    return "user";
}

struct Writer {
    const check::CheckOutcome& o;
    UnitSystem units = o.connection.units;

    double v(double internal, Quantity q) const { return from_internal(internal, q, units); }
    json xy(const Eigen::Vector2d& p, Quantity q) const { return {v(p.x(), q), v(p.y(), q)}; }
    json point(const model::Point& p) const { return xy({p.x, p.y}, Quantity::length); }

    json units_object() const {
        json u = {{"system", std::string(name(units))}};
        for (Quantity q : {Quantity::length, Quantity::force, Quantity::stress, Quantity::moment,
                           Quantity::force_per_length})
            u[quantity_word(q)] = std::string(unit_label(q, units));
        return u;
    }

    json model_object() const {
        const model::Connection& c = o.connection;
        json m;
        m["material"] = {{"grade", c.material.grade},
                         {"E", v(c.material.E, Quantity::stress)},
                         {"nu", c.material.nu},
                         {"Fy", v(c.material.Fy, Quantity::stress)},
                         {"Fu", v(c.material.Fu, Quantity::stress)}};
        m["plate"] = {{"thickness", v(c.plate.thickness, Quantity::length)},
                      {"corners", static_cast<int>(c.plate.outline.size())},
                      {"cutouts", static_cast<int>(c.plate.cutouts.size())}};
        m["bolt_groups"] = json::array();
        for (const model::BoltGroup& g : c.bolt_groups)
            m["bolt_groups"].push_back({{"name", g.name},
                                        {"origin", point(g.origin)},
                                        {"angle_deg", g.angle},
                                        {"rows", g.rows},
                                        {"lines", g.lines},
                                        {"pitch", v(g.pitch, Quantity::length)},
                                        {"gauge", v(g.gauge, Quantity::length)},
                                        {"diameter", v(g.diameter, Quantity::length)},
                                        {"hole_width", v(g.hole.width, Quantity::length)},
                                        {"hole_length", v(g.hole.length, Quantity::length)},
                                        {"tie", model::word(model::tie_words, g.tie)}});
        m["members"] = json::array();
        for (const model::Member& mb : c.members) {
            json forces = json::object();
            for (const auto& [name, f] : mb.forces)
                forces[name] = {{"axial", v(f.axial, Quantity::force)},
                                {"shear", v(f.shear, Quantity::force)},
                                {"moment", v(f.moment, Quantity::moment)}};
            m["members"].push_back({{"name", mb.name},
                                    {"bolt_group", mb.bolt_group},
                                    {"welded_edges", mb.welded_edges},
                                    {"work_point", point(mb.work_point)},
                                    {"angle_deg", mb.angle},
                                    {"forces", forces}});
        }
        m["supports"] = json::array();
        for (const model::Support& s : c.supports)
            m["supports"].push_back({{"name", s.name},
                                     {"kind", model::word(model::support_words, s.kind)},
                                     {"edges", s.edges},
                                     {"bolt_group", s.bolt_group}});
        m["load_cases"] = json::array();
        for (const model::LoadCase& l : c.load_cases)
            m["load_cases"].push_back({{"name", l.name}, {"description", l.description}});
        m["combinations"] = json::array();
        for (const model::Combination& k : c.combinations)
            m["combinations"].push_back({{"name", k.name}, {"factors", k.factors}});
        m["allowables"] = json::array();
        for (const model::AllowableEntry& e : model::allowable_entries) {
            const model::Allowable& a = c.allowables.*e.member;
            m["allowables"].push_back({{"key", e.key},
                                       {"label", e.label},
                                       {"given", a.given},
                                       {"value", a.given ? json(v(a.value, e.quantity)) : json()},
                                       {"source", a.source},
                                       {"quantity", quantity_word(e.quantity)}});
        }
        m["parameters"] = c.parameters;
        return m;
    }

    json mesh_object() const {
        const mesh::QualitySummary& q = o.mesh.quality_summary;
        const auto summary = [](const mesh::Summary& s) {
            return json{{"min", s.min}, {"p05", s.p05}, {"median", s.median}, {"max", s.max}};
        };
        return {{"element", std::string(fe::name(o.mesh.kind))},
                {"element_size", v(o.element_size, Quantity::length)},
                {"elements", o.mesh.n_elements()},
                {"nodes", static_cast<int>(o.mesh.nodes.size())},
                {"dofs", o.results.problem.model.n_dofs()},
                {"quality",
                 {{"scaled_jacobian", summary(q.scaled_jacobian)},
                  {"min_angle_deg", summary(q.min_angle_deg)},
                  {"max_angle_deg", summary(q.max_angle_deg)},
                  {"aspect_ratio", summary(q.aspect_ratio)},
                  {"inverted", q.n_inverted},
                  {"fraction_angles_ok", q.fraction_angles_ok}}}};
    }

    json case_object(size_t k) const {
        const analysis::CaseResult& c = o.results.cases[k];
        json j = {{"name", c.name},
                  {"combination", c.combination},
                  {"applied_force", xy(c.applied_force, Quantity::force)},
                  {"applied_moment", v(c.applied_moment, Quantity::moment)},
                  {"equilibrium_residual", c.equilibrium_residual},
                  {"solver_residual", c.solver_residual},
                  {"strain_energy", v(c.strain_energy, Quantity::moment)},
                  {"contact_iterations", c.contact_iterations}};
        double largest = 0;
        for (size_t i = 0; i < o.mesh.nodes.size() && 2 * i + 1 < static_cast<size_t>(c.u.size());
             ++i)
            largest = std::max(largest, std::hypot(c.u[static_cast<Eigen::Index>(2 * i)],
                                                   c.u[static_cast<Eigen::Index>(2 * i + 1)]));
        j["max_displacement"] = v(largest, Quantity::length);
        j["reactions"] = json::array();
        for (size_t s = 0; s < c.reactions.size(); ++s)
            j["reactions"].push_back(
                {{"support", s < o.connection.supports.size() ? o.connection.supports[s].name : ""},
                 {"force", xy(c.reactions[s].force, Quantity::force)},
                 {"moment", v(c.reactions[s].moment, Quantity::moment)}});
        if (k < o.peaks.size()) {
            const check::PeakStress& p = o.peaks[k];
            j["peak"] = {{"von_mises", v(p.von_mises, Quantity::stress)},
                         {"von_mises_at", xy(p.von_mises_at, Quantity::length)},
                         {"max_principal", v(p.max_principal, Quantity::stress)},
                         {"max_principal_at", xy(p.max_principal_at, Quantity::length)},
                         {"min_principal", v(p.min_principal, Quantity::stress)},
                         {"min_principal_at", xy(p.min_principal_at, Quantity::length)},
                         {"near", p.near}};
            j["peak"]["away_from_bolt_holes"] = {
                {"von_mises", v(p.von_mises_away, Quantity::stress)},
                {"at", xy(p.von_mises_away_at, Quantity::length)},
                {"near", p.near_away}};
            if (p.has_hole_zone)
                j["peak"]["at_bolt_holes"] = {
                    {"von_mises", v(p.von_mises_at_holes, Quantity::stress)},
                    {"at", xy(p.von_mises_at_holes_at, Quantity::length)},
                    {"near", p.near_at_holes}};
        }
        j["bolts"] = json::array();
        for (const analysis::BoltForce& b : c.bolts) {
            json jb = {{"force", xy(b.force, Quantity::force)},
                       {"magnitude", v(b.magnitude, Quantity::force)},
                       {"angle_to_axis_deg", b.angle_to_axis_deg}};
            if (b.bolt >= 0 && static_cast<size_t>(b.bolt) < o.results.problem.bolts.size()) {
                const analysis::BoltModel& m = o.results.problem.bolts[static_cast<size_t>(b.bolt)];
                jb["group"] =
                    m.group >= 0 && static_cast<size_t>(m.group) < o.connection.bolt_groups.size()
                        ? o.connection.bolt_groups[static_cast<size_t>(m.group)].name
                        : "";
                jb["index"] = m.bolt;
                jb["at"] = xy(m.centre, Quantity::length);
            }
            j["bolts"].push_back(jb);
        }
        j["sections"] = json::array();
        if (k < o.section_stress.size())
            for (const check::SectionStress& s : o.section_stress[k]) {
                const std::string id =
                    s.section >= 0 && static_cast<size_t>(s.section) < o.sections.size()
                        ? o.sections[static_cast<size_t>(s.section)].id
                        : "";
                j["sections"].push_back({{"id", id},
                                         {"N", v(s.N, Quantity::force)},
                                         {"V", v(s.V, Quantity::force)},
                                         {"M", v(s.M, Quantity::moment)},
                                         {"average_normal", v(s.average_normal, Quantity::stress)},
                                         {"average_shear", v(s.average_shear, Quantity::stress)},
                                         {"max_membrane", v(s.max_membrane, Quantity::stress)},
                                         {"max_membrane_plus_bending",
                                          v(s.max_membrane_plus_bending, Quantity::stress)},
                                         {"max_peak", v(s.max_peak, Quantity::stress)}});
            }
        j["welds"] = json::array();
        if (k < o.weld_forces.size())
            for (size_t w = 0; w < o.weld_forces[k].size(); ++w) {
                const check::WeldForces& f = o.weld_forces[k][w];
                j["welds"].push_back(
                    {{"id", w < o.welds.size() ? o.welds[w].id : ""},
                     {"resultant", xy(f.resultant, Quantity::force)},
                     {"average", v(f.average, Quantity::force_per_length)},
                     {"peak_edge_average", v(f.peak_edge_average, Quantity::force_per_length)},
                     {"peak", v(f.peak, Quantity::force_per_length)},
                     {"peak_at", v(f.peak_s, Quantity::length)}});
            }
        return j;
    }

    json checks_object() const {
        const check::CheckTable& t = o.table;
        json rows = json::array();
        for (size_t i = 0; i < t.rows.size(); ++i) {
            const check::CheckRow& r = t.rows[i];
            rows.push_back(
                {{"id", r.id},
                 {"family", check::word(r.family)},
                 {"what", r.what},
                 {"where", r.where},
                 {"load_case", r.load_case},
                 {"method", r.method},
                 {"formula", r.formula},
                 {"quantity", quantity_word(r.quantity)},
                 {"unit", std::string(unit_label(r.quantity, units))},
                 {"demand", v(r.demand, r.quantity)},
                 {"capacity",
                  r.status == check::Status::info ? json() : json(v(r.capacity, r.quantity))},
                 {"ratio", r.status == check::Status::info ? json() : json(r.ratio)},
                 {"status", check::word(r.status)},
                 {"governing", static_cast<int>(i) == t.governing}});
        }
        json by_family = json::object();
        for (size_t f = 0; f < std::size(check::all_families) && f < t.governing_by_family.size();
             ++f)
            if (const int g = t.governing_by_family[f]; g >= 0)
                by_family[check::word(check::all_families[f])] = t.rows[static_cast<size_t>(g)].id;
        return {{"rows", rows},
                {"governing",
                 t.governing >= 0 ? json(t.rows[static_cast<size_t>(t.governing)].id) : json()},
                {"governing_by_family", by_family}};
    }

    json convergence_object() const {
        const check::Convergence& c = o.convergence;
        json rows = json::array();
        for (const check::ConvergenceRow& r : c.rows)
            rows.push_back({{"quantity", r.quantity},
                            {"load_case", r.load_case},
                            {"unit", std::string(unit_label(r.unit, units))},
                            {"coarse", v(r.coarse, r.unit)},
                            {"fine", v(r.fine, r.unit)},
                            {"change", r.change()}});
        return {{"done", c.done},
                {"coarse_size", v(c.coarse_size, Quantity::length)},
                {"fine_size", v(c.fine_size, Quantity::length)},
                {"coarse_elements", c.coarse_elements},
                {"fine_elements", c.fine_elements},
                {"coarse_dofs", c.coarse_dofs},
                {"fine_dofs", c.fine_dofs},
                {"largest_change", c.done ? json(c.largest_change()) : json()},
                {"rows", rows}};
    }
};

} // namespace

std::string results_json(const check::CheckOutcome& o, const RunInfo& run,
                         const std::vector<Figure>& figures) {
    const Writer w{o};
    const model::Job& job = o.connection.job;
    json j;
    j["schema"] = "lapwing-results/1";
    j["program"] = {{"name", run.program}, {"version", run.version}, {"build_id", run.build_id}};
    j["run"] = {{"date", run.date},
                {"command_line", run.command_line},
                {"input_file", run.input_file},
                {"input_sha256", run.input_sha256},
                {"resolved_sha256", run.resolved_sha256},
                {"reproducible", run.reproducible},
                {"convergence_mesh", run.two_mesh}};
    if (!run.reproducible)
        j["run"]["seconds"] = {{"mesh", o.seconds.mesh},
                               {"analysis", o.seconds.analysis},
                               {"checks", o.seconds.checks},
                               {"fine_mesh", o.seconds.fine_mesh}};
    j["job"] = {{"title", job.title},
                {"project", job.project},
                {"mark", job.mark},
                {"prepared_by", job.prepared_by},
                {"checked_by", job.checked_by},
                {"revision", job.revision},
                {"notes", job.notes}};
    j["units"] = w.units_object();
    const check::CheckTable& t = o.table;
    j["verdict"] = {{"passes", t.passes()},
                    {"max_ratio", t.governing >= 0 ? json(t.max_ratio()) : json()},
                    {"governing", t.governing >= 0
                                      ? json(t.rows[static_cast<size_t>(t.governing)].id)
                                      : json()}};
    j["model"] = w.model_object();
    j["mesh"] = w.mesh_object();
    j["sections"] = json::array();
    for (const check::SectionLine& s : o.sections)
        j["sections"].push_back({{"id", s.id},
                                 {"kind", kind_word(s.kind)},
                                 {"label", s.label},
                                 {"from", w.xy(s.from, Quantity::length)},
                                 {"to", w.xy(s.to, Quantity::length)},
                                 {"length", w.v(s.length(), Quantity::length)},
                                 {"material_length", w.v(s.material_length(), Quantity::length)}});
    j["welds"] = json::array();
    for (const check::WeldLine& l : o.welds)
        j["welds"].push_back({{"id", l.id},
                              {"label", l.label},
                              {"from", w.xy(l.from, Quantity::length)},
                              {"to", w.xy(l.to, Quantity::length)},
                              {"length", w.v(l.length(), Quantity::length)}});
    j["cases"] = json::array();
    for (size_t k = 0; k < o.results.cases.size(); ++k) j["cases"].push_back(w.case_object(k));
    j["checks"] = w.checks_object();
    j["convergence"] = w.convergence_object();
    // The figures as listed on the sheet; the .svg files exist beside this
    // file when report.figures is on (they are always inline in report.html).
    j["figures"] = json::array();
    for (const Figure& f : figures)
        j["figures"].push_back({{"file", f.file},
                                {"kind", f.kind},
                                {"title", f.title},
                                {"load_case", f.load_case.empty() ? json() : json(f.load_case)},
                                {"caption", f.caption},
                                {"file_written", o.connection.report.figures}});
    return j.dump(2) + "\n";
}

} // namespace lapwing::report
