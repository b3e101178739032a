// Unit conversion against the exact factors of NIST SP 811 (2008), appendix B:
// 1 in = 25.4 mm and 1 lbf = 4.448 221 615 260 5 N, both exact by definition.
#include "core/units.hpp"

#include <doctest/doctest.h>

using lapwing::internal_per_unit;
using lapwing::Quantity;
using lapwing::UnitSystem;

TEST_CASE("kip-in lengths and forces use the exact NIST SP 811 factors") {
    // Exact by definition: no tolerance beyond floating-point representation.
    CHECK(internal_per_unit(Quantity::length, UnitSystem::kip_in) == 25.4);
    // 1 kip = 1000 lbf = 4 448.221 615 260 5 N (NIST SP 811 B.8, exact).
    CHECK(internal_per_unit(Quantity::force, UnitSystem::kip_in) ==
          doctest::Approx(4448.2216152605).epsilon(1e-15));
    // The brief's rounded figure 1 kip = 4 448.221 615 N: within its last digit.
    CHECK(std::abs(internal_per_unit(Quantity::force, UnitSystem::kip_in) - 4448.221615) < 5e-7);
}

TEST_CASE("ksi, kip·in and kip/in match NIST SP 811's published conversions") {
    // NIST SP 811 B.8: 1 ksi = 6.894 757 MPa (7 significant figures, so ± 5e-7).
    CHECK(std::abs(internal_per_unit(Quantity::stress, UnitSystem::kip_in) - 6.894757) < 5e-7);
    // NIST SP 811 B.8: 1 lbf·in = 0.112 984 8 N·m, so 1 kip·in = 112 984.8 N·mm (± 0.05).
    CHECK(std::abs(internal_per_unit(Quantity::moment, UnitSystem::kip_in) - 112984.8) < 0.05);
    // NIST SP 811 B.8: 1 lbf/in = 175.126 8 N/m, so 1 kip/in = 175.126 8 N/mm (± 5e-5).
    CHECK(std::abs(internal_per_unit(Quantity::force_per_length, UnitSystem::kip_in) - 175.1268) <
          5e-5);
}

TEST_CASE("kN-mm scales forces by 1000 and keeps stresses in MPa") {
    // SI prefixes (exact): 1 kN = 1000 N; 1 kN·mm = 1000 N·mm; 1 kN/mm = 1000 N/mm.
    CHECK(internal_per_unit(Quantity::force, UnitSystem::kn_mm) == 1000.0);
    CHECK(internal_per_unit(Quantity::moment, UnitSystem::kn_mm) == 1000.0);
    CHECK(internal_per_unit(Quantity::force_per_length, UnitSystem::kn_mm) == 1000.0);
    CHECK(internal_per_unit(Quantity::length, UnitSystem::kn_mm) == 1.0);
    // Engineers read kN-mm stresses in MPa, not kN/mm² (= 1000 MPa).
    CHECK(internal_per_unit(Quantity::stress, UnitSystem::kn_mm) == 1.0);
    CHECK(internal_per_unit(Quantity::stress, UnitSystem::n_mm) == 1.0);
    CHECK(internal_per_unit(Quantity::none, UnitSystem::kip_in) == 1.0);
}

TEST_CASE("converting in and back out returns the value typed") {
    for (auto s : {UnitSystem::n_mm, UnitSystem::kn_mm, UnitSystem::kip_in}) {
        for (auto q : {Quantity::length, Quantity::force, Quantity::stress, Quantity::moment,
                       Quantity::force_per_length}) {
            CHECK(lapwing::from_internal(lapwing::to_internal(0.875, q, s), q, s) ==
                  doctest::Approx(0.875).epsilon(1e-15));
        }
    }
}

TEST_CASE("unit systems are chosen by their names, and labelled for output") {
    CHECK(lapwing::parse_unit_system("kip-in") == UnitSystem::kip_in);
    CHECK(lapwing::parse_unit_system("kN-mm") == UnitSystem::kn_mm);
    CHECK(lapwing::parse_unit_system("N-mm") == UnitSystem::n_mm);
    CHECK(!lapwing::parse_unit_system("kn-mm").has_value()); // names are exact
    CHECK(lapwing::unit_label(Quantity::stress, UnitSystem::kn_mm) == "MPa");
    CHECK(lapwing::unit_label(Quantity::stress, UnitSystem::kip_in) == "ksi");
    CHECK(lapwing::unit_label(Quantity::moment, UnitSystem::kip_in) == "kip·in");
}
