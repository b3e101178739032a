#include "fe/large_pages.hpp"

#include <cstdint>
#include <cstdlib>
#include <mutex>

#if defined(__linux__)
#include <sys/mman.h>
#endif

#ifdef LAPWING_HAVE_CHOLMOD
#include <SuiteSparse_config.h>
#endif

namespace lapwing::fe {

bool advise_large_pages(void* p, std::size_t bytes) {
#if defined(__linux__) && defined(MADV_HUGEPAGE)
    constexpr std::uintptr_t huge = std::uintptr_t{2} << 20;
    const auto begin = reinterpret_cast<std::uintptr_t>(p);
    const std::uintptr_t first = (begin + huge - 1) & ~(huge - 1);
    const std::uintptr_t last = (begin + bytes) & ~(huge - 1);
    if (p == nullptr || last <= first) return false;
    return madvise(reinterpret_cast<void*>(first), last - first, MADV_HUGEPAGE) == 0;
#else
    (void)p;
    (void)bytes;
    return false;
#endif
}

namespace {

void* advised(void* p, std::size_t bytes) {
    if (bytes >= large_page_threshold) advise_large_pages(p, bytes);
    return p;
}

// Large blocks come from glibc's mmap (above its threshold, 128 KiB to
// 32 MiB), so the advice covers pages of their own that nothing else
// shares; the advice goes before the first write, the write that faults.
void* large_malloc(std::size_t bytes) {
    return advised(std::malloc(bytes), bytes);
}

void* large_calloc(std::size_t count, std::size_t size) {
    // calloc's fresh mmap'd pages are zero without being touched; the
    // advice then applies to the first write.
    return advised(std::calloc(count, size), count * size);
}

void* large_realloc(void* p, std::size_t bytes) {
    return advised(std::realloc(p, bytes), bytes);
}

void large_free(void* p) {
    std::free(p);
}

} // namespace

void use_large_pages_for_cholmod() {
#ifdef LAPWING_HAVE_CHOLMOD
    static std::once_flag once;
    std::call_once(once, [] {
#if SUITESPARSE_MAIN_VERSION >= 7
        SuiteSparse_config_malloc_func_set(large_malloc);
        SuiteSparse_config_calloc_func_set(large_calloc);
        SuiteSparse_config_realloc_func_set(large_realloc);
        SuiteSparse_config_free_func_set(large_free);
#else
        SuiteSparse_config.malloc_func = large_malloc;
        SuiteSparse_config.calloc_func = large_calloc;
        SuiteSparse_config.realloc_func = large_realloc;
        SuiteSparse_config.free_func = large_free;
#endif
    });
#endif
}

bool cholmod_uses_large_pages() {
#ifdef LAPWING_HAVE_CHOLMOD
#if SUITESPARSE_MAIN_VERSION >= 7
    return SuiteSparse_config_malloc_func_get() == large_malloc;
#else
    return SuiteSparse_config.malloc_func == large_malloc;
#endif
#else
    return false;
#endif
}

} // namespace lapwing::fe
