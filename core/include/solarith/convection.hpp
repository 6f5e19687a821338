// Convective heat transfer. Temperatures in °C, h in W/(m²·K), areas in m².
// (The correlations for h, CONV_WIND_COEFF, NU_* ..., follow in a later issue.)
#pragma once

namespace solarith::convection {

// Heat flow from a surface to the fluid around it, W:
//   q = h·A·(T_surface − T_fluid),
// Newton's law of cooling (Newton 1701) as written in F.P. Incropera et al.,
// Fundamentals of Heat and Mass Transfer, 6th ed., 2007, eq. 1.3a (from memory).
// Negative when the fluid is the warmer. h >= 0, A >= 0, T >= -273.15 °C.
double newton_heat_flow(double h, double area, double t_surface_celsius, double t_fluid_celsius);

}  // namespace solarith::convection
