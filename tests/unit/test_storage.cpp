// Storage family (STORE_*): reference values from outside the project, the
// source named beside each check. Property values are common-practice
// figures, quoted from memory where a book is named; the checks themselves
// are exact arithmetic on them.
#include "support.hpp"

#include <string>

TEST_CASE("STORE_SENSIBLE: m·cp·ΔT")
{
    // 200 kg of water (a 200 l tank) heated from 15 °C to 60 °C with
    // cp = 4186 J/(kg·K), the common-practice value for water around 20-60 °C:
    // Q = 200·4186·45 = 37.674 MJ (hand calculation).
    CHECK(test::call("STORE_SENSIBLE", "200; 4186; 15; 60") == test::rel(37.674e6, 1e-14));
    // Sign gives the direction: cooling releases the same heat.
    CHECK(test::call("STORE_SENSIBLE", "200; 4186; 60; 15") == test::rel(-37.674e6, 1e-14));
    // Additive over a path 15 -> 40 -> 60 (energy is a state function at constant cp).
    CHECK(test::call("STORE_SENSIBLE", "200; 4186; 15; 40") + test::call("STORE_SENSIBLE", "200; 4186; 40; 60")
          == test::rel(37.674e6, 1e-14));
    CHECK(test::call("STORE_SENSIBLE", "0; 4186; 15; 60") == 0.0);
    CHECK(test::call("STORE_SENSIBLE", "200; 4186; 60; 60") == 0.0);

    CHECK_REFUSED("STORE_SENSIBLE", "-1; 4186; 15; 60", "mass = -1 is outside the non-negative numbers");
    CHECK_REFUSED("STORE_SENSIBLE", "200; 0; 15; 60", "cp = 0 is outside the positive numbers");
    CHECK_REFUSED("STORE_SENSIBLE", "200; 4186; -300; 60", "T1 = -300 is outside -273.15 °C");
    CHECK_REFUSED("STORE_SENSIBLE", "200; 4186; 15; -300", "T2 = -300 is outside -273.15 °C");
}

TEST_CASE("STORE_LATENT: m·λ")
{
    // Melting 1 kg of ice, heat of fusion of water at 1 atm 333.7 kJ/kg
    // (Çengel & Boles, Thermodynamics, chapter 1/4 property value, from memory).
    CHECK(test::call("STORE_LATENT", "1; 333700") == 333700.0);
    // 50 kg of a paraffin with λ = 200 kJ/kg (typical of commercial paraffin
    // PCMs): 10 MJ (hand calculation).
    CHECK(test::call("STORE_LATENT", "50; 200000") == test::rel(1e7, 1e-15));
    CHECK(test::call("STORE_LATENT", "0; 200000") == 0.0);
    CHECK(test::call("STORE_LATENT", "50; 0") == 0.0);

    CHECK_REFUSED("STORE_LATENT", "-1; 200000", "mass = -1 is outside the non-negative numbers");
    CHECK_REFUSED("STORE_LATENT", "1; -5", "latent_heat = -5 is outside the non-negative numbers");
}

TEST_CASE("STORE_PCM: sensible + latent + sensible over T1 -> T2")
{
    // Ice at -10 °C to water at 20 °C, per kg: cp_ice = 2110, λ = 333700,
    // cp_water = 4180 J/(kg·K) (Çengel & Boles property values, from memory):
    // 21100 + 333700 + 83600 = 438400 J (hand calculation, Sharma et al. 2009 eq. 3).
    const std::string ice = "1; 2110; 4180; 0; 333700; ";
    CHECK(test::call("STORE_PCM", ice + "-10; 20") == test::rel(438400.0, 1e-15));
    CHECK(test::call("STORE_PCM", ice + "20; -10") == test::rel(-438400.0, 1e-15));
    // Paraffin: 10 kg, cp 2000 solid / 2200 liquid, melting at 50 °C,
    // λ = 200 kJ/kg, 20 -> 70 °C: 10·(2000·30 + 200000 + 2200·20) = 3.04 MJ.
    const std::string paraffin = "10; 2000; 2200; 50; 200000; ";
    CHECK(test::call("STORE_PCM", paraffin + "20; 70") == test::rel(3.04e6, 1e-15));
    // The same as the three single-phase functions added (Sharma et al. eq. 3 term by term).
    CHECK(test::call("STORE_PCM", paraffin + "20; 70")
          == test::rel(test::call("STORE_SENSIBLE", "10; 2000; 20; 50") + test::call("STORE_LATENT", "10; 200000")
                           + test::call("STORE_SENSIBLE", "10; 2200; 50; 70"),
                       1e-15));
    // Within one phase it is plain sensible heat with that phase's cp.
    CHECK(test::call("STORE_PCM", paraffin + "20; 45") == test::rel(test::call("STORE_SENSIBLE", "10; 2000; 20; 45"), 1e-15));
    CHECK(test::call("STORE_PCM", paraffin + "55; 70") == test::rel(test::call("STORE_SENSIBLE", "10; 2200; 55; 70"), 1e-15));
    CHECK(test::call("STORE_PCM", paraffin + "70; 55") == test::rel(test::call("STORE_SENSIBLE", "10; 2200; 70; 55"), 1e-15));
    // Equal cp and no latent heat: STORE_SENSIBLE.
    CHECK(test::call("STORE_PCM", "10; 2000; 2000; 50; 0; 20; 70") == test::rel(test::call("STORE_SENSIBLE", "10; 2000; 20; 70"), 1e-15));

    // Exactly at T_melt the material counts as solid (documented choice):
    CHECK(test::call("STORE_PCM", paraffin + "20; 50") == test::rel(10 * 2000 * 30.0, 1e-15));            // no λ
    CHECK(test::call("STORE_PCM", paraffin + "50; 70") == test::rel(10 * (200000 + 2200 * 20.0), 1e-15));  // λ
    CHECK(test::call("STORE_PCM", paraffin + "70; 50") == test::rel(-10 * (200000 + 2200 * 20.0), 1e-15)); // λ released
    CHECK(test::call("STORE_PCM", paraffin + "50; 20") == test::rel(-10 * 2000 * 30.0, 1e-15));
    CHECK(test::call("STORE_PCM", paraffin + "50; 50") == 0.0);
    // Additive along a path through T_melt: 20 -> 50 -> 70 equals 20 -> 70.
    CHECK(test::call("STORE_PCM", paraffin + "20; 50") + test::call("STORE_PCM", paraffin + "50; 70")
          == test::rel(3.04e6, 1e-15));

    // Exact antisymmetry Q(T1, T2) = −Q(T2, T1) over a grid including T_melt.
    const double temperatures[] = {-20, 0, 20, 49.999999, 50, 50.000001, 70, 120};
    for (double t1 : temperatures)
        for (double t2 : temperatures) {
            const std::string forward = paraffin + std::to_string(t1) + "; " + std::to_string(t2);
            const std::string backward = paraffin + std::to_string(t2) + "; " + std::to_string(t1);
            CAPTURE(forward);
            CHECK(test::call("STORE_PCM", forward) == -test::call("STORE_PCM", backward));
            // Heating stores heat, cooling releases it.
            if (t2 > t1)
                CHECK(test::call("STORE_PCM", forward) > 0);
        }

    CHECK_REFUSED("STORE_PCM", "-1; 2000; 2200; 50; 200000; 20; 70", "mass = -1 is outside the non-negative numbers");
    CHECK_REFUSED("STORE_PCM", "10; 0; 2200; 50; 200000; 20; 70", "cp_solid = 0 is outside the positive numbers");
    CHECK_REFUSED("STORE_PCM", "10; 2000; -1; 50; 200000; 20; 70", "cp_liquid = -1 is outside the positive numbers");
    CHECK_REFUSED("STORE_PCM", "10; 2000; 2200; -300; 200000; 20; 70", "T_melt = -300 is outside -273.15 °C");
    CHECK_REFUSED("STORE_PCM", "10; 2000; 2200; 50; -1; 20; 70", "latent_heat = -1 is outside the non-negative numbers");
    CHECK_REFUSED("STORE_PCM", "10; 2000; 2200; 50; 200000; -300; 70", "T1 = -300 is outside -273.15 °C");
    CHECK_REFUSED("STORE_PCM", "10; 2000; 2200; 50; 200000; 20; -300", "T2 = -300 is outside -273.15 °C");
}
