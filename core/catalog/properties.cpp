// Catalogue entries of the fluid-property family (WATER_*, AIR_*, GLYCOL_*).
#include "solarith/catalog.hpp"
#include "solarith/properties.hpp"

#include <cmath>

namespace solarith::catalog {
namespace {

constexpr const char* family = "Fluid properties";

// Water's pressure argument: omitted means water::default_pressure(T).
double water_pressure(const Args& a, double t_celsius)
{
    const auto given = a.optional_number(1);
    return given ? *given : water::default_pressure(std::string(a.spec().name).c_str(), t_celsius);
}

const ArgSpec water_t{"T", ArgKind::Number, "°C", "Temperature of the liquid water, 0..200"};
const ArgSpec water_p{"pressure", ArgKind::OptionalNumber, "Pa",
                      "Absolute pressure, from the saturation pressure at T (below it the water is steam) up to "
                      "100 MPa; when omitted 101325, or the saturation pressure where that is higher",
                      NAN};

#define WATER_RANGE                                                                                           \
    " Valid for liquid water at 0..200 °C and pressures from the saturation pressure at T (below it the water "   \
    "is steam) up to 100 MPa (IF97 region 1); pressure omitted: 101325 Pa, or the saturation pressure where "     \
    "that is higher (above 99.97 °C the default state is saturated liquid)."

const ArgSpec air_t{"T", ArgKind::Number, "°C", "Temperature of the dry air, -50..500"};
const ArgSpec glycol_t{"T", ArgKind::Number, "°C",
                       "Temperature of the mixture, from its freezing point (GLYCOL_FREEZE_POINT) up to 40"};
const ArgSpec glycol_x{"fraction", ArgKind::Number, "–", "Mass fraction of glycol in the mixture, 0..0.6"};
const ArgSpec glycol_type{"type", ArgKind::OptionalText, "", "\"propylene\" or \"ethylene\" glycol", 0,
                          "propylene"};

#define GLYCOL_METHOD                                                                                         \
    " Model: M. Conde, Thermophysical properties of brines — Models (M. Conde Engineering, Zurich, 2002, rev. 2011), " \
    "Y = A1 + A2·ξ + A3·θ + A4·ξ·θ + A5·θ², θ = 273.15 K/T, ξ = mass fraction (coefficients quoted from memory). " \
    "Scaled to water: from 0 °C up the result is the IAPWS value for water at 101325 Pa times Y(ξ, T)/Y(0, T), " \
    "so fraction 0 gives water exactly; below 0 °C (mixtures only) the factor water/Y(0) is held at its 0 °C " \
    "value. Valid for mass fraction 0..0.6 and temperatures from the freezing point of the mixture (ASHRAE " \
    "Handbook—Fundamentals 2009, ch. 31, Tables 4 and 9) up to 40 °C: above it the model's own water limit " \
    "departs (propylene glycol viscosity +8 % at 50 °C), a sign that its data end there. Inhibitors of " \
    "commercial fluids are not included; expect differences of a few per cent from a product's data sheet."

glycol::Kind glycol_kind(const Args& a, std::size_t index)
{
    return glycol::parse_kind(std::string(a.spec().name).c_str(), "type", a.text(index));
}

}  // namespace

std::vector<FunctionSpec> properties_functions()
{
    return {
        {"WATER_DENSITY", family, "Density of liquid water at temperature T and pressure (IAPWS-IF97).", "kg/m³",
         ResultKind::Number,
         "ρ = 1/v, v = π·γ_π·R·T/p from the Gibbs free energy of IAPWS-IF97 region 1 (IAPWS R7-97(2012), eq. 7, "
         "Tables 2 and 3), R = 461.526 J/(kg·K)." WATER_RANGE,
         {water_t, water_p}, "60",
         [](const Args& a) -> Result {
             const double t = a.number(0);
             return water::density(t, water_pressure(a, t));
         }},
        {"WATER_CP", family, "Isobaric specific heat capacity of liquid water at temperature T and pressure (IAPWS-IF97).",
         "J/(kg·K)", ResultKind::Number,
         "cp = −τ²·γ_ττ·R from the Gibbs free energy of IAPWS-IF97 region 1 (IAPWS R7-97(2012), eq. 7, Tables 2 "
         "and 3), R = 461.526 J/(kg·K)." WATER_RANGE,
         {water_t, water_p}, "60; 500000",
         [](const Args& a) -> Result {
             const double t = a.number(0);
             return water::cp(t, water_pressure(a, t));
         }},
        {"WATER_VISCOSITY", family, "Dynamic viscosity of liquid water at temperature T and pressure (IAPWS 2008).",
         "Pa·s", ResultKind::Number,
         "μ = μ₀(T̄)·μ₁(T̄, ρ̄), IAPWS R12-08 (Huber et al., J. Phys. Chem. Ref. Data 38, 2009), eqs. 10–12; the "
         "critical enhancement μ₂ is 1 outside 645.91..650.77 K (release §2.3), so exactly 1 here. Density from "
         "IAPWS-IF97 region 1." WATER_RANGE,
         {water_t, water_p}, "60",
         [](const Args& a) -> Result {
             const double t = a.number(0);
             return water::viscosity(t, water_pressure(a, t));
         }},
        {"WATER_CONDUCTIVITY", family,
         "Thermal conductivity of liquid water at temperature T and pressure (IAPWS 2011).", "W/(m·K)",
         ResultKind::Number,
         "λ = λ₀(T̄)·λ₁(T̄, ρ̄), IAPWS R15-11 (Huber et al., J. Phys. Chem. Ref. Data 41, 2012), eqs. 10, 16, 17; "
         "the critical enhancement λ₂ is left out: it is zero below about 150 °C and at most 0.22 % of λ at "
         "200 °C (measured against python3-iapws, which includes it). Density from IAPWS-IF97 region 1." WATER_RANGE,
         {water_t, water_p}, "60",
         [](const Args& a) -> Result {
             const double t = a.number(0);
             return water::conductivity(t, water_pressure(a, t));
         }},
        {"WATER_PRANDTL", family, "Prandtl number of liquid water at temperature T and pressure.", "–",
         ResultKind::Number,
         "Pr = μ·cp/λ with μ from IAPWS R12-08, cp from IAPWS-IF97 region 1 and λ from IAPWS R15-11 (as "
         "WATER_VISCOSITY, WATER_CP, WATER_CONDUCTIVITY)." WATER_RANGE,
         {water_t, water_p}, "60",
         [](const Args& a) -> Result {
             const double t = a.number(0);
             return water::prandtl(t, water_pressure(a, t));
         }},
        {"WATER_SAT_PRESSURE", family, "Saturation (boiling) pressure of water at temperature T.", "Pa",
         ResultKind::Number,
         "Saturation-pressure equation of IAPWS-IF97 region 4 (IAPWS R7-97(2012), eq. 30, Table 34). Valid here "
         "for 0..200 °C (IF97 itself goes on to the critical point).",
         {{"T", ArgKind::Number, "°C", "Temperature, 0..200"}}, "100",
         [](const Args& a) -> Result { return water::saturation_pressure(a.number(0)); }},
        {"WATER_SAT_TEMP", family, "Saturation (boiling) temperature of water at a given pressure.", "°C",
         ResultKind::Number,
         "Saturation-temperature equation of IAPWS-IF97 region 4 (IAPWS R7-97(2012), eq. 31, Table 34). Valid for "
         "the saturation pressures of 0..200 °C, 611.213 Pa..1.55467 MPa.",
         {{"pressure", ArgKind::Number, "Pa", "Absolute pressure, 611.213..1554672 (saturation at 0..200 °C)"}},
         "101325",
         [](const Args& a) -> Result { return water::saturation_temperature(a.number(0)); }},
        {"WATER_LATENT_HEAT", family, "Latent heat of evaporation of water at temperature T (at saturation).",
         "J/kg", ResultKind::Number,
         "r = h''(T, p_s) − h'(T, p_s): saturated vapour from IAPWS-IF97 region 2 (ideal-gas and residual parts, "
         "eqs. 15–17, Tables 10–12), saturated liquid from region 1, at p_s from the region 4 equation (IAPWS "
         "R7-97(2012)). Valid for 0..200 °C.",
         {{"T", ArgKind::Number, "°C", "Saturation temperature, 0..200"}}, "100",
         [](const Args& a) -> Result { return water::latent_heat(a.number(0)); }},

        {"AIR_DENSITY", family, "Density of dry air at temperature T and pressure (ideal gas).", "kg/m³",
         ResultKind::Number,
         "ρ = p·M/(R·T), ideal gas, M = 28.9586 g/mol (dry-air composition of Lemmon et al. 2000, J. Phys. Chem. "
         "Ref. Data 29, 331–385), R = 8.314462618 J/(mol·K) (CODATA 2018). Valid for -50..500 °C and 0 < pressure "
         "<= 200 kPa, where the ideal gas is within 0.32 % of the real-gas density of Lemmon et al. (2000) "
         "(0.16 % at 101325 Pa).",
         {air_t, {"pressure", ArgKind::OptionalNumber, "Pa", "Absolute pressure, up to 200000", 101325.0}}, "20",
         [](const Args& a) -> Result { return air::density(a.number(0), a.number(1)); }},
        {"AIR_CP", family, "Isobaric specific heat capacity of dry air at temperature T (ideal gas).", "J/(kg·K)",
         ResultKind::Number,
         "cp⁰ = R/M·(1 − τ²·∂²α⁰/∂τ²), τ = 132.6312 K/T, from the ideal-gas Helmholtz energy α⁰ of Lemmon, "
         "Jacobsen, Penoncello & Friend (2000), J. Phys. Chem. Ref. Data 29, 331–385, eq. 24, Table 13; "
         "M = 28.9586 g/mol. The ideal-gas value: at 101325 Pa the real gas is higher by 0.016 % (500 °C) to "
         "0.33 % (-50 °C). Valid for -50..500 °C.",
         {air_t}, "20",
         [](const Args& a) -> Result { return air::cp(a.number(0)); }},
        {"AIR_VISCOSITY", family, "Dynamic viscosity of dry air at temperature T and 101325 Pa.", "Pa·s",
         ResultKind::Number,
         "η = η⁰(T) + ηʳ(τ, δ), Lemmon & Jacobsen (2004), Int. J. Thermophys. 25, 21–69, eqs. 1–3 with the "
         "coefficients for air: dilute-gas term (collision integral with σ = 0.360 nm, ε/k = 103.3 K, "
         "M = 28.9586 g/mol) plus the residual term at the density of air at 101325 Pa (ideal gas). Valid for "
         "-50..500 °C; the pressure dependence is weak (0.1 % per atmosphere at room temperature).",
         {air_t}, "20",
         [](const Args& a) -> Result { return air::viscosity(a.number(0)); }},
        {"AIR_CONDUCTIVITY", family, "Thermal conductivity of dry air at temperature T and 101325 Pa.", "W/(m·K)",
         ResultKind::Number,
         "λ = λ⁰(T) + λʳ(τ, δ), Lemmon & Jacobsen (2004), Int. J. Thermophys. 25, 21–69, eqs. 4–6 with the "
         "coefficients for air: dilute-gas term plus the residual term at the density of air at 101325 Pa (ideal "
         "gas); the critical enhancement is left out (below 2e-6 of λ at 101325 Pa). Valid for -50..500 °C.",
         {air_t}, "20",
         [](const Args& a) -> Result { return air::conductivity(a.number(0)); }},
        {"AIR_PRANDTL", family, "Prandtl number of dry air at temperature T and 101325 Pa.", "–", ResultKind::Number,
         "Pr = η·cp/λ with η and λ from Lemmon & Jacobsen (2004) at 101325 Pa and the ideal-gas cp of Lemmon et al. "
         "(2000), as AIR_VISCOSITY, AIR_CONDUCTIVITY and AIR_CP. Valid for -50..500 °C.",
         {air_t}, "20",
         [](const Args& a) -> Result { return air::prandtl(a.number(0)); }},

        {"GLYCOL_DENSITY", family, "Density of a propylene or ethylene glycol–water mixture.", "kg/m³",
         ResultKind::Number, "Density ρ in kg/m³." GLYCOL_METHOD,
         {glycol_t, glycol_x, glycol_type}, "40; 0.3",
         [](const Args& a) -> Result { return glycol::density(a.number(0), a.number(1), glycol_kind(a, 2)); }},
        {"GLYCOL_CP", family, "Isobaric specific heat capacity of a propylene or ethylene glycol–water mixture.",
         "J/(kg·K)", ResultKind::Number, "Specific heat capacity cp (Conde's Y in kJ/(kg·K); only its ratio enters)." GLYCOL_METHOD,
         {glycol_t, glycol_x, glycol_type}, "40; 0.3; \"propylene\"",
         [](const Args& a) -> Result { return glycol::cp(a.number(0), a.number(1), glycol_kind(a, 2)); }},
        {"GLYCOL_VISCOSITY", family, "Dynamic viscosity of a propylene or ethylene glycol–water mixture.", "Pa·s",
         ResultKind::Number, "Dynamic viscosity μ, with Y = ln(μ/Pa·s) (the ratio becomes exp of a difference)." GLYCOL_METHOD,
         {glycol_t, glycol_x, glycol_type}, "40; 0.3",
         [](const Args& a) -> Result { return glycol::viscosity(a.number(0), a.number(1), glycol_kind(a, 2)); }},
        {"GLYCOL_CONDUCTIVITY", family, "Thermal conductivity of a propylene or ethylene glycol–water mixture.",
         "W/(m·K)", ResultKind::Number, "Thermal conductivity λ in W/(m·K)." GLYCOL_METHOD,
         {glycol_t, glycol_x, glycol_type}, "40; 0.3; \"ethylene\"",
         [](const Args& a) -> Result { return glycol::conductivity(a.number(0), a.number(1), glycol_kind(a, 2)); }},
        {"GLYCOL_FREEZE_POINT", family,
         "Freezing point (first ice crystals) of a propylene or ethylene glycol–water mixture.", "°C",
         ResultKind::Number,
         "Freezing points of ASHRAE Handbook—Fundamentals (SI) 2009, ch. 31, Table 9 (propylene glycol) and Table 4 "
         "(ethylene glycol), mass fractions 0..0.6 in steps of 0.05 (propylene) and 0.1 (ethylene) (quoted from "
         "memory, about ±0.5 K, ±1 K at 0.6; values for industrially inhibited fluids), joined "
         "by a monotone piecewise cubic Hermite interpolant (Fritsch & Carlson 1980). Valid for mass fraction "
         "0..0.6. Freeze protection (slush) and burst protection lie lower; see the fluid maker's data.",
         {glycol_x, glycol_type}, "0.3",
         [](const Args& a) -> Result { return glycol::freeze_point(a.number(0), glycol_kind(a, 1)); }},
    };
}

}  // namespace solarith::catalog
