// Catalogue entries of the losses family (LOSS_*).
#include "solarith/catalog.hpp"
#include "solarith/losses.hpp"

namespace solarith::catalog {

std::vector<FunctionSpec> losses_functions()
{
    namespace loss = solarith::losses;
    return {
        {"LOSS_PIPE", "Losses",
         "Heat lost per metre by an insulated (or bare) horizontal pipe to the air and surroundings around it, "
         "in still air or in a wind across the pipe.",
         "W/m", ResultKind::Number,
         "Steady balance solved for the outer surface temperature T_s: 2π·k·(T_fluid − T_s)/ln(r_o/r_i) = "
         "h·π·D_o·(T_s − T_ambient) + ε·σ·π·D_o·(T_s⁴ − T_ambient⁴) (cylindrical-shell conduction and a grey "
         "surface in a large enclosure at T_ambient, Incropera et al., Fundamentals of Heat and Mass Transfer, "
         "6th ed., 2007, §3.3.1 and eq. 1.7), r_i = pipe_outer_diameter/2, r_o = r_i + insulation_thickness, "
         "D_o = 2·r_o. h = Nu·k/D_o with air properties at the film temperature (T_s + T_ambient)/2: still air "
         "Churchill & Chu horizontal cylinder (Int. J. Heat Mass Transfer 18, 1975, 1049–1053); with wind, "
         "Nu = (Nu_forced³ + Nu_free³)^(1/3) (Churchill, AIChE J. 23, 1977, 10–16; Incropera §9.9), Nu_forced "
         "by Churchill & Bernstein (J. Heat Transfer 99, 1977, 300–306) for wind across the pipe. The residual "
         "changes sign between T_ambient and T_fluid, and T_s is found in that bracket by TOMS 748 "
         "(Boost.Math); a failed solve is Err:523. Bare pipe (thickness 0): T_s = T_fluid. Neglected: inner "
         "film and pipe wall (the insulation's inner face is at T_fluid), condensation. Negative when the "
         "surroundings are warmer (heat gain). Valid for T_fluid and T_ambient −50..500 °C (air properties), "
         "D > 0, t >= 0, k > 0, ε 0..1, wind >= 0 with Re·Pr >= 0.2 and Re <= 1e7, outside Ra <= 1e12.",
         {{"T_fluid", ArgKind::Number, "°C", "Temperature of the fluid in the pipe, -50..500"},
          {"T_ambient", ArgKind::Number, "°C", "Temperature of the air and the surroundings, -50..500"},
          {"pipe_outer_diameter", ArgKind::Number, "m", "Outer diameter of the pipe (under the insulation), > 0"},
          {"insulation_thickness", ArgKind::Number, "m", "Radial thickness of the insulation, >= 0 (0: bare pipe)"},
          {"insulation_conductivity", ArgKind::Number, "W/(m·K)", "Thermal conductivity of the insulation, > 0"},
          {"emissivity", ArgKind::OptionalNumber, "–", "Emissivity of the outer surface, 0..1", 0.9},
          {"wind_speed", ArgKind::OptionalNumber, "m/s", "Wind speed across the pipe, >= 0 (0: still air)", 0.0}},
         "60; 20; 0.022; 0.02; 0.04",
         [](const Args& a) -> Result {
             return loss::pipe_heat_loss(a.number(0), a.number(1), a.number(2), a.number(3), a.number(4),
                                         a.number(5), a.number(6));
         }},
    };
}

}  // namespace solarith::catalog
