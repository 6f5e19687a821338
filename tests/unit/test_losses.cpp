// Losses family (LOSS_PIPE): reference values from outside the project, the
// source named beside each check.
//   [Incropera] F.P. Incropera, D.P. DeWitt, T.L. Bergman, A.S. Lavine,
//               Fundamentals of Heat and Mass Transfer, 6th ed., Wiley, 2007
//               (example numbers and Table A.4 values from memory).
#include "support.hpp"

#include "solarith/losses.hpp"
#include "solarith/properties.hpp"

#include <algorithm>
#include <cmath>
#include <cstdio>
#include <string>

namespace {

constexpr double pi = 3.14159265358979323846;

std::string args(std::initializer_list<double> values)
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

TEST_CASE("LOSS_PIPE: against an independent solution with python3-iapws air")
{
    // gen_correlations.py solves the same balance with SciPy's brentq and the
    // real-gas air properties of Lemmon et al. (python3-iapws); Solarith's air
    // is an ideal gas with the same transport equations, which moves h by a
    // few tenths of a percent: tolerance 1 %.
    double worst = 0, worst_surface = 0;
    for (const auto& row : test::read_table("loss_pipe.txt")) {
        const std::string call = args({row[0], row[1], row[2], row[3], row[4], row[5], row[6]});
        CAPTURE(call);
        const double q = test::call("LOSS_PIPE", call);
        const auto balance = solarith::losses::pipe_balance(row[0], row[1], row[2], row[3], row[4], row[5], row[6]);
        worst = std::max(worst, std::fabs(q - row[8]) / std::fabs(row[8]));
        worst_surface = std::max(worst_surface, std::fabs(balance.surface_celsius - row[7]));
        CHECK(q == test::rel(row[8], 1e-2));
        CHECK(balance.surface_celsius == doctest::Approx(row[7]).epsilon(0.05).scale(1));
    }
    MESSAGE("LOSS_PIPE vs SciPy + python3-iapws air: worst relative error " << worst
            << ", worst surface temperature difference " << worst_surface << " K");
}

TEST_CASE("LOSS_PIPE: bare pipe of Incropera's Example 9.3")
{
    // [Incropera] Example 9.3 (inputs from memory): horizontal steam pipe,
    // D = 0.1 m, surface 165 °C, emissivity 0.85, room air and walls at 23 °C.
    // Hand-worked with Table A.4 at the film temperature 367 K (ν = 22.79e-6,
    // k = 31.29e-3, α = 32.76e-6, Pr = 0.6966, β = 1/367 K): Ra = 5.080e6,
    // Nu = 23.10 (Churchill–Chu), h = 7.228 W/(m²·K),
    // q' = 7.228·π·0.1·142 + 0.85·π·0.1·5.67e-8·(438⁴ − 296⁴) = 322.4 + 441.0 = 763.5 W/m
    // (the printed total, as recalled, is 763 W/m). A bare pipe is LOSS_PIPE
    // with insulation 0, the surface at the fluid temperature. Tolerance 1 %:
    // Table A.4 vs Solarith's air (Ra 3 % apart, Nu 0.7 %), 438 K vs 438.15 K.
    CHECK(test::call("LOSS_PIPE", "165; 23; 0.1; 0; 0.05; 0.85") == test::rel(763.5, 0.01));
    const auto bare = solarith::losses::pipe_balance(165, 23, 0.1, 0, 0.05, 0.85, 0);
    CHECK(bare.surface_celsius == 165.0);
    CHECK(bare.h_convection == test::rel(7.228, 0.01));
    CHECK(bare.radiation == test::rel(441.0, 0.005));
}

TEST_CASE("LOSS_PIPE: the solved surface closes the energy balance")
{
    // At the solved surface temperature the heat conducted through the
    // insulation equals convection plus radiation, each term recomputed with
    // other Solarith functions: COND_SHELL (Fourier, cylindrical shell),
    // RAD_EXCHANGE_ENCLOSED with area ratio 0 (grey body in a large room),
    // DIM_RAYLEIGH + NU_FREE_CYLINDER (+ NU_CYLINDER_CROSS with wind) and CONV_HEAT.
    double worst = 0;
    struct Case {
        double t_fluid, t_ambient, diameter, thickness, k, emissivity, wind;
    };
    for (const Case& c : {Case{60, 20, 0.022, 0.02, 0.04, 0.9, 0}, Case{90, -10, 0.054, 0.03, 0.035, 0.2, 8},
                          Case{5, 30, 0.028, 0.013, 0.036, 0.9, 0}, Case{400, 20, 0.3, 0.1, 0.07, 0.9, 10},
                          Case{150, 10, 0.1, 0.001, 0.2, 0.0, 2}}) {
        CAPTURE(c.t_fluid);
        CAPTURE(c.wind);
        const auto b = solarith::losses::pipe_balance(c.t_fluid, c.t_ambient, c.diameter, c.thickness, c.k,
                                                      c.emissivity, c.wind);
        const double r_inner = c.diameter / 2, r_outer = r_inner + c.thickness, d_outer = 2 * r_outer;
        const double ts = b.surface_celsius;
        const double conduction = test::call("COND_SHELL", args({c.k, 1, r_inner, r_outer, c.t_fluid, ts}));
        const double radiation = test::call("RAD_EXCHANGE_ENCLOSED", args({ts, c.t_ambient, c.emissivity, 1, 0})) * pi * d_outer;
        const double film = 0.5 * (ts + c.t_ambient);
        const double pr = solarith::air::prandtl(film);
        double nu = test::call("NU_FREE_CYLINDER", args({test::call("DIM_RAYLEIGH", args({ts, c.t_ambient, d_outer}) + "; \"air\""), pr}));
        if (c.wind > 0) {
            const double viscosity = solarith::air::viscosity(film) / solarith::air::density(film, 101325);
            const double forced = test::call("NU_CYLINDER_CROSS", args({test::call("DIM_REYNOLDS", args({c.wind, d_outer, viscosity})), pr}));
            nu = std::cbrt(nu * nu * nu + forced * forced * forced);  // Churchill 1977, n = 3
        }
        const double h = nu * solarith::air::conductivity(film) / d_outer;
        const double convection = test::call("CONV_HEAT", args({h, pi * d_outer, ts, c.t_ambient}));

        CHECK(b.conduction == test::rel(conduction, 1e-12));
        CHECK(b.radiation == doctest::Approx(radiation).epsilon(1e-12));  // scale 1: emissivity 0 gives 0
        CHECK(b.convection == test::rel(convection, 1e-10));
        const double imbalance = std::fabs(conduction - convection - radiation) / std::fabs(conduction);
        worst = std::max(worst, imbalance);
        CHECK(imbalance < 1e-9);
        CHECK(test::call("LOSS_PIPE", args({c.t_fluid, c.t_ambient, c.diameter, c.thickness, c.k, c.emissivity, c.wind}))
              == b.conduction);
    }
    MESSAGE("LOSS_PIPE energy balance: worst relative imbalance " << worst);
}

TEST_CASE("LOSS_PIPE: converges over the whole valid range")
{
    // The residual changes sign between T_ambient and T_fluid for every valid
    // input (losses.hpp), so TOMS 748 must always return; a grid over the
    // range, with the balance closing at each solution.
    int solved = 0;
    double worst = 0;
    for (double t_fluid : {-50.0, -10.0, 0.0, 20.0, 20.001, 60.0, 150.0, 300.0, 500.0})
        for (double t_ambient : {-50.0, 0.0, 20.0, 45.0})
            for (double diameter : {0.006, 0.05, 0.5})
                for (double thickness : {0.0, 0.001, 0.05, 0.3})
                    for (double k : {0.02, 1.0, 50.0})
                        for (double emissivity : {0.0, 0.9})
                            for (double wind : {0.0, 5.0}) {
                                const std::string call =
                                    args({t_fluid, t_ambient, diameter, thickness, k, emissivity, wind});
                                CAPTURE(call);
                                const auto b = solarith::losses::pipe_balance(t_fluid, t_ambient, diameter,
                                                                              thickness, k, emissivity, wind);
                                ++solved;
                                const double low = std::min(t_fluid, t_ambient), high = std::max(t_fluid, t_ambient);
                                CHECK(b.surface_celsius >= low);
                                CHECK(b.surface_celsius <= high);
                                if (t_fluid == t_ambient)
                                    continue;
                                const double imbalance = std::fabs(b.conduction - b.convection - b.radiation)
                                                         / std::fabs(b.conduction);
                                worst = std::max(worst, imbalance);
                                CHECK(imbalance < 1e-12);
                                // Heat flows from the warmer side.
                                CHECK((b.conduction > 0) == (t_fluid > t_ambient));
                            }
    MESSAGE("LOSS_PIPE: " << solved << " cases solved, worst relative imbalance " << worst);
}

TEST_CASE("LOSS_PIPE: physical behaviour and refusals")
{
    // No temperature difference, no loss; a cold pipe gains heat.
    CHECK(test::call("LOSS_PIPE", "20; 20; 0.022; 0.02; 0.04") == 0.0);
    CHECK(test::call("LOSS_PIPE", "5; 30; 0.028; 0.013; 0.036") < 0);
    // Thicker insulation loses less, a better insulator loses less, wind takes more.
    CHECK(test::call("LOSS_PIPE", "60; 20; 0.022; 0.04; 0.04") < test::call("LOSS_PIPE", "60; 20; 0.022; 0.02; 0.04"));
    CHECK(test::call("LOSS_PIPE", "60; 20; 0.022; 0.02; 0.03") < test::call("LOSS_PIPE", "60; 20; 0.022; 0.02; 0.04"));
    CHECK(test::call("LOSS_PIPE", "60; 20; 0.022; 0.02; 0.04; 0.9; 5")
          > test::call("LOSS_PIPE", "60; 20; 0.022; 0.02; 0.04; 0.9; 0"));
    // Critical radius (Incropera §3.3.1, Example 3.5): a thin wire with a poor
    // insulator (k = 0.2 W/(m·K), r_cr = k/h of order 0.02 m with h about
    // 10 W/(m²·K)) loses MORE with a thin insulation than bare.
    CHECK(test::call("LOSS_PIPE", "80; 20; 0.004; 0.003; 0.2") > test::call("LOSS_PIPE", "80; 20; 0.004; 0; 0.2"));
    // Emissivity 0: convection only.
    const auto no_radiation = solarith::losses::pipe_balance(60, 20, 0.022, 0.02, 0.04, 0.0, 0);
    CHECK(no_radiation.radiation == 0.0);

    CHECK_REFUSED("LOSS_PIPE", "600; 20; 0.022; 0.02; 0.04", "T_fluid = 600 is outside -50..500");
    CHECK_REFUSED("LOSS_PIPE", "60; -60; 0.022; 0.02; 0.04", "T_ambient = -60 is outside -50..500");
    CHECK_REFUSED("LOSS_PIPE", "60; 20; 0; 0.02; 0.04", "pipe_outer_diameter = 0 is outside the positive numbers");
    CHECK_REFUSED("LOSS_PIPE", "60; 20; 0.022; -0.01; 0.04", "insulation_thickness = -0.01 is outside the non-negative");
    CHECK_REFUSED("LOSS_PIPE", "60; 20; 0.022; 0.02; 0", "insulation_conductivity = 0 is outside the positive");
    CHECK_REFUSED("LOSS_PIPE", "60; 20; 0.022; 0.02; 0.04; 1.1", "emissivity = 1.1 is outside 0..1");
    CHECK_REFUSED("LOSS_PIPE", "60; 20; 0.022; 0.02; 0.04; 0.9; -1", "wind_speed = -1 is outside the non-negative");
    // A breath of wind below Churchill–Bernstein's Re·Pr >= 0.2.
    CHECK_REFUSED("LOSS_PIPE", "60; 20; 0.022; 0.02; 0.04; 0.9; 1e-5", "Re·Pr >= 0.2");
    CHECK_REFUSED("LOSS_PIPE", "60; 20; 0.022; 0.02; 0.04; 0.9; 1e4", "Re <= 1e7");
    // A huge hot cylinder beyond Ra = 1e12.
    CHECK_REFUSED("LOSS_PIPE", "500; -50; 100; 0; 0.04", "exceeds 1e12");
}
