// Radiation family (RAD_*): reference values from outside the project,
// the source named beside each check.
#include "support.hpp"

#include "solarith/constants.hpp"

TEST_CASE("RAD_EMISSIVE: Stefan–Boltzmann law")
{
    // sigma·T⁴ with sigma from CODATA 2018 (scipy.constants.Stefan_Boltzmann,
    // python3-scipy 1.10): 300 K -> 459.30033 W/m²; 1000 K -> 56703.74 W/m².
    CHECK(test::call("RAD_EMISSIVE", "26.85") == test::rel(459.30033, 1e-7));
    CHECK(test::call("RAD_EMISSIVE", "726.85; 1") == test::rel(56703.74419, 1e-9));
    // Grey body: proportional to emissivity (definition of a grey surface).
    CHECK(test::call("RAD_EMISSIVE", "726.85; 0.25") == test::rel(56703.74419 / 4, 1e-9));
    CHECK(test::call("RAD_EMISSIVE", "-273.15") == 0.0);

    CHECK_REFUSED("RAD_EMISSIVE", "-274", "T = -274 is outside -273.15 °C (absolute zero) and above");
    CHECK_REFUSED("RAD_EMISSIVE", "20; 1.2", "emissivity = 1.2 is outside 0..1");
    CHECK_REFUSED("RAD_EMISSIVE", "20; -0.1", "emissivity = -0.1 is outside 0..1");
    CHECK_REFUSED("RAD_EMISSIVE", "1e300", "not a finite number");
}
