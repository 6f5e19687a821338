// Liquid water (WATER_*): the IAPWS releases' own verification values and a
// grid generated with Debian's python3-iapws (tests/reference/gen_properties.py).
//
// Release verification values are quoted from memory of the printed
// releases (each value as printed, 9 significant digits):
//   [IF97] IAPWS R7-97(2012), Tables 5 (region 1), 15 (region 2), 35 and 36 (region 4);
//   [V08]  IAPWS R12-08, Table 4 (viscosity, μ₂ = 1 at these states);
//   [K11]  IAPWS R15-11, Table 4 (thermal conductivity).
#include "support.hpp"

#include "solarith/properties.hpp"

#include <algorithm>
#include <cmath>
#include <cstdio>
#include <string>

namespace {

namespace f = solarith::water::formulation;

double relative_error(double value, double reference)
{
    return std::fabs(value / reference - 1);
}

std::string args(double t, double p)
{
    char buffer[80];
    std::snprintf(buffer, sizeof buffer, "%.17g; %.17g", t, p);
    return buffer;
}

std::string arg(double x)
{
    char buffer[40];
    std::snprintf(buffer, sizeof buffer, "%.17g", x);
    return buffer;
}

// Values as the release prints them: v in m³/kg, h and u in kJ/kg, s and cp
// in kJ/(kg·K), w in m/s.
struct Printed {
    double t, p_mpa, v, h, u, s, cp, w;
};

void check_state(const f::State& state, const Printed& printed)
{
    CAPTURE(printed.t);
    CAPTURE(printed.p_mpa);
    const double tol = 1e-8;  // 9 printed digits: half a unit in the last is at most 5e-9
    CHECK(state.v == test::rel(printed.v, tol));
    CHECK(state.h / 1e3 == test::rel(printed.h, tol));
    CHECK(state.u / 1e3 == test::rel(printed.u, tol));
    CHECK(state.s / 1e3 == test::rel(printed.s, tol));
    CHECK(state.cp / 1e3 == test::rel(printed.cp, tol));
    CHECK(state.w == test::rel(printed.w, tol));
}

}  // namespace

TEST_CASE("IAPWS-IF97 region 1: the release's verification values")
{
    // [IF97] Table 5 (from memory).
    check_state(f::region1(300, 3e6), {300, 3, 0.100215168e-2, 0.115331273e3, 0.112324818e3, 0.392294792,
                                       0.417301218e1, 0.150773921e4});
    check_state(f::region1(300, 80e6), {300, 80, 0.971180894e-3, 0.184142828e3, 0.106448356e3, 0.368563852,
                                        0.401008987e1, 0.163469054e4});
    check_state(f::region1(500, 3e6), {500, 3, 0.120241800e-2, 0.975542239e3, 0.971934985e3, 0.258041912e1,
                                       0.465580682e1, 0.124071337e4});
}

TEST_CASE("IAPWS-IF97 region 2 (vapour, for h'' of the latent heat): the release's verification values")
{
    // [IF97] Table 15 (from memory).
    check_state(f::region2(300, 0.0035e6), {300, 0.0035, 0.394913866e2, 0.254991145e4, 0.241169160e4,
                                            0.852238967e1, 0.191300162e1, 0.427920172e3});
    check_state(f::region2(700, 0.0035e6), {700, 0.0035, 0.923015898e2, 0.333568375e4, 0.301262819e4,
                                            0.101749996e2, 0.208141274e1, 0.644289068e3});
    check_state(f::region2(700, 30e6), {700, 30, 0.542946619e-2, 0.263149474e4, 0.246861076e4, 0.517540298e1,
                                        0.103505092e2, 0.480386523e3});
}

TEST_CASE("IAPWS-IF97 region 4: the release's verification values")
{
    // [IF97] Table 35: saturation pressure in MPa (from memory).
    CHECK(f::saturation_pressure(300) / 1e6 == test::rel(0.353658941e-2, 1e-8));
    CHECK(f::saturation_pressure(500) / 1e6 == test::rel(0.263889776e1, 1e-8));
    CHECK(f::saturation_pressure(600) / 1e6 == test::rel(0.123443146e2, 1e-8));
    // [IF97] Table 36: saturation temperature in K (from memory).
    CHECK(f::saturation_temperature(0.1e6) == test::rel(0.372755919e3, 1e-8));
    CHECK(f::saturation_temperature(1e6) == test::rel(0.453035632e3, 1e-8));
    CHECK(f::saturation_temperature(10e6) == test::rel(0.584149488e3, 1e-8));
}

TEST_CASE("IAPWS 2008 viscosity and IAPWS 2011 conductivity: the releases' check values")
{
    // [V08] Table 4, µPa·s, printed to 6 decimals (from memory). The
    // tolerance is the printed rounding (5e-7 µPa·s) relative to the smallest.
    const struct {
        double t, rho, mu;
    } viscosity[] = {
        {298.15, 998, 889.735100},  {298.15, 1200, 1437.649467}, {373.15, 1000, 307.883622},
        {433.15, 1, 14.538324},     {433.15, 1000, 217.685358},  {873.15, 1, 32.619287},
        {873.15, 100, 35.802262},   {873.15, 600, 77.430195},    {1173.15, 1, 44.217245},
        {1173.15, 100, 47.640433},  {1173.15, 400, 64.154608},
    };
    for (const auto& c : viscosity) {
        CAPTURE(c.t);
        CAPTURE(c.rho);
        CHECK(f::viscosity(c.t, c.rho) * 1e6 == test::rel(c.mu, 5e-8));
    }
    // [K11] Table 4, mW/(m·K), 9 digits (from memory); at these states the
    // critical enhancement is below the printed digits.
    CHECK(f::conductivity(298.15, 0) * 1e3 == test::rel(18.4341883, 1e-8));
    CHECK(f::conductivity(298.15, 998) * 1e3 == test::rel(607.712868, 1e-8));
    CHECK(f::conductivity(298.15, 1200) * 1e3 == test::rel(799.038144, 1e-8));
    CHECK(f::conductivity(873.15, 0) * 1e3 == test::rel(79.1034659, 1e-8));
}

TEST_CASE("WATER_* against python3-iapws over 0..200 °C and 101325 Pa..100 MPa")
{
    // tests/reference/water_liquid.txt: IF97 region 1, IAPWS 2008 viscosity and
    // IAPWS 2011 conductivity (without λ₂) at the IF97 density, python3-iapws 1.5.3.
    const auto rows = test::read_table("water_liquid.txt");
    double worst[5] = {};
    std::size_t default_rows = 0;
    for (const auto& r : rows) {
        const double t = r[0], p = r[1];
        CAPTURE(t);
        CAPTURE(p);
        const double values[5] = {test::call("WATER_DENSITY", args(t, p)), test::call("WATER_CP", args(t, p)),
                                  solarith::water::expansion(t, p), test::call("WATER_VISCOSITY", args(t, p)),
                                  test::call("WATER_CONDUCTIVITY", args(t, p))};
        for (int i = 0; i < 5; ++i) {
            const double e = relative_error(values[i], r[2 + i]);
            worst[i] = std::max(worst[i], e);
            CHECK(e < 1e-12);
        }
        CHECK(test::call("WATER_PRANDTL", args(t, p))
              == test::rel(r[5] * r[3] / r[6], 1e-12));
        // Rows at the default pressure: the pressure may be omitted.
        if (relative_error(p, solarith::water::default_pressure(t)) < 1e-12) {
            ++default_rows;
            CHECK(test::call("WATER_DENSITY", arg(t)) == test::rel(r[2], 1e-12));
            CHECK(test::call("WATER_VISCOSITY", arg(t) + ";") == test::rel(r[5], 1e-12));
        }
    }
    CHECK(default_rows > 40);
    MESSAGE("WATER_* vs python3-iapws, " << rows.size() << " states: worst relative error density " << worst[0]
                                         << ", cp " << worst[1] << ", expansion " << worst[2] << ", viscosity "
                                         << worst[3] << ", conductivity " << worst[4]);
}

TEST_CASE("WATER_CONDUCTIVITY: size of the critical enhancement left out, and IF97 vs IAPWS-95")
{
    // tests/reference/water_iapws95.txt: λ with the critical enhancement
    // (python3-iapws IAPWS97 class) and IAPWS-95 properties at the same states.
    const auto rows = test::read_table("water_iapws95.txt");
    double worst_lambda2 = 0, worst_rho = 0, worst_mu = 0;
    for (const auto& r : rows) {
        const double t = r[0], p = r[1];
        CAPTURE(t);
        CAPTURE(p);
        const double lambda = test::call("WATER_CONDUCTIVITY", args(t, p));
        worst_lambda2 = std::max(worst_lambda2, relative_error(lambda, r[2]));
        worst_rho = std::max(worst_rho, relative_error(test::call("WATER_DENSITY", args(t, p)), r[3]));
        worst_mu = std::max(worst_mu, relative_error(test::call("WATER_VISCOSITY", args(t, p)), r[4]));
        // The enhancement is zero up to 150 °C (properties.hpp).
        if (t <= 150)
            CHECK(lambda == test::rel(r[2], 1e-10));
    }
    // Bounds stated in properties.hpp and the catalogue's method text.
    CHECK(worst_lambda2 < 2.2e-3);
    CHECK(worst_rho < 1.8e-5);
    CHECK(worst_mu < 2.9e-5);
    MESSAGE("WATER_CONDUCTIVITY without λ₂ vs with it: worst " << worst_lambda2 << "; IF97 vs IAPWS-95: density "
                                                            << worst_rho << ", viscosity " << worst_mu);
}

TEST_CASE("WATER_SAT_PRESSURE, WATER_SAT_TEMP, WATER_LATENT_HEAT against python3-iapws")
{
    // tests/reference/water_saturation*.txt: IF97 regions 1, 2 and 4 from python3-iapws.
    double worst_p = 0, worst_r = 0, worst_t = 0;
    for (const auto& r : test::read_table("water_saturation.txt")) {
        CAPTURE(r[0]);
        const double p = test::call("WATER_SAT_PRESSURE", arg(r[0]));
        const double latent = test::call("WATER_LATENT_HEAT", arg(r[0]));
        worst_p = std::max(worst_p, relative_error(p, r[1]));
        worst_r = std::max(worst_r, relative_error(latent, r[2]));
        CHECK(p == test::rel(r[1], 1e-13));
        CHECK(latent == test::rel(r[2], 1e-12));
        // Round trip through the backward equation: IF97 eqs. 30 and 31 are
        // consistent to rounding ([IF97] §8.1), so the round trip returns T.
        CHECK(std::fabs(test::call("WATER_SAT_TEMP", arg(p)) - r[0]) < 1e-9);
    }
    for (const auto& r : test::read_table("water_saturation_temperature.txt")) {
        CAPTURE(r[0]);
        const double t = test::call("WATER_SAT_TEMP", arg(r[0]));
        worst_t = std::max(worst_t, std::fabs(t - r[1]));
        CHECK(std::fabs(t - r[1]) < 1e-10);
    }
    MESSAGE("saturation vs python3-iapws: worst relative error p_s " << worst_p << ", latent heat " << worst_r
                                                                      << "; worst |ΔT_s| " << worst_t << " K");
}

TEST_CASE("WATER_*: handbook values of common practice")
{
    // Water at 20 °C, 1 atm (common practice; the CRC Handbook's
    // concentrative-properties table quotes 1.002 mPa·s for pure water at
    // 20 °C; density 998.2 kg/m³, cp 4.18 kJ/(kg·K), λ 0.598 W/(m·K)),
    // tolerances half a unit of the last quoted digit.
    CHECK(test::call("WATER_DENSITY", "20") == test::rel(998.2, 1e-4));
    CHECK(test::call("WATER_VISCOSITY", "20") == test::rel(1.002e-3, 5e-4));
    CHECK(test::call("WATER_CP", "20") == test::rel(4180, 1.2e-3));
    CHECK(test::call("WATER_CONDUCTIVITY", "20") == test::rel(0.598, 1e-3));
    // Density maximum near 3.98 °C (common practice): expansion changes sign there.
    CHECK(solarith::water::expansion(3.9, 101325) < 0);
    CHECK(solarith::water::expansion(4.1, 101325) > 0);
    // Normal boiling point 99.97 °C on ITS-90 (common practice), latent heat
    // there 2257 kJ/kg (steam tables, common practice).
    CHECK(std::fabs(test::call("WATER_SAT_TEMP", "101325") - 99.974) < 5e-4);
    CHECK(test::call("WATER_LATENT_HEAT", "100") == test::rel(2256.5e3, 5e-4));
    // Prandtl number at 60 °C, about 2.99 (Incropera Table A.6 interpolated, from memory: 3.0 at 333 K ±2 %).
    CHECK(test::call("WATER_PRANDTL", "60") == test::rel(2.99, 0.02));
}

TEST_CASE("WATER_*: default pressure, and the pressure that keeps water liquid")
{
    namespace w = solarith::water;
    // Below 99.97 °C the default is 101325 Pa; above, the saturation pressure.
    CHECK(w::default_pressure(60) == 101325.0);
    CHECK(w::default_pressure(150) == test::call("WATER_SAT_PRESSURE", "150"));
    CHECK(test::call("WATER_DENSITY", "60") == test::call("WATER_DENSITY", "60; 101325"));
    CHECK(test::call("WATER_CP", "150") == test::call("WATER_CP", "150; " + arg(w::default_pressure(150))));
    // Pressure raises the density of the liquid.
    CHECK(test::call("WATER_DENSITY", "60; 500000") > test::call("WATER_DENSITY", "60"));
    // 100 MPa, the upper bound of region 1, is accepted; more is not.
    CHECK(test::call("WATER_DENSITY", "20; 1e8") > 1030);

    for (const char* name : {"WATER_DENSITY", "WATER_CP", "WATER_VISCOSITY", "WATER_CONDUCTIVITY", "WATER_PRANDTL"}) {
        CAPTURE(name);
        CHECK_REFUSED(name, "-0.5", "T = -0.5 is outside 0..200 °C");
        CHECK_REFUSED(name, "200.1", "T = 200.1 is outside 0..200 °C");
        // 150 °C at 1 atm is steam.
        CHECK_REFUSED(name, "150; 101325", "pressure = 101325 is outside 476");
        CHECK_REFUSED(name, "150; 101325", "(below it the water is steam)");
        CHECK_REFUSED(name, "20; 1.0001e8", "up to 100 MPa");
        // 1e-9 below the saturation pressure still counts as saturated liquid, 1e-8 does not.
        const double p_sat = solarith::water::saturation_pressure(150);
        CHECK(test::call(name, args(150, p_sat * (1 - 1e-10))) == test::rel(test::call(name, args(150, p_sat)), 1e-12));
        CHECK_REFUSED(name, args(150, p_sat * (1 - 1e-8)), "(below it the water is steam)");
        CHECK_REFUSED(name, "20; -5", "pressure = -5 is outside");
        CHECK_REFUSED(name, "20; 0", "pressure = 0 is outside");
    }
    CHECK_REFUSED("WATER_SAT_PRESSURE", "-1", "T = -1 is outside 0..200 °C");
    CHECK_REFUSED("WATER_SAT_PRESSURE", "201", "T = 201 is outside 0..200 °C");
    CHECK_REFUSED("WATER_LATENT_HEAT", "-1", "T = -1 is outside 0..200 °C");
    CHECK_REFUSED("WATER_LATENT_HEAT", "250", "T = 250 is outside 0..200 °C");
    CHECK_REFUSED("WATER_SAT_TEMP", "600", "pressure = 600 is outside 611.213..1.55467e+06 Pa");
    CHECK_REFUSED("WATER_SAT_TEMP", "2e6", "pressure = 2e+06 is outside");
    CHECK_REFUSED("WATER_SAT_TEMP", "0", "pressure = 0 is outside");
    // The ends of the range are accepted and give 0 and 200 °C.
    CHECK(std::fabs(test::call("WATER_SAT_TEMP", arg(w::saturation_pressure(0)))) < 1e-9);
    CHECK(test::call("WATER_SAT_TEMP", arg(w::saturation_pressure(200))) == test::rel(200, 1e-12));
}
