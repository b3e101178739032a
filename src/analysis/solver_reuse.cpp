// Reusing the sparse pattern and the ordering between models of one topology.
#include "analysis/solver_reuse.hpp"

#include <cstring>

namespace lapwing::analysis {

namespace {

template <typename T>
void put(std::string& key, const T& value) {
    char bytes[sizeof(T)];
    std::memcpy(bytes, &value, sizeof(T));
    key.append(bytes, sizeof(T));
}

} // namespace

std::string topology_key(const fe::Model& model, const fe::Constraints& constraints) {
    std::string key;
    key.reserve(64 * model.elements.size() + 1024);
    put(key, model.n_nodes());
    put(key, model.elements.size());
    for (const fe::Element& e : model.elements) {
        put(key, static_cast<int>(e.kind));
        const int n = fe::node_count(e.kind);
        for (int i = 0; i < n; ++i) put(key, e.nodes[static_cast<size_t>(i)]);
    }
    put(key, model.springs.size());
    for (const fe::Spring& s : model.springs) put(key, s.dof_a), put(key, s.dof_b);
    // A link spring's direction and stiffness are values; its nodes are topology.
    put(key, model.link_springs.size());
    for (const fe::LinkSpring& s : model.link_springs) put(key, s.node_a), put(key, s.node_b);
    put(key, model.rotation_nodes.size());
    for (int n : model.rotation_nodes) put(key, n);
    // The constraints in full, coefficients included: the problem keeps the
    // ones it was built with (rigid-link coefficients follow the coordinates).
    put(key, constraints.prescribed.size());
    for (const fe::PrescribedDof& p : constraints.prescribed) put(key, p.dof), put(key, p.value);
    put(key, constraints.linear.size());
    for (const fe::LinearConstraint& c : constraints.linear) {
        put(key, c.slave);
        put(key, c.offset);
        put(key, c.masters.size());
        for (const auto& [dof, coefficient] : c.masters) put(key, dof), put(key, coefficient);
    }
    return key;
}

fe::LinearStaticProblem& SolverReuse::problem_for(const fe::Model& model,
                                                  const fe::Constraints& constraints,
                                                  const std::function<void()>& before_values) {
    std::string key = topology_key(model, constraints);
    if (problem_ && key == key_) {
        try {
            if (before_values) before_values();
            problem_->refactorize(model);
        } catch (...) {
            // A failed factorization leaves no state worth keeping.
            problem_.reset();
            key_.clear();
            throw;
        }
        ++n_reused_;
        return *problem_;
    }
    problem_.reset();
    key_.clear();
    problem_ = std::make_unique<fe::LinearStaticProblem>(model, constraints, fe::SolverOptions{},
                                                         before_values);
    key_ = std::move(key);
    ++n_built_;
    return *problem_;
}

} // namespace lapwing::analysis
