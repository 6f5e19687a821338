// Catalogue entries of the convection family (CONV_*).
#include "solarith/catalog.hpp"
#include "solarith/convection.hpp"

#include <cmath>

namespace solarith::catalog {

namespace {

// The glycol mass fraction of a call; omitted is NaN, as fluids::at expects.
double glycol_fraction(const Args& a, std::size_t index)
{
    return a.optional_number(index).value_or(NAN);
}

}  // namespace

std::vector<FunctionSpec> convection_functions()
{
    namespace conv = solarith::convection;
    return {
        {"CONV_HEAT", "Convection",
         "Heat flow by convection from a surface to the fluid around it, for a known heat transfer "
         "coefficient.",
         "W", ResultKind::Number,
         "q = h·A·(T_surface − T_fluid), Newton's law of cooling (Incropera et al., Fundamentals of Heat and "
         "Mass Transfer, 6th ed., 2007, eq. 1.3a). Valid for h >= 0, A >= 0, temperatures >= -273.15 °C. "
         "Negative when the fluid is warmer than the surface.",
         {{"h", ArgKind::Number, "W/(m²·K)", "Convection heat transfer coefficient, >= 0"},
          {"area", ArgKind::Number, "m²", "Surface area in contact with the fluid, >= 0"},
          {"T_surface", ArgKind::Number, "°C", "Surface temperature"},
          {"T_fluid", ArgKind::Number, "°C", "Temperature of the fluid away from the surface"}},
         "10; 2; 60; 20",
         [](const Args& a) -> Result {
             return conv::newton_heat_flow(a.number(0), a.number(1), a.number(2), a.number(3));
         }},
        {"DIM_REYNOLDS", "Convection",
         "Reynolds number of a flow: ratio of inertial to viscous forces, from velocity, characteristic length "
         "and kinematic viscosity.",
         "–", ResultKind::Number,
         "Re = V·L/ν, the definition (Incropera et al., Fundamentals of Heat and Mass Transfer, 6th ed., 2007, "
         "§6.4). Valid for V >= 0, L > 0, ν > 0.",
         {{"velocity", ArgKind::Number, "m/s", "Flow velocity (magnitude), >= 0"},
          {"length", ArgKind::Number, "m", "Characteristic length (diameter, plate length), > 0"},
          {"kinematic_viscosity", ArgKind::Number, "m²/s", "Kinematic viscosity ν = μ/ρ of the fluid, > 0"}},
         "2; 0.05; 1.5e-5",
         [](const Args& a) -> Result { return conv::reynolds(a.number(0), a.number(1), a.number(2)); }},
        {"DIM_RAYLEIGH", "Convection",
         "Rayleigh number of free convection across a temperature difference over a length, with the fluid's "
         "properties at the mean temperature.",
         "–", ResultKind::Number,
         "Ra = g·β·|T_hot − T_cold|·L³/(ν·α), the definition (Incropera et al., Fundamentals of Heat and Mass "
         "Transfer, 6th ed., 2007, eq. 9.25), g = 9.80665 m/s² (standard gravity), β, ν = μ/ρ and α = k/(ρ·cp) of "
         "the fluid at the mean temperature (T_hot + T_cold)/2 from the Solarith property functions (WATER_*, "
         "AIR_*, GLYCOL_*; air at 101325 Pa, water at 101325 Pa or its saturation pressure where higher). The "
         "magnitude of the temperature difference is used, so Ra >= 0 whichever temperature is higher; the "
         "orientation (which face is heated) belongs to the Nusselt correlation. Refused where β <= 0 at the mean "
         "temperature (water below its density maximum near 4 °C, where the Boussinesq form g·β·ΔT fails). "
         "Valid for L > 0 and temperatures within the property range of the fluid.",
         {{"T_hot", ArgKind::Number, "°C", "Temperature of the warmer surface or fluid"},
          {"T_cold", ArgKind::Number, "°C", "Temperature of the colder surface or fluid"},
          {"length", ArgKind::Number, "m", "Characteristic length (plate height, cylinder diameter, gap), > 0"},
          {"fluid", ArgKind::Text, "", "\"water\", \"air\", \"propylene\" or \"ethylene\" (glycol–water mixture)"},
          {"glycol_fraction", ArgKind::OptionalNumber, "–",
           "Mass fraction of glycol 0..0.6 for \"propylene\" and \"ethylene\"; omit (or 0) for water and air", NAN}},
         "70; 50; 0.025; \"air\"",
         [](const Args& a) -> Result {
             return conv::rayleigh(a.number(0), a.number(1), a.number(2), a.text(3), glycol_fraction(a, 4));
         }},
        {"NU_PIPE", "Convection",
         "Mean Nusselt number of flow inside a circular tube at uniform wall temperature: laminar, transition "
         "and turbulent, fully developed or over a tube of given length.",
         "–", ResultKind::Number,
         "Laminar (Re <= 2300): Nu = 3.66 fully developed (Incropera et al., Fundamentals of Heat and Mass "
         "Transfer, 6th ed., 2007, eq. 8.55); with L/D given, Hausen's thermal-entry form Nu = 3.66 + "
         "0.0668·Gz/(1 + 0.04·Gz^(2/3)), Gz = Re·Pr/(L/D) (Hausen, Z. VDI Beih. Verfahrenstech. 4, 1943; Incropera "
         "eq. 8.57). Turbulent (Re >= 4000): Gnielinski, Nu = (f/8)(Re − 1000)Pr/(1 + 12.7(f/8)^(1/2)(Pr^(2/3) − "
         "1)), Petukhov's friction factor f = (0.790 ln Re − 1.64)^−2 (Gnielinski, Int. Chem. Eng. 16, 1976, "
         "359–368; Petukhov, Adv. Heat Transfer 6, 1970; Incropera eqs. 8.62 and 8.21), times 1 + (D/L)^(2/3) "
         "when L/D is given (Gnielinski 1976). Transition (2300 < Re < 4000): linear in Re between the laminar "
         "value at 2300 and the Gnielinski value at 4000, the interpolation of Gnielinski (Int. J. Heat Mass "
         "Transfer 63, 2013, 134–140), who carries it to Re = 10^4; continuous in Re. Properties at the bulk "
         "temperature, no wall-viscosity correction, smooth tube. Valid for 0 < Re <= 5e6; Pr > 0 for Re <= 2300 "
         "and 0.5 <= Pr <= 2000 above; L/D >= 1 when given. Equation numbers from memory of the printed book.",
         {{"Re", ArgKind::Number, "–", "Reynolds number on the inner diameter, 0 < Re <= 5e6"},
          {"Pr", ArgKind::Number, "–", "Prandtl number of the fluid at the bulk temperature, > 0 (0.5..2000 above "
                                       "Re = 2300)"},
          {"length_to_diameter", ArgKind::OptionalNumber, "–",
           "Tube length over inner diameter L/D, >= 1; omit for fully developed flow", NAN}},
         "20000; 4.3",
         [](const Args& a) -> Result { return conv::nusselt_pipe(a.number(0), a.number(1), a.optional_number(2)); }},
        {"NU_FLAT_PLATE", "Convection",
         "Mean Nusselt number over a flat plate in parallel flow: laminar boundary layer, or laminar followed "
         "by turbulent (mixed) when the flow passes transition on the plate.",
         "–", ResultKind::Number,
         "Nu = 0.664·Re^(1/2)·Pr^(1/3) for Re <= 5e5 (laminar, Incropera et al., Fundamentals of Heat and Mass "
         "Transfer, 6th ed., 2007, eq. 7.30); Nu = (0.037·Re^(4/5) − 871)·Pr^(1/3) for Re > 5e5 (mixed boundary "
         "layer with transition at Re_x = 5e5, Incropera eq. 7.38). Re and Nu on the plate length, properties "
         "at the film temperature, uniform surface temperature. Valid for 0 < Re <= 1e8; Pr >= 0.6 (laminar) and "
         "0.6 <= Pr <= 60 (mixed, Incropera eq. 7.39). Equation numbers from memory of the printed book.",
         {{"Re", ArgKind::Number, "–", "Reynolds number on the plate length, 0 < Re <= 1e8"},
          {"Pr", ArgKind::Number, "–", "Prandtl number at the film temperature, >= 0.6 (0.6..60 above Re = 5e5)"}},
         "100000; 0.7",
         [](const Args& a) -> Result { return conv::nusselt_flat_plate(a.number(0), a.number(1)); }},
        {"NU_CYLINDER_CROSS", "Convection",
         "Mean Nusselt number of a long circular cylinder (pipe, wire) in a cross flow.",
         "–", ResultKind::Number,
         "Nu = 0.3 + 0.62·Re^(1/2)·Pr^(1/3)/[1 + (0.4/Pr)^(2/3)]^(1/4)·[1 + (Re/282000)^(5/8)]^(4/5), "
         "Churchill & Bernstein (J. Heat Transfer 99, 1977, 300–306; Incropera et al., Fundamentals of Heat "
         "and Mass Transfer, 6th ed., 2007, eq. 7.54, number from memory). Re and Nu on the diameter, properties "
         "at the film temperature. Valid for Re·Pr >= 0.2 (Incropera), Re <= 1e7 (about the upper end of the "
         "data correlated, from memory), Pr > 0.",
         {{"Re", ArgKind::Number, "–", "Reynolds number on the cylinder diameter, 0 < Re <= 1e7"},
          {"Pr", ArgKind::Number, "–", "Prandtl number at the film temperature, > 0, with Re·Pr >= 0.2"}},
         "5000; 0.7",
         [](const Args& a) -> Result { return conv::nusselt_cylinder_cross(a.number(0), a.number(1)); }},
        {"NU_FREE_PLATE", "Convection",
         "Mean Nusselt number of free convection on one face of a plate at uniform temperature: vertical, "
         "inclined with the heated face looking down, or horizontal.",
         "–", ResultKind::Number,
         "tilt is the angle from horizontal of a face warmer than the fluid: 0 = facing up, 90 = vertical, "
         "180 = facing down (for a face colder than the fluid give 180 − tilt, the mirror-image flow). "
         "90 <= tilt <= 150: Churchill & Chu vertical plate, Nu = {0.825 + 0.387·Ra'^(1/6)/[1 + "
         "(0.492/Pr)^(9/16)]^(8/27)}², with Ra' = Ra·cos(tilt − 90°), g replaced by g·cos θ up to θ = 60° from "
         "vertical (Churchill & Chu, Int. J. Heat Mass Transfer 18, 1975, 1323–1329; Incropera et al., "
         "Fundamentals of Heat and Mass Transfer, 6th ed., 2007, eq. 9.26 and §9.6.2), 0.1 <= Ra' <= 1e12, any "
         "Pr. tilt 0 (heated face up): Nu = 0.54·Ra^(1/4) for 1e4 <= Ra <= 1e7 and Pr >= 0.7, Nu = 0.15·Ra^(1/3) "
         "for 1e7 < Ra <= 1e11 (McAdams; Lloyd & Moran 1974; Incropera eqs. 9.30–9.31; the pair is 6 % apart at "
         "1e7). tilt 180 (heated face down): Nu = 0.52·Ra^(1/5), 1e4 <= Ra <= 1e9, Pr >= 0.7 (Radziemska & "
         "Lewandowski 2001; Incropera eq. 9.32). Length in Ra and Nu: plate height along the slope, or "
         "area/perimeter for horizontal plates. Refused: 0 < tilt < 90 and 150 < tilt < 180 (a heated face "
         "inclined upward, or nearly horizontal facing down), where the flow separates into three-dimensional "
         "plumes and no general correlation is published. Equation numbers from memory of the printed book.",
         {{"Ra", ArgKind::Number, "–", "Rayleigh number on the characteristic length, >= 0"},
          {"Pr", ArgKind::Number, "–", "Prandtl number at the film temperature, > 0"},
          {"tilt", ArgKind::Number, "°",
           "Angle of the heated face from horizontal: 0 facing up, 90 vertical, 180 facing down; accepted 0, "
           "90..150, 180"}},
         "1e8; 0.71; 90",
         [](const Args& a) -> Result { return conv::nusselt_free_plate(a.number(0), a.number(1), a.number(2)); }},
        {"NU_FREE_CYLINDER", "Convection",
         "Mean Nusselt number of free convection around a long horizontal cylinder (pipe) at uniform "
         "temperature.",
         "–", ResultKind::Number,
         "Nu = {0.60 + 0.387·Ra^(1/6)/[1 + (0.559/Pr)^(9/16)]^(8/27)}², Churchill & Chu (Int. J. Heat Mass "
         "Transfer 18, 1975, 1049–1053; Incropera et al., Fundamentals of Heat and Mass Transfer, 6th ed., "
         "2007, eq. 9.34, number from memory). Ra and Nu on the diameter, properties at the film temperature. "
         "Valid for 0 <= Ra <= 1e12 (the upper limit Incropera states; no lower limit is stated, Ra = 0 gives "
         "the equation's limit 0.36), Pr > 0.",
         {{"Ra", ArgKind::Number, "–", "Rayleigh number on the cylinder diameter, 0..1e12"},
          {"Pr", ArgKind::Number, "–", "Prandtl number at the film temperature, > 0"}},
         "5e6; 0.7",
         [](const Args& a) -> Result { return conv::nusselt_free_cylinder(a.number(0), a.number(1)); }},
        {"NU_TILTED_GAP", "Convection",
         "Nusselt number across an inclined air layer between two plates heated from below, such as the "
         "gap between a solar collector's absorber and its cover.",
         "–", ResultKind::Number,
         "Nu = 1 + 1.44·[1 − 1708·(sin 1.8β)^1.6/(Ra·cos β)]·[1 − 1708/(Ra·cos β)]⁺ + [(Ra·cos β/5830)^(1/3) − "
         "1]⁺, [x]⁺ = max(x, 0), β the tilt from horizontal (Hollands, Unny, Raithby & Konicek, J. Heat Transfer "
         "98, 1976, 189–193; Duffie & Beckman, Solar Engineering of Thermal Processes, 4th ed., 2013, eq. "
         "3.12.1, number from memory). Ra and Nu on the gap width, Ra with the plate-to-plate temperature "
         "difference; the lower plate is the warmer. Nu = 1 (conduction) while Ra·cos β <= 1708. Valid for air "
         "layers much longer than wide, 0 <= tilt <= 75°, 0 <= Ra <= 1e5.",
         {{"Ra", ArgKind::Number, "–", "Rayleigh number on the gap width, 0..1e5"},
          {"tilt", ArgKind::Number, "°", "Tilt of the layer from horizontal, 0..75"}},
         "20000; 45",
         [](const Args& a) -> Result { return conv::nusselt_tilted_gap(a.number(0), a.number(1)); }},
        {"CONV_WIND_COEFF", "Convection",
         "Heat transfer coefficient of wind on a flat surface such as a collector cover.",
         "W/(m²·K)", ResultKind::Number,
         "h = max(5, 8.6·V^0.6/L^0.4), the correlation of Sparrow, Ramsey & Mass (J. Heat Transfer 101, 1979, "
         "199–204) with the floor of 5 W/(m²·K), as Duffie & Beckman use it for solar collectors (Solar "
         "Engineering of Thermal Processes, 4th ed., 2013, §3.15, section from memory). L "
         "is the characteristic length (Duffie & Beckman take the cube root of the house volume for a roof "
         "collector). Valid for V >= 0 (V = 0 gives 5), L > 0; the source gives no upper wind speed.",
         {{"wind_speed", ArgKind::Number, "m/s", "Wind speed, >= 0"},
          {"length", ArgKind::OptionalNumber, "m", "Characteristic length, > 0", 1.0}},
         "3",
         [](const Args& a) -> Result { return conv::wind_coefficient(a.number(0), a.number(1)); }},
        {"CONV_PIPE_COEFF", "Convection",
         "Heat transfer coefficient between a fluid flowing in a circular tube and the tube wall, from the "
         "mass flow and the fluid's properties.",
         "W/(m²·K)", ResultKind::Number,
         "h = Nu·k/D with Re = 4·ṁ/(π·D·μ) and Nu from NU_PIPE (3.66 or Hausen laminar, Gnielinski with "
         "Petukhov friction turbulent, linear blend 2300 < Re < 4000), properties μ, cp, k of the fluid at "
         "T_mean from the Solarith property functions (water at 101325 Pa or its saturation pressure where "
         "higher). Uniform wall temperature, smooth tube, no wall-viscosity correction. Valid for ṁ > 0, D > 0, "
         "length > 0 when given (L/D >= 1), and Re, Pr within NU_PIPE's range (Re <= 5e6; 0.5 <= Pr <= 2000 "
         "above Re = 2300); omitting length gives fully developed flow.",
         {{"fluid", ArgKind::Text, "", "\"water\", \"air\", \"propylene\" or \"ethylene\" (glycol–water mixture)"},
          {"T_mean", ArgKind::Number, "°C", "Mean (bulk) temperature of the fluid"},
          {"mass_flow", ArgKind::Number, "kg/s", "Mass flow rate, > 0"},
          {"inner_diameter", ArgKind::Number, "m", "Inner diameter of the tube, > 0"},
          {"length", ArgKind::OptionalNumber, "m", "Tube length, > 0; omit for fully developed flow", NAN},
          {"glycol_fraction", ArgKind::OptionalNumber, "–",
           "Mass fraction of glycol 0..0.6 for \"propylene\" and \"ethylene\"; omit (or 0) for water and air", NAN}},
         "\"water\"; 40; 0.02; 0.01",
         [](const Args& a) -> Result {
             return conv::pipe_coefficient(a.text(0), a.number(1), a.number(2), a.number(3), a.optional_number(4),
                                           glycol_fraction(a, 5));
         }},
    };
}

}  // namespace solarith::catalog
