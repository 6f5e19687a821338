// Heat conduction: steady one-dimensional walls and cylindrical shells,
// thermal resistances, fin efficiencies, the critical insulation radius and
// two transient solutions (lumped body, semi-infinite solid).
//
// Units: temperatures in °C (points) and K (differences), lengths in m,
// areas in m², conductivity W/(m·K), h W/(m²·K), time in s.
//
// Which zeros are accepted (one rule for the whole family):
//  - a quantity the formula divides by must be positive (a zero would give
//    an infinite result): wall thickness in COND_WALL, area in a resistance,
//    r_inner, the time constant's ρ·V·cp ...;
//  - material properties (conductivity, density, cp, diffusivity) must be
//    positive: no real material has a zero value;
//  - sizes that may vanish (a layer of zero thickness, a fin of zero length,
//    zero time, h = 0 for an insulated surface) are accepted and give the
//    formula's limit, e.g. COND_R_WALL with thickness 0 is 0 K/W and a fin
//    with h = 0 has efficiency 1.
//
// Sources cited below are from memory of the printed books; equation and
// table numbers refer to the edition named.
//   [Incropera] F.P. Incropera, D.P. DeWitt, T.L. Bergman, A.S. Lavine,
//               Fundamentals of Heat and Mass Transfer, 6th ed., Wiley, 2007.
//   [Gardner]   K.A. Gardner, "Efficiency of extended surface",
//               Trans. ASME 67 (1945) 621–631.
#pragma once

#include <vector>

namespace solarith::conduction {

// Heat flow through a plane wall from side 1 to side 2, W:
//   q = k·A·(T1 − T2)/L.
// Fourier's law, steady, one-dimensional, constant k [Incropera §3.1].
// k > 0, A >= 0, L > 0, T1, T2 >= -273.15 °C.
double wall_heat_flow(double conductivity, double area, double thickness, double t1_celsius,
                      double t2_celsius);

// Heat flow outward through a cylindrical shell of the given length, W:
//   q = 2π·k·length·(T_inner − T_outer)/ln(r_outer/r_inner).
// Fourier's law, steady, radial, constant k [Incropera §3.3.1].
// k > 0, length >= 0, 0 < r_inner < r_outer.
double shell_heat_flow(double conductivity, double length, double r_inner, double r_outer,
                       double t_inner_celsius, double t_outer_celsius);

// Conduction resistance of a plane layer, K/W: R = L/(k·A) [Incropera §3.1].
// L >= 0 (0 gives 0 K/W: no layer), k > 0, A > 0.
double wall_resistance(double thickness, double conductivity, double area);

// Conduction resistance of a cylindrical layer, K/W:
//   R = ln(r_outer/r_inner)/(2π·k·length) [Incropera §3.3.1].
// 0 < r_inner <= r_outer (equal radii give 0 K/W: no layer), k > 0, length > 0.
double shell_resistance(double r_inner, double r_outer, double conductivity, double length);

// Plane layers in series, K/W: R = Σ L_i/(k_i·A) [Incropera §3.1, composite wall].
// One conductivity per thickness; each L_i >= 0, k_i > 0; A > 0.
double layers_resistance(const std::vector<double>& thicknesses,
                         const std::vector<double>& conductivities, double area);

// Efficiency of a straight rectangular fin with an adiabatic tip, 0..1:
//   η = tanh(m·L)/(m·L),  m = √(2h/(k·t)),
// the wide-fin form (fin width >> thickness, perimeter ≈ 2·width)
// [Incropera Table 3.4 case B and Table 3.5]. For a convective tip pass the
// corrected length L + t/2 [Incropera Table 3.5].
// h >= 0 (0 gives 1), k > 0, t > 0, L >= 0 (0 gives 1).
double straight_fin_efficiency(double h, double conductivity, double thickness, double fin_length);

// Efficiency of an annular fin of rectangular profile with an adiabatic tip, 0..1:
//   η = 2·r1/(m·(r2² − r1²)) · [K1(m·r1)·I1(m·r2) − I1(m·r1)·K1(m·r2)]
//                             / [I0(m·r1)·K1(m·r2) + K0(m·r1)·I1(m·r2)],
//   m = √(2h/(k·t))  [Gardner 1945; Incropera Table 3.5].
// Evaluated with exponentially scaled Bessel functions so that no term
// overflows. For a convective tip pass r2 + t/2 as r_outer.
// h >= 0 (0 gives 1), k > 0, t > 0, 0 < r_inner <= r_outer (equal gives 1),
// m·r_outer <= 1e12 (far beyond any real fin).
double annular_fin_efficiency(double h, double conductivity, double thickness, double r_inner,
                              double r_outer);

// Critical radius of insulation on a cylinder, m: r_cr = k/h
// [Incropera §3.3.1, Example 3.5]. k > 0, h > 0.
double critical_radius_cylinder(double conductivity, double h);

// Temperature of a lumped body after time t, °C:
//   T = T_fluid + (T_start − T_fluid)·exp(−h·A·t/(ρ·V·cp))  [Incropera §5.1, lumped capacitance].
// Valid when the Biot number h·(V/A)/k_solid < 0.1 (the caller's
// responsibility: the solid's conductivity is not an argument).
// h >= 0, A >= 0, V > 0, ρ > 0, cp > 0, t >= 0.
double lumped_temperature(double t_start_celsius, double t_fluid_celsius, double h, double area,
                          double volume, double density, double cp, double time_s);

// Temperature in a semi-infinite solid at depth x, time t after its surface
// is stepped from T_initial to T_surface, °C:
//   T = T_initial + (T_surface − T_initial)·erfc(x/(2·√(α·t)))
// (the same as T_s + (T_i − T_s)·erf(...)) [Incropera eq. 5.57].
// α > 0, x >= 0, t >= 0. At t = 0 the solid is still at T_initial for x > 0;
// the surface itself (x = 0) is at T_surface for every t >= 0.
double semi_infinite_temperature(double t_initial_celsius, double t_surface_celsius,
                                 double diffusivity, double depth, double time_s);

}  // namespace solarith::conduction
