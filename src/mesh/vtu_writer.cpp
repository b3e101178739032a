// VTK XML unstructured grid (VTK file formats, "XML file formats": Piece with
// Points, Cells {connectivity, offsets, types}, CellData). Our node order is
// VTK's for cell types 9, 23 and 28 (fe/element_kind.hpp).
#include "mesh/writers.hpp"

#include <fmt/format.h>
#include <iterator>

namespace lapwing::mesh {

std::string mesh_to_vtu(const Mesh& mesh) {
    fmt::memory_buffer out;
    auto put = [&]<typename... T>(fmt::format_string<T...> f, T&&... args) {
        fmt::format_to(std::back_inserter(out), f, std::forward<T>(args)...);
    };
    const int n_el = mesh.n_elements();
    const int npe = fe::node_count(mesh.kind);
    put("<?xml version=\"1.0\"?>\n");
    put("<VTKFile type=\"UnstructuredGrid\" version=\"0.1\" byte_order=\"LittleEndian\">\n");
    put("<UnstructuredGrid>\n<Piece NumberOfPoints=\"{}\" NumberOfCells=\"{}\">\n",
        mesh.nodes.size(), n_el);
    put("<Points>\n<DataArray type=\"Float64\" NumberOfComponents=\"3\" format=\"ascii\">\n");
    for (const auto& p : mesh.nodes) put("{:.17g} {:.17g} 0\n", p.x(), p.y());
    put("</DataArray>\n</Points>\n<Cells>\n");
    put("<DataArray type=\"Int64\" Name=\"connectivity\" format=\"ascii\">\n");
    for (int e = 0; e < n_el; ++e) {
        const auto el = mesh.element(e);
        for (int k = 0; k < npe; ++k) put("{}{}", el[k], k + 1 < npe ? ' ' : '\n');
    }
    put("</DataArray>\n<DataArray type=\"Int64\" Name=\"offsets\" format=\"ascii\">\n");
    for (int e = 0; e < n_el; ++e) put("{}\n", static_cast<long long>(e + 1) * npe);
    put("</DataArray>\n<DataArray type=\"UInt8\" Name=\"types\" format=\"ascii\">\n");
    const int type = fe::vtk_cell_type(mesh.kind);
    for (int e = 0; e < n_el; ++e) put("{}\n", type);
    put("</DataArray>\n</Cells>\n<CellData Scalars=\"scaled_jacobian\">\n");
    const auto cell_array = [&](const char* name, auto get) {
        put("<DataArray type=\"Float64\" Name=\"{}\" format=\"ascii\">\n", name);
        for (int e = 0; e < n_el && e < static_cast<int>(mesh.quality.size()); ++e)
            put("{:.9g}\n", get(mesh.quality[e]));
        put("</DataArray>\n");
    };
    cell_array("scaled_jacobian", [](const ElementQuality& q) { return q.scaled_jacobian; });
    cell_array("min_angle_deg", [](const ElementQuality& q) { return q.min_angle_deg; });
    cell_array("max_angle_deg", [](const ElementQuality& q) { return q.max_angle_deg; });
    cell_array("aspect_ratio", [](const ElementQuality& q) { return q.aspect_ratio; });
    put("</CellData>\n</Piece>\n</UnstructuredGrid>\n</VTKFile>\n");
    return fmt::to_string(out);
}

} // namespace lapwing::mesh
