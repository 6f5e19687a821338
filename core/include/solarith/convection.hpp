// Convective heat transfer: Newton's law, the dimensionless groups and the
// Nusselt-number correlations of the catalogue, and two heat transfer
// coefficients built from them.
//
// Units: temperatures in °C, lengths in m, velocities in m/s, h in W/(m²·K);
// Re, Pr, Ra and Nu are dimensionless.
//
// Each correlation refuses input outside the range its source states
// (DomainError naming the spreadsheet function and argument) instead of
// extrapolating. Where a source gives no lower or upper limit the comment
// says so and what is accepted instead.
//
// Sources (equation numbers of the textbooks from memory of the printed books):
//   [Incropera] F.P. Incropera, D.P. DeWitt, T.L. Bergman, A.S. Lavine,
//               Fundamentals of Heat and Mass Transfer, 6th ed., Wiley, 2007.
//   [Duffie]    J.A. Duffie, W.A. Beckman, Solar Engineering of Thermal
//               Processes, 4th ed., Wiley, 2013.
//   [Gnielinski1976] V. Gnielinski, "New equations for heat and mass transfer in
//               turbulent pipe and channel flow", Int. Chem. Eng. 16 (1976) 359–368.
//   [Gnielinski2013] V. Gnielinski, "On heat transfer in tubes", Int. J. Heat
//               Mass Transfer 63 (2013) 134–140.
//   [Petukhov]  B.S. Petukhov, "Heat transfer and friction in turbulent pipe flow
//               with variable physical properties", Adv. Heat Transfer 6 (1970) 503–564.
//   [Hausen]    H. Hausen, "Darstellung des Wärmeüberganges in Rohren durch
//               verallgemeinerte Potenzbeziehungen", Z. VDI Beih. Verfahrenstech. 4 (1943) 91–98.
//   [ChurchillBernstein] S.W. Churchill, M. Bernstein, "A correlating equation for
//               forced convection from gases and liquids to a circular cylinder in
//               crossflow", J. Heat Transfer 99 (1977) 300–306.
//   [ChurchillChuPlate] S.W. Churchill, H.H.S. Chu, "Correlating equations for
//               laminar and turbulent free convection from a vertical plate",
//               Int. J. Heat Mass Transfer 18 (1975) 1323–1329.
//   [ChurchillChuCylinder] S.W. Churchill, H.H.S. Chu, "Correlating equations for
//               laminar and turbulent free convection from a horizontal cylinder",
//               Int. J. Heat Mass Transfer 18 (1975) 1049–1053.
//   [Hollands]  K.G.T. Hollands, T.E. Unny, G.D. Raithby, L. Konicek, "Free
//               convective heat transfer across inclined air layers", J. Heat
//               Transfer 98 (1976) 189–193.
//   [Sparrow]   E.M. Sparrow, J.W. Ramsey, E.A. Mass, "Effect of finite width on
//               heat transfer and fluid flow about an inclined rectangular plate",
//               J. Heat Transfer 101 (1979) 199–204.
#pragma once

#include <optional>
#include <string>

namespace solarith::convection {

// Heat flow from a surface to the fluid around it, W:
//   q = h·A·(T_surface − T_fluid),
// Newton's law of cooling (Newton 1701) as written in F.P. Incropera et al.,
// Fundamentals of Heat and Mass Transfer, 6th ed., 2007, eq. 1.3a (from memory).
// Negative when the fluid is the warmer. h >= 0, A >= 0, T >= -273.15 °C.
double newton_heat_flow(double h, double area, double t_surface_celsius, double t_fluid_celsius);

// DIM_REYNOLDS. Re = V·L/ν (definition). V >= 0, L > 0, ν > 0.
double reynolds(double velocity, double length, double kinematic_viscosity);

// DIM_RAYLEIGH. Ra = g·β·|T_hot − T_cold|·L³/(ν·α), properties of the fluid
// (fluids::at) at the mean temperature (T_hot + T_cold)/2, g the standard
// gravity. The magnitude of the temperature difference is used, so the result
// is >= 0 whichever temperature is the larger; which face is heated is a
// matter of the correlation the Ra is passed to. β must be positive at the
// mean temperature: water below about 4 °C (the density maximum) has β <= 0,
// where this Boussinesq form does not apply, and is refused. L > 0; the
// temperatures and glycol_fraction within the property ranges of fluids::at.
double rayleigh(double t_hot_celsius, double t_cold_celsius, double length,
                const std::string& fluid, double glycol_fraction);

// NU_PIPE. Mean Nusselt number for flow inside a circular tube, uniform wall
// temperature, properties at the bulk temperature (no wall-viscosity factor):
//  - Re <= 2300, laminar: 3.66, fully developed [Incropera eq. 8.55]; when
//    L/D is given, Hausen's thermal-entry form
//        Nu = 3.66 + 0.0668·Gz/(1 + 0.04·Gz^(2/3)),  Gz = (D/L)·Re·Pr
//    [Hausen; Incropera eq. 8.57], which tends to 3.66 as L/D → ∞. The laminar
//    values hold for every Pr > 0 (Gz is the only group).
//  - Re >= 4000: Gnielinski's correlation with Petukhov's friction factor
//        Nu = (f/8)·(Re − 1000)·Pr / (1 + 12.7·√(f/8)·(Pr^(2/3) − 1)),
//        f = (0.790·ln Re − 1.64)^−2
//    [Gnielinski1976; Petukhov; Incropera eqs. 8.62 and 8.21], times the short-
//    tube factor 1 + (D/L)^(2/3) when L/D is given [Gnielinski1976].
//  - 2300 < Re < 4000: linear in Re between the laminar value at Re = 2300 and
//    the Gnielinski value at Re = 4000, the interpolation Gnielinski2013 proposes
//    for the transition region. (Gnielinski2013 interpolates up to Re = 10⁴;
//    the catalogue ends the blend at 4000, inside the 1976 correlation's range.)
//    The result is continuous in Re.
// Range: 0 < Re <= 5·10⁶; Pr > 0 for Re <= 2300 and 0.5 <= Pr <= 2000 above
// (the Gnielinski range [Incropera eq. 8.62]); L/D >= 1 when given (the range of
// the short-tube factor, d/l <= 1 [Gnielinski1976]).
// length_to_diameter <= 0 means "not given" (fully developed flow).
double nusselt_pipe(double re, double pr, double length_to_diameter);
// The same, with L/D absent (nullopt) for fully developed flow; a value that
// is given must be >= 1 (0 and negative values are refused).
double nusselt_pipe(double re, double pr, std::optional<double> length_to_diameter);

// NU_FLAT_PLATE. Mean Nusselt number of a flat plate in parallel flow, based
// on the plate length, transition at Re_x,c = 5·10⁵:
//   Re <= 5·10⁵: Nu = 0.664·Re^(1/2)·Pr^(1/3)            [Incropera eq. 7.30]
//   Re >  5·10⁵: Nu = (0.037·Re^(4/5) − 871)·Pr^(1/3)    [Incropera eq. 7.38]
// Range: 0 < Re <= 10⁸; Pr >= 0.6 (laminar), 0.6 <= Pr <= 60 (mixed boundary
// layer) [Incropera eqs. 7.30 and 7.39]. The two forms meet within 0.1 % at
// Re = 5·10⁵.
double nusselt_flat_plate(double re, double pr);

// NU_CYLINDER_CROSS. Mean Nusselt number of a circular cylinder in cross flow:
//   Nu = 0.3 + 0.62·Re^(1/2)·Pr^(1/3)/[1 + (0.4/Pr)^(2/3)]^(1/4)
//            ·[1 + (Re/282000)^(5/8)]^(4/5)
// [ChurchillBernstein; Incropera eq. 7.54], properties at the film temperature.
// Range: Re·Pr >= 0.2 [Incropera], Re <= 10⁷ (about the upper end of the data
// Churchill and Bernstein correlated, from memory), Pr > 0.
double nusselt_cylinder_cross(double re, double pr);

// NU_FREE_PLATE. Mean Nusselt number of free convection on one face of a plate
// at a uniform temperature.
// Tilt convention: tilt is the angle in degrees between the face and the
// horizontal, measured so that for a face WARMER than the fluid
//     0 = horizontal, facing up;  90 = vertical;  180 = horizontal, facing down;
// between 90 and 180 the heated face looks downward. For a face COLDER than
// the fluid the flow is the mirror image: give 180 − its tilt (a cold face
// looking up counts as a heated face looking down).
// Characteristic length in Ra and Nu: the plate height along the slope for
// vertical and inclined plates; area/perimeter for horizontal plates.
//   90 <= tilt <= 150: Churchill–Chu, vertical plate, with g replaced by
//       g·cos θ, θ = tilt − 90 from the vertical (up to 60°), i.e. Ra·cos θ:
//         Nu = {0.825 + 0.387·Ra^(1/6)/[1 + (0.492/Pr)^(9/16)]^(8/27)}²
//       [ChurchillChuPlate; Incropera eq. 9.26 and §9.6.2]. Range
//       0.1 <= Ra·cos θ <= 10¹² (the range Churchill and Chu state, from
//       memory), Pr > 0.
//   tilt = 0 (heated face up): Nu = 0.54·Ra^(1/4) for 10⁴ <= Ra <= 10⁷ with
//       Pr >= 0.7, Nu = 0.15·Ra^(1/3) for 10⁷ < Ra <= 10¹¹, any Pr
//       [Incropera eqs. 9.30, 9.31, after McAdams and Lloyd & Moran 1974].
//       The published pair does not meet at 10⁷ (they differ by 6 %).
//   tilt = 180 (heated face down): Nu = 0.52·Ra^(1/5), 10⁴ <= Ra <= 10⁹,
//       Pr >= 0.7 [Incropera eq. 9.32, after Radziemska & Lewandowski 2001].
//   0 < tilt < 90 (heated face inclined upward) and 150 < tilt < 180 are
//       refused: the flow separates into three-dimensional plumes and the
//       sources give no general correlation [Incropera §9.6.2].
double nusselt_free_plate(double ra, double pr, double tilt_deg);

// NU_FREE_CYLINDER. Mean Nusselt number of free convection around a long
// horizontal cylinder at a uniform temperature, based on its diameter:
//   Nu = {0.60 + 0.387·Ra^(1/6)/[1 + (0.559/Pr)^(9/16)]^(8/27)}²
// [ChurchillChuCylinder; Incropera eq. 9.34]. Range: 0 <= Ra <= 10¹² (the
// upper limit Incropera states; no lower limit is stated, and Ra = 0 gives the
// equation's own limit 0.36), Pr > 0.
double nusselt_free_cylinder(double ra, double pr);

// NU_TILTED_GAP. Nusselt number across an inclined air layer between two
// parallel plates heated from below (the lower plate warmer), based on the gap:
//   Nu = 1 + 1.44·[1 − 1708·(sin 1.8β)^1.6/(Ra·cos β)]·[1 − 1708/(Ra·cos β)]⁺
//          + [(Ra·cos β/5830)^(1/3) − 1]⁺
// [Hollands; Duffie eq. 3.12.1], [x]⁺ = max(x, 0), β the tilt from horizontal.
// Range: 0 <= tilt <= 75°, 0 <= Ra <= 10⁵ (Ra on the gap and the plate-to-plate
// ΔT), air (Pr ≈ 0.7) in layers much longer than wide [Hollands; Duffie §3.12].
// Below Ra·cos β = 1708 (onset of cellular convection) Nu = 1: conduction.
double nusselt_tilted_gap(double ra, double tilt_deg);

// CONV_WIND_COEFF. Wind heat transfer coefficient on a flat cover, W/(m²·K):
//   h = max(5, 8.6·V^0.6/L^0.4)
// [Sparrow; Duffie §3.15 (section from memory)]. L is
// the characteristic length (Duffie uses the cube root of the house volume for
// roof collectors). V >= 0 (0 gives the floor 5), L > 0. The source states no
// upper wind speed.
double wind_coefficient(double wind_speed, double length);

// CONV_PIPE_COEFF. Heat transfer coefficient of flow inside a circular tube,
// W/(m²·K):
//   Re = 4·ṁ/(π·D·μ),  Nu = NU_PIPE(Re, Pr, L/D),  h = Nu·k/D,
// properties (μ, cp, k) of the fluid at T_mean (fluids::at). ṁ > 0, D > 0;
// length L > 0 when given (L/D >= 1). Re and Pr must lie in NU_PIPE's range.
// length <= 0 means "not given"; glycol_fraction as in fluids::at.
double pipe_coefficient(const std::string& fluid, double t_mean_celsius, double mass_flow,
                        double inner_diameter, double length, double glycol_fraction);
// The same with length absent (nullopt) for fully developed flow; a length
// that is given must be > 0.
double pipe_coefficient(const std::string& fluid, double t_mean_celsius, double mass_flow,
                        double inner_diameter, std::optional<double> length, double glycol_fraction);

// The bare formulas, without range checks, for callers that have checked the
// range themselves (the pipe-loss solver evaluates them many times).
namespace formula {
double churchill_bernstein(double re, double pr);     // as nusselt_cylinder_cross
double churchill_chu_cylinder(double ra, double pr);  // as nusselt_free_cylinder
}  // namespace formula

}  // namespace solarith::convection
