// Relative comparisons for tests. doctest::Approx adds a scale of 1 to the
// tolerance by default, which makes it absolute for small numbers (3e-5 ±
// 0.01 would pass anything); `approx` is purely relative.
#pragma once

#include <doctest/doctest.h>

namespace lapwing::test {

inline doctest::Approx approx(double value, double relative = 1e-12) {
    return doctest::Approx(value).epsilon(relative).scale(0);
}

} // namespace lapwing::test
