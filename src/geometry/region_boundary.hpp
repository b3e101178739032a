// From the plate region's input data to its checked boundary loops.
#pragma once

#include "geometry/curve.hpp"
#include "geometry/plate_region.hpp"

namespace lapwing::geometry {

// Checks the region and builds its boundary: outline with chamfers and
// fillets, minus cut-outs, minus holes. Throws lapwing::InputError listing
// every problem found, each naming the offending item ("holes[3]") and where
// it is.
RegionBoundary build_region_boundary(const PlateRegion& region);

// The same checks without keeping the result.
void validate(const PlateRegion& region);

// Largest distance used as "equal" for points of this region: a billionth of
// its size.
double geometric_tolerance(const PlateRegion& region);

} // namespace lapwing::geometry
