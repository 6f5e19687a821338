// Thermal radiation: black and grey bodies, exchange between surfaces,
// sky temperature and view factors. Temperatures in °C (converted to K
// inside), wavelengths in µm, fluxes in W/m².
#pragma once

namespace solarith::radiation {

// Emissive power of a grey body, E = emissivity·sigma·T⁴, W/m².
// Stefan–Boltzmann law (Stefan 1879, Boltzmann 1884); sigma from CODATA 2018.
// Valid for T >= -273.15 °C, emissivity 0..1.
double emissive_power(double t_celsius, double emissivity);

}  // namespace solarith::radiation
