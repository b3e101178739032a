// SerialOpenMpScope: the calling thread's OpenMP setting is changed for the
// scope's lifetime only, and no other thread's (OpenMP 5.0 §2.4: the
// max-active-levels-var ICV belongs to the data environment of the task,
// here the thread's implicit task).
#include "fe/openmp_scope.hpp"

#include <dlfcn.h>
#include <doctest/doctest.h>
#include <thread>

using lapwing::fe::SerialOpenMpScope;

namespace {

using GetLevels = int (*)();

// The runtime's getter, looked up as the scope does (nullptr: no OpenMP).
GetLevels levels_getter() {
    return reinterpret_cast<GetLevels>(dlsym(RTLD_DEFAULT, "omp_get_max_active_levels"));
}

} // namespace

TEST_CASE("OpenMP scope: the thread's max-active-levels is 0 inside and restored after, "
          "other threads untouched") {
    const GetLevels get = levels_getter();
    if (!get) {
        CHECK_FALSE(SerialOpenMpScope::active());
        return;
    }
    const int before = get();
    int other_inside = -1;
    {
        const SerialOpenMpScope scope;
        if (SerialOpenMpScope::active())
            CHECK(get() == 0);
        else
            CHECK(get() == before);
        std::thread other([&] { other_inside = get(); });
        other.join();
        {
            const SerialOpenMpScope nested; // scopes nest: the inner one restores 0
        }
        if (SerialOpenMpScope::active()) CHECK(get() == 0);
    }
    CHECK(get() == before);
    CHECK(other_inside == before);
}
