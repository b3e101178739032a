// Random valid plate regions for robustness tests: convex and non-convex
// outlines of 3-10 vertices, bolt patterns of circular or slotted holes, one
// cut-out. Every plate is reproducible from its seed on any platform (own
// generator and own distributions, not the standard library's).
#pragma once

#include "geometry/plate_region.hpp"

#include <cstdint>

namespace lapwing::test {

geometry::PlateRegion random_plate(std::uint64_t seed);

} // namespace lapwing::test
