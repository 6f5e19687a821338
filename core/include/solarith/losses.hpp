// Heat losses of system components. Temperatures in °C, lengths in m,
// results in W per m of pipe.
//
// Sources (equation numbers from memory of the printed books):
//   [Incropera] F.P. Incropera, D.P. DeWitt, T.L. Bergman, A.S. Lavine,
//               Fundamentals of Heat and Mass Transfer, 6th ed., Wiley, 2007.
//   [Churchill1977] S.W. Churchill, "A comprehensive correlating equation for
//               laminar, assisting, forced and free convection", AIChE J. 23 (1977)
//               10–16 (combination Nu³ = Nu_forced³ + Nu_free³).
//   The correlations themselves are cited in convection.hpp.
#pragma once

namespace solarith::losses {

// The solved state of an insulated pipe, per metre of pipe.
struct PipeBalance {
    double surface_celsius;  // outer surface of the insulation (of the pipe when bare), °C
    double conduction;       // through the insulation, W/m (fluid → surface)
    double convection;       // surface → air, W/m
    double radiation;        // surface → surroundings, W/m
    double h_convection;     // outer convection coefficient at the solution, W/(m²·K)
};

// LOSS_PIPE. Heat lost by a horizontal pipe through its insulation to still or
// moving air and to surroundings at the air temperature, W per m of pipe
// (negative when the surroundings are the warmer: a heat gain). The outer
// surface temperature T_s solves the steady balance
//   2π·k·(T_fluid − T_s)/ln(r_o/r_i)  =  h(T_s)·π·D_o·(T_s − T_a)  +  ε·σ·π·D_o·(T_s⁴ − T_a⁴)
// (conduction through a cylindrical shell [Incropera §3.3.1], convection,
// grey surface small in a large enclosure at T_a [Incropera eq. 1.7]), with
// r_i = pipe_outer_diameter/2, r_o = r_i + insulation_thickness, D_o = 2·r_o.
// h = Nu·k_air/D_o, air properties at the film temperature (T_s + T_a)/2:
//   wind 0: Nu = Churchill–Chu horizontal cylinder (NU_FREE_CYLINDER);
//   wind > 0: Nu = (Nu_forced³ + Nu_free³)^(1/3), Churchill–Bernstein for the
//   wind across the pipe (NU_CYLINDER_CROSS) combined with free convection as
//   Churchill1977 proposes [Incropera §9.9, n = 3].
// The residual (conduction − convection − radiation) is positive at
// T_s = T_ambient (only conduction is left) and negative at T_s = T_fluid (only
// the outer terms are left, and h > 0 since Nu_free >= 0.36), so the root is
// bracketed by the two temperatures and found by TOMS 748 (Boost.Math). If it
// does not converge the result is an EvaluationError. A bare pipe
// (insulation_thickness 0) has T_s = T_fluid, no solve.
// Neglected: the inner film and the pipe wall (the insulation's inner face is
// at T_fluid), condensation on cold pipes.
// Ranges: T_fluid and T_ambient −50..500 °C (the air properties), D > 0,
// t >= 0, k > 0, ε 0..1, wind >= 0; with wind, Re·Pr >= 0.2 and Re <= 10⁷ at
// every film temperature that can occur (NU_CYLINDER_CROSS), and Ra <= 10¹²
// (NU_FREE_CYLINDER).
double pipe_heat_loss(double t_fluid_celsius, double t_ambient_celsius, double pipe_outer_diameter,
                      double insulation_thickness, double insulation_conductivity, double emissivity,
                      double wind_speed);

// The same balance, with its parts (for checks and reports).
PipeBalance pipe_balance(double t_fluid_celsius, double t_ambient_celsius, double pipe_outer_diameter,
                         double insulation_thickness, double insulation_conductivity, double emissivity,
                         double wind_speed);

}  // namespace solarith::losses
