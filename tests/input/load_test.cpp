// Loading good templates: units converted at input, integers accepted where
// floats are expected, parameters in any order, --set overrides, hole sizes.
#include "input/load_connection.hpp"

#include <doctest/doctest.h>
#include <string>

using lapwing::input::load_connection;

namespace {

// A small valid template; `units` and `extra` vary per test.
std::string joint(const std::string& units, const std::string& numbers) {
    return "[units]\nsystem = \"" + units + "\"\n" + numbers + R"(
[plate]
thickness = "t"
outline = [{ x = 0, y = 0, edge = "weld" }, { x = "w", y = 0 }, { x = "w", y = "h" }, { x = 0, y = "h" }]

[[bolt_group]]
name = "bolts"
origin = ["w/2", "h/2"]
diameter = "d"

[[load_case]]
name = "dead"

[[member]]
name = "bar"
bolt_group = "bolts"
work_point = ["w", "h/2"]
angle = 0
forces.dead = { axial = "P", moment = "M" }

[allowables]
peak_von_mises = "0.9*Fy"
)";
}

const std::string metric_numbers = R"(
[parameters]
t = 10
w = 300
h = 120
d = 20
P = 100
M = 5000

[material]
E = 200000
Fy = 355
Fu = 490
)";

const std::string inch_numbers = R"(
[parameters]
t = 0.5
w = 12
h = 6
d = 0.75
P = 100
M = 50

[material]
E = 29000
Fy = 50
Fu = 65
)";

} // namespace

TEST_CASE("kip-in input is converted to N, mm and MPa with the NIST SP 811 factors") {
    const auto c = load_connection(joint("kip-in", inch_numbers), "j.toml");
    // 0.5 in × 25.4 mm/in = 12.7 mm exactly (NIST SP 811: 1 in = 25.4 mm).
    CHECK(c.plate.thickness == doctest::Approx(12.7).epsilon(1e-15));
    // 50 ksi × 6.894 757 MPa/ksi = 344.737 85 MPa (NIST SP 811, 7 figures).
    CHECK(c.material.Fy == doctest::Approx(344.73785).epsilon(1e-7));
    // 0.9 Fy evaluated in ksi, then converted: 45 ksi = 310.264 MPa.
    CHECK(c.allowables.peak_von_mises.value == doctest::Approx(45 * 6.894757).epsilon(1e-7));
    // 100 kip = 444 822.161 526 05 N (1 lbf = 4.448 221 615 260 5 N exactly).
    const auto& f = c.members.at(0).forces.at("dead");
    CHECK(f.axial == doctest::Approx(444822.16152605).epsilon(1e-14));
    // 50 kip·in = 50 × 4448.2216152605 N × 25.4 mm.
    CHECK(f.moment == doctest::Approx(50 * 4448.2216152605 * 25.4).epsilon(1e-14));
    // The work point and bolt centre are lengths too: (12 in, 3 in) = (304.8, 76.2) mm.
    CHECK(c.members.at(0).work_point.x == doctest::Approx(304.8).epsilon(1e-15));
    CHECK(c.bolt_groups.at(0).origin.y == doctest::Approx(76.2).epsilon(1e-15));
    // Parameters stay in the user's units.
    CHECK(c.parameters.at("t") == 0.5);
}

TEST_CASE("kN-mm forces are multiplied by 1000, stresses stay in MPa") {
    const auto c = load_connection(joint("kN-mm", metric_numbers), "j.toml");
    CHECK(c.members.at(0).forces.at("dead").axial == 100000.0);
    CHECK(c.members.at(0).forces.at("dead").moment == 5000000.0); // 5000 kN·mm
    CHECK(c.material.Fy == 355.0);
    CHECK(c.plate.thickness == 10.0);
}

TEST_CASE("an integer is accepted wherever a float is expected") {
    // The toml11 pitfall (TOOLCHAIN.md): `t = 10` is an integer in TOML.
    const auto a = load_connection(joint("N-mm", metric_numbers), "j.toml");
    std::string floats = metric_numbers;
    floats.replace(floats.find("t = 10"), 6, "t = 10.0");
    floats.replace(floats.find("E = 200000"), 10, "E = 200000.0");
    const auto b = load_connection(joint("N-mm", floats), "j.toml");
    CHECK(a.plate.thickness == b.plate.thickness);
    CHECK(a.material.E == b.material.E);
}

TEST_CASE("parameters may refer to each other in any order") {
    std::string numbers = metric_numbers;
    numbers.replace(numbers.find("t = 10"), 6, "t = \"w/30\"");   // uses w, defined below it
    numbers.replace(numbers.find("h = 120"), 7, "h = \"2*t*6\""); // uses t, itself an expression
    const auto c = load_connection(joint("N-mm", numbers), "j.toml");
    CHECK(c.parameters.at("t") == 10.0);
    CHECK(c.parameters.at("h") == 120.0);
    CHECK(c.plate.outline.at(2).at.y == 120.0);
}

TEST_CASE("--set overrides a parameter, a plain key and an entry of a list") {
    const auto c =
        load_connection(joint("N-mm", metric_numbers), "j.toml",
                        {"parameters.t=14", "bolt_group[0].rows=3", "bolt_group[0].pitch=60",
                         "job.title=Splice S4", "material.Fy=\"0.7*490\""});
    CHECK(c.plate.thickness == 14.0);
    CHECK(c.bolt_groups.at(0).rows == 3);
    CHECK(c.bolt_groups.at(0).pitch == 60.0);
    CHECK(c.job.title == "Splice S4"); // not TOML, so taken as plain text
    CHECK(c.material.Fy == doctest::Approx(343.0).epsilon(1e-15));
    // Spaces around '=' are allowed when the argument is quoted as one word.
    const auto spaced =
        load_connection(joint("N-mm", metric_numbers), "j.toml", {"parameters.t = 16"});
    CHECK(spaced.plate.thickness == 16.0);
}

TEST_CASE("holes follow the stated clearance rule unless given explicitly") {
    // Metric rule (common practice): standard d + 2 mm for d ≤ 24 mm, d + 3 mm above.
    const auto c = load_connection(joint("N-mm", metric_numbers), "j.toml");
    CHECK(c.bolt_groups.at(0).hole.width == 22.0);
    CHECK(!c.bolt_groups.at(0).hole.user_given);
    const auto explicit_hole = load_connection(joint("N-mm", metric_numbers), "j.toml",
                                               {"bolt_group[0].hole_diameter=21.5"});
    CHECK(explicit_hole.bolt_groups.at(0).hole.width == 21.5);
    CHECK(explicit_hole.bolt_groups.at(0).hole.user_given);
    // kip-in defaults to the inch rule: a 3/4 in bolt in a 13/16 in standard hole
    // (AISC 360-16 Table J3.3, from memory).
    const auto inch = load_connection(joint("kip-in", inch_numbers), "j.toml");
    CHECK(inch.bolt_groups.at(0).hole.width == doctest::Approx(13.0 / 16.0 * 25.4).epsilon(1e-14));
}

TEST_CASE("a member's moment is about its work point unless `about` is given") {
    const auto c = load_connection(joint("N-mm", metric_numbers), "j.toml");
    const auto& f = c.members.at(0).forces.at("dead");
    CHECK(f.moment_point == c.members.at(0).work_point);
    // The ply defaults to the plate: thickness and modulus.
    CHECK(c.members.at(0).ply_thickness == c.plate.thickness);
    CHECK(c.members.at(0).ply_modulus == c.material.E);
}

TEST_CASE("the summary shows values in the user's units") {
    const auto c = load_connection(joint("kip-in", inch_numbers), "j.toml");
    const std::string s = lapwing::input::summarize(c);
    CHECK(s.find("plate: thickness 0.5 in") != std::string::npos);
    CHECK(s.find("Fy = 50 ksi") != std::string::npos);
    CHECK(s.find("peak von Mises away from bolt holes: 0.9*Fy = 45 ksi") != std::string::npos);
    CHECK(s.find("dead: axial 100 kip, shear 0 kip, moment 50 kip·in") != std::string::npos);
}

TEST_CASE("edge loads, symmetry lines and welded members read and round-trip") {
    const std::string text = joint("kN-mm", metric_numbers) + R"(
[[member]]
name = "stiffener"
welded_edges = [2]
work_point = [150, 120]
angle = 90
forces.dead = { axial = -20 }

[[support]]
kind = "symmetry"
line = [[0, 0], [0, 120]]

[[edge_load]]
edge = "weld"
load_case = "dead"
total = [0, -12]

[[edge_load]]
edge = 1
load_case = "dead"
traction = [0.5, 0]
)";
    const auto c = load_connection(text, "j.toml");
    REQUIRE(c.members.size() == 2);
    CHECK(c.members[1].welded_edges == std::vector<int>{2});
    CHECK(c.members[1].forces.at("dead").axial == -20000.0); // kN → N
    REQUIRE(c.supports.size() == 1);
    CHECK(c.supports[0].kind == lapwing::model::SupportKind::symmetry);
    CHECK(c.supports[0].line_to == lapwing::model::Point{0.0, 120.0});
    REQUIRE(c.edge_loads.size() == 2);
    CHECK(c.edge_loads[0].edge == 0); // "weld" names segment 0
    CHECK(c.edge_loads[0].total);
    CHECK(c.edge_loads[0].fy == -12000.0); // 12 kN
    CHECK(c.edge_loads[1].fx == 500.0);    // 0.5 kN/mm = 500 N/mm
    const std::string summary = lapwing::input::summarize(c);
    const auto again = load_connection(lapwing::input::write_resolved(c), "resolved.toml");
    CHECK(lapwing::input::summarize(again) == summary);
}
