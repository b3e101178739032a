// CHOLMOD's own OpenMP loops (the row maps and the assembly of each
// supernode in cholmod_super_numeric) run on CHOLMOD_OMP_NUM_THREADS = 4
// threads, a constant fixed when the library was built (cholmod_core.h),
// whatever the machine. With fewer cores than that the team costs more than
// the loops gain: on the 2-core benchmark machine a 10⁶-dof factorization
// spent about a quarter more CPU time with it, in ~270,000 context switches
// (docs/benchmarks.md, "CHOLMOD's OpenMP team").
//
// A SerialOpenMpScope makes the OpenMP parallel regions the calling thread
// starts run on that thread alone (max-active-levels 0, an ICV of the
// calling thread's data environment: other threads are not touched), and
// restores the setting when it ends. It does nothing where no OpenMP
// runtime is loaded, where the machine has at least as many cores as
// CHOLMOD's team, or where the BLAS itself runs on OpenMP (its threads are
// the user's setting, not lapwing's).
#pragma once

namespace lapwing::fe {

class SerialOpenMpScope {
public:
    SerialOpenMpScope();
    ~SerialOpenMpScope();
    SerialOpenMpScope(const SerialOpenMpScope&) = delete;
    SerialOpenMpScope& operator=(const SerialOpenMpScope&) = delete;

    // Whether scopes change anything in this process (decided once).
    static bool active();

private:
    int saved_ = -1; // the thread's max-active-levels before, or −1: unchanged
};

} // namespace lapwing::fe
