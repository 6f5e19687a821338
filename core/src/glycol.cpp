// Glycol–water mixtures (1,2-propanediol or 1,2-ethanediol in water).
//
// Density, cp, viscosity and thermal conductivity: the brine models of
// M. Conde, "Thermophysical properties of brines — Models", M. Conde
// Engineering, Zurich, 2002 (revised 2011), section on glycol solutions:
//   Y(ξ, T) = A1 + A2·ξ + A3·θ + A4·ξ·θ + A5·θ²,  θ = 273.15 K / T,
// ξ the mass fraction of glycol, Y the density in kg/m³, cp in kJ/(kg·K),
// the conductivity in W/(m·K), or ln(μ / Pa·s) for the viscosity. The
// coefficients A1..A5 below are quoted from memory of Conde's tables and
// were checked only indirectly: at ξ = 0 they reproduce water (IAPWS, 101325
// Pa) over 0..40 °C within 0.21 % (density), 0.99 % (cp), 1.65 %
// (conductivity) and 4.3 % (viscosity); they agree with ASHRAE's densities of
// ethylene glycol solutions (30 and 50 % by volume, 4..38 °C) within 1 %;
// and at ξ = 0.5, 20 °C they give the handbook values of common practice to a
// few per cent (tests/unit/test_glycol.cpp). Above 40 °C the model's water limit departs quickly
// (propylene glycol: viscosity +8 % at 50 °C, +20 % at 70 °C, +48 % at
// 100 °C), a sign that the data behind the fit end near there; Conde's own
// stated range is not recalled. So the range here stops at 40 °C.
//
// Fraction 0 equals water: from 0 °C up every property is the IAPWS value of
// water at 101325 Pa (water::default_pressure) times the model's ratio
// Y(ξ, T)/Y(0, T) (for the viscosity, exp of the difference of the
// logarithms). So the model supplies only the change that the glycol makes,
// and at ξ = 0 the result is water's to the last bit. Below 0 °C, where only
// mixtures are liquid, the factor water/Y(0, ·) is held at its 0 °C value.
//
// Freezing point: ASHRAE Handbook — Fundamentals (SI), 2009, chapter 31
// (Physical properties of secondary coolants), Table 4 (ethylene glycol) and
// Table 9 (propylene glycol), mass-% rows at 5 % steps (propylene) and 10 %
// steps (ethylene), quoted from memory (about ±0.5 K; ±1 K at 60 %), joined
// by a monotone piecewise cubic Hermite interpolant (Fritsch & Carlson 1980,
// boost::math::interpolators::pchip).
//
// The freezing points of ASHRAE's tables are those of industrially inhibited
// fluids (the inhibitors lower them a little below pure glycol–water).
//
// Range: mass fraction 0..0.6; temperature from the freezing point of the
// mixture up to 40 °C.
#include "solarith/properties.hpp"

#include "properties_internal.hpp"
#include "solarith/constants.hpp"
#include "solarith/errors.hpp"

#include <algorithm>
#include <array>
#include <cctype>
#include <cmath>
#include <string>
#include <vector>

// Boost 1.74's pchip.hpp calls isnan unqualified; make std::isnan visible to it.
using std::isnan;
#include <boost/math/interpolators/pchip.hpp>

namespace solarith::glycol {
namespace {

constexpr double fraction_max = 0.6;
constexpr double t_max = 40.0;  // °C, see the header

// Conde's A1..A5 for one property.
using Coefficients = std::array<double, 5>;

struct Model {
    Coefficients density;       // kg/m³
    Coefficients cp;            // kJ/(kg·K)
    Coefficients conductivity;  // W/(m·K)
    Coefficients ln_viscosity;  // ln(μ / Pa·s)
};

// Conde (2011), glycol solutions (from memory, see the header).
constexpr Model propylene_model{
    {508.41109, -182.40820, 965.76507, 280.29104, -472.22510},
    {4.47642, 0.60863, -0.71497, -1.93855, 0.47873},
    {1.18886, -1.49110, -0.69682, 1.13633, 0.06735},
    {-1.02798, -10.03298, -19.93497, 14.65802, 14.62050},
};
constexpr Model ethylene_model{
    {658.49825, -54.81501, 664.71643, 232.72605, -322.61661},
    {5.36449, 0.78863, -2.59001, -2.73187, 1.43759},
    {0.83818, -1.37620, -0.07629, 1.07720, -0.20174},
    {-4.63024, -2.14817, -12.70106, 5.40536, 10.98990},
};

const Model& model(Kind kind)
{
    return kind == Kind::Propylene ? propylene_model : ethylene_model;
}

// Y(ξ, T) and its temperature derivative dY/dT.
double conde(const Coefficients& a, double fraction, double t_kelvin)
{
    const double theta = 273.15 / t_kelvin;
    return a[0] + a[1] * fraction + (a[2] + a[3] * fraction) * theta + a[4] * theta * theta;
}

double conde_slope(const Coefficients& a, double fraction, double t_kelvin)
{
    const double theta = 273.15 / t_kelvin;
    return -(a[2] + a[3] * fraction + 2 * a[4] * theta) * theta / t_kelvin;
}

// Freezing points (°C) by mass fraction (ASHRAE 2009, chapter 31; from
// memory): propylene glycol (Table 9) at 5 % steps, ethylene glycol (Table 4)
// at 10 % steps (its 5 % rows are not remembered well enough).
const std::vector<double> propylene_nodes{0.0, 0.05, 0.1, 0.15, 0.2, 0.25, 0.3, 0.35, 0.4, 0.45, 0.5, 0.55, 0.6};
const std::vector<double> propylene_freezing{0.0,   -1.6,  -3.3,  -5.1,  -7.1,  -9.6, -12.7,
                                             -16.4, -21.1, -26.7, -33.5, -41.1, -51.1};
const std::vector<double> ethylene_nodes{0.0, 0.1, 0.2, 0.3, 0.4, 0.5, 0.6};
const std::vector<double> ethylene_freezing{0.0, -3.2, -7.8, -14.1, -22.3, -33.8, -48.3};

double freezing_point(double fraction, Kind kind)
{
    using Pchip = boost::math::interpolators::pchip<std::vector<double>>;
    static const Pchip propylene{std::vector<double>(propylene_nodes), std::vector<double>(propylene_freezing)};
    static const Pchip ethylene{std::vector<double>(ethylene_nodes), std::vector<double>(ethylene_freezing)};
    return kind == Kind::Propylene ? propylene(fraction) : ethylene(fraction);
}

const char* kind_name(Kind kind)
{
    return kind == Kind::Propylene ? "propylene" : "ethylene";
}

struct Names {
    const char* function;
    const char* temperature;
    const char* fraction;
};

void check_fraction(const Names& names, double fraction)
{
    if (!(fraction >= 0 && fraction <= fraction_max))
        fail_domain(names.function, names.fraction, fraction, "0..0.6 (mass fraction of glycol)");
}

// Checks both inputs; gives the temperature in kelvin.
double checked_kelvin(const Names& names, double t_celsius, double fraction, Kind kind)
{
    check_fraction(names, fraction);
    const double t_freeze = freezing_point(fraction, kind);
    if (!(t_celsius >= t_freeze && t_celsius <= t_max))
        fail_domain(names.function, names.temperature, t_celsius,
                    format_number(t_freeze) + "..40 °C: from the freezing point of " + format_number(fraction * 100)
                        + " % " + kind_name(kind) + " glycol in water up to 40 °C (range of the mixture model)");
    return constants::kelvin(t_celsius);
}

// The model scaled to water: Y(ξ, T)·W(T*)/Y(0, T*), T* = max(T, 0 °C),
// W the IAPWS value for water at 101325 Pa. From 0 °C up this is water times
// the model's ratio Y(ξ, T)/Y(0, T), and exactly water at ξ = 0. Below 0 °C
// (reached only by mixtures, whose freezing point lies lower) water is not
// liquid, and the correction factor is held at its 0 °C value, which keeps
// the property continuous.
double scaled(const Coefficients& a, double water_value_at_t_star, double fraction, double t_kelvin)
{
    const double t_star = std::max(t_kelvin, constants::zero_celsius_in_kelvin);
    // The ratio first: at ξ = 0 (T* = T) it is exactly 1, and so the result is water's.
    return water_value_at_t_star * (conde(a, fraction, t_kelvin) / conde(a, 0, t_star));
}

double t_star_celsius(double t_celsius)
{
    return std::max(t_celsius, 0.0);
}

double water_pressure(double t_celsius)
{
    return water::default_pressure(t_star_celsius(t_celsius));
}

double mixture_density(double t_kelvin, double t_celsius, double fraction, Kind kind)
{
    const double t = t_star_celsius(t_celsius);
    return scaled(model(kind).density, water::density(t, water_pressure(t)), fraction, t_kelvin);
}

double mixture_cp(double t_kelvin, double t_celsius, double fraction, Kind kind)
{
    const double t = t_star_celsius(t_celsius);
    // Conde's cp is in kJ/(kg·K); only its ratio enters.
    return scaled(model(kind).cp, water::cp(t, water_pressure(t)), fraction, t_kelvin);
}

double mixture_conductivity(double t_kelvin, double t_celsius, double fraction, Kind kind)
{
    const double t = t_star_celsius(t_celsius);
    return scaled(model(kind).conductivity, water::conductivity(t, water_pressure(t)), fraction, t_kelvin);
}

double mixture_viscosity(double t_kelvin, double t_celsius, double fraction, Kind kind)
{
    const double t = t_star_celsius(t_celsius);
    const double t_star = constants::kelvin(t);
    const auto& a = model(kind).ln_viscosity;
    return water::viscosity(t, water_pressure(t)) * std::exp(conde(a, fraction, t_kelvin) - conde(a, 0, t_star));
}

// −(1/ρ)·dρ/dT of mixture_density: −Y'/Y for the model, plus, from 0 °C up,
// the water expansion and the model's own water term Y₀'/Y₀ of the factor.
double mixture_expansion(double t_kelvin, double t_celsius, double fraction, Kind kind)
{
    const auto& a = model(kind).density;
    double alpha = -conde_slope(a, fraction, t_kelvin) / conde(a, fraction, t_kelvin);
    if (t_celsius >= 0)
        alpha += water::expansion(t_celsius, water_pressure(t_celsius))
                 + conde_slope(a, 0, t_kelvin) / conde(a, 0, t_kelvin);
    return alpha;
}

}  // namespace

Kind parse_kind(const char* function, const char* argument, const std::string& text)
{
    std::string lower;
    for (char c : text)
        lower += static_cast<char>(std::tolower(static_cast<unsigned char>(c)));
    if (lower == "propylene")
        return Kind::Propylene;
    if (lower == "ethylene")
        return Kind::Ethylene;
    fail_domain(function, std::string(argument) + " = \"" + text + "\" is not \"propylene\" or \"ethylene\"");
}

double freeze_point(double fraction, Kind kind)
{
    check_fraction({"GLYCOL_FREEZE_POINT", "T", "fraction"}, fraction);
    return freezing_point(fraction, kind);
}

double density(double t_celsius, double fraction, Kind kind)
{
    const double t = checked_kelvin({"GLYCOL_DENSITY", "T", "fraction"}, t_celsius, fraction, kind);
    return mixture_density(t, t_celsius, fraction, kind);
}

double cp(double t_celsius, double fraction, Kind kind)
{
    const double t = checked_kelvin({"GLYCOL_CP", "T", "fraction"}, t_celsius, fraction, kind);
    return mixture_cp(t, t_celsius, fraction, kind);
}

double viscosity(double t_celsius, double fraction, Kind kind)
{
    const double t = checked_kelvin({"GLYCOL_VISCOSITY", "T", "fraction"}, t_celsius, fraction, kind);
    return mixture_viscosity(t, t_celsius, fraction, kind);
}

double conductivity(double t_celsius, double fraction, Kind kind)
{
    const double t = checked_kelvin({"GLYCOL_CONDUCTIVITY", "T", "fraction"}, t_celsius, fraction, kind);
    return mixture_conductivity(t, t_celsius, fraction, kind);
}

fluids::Properties properties(const char* function, double t_celsius, double fraction, Kind kind)
{
    const double t = checked_kelvin({function, "fluid temperature", "glycol_fraction"}, t_celsius, fraction, kind);
    return {mixture_density(t, t_celsius, fraction, kind), mixture_cp(t, t_celsius, fraction, kind),
            mixture_viscosity(t, t_celsius, fraction, kind), mixture_conductivity(t, t_celsius, fraction, kind),
            mixture_expansion(t, t_celsius, fraction, kind)};
}

}  // namespace solarith::glycol
