// Thermal energy storage: heat taken up by a mass of material. Energies in J,
// temperatures in °C, cp in J/(kg·K), latent heat in J/kg. A positive result
// is heat stored (the material warmed or melted), a negative one heat released.
//
// Sources (from memory of the printed texts):
//   [Duffie]  J.A. Duffie, W.A. Beckman, Solar Engineering of Thermal
//             Processes, 4th ed., Wiley, 2013, §8.3 (sensible storage, Q = m·cp·ΔT).
//   [Sharma]  A. Sharma, V.V. Tyagi, C.R. Chen, D. Buddhi, "Review on thermal
//             energy storage with phase change materials and applications",
//             Renew. Sustain. Energy Rev. 13 (2009) 318–345, eqs. 1 and 3
//             (equation numbers from memory).
//   [Incropera] F.P. Incropera, D.P. DeWitt, T.L. Bergman, A.S. Lavine,
//             Fundamentals of Heat and Mass Transfer, 6th ed., Wiley, 2007
//             (section numbers from memory).
//
// The water functions (STORE_WATER, STORE_TANK_VOLUME, STORE_COOLDOWN) take
// density and cp of liquid water from water:: (properties.hpp) at one constant
// pressure: 101325 Pa, or the saturation pressure of the hottest state where
// that is higher (water::default_pressure of the hottest temperature), so the
// water stays liquid over the whole process. Liquid water range: 0..200 °C.
#pragma once

namespace solarith::storage {

// Sensible heat to bring a mass from T1 to T2 at constant cp, J:
//   Q = m·cp·(T2 − T1)  [Duffie §8.3; Sharma eq. 1].
// m >= 0, cp > 0, T >= -273.15 °C. Positive when heating.
double sensible_heat(double mass, double cp, double t1_celsius, double t2_celsius);

// Latent heat to melt (or evaporate) a mass completely, J: Q = m·λ, the latent term
// of [Sharma eq. 3] with melted fraction a_m = 1. m >= 0, λ >= 0.
double latent_heat(double mass, double latent_heat_per_kg);

// Heat to bring a phase-change material from T1 to T2, J: sensible heat of the
// solid below T_melt (cp_solid), the latent heat when the path crosses T_melt,
// sensible heat of the liquid above T_melt (cp_liquid) [Sharma eq. 3]:
//   heating T1 < T_melt < T2:  Q = m·[cp_s·(T_melt − T1) + λ + cp_l·(T2 − T_melt)].
// Cooling gives the same magnitude with a negative sign, so
// Q(T1, T2) = −Q(T2, T1) exactly.
// Phase assumption: the material melts isothermally at T_melt and a state
// exactly at T_melt counts as fully solid. Heating from T_melt upward
// therefore includes λ; heating up to T_melt does not; cooling from above
// down to T_melt releases λ.
// m >= 0, cp_solid > 0, cp_liquid > 0, λ >= 0, temperatures >= -273.15 °C.
double pcm_heat(double mass, double cp_solid, double cp_liquid, double t_melt_celsius,
                double latent_heat_per_kg, double t1_celsius, double t2_celsius);

// STORE_WATER. Heat to bring a volume of liquid water from T1 to T2 at constant
// pressure, J:
//   Q = V·ρ(T1)·∫_{T1}^{T2} cp(T) dT,
// i.e. mass × enthalpy difference, since cp = (∂h/∂T)_p; the enthalpies are
// those of IAPWS-IF97 region 1 (water::formulation::region1, the formulation
// of WATER_CP and WATER_DENSITY). The volume is measured at T1, the state the
// water starts in (the mass of a tank filled at T1). Pressure as in the note
// above (of max(T1, T2)). Q < 0 when cooling (T2 < T1).
// V >= 0, T1 and T2 in 0..200 °C.
double water_heat(double volume, double t1_celsius, double t2_celsius);

// STORE_TANK_VOLUME. Volume of water at T_hot that releases the energy E when
// it cools to T_cold, m³ — the tank volume holding that heat when charged:
//   V = E / (ρ(T_hot)·∫_{T_cold}^{T_hot} cp dT),
// the inverse of STORE_WATER in the sense STORE_WATER(V; T_hot; T_cold) = −E
// (the volume is measured at the hot, start state). Closed form, since Q is
// linear in V. E >= 0, 0 <= T_cold < T_hot <= 200 °C.
double tank_volume(double energy, double t_hot_celsius, double t_cold_celsius);

// STORE_TANK_UA. Heat loss coefficient of an insulated vertical cylindrical
// tank, W/K: the side wall and the two flat ends in parallel, each a
// conduction resistance through the insulation in series with the outer film
// [Incropera §3.3.1 (cylinder), §3.1 (plane wall)]:
//   R_side = ln(r_o/r_i)/(2π·k·H) + 1/(h·2π·r_o·H),   r_i = D/2, r_o = r_i + t
//   R_end  = t/(k·π·r_i²) + 1/(h·π·r_i²)               (each end, plane layer)
//   UA = 1/R_side + 2/R_end.
// The inner film and the tank wall are neglected (the water side is at the
// water temperature), the ends are one-dimensional over the tank's cross
// section π·D²/4 (the ring of insulation around the rim, outside D, and the
// corner conduction are not counted), h is the same on all outer faces and
// includes radiation if the user wants it to. D > 0 (inner diameter),
// H > 0, t >= 0 (0 gives the films alone), k > 0, h > 0.
double tank_ua(double diameter, double height, double insulation_thickness, double insulation_conductivity,
               double h_outside);

// STORE_COOLDOWN. Temperature of a fully mixed water tank after time t in
// surroundings at T_ambient, °C. The energy balance
//   m·cp(T)·dT/dt = −UA·(T − T_ambient),  m = ρ(T_start)·V,
// is integrated exactly with cp varying with temperature: separating the
// variables with u = |T − T_ambient|,
//   UA·t/m = ∫_{ln u}^{ln u_start} cp(T_ambient ± e^s) ds,
// the integral by Gauss–Kronrod quadrature and the end temperature by TOMS 748
// (Boost.Math) on a bracket that always holds the root. With constant cp this
// is the exponential decay T = T_a + (T_start − T_a)·exp(−UA·t/(m·cp))
// [Incropera §5.1, lumped capacitance; Duffie §8.3, fully mixed tank].
// Heating (T_start < T_ambient) follows the same law. Within 1 µK of T_ambient
// cp is taken constant. The water must stay liquid: T_ambient <= 200 °C, and
// when T_ambient < 0 °C a tank that would reach 0 °C within time_s is refused
// (freezing is not modelled). T_start 0..200 °C, UA >= 0, V > 0, t >= 0.
double cooldown_temperature(double t_start_celsius, double t_ambient_celsius, double ua, double volume,
                            double time_s);

}  // namespace solarith::storage
