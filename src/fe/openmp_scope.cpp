#include "fe/openmp_scope.hpp"

#include <cstring>
#include <dlfcn.h>
#include <link.h>
#include <thread>

namespace lapwing::fe {

namespace {

// The team size CHOLMOD was built with (cholmod_core.h).
constexpr unsigned cholmod_team = 4;

using GetLevels = int (*)();
using SetLevels = void (*)(int);

struct Runtime {
    GetLevels get = nullptr;
    SetLevels set = nullptr;
};

// Debian installs the OpenMP builds of its BLAS under openblas-openmp/ and
// blis-openmp/; any loaded object with "openmp" in its path is taken as one.
bool openmp_blas_loaded() {
    bool found = false;
    dl_iterate_phdr(
        [](dl_phdr_info* info, size_t, void* out) {
            if (info->dlpi_name && std::strstr(info->dlpi_name, "openmp")) {
                *static_cast<bool*>(out) = true;
                return 1;
            }
            return 0;
        },
        &found);
    return found;
}

// The OpenMP runtime CHOLMOD brought in, looked up rather than linked: a
// CHOLMOD built without OpenMP leaves nothing to do.
Runtime find_runtime() {
    Runtime r;
    const unsigned cores = std::thread::hardware_concurrency();
    if (cores == 0 || cores >= cholmod_team || openmp_blas_loaded()) return r;
    r.get = reinterpret_cast<GetLevels>(dlsym(RTLD_DEFAULT, "omp_get_max_active_levels"));
    r.set = reinterpret_cast<SetLevels>(dlsym(RTLD_DEFAULT, "omp_set_max_active_levels"));
    if (!r.get || !r.set) r = {};
    return r;
}

const Runtime& runtime() {
    static const Runtime r = find_runtime();
    return r;
}

} // namespace

bool SerialOpenMpScope::active() {
    return runtime().set != nullptr;
}

SerialOpenMpScope::SerialOpenMpScope() {
    const Runtime& r = runtime();
    if (!r.set) return;
    saved_ = r.get();
    if (saved_ != 0) r.set(0);
}

SerialOpenMpScope::~SerialOpenMpScope() {
    if (saved_ > 0) runtime().set(saved_);
}

} // namespace lapwing::fe
