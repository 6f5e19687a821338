// Catalogue entries of the conduction family (COND_*).
#include "solarith/catalog.hpp"
#include "solarith/conduction.hpp"

namespace solarith::catalog {

std::vector<FunctionSpec> conduction_functions()
{
    namespace cond = solarith::conduction;
    return {
        {"COND_WALL", "Conduction",
         "Steady heat flow by conduction through a plane wall, from side 1 to side 2.",
         "W", ResultKind::Number,
         "q = k·A·(T1 − T2)/L, Fourier's law for steady one-dimensional conduction through a plane wall "
         "of constant conductivity (Incropera et al., Fundamentals of Heat and Mass Transfer, 6th ed., 2007, "
         "§3.1). Valid for k > 0, A >= 0, L > 0, temperatures >= -273.15 °C. Negative when side 2 is warmer.",
         {{"conductivity", ArgKind::Number, "W/(m·K)", "Thermal conductivity of the wall material, > 0"},
          {"area", ArgKind::Number, "m²", "Wall area normal to the heat flow, >= 0"},
          {"thickness", ArgKind::Number, "m", "Wall thickness, > 0"},
          {"T1", ArgKind::Number, "°C", "Surface temperature on side 1"},
          {"T2", ArgKind::Number, "°C", "Surface temperature on side 2"}},
         "0.72; 12; 0.2; 20; -5",
         [](const Args& a) -> Result {
             return cond::wall_heat_flow(a.number(0), a.number(1), a.number(2), a.number(3), a.number(4));
         }},
        {"COND_SHELL", "Conduction",
         "Steady heat flow by conduction outward through a cylindrical shell such as pipe insulation.",
         "W", ResultKind::Number,
         "q = 2π·k·length·(T_inner − T_outer)/ln(r_outer/r_inner), Fourier's law for steady radial conduction "
         "through a cylindrical shell of constant conductivity (Incropera et al., Fundamentals of Heat and Mass "
         "Transfer, 6th ed., 2007, §3.3.1). Valid for k > 0, length >= 0, 0 < r_inner < r_outer, temperatures "
         ">= -273.15 °C. Negative when the outside is warmer.",
         {{"conductivity", ArgKind::Number, "W/(m·K)", "Thermal conductivity of the shell material, > 0"},
          {"length", ArgKind::Number, "m", "Axial length of the shell, >= 0"},
          {"r_inner", ArgKind::Number, "m", "Inner radius, > 0"},
          {"r_outer", ArgKind::Number, "m", "Outer radius, > r_inner"},
          {"T_inner", ArgKind::Number, "°C", "Temperature of the inner surface"},
          {"T_outer", ArgKind::Number, "°C", "Temperature of the outer surface"}},
         "0.04; 10; 0.011; 0.041; 60; 20",
         [](const Args& a) -> Result {
             return cond::shell_heat_flow(a.number(0), a.number(1), a.number(2), a.number(3), a.number(4),
                                          a.number(5));
         }},
        {"COND_R_WALL", "Conduction",
         "Thermal resistance of a plane layer to conduction across it.",
         "K/W", ResultKind::Number,
         "R = L/(k·A), conduction resistance of a plane layer (Incropera et al., Fundamentals of Heat and Mass "
         "Transfer, 6th ed., 2007, §3.1). Valid for L >= 0 (a layer of zero thickness gives 0 K/W), k > 0, A > 0.",
         {{"thickness", ArgKind::Number, "m", "Layer thickness, >= 0"},
          {"conductivity", ArgKind::Number, "W/(m·K)", "Thermal conductivity of the layer, > 0"},
          {"area", ArgKind::Number, "m²", "Area normal to the heat flow, > 0"}},
         "0.1; 0.04; 1",
         [](const Args& a) -> Result { return cond::wall_resistance(a.number(0), a.number(1), a.number(2)); }},
        {"COND_R_SHELL", "Conduction",
         "Thermal resistance of a cylindrical layer (pipe wall, pipe insulation) to radial conduction.",
         "K/W", ResultKind::Number,
         "R = ln(r_outer/r_inner)/(2π·k·length), conduction resistance of a cylindrical layer (Incropera et al., "
         "Fundamentals of Heat and Mass Transfer, 6th ed., 2007, §3.3.1). Valid for 0 < r_inner <= r_outer "
         "(equal radii give 0 K/W), k > 0, length > 0.",
         {{"r_inner", ArgKind::Number, "m", "Inner radius, > 0"},
          {"r_outer", ArgKind::Number, "m", "Outer radius, >= r_inner"},
          {"conductivity", ArgKind::Number, "W/(m·K)", "Thermal conductivity of the layer, > 0"},
          {"length", ArgKind::Number, "m", "Axial length, > 0"}},
         "0.011; 0.041; 0.04; 1",
         [](const Args& a) -> Result {
             return cond::shell_resistance(a.number(0), a.number(1), a.number(2), a.number(3));
         }},
        {"COND_R_LAYERS", "Conduction",
         "Thermal resistance of plane layers in series (a composite wall), each layer given by its thickness "
         "and conductivity.",
         "K/W", ResultKind::Number,
         "R = Σ L_i/(k_i·A), plane conduction resistances in series, one-dimensional, perfect contact between "
         "layers (Incropera et al., Fundamentals of Heat and Mass Transfer, 6th ed., 2007, §3.1, composite "
         "wall). The two ranges pair up cell by cell (row by row) and must hold the same number of cells. "
         "Valid for each L_i >= 0, k_i > 0, A > 0.",
         {{"thicknesses", ArgKind::Range, "m", "Thickness of each layer, >= 0"},
          {"conductivities", ArgKind::Range, "W/(m·K)", "Thermal conductivity of each layer, > 0, in the same "
                                                        "order as the thicknesses"},
          {"area", ArgKind::Number, "m²", "Wall area normal to the heat flow, > 0"}},
         "{0.1; 0.2; 0.015}; {0.04; 0.72; 0.17}; 10",
         [](const Args& a) -> Result {
             return cond::layers_resistance(a.numbers(0), a.numbers(1), a.number(2));
         }},
        {"COND_FIN_EFF", "Conduction",
         "Efficiency of a straight fin of rectangular profile with an insulated tip: its heat flow relative "
         "to that of the same fin held entirely at the base temperature.",
         "–", ResultKind::Number,
         "η = tanh(m·L)/(m·L), m = √(2h/(k·t)): straight rectangular fin, adiabatic tip, wide-fin form "
         "(width >> thickness, so the perimeter is twice the width), one-dimensional conduction, uniform h "
         "(Incropera et al., Fundamentals of Heat and Mass Transfer, 6th ed., 2007, Table 3.4 case B and "
         "Table 3.5). For a convecting tip pass the corrected length L + t/2. Valid for h >= 0, k > 0, t > 0, "
         "L >= 0; h = 0 or L = 0 gives the limit 1.",
         {{"h", ArgKind::Number, "W/(m²·K)", "Heat transfer coefficient on the fin faces, >= 0"},
          {"conductivity", ArgKind::Number, "W/(m·K)", "Thermal conductivity of the fin, > 0"},
          {"thickness", ArgKind::Number, "m", "Fin thickness, > 0"},
          {"fin_length", ArgKind::Number, "m", "Fin length from base to tip, >= 0"}},
         "25; 200; 0.0005; 0.05",
         [](const Args& a) -> Result {
             return cond::straight_fin_efficiency(a.number(0), a.number(1), a.number(2), a.number(3));
         }},
        {"COND_ANNULAR_FIN_EFF", "Conduction",
         "Efficiency of an annular (circumferential) fin of constant thickness on a tube, insulated tip.",
         "–", ResultKind::Number,
         "η = 2·r1/(m·(r2² − r1²))·[K1(m·r1)·I1(m·r2) − I1(m·r1)·K1(m·r2)]/[I0(m·r1)·K1(m·r2) + "
         "K0(m·r1)·I1(m·r2)], m = √(2h/(k·t)): annular fin of rectangular profile, adiabatic tip, "
         "one-dimensional radial conduction, uniform h (Gardner, Trans. ASME 67, 1945, 621–631; Incropera et "
         "al., Fundamentals of Heat and Mass Transfer, 6th ed., 2007, Table 3.5). Modified Bessel functions from "
         "Boost.Math, exponentially scaled (Hankel expansion, Abramowitz & Stegun 9.7.1–9.7.2, for arguments "
         "above 500). For a convecting tip pass r2 + t/2 as r_outer. Valid for h >= 0, k > 0, t > 0, "
         "0 < r_inner <= r_outer, m·r_outer <= 1e12; h = 0 or r_outer = r_inner gives the limit 1. "
         "Measured relative accuracy: better than 1e-14 + 1e-15/(m·(r2 − r1)), at worst about 1e-10; below "
         "m·(r2 − r1) = 1e-6 the straight-fin value tanh(m·L)/(m·L) is returned (difference < 1e-9).",
         {{"h", ArgKind::Number, "W/(m²·K)", "Heat transfer coefficient on the fin faces, >= 0"},
          {"conductivity", ArgKind::Number, "W/(m·K)", "Thermal conductivity of the fin, > 0"},
          {"thickness", ArgKind::Number, "m", "Fin thickness, > 0"},
          {"r_inner", ArgKind::Number, "m", "Radius of the fin root (tube outer radius), > 0"},
          {"r_outer", ArgKind::Number, "m", "Radius of the fin tip, >= r_inner"}},
         "50; 186; 0.006; 0.025; 0.048",
         [](const Args& a) -> Result {
             return cond::annular_fin_efficiency(a.number(0), a.number(1), a.number(2), a.number(3), a.number(4));
         }},
        {"COND_CRITICAL_RADIUS", "Conduction",
         "Critical outer radius of insulation on a cylinder (pipe, wire): below it, adding insulation "
         "increases the heat loss.",
         "m", ResultKind::Number,
         "r_cr = k/h for a cylinder, from minimising the sum of the insulation's conduction resistance and "
         "the outer convection resistance (Incropera et al., Fundamentals of Heat and Mass Transfer, 6th ed., "
         "2007, §3.3.1, Example 3.5). Valid for k > 0, h > 0; h is taken independent of the radius.",
         {{"conductivity", ArgKind::Number, "W/(m·K)", "Thermal conductivity of the insulation, > 0"},
          {"h", ArgKind::Number, "W/(m²·K)", "Heat transfer coefficient on the outer surface, > 0"}},
         "0.15; 12",
         [](const Args& a) -> Result { return cond::critical_radius_cylinder(a.number(0), a.number(1)); }},
        {"COND_LUMPED_TEMP", "Conduction",
         "Temperature of a small or highly conductive body, uniform inside, after a time in a fluid at "
         "another temperature.",
         "°C", ResultKind::Number,
         "T = T_fluid + (T_start − T_fluid)·exp(−h·A·t/(ρ·V·cp)), lumped capacitance method (Incropera et al., "
         "Fundamentals of Heat and Mass Transfer, 6th ed., 2007, §5.1). Valid when the Biot number "
         "h·(V/A)/k_solid is below 0.1; the solid's conductivity is not an argument, so the user checks this. "
         "Constant h, fluid temperature and properties. Valid for h >= 0, A >= 0, V > 0, ρ > 0, cp > 0, t >= 0.",
         {{"T_start", ArgKind::Number, "°C", "Temperature of the body at time 0"},
          {"T_fluid", ArgKind::Number, "°C", "Temperature of the surrounding fluid"},
          {"h", ArgKind::Number, "W/(m²·K)", "Heat transfer coefficient at the surface, >= 0"},
          {"area", ArgKind::Number, "m²", "Surface area of the body, >= 0"},
          {"volume", ArgKind::Number, "m³", "Volume of the body, > 0"},
          {"density", ArgKind::Number, "kg/m³", "Density of the body, > 0"},
          {"cp", ArgKind::Number, "J/(kg·K)", "Specific heat of the body, > 0"},
          {"time_s", ArgKind::Number, "s", "Time since the start, >= 0"}},
         "25; 200; 400; 1.566e-6; 1.843e-10; 8500; 400; 2",
         [](const Args& a) -> Result {
             return cond::lumped_temperature(a.number(0), a.number(1), a.number(2), a.number(3), a.number(4),
                                             a.number(5), a.number(6), a.number(7));
         }},
        {"COND_SEMI_INF_TEMP", "Conduction",
         "Temperature at a depth in a semi-infinite solid (ground, thick wall) a time after its surface "
         "temperature changed suddenly.",
         "°C", ResultKind::Number,
         "T = T_initial + (T_surface − T_initial)·erfc(x/(2·√(α·t))), semi-infinite solid at uniform T_initial "
         "whose surface is held at T_surface from t = 0 (Incropera et al., Fundamentals of Heat and Mass "
         "Transfer, 6th ed., 2007, eq. 5.57, case 1). erfc from Boost.Math. Constant properties. Valid for "
         "α > 0, x >= 0, t >= 0; at t = 0 the result is T_initial for x > 0, and the surface (x = 0) is at "
         "T_surface for every t.",
         {{"T_initial", ArgKind::Number, "°C", "Uniform temperature of the solid before the change"},
          {"T_surface", ArgKind::Number, "°C", "Surface temperature imposed from time 0"},
          {"diffusivity", ArgKind::Number, "m²/s", "Thermal diffusivity k/(ρ·cp), > 0"},
          {"depth", ArgKind::Number, "m", "Depth below the surface, >= 0"},
          {"time_s", ArgKind::Number, "s", "Time since the surface temperature changed, >= 0"}},
         "20; -15; 1.38e-7; 0.68; 5184000",
         [](const Args& a) -> Result {
             return cond::semi_infinite_temperature(a.number(0), a.number(1), a.number(2), a.number(3),
                                                    a.number(4));
         }},
    };
}

}  // namespace solarith::catalog
