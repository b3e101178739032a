// Element stiffness throughput on one core: fe::stiffness<4>,
// fe::stiffness_q4i and fe::stiffness<8> (and <9>) over the element shapes of
// the plate-with-hole mesh (graded, curved near the hole, so not all equal),
// ≥ 10⁶ element matrices per timed run, median of the runs. The nodal
// coordinates are gathered beforehand, so this is the element routine alone.
#include "fe/element_kind.hpp"
#include "fe/element_stiffness.hpp"
#include "fe/isoparametric_map.hpp"
#include "fe/material.hpp"
#include "measure.hpp"
#include "plate_with_hole.hpp"

#include <algorithm>
#include <fmt/format.h>
#include <iostream>
#include <string>
#include <vector>

namespace lapwing::bench {
namespace {

template <int n>
std::vector<fe::NodeCoords<n>> element_coords(const fe::Model& model) {
    std::vector<fe::NodeCoords<n>> out;
    out.reserve(model.elements.size());
    for (const fe::Element& el : model.elements)
        out.push_back(fe::gather_coords<n>(
            model.nodes, std::span<const int>(el.nodes.data(), static_cast<size_t>(n))));
    return out;
}

struct Rate {
    double wall = 0; // elements per wall second
    double cpu = 0;  // elements per CPU second (what one core does when it runs)
};

// Runs `compute` over the shapes until `min_elements` matrices are done.
// `sink` keeps the work from being optimised out.
template <typename Shape, typename F>
Rate throughput(const std::vector<Shape>& shapes, long min_elements, F&& compute, double& sink) {
    long done = 0;
    const Stopwatch clock;
    while (done < min_elements)
        for (size_t e = 0; e < shapes.size(); ++e, ++done)
            sink += compute(shapes[e], static_cast<int>(e));
    const auto n = static_cast<double>(done);
    return {n / clock.seconds(), n / clock.cpu_seconds()};
}

void report(const std::string& what, const std::vector<Rate>& rates, long per_run) {
    std::vector<double> wall, cpu;
    for (const Rate& r : rates) wall.push_back(r.wall), cpu.push_back(r.cpu);
    std::cout << fmt::format("{:<22} {:>10.3e} elements/CPU-s, {:>10.3e} elements/wall-s "
                             "(median of {} runs of ≥ {} elements; CPU-rate range {:.3e}–{:.3e})\n",
                             what, median(cpu), median(wall), rates.size(), per_run,
                             *std::min_element(cpu.begin(), cpu.end()),
                             *std::max_element(cpu.begin(), cpu.end()));
    std::cout << fmt::format("result\t{}\telements_per_cpu_s\t{:.6g}\t{}\n", what, median(cpu),
                             rates.size());
    std::cout << fmt::format("result\t{}\telements_per_wall_s\t{:.6g}\t{}\n", what, median(wall),
                             rates.size())
              << std::flush;
}

int run(bool smoke) {
    const long per_run = smoke ? 20000 : 1000000;
    const int runs = smoke ? 1 : 5;
    const fe::Matrix3 D = fe::plane_stress_D({200000.0, 0.3});
    double sink = 0;
    // About 10⁵ distinct shapes (5 m² elements), cycled to reach per_run.
    const int m = smoke ? 20 : 140;

    const PlateModel q4 = make_plate_with_hole_at_scale(fe::ElementKind::Q4, m);
    const auto shapes4 = element_coords<4>(q4.model);
    std::vector<Rate> rates;
    for (int k = 0; k < runs; ++k)
        rates.push_back(throughput(
            shapes4, per_run,
            [&](const fe::NodeCoords<4>& X, int e) {
                return fe::stiffness<4>(X, D, 10.0, e)(0, 0);
            },
            sink));
    report("stiffness<4> (Q4)", rates, per_run);

    rates.clear();
    for (int k = 0; k < runs; ++k)
        rates.push_back(throughput(
            shapes4, per_run,
            [&](const fe::NodeCoords<4>& X, int e) {
                return fe::stiffness_q4i(X, D, 10.0, e).k(0, 0);
            },
            sink));
    report("stiffness_q4i (Q4i)", rates, per_run);

    const PlateModel q8 = make_plate_with_hole_at_scale(fe::ElementKind::Q8, m);
    const auto shapes8 = element_coords<8>(q8.model);
    rates.clear();
    for (int k = 0; k < runs; ++k)
        rates.push_back(throughput(
            shapes8, per_run,
            [&](const fe::NodeCoords<8>& X, int e) {
                return fe::stiffness<8>(X, D, 10.0, e)(0, 0);
            },
            sink));
    report("stiffness<8> (Q8)", rates, per_run);

    const PlateModel q9 = make_plate_with_hole_at_scale(fe::ElementKind::Q9, m);
    const auto shapes9 = element_coords<9>(q9.model);
    rates.clear();
    for (int k = 0; k < runs; ++k)
        rates.push_back(throughput(
            shapes9, per_run,
            [&](const fe::NodeCoords<9>& X, int e) {
                return fe::stiffness<9>(X, D, 10.0, e)(0, 0);
            },
            sink));
    report("stiffness<9> (Q9)", rates, per_run);

    std::cout << fmt::format("# checksum {:.6e}\n", sink);
    return sink > 0 ? 0 : 1; // k(0,0) > 0 for every valid element
}

} // namespace
} // namespace lapwing::bench

int main(int argc, char** argv) {
    const std::string arg = argc > 1 ? argv[1] : "";
    if (argc > 2 || (argc == 2 && arg != "--smoke")) {
        std::cerr << "bench_fe_elements: usage: bench_fe_elements [--smoke]\n";
        return 2;
    }
    return lapwing::bench::run(arg == "--smoke");
}
