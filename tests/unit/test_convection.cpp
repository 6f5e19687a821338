// Convection family (CONV_*): reference values from outside the project,
// the source named beside each check. Textbook examples are quoted from
// memory of the printed books, answers as printed (rounded); each tolerance
// is the rounding of the printed answer.
#include "support.hpp"

#include <cmath>
#include <cstdio>
#include <string>

namespace {
constexpr double pi = 3.14159265358979323846;

std::string number(double v)
{
    char buffer[40];
    std::snprintf(buffer, sizeof buffer, "%.17g", v);
    return buffer;
}
}  // namespace

TEST_CASE("CONV_HEAT: Newton's law of cooling")
{
    // Incropera et al., Fundamentals of Heat and Mass Transfer, 6th ed.,
    // Example 1.2 (from memory): uninsulated steam pipe, D = 70 mm, surface
    // 200 °C, room air 25 °C, h = 15 W/(m²·K): convection loss 577 W per metre
    // (of the 998 W/m total with radiation).
    CHECK(test::call("CONV_HEAT", "15; " + number(pi * 0.07) + "; 200; 25")
          == doctest::Approx(577).epsilon(0.5 / 577));
    // Çengel & Ghajar, Heat and Mass Transfer, chapter 1 example on measuring
    // h (from memory; number not recalled): wire 2 m long, 0.3 cm diameter,
    // 60 V × 1.5 A = 90 W, surface 152 °C in air at 15 °C -> h = 34.9 W/(m²·K).
    // Turned round: that h gives back the 90 W within the rounding of 34.9.
    CHECK(test::call("CONV_HEAT", "34.9; " + number(pi * 0.003 * 2) + "; 152; 15")
          == doctest::Approx(90).epsilon(0.05 / 34.9));
    // Sign: heat flows from the fluid into a colder surface.
    CHECK(test::call("CONV_HEAT", "10; 2; 20; 60") == -800.0);
    CHECK(test::call("CONV_HEAT", "10; 2; 60; 20") == 800.0);
    // Accepted zeros: no convection, no area.
    CHECK(test::call("CONV_HEAT", "0; 2; 60; 20") == 0.0);
    CHECK(test::call("CONV_HEAT", "10; 0; 60; 20") == 0.0);

    CHECK_REFUSED("CONV_HEAT", "-10; 2; 60; 20", "h = -10 is outside the non-negative numbers");
    CHECK_REFUSED("CONV_HEAT", "10; -2; 60; 20", "area = -2 is outside the non-negative numbers");
    CHECK_REFUSED("CONV_HEAT", "10; 2; -274; 20", "T_surface = -274 is outside -273.15 °C");
    CHECK_REFUSED("CONV_HEAT", "10; 2; 60; -274", "T_fluid = -274 is outside -273.15 °C");
    CHECK_REFUSED("CONV_HEAT", "1e300; 1e300; 60; 20", "not a finite number");
}
