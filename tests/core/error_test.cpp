// Diagnostics print in the compiler-style form that editors can jump to.
#include "core/error.hpp"

#include <doctest/doctest.h>

using lapwing::Diagnostic;

TEST_CASE("a diagnostic prints file:line:column, the key, the source line and a caret") {
    Diagnostic d{"joint.toml", 12, 8, "plate.thickness", "= -4: must be > 0", "thickness = -4"};
    CHECK(d.format() ==
          "joint.toml:12:8: plate.thickness = -4: must be > 0\n    thickness = -4\n           ^");
}

TEST_CASE("an input error carries every diagnostic and joins them in its message") {
    lapwing::InputError e({{"a.toml", 1, 0, "x", "bad", ""}, {"a.toml", 2, 0, "y", "worse", ""}});
    CHECK(e.diagnostics().size() == 2);
    CHECK(std::string(e.what()) == "a.toml:1: x bad\na.toml:2: y worse");
}
