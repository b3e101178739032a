// Test helper: a small template with a coarse mesh, linear bolt ties and no
// convergence mesh, so each pipeline run takes a fraction of a second.
#pragma once

#include "support/templates.hpp"

#include <string>
#include <vector>

namespace lapwing::test {

// Coarse settings for the lap splice: spread ties (a linear model), large
// elements; the sweep must match single runs at any settings, so coarse
// ones lose nothing here.
inline std::vector<std::string> coarse_lap_splice() {
    return {"mesh.size=30", "mesh.near_hole_size=12", "mesh.around_hole=8",
            "bolt_group[0].tie=\"spread\"", "bolt_group[1].tie=\"spread\""};
}

} // namespace lapwing::test
