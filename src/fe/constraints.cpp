// Construction of the dof map u = T ũ + g from prescribed values and linear
// multipoint constraints, resolving chains of slaves.
#include "fe/constraints.hpp"

#include "core/error.hpp"

#include <algorithm>
#include <fmt/format.h>

namespace lapwing::fe {

void add_rigid_link(const Model& model, int reference_node, int point_node,
                    Constraints& constraints) {
    const auto it =
        std::find(model.rotation_nodes.begin(), model.rotation_nodes.end(), reference_node);
    if (it == model.rotation_nodes.end())
        throw AnalysisError(fmt::format("rigid link to node {}: that node carries no rotation dof",
                                        reference_node));
    const int theta = dof_rotation(model, static_cast<int>(it - model.rotation_nodes.begin()));
    const Vector2 d = model.nodes[static_cast<size_t>(point_node)] -
                      model.nodes[static_cast<size_t>(reference_node)];
    constraints.linear.push_back(
        {dof_ux(point_node), {{dof_ux(reference_node), 1.0}, {theta, -d.y()}}, 0.0});
    constraints.linear.push_back(
        {dof_uy(point_node), {{dof_uy(reference_node), 1.0}, {theta, d.x()}}, 0.0});
}

namespace {

enum class Role : unsigned char { free, prescribed, slave };

struct Expansion {
    std::vector<DofMap::Term> terms;
    double offset = 0;
};

} // namespace

DofMap::DofMap(int n_dofs, const Constraints& constraints) {
    const auto n = static_cast<size_t>(n_dofs);
    std::vector<Role> role(n, Role::free);
    std::vector<double> value(n, 0.0);
    std::vector<int> constraint_of(n, -1);
    auto claim = [&](int dof, Role r, const char* what) {
        if (dof < 0 || dof >= n_dofs)
            throw AnalysisError(
                fmt::format("{} names dof {}, but the model has {} dofs", what, dof, n_dofs));
        if (role[static_cast<size_t>(dof)] != Role::free)
            throw AnalysisError(fmt::format("dof {} is constrained twice", dof));
        role[static_cast<size_t>(dof)] = r;
    };
    for (const auto& p : constraints.prescribed) {
        claim(p.dof, Role::prescribed, "a prescribed displacement");
        value[static_cast<size_t>(p.dof)] = p.value;
    }
    for (size_t c = 0; c < constraints.linear.size(); ++c) {
        const auto& lc = constraints.linear[c];
        claim(lc.slave, Role::slave, "a linear constraint");
        constraint_of[static_cast<size_t>(lc.slave)] = static_cast<int>(c);
        for (const auto& [m, coefficient] : lc.masters)
            if (m < 0 || m >= n_dofs)
                throw AnalysisError(fmt::format(
                    "linear constraint on dof {} names master dof {}, out of range", lc.slave, m));
    }

    unknown_of_.assign(n, -1);
    for (size_t d = 0; d < n; ++d)
        if (role[d] == Role::free) {
            unknown_of_[d] = n_unknowns_++;
            dof_of_.push_back(static_cast<int>(d));
        }

    // Resolve every dof to unknowns, depth first with cycle detection.
    std::vector<Expansion> expansion(n);
    std::vector<unsigned char> state(n, 0); // 0 new, 1 on the stack, 2 done
    auto resolve = [&](auto&& self, int dof) -> const Expansion& {
        const auto d = static_cast<size_t>(dof);
        if (state[d] == 2) return expansion[d];
        if (state[d] == 1)
            throw AnalysisError(
                fmt::format("the linear constraints form a cycle through dof {}", dof));
        state[d] = 1;
        Expansion e;
        if (role[d] == Role::free) {
            e.terms.push_back({unknown_of_[d], 1.0});
        } else if (role[d] == Role::prescribed) {
            e.offset = value[d];
        } else {
            const auto& lc = constraints.linear[static_cast<size_t>(constraint_of[d])];
            e.offset = lc.offset;
            for (const auto& [m, coefficient] : lc.masters) {
                const Expansion& em = self(self, m);
                e.offset += coefficient * em.offset;
                for (const Term& t : em.terms)
                    e.terms.push_back({t.unknown, coefficient * t.coefficient});
            }
            std::sort(e.terms.begin(), e.terms.end(),
                      [](const Term& a, const Term& b) { return a.unknown < b.unknown; });
            std::vector<Term> merged;
            for (const Term& t : e.terms) {
                if (!merged.empty() && merged.back().unknown == t.unknown)
                    merged.back().coefficient += t.coefficient;
                else
                    merged.push_back(t);
            }
            std::erase_if(merged, [](const Term& t) { return t.coefficient == 0.0; });
            e.terms = std::move(merged);
        }
        expansion[d] = std::move(e);
        state[d] = 2;
        return expansion[d];
    };

    start_.reserve(n + 1);
    start_.push_back(0);
    offset_.resize(n);
    for (size_t d = 0; d < n; ++d) {
        const Expansion& e = resolve(resolve, static_cast<int>(d));
        terms_.insert(terms_.end(), e.terms.begin(), e.terms.end());
        start_.push_back(static_cast<int>(terms_.size()));
        offset_[d] = e.offset;
    }
}

Eigen::VectorXd DofMap::expand(const Eigen::VectorXd& reduced) const {
    Eigen::VectorXd full(n_full());
    for (int d = 0; d < n_full(); ++d) {
        double v = offset(d);
        for (const Term& t : terms(d)) v += t.coefficient * reduced(t.unknown);
        full(d) = v;
    }
    return full;
}

Eigen::VectorXd DofMap::restrict_to_unknowns(const Eigen::VectorXd& full) const {
    Eigen::VectorXd reduced = Eigen::VectorXd::Zero(n_unknowns());
    for (int d = 0; d < n_full(); ++d)
        for (const Term& t : terms(d)) reduced(t.unknown) += t.coefficient * full(d);
    return reduced;
}

} // namespace lapwing::fe
