// System-sizing family (HX_*, FCHART_*): reference values from outside the
// project, the source named beside each check.
//
// Books and papers (equation numbers from memory of the printed texts):
//   Incropera: Incropera, DeWitt, Bergman, Lavine, Fundamentals of Heat and
//              Mass Transfer, 6th ed., Wiley, 2007, Table 11.3.
//   D&B:       Duffie & Beckman, Solar Engineering of Thermal Processes,
//              4th ed., Wiley, 2013 (§10.2; chapter 20).
//   KBD:       Klein, Beckman & Duffie, Solar Energy 18 (1976) 113–127 and
//              19 (1977) 509–512 (the f-chart correlations, from memory).
// Generated tables: tests/reference/gen_sizing.py (the crossflow series in
// Python decimal arithmetic and with SciPy's gammainc; the crossflow
// exchanger's differential equations on a grid; counterflow, parallel and
// shell-and-tube exchangers as boundary-value problems with scipy.linalg.expm).
//
// No textbook worked example of the f-chart is used: the examples of D&B
// chapter 20 are not remembered confidently enough to quote.
#include "support.hpp"

#include <algorithm>
#include <cmath>
#include <cstdio>
#include <string>

namespace {

std::string args(std::initializer_list<double> values, const std::string& tail = "")
{
    std::string out;
    char buffer[40];
    for (double v : values) {
        std::snprintf(buffer, sizeof buffer, "%.17g", v);
        out += (out.empty() ? "" : "; ") + std::string(buffer);
    }
    return tail.empty() ? out : out + "; " + tail;
}

double effectiveness(double ntu, double cr, const std::string& arrangement)
{
    return test::call("HX_EFFECTIVENESS", args({ntu, cr}, "\"" + arrangement + "\""));
}

const char* const arrangements[] = {"counterflow", "parallel", "crossflow", "shell-and-tube"};

}  // namespace

// ---- HX_EFFECTIVENESS --------------------------------------------------------

TEST_CASE("HX_EFFECTIVENESS: counterflow, parallel and shell-and-tube against their differential equations")
{
    // Each exchanger solved as a linear boundary-value problem with
    // scipy.linalg.expm (gen_sizing.py), independently of the closed forms of
    // Incropera Table 11.3 that the add-in evaluates.
    const auto rows = test::read_table("hx_closed_forms.txt");
    double worst_counter = 0, worst_parallel = 0, worst_shell = 0;
    double worst_gap[3] = {0, 0, 0};  // shell formula above the four-pass solution, NTU <= 1, 2, 3
    for (const auto& row : rows) {
        const double ntu = row[0];
        const double cr = row[1];
        const double counter = effectiveness(ntu, cr, "counterflow");
        const double parallel = effectiveness(ntu, cr, "parallel");
        const double shell = effectiveness(ntu, cr, "shell-and-tube");
        worst_counter = std::max(worst_counter, std::fabs(counter - row[2]) / row[2]);
        worst_parallel = std::max(worst_parallel, std::fabs(parallel - row[3]) / row[3]);
        worst_shell = std::max(worst_shell, std::fabs(shell - row[4]) / row[4]);
        CHECK_MESSAGE(counter == test::rel(row[2], 1e-12), "counterflow NTU " << ntu << ", Cr " << cr);
        CHECK_MESSAGE(parallel == test::rel(row[3], 1e-12), "parallel NTU " << ntu << ", Cr " << cr);
        CHECK_MESSAGE(shell == test::rel(row[4], 1e-12), "shell-and-tube NTU " << ntu << ", Cr " << cr);
        // Four tube passes: the two-pass formula lies above the exact value
        // by no more than the catalogue states (0.0005, 0.004, 0.011 for
        // NTU <= 1, 2, 3).
        CHECK(shell >= row[6] - 1e-12);
        const double gap = shell - row[5];
        for (int k = 0; k < 3; ++k)
            if (ntu <= k + 1)
                worst_gap[k] = std::max(worst_gap[k], gap);
    }
    CHECK(worst_gap[0] <= 0.0005);
    CHECK(worst_gap[1] <= 0.004);
    CHECK(worst_gap[2] <= 0.011);
    MESSAGE("HX_EFFECTIVENESS vs expm solutions (" << rows.size() << " rows): worst relative error counterflow "
                                                  << worst_counter << ", parallel " << worst_parallel
                                                  << ", shell-and-tube (2 passes) " << worst_shell
                                                  << "; above four passes by at most " << worst_gap[0] << ", "
                                                  << worst_gap[1] << ", " << worst_gap[2]
                                                  << " for NTU <= 1, 2, 3");
}

TEST_CASE("HX_EFFECTIVENESS: closed forms by hand and their limits")
{
    // Incropera eq. 11.29a written out: NTU = 1, Cr = 0.5.
    const double a = std::exp(-0.5);
    CHECK(effectiveness(1, 0.5, "counterflow") == test::rel((1 - a) / (1 - 0.5 * a), 1e-15));
    // eq. 11.29b: Cr = 1, ε = NTU/(1 + NTU), and no 0/0 next to it.
    CHECK(effectiveness(3, 1, "counterflow") == test::rel(0.75, 1e-15));
    CHECK(effectiveness(3, 1 - 1e-12, "counterflow") == test::rel(0.75, 1e-11));
    CHECK(effectiveness(3, 1 - 1e-6, "counterflow") == test::rel(0.75, 1e-6));
    // eq. 11.28a: NTU = 2, Cr = 0.25.
    CHECK(effectiveness(2, 0.25, "parallel") == test::rel((1 - std::exp(-2.5)) / 1.25, 1e-15));
    // eq. 11.30a: NTU = 1, Cr = 1 (s = √2).
    const double s = std::sqrt(2.0);
    CHECK(effectiveness(1, 1, "shell-and-tube")
          == test::rel(2 / (2 + s * (1 + std::exp(-s)) / (1 - std::exp(-s))), 1e-15));

    // Cr = 0 (one fluid changing phase, or C_max infinite): ε = 1 − e^(−NTU)
    // for every arrangement (Incropera eq. 11.35a).
    for (const char* arrangement : arrangements)
        for (double ntu : {0.01, 0.5, 1.0, 2.0, 5.0, 30.0}) {
            CHECK_MESSAGE(effectiveness(ntu, 0, arrangement) == test::rel(-std::expm1(-ntu), 1e-15),
                          arrangement << " NTU " << ntu);
            // and continuously so: Cr = 1e-9 differs by O(Cr).
            CHECK_MESSAGE(effectiveness(ntu, 1e-9, arrangement) == test::rel(-std::expm1(-ntu), 1e-8),
                          arrangement << " NTU " << ntu);
        }
    // NTU = 0: no transfer.
    for (const char* arrangement : arrangements)
        CHECK(effectiveness(0, 0.6, arrangement) == 0.0);

    // NTU → ∞: counterflow → 1 for Cr < 1, parallel → 1/(1 + Cr), one shell
    // pass → 2/(1 + Cr + √(1 + Cr²)) (the limits of eqs. 11.29a, 11.28a,
    // 11.30a); crossflow (both unmixed) → 1.
    CHECK(effectiveness(1e3, 0.5, "counterflow") == test::rel(1.0, 1e-15));
    CHECK(effectiveness(1e6, 1, "counterflow") == test::rel(1e6 / (1 + 1e6), 1e-15));
    CHECK(effectiveness(1e3, 0.5, "parallel") == test::rel(1 / 1.5, 1e-15));
    CHECK(effectiveness(1e3, 0.5, "shell-and-tube") == test::rel(2 / (1.5 + std::sqrt(1.25)), 1e-15));
    CHECK(effectiveness(1e300, 0.7, "counterflow") == 1.0);
    CHECK(effectiveness(1e300, 0.7, "parallel") == test::rel(1 / 1.7, 1e-15));
    CHECK(effectiveness(1e300, 0.7, "shell-and-tube") == test::rel(2 / (1.7 + std::sqrt(1.49)), 1e-15));
    CHECK(effectiveness(1e4, 0.5, "crossflow") == test::rel(1.0, 1e-15));

    // Tiny NTU: ε ≈ NTU for every arrangement (first order of each form).
    for (const char* arrangement : arrangements)
        CHECK_MESSAGE(effectiveness(1e-12, 1, arrangement) == test::rel(1e-12, 1e-11), arrangement);

    // Arrangement names: default counterflow, any letter case.
    CHECK(test::call("HX_EFFECTIVENESS", "1; 0.5") == effectiveness(1, 0.5, "counterflow"));
    CHECK(test::call("HX_EFFECTIVENESS", "1; 0.5; \"CrossFlow\"") == effectiveness(1, 0.5, "crossflow"));
    CHECK(test::call("HX_EFFECTIVENESS", "1; 0.5; \"Shell-And-Tube\"") == effectiveness(1, 0.5, "shell-and-tube"));

    CHECK_REFUSED("HX_EFFECTIVENESS", "-1; 0.5", "ntu = -1 is outside the non-negative numbers");
    CHECK_REFUSED("HX_EFFECTIVENESS", "1; 1.2", "capacity_ratio = 1.2 is outside 0..1");
    CHECK_REFUSED("HX_EFFECTIVENESS", "1; -0.1; \"parallel\"", "capacity_ratio = -0.1 is outside 0..1");
    CHECK_REFUSED("HX_EFFECTIVENESS", "1; 0.5; \"cross-flow\"", "arrangement = \"cross-flow\" is not one of");
    CHECK_REFUSED("HX_EFFECTIVENESS", "1; 0.5; \"\"", "arrangement = \"\" is not one of");
    CHECK_REFUSED("HX_EFFECTIVENESS", "20000; 0.5; \"crossflow\"", "ntu = 20000 is outside 0..10000 for \"crossflow\"");
    CHECK_REFUSED("HX_EFFECTIVENESS", "-3; 0.5; \"crossflow\"", "ntu = -3 is outside the non-negative numbers");
}

TEST_CASE("HX_EFFECTIVENESS crossflow (both unmixed): the exact series, evaluated independently")
{
    // The series of Mason (1954) / Baclic (1990) in decimal arithmetic and
    // with SciPy's gammainc (gen_sizing.py).
    const auto rows = test::read_table("hx_crossflow_series.txt");
    double worst = 0, worst_scipy = 0, worst_absolute = 0;
    std::string worst_at;
    for (const auto& row : rows) {
        const double ntu = row[0];
        const double cr = row[1];
        const double eps = effectiveness(ntu, cr, "crossflow");
        const double err = std::fabs(eps - row[2]) / row[2];
        if (err > worst) {
            worst = err;
            worst_at = args({ntu, cr});
        }
        worst_scipy = std::max(worst_scipy, std::fabs(eps - row[3]) / row[3]);
        worst_absolute = std::max(worst_absolute, std::fabs(eps - row[2]));
        CHECK_MESSAGE(eps == test::rel(row[2], 1e-13), "NTU " << ntu << ", Cr " << cr);
        CHECK(eps <= 1.0);
    }
    MESSAGE("HX_EFFECTIVENESS crossflow vs decimal series (" << rows.size() << " rows): worst relative error " << worst
                                                            << " at (" << worst_at << "), worst absolute error "
                                                            << worst_absolute << "; vs SciPy " << worst_scipy);
}

TEST_CASE("HX_EFFECTIVENESS crossflow (both unmixed): the series against the exchanger's differential equations")
{
    // Grid solution of du/dξ = −NTU(u − v), dv/dη = NTU·Cr(u − v), Richardson-
    // extrapolated (gen_sizing.py): checks the series formula itself.
    const auto rows = test::read_table("hx_crossflow_pde.txt");
    double worst = 0;
    for (const auto& row : rows) {
        const double eps = effectiveness(row[0], row[1], "crossflow");
        worst = std::max(worst, std::fabs(eps - row[2]));
        CHECK_MESSAGE(std::fabs(eps - row[2]) <= 1e-12, "NTU " << row[0] << ", Cr " << row[1]);
    }
    MESSAGE("HX_EFFECTIVENESS crossflow vs differential equations (" << rows.size()
                                                                    << " rows): worst absolute difference " << worst);
}

TEST_CASE("HX_EFFECTIVENESS crossflow (both unmixed): properties and the handbook approximation")
{
    // ε rises with NTU and falls with Cr (more area helps; a stronger second
    // stream heats up less): checked on a grid.
    for (double cr : {0.1, 0.5, 0.9, 1.0}) {
        double previous = 0;
        for (double ntu = 0.25; ntu <= 40; ntu *= 1.5) {
            const double eps = effectiveness(ntu, cr, "crossflow");
            CHECK_MESSAGE(eps > previous, "NTU " << ntu << ", Cr " << cr);
            previous = eps;
        }
    }
    for (double ntu : {0.5, 2.0, 8.0}) {
        double previous = 1;
        for (double cr = 0.0; cr <= 1.0; cr += 0.125) {
            const double eps = effectiveness(ntu, cr, "crossflow");
            CHECK_MESSAGE(eps < previous, "NTU " << ntu << ", Cr " << cr);
            previous = eps;
        }
    }
    // Between parallel flow and counterflow at equal NTU and Cr (Incropera
    // Fig. 11.14–11.19 ordering, common practice).
    for (double ntu : {0.5, 1.0, 3.0, 10.0})
        for (double cr : {0.25, 0.75, 1.0}) {
            const double eps = effectiveness(ntu, cr, "crossflow");
            CHECK(eps > effectiveness(ntu, cr, "parallel"));
            CHECK(eps < effectiveness(ntu, cr, "counterflow"));
        }
    // The approximation of Incropera eq. 11.32 (from memory),
    // ε ≈ 1 − exp[(NTU^0.22/Cr)(exp(−Cr·NTU^0.78) − 1)], follows the exact
    // series within 0.02 over the charts' range NTU 0.1..10 — a check that the
    // two describe the same exchanger, not of the digits.
    double worst = 0;
    for (double ntu : {0.1, 0.25, 0.5, 1.0, 2.0, 3.0, 5.0, 7.5, 10.0})
        for (double cr : {0.25, 0.5, 0.75, 1.0}) {
            const double approx =
                1 - std::exp(std::pow(ntu, 0.22) / cr * (std::exp(-cr * std::pow(ntu, 0.78)) - 1));
            worst = std::max(worst, std::fabs(effectiveness(ntu, cr, "crossflow") - approx));
        }
    CHECK(worst < 0.02);
    MESSAGE("crossflow: the approximation of Incropera eq. 11.32 differs from the series by at most " << worst
                                                                                                     << " for NTU 0.1..10");
}

// ---- HX_COLLECTOR_PENALTY ----------------------------------------------------

TEST_CASE("HX_COLLECTOR_PENALTY: de Winter's factor from the energy balances it summarises")
{
    // Collector (Hottel–Whillier–Bliss on the collector inlet T_ci),
    // collector loop and exchanger into a tank at T_t:
    //   Q = A·F_R·[S − U_L·(T_ci − T_a)],  Q = (ṁcp)_c·(T_co − T_ci),
    //   Q = ε·(ṁcp)_min·(T_co − T_t)
    // (D&B §10.2). Solved here for Q by Cramer's rule on T_ci and T_co, then
    // compared with A·F_R′·[S − U_L·(T_t − T_a)].
    struct Case {
        double area, f_r, u_l, s, t_a, t_t, c_c, eps, c_min;
    };
    const Case cases[] = {
        {4.0, 0.8, 5.0, 600, 10, 45, 0.05 * 3800, 0.6, 0.05 * 3800},     // glycol loop the smaller stream
        {10.0, 0.85, 4.2, 700, 20, 55, 0.15 * 3700, 0.75, 0.12 * 4180},  // tank side the smaller stream
        {50.0, 0.9, 3.5, 500, -5, 30, 0.7 * 3600, 0.9, 0.7 * 3600},
        {2.0, 0.7, 8.0, 300, 0, 60, 0.02 * 4000, 0.3, 0.01 * 4180},
    };
    for (const Case& k : cases) {
        const double afu = k.area * k.f_r * k.u_l;
        // Unknowns T_ci, T_co. Equate the three expressions of Q:
        //   c_c·(T_co − T_ci) = A·F_R·S − afu·(T_ci − T_a)   ->  (afu − c_c)·T_ci + c_c·T_co = A·F_R·S + afu·T_a
        //   c_c·(T_co − T_ci) = εC·(T_co − T_t)              ->  −c_c·T_ci + (c_c − εC)·T_co = −εC·T_t
        const double e_c = k.eps * k.c_min;
        const double a11 = afu - k.c_c, a12 = k.c_c, b1 = k.area * k.f_r * k.s + afu * k.t_a;
        const double a21 = -k.c_c, a22 = k.c_c - e_c, b2 = -e_c * k.t_t;
        const double det = a11 * a22 - a12 * a21;
        const double t_ci = (b1 * a22 - a12 * b2) / det;
        const double t_co = (a11 * b2 - a21 * b1) / det;
        const double q = k.c_c * (t_co - t_ci);
        const double factor = test::call("HX_COLLECTOR_PENALTY", args({afu, k.c_c, k.eps, k.c_min}));
        const double q_prime = k.area * k.f_r * factor * (k.s - k.u_l * (k.t_t - k.t_a));
        CHECK(q_prime == test::rel(q, 1e-12));
        CHECK(factor > 0);
        CHECK(factor < 1);
    }

    // No exchanger penalty with a perfect exchanger on the collector loop's own
    // capacity rate, or with a loss-free collector (the bracket is 1).
    CHECK(test::call("HX_COLLECTOR_PENALTY", "150; 560; 1; 560") == 1.0);
    CHECK(test::call("HX_COLLECTOR_PENALTY", "0; 560; 0.3; 100") == 1.0);
    // The formula written out (D&B §10.2): A·F_R·U_L = 150 W/K, (ṁcp)_c = 560,
    // ε = 0.7, (ṁcp)_min = 500: 1/(1 + (150/560)·(560/350 − 1)) = 1/(1 + 0.267857·0.6).
    CHECK(test::call("HX_COLLECTOR_PENALTY", "150; 560; 0.7; 500") == test::rel(1 / (1 + 150.0 / 560 * 0.6), 1e-15));
    // Tiny ε·(ṁcp)_min: a vanishing factor, not a division by zero.
    CHECK(test::call("HX_COLLECTOR_PENALTY", "150; 560; 1e-300; 1e-300") == 0.0);

    CHECK_REFUSED("HX_COLLECTOR_PENALTY", "-1; 560; 0.7; 500", "f_r_ul_area = -1 is outside the non-negative numbers");
    CHECK_REFUSED("HX_COLLECTOR_PENALTY", "560; 560; 0.7; 500", "f_r_ul_area = 560 is outside 0 up to (not including)");
    CHECK_REFUSED("HX_COLLECTOR_PENALTY", "150; 0; 0.7; 500",
                  "collector_capacity_rate = 0 is outside the positive numbers");
    CHECK_REFUSED("HX_COLLECTOR_PENALTY", "150; 560; 0; 500", "effectiveness = 0 is outside 0..1, excluding 0");
    CHECK_REFUSED("HX_COLLECTOR_PENALTY", "150; 560; 1.1; 500", "effectiveness = 1.1 is outside 0..1, excluding 0");
    CHECK_REFUSED("HX_COLLECTOR_PENALTY", "150; 560; 0.7; 0", "min_capacity_rate = 0 is outside the positive numbers");
    CHECK_REFUSED("HX_COLLECTOR_PENALTY", "150; 560; 0.7; 600", "min_capacity_rate = 600 is outside 0..collector");
}

// ---- f-chart -----------------------------------------------------------------

TEST_CASE("FCHART_X and FCHART_Y: the dimensionless groups")
{
    // D&B §20.2 definitions, by hand: A = 50 m², F_R′U_L = 4 W/(m²·K),
    // T̄a = −2 °C, 31 days, L = 30 GJ:
    //   X = 50·4·(100 − (−2))·31·86400/30e9 = 20400·2678400/3e10 = 1.821312.
    CHECK(test::call("FCHART_X", "50; 4; -2; 31; 30e9") == test::rel(1.821312, 1e-14));
    CHECK(test::call("FCHART_X", "50; 4; -2; 31; 30e9; 100") == test::call("FCHART_X", "50; 4; -2; 31; 30e9"));
    // Another reference temperature scales the temperature difference only.
    CHECK(test::call("FCHART_X", "50; 4; -2; 31; 30e9; 49") == test::rel(1.821312 * 51 / 102, 1e-14));
    CHECK(test::call("FCHART_X", "0; 4; -2; 31; 30e9") == 0.0);
    CHECK(test::call("FCHART_X", "50; 4; 100; 31; 30e9") == 0.0);
    //   Y = 50·0.7·0.94·12 MJ/m²·31/30 GJ = 32.9·12e6·31/3e10 = 0.40796.
    CHECK(test::call("FCHART_Y", "50; 0.7; 0.94; 12e6; 31; 30e9") == test::rel(0.40796, 1e-14));
    CHECK(test::call("FCHART_Y", "50; 0.7; 0.94; 0; 31; 30e9") == 0.0);
    // Both are per month: a 28-day month with the same daily figures and a
    // load in proportion gives the same X and Y.
    CHECK(test::call("FCHART_X", "50; 4; -2; 28; " + args({30e9 * 28 / 31}))
          == test::rel(1.821312, 1e-14));
    CHECK(test::call("FCHART_Y", "50; 0.7; 0.94; 12e6; 28; " + args({30e9 * 28 / 31}))
          == test::rel(0.40796, 1e-14));

    CHECK_REFUSED("FCHART_X", "-1; 4; -2; 31; 30e9", "area = -1 is outside the non-negative numbers");
    CHECK_REFUSED("FCHART_X", "50; -4; -2; 31; 30e9", "f_r_ul = -4 is outside the non-negative numbers");
    CHECK_REFUSED("FCHART_X", "50; 4; -300; 31; 30e9", "T_ambient_mean = -300 is outside -273.15 °C");
    CHECK_REFUSED("FCHART_X", "50; 4; -2; 0; 30e9", "days = 0 is outside 1..31");
    CHECK_REFUSED("FCHART_X", "50; 4; -2; 32; 30e9", "days = 32 is outside 1..31");
    CHECK_REFUSED("FCHART_X", "50; 4; -2; 31; 0", "load = 0 is outside the positive numbers");
    CHECK_REFUSED("FCHART_X", "50; 4; 20; 31; 30e9; 10", "T_ref = 10 is outside temperatures at or above T_ambient_mean");
    CHECK_REFUSED("FCHART_Y", "-50; 0.7; 0.94; 12e6; 31; 30e9", "area = -50 is outside the non-negative numbers");
    CHECK_REFUSED("FCHART_Y", "50; 1.2; 0.94; 12e6; 31; 30e9", "f_r_tau_alpha_n = 1.2 is outside 0..1");
    CHECK_REFUSED("FCHART_Y", "50; 0.7; 1.1; 12e6; 31; 30e9", "tau_alpha_ratio = 1.1 is outside 0..1");
    CHECK_REFUSED("FCHART_Y", "50; 0.7; 0.94; -1; 31; 30e9",
                  "h_tilted_mean_daily = -1 is outside the non-negative numbers");
    CHECK_REFUSED("FCHART_Y", "50; 0.7; 0.94; 12e6; 40; 30e9", "days = 40 is outside 1..31");
    CHECK_REFUSED("FCHART_Y", "50; 0.7; 0.94; 12e6; 31; -5", "load = -5 is outside the positive numbers");
}

TEST_CASE("FCHART_F: the liquid and air correlations")
{
    // KBD 1976 liquid correlation (D&B §20.3, from memory), X = 3.5, Y = 1.2:
    //   1.029·1.2 − 0.065·3.5 − 0.245·1.44 + 0.0018·12.25 + 0.0215·1.728
    //   = 1.2348 − 0.2275 − 0.3528 + 0.02205 + 0.037152 = 0.713702.
    CHECK(test::call("FCHART_F", "3.5; 1.2") == test::rel(0.713702, 1e-14));
    CHECK(test::call("FCHART_F", "3.5; 1.2; \"liquid\"") == test::rel(0.713702, 1e-14));
    // KBD 1977 air correlation (D&B §20.4, from memory), same X and Y:
    //   1.040·1.2 − 0.065·3.5 − 0.159·1.44 + 0.00187·12.25 − 0.0095·1.728
    //   = 1.248 − 0.2275 − 0.22896 + 0.0229075 − 0.016416 = 0.7980315.
    CHECK(test::call("FCHART_F", "3.5; 1.2; \"air\"") == test::rel(0.7980315, 1e-14));
    CHECK(test::call("FCHART_F", "3.5; 1.2; \"AIR\"") == test::rel(0.7980315, 1e-14));
    // Limited to 0..1 (D&B ch. 20): liquid at X = 0, Y = 3 gives 1.4625 -> 1;
    // at X = 18, Y = 0 gives −0.5868 -> 0.
    CHECK(test::call("FCHART_F", "0; 3") == 1.0);
    CHECK(test::call("FCHART_F", "18; 0") == 0.0);
    CHECK(test::call("FCHART_F", "18; 0; \"air\"") == 0.0);
    CHECK(test::call("FCHART_F", "0; 0") == 0.0);
    // The published charts: f falls as X grows at fixed Y. ∂f/∂X = −0.065 +
    // 0.0036·X (liquid) is negative up to X = 18.06, just past the range;
    // −0.065 + 0.00374·X (air) up to X = 17.38, beyond which the air
    // polynomial rises by less than 0.001 to X = 18.
    for (const std::string system : {"liquid", "air"}) {
        const double x_turn = system == "liquid" ? 18.0 : 17.0;
        for (double y : {0.5, 1.0, 2.0}) {
            double previous = 2;
            for (double x = 0; x <= x_turn; x += 0.5) {
                const double f = test::call("FCHART_F", args({x, y}, "\"" + system + "\""));
                CHECK_MESSAGE(f <= previous, system << " X " << x << ", Y " << y);
                previous = f;
            }
            const double rise = test::call("FCHART_F", args({18.0, y}, "\"" + system + "\""))
                                - test::call("FCHART_F", args({17.38, y}, "\"" + system + "\""));
            CHECK(rise < 0.001);
        }
    }

    CHECK_REFUSED("FCHART_F", "-0.1; 1", "X = -0.1 is outside 0..18");
    CHECK_REFUSED("FCHART_F", "18.1; 1", "X = 18.1 is outside 0..18");
    CHECK_REFUSED("FCHART_F", "3; 3.1", "Y = 3.1 is outside 0..3");
    CHECK_REFUSED("FCHART_F", "3; -0.5; \"air\"", "Y = -0.5 is outside 0..3");
    CHECK_REFUSED("FCHART_F", "3; 1; \"water\"", "system = \"water\" is not one of \"liquid\", \"air\"");
}

TEST_CASE("FCHART_STORAGE_CORR and FCHART_DHW_CORR: corrections of X")
{
    // (M/75)^(−0.25) (KBD 1976; D&B §20.3, from memory), by hand:
    CHECK(test::call("FCHART_STORAGE_CORR", "75") == 1.0);
    CHECK(test::call("FCHART_STORAGE_CORR", "150") == test::rel(std::pow(2.0, -0.25), 1e-15));   // 0.8409
    CHECK(test::call("FCHART_STORAGE_CORR", "37.5") == test::rel(std::pow(2.0, 0.25), 1e-15));   // 1.1892
    CHECK(test::call("FCHART_STORAGE_CORR", "300") == test::rel(std::sqrt(0.5), 1e-15));         // 0.7071
    CHECK_REFUSED("FCHART_STORAGE_CORR", "37", "storage_litres_per_m2 = 37 is outside 37.5..300");
    CHECK_REFUSED("FCHART_STORAGE_CORR", "301", "storage_litres_per_m2 = 301 is outside 37.5..300");
    CHECK_REFUSED("FCHART_STORAGE_CORR", "0", "storage_litres_per_m2 = 0 is outside 37.5..300");

    // (11.6 + 1.18·T_w + 3.86·T_m − 2.32·T̄a)/(100 − T̄a) (KBD 1976; D&B §20.5,
    // from memory), by hand:
    //   T_m = 11, T_w = 60, T̄a = 5: (11.6 + 70.8 + 42.46 − 11.6)/95 = 113.26/95.
    CHECK(test::call("FCHART_DHW_CORR", "11; 60; 5") == test::rel(113.26 / 95, 1e-14));
    //   T_m = 20, T_w = 50, T̄a = 20: (11.6 + 59 + 77.2 − 46.4)/80 = 101.4/80.
    CHECK(test::call("FCHART_DHW_CORR", "20; 50; 20") == test::rel(101.4 / 80, 1e-14));
    //   T_m = 5, T_w = 70, T̄a = −10: (11.6 + 82.6 + 19.3 + 23.2)/110 = 136.7/110.
    CHECK(test::call("FCHART_DHW_CORR", "5; 70; -10") == test::rel(136.7 / 110, 1e-14));
    // The multiplier reaches 0 at T̄a = 89.9/2.32 = 38.75 °C for T_m = 5, T_w = 50.
    CHECK(test::call("FCHART_DHW_CORR", "5; 50; 38.7") > 0);
    CHECK_REFUSED("FCHART_DHW_CORR", "5; 50; 38.75", "T_ambient_mean = 38.75 is outside temperatures below 38.75");
    CHECK_REFUSED("FCHART_DHW_CORR", "4; 60; 5", "T_mains = 4 is outside 5..20");
    CHECK_REFUSED("FCHART_DHW_CORR", "21; 60; 5", "T_mains = 21 is outside 5..20");
    CHECK_REFUSED("FCHART_DHW_CORR", "11; 45; 5", "T_set = 45 is outside 50..70");
    CHECK_REFUSED("FCHART_DHW_CORR", "11; 75; 5", "T_set = 75 is outside 50..70");
    CHECK_REFUSED("FCHART_DHW_CORR", "11; 60; -300", "T_ambient_mean = -300 is outside -273.15 °C");
}

TEST_CASE("f-chart groups feed the correlation")
{
    // A month through the chain, each step a catalogue call: X corrected for
    // 150 l/m² of storage, then f (liquid). By hand: X = 1.821312·2^(−0.25),
    // Y = 0.40796, f = 1.029Y − 0.065X − 0.245Y² + 0.0018X² + 0.0215Y³.
    const double x = test::call("FCHART_X", "50; 4; -2; 31; 30e9") * test::call("FCHART_STORAGE_CORR", "150");
    const double y = test::call("FCHART_Y", "50; 0.7; 0.94; 12e6; 31; 30e9");
    const double xh = 1.821312 * std::pow(2.0, -0.25);
    const double yh = 0.40796;
    const double fh = 1.029 * yh - 0.065 * xh - 0.245 * yh * yh + 0.0018 * xh * xh + 0.0215 * yh * yh * yh;
    CHECK(test::call("FCHART_F", args({x, y})) == test::rel(fh, 1e-13));
}
