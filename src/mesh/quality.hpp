// Element quality figures: scaled Jacobian, corner angles, aspect ratio, and
// their summary over a mesh.
#pragma once

#include "mesh/mesh.hpp"

namespace lapwing::mesh {

ElementQuality element_quality(const Mesh& mesh, int element);

// Quality of every element, and the summary (min, 5th percentile, median).
void compute_quality(Mesh& mesh);

// Summary of a list of values (sorted copy; p05 and median by nearest rank).
Summary summarize(std::vector<double> values);

} // namespace lapwing::mesh
