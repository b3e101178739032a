// Robustness: random valid plates (random_plate.cpp: convex and non-convex
// outlines of 3-10 vertices, 1-30 holes in bolt patterns, slots, one cut-out)
// all mesh and meet the quality targets on every plate, with no
// exception tolerated: no inverted element, min scaled Jacobian >= 0.3,
// >= 99 % of elements with angles in [30°, 150°]; every mesh conforming; the
// quadratic meshes also reproduce the exact region area (Green's theorem on
// the boundary lines and arcs) within 1e-5. Each failure names its seed.
//
// Seeds 0-999 by default; LAPWING_RANDOM_PLATES=N runs seeds 0..N-1 and
// LAPWING_RANDOM_SEEDS=A-B runs seeds A..B (inclusive), for larger sweeps.
// The test prints the quality figures over every element of the set (min,
// 5th percentile, median), which docs/mesher.md quotes.
#include "core/error.hpp"
#include "geometry/region_boundary.hpp"
#include "mesh/mesh.hpp"
#include "mesh/quality.hpp"
#include "mesh_checks.hpp"
#include "random_plate.hpp"

#include <cmath>
#include <cstdio>
#include <cstdlib>
#include <doctest/doctest.h>
#include <iomanip>
#include <sstream>
#include <vector>

using namespace lapwing;

namespace {

// Per-element figures over a whole set of plates.
struct Tally {
    std::vector<double> sj, min_angle, max_angle, aspect;
    long angles_ok = 0;
    double worst_plate_angles_ok = 1.0;
};

// Meshes the plate of `seed` (Q8, Q4, Q9 in turn; default settings except a
// coarse global size, to keep 1000 plates fast) and returns what misses the
// targets, empty if nothing does.
std::string random_plate_problem(int seed, Tally* tally) {
    const geometry::PlateRegion r = test::random_plate(static_cast<std::uint64_t>(seed));
    mesh::MeshSettings s;
    s.element_size = 40;
    s.kind = std::array{fe::ElementKind::Q8, fe::ElementKind::Q4, fe::ElementKind::Q9}[seed % 3];
    std::ostringstream why;
    try {
        const mesh::Mesh m = mesh::build_mesh(r, s);
        const auto& q = m.quality_summary;
        if (q.n_inverted > 0) why << q.n_inverted << " inverted elements; ";
        if (!(q.scaled_jacobian.min >= 0.3))
            why << "min scaled Jacobian " << q.scaled_jacobian.min << " below 0.3; ";
        if (!(q.fraction_angles_ok >= 0.99))
            why << "angles in [30, 150] on only " << q.fraction_angles_ok << "; ";
        const auto boundary = geometry::build_region_boundary(r);
        const std::string conf =
            test::conformity_problem(m, static_cast<int>(boundary.loops.size()));
        if (!conf.empty()) why << conf << "; ";
        if (fe::is_quadratic(s.kind)) {
            double exact = 0.0;
            for (const auto& loop : boundary.loops) exact += geometry::signed_area(loop);
            const double err = std::abs(test::mesh_area(m) - exact) / exact;
            if (!(err <= 1e-5)) why << "area error " << err << "; ";
        }
        if (tally) {
            for (const mesh::ElementQuality& e : m.quality) {
                tally->sj.push_back(e.scaled_jacobian);
                tally->min_angle.push_back(e.min_angle_deg);
                tally->max_angle.push_back(e.max_angle_deg);
                tally->aspect.push_back(e.aspect_ratio);
                if (e.min_angle_deg >= 30.0 && e.max_angle_deg <= 150.0) ++tally->angles_ok;
            }
            tally->worst_plate_angles_ok =
                std::min(tally->worst_plate_angles_ok, q.fraction_angles_ok);
        }
    } catch (const std::exception& e) {
        why << "threw: " << e.what();
    }
    std::string out = why.str();
    if (!out.empty())
        out = "seed " + std::to_string(seed) + " (" + std::string(fe::name(s.kind)) + "): " + out;
    return out;
}

std::string figures(const char* name, const mesh::Summary& s) {
    std::ostringstream o;
    o << std::fixed << std::setprecision(3) << name << ": min " << s.min << ", 5th pct " << s.p05
      << ", median " << s.median << ", max " << s.max << "\n";
    return o.str();
}

} // namespace

TEST_CASE("1000 random plates mesh without failure and meet the quality targets") {
    int first = 0, last = 999;
    if (const char* env = std::getenv("LAPWING_RANDOM_PLATES")) last = std::atoi(env) - 1;
    if (const char* env = std::getenv("LAPWING_RANDOM_SEEDS")) {
        REQUIRE_MESSAGE(std::sscanf(env, "%d-%d", &first, &last) == 2,
                        "LAPWING_RANDOM_SEEDS must read A-B (first and last seed)");
    }
    Tally tally;
    int failures = 0;
    for (int seed = first; seed <= last; ++seed) {
        const std::string problem = random_plate_problem(seed, &tally);
        if (problem.empty()) continue;
        ++failures;
        if (failures <= 30) MESSAGE(problem);
    }
    const size_t n = tally.sj.size();
    std::ostringstream o;
    o << "seeds " << first << "-" << last << ": " << failures << " plates miss a target; " << n
      << " elements\n"
      << figures("scaled Jacobian", mesh::summarize(tally.sj))
      << figures("smallest corner angle (deg)", mesh::summarize(tally.min_angle))
      << figures("largest corner angle (deg)", mesh::summarize(tally.max_angle))
      << figures("aspect ratio", mesh::summarize(tally.aspect)) << std::setprecision(6)
      << "elements with every angle in [30, 150]: "
      << 100.0 * static_cast<double>(tally.angles_ok) / static_cast<double>(std::max<size_t>(n, 1))
      << " %; worst plate " << 100.0 * tally.worst_plate_angles_ok << " %";
    MESSAGE(o.str());
    CHECK(failures == 0);
}

// Seeds beyond the fixed set that once failed, kept as named cases: 1597,
// 2162 and 2187 threw "cannot recover the boundary".
TEST_CASE("random plates that once failed mesh and meet the quality targets") {
    for (int seed : {1597, 2162, 2187}) {
        CAPTURE(seed);
        CHECK(random_plate_problem(seed, nullptr) == "");
    }
}
