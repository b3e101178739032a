// Building the FE problem of a connection: plate, bolts, members, supports.
#include "analysis/fe_problem.hpp"

#include "analysis/bearing_share.hpp"
#include "analysis/bolt_ties.hpp"
#include "analysis/fastener_stiffness.hpp"
#include "analysis/mesh_check.hpp"
#include "core/error.hpp"

#include <algorithm>
#include <cmath>
#include <fmt/format.h>
#include <numbers>
#include <set>

namespace lapwing::analysis {

namespace {

constexpr double degrees = std::numbers::pi / 180.0;

// Contact penalty for bearing ties: 100 E t in total round the hole, about
// a thousand times a bolt's shear stiffness, so the contact's own compliance
// is negligible while the system stays well conditioned.
double contact_penalty(const model::Connection& c) {
    return 100.0 * c.material.E * c.plate.thickness;
}

// A "rigid" bolt that cannot be a constraint (spread tie: its node is already
// a slave of the hole) is a spring this many times the Huth stiffness.
constexpr double rigid_factor = 1000.0;

int add_node(fe::Model& m, const Eigen::Vector2d& x) {
    m.nodes.push_back(x);
    return m.n_nodes() - 1;
}

std::string member_path(int i) {
    return fmt::format("member[{}]", i);
}

// The member's factored force and its moment about the work point.
std::pair<Eigen::Vector2d, double> member_action(const model::Member& member,
                                                 const std::map<std::string, double>& factors) {
    Eigen::Vector2d force(0, 0);
    double moment = 0;
    for (const auto& [case_name, factor] : factors) {
        const auto it = member.forces.find(case_name);
        if (it == member.forces.end()) continue;
        const model::MemberForces& f = it->second;
        const double a = member.angle * degrees;
        const Eigen::Vector2d axis(std::cos(a), std::sin(a)), across(-std::sin(a), std::cos(a));
        // Axial + pulls the plate along the member, away from the joint.
        const Eigen::Vector2d F = f.axial * axis + f.shear * across;
        // The force acts through `moment_point` with the couple M about
        // it; moved to the work point it adds (q − w) × F.
        const Eigen::Vector2d arm(f.moment_point.x - member.work_point.x,
                                  f.moment_point.y - member.work_point.y);
        force += factor * F;
        moment += factor * (f.moment + arm.x() * F.y() - arm.y() * F.x());
    }
    return {force, moment};
}

double hole_diameter(const model::Connection& c, const BoltModel& b) {
    return c.bolt_groups[static_cast<size_t>(b.group)].hole.width;
}

} // namespace

FeProblem build_fe_problem(const model::Connection& c, const mesh::Mesh& mesh,
                           const PlateLayout& layout) {
    check_mesh_not_folded(c, mesh, layout);
    FeProblem p;
    fe::Model& m = p.model;
    m.nodes.assign(mesh.nodes.begin(), mesh.nodes.end());
    p.n_plate_nodes = m.n_nodes();
    m.materials = {{c.material.E, c.material.nu}};
    const int n_per = fe::node_count(mesh.kind);
    for (int e = 0; e < mesh.n_elements(); ++e) {
        fe::Element el;
        el.kind = mesh.kind;
        el.thickness = c.plate.thickness;
        const auto nodes = mesh.element(e);
        for (int i = 0; i < n_per; ++i)
            el.nodes[static_cast<size_t>(i)] = nodes[static_cast<size_t>(i)];
        m.elements.push_back(el);
    }
    Eigen::Vector2d lo = mesh.nodes.front(), hi = mesh.nodes.front();
    for (const auto& x : mesh.nodes) lo = lo.cwiseMin(x), hi = hi.cwiseMax(x);
    p.size = (hi - lo).norm();

    // Who carries each bolt group.
    std::vector<int> group_member(c.bolt_groups.size(), -1),
        group_support(c.bolt_groups.size(), -1);
    std::vector<Diagnostic> problems;
    auto group_index = [&](const std::string& name) {
        for (size_t g = 0; g < c.bolt_groups.size(); ++g)
            if (c.bolt_groups[g].name == name) return static_cast<int>(g);
        return -1;
    };
    for (int i = 0; i < static_cast<int>(c.members.size()); ++i)
        if (!c.members[static_cast<size_t>(i)].bolt_group.empty()) {
            const int g = group_index(c.members[static_cast<size_t>(i)].bolt_group);
            if (g >= 0) group_member[static_cast<size_t>(g)] = i;
        }
    for (int i = 0; i < static_cast<int>(c.supports.size()); ++i) {
        const auto& s = c.supports[static_cast<size_t>(i)];
        if (s.kind != model::SupportKind::bolted) continue;
        const int g = group_index(s.bolt_group);
        if (g < 0) continue;
        if (c.bolt_groups[static_cast<size_t>(g)].tie == model::TieKind::cosine)
            problems.push_back(
                {"", 0, 0, fmt::format("bolt_group[{}].tie", g),
                 fmt::format("= \"cosine\": group \"{}\" fixes the plate to support \"{}\"; a "
                             "support's bolts need a tie (\"spread\" or \"bearing\"); the cosine "
                             "share is for the bolts of a member",
                             s.bolt_group, s.name),
                 ""});
        if (group_member[static_cast<size_t>(g)] >= 0)
            problems.push_back(
                {"", 0, 0, fmt::format("support[{}].bolt_group", i),
                 fmt::format(
                     "= \"{}\": that bolt group already carries member \"{}\"; a group "
                     "connects the plate either to a member or to a support",
                     s.bolt_group,
                     c.members[static_cast<size_t>(group_member[static_cast<size_t>(g)])].name),
                 ""});
        group_support[static_cast<size_t>(g)] = i;
    }

    // Member rigid bodies.
    p.members.resize(c.members.size());
    for (int i = 0; i < static_cast<int>(c.members.size()); ++i) {
        const model::Member& member = c.members[static_cast<size_t>(i)];
        MemberModel& mm = p.members[static_cast<size_t>(i)];
        int n_bolts = 0;
        bool prescribed = false;
        if (!member.bolt_group.empty()) {
            const int g = group_index(member.bolt_group);
            if (g >= 0) {
                const model::BoltGroup& group = c.bolt_groups[static_cast<size_t>(g)];
                n_bolts = group.rows * group.lines;
                prescribed = group.tie == model::TieKind::cosine;
                if (prescribed && group.hole.width != group.hole.length)
                    problems.push_back(
                        {"", 0, 0, fmt::format("bolt_group[{}].tie", g),
                         fmt::format("= \"cosine\": the cosine bearing pressure needs round holes; "
                                     "group \"{}\" has slots (use \"spread\" or \"bearing\")",
                                     group.name),
                         ""});
            }
        }
        if (prescribed) {
            // No rigid body: the shares are loads on the holes. One bolt cannot
            // take a moment by the elastic method (no polar moment of area).
            for (const auto& [case_name, f] : member.forces)
                if (n_bolts == 1 && f.moment != 0.0)
                    problems.push_back(
                        {"", 0, 0, member_path(i) + ".forces." + case_name + ".moment",
                         fmt::format("= {} N·mm: member \"{}\" has a single bolt, which cannot "
                                     "carry a moment; use at least two bolts or remove the moment",
                                     f.moment, member.name),
                         ""});
            continue;
        }
        mm.reference_node = add_node(m, {member.work_point.x, member.work_point.y});
        if (member.bolt_group.empty() || n_bolts > 1) {
            mm.rotation = static_cast<int>(m.rotation_nodes.size());
            m.rotation_nodes.push_back(mm.reference_node);
        } else {
            for (const auto& [case_name, f] : member.forces) {
                if (f.moment != 0.0)
                    problems.push_back(
                        {"", 0, 0, member_path(i) + ".forces." + case_name + ".moment",
                         fmt::format(
                             "= {} N·mm: member \"{}\" is held by a single bolt, which cannot "
                             "carry a moment; use at least two bolts or remove the moment",
                             f.moment, member.name),
                         ""});
            }
        }
    }

    // Rigid links (member, node) are applied once every node exists: a
    // rotation dof's number depends on the final node count.
    std::vector<std::pair<int, int>> rigid_links;

    // Bolts.
    const double penalty = contact_penalty(c);
    for (int h = 0; h < static_cast<int>(layout.bolts.size()); ++h) {
        const BoltRef& ref = layout.bolts[static_cast<size_t>(h)];
        const model::BoltGroup& group = c.bolt_groups[static_cast<size_t>(ref.group)];
        const int member = group_member[static_cast<size_t>(ref.group)];
        const int support = group_support[static_cast<size_t>(ref.group)];
        if (member < 0 && support < 0) continue; // an empty hole: no bolt carries load through it
        BoltModel b;
        b.group = ref.group;
        b.bolt = ref.bolt;
        b.hole = h;
        b.centre = ref.centre;
        b.member = member;
        b.support = support;
        b.tie = group.tie;
        const HoleEdge edge = hole_edge(mesh, layout.region.holes[static_cast<size_t>(h)], h);
        b.hole_nodes = edge.nodes;
        b.hole_weights = edge.weights;
        b.hole_normals = edge.normals;
        if (b.tie == model::TieKind::cosine) {
            b.prescribed = true;
            if (member >= 0)
                p.members[static_cast<size_t>(member)].bolts.push_back(
                    static_cast<int>(p.bolts.size()));
            p.bolts.push_back(std::move(b));
            continue;
        }
        b.plate_node = add_node(m, ref.centre);
        if (b.tie == model::TieKind::spread)
            add_spread_tie(b.plate_node, edge, p.constraints);
        else {
            b.first_contact =
                add_bearing_contact(b.plate_node, edge, penalty, m, b.contact_stiffness);
            p.has_contact = true;
        }
        // Shear stiffness between the plate and the member or support.
        const model::Member* mem = member >= 0 ? &c.members[static_cast<size_t>(member)] : nullptr;
        FastenerPlies plies{c.plate.thickness,
                            c.material.E,
                            mem && mem->ply_thickness > 0 ? mem->ply_thickness : c.plate.thickness,
                            mem && mem->ply_modulus > 0 ? mem->ply_modulus : c.material.E,
                            c.material.E,
                            group.diameter,
                            group.shear_planes};
        double k = 0;
        bool by_constraint = false;
        switch (group.stiffness) {
        case model::StiffnessKind::formula:
            k = huth_stiffness(plies);
            break;
        case model::StiffnessKind::given:
            k = group.spring;
            break;
        case model::StiffnessKind::rigid:
            if (b.tie == model::TieKind::bearing)
                by_constraint = true;
            else
                k = rigid_factor * huth_stiffness(plies);
            break;
        }
        const int bolt_index = static_cast<int>(p.bolts.size());
        if (member >= 0) {
            auto link = [&](int node) { rigid_links.push_back({member, node}); };
            if (by_constraint)
                link(b.plate_node);
            else {
                b.other_node = add_node(m, ref.centre);
                link(b.other_node);
                b.first_spring = static_cast<int>(m.springs.size());
                m.springs.push_back({fe::dof_ux(b.plate_node), fe::dof_ux(b.other_node), k});
                m.springs.push_back({fe::dof_uy(b.plate_node), fe::dof_uy(b.other_node), k});
            }
            p.members[static_cast<size_t>(member)].bolts.push_back(bolt_index);
        } else {
            if (by_constraint) {
                p.constraints.prescribed.push_back({fe::dof_ux(b.plate_node), 0.0});
                p.constraints.prescribed.push_back({fe::dof_uy(b.plate_node), 0.0});
            } else {
                b.first_spring = static_cast<int>(m.springs.size());
                m.springs.push_back({fe::dof_ux(b.plate_node), -1, k});
                m.springs.push_back({fe::dof_uy(b.plate_node), -1, k});
            }
        }
        b.stiffness = by_constraint ? 0.0 : k;
        p.bolts.push_back(std::move(b));
    }

    // Welded members: the member's rigid body holds every node of its edges.
    std::set<int> member_weld_nodes;
    for (int i = 0; i < static_cast<int>(c.members.size()); ++i) {
        const model::Member& member = c.members[static_cast<size_t>(i)];
        if (!member.bolt_group.empty()) continue;
        std::set<int> nodes;
        for (int edge : member.welded_edges)
            for (int n : mesh.nodes_on(geometry::BoundaryKind::outline_edge, edge)) nodes.insert(n);
        for (int n : nodes) {
            rigid_links.push_back({i, n});
            member_weld_nodes.insert(n);
        }
    }
    for (const auto& [member, node] : rigid_links) {
        const MemberModel& mm = p.members[static_cast<size_t>(member)];
        if (mm.rotation >= 0)
            fe::add_rigid_link(m, mm.reference_node, node, p.constraints);
        else { // a one-bolt member: translation only
            p.constraints.linear.push_back(
                {fe::dof_ux(node), {{fe::dof_ux(mm.reference_node), 1.0}}, 0.0});
            p.constraints.linear.push_back(
                {fe::dof_uy(node), {{fe::dof_uy(mm.reference_node), 1.0}}, 0.0});
        }
    }

    // Supports.
    p.supports.resize(c.supports.size());
    std::set<int> supported;
    for (int i = 0; i < static_cast<int>(c.supports.size()); ++i) {
        const model::Support& s = c.supports[static_cast<size_t>(i)];
        SupportModel& sm = p.supports[static_cast<size_t>(i)];
        if (s.kind == model::SupportKind::welded) {
            std::set<int> nodes;
            for (int edge : s.edges)
                for (int n : mesh.nodes_on(geometry::BoundaryKind::outline_edge, edge))
                    nodes.insert(n);
            Eigen::Vector2d centroid(0, 0);
            for (int n : nodes) {
                if (supported.count(n)) continue; // a corner shared with another welded support
                if (member_weld_nodes.count(n)) {
                    problems.push_back(
                        {"", 0, 0, fmt::format("support[{}].edges", i),
                         fmt::format(
                             "node at ({:.1f}, {:.1f}) of support \"{}\" is already held by "
                             "another support or a welded member; give each edge one role",
                             m.nodes[static_cast<size_t>(n)].x(),
                             m.nodes[static_cast<size_t>(n)].y(), s.name),
                         ""});
                    continue;
                }
                supported.insert(n);
                sm.nodes.push_back(n);
                centroid += m.nodes[static_cast<size_t>(n)];
                p.constraints.prescribed.push_back({fe::dof_ux(n), 0.0});
                p.constraints.prescribed.push_back({fe::dof_uy(n), 0.0});
            }
            sm.about = sm.nodes.empty()
                           ? centroid
                           : Eigen::Vector2d(centroid / static_cast<double>(sm.nodes.size()));
        } else if (s.kind == model::SupportKind::symmetry) {
            const Eigen::Vector2d a(s.line_from.x, s.line_from.y), b(s.line_to.x, s.line_to.y);
            const Eigen::Vector2d t = (b - a).normalized(), normal(-t.y(), t.x());
            for (int n = 0; n < p.n_plate_nodes; ++n) {
                const Eigen::Vector2d& x = m.nodes[static_cast<size_t>(n)];
                if (std::abs((x - a).dot(normal)) > 1e-6 * p.size || supported.count(n)) continue;
                supported.insert(n);
                sm.nodes.push_back(n);
                // u · n = 0: eliminate the larger component.
                if (std::abs(normal.x()) >= std::abs(normal.y())) {
                    if (std::abs(normal.y()) < 1e-12)
                        p.constraints.prescribed.push_back({fe::dof_ux(n), 0.0});
                    else
                        p.constraints.linear.push_back(
                            {fe::dof_ux(n), {{fe::dof_uy(n), -normal.y() / normal.x()}}, 0.0});
                } else {
                    if (std::abs(normal.x()) < 1e-12)
                        p.constraints.prescribed.push_back({fe::dof_uy(n), 0.0});
                    else
                        p.constraints.linear.push_back(
                            {fe::dof_uy(n), {{fe::dof_ux(n), -normal.x() / normal.y()}}, 0.0});
                }
            }
            sm.about = 0.5 * (a + b);
        } else {
            Eigen::Vector2d centroid(0, 0);
            for (int bi = 0; bi < static_cast<int>(p.bolts.size()); ++bi)
                if (p.bolts[static_cast<size_t>(bi)].support == i) {
                    sm.bolts.push_back(bi);
                    centroid += p.bolts[static_cast<size_t>(bi)].centre;
                }
            sm.about = sm.bolts.empty()
                           ? centroid
                           : Eigen::Vector2d(centroid / static_cast<double>(sm.bolts.size()));
        }
    }
    if (!problems.empty()) throw InputError(problems);
    return p;
}

std::vector<Eigen::Vector2d> prescribed_bolt_forces(const model::Connection& c, const FeProblem& p,
                                                    const std::map<std::string, double>& factors) {
    std::vector<Eigen::Vector2d> out(p.bolts.size(), Eigen::Vector2d::Zero());
    for (size_t i = 0; i < c.members.size(); ++i) {
        const MemberModel& mm = p.members[i];
        if (mm.reference_node >= 0 || mm.bolts.empty()) continue;
        const auto [force, moment] = member_action(c.members[i], factors);
        std::vector<Eigen::Vector2d> centres;
        for (int bi : mm.bolts) centres.push_back(p.bolts[static_cast<size_t>(bi)].centre);
        const Eigen::Vector2d about(c.members[i].work_point.x, c.members[i].work_point.y);
        const auto shares = elastic_shares(centres, force, moment, about);
        for (size_t k = 0; k < mm.bolts.size(); ++k)
            out[static_cast<size_t>(mm.bolts[k])] = shares[k];
    }
    return out;
}

fe::Loads loads_for(const model::Connection& c, const mesh::Mesh& mesh, const FeProblem& p,
                    const std::map<std::string, double>& factors) {
    fe::Loads loads;
    for (int i = 0; i < static_cast<int>(c.members.size()); ++i) {
        const model::Member& member = c.members[static_cast<size_t>(i)];
        const MemberModel& mm = p.members[static_cast<size_t>(i)];
        if (mm.reference_node < 0) continue; // prescribed shares: loads on the holes, below
        const auto [force, moment] = member_action(member, factors);
        loads.nodal.push_back({fe::dof_ux(mm.reference_node), force.x()});
        loads.nodal.push_back({fe::dof_uy(mm.reference_node), force.y()});
        if (mm.rotation >= 0)
            loads.nodal.push_back({fe::dof_rotation(p.model, mm.rotation), moment});
    }
    // Prescribed shares: a cosine bearing pressure on each bolt's hole.
    const std::vector<Eigen::Vector2d> shares = prescribed_bolt_forces(c, p, factors);
    for (size_t bi = 0; bi < p.bolts.size(); ++bi) {
        const BoltModel& b = p.bolts[bi];
        if (!b.prescribed) continue;
        const auto& hole = hole_diameter(c, b);
        for (const auto& f : cosine_bearing_forces(p.model, mesh, b.hole, b.centre, hole,
                                                   c.plate.thickness, shares[bi]))
            loads.nodal.push_back(f);
    }
    // Edge loads: force per length (or a total force spread evenly) on an
    // outline segment, as a traction t/thickness on its element edges.
    const double t = c.plate.thickness;
    for (const model::EdgeLoad& load : c.edge_loads) {
        const auto it = factors.find(load.load_case);
        if (it == factors.end()) continue;
        double length = 0;
        for (const mesh::BoundaryEdge& e : mesh.boundary_edges)
            if (e.tag.kind == geometry::BoundaryKind::outline_edge && e.tag.index == load.edge) {
                const int b = e.nodes[2] >= 0 ? e.nodes[2] : e.nodes[1];
                length += (mesh.nodes[static_cast<size_t>(b)] -
                           mesh.nodes[static_cast<size_t>(e.nodes[0])])
                              .norm();
            }
        if (length <= 0) continue;
        Eigen::Vector2d per_length(load.fx, load.fy);
        if (load.total) per_length /= length;
        const Eigen::Vector2d traction = it->second * per_length / t;
        for (const mesh::BoundaryEdge& e : mesh.boundary_edges)
            if (e.tag.kind == geometry::BoundaryKind::outline_edge && e.tag.index == load.edge)
                loads.edges.push_back(
                    {e.element, e.local_edge, fe::TractionFrame::global, traction, traction});
    }
    return loads;
}

} // namespace lapwing::analysis
