// Plates with known exact geometry for the mesh tests.
#pragma once

#include "geometry/plate_region.hpp"

#include <cmath>
#include <numbers>

namespace lapwing::test {

// 300 × 200 splice-plate-like region: a fillet R 40 at corner 2, a chamfer 20
// at corner 3, a notch removing [0, 60] × [0, 30] at corner 0 (drawn past the
// plate edges, so it crosses the outline), two d 22 holes and a 50 × 22 slot
// at 30°.
inline geometry::PlateRegion sample_plate() {
    geometry::PlateRegion r;
    r.outline = {{{0, 0}}, {{300, 0}}, {{300, 200}, 0, 40}, {{0, 200}, 20, 0}};
    r.holes = {geometry::Hole::circle({100, 100}, 22), geometry::Hole::circle({180, 100}, 22),
               geometry::Hole::slot({240, 60}, 50, 22, 30)};
    r.cutouts = {{{{-10, -10}, {60, -10}, {60, 30}, {-10, 30}}}};
    return r;
}

// Its exact area by hand: rectangle, minus the fillet's corner R² − πR²/4,
// minus the chamfer's triangle c²/2, minus two circles πd²/4, minus the slot
// (L − w) w + πw²/4, minus the notch 60 × 30.
inline double sample_plate_area() {
    const double pi = std::numbers::pi;
    return 300.0 * 200.0 - (40.0 * 40.0 - pi * 40.0 * 40.0 / 4) - 20.0 * 20.0 / 2 -
           2 * pi * 22.0 * 22.0 / 4 - ((50.0 - 22.0) * 22.0 + pi * 22.0 * 22.0 / 4) - 60.0 * 30.0;
}

} // namespace lapwing::test
