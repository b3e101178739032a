// Mesh drawings and files as strings (cli/ writes them to disk).
#pragma once

#include "mesh/mesh.hpp"

#include <string>

namespace lapwing::mesh {

struct SvgOptions {
    double width_px = 800.0; // drawing width; height follows the aspect ratio
    bool show_tags = true;   // colour boundary edges by kind and label each piece
};

// The mesh as a standalone SVG: elements (curved edges as quadratic Bézier
// curves through their mid-side nodes), the boundary drawn heavier, and the
// boundary tags when asked.
std::string mesh_to_svg(const Mesh& mesh, const SvgOptions& options = {});

// The mesh as a VTK XML unstructured grid (.vtu, ASCII; cell types 9, 23,
// 28), with the quality figures as cell data. Opens in ParaView.
std::string mesh_to_vtu(const Mesh& mesh);

} // namespace lapwing::mesh
