// Check rows of the classical limit states, evaluated on this plate with the
// forces the analysis found: each bolt's bearing and tear-out, the weakest
// block shear path of each member's group, Whitmore yielding and buckling,
// and gross and net sections across every bolt row.
#include "check/block_shear_check.hpp"
#include "check/block_shear_paths.hpp"
#include "check/bolt_clearances.hpp"
#include "check/buckling_lengths.hpp"
#include "check/evaluation.hpp"
#include "check/limit_states.hpp"
#include "check/unit_text.hpp"
#include "geometry/region_boundary.hpp"

#include <cmath>
#include <fmt/format.h>
#include <numbers>

namespace lapwing::check {

namespace {

Eigen::Vector2d member_axis(const model::Member& m) {
    const double a = m.angle * std::numbers::pi / 180.0;
    return {std::cos(a), std::sin(a)};
}

// The member's factored axial force in one case or combination (+ tension).
double member_axial(const model::Member& m, const std::map<std::string, double>& factors) {
    double axial = 0;
    for (const auto& [name, factor] : factors) {
        const auto it = m.forces.find(name);
        if (it != m.forces.end()) axial += factor * it->second.axial;
    }
    return axial;
}

std::string other_form(const Capacity& other, UnitSystem units) {
    if (other.method.empty()) return "";
    return fmt::format("for information, {}: {} ({})", other.method,
                       value_text(other.value, Quantity::force, units), other.formula);
}

CheckRow classical_row(std::string id, Family family, std::string what, std::string where,
                       const std::string& load_case, const Capacity& capacity, double demand) {
    CheckRow r;
    r.id = std::move(id);
    r.family = family;
    r.what = std::move(what);
    r.where = std::move(where);
    r.load_case = load_case;
    r.method = capacity.method;
    r.formula = capacity.formula;
    r.quantity = Quantity::force;
    r.demand = demand;
    r.capacity = capacity.value;
    return r;
}

std::vector<int> welded_edges(const model::Connection& c) {
    std::vector<int> edges;
    for (const model::Support& s : c.supports)
        if (s.kind == model::SupportKind::welded)
            edges.insert(edges.end(), s.edges.begin(), s.edges.end());
    return edges;
}

void bearing_rows(const model::Connection& c, const Evaluation& e,
                  const geometry::RegionBoundary& boundary, std::vector<CheckRow>& rows) {
    const analysis::FeProblem& p = e.results.problem;
    const double t = c.plate.thickness;
    for (const analysis::CaseResult& r : e.results.cases) {
        double largest = 0;
        for (const analysis::BoltForce& b : r.bolts) largest = std::max(largest, b.magnitude);
        for (const analysis::BoltForce& b : r.bolts) {
            if (b.magnitude <= 1e-9 * largest || b.magnitude == 0) continue;
            const analysis::BoltModel& bm = p.bolts[static_cast<size_t>(b.bolt)];
            const model::BoltGroup& g = c.bolt_groups[static_cast<size_t>(bm.group)];
            BoltClearances gap =
                bolt_clearances(e.layout.region, boundary, bm.hole, g.diameter, b.force);
            if (g.hole.kind == model::HoleKind::oversized)
                gap.hole_factor = std::min(gap.hole_factor, 0.8); // EN 1993-1-8 Table 3.4 (memory)
            const TwoForms forms = bearing_forms(gap, t, c.material, 0.0, c.allowables.bearing);
            CheckRow row = classical_row(
                fmt::format("bearing:{}[{}]:{}", g.name, bm.bolt, r.name), Family::bearing,
                fmt::format("bolt bearing and tear-out (bearing stress F/(d t) = {})",
                            value_text(bearing_stress(b.magnitude, g.diameter, t), Quantity::stress,
                                       c.units)),
                fmt::format("bolt {}[{}] at {}; lc = {} to {}", g.name, bm.bolt,
                            point_text(bm.centre, c.units), length_text(gap.lc, c.units),
                            gap.ahead),
                r.name, forms.chosen, b.magnitude);
            row.capacity_required = true;
            row.note = other_form(forms.other, c.units);
            rows.push_back(std::move(row));
        }
    }
}

void block_shear_rows(const model::Connection& c, const Evaluation& e,
                      const geometry::RegionBoundary& boundary, std::vector<CheckRow>& rows) {
    const analysis::FeProblem& p = e.results.problem;
    for (size_t m = 0; m < c.members.size(); ++m) {
        const model::Member& member = c.members[m];
        if (member.bolt_group.empty()) continue;
        const auto& bolts = p.members[m].bolts;
        if (bolts.empty()) continue;
        const model::BoltGroup& g =
            c.bolt_groups[static_cast<size_t>(p.bolts[static_cast<size_t>(bolts[0])].group)];
        std::vector<Eigen::Vector2d> centres;
        for (int b : bolts) centres.push_back(p.bolts[static_cast<size_t>(b)].centre);
        const BlockShearPaths paths = block_shear_paths(centres, member_axis(member), boundary);
        for (const analysis::CaseResult& r : e.results.cases) {
            std::vector<Eigen::Vector2d> forces;
            for (int b : bolts) forces.push_back(r.bolts[static_cast<size_t>(b)].force);
            const std::vector<PathCheck> checks =
                check_paths(paths, forces, c.plate.thickness, g.hole, g.angle, c.material,
                            c.allowables.block_shear);
            const int w = weakest(checks);
            if (w < 0) continue; // no path is pulled in this case
            const PathCheck& pc = checks[static_cast<size_t>(w)];
            const BlockShearPath& path = paths.paths[static_cast<size_t>(pc.path)];
            CheckRow row = classical_row(
                fmt::format("block-shear:{}:{}", member.name, r.name), Family::block_shear,
                fmt::format("block shear, weakest of {} paths: {}", checks.size(), path.name),
                fmt::format("bolt group {} of member {}", g.name, member.name), r.name,
                pc.capacity.chosen, pc.demand);
            row.capacity_required = true;
            row.note = other_form(pc.capacity.other, c.units);
            rows.push_back(std::move(row));
        }
    }
}

void whitmore_rows(const model::Connection& c, const Evaluation& e,
                   const geometry::RegionBoundary& boundary, std::vector<CheckRow>& rows) {
    const double t = c.plate.thickness;
    const std::vector<int> supported = welded_edges(c);
    for (const SectionLine& line : e.sections) {
        if (line.kind != SectionKind::whitmore || line.member < 0) continue;
        const model::Member& member = c.members[static_cast<size_t>(line.member)];
        const double Lw = line.material_length();
        const Capacity yield = whitmore_yield(c.allowables.whitmore_yield, Lw, t);
        const BucklingLengths lengths =
            supported.empty()
                ? BucklingLengths{}
                : thornton_lengths(boundary, line.from, line.to, member_axis(member), supported);
        std::string where =
            fmt::format("{}, Lw = {} ({} before clipping and holes)", line.label,
                        length_text(Lw, c.units), length_text(line.unclipped_length, c.units));
        for (size_t k = 0; k < e.results.cases.size(); ++k) {
            const std::string& lc = e.results.cases[k].name;
            const double axial = member_axial(member, case_factors(c, k));
            if (axial == 0) continue;
            rows.push_back(classical_row(fmt::format("whitmore:{}:{}", member.name, lc),
                                         Family::whitmore,
                                         "Whitmore section yielding, member force / (Lw t)", where,
                                         lc, yield, std::abs(axial)));
            if (axial > 0) continue;
            // Compression: Thornton's column on the Whitmore section.
            if (lengths.reaching.empty()) {
                CheckRow row = classical_row(
                    fmt::format("buckling:{}:{}", member.name, lc), Family::buckling,
                    "Whitmore section buckling (Thornton 1984)", where, lc, Capacity{}, -axial);
                row.note = "no length from the Whitmore line along the member reaches a welded "
                           "edge: the column is not defined here; check by other means";
                for (const std::string& n : lengths.notes) row.note += "; " + n;
                rows.push_back(std::move(row));
                continue;
            }
            const Slenderness s = thornton_slenderness(
                lengths.lengths(), t, c.allowables.whitmore_buckling.K, c.material.E, c.units);
            const TwoForms forms =
                buckling_forms(s, c.material, Lw, t, c.allowables.whitmore_buckling,
                               c.allowables.block_shear.style);
            CheckRow row = classical_row(
                fmt::format("buckling:{}:{}", member.name, lc), Family::buckling,
                fmt::format("Whitmore section buckling (Thornton 1984), K = {:.3g}, KL/r = {:.1f}",
                            s.K, s.KL_over_r),
                where + "; " + s.lengths, lc, forms.chosen, -axial);
            row.capacity_required = true;
            row.note = other_form(forms.other, c.units);
            for (const std::string& n : lengths.notes) row.note += "; " + n;
            rows.push_back(std::move(row));
        }
    }
}

void net_section_rows(const model::Connection& c, const Evaluation& e,
                      std::vector<CheckRow>& rows) {
    const double t = c.plate.thickness;
    const model::Allowables& al = c.allowables;
    for (size_t s = 0; s < e.sections.size(); ++s) {
        const SectionLine& line = e.sections[s];
        if (line.kind != SectionKind::net) continue;
        // Gross: the whole chord through the row (cut-outs on it included,
        // holes not deducted); net: the material left between the holes.
        const double gross = line.length(), net = line.material_length();
        const std::string where =
            fmt::format("{}, gross {}, net {}", line.label, length_text(gross, c.units),
                        length_text(net, c.units));
        for (size_t k = 0; k < e.results.cases.size(); ++k) {
            const SectionStress& ss = e.section_stress[k][s];
            const std::string& lc = e.results.cases[k].name;
            const auto add = [&](const char* id, const model::Allowable& a, const char* what,
                                 double length, double demand) {
                if (!a.given) return;
                rows.push_back(classical_row(fmt::format("{}:{}:{}", id, line.id, lc),
                                             Family::net_section,
                                             fmt::format("{} (FE section force)", what), where, lc,
                                             section_capacity(a, what, length, t), demand));
            };
            if (ss.N > 0) {
                add("gross-tension", al.gross_tension, "gross section tension", gross, ss.N);
                add("net-tension", al.net_tension, "net section tension", net, ss.N);
            }
            add("gross-shear", al.gross_shear, "gross section shear", gross, std::abs(ss.V));
            add("net-shear", al.net_shear, "net section shear", net, std::abs(ss.V));
        }
    }
}

} // namespace

std::vector<CheckRow> classical_rows(const model::Connection& c, const Evaluation& e) {
    std::vector<CheckRow> rows;
    const geometry::RegionBoundary boundary = geometry::build_region_boundary(e.layout.region);
    bearing_rows(c, e, boundary, rows);
    block_shear_rows(c, e, boundary, rows);
    whitmore_rows(c, e, boundary, rows);
    net_section_rows(c, e, rows);
    return rows;
}

} // namespace lapwing::check
