// Physical constants against CODATA 2018 as python3-scipy 1.10
// (scipy.constants, Debian 12) prints them.
#include "support.hpp"

#include "solarith/constants.hpp"

#include <cmath>

using namespace solarith::constants;

TEST_CASE("constants agree with CODATA 2018")
{
    // Exact since the 2019 SI: scipy.constants.h, c, k.
    CHECK(planck == 6.62607015e-34);
    CHECK(speed_of_light == 299792458.0);
    CHECK(boltzmann == 1.380649e-23);
    // Printed to 10 digits by CODATA (scipy.constants.Stefan_Boltzmann,
    // physical_constants['first radiation constant'], ['second radiation
    // constant']); the core computes them from h, c and k, so they agree to
    // the printed digits (CODATA truncates: up to 1e-9 relative).
    CHECK(stefan_boltzmann == test::rel(5.670374419e-08, 1e-9));
    CHECK(first_radiation == test::rel(3.741771852e-16, 1e-9));
    CHECK(second_radiation == test::rel(0.01438776877, 1e-9));
    // scipy.constants.Wien, printed to 10 digits.
    CHECK(wien_displacement == test::rel(0.002897771955, 1e-15));
    // The Wien constant is h·c/(k·x) with x the root of x = 5·(1 − e^(−x))
    // (maximum of Planck's law); x = 4.965114231744276 (common practice).
    const double x = 4.965114231744276;
    CHECK(x == test::rel(5 * (1 - std::exp(-x)), 1e-15));
    CHECK(wien_displacement == test::rel(planck * speed_of_light / (boltzmann * x), 1e-9));
    CHECK(kelvin(-273.15) == 0.0);
}
