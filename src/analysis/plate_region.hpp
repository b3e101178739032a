// The connection's plate as a region for the mesher: its outline, cut-outs
// and one hole per bolt, with the map from hole number back to the bolt.
#pragma once

#include "geometry/plate_region.hpp"
#include "mesh/mesh.hpp"
#include "model/connection.hpp"

#include <vector>

namespace lapwing::analysis {

struct BoltRef {
    int group = -1;         // index into Connection::bolt_groups
    int bolt = -1;          // index into bolt_positions(group)
    Eigen::Vector2d centre; // mm
};

struct PlateLayout {
    geometry::PlateRegion region;
    std::vector<BoltRef> bolts; // bolts[h] sits in region.holes[h]
};

PlateLayout plate_layout(const model::Connection& connection);

// Mesh settings from the template's mesh controls.
mesh::MeshSettings mesh_settings(const model::Connection& connection);

} // namespace lapwing::analysis
