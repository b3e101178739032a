// The shipped templates (templates/*.toml), read and loaded for tests.
#pragma once

#include "input/load_connection.hpp"
#include "model/connection.hpp"

#include <fstream>
#include <sstream>
#include <stdexcept>
#include <string>
#include <vector>

namespace lapwing::test {

inline std::string template_path(const std::string& name) {
    return std::string(LAPWING_SOURCE_DIR) + "/templates/" + name;
}

// The text of templates/NAME; throws when it cannot be read, so that a
// missing template fails the test instead of loading an empty document.
inline std::string read_template(const std::string& name) {
    std::ifstream in(template_path(name));
    if (!in) throw std::runtime_error("cannot read " + template_path(name));
    std::stringstream text;
    text << in.rdbuf();
    return text.str();
}

// templates/NAME with the --set overrides `sets` (KEY=VALUE), as the CLI loads it.
inline model::Connection load_template(const std::string& name,
                                       const std::vector<std::string>& sets = {}) {
    return input::load_connection(read_template(name), template_path(name), sets);
}

} // namespace lapwing::test
