// The colour scale of the stress contours: viridis (van der Walt & Smith
// 2015, matplotlib), perceptually uniform and readable in grey and by most
// colour-blind readers.
#pragma once

#include <array>
#include <string>

namespace lapwing::report {

struct Rgb {
    int r = 0, g = 0, b = 0; // 0..255
};

// Colour at t in [0, 1] (clamped), linear between ten published samples.
Rgb viridis(double t);

// "#rrggbb".
std::string hex(Rgb colour);

} // namespace lapwing::report
