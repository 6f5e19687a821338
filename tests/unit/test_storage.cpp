// Storage family (STORE_*): reference values from outside the project, the
// source named beside each check. Property values are common-practice
// figures, quoted from memory where a book is named; the checks themselves
// are exact arithmetic on them.
#include "support.hpp"

#include "solarith/properties.hpp"

#include <cmath>
#include <cstdio>
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

// ---- liquid water stores ---------------------------------------------------------
// References generated by tests/reference/gen_correlations.py with python3-iapws
// (IAPWS-IF97 region 1) and SciPy; the worst error over each table is reported.

namespace {

std::string numbers(std::initializer_list<double> values)
{
    std::string out;
    char buffer[40];
    for (double v : values) {
        std::snprintf(buffer, sizeof buffer, "%.17g", v);
        out += (out.empty() ? "" : "; ") + std::string(buffer);
    }
    return out;
}

}  // namespace

TEST_CASE("STORE_WATER: V·ρ(T1)·(h(T2) − h(T1)), IAPWS-IF97")
{
    // python3-iapws IF97 region 1 enthalpy differences at the constant pressure
    // max(101325 Pa, p_sat(max(T1, T2))), mass at T1 (store_water.txt). Both
    // sides evaluate IF97: agreement to rounding.
    double worst = 0;
    for (const auto& row : test::read_table("store_water.txt")) {
        const std::string call = numbers({row[0], row[1], row[2]});
        CAPTURE(call);
        const double q = test::call("STORE_WATER", call);
        if (row[3] == 0) {
            CHECK(q == 0.0);
            continue;
        }
        worst = std::max(worst, std::fabs(q - row[3]) / std::fabs(row[3]));
        CHECK(q == test::rel(row[3], 1e-11));
    }
    MESSAGE("STORE_WATER vs python3-iapws: worst relative error " << worst);

    // Common practice: a 300 l tank heated 15 -> 60 °C takes about
    // V·1000·4186·45 = 56.5 MJ; the real water (ρ(15 °C) = 999.1 kg/m³,
    // mean cp about 4181 J/(kg·K)) needs 0.2 % less.
    CHECK(test::call("STORE_WATER", "0.3; 15; 60") == test::rel(0.3 * 1000 * 4186 * 45, 5e-3));
    CHECK(test::call("STORE_WATER", "0; 15; 60") == 0.0);
    CHECK(test::call("STORE_WATER", "0.3; 40; 40") == 0.0);
    // The volume is measured at T1: cooling 60 -> 15 releases the enthalpy
    // difference of the (smaller) mass filling 0.3 m³ at 60 °C.
    const double heating = test::call("STORE_WATER", "0.3; 15; 60");
    const double cooling = test::call("STORE_WATER", "0.3; 60; 15");
    CHECK(cooling < 0);
    CHECK(-cooling / heating
          == test::rel(solarith::water::density(60, 101325) / solarith::water::density(15, 101325), 1e-12));

    CHECK_REFUSED("STORE_WATER", "-1; 15; 60", "volume = -1 is outside the non-negative numbers");
    CHECK_REFUSED("STORE_WATER", "0.3; -1; 60", "T1 = -1 is outside 0..200");
    CHECK_REFUSED("STORE_WATER", "0.3; 15; 201", "T2 = 201 is outside 0..200");
}

TEST_CASE("STORE_TANK_VOLUME: inverse of STORE_WATER")
{
    // The rows of store_water.txt that cool (T1 > T2): the volume at T1 whose
    // cooling releases −Q is V.
    double worst = 0;
    for (const auto& row : test::read_table("store_water.txt")) {
        if (!(row[1] > row[2]))
            continue;
        const std::string call = numbers({-row[3], row[1], row[2]});
        CAPTURE(call);
        const double v = test::call("STORE_TANK_VOLUME", call);
        worst = std::max(worst, std::fabs(v - row[0]) / row[0]);
        CHECK(v == test::rel(row[0], 1e-11));
    }
    MESSAGE("STORE_TANK_VOLUME vs python3-iapws: worst relative error " << worst);
    // Round trip through STORE_WATER.
    const double v = test::call("STORE_TANK_VOLUME", "36e6; 60; 15");
    CHECK(test::call("STORE_WATER", numbers({v, 60, 15})) == test::rel(-36e6, 1e-14));
    CHECK(test::call("STORE_TANK_VOLUME", "0; 60; 15") == 0.0);

    CHECK_REFUSED("STORE_TANK_VOLUME", "-1; 60; 15", "energy = -1 is outside the non-negative numbers");
    CHECK_REFUSED("STORE_TANK_VOLUME", "36e6; 15; 60", "T_hot = 15 is outside the temperatures above T_cold = 60");
    CHECK_REFUSED("STORE_TANK_VOLUME", "36e6; 60; 60", "T_hot = 60 is outside the temperatures above T_cold = 60");
    CHECK_REFUSED("STORE_TANK_VOLUME", "36e6; 210; 15", "T_hot = 210 is outside 0..200");
    CHECK_REFUSED("STORE_TANK_VOLUME", "36e6; 60; -5", "T_cold = -5 is outside 0..200");
}

TEST_CASE("STORE_TANK_UA: resistances of wall and ends")
{
    // Hand-summed resistances with the conduction family's own functions
    // (Incropera et al., 6th ed., §3.1 and §3.3.1): D = 0.6 m, H = 1.5 m,
    // 0.1 m of insulation k = 0.04 W/(m·K), h = 10 W/(m²·K).
    //   side: ln(0.4/0.3)/(2π·0.04·1.5) + 1/(10·2π·0.4·1.5) = 0.763100 + 0.026526 K/W
    //   each end: 0.1/(0.04·π·0.09) + 1/(10·π·0.09) = 8.841941 + 0.353678 K/W
    //   UA = 1/0.789626 + 2/9.195619 = 1.266422 + 0.217495 = 1.483917 W/K.
    constexpr double pi = 3.14159265358979323846;
    const double end_area = pi * 0.3 * 0.3;
    const double side = test::call("COND_R_SHELL", "0.3; 0.4; 0.04; 1.5") + 1 / (10 * 2 * pi * 0.4 * 1.5);
    const double end = test::call("COND_R_WALL", numbers({0.1, 0.04, end_area})) + 1 / (10 * end_area);
    CHECK(test::call("STORE_TANK_UA", "0.6; 1.5; 0.1; 0.04; 10") == test::rel(1 / side + 2 / end, 1e-14));
    CHECK(test::call("STORE_TANK_UA", "0.6; 1.5; 0.1; 0.04") == test::rel(1.483917, 1e-6));  // default h = 10
    // No insulation: the outer films alone, UA = h·(π·D·H + 2·π·D²/4).
    CHECK(test::call("STORE_TANK_UA", "0.6; 1.5; 0; 0.04; 8")
          == test::rel(8 * (pi * 0.6 * 1.5 + 2 * pi * 0.09), 1e-14));
    // Thicker insulation loses less.
    CHECK(test::call("STORE_TANK_UA", "0.6; 1.5; 0.15; 0.04") < test::call("STORE_TANK_UA", "0.6; 1.5; 0.1; 0.04"));

    CHECK_REFUSED("STORE_TANK_UA", "0; 1.5; 0.1; 0.04", "diameter = 0 is outside the positive numbers");
    CHECK_REFUSED("STORE_TANK_UA", "0.6; 0; 0.1; 0.04", "height = 0 is outside the positive numbers");
    CHECK_REFUSED("STORE_TANK_UA", "0.6; 1.5; -0.1; 0.04", "insulation_thickness = -0.1 is outside the non-negative");
    CHECK_REFUSED("STORE_TANK_UA", "0.6; 1.5; 0.1; 0", "insulation_conductivity = 0 is outside the positive");
    CHECK_REFUSED("STORE_TANK_UA", "0.6; 1.5; 0.1; 0.04; 0", "h_outside = 0 is outside the positive numbers");
}

TEST_CASE("STORE_COOLDOWN: fully mixed tank")
{
    // SciPy DOP853 integration of m·cp(T)·dT/dt = −UA·(T − T_a) with IF97 cp
    // (store_cooldown.txt): worst absolute error in °C.
    double worst = 0;
    for (const auto& row : test::read_table("store_cooldown.txt")) {
        const std::string call = numbers({row[0], row[1], row[2], row[3], row[4]});
        CAPTURE(call);
        const double t = test::call("STORE_COOLDOWN", call);
        worst = std::max(worst, std::fabs(t - row[5]));
        CHECK(std::fabs(t - row[5]) <= 1e-8);
    }
    MESSAGE("STORE_COOLDOWN vs SciPy ODE with IF97 cp: worst absolute error " << worst << " K");

    // The analytic exponential with constant properties (Incropera et al., 6th
    // ed., §5.1 lumped capacitance): with ρ(60 °C) and cp at the mean
    // temperature of the path, T = 20 + 40·exp(−UA·t/(ρ·V·cp)); over this day
    // the variable cp moves the answer by about 2e-6 K (measured), checked to 1e-5 K.
    const double rho = solarith::water::density(60, 101325);
    const double t_end = test::call("STORE_COOLDOWN", "60; 20; 2; 0.3; 86400");
    const double cp_mean = solarith::water::cp(0.5 * (60 + t_end), 101325);
    const double exponential = 20 + 40 * std::exp(-2.0 * 86400 / (rho * 0.3 * cp_mean));
    CHECK(std::fabs(t_end - exponential) <= 1e-5);
    MESSAGE("STORE_COOLDOWN vs the constant-property exponential (cp at the mean): " << t_end - exponential << " K");

    // Limits: no loss, no time, already at ambient, a very long time.
    CHECK(test::call("STORE_COOLDOWN", "60; 20; 0; 0.3; 86400") == 60.0);
    CHECK(test::call("STORE_COOLDOWN", "60; 20; 2; 0.3; 0") == 60.0);
    CHECK(test::call("STORE_COOLDOWN", "20; 20; 2; 0.3; 86400") == 20.0);
    CHECK(test::call("STORE_COOLDOWN", "60; 20; 2; 0.3; 1e12") == doctest::Approx(20).epsilon(1e-15));
    const double near = test::call("STORE_COOLDOWN", "60; 20; 2; 0.3; 1.1e7");  // a few µK above ambient
    CHECK(near > 20);
    CHECK(near < 20.001);
    // Monotone in time and never past ambient.
    double previous = 90;
    for (double days : {0.5, 1.0, 2.0, 5.0, 10.0, 30.0, 100.0}) {
        const double t = test::call("STORE_COOLDOWN", numbers({90, 15, 3, 0.2, days * 86400}));
        CAPTURE(days);
        CHECK(t < previous);
        CHECK(t > 15);
        previous = t;
    }

    CHECK_REFUSED("STORE_COOLDOWN", "201; 20; 2; 0.3; 86400", "T_start = 201 is outside 0..200");
    CHECK_REFUSED("STORE_COOLDOWN", "-1; 20; 2; 0.3; 86400", "T_start = -1 is outside 0..200");
    CHECK_REFUSED("STORE_COOLDOWN", "60; 250; 2; 0.3; 86400", "T_ambient = 250 is outside -273.15..200");
    CHECK_REFUSED("STORE_COOLDOWN", "60; -300; 2; 0.3; 86400", "T_ambient = -300 is outside -273.15 °C");
    CHECK_REFUSED("STORE_COOLDOWN", "60; 20; -2; 0.3; 86400", "UA = -2 is outside the non-negative numbers");
    CHECK_REFUSED("STORE_COOLDOWN", "60; 20; 2; 0; 86400", "volume = 0 is outside the positive numbers");
    CHECK_REFUSED("STORE_COOLDOWN", "60; 20; 2; 0.3; -1", "time_s = -1 is outside the non-negative numbers");
    // Frost: a small tank in −20 °C air reaches 0 °C within a month.
    CHECK_REFUSED("STORE_COOLDOWN", "10; -20; 5; 0.05; 2.6e6", "reaches 0 °C (freezing)");
}
