// The dense product a supernodal factorization lives on, C −= A Bᵀ, timed
// through the BLAS this process has loaded (dgemm_, found as CHOLMOD finds
// it) and through Eigen, at the panel sizes of the plate factors (a
// descendant's rows against a supernode's columns). Tells a user which of
// the two is faster on their machine and BLAS, which is what
// fe::DenseKernels::automatic decides by the BLAS's identity alone.
//   bench_fe_gemm [--repeats N]   (N runs of each size, median reported)
//   bench_fe_gemm --smoke         (one small size, checks the two agree)
#include "fe/supernodal_numeric.hpp"
#include "measure.hpp"

#include <Eigen/Core>
#include <algorithm>
#include <cstdio>
#include <cstdlib>
#include <dlfcn.h>
#include <stdexcept>
#include <string>
#include <vector>

namespace {

// The Fortran BLAS interface (reference BLAS, netlib): column-major,
// arguments by address.
using Dgemm = void (*)(const char* transa, const char* transb, const int* m, const int* n,
                       const int* k, const double* alpha, const double* a, const int* lda,
                       const double* b, const int* ldb, const double* beta, double* c,
                       const int* ldc);

struct Shape {
    int m, n, k; // C is m × n, A m × k, B n × k
};

double median_seconds(int repeats, const auto& run) {
    std::vector<double> t;
    for (int r = 0; r < repeats; ++r) {
        const lapwing::bench::Stopwatch watch;
        run();
        t.push_back(watch.seconds());
    }
    return lapwing::bench::median(t);
}

} // namespace

int main(int argc, char** argv) {
    int repeats = 5;
    bool smoke = false;
    for (int i = 1; i < argc; ++i) {
        const std::string arg = argv[i];
        if (arg == "--smoke")
            smoke = true;
        else if (arg == "--repeats" && i + 1 < argc)
            repeats = std::max(1, std::atoi(argv[++i]));
        else {
            std::fprintf(stderr,
                         "bench_fe_gemm: unknown argument %s (use [--repeats N] | "
                         "--smoke)\n",
                         arg.c_str());
            return 2;
        }
    }
    const auto dgemm = reinterpret_cast<Dgemm>(dlsym(RTLD_DEFAULT, "dgemm_"));
    const lapwing::fe::BlasInUse& blas = lapwing::fe::blas_in_use();
    std::printf("# BLAS in use: %s (%s)\n", blas.path.empty() ? "none found" : blas.path.c_str(),
                blas.reference ? "the reference BLAS" : "not the reference BLAS");
    if (!dgemm) {
        std::printf("# dgemm_ is not loaded: nothing to compare\n");
        return 0;
    }
    const std::vector<Shape> shapes =
        smoke ? std::vector<Shape>{{96, 24, 40}}
              : std::vector<Shape>{{64, 16, 32},     {256, 64, 64},    {512, 128, 128},
                                   {1024, 256, 256}, {2048, 512, 512}, {4096, 1024, 512}};
    std::printf("%8s %6s %6s %12s %12s %8s\n", "m", "n", "k", "BLAS GF/s", "Eigen GF/s",
                "Eigen/BLAS");
    int failures = 0;
    for (const Shape& s : shapes) {
        const Eigen::MatrixXd A = Eigen::MatrixXd::Random(s.m, s.k);
        const Eigen::MatrixXd B = Eigen::MatrixXd::Random(s.n, s.k);
        Eigen::MatrixXd c_blas = Eigen::MatrixXd::Zero(s.m, s.n), c_eigen = c_blas;
        // Enough products per timing that each lasts well over a millisecond.
        const double flops = 2.0 * s.m * s.n * s.k;
        const int times = smoke ? 1 : std::max(1, static_cast<int>(2e8 / flops));
        const double minus_one = -1, one = 1;
        const double t_blas = median_seconds(repeats, [&] {
            for (int r = 0; r < times; ++r)
                dgemm("N", "T", &s.m, &s.n, &s.k, &minus_one, A.data(), &s.m, B.data(), &s.n, &one,
                      c_blas.data(), &s.m);
        });
        const double t_eigen = median_seconds(repeats, [&] {
            for (int r = 0; r < times; ++r) c_eigen.noalias() -= A * B.transpose();
        });
        const double gf_blas = flops * times / t_blas * 1e-9;
        const double gf_eigen = flops * times / t_eigen * 1e-9;
        std::printf("%8d %6d %6d %12.2f %12.2f %8.2f\n", s.m, s.n, s.k, gf_blas, gf_eigen,
                    gf_eigen / gf_blas);
        // Both accumulated the same products the same number of times: they
        // agree to round-off (k terms a product, |entries| ≤ 1).
        const double scale = static_cast<double>(s.k) * times * repeats;
        if ((c_blas - c_eigen).cwiseAbs().maxCoeff() > 1e-12 * scale) ++failures;
    }
    if (failures) std::printf("# the BLAS and Eigen products differ beyond round-off\n");
    if (smoke) std::printf(failures ? "smoke: FAILED\n" : "smoke: ok\n");
    return failures ? 1 : 0;
}
