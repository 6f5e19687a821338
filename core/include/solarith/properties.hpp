// Thermophysical properties of the working fluids: liquid water, dry air and
// glycol–water mixtures. Temperatures in °C, pressures in Pa, SI results.
// Each function checks its own validity range and raises DomainError naming
// its spreadsheet function (e.g. WATER_DENSITY), also when another function
// (a correlation, a loss model) calls it.
#pragma once

#include <string>

namespace solarith::water {

// Liquid water, 0..200 °C. pressure_pa must not lie below the saturation
// pressure at T (the water would be steam). default_pressure(T) is the
// catalogue's default: 101325 Pa, or the saturation pressure where higher.
double default_pressure(double t_celsius);
double density(double t_celsius, double pressure_pa);       // kg/m³
double cp(double t_celsius, double pressure_pa);            // J/(kg·K)
double viscosity(double t_celsius, double pressure_pa);     // Pa·s
double conductivity(double t_celsius, double pressure_pa);  // W/(m·K)
double prandtl(double t_celsius, double pressure_pa);       // –
// Volumetric thermal expansion coefficient −(1/ρ)(∂ρ/∂T)_p, 1/K.
double expansion(double t_celsius, double pressure_pa);
double saturation_pressure(double t_celsius);               // Pa
double saturation_temperature(double pressure_pa);          // °C
double latent_heat(double t_celsius);                       // J/kg, evaporation at saturation

}  // namespace solarith::water

namespace solarith::air {

// Dry air, -50..500 °C; density as an ideal gas at the given pressure.
double density(double t_celsius, double pressure_pa);  // kg/m³
double cp(double t_celsius);                           // J/(kg·K)
double viscosity(double t_celsius);                    // Pa·s
double conductivity(double t_celsius);                 // W/(m·K)
double prandtl(double t_celsius);                      // –

}  // namespace solarith::air

namespace solarith::glycol {

enum class Kind { Propylene, Ethylene };

// "propylene" or "ethylene" (any case); anything else is a DomainError of
// `function` naming `argument`.
Kind parse_kind(const char* function, const char* argument, const std::string& text);

// Mixtures with water, mass fraction of glycol 0..0.6, within the liquid range
// of the source data (above the freezing point). At fraction 0 they agree
// with water at 101325 Pa.
double density(double t_celsius, double fraction, Kind kind);       // kg/m³
double cp(double t_celsius, double fraction, Kind kind);            // J/(kg·K)
double viscosity(double t_celsius, double fraction, Kind kind);     // Pa·s
double conductivity(double t_celsius, double fraction, Kind kind);  // W/(m·K)
double freeze_point(double fraction, Kind kind);                    // °C

}  // namespace solarith::glycol

namespace solarith::fluids {

// The properties a convection correlation needs, for the fluid names the
// catalogue accepts: "water", "air", "propylene", "ethylene" (glycol mixtures
// take glycol_fraction; water and air must have it omitted or 0). Air at
// 101325 Pa, water at its default pressure.
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
