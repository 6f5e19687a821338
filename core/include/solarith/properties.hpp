// Thermophysical properties of the working fluids: liquid water, dry air and
// glycol–water mixtures. Temperatures in °C, pressures in Pa, SI results.
// Each function checks its own validity range and raises DomainError naming
// its spreadsheet function (e.g. WATER_DENSITY), also when another function
// (a correlation, a loss model) calls it. fluids::at names the calling
// function instead.
#pragma once

#include <string>

namespace solarith::water {

// Liquid water, 0..200 °C, from 0 °C (273.15 K, the lower bound of IF97
// region 1) to 200 °C. pressure_pa must lie between the saturation pressure
// at T (below it the water would be steam; up to 1e-9 below counts as
// rounding and is accepted) and 100 MPa (the upper bound of IF97 region 1);
// NaN is refused. default_pressure(T) is the catalogue's
// default: 101325 Pa, or the saturation pressure where that is higher
// (above 99.97 °C the default state is saturated liquid).
//
// Sources:
//   [IF97]  IAPWS R7-97(2012), Revised Release on the IAPWS Industrial
//           Formulation 1997 for the Thermodynamic Properties of Water and
//           Steam (Wagner et al., J. Eng. Gas Turbines Power 122, 2000, 150–182).
//           Region 1: Gibbs free energy γ(π, τ) = Σ nᵢ (7.1 − π)^Iᵢ (τ − 1.222)^Jᵢ,
//           π = p/16.53 MPa, τ = 1386 K/T, R = 461.526 J/(kg·K) (eqs. 7, Table 2);
//           v = π·γ_π·R·T/p, cp = −τ²·γ_ττ·R, α_v = (1 − τ·γ_πτ/γ_π)/T (Table 3).
//           Region 2 (vapour): γ = ln π + Σ n⁰ᵢ τ^J⁰ᵢ + Σ nᵢ π^Iᵢ (τ − 0.5)^Jᵢ,
//           π = p/1 MPa, τ = 540 K/T (eqs. 15–17, Tables 10, 11).
//           Region 4 (saturation line): eqs. 30 and 31, Table 34.
//   [V08]   IAPWS R12-08, Release on the IAPWS Formulation 2008 for the
//           Viscosity of Ordinary Water Substance (Huber et al., J. Phys. Chem.
//           Ref. Data 38, 2009, 101–125): μ = μ₀(T̄)·μ₁(T̄, ρ̄)·μ₂, eqs. 10–12.
//           The critical enhancement μ₂ differs from 1 only within
//           645.91 K < T < 650.77 K and 245.8 < ρ < 405.3 kg/m³ (release §2.3),
//           far from 0..200 °C liquid: μ₂ = 1 here, exactly as the release allows.
//   [K11]   IAPWS R15-11, Release on the IAPWS Formulation 2011 for the
//           Thermal Conductivity of Ordinary Water Substance (Huber et al.,
//           J. Phys. Chem. Ref. Data 41, 2012, 033102): λ = λ₀(T̄)·λ₁(T̄, ρ̄) + λ₂,
//           eqs. 10, 16, 17. The critical enhancement λ₂ is left out: in
//           0..200 °C liquid it is zero below about 150 °C (its Δχ̄ is
//           negative there) and grows to 0.22 % of λ at 200 °C (measured
//           against python3-iapws, which includes it through the release's
//           industrial formulation; tests/reference/water_iapws95.txt).
//   Density for V08 and K11 comes from IF97 region 1 (the releases are
//   written for IAPWS-95 densities; IF97 differs from IAPWS-95 by at most
//   1.7e-5 in density here, and μ by 2.8e-5; measured with python3-iapws).
double default_pressure(double t_celsius);
// The same, naming `function` (and its argument "T") when T is out of range.
double default_pressure(const char* function, double t_celsius);
double density(double t_celsius, double pressure_pa);       // kg/m³, IF97 region 1
double cp(double t_celsius, double pressure_pa);            // J/(kg·K), IF97 region 1
double viscosity(double t_celsius, double pressure_pa);     // Pa·s, V08
double conductivity(double t_celsius, double pressure_pa);  // W/(m·K), K11
double prandtl(double t_celsius, double pressure_pa);       // –, μ·cp/λ
// Volumetric thermal expansion coefficient −(1/ρ)(∂ρ/∂T)_p, 1/K (IF97 region 1).
double expansion(double t_celsius, double pressure_pa);
// Saturation pressure at 0..200 °C, Pa (IF97 eq. 30).
double saturation_pressure(double t_celsius);
// Saturation temperature, °C, for the saturation pressures of 0..200 °C,
// 611.213 Pa..1.55467 MPa (IF97 eq. 31).
double saturation_temperature(double pressure_pa);
// Latent heat of evaporation at saturation, 0..200 °C, J/kg:
// h''(T, p_s) − h'(T, p_s) with h'' from IF97 region 2 and h' from region 1
// at p_s = saturation_pressure(T).
double latent_heat(double t_celsius);

// The formulations themselves, in kelvin and pascal, without range checks
// (callers check; the tests compare them with the releases' verification
// tables).
namespace formulation {

struct State {
    double v;          // specific volume, m³/kg
    double h;          // specific enthalpy, J/kg
    double u;          // specific internal energy, J/kg
    double s;          // specific entropy, J/(kg·K)
    double cp;         // isobaric heat capacity, J/(kg·K)
    double w;          // speed of sound, m/s
    double expansion;  // volumetric expansion coefficient α_v, 1/K
};

State region1(double t_kelvin, double p_pa);               // IF97 region 1 (liquid)
State region2(double t_kelvin, double p_pa);               // IF97 region 2 (vapour)
double saturation_pressure(double t_kelvin);               // IF97 eq. 30, Pa
double saturation_temperature(double p_pa);                // IF97 eq. 31, K
double viscosity(double t_kelvin, double density);         // V08 with μ₂ = 1, Pa·s
double conductivity(double t_kelvin, double density);      // K11 without λ₂, W/(m·K)

}  // namespace formulation
}  // namespace solarith::water

namespace solarith::air {

// Dry air, -50..500 °C.
//   Density: ideal gas, ρ = p·M/(R·T), M = 28.9586 g/mol (the dry-air
//     composition of Lemmon et al. 2000, below), R = N_A·k (CODATA 2018),
//     0 < pressure <= 200 kPa: there the ideal gas is within 0.32 % of the
//     real-gas density of Lemmon et al. 2000 (worst at −50 °C and 200 kPa;
//     0.16 % at 101325 Pa; measured with python3-iapws 1.5.3).
//   cp: ideal-gas heat capacity from the ideal-gas Helmholtz energy of
//     E.W. Lemmon, R.T. Jacobsen, S.G. Penoncello, D.G. Friend, "Thermodynamic
//     properties of air and mixtures of nitrogen, argon and oxygen from 60 to
//     2000 K at pressures to 2000 MPa", J. Phys. Chem. Ref. Data 29 (2000)
//     331–385, eq. 24 and Table 13: cp⁰/R = 1 − τ²·∂²α⁰/∂τ², τ = 132.6312 K/T.
//     The real gas at 101325 Pa has a cp higher by 0.016 % (500 °C) to 0.33 %
//     (−50 °C) (Lemmon et al. 2000 full equation of state, python3-iapws).
//   Viscosity and conductivity: E.W. Lemmon, R.T. Jacobsen, "Viscosity and
//     thermal conductivity equations for nitrogen, oxygen, argon, and air",
//     Int. J. Thermophys. 25 (2004) 21–69, eqs. 1–6 and Tables I–IV for air:
//     the dilute-gas terms (Chapman–Enskog collision integral, σ = 0.360 nm,
//     ε/k = 103.3 K) plus the residual terms at the density of air at
//     101325 Pa (ideal gas, as AIR_DENSITY); the critical enhancement of the
//     conductivity is left out (at 101325 Pa at most 1.7e-6 of λ over
//     −50..500 °C, measured with python3-iapws).
double density(double t_celsius, double pressure_pa);  // kg/m³
double cp(double t_celsius);                           // J/(kg·K)
double viscosity(double t_celsius);                    // Pa·s, at 101325 Pa
double conductivity(double t_celsius);                 // W/(m·K), at 101325 Pa
double prandtl(double t_celsius);                      // –, μ·cp/λ

}  // namespace solarith::air

namespace solarith::glycol {

enum class Kind { Propylene, Ethylene };

// "propylene" or "ethylene" (any case); anything else is a DomainError of
// `function` naming `argument`.
Kind parse_kind(const char* function, const char* argument, const std::string& text);

// Mixtures with water, mass fraction of glycol 0..0.6, from the freezing
// point of the mixture up to 40 °C (the range of the data). At fraction 0
// they equal water at 101325 Pa exactly. Model: Conde (2002/2011) brine
// correlations scaled to IAPWS water; freezing points from ASHRAE (2009)
// ch. 31; sources and method in glycol.cpp's header comment.
double density(double t_celsius, double fraction, Kind kind);       // kg/m³
double cp(double t_celsius, double fraction, Kind kind);            // J/(kg·K)
double viscosity(double t_celsius, double fraction, Kind kind);     // Pa·s
double conductivity(double t_celsius, double fraction, Kind kind);  // W/(m·K)
double freeze_point(double fraction, Kind kind);                    // °C

}  // namespace solarith::glycol

namespace solarith::fluids {

// The properties a convection correlation needs, for the fluid names the
// catalogue accepts: "water", "air", "propylene", "ethylene" (any case;
// glycol mixtures take glycol_fraction 0..0.6; water and air must have it
// omitted (NaN) or 0). Air at 101325 Pa, water at its default pressure.
// Expansion: air 1/T (ideal gas, T in K), water from IF97, glycol mixtures
// −(1/ρ)·∂ρ/∂T of their density. Messages name `function` and the
// "fluid temperature", "fluid" or "glycol_fraction".
struct Properties {
    double density;       // kg/m³
    double cp;            // J/(kg·K)
    double viscosity;     // Pa·s, dynamic
    double conductivity;  // W/(m·K)
    double expansion;     // 1/K, volumetric
    double prandtl() const { return viscosity * cp / conductivity; }
    double kinematic_viscosity() const { return viscosity / density; }
    double diffusivity() const { return conductivity / (density * cp); }
};

Properties at(const char* function, const std::string& fluid, double t_celsius, double glycol_fraction);

}  // namespace solarith::fluids
