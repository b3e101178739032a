// Benchmark model: a quarter of a plate with a central circular hole in
// plane stress, sized by a target dof count. A mapped annulus-to-square
// block around the hole plus a straight strip out to the loaded end, both
// made by fe::make_structured_grid and joined along their shared edge by
// index (no geometric search), symmetry supports on the cut lines and a
// uniform tension on the far end.
#pragma once

#include "fe/constraints.hpp"
#include "fe/linear_static.hpp"
#include "fe/model.hpp"

namespace lapwing::bench {

// Geometry in mm, load in MPa. Full plate 320 × 80 with a 20 mm hole:
// d/W = 0.25 and length 4 W, the long-strip set-up of REFERENCES.md.
struct PlateWithHole {
    double hole_radius = 10;
    double half_width = 40;   // the annulus block is [0, half_width]²
    double half_length = 160; // the strip runs from half_width to half_length
    double thickness = 10;
    double tension = 100; // σ on the far end x = half_length
};

struct PlateModel {
    fe::Model model;
    fe::Constraints constraints;
    fe::Loads loads;
    int mesh_scale = 0;     // m: 2m × m annulus elements, 3m × m strip elements
    int hole_top_node = -1; // the node at (0, hole_radius), where σxx peaks
};

// The model whose dof count is closest to `target_dofs` (at least the
// smallest mesh, m = 2). Kinds: Q4, Q4i, Q8, Q9.
PlateModel make_plate_with_hole(fe::ElementKind kind, long target_dofs,
                                const PlateWithHole& plate = {});

// The model at a given mesh scale m ≥ 2.
PlateModel make_plate_with_hole_at_scale(fe::ElementKind kind, int m,
                                         const PlateWithHole& plate = {});

// Dofs (2 per node) of the model at scale m, from the node count formula
// of the two grids minus the shared edge.
long plate_dofs(fe::ElementKind kind, int m);

} // namespace lapwing::bench
