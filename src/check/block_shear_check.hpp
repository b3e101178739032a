// Block shear of one bolt group: every candidate path's demand (the pull of
// its bolts) against its capacity in both published forms, and the weakest
// path (the largest demand / capacity), which is the one reported.
#pragma once

#include "check/block_shear_paths.hpp"
#include "check/limit_states.hpp"
#include "model/connection.hpp"

#include <Eigen/Core>
#include <vector>

namespace lapwing::check {

// Hole widths a path deducts: along its shear planes and across its
// tension plane (a slot deducts its length where the plane runs along its
// long side). Before any allowance.
struct HoleWidths {
    double shear = 0;
    double tension = 0;
};
// For the group's hole (model::Hole; a slot's long side along or across the
// group axis at `group_angle_deg`) and a path pulled along `pull`.
HoleWidths hole_widths(const model::Hole& hole, double group_angle_deg,
                       const Eigen::Vector2d& pull);

struct PathCheck {
    int path = -1;              // index into BlockShearPaths::paths
    double demand = 0;          // N, path_demand
    BlockShearAreas aisc_areas; // holes + aisc_hole_allowance
    BlockShearAreas en_areas;   // holes d0
    TwoForms capacity;
    double ratio() const { return capacity.chosen.value > 0 ? demand / capacity.chosen.value : 0; }
};

// Every path of `paths` with the bolt forces `forces` (forces[i] on the
// plate from the bolt at centre i, as given to block_shear_paths).
std::vector<PathCheck> check_paths(const BlockShearPaths& paths,
                                   const std::vector<Eigen::Vector2d>& forces, double t,
                                   const model::Hole& hole, double group_angle_deg,
                                   const model::Material& material,
                                   const model::BlockShearAllowable& allowable);

// Index into `checks` of the weakest loaded path (demand > 0, largest
// ratio; ties go to the first), or -1 when no path is pulled.
int weakest(const std::vector<PathCheck>& checks);

} // namespace lapwing::check
