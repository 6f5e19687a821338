// Convective heat transfer. Temperatures in °C, h in W/(m²·K), areas in m².
#pragma once

#include <string>

namespace solarith::convection {

// Heat flow from a surface to the fluid around it, W:
//   q = h·A·(T_surface − T_fluid),
// Newton's law of cooling (Newton 1701) as written in F.P. Incropera et al.,
// Fundamentals of Heat and Mass Transfer, 6th ed., 2007, eq. 1.3a (from memory).
// Negative when the fluid is the warmer. h >= 0, A >= 0, T >= -273.15 °C.
double newton_heat_flow(double h, double area, double t_surface_celsius, double t_fluid_celsius);

// Dimensionless groups and correlations. Each refuses input outside its
// published validity range (DomainError) instead of extrapolating.
double reynolds(double velocity, double length, double kinematic_viscosity);        // DIM_REYNOLDS
double rayleigh(double t_hot_celsius, double t_cold_celsius, double length,          // DIM_RAYLEIGH
                const std::string& fluid, double glycol_fraction);
// length_to_diameter <= 0 means "not given" (fully developed flow).
double nusselt_pipe(double re, double pr, double length_to_diameter);               // NU_PIPE
double nusselt_flat_plate(double re, double pr);                                    // NU_FLAT_PLATE
double nusselt_cylinder_cross(double re, double pr);                                // NU_CYLINDER_CROSS
double nusselt_free_plate(double ra, double pr, double tilt_deg);                   // NU_FREE_PLATE
double nusselt_free_cylinder(double ra, double pr);                                 // NU_FREE_CYLINDER
double nusselt_tilted_gap(double ra, double tilt_deg);                              // NU_TILTED_GAP
double wind_coefficient(double wind_speed, double length);                          // CONV_WIND_COEFF, W/(m²·K)
// length <= 0 means "not given"; glycol_fraction as in fluids::at.
double pipe_coefficient(const std::string& fluid, double t_mean_celsius, double mass_flow,  // CONV_PIPE_COEFF
                        double inner_diameter, double length, double glycol_fraction);

}  // namespace solarith::convection
