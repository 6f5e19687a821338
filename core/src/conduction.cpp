#include "solarith/conduction.hpp"

#include "solarith/constants.hpp"
#include "solarith/errors.hpp"

#include <boost/math/special_functions/bessel.hpp>
#include <boost/math/special_functions/erf.hpp>

#include <algorithm>
#include <cmath>
#include <string>

namespace solarith::conduction {

using constants::pi;

namespace {

// ln(r_outer/r_inner) without losing digits when the radii are close.
double log_radius_ratio(double r_inner, double r_outer)
{
    return std::log1p((r_outer - r_inner) / r_inner);
}

void require_outer_above_inner(const char* fn, double r_inner, double r_outer)
{
    if (!(r_outer > r_inner))
        fail_domain(fn, "r_outer", r_outer, "the values above r_inner = " + format_number(r_inner));
}

void require_outer_not_below_inner(const char* fn, double r_inner, double r_outer)
{
    if (!(r_outer >= r_inner))
        fail_domain(fn, "r_outer", r_outer, "the values from r_inner = " + format_number(r_inner) + " up");
}

// Fin parameter m = √(2h/(k·t)) in 1/m, of a thin fin cooled on both faces.
double fin_parameter(double h, double conductivity, double thickness)
{
    return std::sqrt(2.0 * h / (conductivity * thickness));
}

// tanh(x)/x for x = m·L >= 0: the efficiency of a straight fin with an
// adiabatic tip. Below 1e-4 the series 1 − x²/3 + 2x⁴/15 (truncation
// < 1e-25) avoids 0/0 and a rounded quotient just above 1.
double tanh_ratio(double x)
{
    if (x < 1e-4) {
        const double x2 = x * x;
        return 1.0 - x2 / 3.0 + 2.0 * x2 * x2 / 15.0;
    }
    return std::tanh(x) / x;  // x = +inf gives 1/inf = 0, the limit
}

// Exponentially scaled modified Bessel functions of order 0 and 1:
//   scaled_i(ν, x) = e^(−x)·I_ν(x),  scaled_k(ν, x) = e^(x)·K_ν(x),  x > 0.
// Below `asymptotic_from` Boost.Math gives I and K directly (I_1(500) is
// about 1e215, far from overflow). Above it the Hankel expansion for large
// argument is used (Abramowitz & Stegun 1964, eqs. 9.7.1 and 9.7.2):
//   I_ν(x) ≈ e^x/√(2πx) · Σ (−1)^k a_k(ν)/x^k,  K_ν(x) ≈ √(π/(2x))·e^(−x) · Σ a_k(ν)/x^k,
//   a_k(ν) = (4ν² − 1²)(4ν² − 3²)…(4ν² − (2k−1)²)/(k!·8^k).
// At x >= 500 the terms fall below 1e-17 of the sum within 8 terms; the
// exponentially small second term of I (relative size e^(−2x)) is dropped.
constexpr double asymptotic_from = 500.0;

// Σ (±1)^k a_k(ν)/x^k, alternating in sign for I, all of one sign for K.
double hankel_sum(int order, double x, bool alternating)
{
    const double four_nu_sq = 4.0 * order * order;
    double term = 1.0;
    double sum = 1.0;
    for (int k = 1; k <= 40; ++k) {
        const double odd = 2.0 * k - 1.0;
        term *= (four_nu_sq - odd * odd) / (8.0 * k * x);
        sum += alternating && (k % 2 == 1) ? -term : term;
        if (std::fabs(term) < 1e-17 * std::fabs(sum))
            break;
    }
    return sum;
}

double scaled_i(int order, double x)
{
    if (x < asymptotic_from)
        return boost::math::cyl_bessel_i(order, x) * std::exp(-x);
    return hankel_sum(order, x, true) / std::sqrt(2.0 * pi * x);
}

double scaled_k(int order, double x)
{
    if (x < asymptotic_from)
        return boost::math::cyl_bessel_k(order, x) * std::exp(x);
    return hankel_sum(order, x, false) * std::sqrt(pi / (2.0 * x));
}

}  // namespace

double wall_heat_flow(double conductivity, double area, double thickness, double t1_celsius,
                      double t2_celsius)
{
    constexpr const char* fn = "COND_WALL";
    check::positive(fn, "conductivity", conductivity);
    check::non_negative(fn, "area", area);
    check::positive(fn, "thickness", thickness);
    check::celsius(fn, "T1", t1_celsius);
    check::celsius(fn, "T2", t2_celsius);
    return conductivity * area * (t1_celsius - t2_celsius) / thickness;
}

double shell_heat_flow(double conductivity, double length, double r_inner, double r_outer,
                       double t_inner_celsius, double t_outer_celsius)
{
    constexpr const char* fn = "COND_SHELL";
    check::positive(fn, "conductivity", conductivity);
    check::non_negative(fn, "length", length);
    check::positive(fn, "r_inner", r_inner);
    check::finite(fn, "r_outer", r_outer);
    require_outer_above_inner(fn, r_inner, r_outer);
    check::celsius(fn, "T_inner", t_inner_celsius);
    check::celsius(fn, "T_outer", t_outer_celsius);
    return 2.0 * pi * conductivity * length * (t_inner_celsius - t_outer_celsius)
           / log_radius_ratio(r_inner, r_outer);
}

double wall_resistance(double thickness, double conductivity, double area)
{
    constexpr const char* fn = "COND_R_WALL";
    check::non_negative(fn, "thickness", thickness);
    check::positive(fn, "conductivity", conductivity);
    check::positive(fn, "area", area);
    return thickness / (conductivity * area);
}

double shell_resistance(double r_inner, double r_outer, double conductivity, double length)
{
    constexpr const char* fn = "COND_R_SHELL";
    check::positive(fn, "r_inner", r_inner);
    check::finite(fn, "r_outer", r_outer);
    require_outer_not_below_inner(fn, r_inner, r_outer);
    check::positive(fn, "conductivity", conductivity);
    check::positive(fn, "length", length);
    return log_radius_ratio(r_inner, r_outer) / (2.0 * pi * conductivity * length);
}

double layers_resistance(const std::vector<double>& thicknesses,
                         const std::vector<double>& conductivities, double area)
{
    constexpr const char* fn = "COND_R_LAYERS";
    if (thicknesses.size() != conductivities.size())
        fail_domain(fn, "thicknesses has " + std::to_string(thicknesses.size()) + " cells and conductivities "
                            + std::to_string(conductivities.size())
                            + "; each layer needs one thickness and one conductivity");
    if (thicknesses.empty())
        fail_domain(fn, "thicknesses is empty; at least one layer is needed");
    check::positive(fn, "area", area);
    double sum = 0;  // Σ L_i/k_i, m²·K/W
    for (std::size_t i = 0; i < thicknesses.size(); ++i) {
        const std::string cell = " (layer " + std::to_string(i + 1) + ")";
        check::non_negative(fn, ("thicknesses" + cell).c_str(), thicknesses[i]);
        check::positive(fn, ("conductivities" + cell).c_str(), conductivities[i]);
        sum += thicknesses[i] / conductivities[i];
    }
    return sum / area;
}

double straight_fin_efficiency(double h, double conductivity, double thickness, double fin_length)
{
    constexpr const char* fn = "COND_FIN_EFF";
    check::non_negative(fn, "h", h);
    check::positive(fn, "conductivity", conductivity);
    check::positive(fn, "thickness", thickness);
    check::non_negative(fn, "fin_length", fin_length);
    // h = 0 or L = 0 give m·L = 0 and η = 1: the whole fin is at the base temperature.
    return tanh_ratio(fin_parameter(h, conductivity, thickness) * fin_length);
}

double annular_fin_efficiency(double h, double conductivity, double thickness, double r_inner,
                              double r_outer)
{
    constexpr const char* fn = "COND_ANNULAR_FIN_EFF";
    check::non_negative(fn, "h", h);
    check::positive(fn, "conductivity", conductivity);
    check::positive(fn, "thickness", thickness);
    check::positive(fn, "r_inner", r_inner);
    check::finite(fn, "r_outer", r_outer);
    require_outer_not_below_inner(fn, r_inner, r_outer);

    const double m = fin_parameter(h, conductivity, thickness);
    const double a = m * r_inner;
    const double b = m * r_outer;
    constexpr double largest_mr = 1e12;
    if (!(b <= largest_mr))
        fail_domain(fn, "m·r_outer = " + format_number(b) + " with m = √(2h/(k·t)) = " + format_number(m)
                            + " 1/m is outside 0..1e12, the range the method is evaluated over");
    const double d = m * (r_outer - r_inner);  // m·(fin length)

    // The difference of Bessel products below loses about 1e-16/(m·L) of its
    // value (L = r2 − r1). For m·L < 1e-6 the straight-fin value is used
    // instead: both are 1 − O((m·L)²), and they differ by about
    // (m·L)²·(ln(r2/r1)/2 + 1/3) < 1e-12·(1 + ln(r2/r1)). Measured against a 35-digit
    // evaluation (tests/reference/annular_fin_efficiency.txt) the relative
    // error is below 1e-14 + 1e-15/(m·L), at worst 1.3e-10 near m·L = 1e-6.
    if (d < 1e-6)
        return tanh_ratio(d);

    // Both brackets of the formula multiplied by e^(a−b) and written with
    // scaled functions; e^(2(a−b)) <= 1, so nothing overflows.
    const double e = std::exp(-2.0 * d);
    const double numerator = scaled_k(1, a) * scaled_i(1, b) - e * scaled_i(1, a) * scaled_k(1, b);
    const double denominator = e * scaled_i(0, a) * scaled_k(1, b) + scaled_k(0, a) * scaled_i(1, b);
    // 2·r1/(m·(r2² − r1²)) = 2a/(d·(a + b))
    const double eta = 2.0 * a / (d * (a + b)) * numerator / denominator;
    return std::clamp(eta, 0.0, 1.0);  // rounding near m·L = 1e-6 can exceed 1 by ~1e-10
}

double critical_radius_cylinder(double conductivity, double h)
{
    constexpr const char* fn = "COND_CRITICAL_RADIUS";
    check::positive(fn, "conductivity", conductivity);
    check::positive(fn, "h", h);
    return conductivity / h;
}

double lumped_temperature(double t_start_celsius, double t_fluid_celsius, double h, double area,
                          double volume, double density, double cp, double time_s)
{
    constexpr const char* fn = "COND_LUMPED_TEMP";
    check::celsius(fn, "T_start", t_start_celsius);
    check::celsius(fn, "T_fluid", t_fluid_celsius);
    check::non_negative(fn, "h", h);
    check::non_negative(fn, "area", area);
    check::positive(fn, "volume", volume);
    check::positive(fn, "density", density);
    check::positive(fn, "cp", cp);
    check::non_negative(fn, "time_s", time_s);
    if (h == 0 || area == 0 || time_s == 0)  // no exchange yet
        return t_start_celsius;
    // t/τ with τ = ρ·V·cp/(h·A), summed in logarithms so that extreme but
    // valid inputs cannot form 0·inf or inf/inf.
    const double log_t_over_tau = std::log(h) + std::log(area) + std::log(time_s) - std::log(density)
                                  - std::log(volume) - std::log(cp);
    const double decay = std::exp(-std::exp(log_t_over_tau));
    return t_fluid_celsius + (t_start_celsius - t_fluid_celsius) * decay;
}

double semi_infinite_temperature(double t_initial_celsius, double t_surface_celsius,
                                 double diffusivity, double depth, double time_s)
{
    constexpr const char* fn = "COND_SEMI_INF_TEMP";
    check::celsius(fn, "T_initial", t_initial_celsius);
    check::celsius(fn, "T_surface", t_surface_celsius);
    check::positive(fn, "diffusivity", diffusivity);
    check::non_negative(fn, "depth", depth);
    check::non_negative(fn, "time_s", time_s);
    if (depth == 0)
        return t_surface_celsius;  // the boundary condition, from the step on
    const double penetration = 2.0 * std::sqrt(diffusivity) * std::sqrt(time_s);  // 2√(αt), m
    const double eta = depth / penetration;  // +inf at t = 0
    // erfc(27) < 1e-318: beyond that the change has not arrived in double precision.
    if (!(eta < 27.0))
        return t_initial_celsius;
    return t_initial_celsius + (t_surface_celsius - t_initial_celsius) * boost::math::erfc(eta);
}

}  // namespace solarith::conduction
