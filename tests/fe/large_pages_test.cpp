// Huge-page advice for CHOLMOD's large arrays (fe/large_pages.hpp). What is
// checked is what the kernel records: a range given MADV_HUGEPAGE carries the
// "hg" flag in /proc/self/smaps (Linux, Documentation/filesystems/proc.rst,
// "VmFlags"). Where the kernel has no transparent huge pages the advice is
// refused, and the checks say so instead of passing silently.
#include "fe/large_pages.hpp"
#include "fe/sparse_cholesky.hpp"

#include <cstdint>
#include <cstdlib>
#include <doctest/doctest.h>
#include <fstream>
#include <sstream>
#include <string>

using namespace lapwing::fe;

namespace {

bool kernel_offers_huge_pages() {
    std::ifstream in("/sys/kernel/mm/transparent_hugepage/enabled");
    std::string mode;
    std::getline(in, mode);
    return in && mode.find("[never]") == std::string::npos;
}

// The VmFlags of the mapping holding address p ("" if none is found).
std::string vm_flags_at(const void* p) {
    const auto at = reinterpret_cast<std::uintptr_t>(p);
    std::ifstream smaps("/proc/self/smaps");
    std::string line;
    bool inside = false;
    while (std::getline(smaps, line)) {
        std::uintptr_t begin = 0, end = 0;
        char dash = 0;
        std::istringstream head(line);
        if (head >> std::hex >> begin >> dash >> end && dash == '-') {
            inside = begin <= at && at < end;
        } else if (inside && line.rfind("VmFlags:", 0) == 0) {
            return line.substr(8) + " ";
        }
    }
    return "";
}

} // namespace

TEST_CASE("a large block gets the huge-page advice over its whole 2 MiB pages") {
    constexpr std::size_t bytes = std::size_t{16} << 20;
    void* p = std::malloc(bytes);
    REQUIRE(p != nullptr);
    const bool advised = advise_large_pages(p, bytes);
    if (!kernel_offers_huge_pages()) {
        MESSAGE("no transparent huge pages on this kernel: the advice is not checked");
    } else {
        CHECK(advised);
        // 16 MiB holds at least seven whole 2 MiB pages; one in the middle
        // lies inside the advised range.
        const char* middle = static_cast<const char*>(p) + bytes / 2;
        CHECK(vm_flags_at(middle).find(" hg ") != std::string::npos);
    }
    std::free(p);
}

TEST_CASE("a block smaller than one aligned 2 MiB page is left alone") {
    constexpr std::size_t bytes = std::size_t{1} << 20;
    void* p = std::malloc(bytes);
    REQUIRE(p != nullptr);
    CHECK_FALSE(advise_large_pages(p, bytes));
    CHECK_FALSE(advise_large_pages(nullptr, std::size_t{64} << 20));
    std::free(p);
}

#ifdef LAPWING_HAVE_CHOLMOD
TEST_CASE("making a CHOLMOD solver routes SuiteSparse's allocations through the advice") {
    SolverOptions options;
    options.backend = SolverBackend::cholmod;
    const auto solver = make_sparse_cholesky(options);
    REQUIRE(solver != nullptr);
    CHECK(cholmod_uses_large_pages());
}
#endif
