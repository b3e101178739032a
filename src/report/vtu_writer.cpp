// model.vtu: VTK XML unstructured grid (VTK file formats, "XML file
// formats": Piece with Points, Cells {connectivity, offsets, types},
// PointData, CellData), ASCII. Cell types 9 (quad), 23 (quadratic quad) and
// 28 (biquadratic quad); our node order is VTK's (fe/element_kind.hpp).
// Coordinates, displacements and stresses in the user's unit system; per
// load case: "<case>_displacement" (3 components, z = 0), "<case>_stress"
// (σxx, σyy, τxy) and "<case>_von_mises".
#include "report/figures.hpp"
#include "report/outputs.hpp"
#include "report/text_format.hpp"

#include <charconv>
#include <fmt/format.h>
#include <iterator>

namespace lapwing::report {

std::string model_vtu(const check::CheckOutcome& o) {
    const mesh::Mesh& mesh = o.mesh;
    const UnitSystem units = o.connection.units;
    const auto len = [&](double v) { return from_internal(v, Quantity::length, units); };
    const auto str = [&](double v) { return from_internal(v, Quantity::stress, units); };
    fmt::memory_buffer out;
    auto put = [&]<typename... T>(fmt::format_string<T...> f, T&&... args) {
        fmt::format_to(std::back_inserter(out), f, std::forward<T>(args)...);
    };
    // "{:.Pg}" then `after`, by std::to_chars (printf's %.Pg, the same
    // digits): fmt 9's precision path costs several times as much, and the
    // file holds a few numbers per node and case.
    const auto put_g = [&](double v, int precision, char after) {
        char text[40];
        char* end =
            std::to_chars(text, text + sizeof text - 1, v, std::chars_format::general, precision)
                .ptr;
        *end++ = after;
        out.append(text, end);
    };
    const size_t n_nodes = mesh.nodes.size();
    const int n_el = mesh.n_elements();
    const int npe = fe::node_count(mesh.kind);
    put("<?xml version=\"1.0\"?>\n");
    put("<VTKFile type=\"UnstructuredGrid\" version=\"0.1\" byte_order=\"LittleEndian\">\n");
    put("<UnstructuredGrid>\n<Piece NumberOfPoints=\"{}\" NumberOfCells=\"{}\">\n", n_nodes, n_el);
    put("<Points>\n<DataArray type=\"Float64\" NumberOfComponents=\"3\" format=\"ascii\">\n");
    for (const auto& p : mesh.nodes) {
        put_g(len(p.x()), 10, ' ');
        put_g(len(p.y()), 10, ' ');
        put("0\n");
    }
    put("</DataArray>\n</Points>\n<Cells>\n");
    put("<DataArray type=\"Int64\" Name=\"connectivity\" format=\"ascii\">\n");
    for (int e = 0; e < n_el; ++e) {
        const auto el = mesh.element(e);
        for (int k = 0; k < npe; ++k) put("{}{}", el[k], k + 1 < npe ? ' ' : '\n');
    }
    put("</DataArray>\n<DataArray type=\"Int64\" Name=\"offsets\" format=\"ascii\">\n");
    for (int e = 0; e < n_el; ++e) put("{}\n", static_cast<long long>(e + 1) * npe);
    put("</DataArray>\n<DataArray type=\"UInt8\" Name=\"types\" format=\"ascii\">\n");
    for (int e = 0; e < n_el; ++e) put("{}\n", fe::vtk_cell_type(mesh.kind));
    put("</DataArray>\n</Cells>\n<PointData>\n");
    for (const analysis::CaseResult& c : o.results.cases) {
        const std::string name = escape(c.name);
        put("<DataArray type=\"Float64\" Name=\"{}_displacement\" NumberOfComponents=\"3\" "
            "format=\"ascii\">\n",
            name);
        for (size_t i = 0; i < n_nodes; ++i) {
            const bool has = c.u.size() >= static_cast<Eigen::Index>(2 * i + 2);
            const double ux = has ? c.u[static_cast<Eigen::Index>(2 * i)] : 0;
            const double uy = has ? c.u[static_cast<Eigen::Index>(2 * i + 1)] : 0;
            put_g(len(ux), 10, ' ');
            put_g(len(uy), 10, ' ');
            put("0\n");
        }
        put("</DataArray>\n<DataArray type=\"Float64\" Name=\"{}_stress\" "
            "NumberOfComponents=\"3\" format=\"ascii\">\n",
            name);
        const fe::Stress zero = fe::Stress::Zero();
        const auto stress = [&](size_t i) -> const fe::Stress& {
            return i < c.nodal_stress.size() ? c.nodal_stress[i] : zero;
        };
        for (size_t i = 0; i < n_nodes; ++i) {
            put_g(str(stress(i)[0]), 8, ' ');
            put_g(str(stress(i)[1]), 8, ' ');
            put_g(str(stress(i)[2]), 8, '\n');
        }
        put("</DataArray>\n<DataArray type=\"Float64\" Name=\"{}_von_mises\" format=\"ascii\">\n",
            name);
        for (size_t i = 0; i < n_nodes; ++i) put_g(str(von_mises(stress(i))), 8, '\n');
        put("</DataArray>\n");
    }
    put("</PointData>\n<CellData>\n");
    if (mesh.quality.size() == static_cast<size_t>(n_el)) {
        put("<DataArray type=\"Float64\" Name=\"scaled_jacobian\" format=\"ascii\">\n");
        for (const mesh::ElementQuality& q : mesh.quality) put("{:.6g}\n", q.scaled_jacobian);
        put("</DataArray>\n");
    }
    put("</CellData>\n</Piece>\n</UnstructuredGrid>\n</VTKFile>\n");
    return fmt::to_string(out);
}

} // namespace lapwing::report
