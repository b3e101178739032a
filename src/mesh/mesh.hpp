// The all-quadrilateral mesh of a plate region and the settings that build it.
#pragma once

#include "fe/element_kind.hpp"
#include "geometry/plate_region.hpp"

#include <Eigen/Core>
#include <span>
#include <string>
#include <vector>

namespace lapwing::mesh {

struct MeshSettings {
    fe::ElementKind kind = fe::ElementKind::Q8;
    // Target edge length of a quadrilateral away from holes and corners (mm);
    // <= 0 picks a tenth of the outline's smaller bounding-box side.
    double element_size = 0.0;
    // Element edges around each hole (a slot counts both half-circles);
    // 0 picks the default: 16 for quadratic, 32 for linear elements, enough
    // for converged hole-edge stresses (common practice). Rounded up to a
    // multiple of 4 so the quadrant points of a circle are nodes.
    int elements_around_hole = 0;
    // Growth of the element size per unit distance from a hole edge or a
    // re-entrant corner (0.3 = 30 % of the distance).
    double grading = 0.3;
    // Element size at a re-entrant corner, as a fraction of element_size.
    double corner_size_ratio = 0.35;
    // Passes of constrained Laplacian smoothing of interior nodes.
    int smoothing_passes = 4;
};

// Per element: the scaled Jacobian (min det J / max det J over the element's
// corner, mid-side and Gauss points), the corner angles of the quadrilateral
// through its four corners, and its aspect ratio (longest / shortest edge).
struct ElementQuality {
    double scaled_jacobian = 0.0;
    double min_angle_deg = 0.0;
    double max_angle_deg = 0.0;
    double aspect_ratio = 0.0;
};

struct Summary {
    double min = 0.0, p05 = 0.0, median = 0.0, max = 0.0;
};

struct QualitySummary {
    Summary scaled_jacobian, min_angle_deg, max_angle_deg, aspect_ratio;
    int n_inverted = 0;              // elements with det J <= 0 somewhere
    double fraction_angles_ok = 0.0; // elements with every angle in [30°, 150°]
};

// One element edge on the region's boundary.
struct BoundaryEdge {
    int element = -1;
    int local_edge = -1;                  // 0..3, edge e from corner e to corner e+1
    std::array<int, 3> nodes{-1, -1, -1}; // in the element's edge order; [1] is the
                                          // mid-side node for quadratic elements
    geometry::BoundaryTag tag;
};

// Nodes on one hole's edge, in order round the hole.
struct HoleNodes {
    int hole = -1;
    std::vector<int> nodes;
};

struct Mesh {
    fe::ElementKind kind = fe::ElementKind::Q8;
    std::vector<Eigen::Vector2d> nodes; // mm
    std::vector<int> connectivity;      // node_count(kind) per element, fe/element_kind.hpp order
    std::vector<BoundaryEdge> boundary_edges;
    std::vector<HoleNodes> hole_nodes; // one entry per hole of the region, by hole index
    std::vector<ElementQuality> quality;
    QualitySummary quality_summary;

    int n_elements() const { return static_cast<int>(connectivity.size()) / fe::node_count(kind); }
    std::span<const int> element(int e) const {
        const int n = fe::node_count(kind);
        return {connectivity.data() + static_cast<size_t>(e) * n, static_cast<size_t>(n)};
    }
    // Nodes on boundary pieces with this tag (sorted, unique).
    std::vector<int> nodes_on(const geometry::BoundaryTag& tag) const;
    // Nodes on every piece of a kind and index (e.g. all edges of cut-out 0).
    std::vector<int> nodes_on(geometry::BoundaryKind piece_kind, int index) const;
};

// Meshes the region (validated first: bad input raises lapwing::InputError).
// Pure and deterministic: the same input gives the same mesh, bit for bit.
// Throws lapwing::AnalysisError if the mesher fails (naming where).
Mesh build_mesh(const geometry::PlateRegion& region, const MeshSettings& settings);

} // namespace lapwing::mesh
