// A mesh that the mesher folded (an element whose map turns inside out) is
// the mesh settings' doing, not the connection's: said in those terms before
// the finite-element core would blame the element's node order.
#pragma once

#include "analysis/plate_region.hpp"
#include "mesh/mesh.hpp"
#include "model/connection.hpp"

namespace lapwing::analysis {

// Throws AnalysisError naming the first inverted element's place (and the
// bolt hole beside it, if any) and the [mesh] keys that change the mesh.
void check_mesh_not_folded(const model::Connection& c, const mesh::Mesh& mesh,
                           const PlateLayout& layout);

} // namespace lapwing::analysis
