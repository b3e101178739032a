// Carrying a settled contact set between meshes by the angle on each hole.
#include "analysis/contact_seed.hpp"

#include <cmath>
#include <numbers>

namespace lapwing::analysis {

namespace {

constexpr double two_pi = 2 * std::numbers::pi;

// The angle from `from` anticlockwise to `to`, in [0, 2π).
double anticlockwise(double from, double to) {
    const double d = std::fmod(to - from, two_pi);
    return d < 0 ? d + two_pi : d;
}

double angle_about(const FeProblem& p, const BoltModel& bolt, size_t j) {
    const Eigen::Vector2d d = p.model.nodes[static_cast<size_t>(bolt.hole_nodes[j])] - bolt.centre;
    return std::atan2(d.y(), d.x());
}

// The state at angle `a` from the seed's nodes round one hole.
bool closed_at(const ContactSeed::Hole& h, double a) {
    // The seed nodes next to `a` going clockwise (lo) and anticlockwise (hi).
    size_t lo = 0, hi = 0;
    for (size_t k = 1; k < h.angle.size(); ++k) {
        if (anticlockwise(h.angle[k], a) < anticlockwise(h.angle[lo], a)) lo = k;
        if (anticlockwise(a, h.angle[k]) < anticlockwise(a, h.angle[hi])) hi = k;
    }
    // At a seed node (to round-off of the two meshers' coordinates).
    constexpr double same = 1e-9;
    const double to_lo = anticlockwise(h.angle[lo], a), to_hi = anticlockwise(a, h.angle[hi]);
    if (to_lo <= same || two_pi - to_lo <= same) return h.closed[lo] != 0;
    if (to_hi <= same || two_pi - to_hi <= same) return h.closed[hi] != 0;
    if (h.closed[lo] == h.closed[hi]) return h.closed[lo] != 0;
    const double t = to_lo / (to_lo + to_hi);
    return (1 - t) * h.gap[lo] + t * h.gap[hi] <= 0;
}

} // namespace

ContactSeed contact_seed(const FeProblem& p, const std::vector<bool>& closed,
                         const Eigen::VectorXd& u) {
    ContactSeed seed;
    seed.bolts.resize(p.bolts.size());
    for (size_t b = 0; b < p.bolts.size(); ++b) {
        const BoltModel& bolt = p.bolts[b];
        if (bolt.first_contact < 0) continue;
        ContactSeed::Hole& h = seed.bolts[b];
        for (size_t j = 0; j < bolt.hole_nodes.size(); ++j) {
            const size_t spring = static_cast<size_t>(bolt.first_contact) + j;
            const fe::LinkSpring& s = p.model.link_springs[spring];
            const Eigen::Vector2d ua(u(fe::dof_ux(s.node_a)), u(fe::dof_uy(s.node_a)));
            const Eigen::Vector2d ub(u(fe::dof_ux(s.node_b)), u(fe::dof_uy(s.node_b)));
            h.angle.push_back(angle_about(p, bolt, j));
            h.closed.push_back(closed[spring] ? 1 : 0);
            h.gap.push_back((ub - ua).dot(s.direction)); // as analyse() measures it
        }
    }
    return seed;
}

std::vector<bool> seeded_active_set(const FeProblem& p, const ContactSeed& seed) {
    if (seed.bolts.size() != p.bolts.size()) return {};
    std::vector<bool> active(p.model.link_springs.size(), true);
    for (size_t b = 0; b < p.bolts.size(); ++b) {
        const BoltModel& bolt = p.bolts[b];
        const ContactSeed::Hole& h = seed.bolts[b];
        if ((bolt.first_contact >= 0) != !h.angle.empty()) return {};
        if (bolt.first_contact < 0) continue;
        for (size_t j = 0; j < bolt.hole_nodes.size(); ++j)
            active[static_cast<size_t>(bolt.first_contact) + j] =
                closed_at(h, angle_about(p, bolt, j));
    }
    return active;
}

void ContactBoard::publish(size_t i, ContactSeed seed) {
    {
        const std::lock_guard lock(mutex_);
        if (i < seeds_.size()) seeds_[i] = std::move(seed);
    }
    changed_.notify_all();
}

void ContactBoard::finish() {
    {
        const std::lock_guard lock(mutex_);
        finished_ = true;
    }
    changed_.notify_all();
}

std::optional<ContactSeed> ContactBoard::wait(size_t i) {
    std::unique_lock lock(mutex_);
    if (i >= seeds_.size()) return std::nullopt;
    changed_.wait(lock, [&] { return finished_ || seeds_[i].has_value(); });
    return seeds_[i];
}

ContactHooks ContactBoard::publisher() {
    ContactHooks hooks;
    hooks.settled = [this](size_t i, const ContactSeed& seed) { publish(i, seed); };
    return hooks;
}

ContactHooks ContactBoard::reader() {
    ContactHooks hooks;
    hooks.seed_for = [this](size_t i) { return wait(i); };
    return hooks;
}

} // namespace lapwing::analysis
