// Test helper: template text → connection → mesh → analysis results.
#pragma once

#include "analysis/analyse.hpp"
#include "input/load_connection.hpp"
#include "mesh/mesh.hpp"

#include <string>

namespace lapwing::test {

struct Run {
    model::Connection connection;
    analysis::PlateLayout layout;
    mesh::Mesh mesh;
    analysis::Results results;
};

inline Run run_connection(const std::string& toml, const std::vector<std::string>& sets = {}) {
    Run r;
    r.connection = input::load_connection(toml, "test.toml", sets);
    r.layout = analysis::plate_layout(r.connection);
    r.mesh = mesh::build_mesh(r.layout.region, analysis::mesh_settings(r.connection));
    r.results = analysis::analyse(r.connection, r.mesh, r.layout);
    return r;
}

} // namespace lapwing::test
