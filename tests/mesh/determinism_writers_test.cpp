// Determinism (same input, byte-identical output) and the two writers: the
// VTU file read back by a small independent parser, the SVG's structure.
#include "mesh/mesh.hpp"
#include "mesh/writers.hpp"
#include "mesh_checks.hpp"
#include "sample_plates.hpp"

#include <doctest/doctest.h>
#include <regex>
#include <sstream>
#include <string>

using namespace lapwing;

namespace {

// Whitespace-separated numbers of the DataArray named `name`.
std::vector<double> data_array(const std::string& vtu, const std::string& name) {
    const auto at = vtu.find("Name=\"" + name + "\"");
    REQUIRE(at != std::string::npos);
    const auto start = vtu.find('>', at) + 1;
    const auto end = vtu.find("</DataArray>", start);
    std::istringstream in(vtu.substr(start, end - start));
    std::vector<double> out;
    for (double v; in >> v;) out.push_back(v);
    return out;
}

} // namespace

TEST_CASE("the same input gives a byte-identical mesh") {
    for (auto kind : {fe::ElementKind::Q4, fe::ElementKind::Q8, fe::ElementKind::Q9}) {
        mesh::MeshSettings s;
        s.kind = kind;
        s.element_size = 12;
        const std::string a = mesh::mesh_to_vtu(mesh::build_mesh(test::sample_plate(), s));
        const std::string b = mesh::mesh_to_vtu(mesh::build_mesh(test::sample_plate(), s));
        CHECK(a == b);
        CHECK(mesh::mesh_to_svg(mesh::build_mesh(test::sample_plate(), s)) ==
              mesh::mesh_to_svg(mesh::build_mesh(test::sample_plate(), s)));
    }
}

TEST_CASE("the VTU file holds the mesh: counts, VTK cell types 9 / 23 / 28, connectivity") {
    const std::pair<fe::ElementKind, int> kinds[] = {
        {fe::ElementKind::Q4, 9}, {fe::ElementKind::Q8, 23}, {fe::ElementKind::Q9, 28}};
    for (auto [kind, vtk_type] : kinds) {
        mesh::MeshSettings s;
        s.kind = kind;
        const mesh::Mesh m = mesh::build_mesh(test::sample_plate(), s);
        const std::string vtu = mesh::mesh_to_vtu(m);
        CHECK(vtu.find("<VTKFile type=\"UnstructuredGrid\"") != std::string::npos);
        std::smatch match;
        REQUIRE(std::regex_search(
            vtu, match, std::regex("NumberOfPoints=\"(\\d+)\" NumberOfCells=\"(\\d+)\"")));
        CHECK(std::stoul(match[1]) == m.nodes.size());
        CHECK(std::stoi(match[2]) == m.n_elements());
        const auto types = data_array(vtu, "types");
        REQUIRE(types.size() == static_cast<size_t>(m.n_elements()));
        for (double t : types) CHECK(t == vtk_type);
        const auto conn = data_array(vtu, "connectivity");
        const auto offsets = data_array(vtu, "offsets");
        CHECK(conn.size() == m.connectivity.size());
        CHECK(offsets.back() == static_cast<double>(conn.size()));
        for (size_t i = 0; i < conn.size(); ++i) CHECK(conn[i] == m.connectivity[i]);
        // Points read back exactly (17 significant digits round-trip a double).
        const auto at = vtu.find('>', vtu.find("<Points>") + 9) + 1;
        std::istringstream in(vtu.substr(at, vtu.find("</DataArray>", at) - at));
        size_t n = 0;
        bool exact = true;
        for (double x, y, z; in >> x >> y >> z; ++n)
            exact =
                exact && n < m.nodes.size() && x == m.nodes[n].x() && y == m.nodes[n].y() && z == 0;
        CHECK(n == m.nodes.size());
        CHECK(exact);
    }
}

TEST_CASE("the SVG drawing has every element and the boundary tags") {
    mesh::MeshSettings s;
    const mesh::Mesh m = mesh::build_mesh(test::sample_plate(), s);
    const std::string svg = mesh::mesh_to_svg(m);
    CHECK(svg.rfind("<svg xmlns=\"http://www.w3.org/2000/svg\"", 0) == 0);
    CHECK(svg.find("</svg>") != std::string::npos);
    // One closed sub-path per element.
    size_t closes = 0;
    const auto start = svg.find("<path fill=\"#eef3f8\"");
    const auto end = svg.find("\"/>", start);
    for (size_t i = start; i < end; ++i) closes += svg[i] == 'Z';
    CHECK(closes == static_cast<size_t>(m.n_elements()));
    for (const char* tag : {"holes[0]", "holes[2]", "outline.corner[2]", "cutouts[0].edge[1]"})
        CHECK_MESSAGE(svg.find(std::string(">") + tag + "<") != std::string::npos, tag);
}
