// Transparent huge pages for CHOLMOD's large arrays.
//
// A factor of the convergence mesh is about 10⁸ bytes, and the check makes
// it several times over: the factorization fills it, a contact pass turns it
// into a simplicial LDLᵀ (a new array), the second contact chain copies it.
// Each new array is faulted in a 4 KiB page at a time; on a virtual machine
// a fault costs microseconds, and the demo check spent about a quarter of
// its CPU time in the kernel doing that (docs/benchmarks.md, seventh
// session). Asking the kernel for 2 MiB pages over the big arrays (Linux
// madvise MADV_HUGEPAGE; "transparent hugepage" mode madvise, the usual
// default) takes 512 times fewer faults and fewer TLB misses.
#pragma once

#include <cstddef>

namespace lapwing::fe {

// Allocations at least this large get the advice: smaller ones are served
// from the heap's pages, which are reused and rarely fault.
inline constexpr std::size_t large_page_threshold = std::size_t{4} << 20;

// Installs, once per process and before CHOLMOD allocates anything of
// lapwing's, allocation functions for SuiteSparse that pass large blocks
// through madvise(MADV_HUGEPAGE). The memory comes from and returns to the C
// library's malloc, so blocks allocated before the call are freed correctly.
// Safe to call from several threads; a no-op without CHOLMOD or off Linux.
void use_large_pages_for_cholmod();

// Whether SuiteSparse allocates through the functions above (false without
// CHOLMOD, or before the first CHOLMOD solver was made).
bool cholmod_uses_large_pages();

// Advises huge pages for the whole 2 MiB pages inside [p, p + bytes).
// Returns whether any such page was advised (false too where the kernel
// refuses: no transparent huge pages).
bool advise_large_pages(void* p, std::size_t bytes);

} // namespace lapwing::fe
