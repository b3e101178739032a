// Mesher benchmark: quadrilaterals per second on plates of about 10³ to 10⁶
// elements, and peak resident memory (getrusage). Run a few times and quote
// medians: `build/bench/tests/bench/mesh/mesh_bench [repeats] [small [Q4|Q8]]`
// (size 0.00 in the table is the small plate at its default element size;
// "small" runs only it, for profiling, and a kind after it only that kind).
#include "mesh/mesh.hpp"

#include <algorithm>
#include <chrono>
#include <cstdio>
#include <cstdlib>
#include <ctime>
#include <string_view>
#include <sys/resource.h>
#include <vector>

using namespace lapwing;

namespace {

// A 600 × 400 gusset-like plate: a fillet, a notch, a 3 × 4 bolt group of
// d 22 holes and a slot; the element size sets the element count.
geometry::PlateRegion plate() {
    geometry::PlateRegion r;
    r.outline = {{{0, 0}}, {{600, 0}}, {{600, 400}, 0, 60}, {{0, 400}, 30, 0}};
    for (int i = 0; i < 3; ++i)
        for (int j = 0; j < 4; ++j)
            r.holes.push_back(geometry::Hole::circle({300 + 70.0 * j, 120 + 70.0 * i}, 22));
    r.holes.push_back(geometry::Hole::slot({120, 300}, 60, 22, 30));
    r.cutouts = {{{{-10, -10}, {100, -10}, {100, 60}, {-10, 60}}}};
    return r;
}

// A 240 × 160 splice-like plate with two d 22 holes and a chamfer: about
// 10³ elements at the default settings' element size for it (16 mm).
geometry::PlateRegion small_plate() {
    geometry::PlateRegion r;
    r.outline = {{{0, 0}}, {{240, 0}}, {{240, 160}, 20, 0}, {{0, 160}}};
    r.holes = {geometry::Hole::circle({80, 80}, 22), geometry::Hole::circle({160, 80}, 22)};
    return r;
}

// CPU time of this process: on a shared machine whose other jobs stretch the
// wall clock, it stays close to the time an idle machine would take.
double cpu_seconds() {
    timespec t{};
    clock_gettime(CLOCK_PROCESS_CPUTIME_ID, &t);
    return static_cast<double>(t.tv_sec) + 1e-9 * static_cast<double>(t.tv_nsec);
}

double peak_rss_mb() {
    rusage u{};
    getrusage(RUSAGE_SELF, &u);
    return static_cast<double>(u.ru_maxrss) / 1024.0; // Linux: kilobytes
}

} // namespace

int main(int argc, char** argv) {
    const int repeats = argc > 1 ? std::atoi(argv[1]) : 3;
    std::printf("%10s %6s %12s %12s %14s %12s %16s %12s\n", "size_mm", "kind", "elements",
                "median_s", "quads_per_s", "median_cpu_s", "quads_per_cpu_s", "peak_rss_MB");
    // Only the small plate with a second argument "small" (for profiling).
    const bool only_small = argc > 2 && std::string_view(argv[2]) == "small";
    const std::string_view only_kind = only_small && argc > 3 ? argv[3] : "";
    for (double size : {0.0, 40.0, 12.0, 4.0, 1.2, 0.55}) {
        if (only_small && size > 0) break;
        for (auto kind : {fe::ElementKind::Q4, fe::ElementKind::Q8}) {
            if (!only_kind.empty() && fe::name(kind) != only_kind) continue;
            mesh::MeshSettings s;
            s.kind = kind;
            s.element_size = size; // 0: the small plate at its default size
            const geometry::PlateRegion region = size > 0 ? plate() : small_plate();
            std::vector<double> times, cpu;
            int n = 0;
            for (int k = 0; k < repeats; ++k) {
                const auto t0 = std::chrono::steady_clock::now();
                const double c0 = cpu_seconds();
                const mesh::Mesh m = mesh::build_mesh(region, s);
                cpu.push_back(cpu_seconds() - c0);
                const auto t1 = std::chrono::steady_clock::now();
                times.push_back(std::chrono::duration<double>(t1 - t0).count());
                n = m.n_elements();
            }
            std::sort(times.begin(), times.end());
            std::sort(cpu.begin(), cpu.end());
            const double median = times[times.size() / 2], median_cpu = cpu[cpu.size() / 2];
            std::printf("%10.2f %6s %12d %12.4f %14.0f %12.4f %16.0f %12.1f\n", size,
                        fe::name(kind).data(), n, median, n / median, median_cpu, n / median_cpu,
                        peak_rss_mb());
            std::fflush(stdout);
        }
    }
    return 0;
}
