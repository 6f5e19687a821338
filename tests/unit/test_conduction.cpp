// Conduction family (COND_*): reference values from outside the project,
// the source named beside each check.
//
// Textbook examples are quoted from memory of the printed books, with the
// answers as printed (rounded); the tolerance of each such check is the
// rounding of the printed answer. Books:
//   Incropera: Incropera, DeWitt, Bergman, Lavine, Fundamentals of Heat and
//              Mass Transfer, 6th ed., Wiley, 2007.
//   Cengel:    Çengel & Ghajar, Heat and Mass Transfer: Fundamentals and
//              Applications (chapter 3 examples; the numbering below is that
//              of the 4th/5th editions as remembered, and may differ by one or
//              two in other editions).
// Generated tables: tests/reference/gen_conduction.py (SciPy special functions).
#include "support.hpp"

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

double relative_error(double value, double reference)
{
    return std::fabs(value - reference) / std::fabs(reference);
}

}  // namespace

TEST_CASE("COND_WALL: Fourier's law through a plane wall")
{
    // Incropera Example 1.1 (from memory): fireclay brick wall k = 1.7 W/(m·K),
    // L = 0.15 m, 0.5 m × 1.2 m, faces at 1400 K and 1150 K -> q = 1700 W.
    CHECK(test::call("COND_WALL", "1.7; 0.6; 0.15; 1126.85; 876.85") == test::rel(1700.0, 1e-12));
    // Cengel Example 3-1 (from memory): wall 3 m × 5 m × 0.3 m, k = 0.9,
    // faces 16 °C and 2 °C -> 630 W.
    CHECK(test::call("COND_WALL", "0.9; 15; 0.3; 16; 2") == test::rel(630.0, 1e-12));
    // Direction: the flow from side 1 to side 2 changes sign with the sides.
    CHECK(test::call("COND_WALL", "0.9; 15; 0.3; 2; 16") == test::rel(-630.0, 1e-12));
    // Identity with the resistance: q·R = T1 − T2.
    const double q = test::call("COND_WALL", "0.72; 12; 0.2; 20; -5");
    const double r = test::call("COND_R_WALL", "0.2; 0.72; 12");
    CHECK(q * r == test::rel(25.0, 1e-14));
    // No area, no flow (accepted zero).
    CHECK(test::call("COND_WALL", "0.72; 0; 0.2; 20; -5") == 0.0);

    CHECK_REFUSED("COND_WALL", "0; 12; 0.2; 20; -5", "conductivity = 0 is outside the positive numbers");
    CHECK_REFUSED("COND_WALL", "-1; 12; 0.2; 20; -5", "conductivity = -1 is outside the positive numbers");
    CHECK_REFUSED("COND_WALL", "0.72; -12; 0.2; 20; -5", "area = -12 is outside the non-negative numbers");
    CHECK_REFUSED("COND_WALL", "0.72; 12; 0; 20; -5", "thickness = 0 is outside the positive numbers");
    CHECK_REFUSED("COND_WALL", "0.72; 12; 0.2; -300; -5", "T1 = -300 is outside -273.15 °C");
    CHECK_REFUSED("COND_WALL", "0.72; 12; 0.2; 20; -274", "T2 = -274 is outside -273.15 °C");
    CHECK_REFUSED("COND_WALL", "1e300; 1e300; 1e-300; 20; -5", "not a finite number");
}

TEST_CASE("COND_SHELL: Fourier's law through a cylindrical shell")
{
    // Identity with the resistance: q = (T_inner − T_outer)/R_shell.
    const double q = test::call("COND_SHELL", "0.04; 10; 0.011; 0.041; 60; 20");
    const double r = test::call("COND_R_SHELL", "0.011; 0.041; 0.04; 10");
    CHECK(q * r == test::rel(40.0, 1e-14));
    // Hand calculation from the formula: 2π·0.04·10·40/ln(41/11).
    CHECK(q == test::rel(2 * pi * 0.04 * 10 * 40 / std::log(41.0 / 11.0), 1e-14));
    // Exact identity: the shell conducts like a wall of the log-mean area
    // A_lm = 2π·length·(r_o − r_i)/ln(r_o/r_i) (Incropera §3.3.1; any heat
    // transfer text).
    const double a_lm = 2 * pi * 10 * (0.041 - 0.011) / std::log(0.041 / 0.011);
    CHECK(q == test::rel(test::call("COND_WALL", args({0.04, a_lm, 0.041 - 0.011, 60, 20})), 1e-13));
    // Thin-shell limit: as r_o/r_i -> 1 the shell becomes a plane wall of the
    // inner area; the relative difference is about (r_o − r_i)/(2 r_i).
    for (double gap : {1e-2, 1e-4, 1e-6, 1e-9}) {
        CAPTURE(gap);
        const double r_o = 0.1 * (1 + gap), thickness = r_o - 0.1;  // the gap as the double inputs give it
        const double shell = test::call("COND_SHELL", args({50, 2, 0.1, r_o, 80, 20}));
        const double wall = test::call("COND_WALL", args({50, 2 * pi * 0.1 * 2, thickness, 80, 20}));
        CHECK(relative_error(shell, wall) == doctest::Approx(thickness / 0.2).epsilon(1e-3));
    }
    CHECK(test::call("COND_SHELL", "0.04; 0; 0.011; 0.041; 60; 20") == 0.0);
    CHECK(test::call("COND_SHELL", "0.04; 10; 0.011; 0.041; 20; 60") == test::rel(-q, 1e-15));

    CHECK_REFUSED("COND_SHELL", "0.04; 10; 0.011; 0.011; 60; 20", "r_outer = 0.011 is outside the values above r_inner");
    CHECK_REFUSED("COND_SHELL", "0.04; 10; 0.041; 0.011; 60; 20", "r_outer = 0.011 is outside the values above r_inner");
    CHECK_REFUSED("COND_SHELL", "0.04; 10; 0; 0.041; 60; 20", "r_inner = 0 is outside the positive numbers");
    CHECK_REFUSED("COND_SHELL", "0.04; -1; 0.011; 0.041; 60; 20", "length = -1 is outside the non-negative numbers");
    CHECK_REFUSED("COND_SHELL", "0; 10; 0.011; 0.041; 60; 20", "conductivity = 0 is outside the positive numbers");
    CHECK_REFUSED("COND_SHELL", "0.04; 10; 0.011; 0.041; -280; 20", "T_inner = -280 is outside");
    CHECK_REFUSED("COND_SHELL", "0.04; 10; 0.011; 0.041; 60; -280", "T_outer = -280 is outside");
}

TEST_CASE("COND_R_WALL: plane layer resistance")
{
    // Cengel Example 3-1 (from memory): R = 0.3/(0.9·15) = 0.02222 °C/W as printed.
    CHECK(test::call("COND_R_WALL", "0.3; 0.9; 15") == test::rel(0.02222, 2e-4));
    CHECK(test::call("COND_R_WALL", "0.3; 0.9; 15") == test::rel(0.3 / 13.5, 1e-15));
    // Zero thickness: no layer, no resistance (documented choice).
    CHECK(test::call("COND_R_WALL", "0; 0.9; 15") == 0.0);

    CHECK_REFUSED("COND_R_WALL", "-0.1; 0.9; 15", "thickness = -0.1 is outside the non-negative numbers");
    CHECK_REFUSED("COND_R_WALL", "0.3; 0; 15", "conductivity = 0 is outside the positive numbers");
    CHECK_REFUSED("COND_R_WALL", "0.3; 0.9; 0", "area = 0 is outside the positive numbers");
}

TEST_CASE("COND_R_SHELL: cylindrical layer resistance")
{
    // Cengel, insulated steam pipe example (from memory; number not recalled): cast-iron pipe
    // k = 80, D 5 -> 5.5 cm, glass wool k = 0.05 3 cm thick, 1 m long;
    // printed R_pipe = 0.0002 °C/W, R_insulation = 2.35 °C/W; with inside
    // h = 60 and outside h = 18, steam 320 °C and air 5 °C: Q = 121 W.
    const double r_pipe = test::call("COND_R_SHELL", "0.025; 0.0275; 80; 1");
    const double r_insulation = test::call("COND_R_SHELL", "0.0275; 0.0575; 0.05; 1");
    CHECK(r_pipe == doctest::Approx(0.0002).epsilon(0.5e-4 / 0.0002));  // printed to 1 significant digit
    CHECK(r_insulation == doctest::Approx(2.35).epsilon(0.005 / 2.35));
    const double r_total = 1 / (60 * 2 * pi * 0.025) + r_pipe + r_insulation + 1 / (18 * 2 * pi * 0.0575);
    CHECK(315 / r_total == doctest::Approx(121).epsilon(0.5 / 121));

    // Cengel, insulated electric wire example (from memory; number not recalled): 3 mm wire,
    // 2 mm plastic cover k = 0.15, 5 m long: R_plastic = 0.18 °C/W as printed;
    // with h = 12 outside, total 0.94 °C/W and 80 W -> interface at 105 °C.
    const double r_plastic = test::call("COND_R_SHELL", "0.0015; 0.0035; 0.15; 5");
    CHECK(r_plastic == doctest::Approx(0.18).epsilon(0.005 / 0.18));
    const double r_wire = r_plastic + 1 / (12 * 2 * pi * 0.0035 * 5);
    CHECK(r_wire == doctest::Approx(0.94).epsilon(0.005 / 0.94));
    CHECK(30 + 80 * r_wire == doctest::Approx(105).epsilon(0.5 / 105));

    // Equal radii: no layer, 0 K/W (documented choice, as COND_R_WALL with thickness 0).
    CHECK(test::call("COND_R_SHELL", "0.02; 0.02; 0.05; 1") == 0.0);
    // Thin-shell limit: -> L/(k·2π·r_i·length), relative difference ≈ δ/(2 r_i)
    // (series of ln(1 + δ/r_i)); log1p keeps it accurate down to tiny gaps.
    for (double gap : {1e-3, 1e-6, 1e-10, 1e-14}) {
        CAPTURE(gap);
        const double r_o = 0.05 * (1 + gap), thickness = r_o - 0.05;  // the gap as the double inputs give it
        const double shell = test::call("COND_R_SHELL", args({0.05, r_o, 0.2, 3}));
        const double wall = test::call("COND_R_WALL", args({thickness, 0.2, 2 * pi * 0.05 * 3}));
        const double expected = thickness / 0.1;  // δ/(2 r_i)
        CHECK(std::fabs(relative_error(shell, wall) - expected) <= 1e-3 * expected + 1e-15);
    }

    CHECK_REFUSED("COND_R_SHELL", "0.02; 0.019; 0.05; 1", "r_outer = 0.019 is outside the values from r_inner = 0.02 up");
    CHECK_REFUSED("COND_R_SHELL", "0; 0.02; 0.05; 1", "r_inner = 0 is outside the positive numbers");
    CHECK_REFUSED("COND_R_SHELL", "-0.01; 0.02; 0.05; 1", "r_inner = -0.01 is outside the positive numbers");
    CHECK_REFUSED("COND_R_SHELL", "0.01; 0.02; 0; 1", "conductivity = 0 is outside the positive numbers");
    CHECK_REFUSED("COND_R_SHELL", "0.01; 0.02; 0.05; 0", "length = 0 is outside the positive numbers");
}

TEST_CASE("COND_R_LAYERS: plane layers in series")
{
    // Cengel Example 3-3, double-pane window (from memory): two 4 mm glass
    // panes k = 0.78 around a 10 mm air gap k = 0.026, 0.8 m × 1.5 m; room
    // 20 °C with h = 10, outside -10 °C with h = 40 -> Q = 69.2 W.
    const double r_layers = test::call("COND_R_LAYERS", "{0.004; 0.01; 0.004}; {0.78; 0.026; 0.78}; 1.2");
    const double r_total = r_layers + 1 / (10 * 1.2) + 1 / (40 * 1.2);
    CHECK(30 / r_total == doctest::Approx(69.2).epsilon(0.05 / 69.2));
    // Cengel Example 3-2, single pane 8 mm (from memory): Q = 266 W.
    const double r_single = test::call("COND_R_LAYERS", "{0.008}; {0.78}; 1.2") + 1 / 12.0 + 1 / 48.0;
    CHECK(30 / r_single == doctest::Approx(266).epsilon(0.5 / 266));

    // One layer is COND_R_WALL; layers add (definition of series resistances).
    CHECK(test::call("COND_R_LAYERS", "{0.3}; {0.9}; 15") == test::rel(test::call("COND_R_WALL", "0.3; 0.9; 15"), 1e-15));
    CHECK(test::call("COND_R_LAYERS", "0.3; 0.9; 15") == test::rel(test::call("COND_R_WALL", "0.3; 0.9; 15"), 1e-15));
    const double sum = test::call("COND_R_WALL", "0.1; 0.04; 10") + test::call("COND_R_WALL", "0.2; 0.72; 10")
                       + test::call("COND_R_WALL", "0.015; 0.17; 10");
    CHECK(test::call("COND_R_LAYERS", "{0.1; 0.2; 0.015}; {0.04; 0.72; 0.17}; 10") == test::rel(sum, 1e-14));
    // A column range pairs with a row range cell by cell; a zero-thickness layer adds nothing.
    CHECK(test::call("COND_R_LAYERS", "{0.1 | 0.2 | 0.015}; {0.04; 0.72; 0.17}; 10") == test::rel(sum, 1e-14));
    CHECK(test::call("COND_R_LAYERS", "{0.1; 0; 0.2; 0.015}; {0.04; 5; 0.72; 0.17}; 10") == test::rel(sum, 1e-14));

    CHECK_REFUSED("COND_R_LAYERS", "{0.1; 0.2; 0.015}; {0.04; 0.72}; 10",
                  "thicknesses has 3 cells and conductivities 2");
    CHECK_REFUSED("COND_R_LAYERS", "{0.1; -0.2}; {0.04; 0.72}; 10",
                  "thicknesses (layer 2) = -0.2 is outside the non-negative numbers");
    CHECK_REFUSED("COND_R_LAYERS", "{0.1; 0.2}; {0; 0.72}; 10",
                  "conductivities (layer 1) = 0 is outside the positive numbers");
    CHECK_REFUSED("COND_R_LAYERS", "{0.1; 0.2}; {0.04; 0.72}; 0", "area = 0 is outside the positive numbers");
    CHECK_REFUSED("COND_R_LAYERS", "{0.1; \"x\"}; {0.04; 0.72}; 10", "thicknesses has a cell that is the text \"x\"");
}

TEST_CASE("COND_FIN_EFF: straight rectangular fin, adiabatic tip")
{
    // m = √(2·50/(100·0.01)) = 10 1/m, L = 0.1 m: m·L = 1, η = tanh(1) =
    // 0.7615941559557649 ((e² − 1)/(e² + 1), evaluated in Python 3.11).
    CHECK(test::call("COND_FIN_EFF", "50; 100; 0.01; 0.1") == test::rel(0.7615941559557649, 1e-15));
    // Series of tanh(x)/x = 1 − x²/3 + 2x⁴/15 − ... for small m·L (Abramowitz & Stegun 4.5.64).
    const double x = 1e-3;  // L = 1e-4 m with m = 10
    CHECK(test::call("COND_FIN_EFF", "50; 100; 0.01; 1e-4") == test::rel(1 - x * x / 3 + 2 * x * x * x * x / 15, 1e-15));
    // Long fin: tanh(m·L) -> 1, η -> 1/(m·L) (m·L = 40, tanh(40) = 1 to double precision).
    CHECK(test::call("COND_FIN_EFF", "50; 100; 0.01; 4") == test::rel(1 / 40.0, 1e-15));
    // Very short fins: never above 1 (the quotient tanh(x)/x could round up).
    for (const char* tiny : {"50; 100; 0.01; 1e-9", "50; 100; 0.01; 1e-300", "1e-300; 100; 0.01; 0.1"}) {
        CAPTURE(tiny);
        CHECK(test::call("COND_FIN_EFF", tiny) <= 1.0);
        CHECK(test::call("COND_FIN_EFF", tiny) == test::rel(1.0, 1e-15));
    }
    // Accepted zeros give the limit 1: no convection, or no fin.
    CHECK(test::call("COND_FIN_EFF", "0; 100; 0.01; 0.1") == 1.0);
    CHECK(test::call("COND_FIN_EFF", "50; 100; 0.01; 0") == 1.0);
    // More h, lower efficiency (the fin tip cools further below the base).
    CHECK(test::call("COND_FIN_EFF", "100; 100; 0.01; 0.1") < test::call("COND_FIN_EFF", "50; 100; 0.01; 0.1"));

    CHECK_REFUSED("COND_FIN_EFF", "-1; 100; 0.01; 0.1", "h = -1 is outside the non-negative numbers");
    CHECK_REFUSED("COND_FIN_EFF", "50; 0; 0.01; 0.1", "conductivity = 0 is outside the positive numbers");
    CHECK_REFUSED("COND_FIN_EFF", "50; 100; 0; 0.1", "thickness = 0 is outside the positive numbers");
    CHECK_REFUSED("COND_FIN_EFF", "50; 100; 0.01; -0.1", "fin_length = -0.1 is outside the non-negative numbers");
}

TEST_CASE("COND_ANNULAR_FIN_EFF: against high-precision and SciPy references")
{
    // tests/reference/annular_fin_efficiency.txt (gen_conduction.py): Gardner's
    // formula as printed, m·r1 from 1e-3 to 1e5 (across the switch to the
    // Hankel expansion at 500), m·(r2 − r1) from 1e-9 to 30 (across the
    // switch to the straight-fin form at 1e-6). Two reference columns:
    //  - eta_precise: 120-digit decimal arithmetic with the script's own Bessel
    //    functions (checked against SciPy to 1e-15);
    //  - eta_scipy: scipy.special iv/kv (ive/kve past m·r2 = 600) in double
    //    precision, itself uncertain by about 1e-16·(1 + m·r2)/(m·(r2 − r1)).
    // Expected accuracy of the C++ code: the numerator is a difference of nearly
    // equal products, so about 1e-16/(m·(r2 − r1)) relative, and below 1e-9
    // everywhere (see conduction.cpp).
    double worst = 0, worst_thick = 0, worst_scipy = 0;
    std::string worst_row;
    for (const auto& row : test::read_table("annular_fin_efficiency.txt")) {
        REQUIRE(row.size() == 7);
        const double h = row[0], k = row[1], t = row[2], r1 = row[3], r2 = row[4];
        const double m_length = std::sqrt(2 * h / (k * t)) * (r2 - r1);
        const std::string a = args({h, k, t, r1, r2});
        CAPTURE(a);
        const double eta = test::call("COND_ANNULAR_FIN_EFF", a);
        const double err = relative_error(eta, row[5]);
        CHECK(err <= std::min(1e-9, 1e-14 + 1e-15 / m_length));
        // SciPy with plain I and K also loses about 1e-16·m·r2/(m·(r2 − r1)):
        // I(m·r2) changes by that much when m·r2 is rounded to double.
        const double err_scipy = relative_error(eta, row[6]);
        CHECK(err_scipy <= 1e-13 + 1e-15 * (1 + std::sqrt(2 * h / (k * t)) * r2) / m_length);
        if (err > worst) {
            worst = err;
            worst_row = a;
        }
        if (m_length >= 0.1)
            worst_thick = std::max(worst_thick, err);
        worst_scipy = std::max(worst_scipy, err_scipy);
    }
    MESSAGE("COND_ANNULAR_FIN_EFF vs high-precision reference: worst relative error " << worst << " at (" << worst_row
            << "); " << worst_thick << " where m·(r2 − r1) >= 0.1. Worst relative difference from SciPy: "
            << worst_scipy);
}

TEST_CASE("COND_ANNULAR_FIN_EFF: limits and bad input")
{
    // r2 -> r1: the fin vanishes and η -> 1 (limit of the formula; the
    // Wronskian I0·K1 + I1·K0 = 1/x makes the bracket -> (r2 − r1)·m/(m·r1)).
    CHECK(test::call("COND_ANNULAR_FIN_EFF", "50; 186; 0.006; 0.025; 0.025") == 1.0);
    CHECK(test::call("COND_ANNULAR_FIN_EFF", "50; 186; 0.006; 0.025; 0.025000001") == test::rel(1.0, 1e-9));
    // h = 0: no convection, η = 1.
    CHECK(test::call("COND_ANNULAR_FIN_EFF", "0; 186; 0.006; 0.025; 0.048") == 1.0);
    // Continuity across the switch to the straight-fin value at m·(r2 − r1) = 1e-6
    // (m = 10 1/m, r1 = 0.1 m, r2/r1 = 1.000001): within the stated 1e-9.
    const double below = test::call("COND_ANNULAR_FIN_EFF", "50; 100; 0.01; 0.1; 0.10000000999");
    const double above = test::call("COND_ANNULAR_FIN_EFF", "50; 100; 0.01; 0.1; 0.10000001001");
    CHECK(std::fabs(below - above) < 1e-9);
    CHECK(below <= 1.0);
    CHECK(above <= 1.0);

    // Large r1 with fixed fin length: the annular fin becomes a straight fin
    // (curvature negligible), η -> tanh(m·L)/(m·L); the difference shrinks
    // in proportion to L/r1 (first-order curvature effect).
    const double straight = test::call("COND_FIN_EFF", "50; 100; 0.01; 0.1");  // m·L = 1
    double previous_gap = 1;
    for (double r1 : {1.0, 100.0, 1e4, 1e6}) {
        CAPTURE(r1);
        const double annular = test::call("COND_ANNULAR_FIN_EFF", args({50, 100, 0.01, r1, r1 + 0.1}));
        const double gap = std::fabs(annular - straight);
        CHECK(gap < 0.1 / r1);
        CHECK(gap < previous_gap);
        previous_gap = gap;
    }
    CHECK(previous_gap < 1e-8);
    // Curvature lowers the efficiency below the straight fin's.
    CHECK(test::call("COND_ANNULAR_FIN_EFF", "50; 100; 0.01; 0.01; 0.11") < straight);

    CHECK_REFUSED("COND_ANNULAR_FIN_EFF", "50; 186; 0.006; 0.025; 0.02",
                  "r_outer = 0.02 is outside the values from r_inner = 0.025 up");
    CHECK_REFUSED("COND_ANNULAR_FIN_EFF", "50; 186; 0.006; 0; 0.048", "r_inner = 0 is outside the positive numbers");
    CHECK_REFUSED("COND_ANNULAR_FIN_EFF", "-5; 186; 0.006; 0.025; 0.048", "h = -5 is outside the non-negative numbers");
    CHECK_REFUSED("COND_ANNULAR_FIN_EFF", "50; 0; 0.006; 0.025; 0.048", "conductivity = 0 is outside the positive numbers");
    CHECK_REFUSED("COND_ANNULAR_FIN_EFF", "50; 186; 0; 0.025; 0.048", "thickness = 0 is outside the positive numbers");
    CHECK_REFUSED("COND_ANNULAR_FIN_EFF", "50; 186; 0.006; 0.025; 1e12", "m·r_outer = ");
}

TEST_CASE("COND_CRITICAL_RADIUS: critical insulation radius of a cylinder")
{
    // Cengel, insulated electric wire example (from memory): plastic k = 0.15,
    // h = 12 -> r_cr = 0.0125 m = 12.5 mm.
    CHECK(test::call("COND_CRITICAL_RADIUS", "0.15; 12") == test::rel(0.0125, 1e-15));
    // Independent check of the formula: the total resistance of insulation
    // plus outer film, ln(r/r_i)/(2πk) + 1/(2πrh) per metre, is smallest at r_cr.
    const double rc = test::call("COND_CRITICAL_RADIUS", "0.15; 12");
    auto total = [](double r) {
        return test::call("COND_R_SHELL", args({0.0015, r, 0.15, 1})) + 1 / (12 * 2 * pi * r);
    };
    CHECK(total(rc * 0.99) > total(rc));
    CHECK(total(rc * 1.01) > total(rc));

    CHECK_REFUSED("COND_CRITICAL_RADIUS", "0.15; 0", "h = 0 is outside the positive numbers");
    CHECK_REFUSED("COND_CRITICAL_RADIUS", "-0.15; 12", "conductivity = -0.15 is outside the positive numbers");
}

TEST_CASE("COND_LUMPED_TEMP: lumped capacitance")
{
    // Incropera Example 5.1 (from memory): thermocouple junction, a sphere
    // with h = 400, ρ = 8500, c = 400; D = 0.706 mm gives a time constant of
    // 1 s; from 25 °C in gas at 200 °C it is within 1 K of the gas
    // (199 °C) after 5.2 s.
    const double d = 7.06e-4;
    const double area = pi * d * d, volume = pi * d * d * d / 6;
    const std::string body = args({400, area, volume, 8500, 400});
    CHECK(test::call("COND_LUMPED_TEMP", "25; 200; " + body + "; 5.2") == doctest::Approx(199).epsilon(0.1 / 199));
    // Definition of the time constant τ = ρVc/(hA): after τ the excess
    // temperature is e^-1 of the start; after τ·ln(175) the junction is at 199 °C.
    const double tau = 8500 * volume * 400 / (400 * area);
    CHECK((test::call("COND_LUMPED_TEMP", "25; 200; " + body + "; " + args({tau})) - 200) / (25 - 200)
          == test::rel(std::exp(-1.0), 1e-13));
    CHECK(test::call("COND_LUMPED_TEMP", "25; 200; " + body + "; " + args({tau * std::log(175.0)}))
          == test::rel(199.0, 1e-13));
    // Accepted zeros: at t = 0, with h = 0 or without surface, the body keeps T_start.
    CHECK(test::call("COND_LUMPED_TEMP", "25; 200; " + body + "; 0") == 25.0);
    CHECK(test::call("COND_LUMPED_TEMP", "25; 200; 0; 1; 1; 1000; 500; 100") == 25.0);
    CHECK(test::call("COND_LUMPED_TEMP", "25; 200; 10; 0; 1; 1000; 500; 100") == 25.0);
    // Long times: the fluid temperature; cooling works the same way.
    CHECK(test::call("COND_LUMPED_TEMP", "25; 200; " + body + "; 1e6") == 200.0);
    CHECK(test::call("COND_LUMPED_TEMP", "200; 25; " + body + "; " + args({tau}))
          == test::rel(25 + 175 * std::exp(-1.0), 1e-13));

    CHECK_REFUSED("COND_LUMPED_TEMP", "25; 200; 10; 1; 0; 1000; 500; 100", "volume = 0 is outside the positive numbers");
    CHECK_REFUSED("COND_LUMPED_TEMP", "25; 200; 10; 1; 1; 0; 500; 100", "density = 0 is outside the positive numbers");
    CHECK_REFUSED("COND_LUMPED_TEMP", "25; 200; 10; 1; 1; 1000; 0; 100", "cp = 0 is outside the positive numbers");
    CHECK_REFUSED("COND_LUMPED_TEMP", "25; 200; 10; 1; 1; 1000; 500; -1", "time_s = -1 is outside the non-negative");
    CHECK_REFUSED("COND_LUMPED_TEMP", "25; 200; -10; 1; 1; 1000; 500; 100", "h = -10 is outside the non-negative");
    CHECK_REFUSED("COND_LUMPED_TEMP", "25; 200; 10; -1; 1; 1000; 500; 100", "area = -1 is outside the non-negative");
    CHECK_REFUSED("COND_LUMPED_TEMP", "-300; 200; 10; 1; 1; 1000; 500; 100", "T_start = -300 is outside");
    CHECK_REFUSED("COND_LUMPED_TEMP", "25; -300; 10; 1; 1; 1000; 500; 100", "T_fluid = -300 is outside");
}

TEST_CASE("COND_SEMI_INF_TEMP: against SciPy's erf and erfc")
{
    // tests/reference/semi_infinite_temperature.txt (Incropera eq. 5.57 with
    // scipy.special.erf/erfc). Error measure: |T − T_ref|/|T_i − T_s|, the
    // error in the dimensionless temperature; the erfc tail rows (T_i = 0,
    // T_s = 100, so T = 100·erfc) are also checked relative to T itself.
    double worst_scaled = 0, worst_tail = 0;
    for (const auto& row : test::read_table("semi_infinite_temperature.txt")) {
        REQUIRE(row.size() == 6);
        const std::string a = args({row[0], row[1], row[2], row[3], row[4]});
        CAPTURE(a);
        const double t = test::call("COND_SEMI_INF_TEMP", a);
        const double scaled = std::fabs(t - row[5]) / std::fabs(row[0] - row[1]);
        CHECK(scaled <= 1e-14);
        worst_scaled = std::max(worst_scaled, scaled);
        if (row[0] == 0 && row[1] == 100) {
            const double tail = relative_error(t, row[5]);
            CHECK(tail <= 1e-13);
            worst_tail = std::max(worst_tail, tail);
        }
    }
    MESSAGE("COND_SEMI_INF_TEMP vs SciPy: worst error " << worst_scaled << " of |T_i - T_s|; worst relative error "
                                                         << worst_tail << " in the erfc tail (down to erfc = 1e-307)");
}

TEST_CASE("COND_SEMI_INF_TEMP: worked example, limits and bad input")
{
    // Incropera, chapter 5 worked example on the burial depth of a water main
    // (from memory; example number not recalled): soil at 20 °C, surface held
    // at -15 °C for 60 days, α = 0.138e-6 m²/s (k = 0.52, ρ = 2050, c = 1840);
    // the 0 °C front reaches x_m = 0.68 m (printed to 2 digits).
    const double alpha = 0.52 / (2050 * 1840.0), sixty_days = 60 * 86400.0;
    CHECK(std::fabs(test::call("COND_SEMI_INF_TEMP", args({20, -15, alpha, 0.68, sixty_days}))) < 0.1);
    CHECK(test::call("COND_SEMI_INF_TEMP", args({20, -15, alpha, 0.675, sixty_days})) < 0);
    CHECK(test::call("COND_SEMI_INF_TEMP", args({20, -15, alpha, 0.685, sixty_days})) > 0);
    // Self-similarity: T depends on x and t only through x/√(αt) (eq. 5.57).
    CHECK(test::call("COND_SEMI_INF_TEMP", "10; 80; 1e-6; 0.02; 400")
          == test::rel(test::call("COND_SEMI_INF_TEMP", "10; 80; 4e-6; 0.04; 400"), 1e-14));
    // t = 0: nothing has happened below the surface yet; the surface is at T_s.
    CHECK(test::call("COND_SEMI_INF_TEMP", "20; -15; 1e-7; 0.1; 0") == 20.0);
    CHECK(test::call("COND_SEMI_INF_TEMP", "20; -15; 1e-7; 0; 0") == -15.0);
    CHECK(test::call("COND_SEMI_INF_TEMP", "20; -15; 1e-7; 0; 3600") == -15.0);
    // Far below the penetration depth: still T_initial.
    CHECK(test::call("COND_SEMI_INF_TEMP", "20; -15; 1e-7; 100; 3600") == 20.0);

    CHECK_REFUSED("COND_SEMI_INF_TEMP", "20; -15; 0; 0.1; 3600", "diffusivity = 0 is outside the positive numbers");
    CHECK_REFUSED("COND_SEMI_INF_TEMP", "20; -15; 1e-7; -0.1; 3600", "depth = -0.1 is outside the non-negative");
    CHECK_REFUSED("COND_SEMI_INF_TEMP", "20; -15; 1e-7; 0.1; -1", "time_s = -1 is outside the non-negative");
    CHECK_REFUSED("COND_SEMI_INF_TEMP", "-280; -15; 1e-7; 0.1; 3600", "T_initial = -280 is outside");
    CHECK_REFUSED("COND_SEMI_INF_TEMP", "20; -280; 1e-7; 0.1; 3600", "T_surface = -280 is outside");
}
