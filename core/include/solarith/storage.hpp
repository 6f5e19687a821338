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

}  // namespace solarith::storage
