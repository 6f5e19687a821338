// Glycol–water mixtures (GLYCOL_*) and the fluid property sets of fluids::at.
//
// The mixture model (Conde's brine correlations, coefficients from memory,
// scaled to IAPWS water) is checked against: the water limit at fraction 0
// (exact by construction, and the model's own deviation from water measured);
// ASHRAE density data for ethylene glycol as reproduced in a design manual;
// handbook values of common practice quoted from memory; and physical
// consistency (trends, expansion = −(1/ρ)·dρ/dT).
#include "support.hpp"

#include "solarith/constants.hpp"
#include "solarith/properties.hpp"

#include <algorithm>
#include <cmath>
#include <cstdio>
#include <string>

namespace {

double relative_error(double value, double reference)
{
    return std::fabs(value / reference - 1);
}

std::string arg(double x)
{
    char buffer[40];
    std::snprintf(buffer, sizeof buffer, "%.17g", x);
    return buffer;
}

std::string glycol_args(double t, double fraction, const char* type)
{
    return arg(t) + "; " + arg(fraction) + "; \"" + type + "\"";
}

const char* const property_names[] = {"DENSITY", "CP", "VISCOSITY", "CONDUCTIVITY"};

}  // namespace

TEST_CASE("GLYCOL_*: fraction 0 is water at 101325 Pa, exactly")
{
    // Required by the design (functions.md): the scaling makes it exact.
    for (const char* type : {"propylene", "ethylene"})
        for (double t = 0; t <= 40; t += 0.5)
            for (const char* property : property_names) {
                CAPTURE(type);
                CAPTURE(t);
                CAPTURE(property);
                CHECK(test::call(std::string("GLYCOL_") + property, glycol_args(t, 0, type))
                      == test::call(std::string("WATER_") + property, arg(t) + "; 101325"));
            }
    // And the mixture approaches water continuously.
    for (const char* property : property_names) {
        const std::string name = std::string("GLYCOL_") + property;
        CHECK(test::call(name, glycol_args(20, 1e-9, "ethylene"))
              == test::rel(test::call(name, glycol_args(20, 0, "ethylene")), 1e-8));
    }
}

TEST_CASE("GLYCOL_DENSITY: ASHRAE ethylene glycol densities")
{
    // ASHRAE Handbook—Fundamentals (I-P), ch. 31, density of ethylene glycol
    // solutions by volume, as reproduced in a pipe maker's design manual
    // (Viega, "Density of ethylene glycol solutions", Table 5-16, ©ASHRAE
    // Fundamentals), lb/ft³ → kg/m³ with 16.01846. Volume % → mass %:
    // 30 vol % ≈ 32.4 mass %, 50 vol % ≈ 52.4 mass %, interpolated in the
    // mass/volume pairs of ASHRAE 2009 ch. 31 Table 4 (from memory).
    // The tolerance, 1 %, covers the model's stated accuracy and the
    // conversion.
    const struct {
        double t_f, fraction, lb_ft3;
    } rows[] = {
        {40, 0.324, 65.66}, {40, 0.524, 67.47}, {70, 0.324, 65.30},
        {70, 0.524, 67.05}, {100, 0.324, 64.86}, {100, 0.524, 66.55},
    };
    double worst = 0;
    for (const auto& r : rows) {
        const double t = (r.t_f - 32) / 1.8;
        CAPTURE(r.t_f);
        CAPTURE(r.fraction);
        const double rho = test::call("GLYCOL_DENSITY", glycol_args(t, r.fraction, "ethylene"));
        worst = std::max(worst, relative_error(rho, r.lb_ft3 * 16.01846));
        CHECK(rho == test::rel(r.lb_ft3 * 16.01846, 1e-2));
    }
    // The 0 % column is water: 62.42 lb/ft³ at 40 °F, 62.31 at 70 °F, 62.00 at 100 °F.
    CHECK(test::call("WATER_DENSITY", arg((70 - 32) / 1.8)) == test::rel(62.31 * 16.01846, 1e-3));
    MESSAGE("GLYCOL_DENSITY (ethylene) vs ASHRAE densities: worst relative difference " << worst);
}

TEST_CASE("GLYCOL_*: handbook values of common practice at 20 °C")
{
    // From memory, approximate values of common practice for 50 % by mass at
    // 20 °C (Dow/ASHRAE tables): propylene glycol ρ ≈ 1040 kg/m³,
    // cp ≈ 3.6 kJ/(kg·K), μ ≈ 6 mPa·s, λ ≈ 0.37 W/(m·K); ethylene glycol
    // cp ≈ 3.3 kJ/(kg·K), μ ≈ 4 mPa·s, λ ≈ 0.39 W/(m·K). Tolerances reflect
    // how well they are remembered, not the model.
    CHECK(test::call("GLYCOL_DENSITY", glycol_args(20, 0.5, "propylene")) == test::rel(1040, 0.01));
    CHECK(test::call("GLYCOL_CP", glycol_args(20, 0.5, "propylene")) == test::rel(3600, 0.03));
    CHECK(test::call("GLYCOL_VISCOSITY", glycol_args(20, 0.5, "propylene")) == test::rel(6e-3, 0.1));
    CHECK(test::call("GLYCOL_CONDUCTIVITY", glycol_args(20, 0.5, "propylene")) == test::rel(0.37, 0.05));
    CHECK(test::call("GLYCOL_CP", glycol_args(20, 0.5, "ethylene")) == test::rel(3300, 0.03));
    CHECK(test::call("GLYCOL_VISCOSITY", glycol_args(20, 0.5, "ethylene")) == test::rel(4e-3, 0.1));
    CHECK(test::call("GLYCOL_CONDUCTIVITY", glycol_args(20, 0.5, "ethylene")) == test::rel(0.39, 0.05));
}

TEST_CASE("GLYCOL_*: glycol raises density and viscosity, lowers cp and conductivity")
{
    for (const char* type : {"propylene", "ethylene"})
        for (double t : {-10.0, 0.0, 20.0, 40.0}) {
            CAPTURE(type);
            CAPTURE(t);
            double previous[4] = {};
            bool first = true;
            for (double x = t < -7 ? 0.3 : 0.2; x <= 0.6001; x += 0.05) {
                const double values[4] = {test::call("GLYCOL_DENSITY", glycol_args(t, x, type)),
                                          test::call("GLYCOL_CP", glycol_args(t, x, type)),
                                          test::call("GLYCOL_VISCOSITY", glycol_args(t, x, type)),
                                          test::call("GLYCOL_CONDUCTIVITY", glycol_args(t, x, type))};
                if (!first) {
                    CHECK(values[0] > previous[0]);
                    CHECK(values[1] < previous[1]);
                    CHECK(values[2] > previous[2]);
                    CHECK(values[3] < previous[3]);
                }
                std::copy(values, values + 4, previous);
                first = false;
            }
        }
    // Viscosity falls with temperature (30 % propylene glycol, -10..40 °C).
    double previous = 1;
    for (double t = -10; t <= 40; t += 5) {
        const double mu = test::call("GLYCOL_VISCOSITY", glycol_args(t, 0.3, "propylene"));
        CHECK(mu < previous);
        previous = mu;
    }
}

TEST_CASE("GLYCOL_*: continuous across 0 °C, where the scaling to water stops")
{
    for (const char* type : {"propylene", "ethylene"})
        for (const char* property : property_names) {
            CAPTURE(type);
            CAPTURE(property);
            const std::string name = std::string("GLYCOL_") + property;
            const double below = test::call(name, glycol_args(-1e-9, 0.3, type));
            const double at = test::call(name, glycol_args(0, 0.3, type));
            CHECK(below == test::rel(at, 1e-8));
        }
}

TEST_CASE("GLYCOL_FREEZE_POINT: ASHRAE freezing points")
{
    // ASHRAE Handbook—Fundamentals (SI) 2009, ch. 31, Table 9 (propylene
    // glycol, 5 % rows) and Table 4 (ethylene glycol, 10 % rows), mass %,
    // from memory: the nodes of the interpolation are reproduced exactly.
    const double propylene[][2] = {{0, 0},        {0.05, -1.6},  {0.1, -3.3},  {0.15, -5.1},  {0.2, -7.1},
                                   {0.25, -9.6},  {0.3, -12.7},  {0.35, -16.4}, {0.4, -21.1}, {0.45, -26.7},
                                   {0.5, -33.5},  {0.55, -41.1}, {0.6, -51.1}};
    const double ethylene[][2] = {{0, 0}, {0.1, -3.2}, {0.2, -7.8}, {0.3, -14.1}, {0.4, -22.3}, {0.5, -33.8}, {0.6, -48.3}};
    for (const auto& n : propylene)
        CHECK(test::call("GLYCOL_FREEZE_POINT", arg(n[0])) == doctest::Approx(n[1]).epsilon(1e-12));
    for (const auto& n : ethylene)
        CHECK(test::call("GLYCOL_FREEZE_POINT", arg(n[0]) + "; \"ethylene\"") == doctest::Approx(n[1]).epsilon(1e-12));
    // An independent table: Lange's Handbook of Chemistry, 15th ed. (J.A. Dean,
    // 1999), Table 5.13, freezing points of propylene glycol–water by volume
    // (as shown in an online copy of the book): 20, 30, 40, 50 vol % freeze at
    // -6.7, -12.8, -20.6, -33.3 °C. Volume % → mass %: + 0.6 (ASHRAE Table 9
    // pairs 19.4/20, 29.4/30, 39.4/40, 49.4/50 vol/mass %, from memory).
    // Lange's values are for pure glycol, ASHRAE's for inhibited fluids,
    // which freeze a little lower; 1.5 K covers that.
    const double lange[][2] = {{0.206, -6.7}, {0.306, -12.8}, {0.406, -20.6}, {0.506, -33.3}};
    double worst = 0;
    for (const auto& l : lange) {
        CAPTURE(l[0]);
        const double t = test::call("GLYCOL_FREEZE_POINT", arg(l[0]));
        worst = std::max(worst, std::fabs(t - l[1]));
        CHECK(std::fabs(t - l[1]) < 1.5);
        CHECK(t < l[1]);  // inhibited fluid freezes lower
    }
    MESSAGE("GLYCOL_FREEZE_POINT (propylene) vs Lange's Handbook (pure glycol, by volume): worst " << worst << " K");
    // Monotone: more glycol, lower freezing point.
    for (const char* type : {"\"propylene\"", "\"ethylene\""}) {
        double previous = 1;
        for (double x = 0; x <= 0.6; x += 0.01) {
            const double t = test::call("GLYCOL_FREEZE_POINT", arg(x) + "; " + type);
            CHECK(t < previous);
            previous = t;
        }
    }
}

TEST_CASE("GLYCOL_*: refused input")
{
    for (const char* property : {"DENSITY", "CP", "VISCOSITY", "CONDUCTIVITY"}) {
        const std::string name = std::string("GLYCOL_") + property;
        CAPTURE(name);
        CHECK_REFUSED(name, "20; 0.7", "fraction = 0.7 is outside 0..0.6");
        CHECK_REFUSED(name, "20; -0.1", "fraction = -0.1 is outside 0..0.6");
        CHECK_REFUSED(name, "41; 0.3", "T = 41 is outside -12.7..40 °C");
        CHECK_REFUSED(name, "-13; 0.3", "from the freezing point of 30 % propylene glycol");
        CHECK_REFUSED(name, "-15; 0.3; \"ethylene\"", "T = -15 is outside -14.1..40 °C");
        CHECK_REFUSED(name, "-0.5; 0", "T = -0.5 is outside 0..40 °C");
        CHECK_REFUSED(name, "20; 0.3; \"glycerol\"", "type = \"glycerol\" is not \"propylene\" or \"ethylene\"");
        CHECK_REFUSED(name, "20; 0.3; \"\"", "type = \"\" is not");
        // Any case; the freezing point itself is accepted.
        CHECK(test::call(name, "20; 0.3; \"Ethylene\"") == test::call(name, "20; 0.3; \"ethylene\""));
        CHECK(test::call(name, "-12.7; 0.3") > 0);
        CHECK(test::call(name, "-51.1; 0.6") > 0);
    }
    CHECK_REFUSED("GLYCOL_FREEZE_POINT", "0.61", "fraction = 0.61 is outside 0..0.6");
    CHECK_REFUSED("GLYCOL_FREEZE_POINT", "-0.01", "fraction = -0.01 is outside 0..0.6");
    CHECK_REFUSED("GLYCOL_FREEZE_POINT", "0.3; \"PROPANE\"", "type = \"PROPANE\" is not");
}

TEST_CASE("fluids::at: the property sets the correlations use")
{
    namespace fl = solarith::fluids;
    // Water at its default pressure: the WATER_* values; expansion from IF97.
    for (double t : {0.0, 20.0, 60.0, 99.99, 150.0, 200.0}) {
        CAPTURE(t);
        const auto w = fl::at("NU_TEST", "water", t, NAN);
        CHECK(w.density == test::call("WATER_DENSITY", arg(t)));
        CHECK(w.cp == test::call("WATER_CP", arg(t)));
        CHECK(w.viscosity == test::call("WATER_VISCOSITY", arg(t)));
        CHECK(w.conductivity == test::call("WATER_CONDUCTIVITY", arg(t)));
        CHECK(w.prandtl() == test::rel(test::call("WATER_PRANDTL", arg(t)), 1e-15));
        const double p = solarith::water::default_pressure(t);
        CHECK(w.expansion == solarith::water::expansion(t, p));
        CHECK(fl::at("NU_TEST", "Water", t, 0).density == w.density);
    }
    // Water's expansion against a central difference of its density (IF97).
    {
        const double h = 1e-3, t = 60;
        const double slope = (test::call("WATER_DENSITY", arg(t + h)) - test::call("WATER_DENSITY", arg(t - h))) / (2 * h);
        CHECK(fl::at("X", "water", t, NAN).expansion == test::rel(-slope / test::call("WATER_DENSITY", arg(t)), 1e-7));
    }
    // Air at 101325 Pa; expansion 1/T of an ideal gas.
    for (double t : {-50.0, 20.0, 500.0}) {
        CAPTURE(t);
        const auto a = fl::at("NU_TEST", "AIR", t, NAN);
        CHECK(a.density == test::call("AIR_DENSITY", arg(t)));
        CHECK(a.cp == test::call("AIR_CP", arg(t)));
        CHECK(a.viscosity == test::call("AIR_VISCOSITY", arg(t)));
        CHECK(a.conductivity == test::call("AIR_CONDUCTIVITY", arg(t)));
        CHECK(a.expansion == test::rel(1 / (t + 273.15), 1e-15));
    }
    // Glycol mixtures: the GLYCOL_* values; expansion −(1/ρ)·dρ/dT of
    // GLYCOL_DENSITY (central difference), on both sides of 0 °C.
    for (const char* type : {"propylene", "ethylene"})
        for (double t : {-10.0, -0.5, 0.5, 20.0, 39.0}) {
            CAPTURE(type);
            CAPTURE(t);
            const auto g = fl::at("NU_TEST", type, t, 0.4);
            CHECK(g.density == test::call("GLYCOL_DENSITY", glycol_args(t, 0.4, type)));
            CHECK(g.cp == test::call("GLYCOL_CP", glycol_args(t, 0.4, type)));
            CHECK(g.viscosity == test::call("GLYCOL_VISCOSITY", glycol_args(t, 0.4, type)));
            CHECK(g.conductivity == test::call("GLYCOL_CONDUCTIVITY", glycol_args(t, 0.4, type)));
            const double h = 1e-3;
            const double slope = (test::call("GLYCOL_DENSITY", glycol_args(t + h, 0.4, type))
                                  - test::call("GLYCOL_DENSITY", glycol_args(t - h, 0.4, type)))
                                 / (2 * h);
            CHECK(g.expansion == test::rel(-slope / g.density, 1e-6));
        }
    // Fraction 0 of a glycol is water at 101325 Pa.
    CHECK(fl::at("X", "propylene", 30, 0).viscosity == fl::at("X", "water", 30, NAN).viscosity);

    // Messages name the calling function.
    auto refused = [](const std::string& fluid, double t, double fraction, const std::string& text) {
        try {
            fl::at("CONV_PIPE_COEFF", fluid, t, fraction);
            FAIL_CHECK("accepted " << fluid << " at " << t << " with fraction " << fraction);
        } catch (const solarith::DomainError& e) {
            const std::string message = e.what();
            CHECK_MESSAGE(message.rfind("CONV_PIPE_COEFF: ", 0) == 0, message);
            CHECK_MESSAGE(message.find(text) != std::string::npos, message);
        }
    };
    refused("water", 250, NAN, "fluid temperature = 250 is outside 0..200 °C");
    refused("water", 20, 0.3, "glycol_fraction = 0.3 is outside 0 or omitted");
    refused("air", 600, NAN, "fluid temperature = 600 is outside -50..500 °C");
    refused("air", 20, 0.1, "air takes no glycol");
    refused("propylene", 20, NAN, "glycol_fraction is missing");
    refused("ethylene", 20, 0.9, "glycol_fraction = 0.9 is outside 0..0.6");
    refused("ethylene", 60, 0.3, "fluid temperature = 60 is outside -14.1..40 °C");
    refused("oil", 20, NAN, "fluid = \"oil\" is not one of");
    refused("water", NAN, NAN, "fluid temperature = NaN");
}
