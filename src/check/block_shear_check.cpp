// Block shear paths evaluated: areas with each form's hole deduction, the
// two published forms, the weakest path.
#include "check/block_shear_check.hpp"

#include <cmath>
#include <numbers>

namespace lapwing::check {

HoleWidths hole_widths(const model::Hole& hole, double group_angle_deg,
                       const Eigen::Vector2d& pull) {
    if (!(hole.length > hole.width)) return {hole.width, hole.width};
    const double long_deg =
        group_angle_deg + (hole.direction == model::SlotDirection::across ? 90.0 : 0.0);
    const double a = long_deg * std::numbers::pi / 180.0;
    const Eigen::Vector2d long_side(std::cos(a), std::sin(a));
    // Shear planes run along the pull: they cross the slot lengthwise when
    // the pull is nearer its long side than its short side.
    const bool along_long = std::abs(long_side.dot(pull.normalized())) >= std::sqrt(0.5);
    return along_long ? HoleWidths{hole.length, hole.width} : HoleWidths{hole.width, hole.length};
}

std::vector<PathCheck> check_paths(const BlockShearPaths& paths,
                                   const std::vector<Eigen::Vector2d>& forces, double t,
                                   const model::Hole& hole, double group_angle_deg,
                                   const model::Material& material,
                                   const model::BlockShearAllowable& allowable) {
    std::vector<PathCheck> out;
    for (size_t i = 0; i < paths.paths.size(); ++i) {
        const BlockShearPath& p = paths.paths[i];
        const HoleWidths w = hole_widths(hole, group_angle_deg, p.direction);
        PathCheck c;
        c.path = static_cast<int>(i);
        c.demand = path_demand(p, forces);
        c.aisc_areas = areas(p, t, w.shear + aisc_hole_allowance, w.tension + aisc_hole_allowance);
        c.en_areas = areas(p, t, w.shear, w.tension);
        c.capacity =
            block_shear_forms(c.aisc_areas, c.en_areas, p.uniform_tension, material, allowable);
        out.push_back(std::move(c));
    }
    return out;
}

int weakest(const std::vector<PathCheck>& checks) {
    int best = -1;
    for (size_t i = 0; i < checks.size(); ++i) {
        if (!(checks[i].demand > 0)) continue;
        if (best < 0 || checks[i].ratio() > checks[static_cast<size_t>(best)].ratio())
            best = static_cast<int>(i);
    }
    return best;
}

} // namespace lapwing::check
