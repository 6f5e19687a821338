// Catalogue entries of the storage family (STORE_*).
#include "solarith/catalog.hpp"
#include "solarith/storage.hpp"

namespace solarith::catalog {

std::vector<FunctionSpec> storage_functions()
{
    namespace store = solarith::storage;
    return {
        {"STORE_SENSIBLE", "Storage",
         "Sensible heat stored by a mass warmed from T1 to T2 at constant specific heat (released when T2 is "
         "below T1).",
         "J", ResultKind::Number,
         "Q = m·cp·(T2 − T1), sensible heat storage at constant specific heat (Duffie & Beckman, Solar "
         "Engineering of Thermal Processes, 4th ed., 2013, §8.3; Sharma et al., Renew. Sustain. Energy Rev. 13, "
         "2009, 318–345, eq. 1). No phase change between T1 and T2. Valid for m >= 0, cp > 0, temperatures "
         ">= -273.15 °C. Positive when heating, negative when cooling.",
         {{"mass", ArgKind::Number, "kg", "Mass of the storage material, >= 0"},
          {"cp", ArgKind::Number, "J/(kg·K)", "Specific heat, > 0, taken constant over T1..T2"},
          {"T1", ArgKind::Number, "°C", "Start temperature"},
          {"T2", ArgKind::Number, "°C", "End temperature"}},
         "200; 4186; 15; 60",
         [](const Args& a) -> Result {
             return store::sensible_heat(a.number(0), a.number(1), a.number(2), a.number(3));
         }},
        {"STORE_LATENT", "Storage",
         "Latent heat taken up by a mass that melts (or evaporates) completely at constant temperature.",
         "J", ResultKind::Number,
         "Q = m·λ, latent heat of a complete phase change (the latent term of Sharma et al., Renew. Sustain. "
         "Energy Rev. 13, 2009, 318–345, eq. 3, with melted fraction 1). Valid for m >= 0, λ >= 0.",
         {{"mass", ArgKind::Number, "kg", "Mass changing phase, >= 0"},
          {"latent_heat", ArgKind::Number, "J/kg", "Specific latent heat of the phase change, >= 0"}},
         "1; 333700",
         [](const Args& a) -> Result { return store::latent_heat(a.number(0), a.number(1)); }},
        {"STORE_PCM", "Storage",
         "Heat stored by a phase-change material taken from T1 to T2: sensible heat of the solid, latent heat "
         "when it crosses the melting point, sensible heat of the liquid (negative when it cools).",
         "J", ResultKind::Number,
         "For heating across the melting point, Q = m·[cp_solid·(T_melt − T1) + λ + cp_liquid·(T2 − T_melt)] "
         "(Sharma et al., Renew. Sustain. Energy Rev. 13, 2009, 318–345, eq. 3); when T1 and T2 lie on one side "
         "of T_melt only that phase's sensible term applies. Cooling gives the same magnitude with a negative "
         "sign: Q(T1, T2) = −Q(T2, T1). Isothermal melting at T_melt; a state exactly at T_melt counts as fully "
         "solid, so a path from T_melt upward includes λ and a path ending at T_melt from below does not. "
         "Constant cp in each phase. Valid for m >= 0, cp_solid > 0, cp_liquid > 0, λ >= 0, temperatures "
         ">= -273.15 °C.",
         {{"mass", ArgKind::Number, "kg", "Mass of the phase-change material, >= 0"},
          {"cp_solid", ArgKind::Number, "J/(kg·K)", "Specific heat of the solid, > 0"},
          {"cp_liquid", ArgKind::Number, "J/(kg·K)", "Specific heat of the liquid, > 0"},
          {"T_melt", ArgKind::Number, "°C", "Melting temperature"},
          {"latent_heat", ArgKind::Number, "J/kg", "Specific latent heat of melting, >= 0"},
          {"T1", ArgKind::Number, "°C", "Start temperature"},
          {"T2", ArgKind::Number, "°C", "End temperature"}},
         "10; 2000; 2200; 50; 200000; 20; 70",
         [](const Args& a) -> Result {
             return store::pcm_heat(a.number(0), a.number(1), a.number(2), a.number(3), a.number(4), a.number(5),
                                    a.number(6));
         }},
        {"STORE_WATER", "Storage",
         "Heat to bring a volume of liquid water from T1 to T2, with the real density and specific heat of "
         "water (released, negative, when T2 is below T1).",
         "J", ResultKind::Number,
         "Q = V·ρ(T1)·∫ cp dT from T1 to T2 = mass × enthalpy difference at constant pressure (cp = (∂h/∂T)_p), "
         "ρ and h of liquid water from IAPWS-IF97 region 1 (IAPWS R7-97(2012), as WATER_DENSITY and WATER_CP). "
         "The volume is measured at T1 (the mass of the water as it starts). Pressure constant at 101325 Pa, or "
         "the saturation pressure of the hotter temperature where that is higher, so the water stays liquid. "
         "Sensible heat storage in water (Duffie & Beckman, Solar Engineering of Thermal Processes, 4th ed., "
         "2013, §8.3). Valid for V >= 0 and T1, T2 in 0..200 °C.",
         {{"volume", ArgKind::Number, "m³", "Volume of the water at T1, >= 0"},
          {"T1", ArgKind::Number, "°C", "Start temperature, 0..200"},
          {"T2", ArgKind::Number, "°C", "End temperature, 0..200"}},
         "0.3; 15; 60",
         [](const Args& a) -> Result { return store::water_heat(a.number(0), a.number(1), a.number(2)); }},
        {"STORE_TANK_VOLUME", "Storage",
         "Volume of a water store that holds a given amount of heat between a charged (hot) and a discharged "
         "(cold) temperature.",
         "m³", ResultKind::Number,
         "V = E/(ρ(T_hot)·∫ cp dT from T_cold to T_hot), the inverse of STORE_WATER: STORE_WATER(V; T_hot; T_cold) "
         "= −E, the heat a tank full of water at T_hot releases when cooled to T_cold; the volume is that of the "
         "hot water (what the tank must hold). Closed form, STORE_WATER being linear in V. Properties and "
         "pressure as STORE_WATER (101325 Pa, or the saturation pressure at T_hot where higher). Valid for E >= 0, "
         "0 <= T_cold < T_hot <= 200 °C.",
         {{"energy", ArgKind::Number, "J", "Heat to be stored, >= 0"},
          {"T_hot", ArgKind::Number, "°C", "Temperature of the charged store, above T_cold, <= 200"},
          {"T_cold", ArgKind::Number, "°C", "Temperature the store is discharged to, >= 0"}},
         "36e6; 60; 15",
         [](const Args& a) -> Result { return store::tank_volume(a.number(0), a.number(1), a.number(2)); }},
        {"STORE_TANK_UA", "Storage",
         "Heat loss coefficient UA of an insulated cylindrical tank: side wall and both flat ends, conduction "
         "through the insulation and the outer surface film.",
         "W/K", ResultKind::Number,
         "UA = 1/R_side + 2/R_end with R_side = ln(r_o/r_i)/(2π·k·H) + 1/(h·2π·r_o·H) (cylindrical shell, "
         "Incropera et al., Fundamentals of Heat and Mass Transfer, 6th ed., 2007, §3.3.1) and R_end = "
         "t/(k·π·r_i²) + 1/(h·π·r_i²) for each end (plane layer, §3.1), r_i = D/2, r_o = r_i + t. Neglected: the "
         "inner film and the tank wall, the insulation ring around the rims of the ends and corner conduction "
         "(one-dimensional ends over the cross section π·D²/4). One h on all outer faces (include radiation in "
         "it if wanted). Valid for D > 0, H > 0, t >= 0 (0 gives the surface films alone), k > 0, h > 0.",
         {{"diameter", ArgKind::Number, "m", "Inside diameter of the tank (of the water), > 0"},
          {"height", ArgKind::Number, "m", "Height of the cylindrical wall (of the water), > 0"},
          {"insulation_thickness", ArgKind::Number, "m", "Thickness of the insulation on wall and ends, >= 0"},
          {"insulation_conductivity", ArgKind::Number, "W/(m·K)", "Thermal conductivity of the insulation, > 0"},
          {"h_outside", ArgKind::OptionalNumber, "W/(m²·K)", "Heat transfer coefficient on the outer surface, > 0",
           10.0}},
         "0.6; 1.5; 0.1; 0.04",
         [](const Args& a) -> Result {
             return store::tank_ua(a.number(0), a.number(1), a.number(2), a.number(3), a.number(4));
         }},
        {"STORE_COOLDOWN", "Storage",
         "Temperature of a fully mixed water tank after a time of standing in surroundings at another "
         "temperature, for a known heat loss coefficient UA.",
         "°C", ResultKind::Number,
         "m·cp(T)·dT/dt = −UA·(T − T_ambient), m = ρ(T_start)·V, integrated exactly with cp varying with "
         "temperature: UA·t/m = ∫ cp(T) dT/(T − T_ambient) from T to T_start, the integral by Gauss–Kronrod "
         "quadrature in ln|T − T_ambient| and T by TOMS 748 root finding (Boost.Math). With constant cp it is "
         "the exponential decay T = T_ambient + (T_start − T_ambient)·exp(−UA·t/(m·cp)) (fully mixed tank, "
         "Duffie & Beckman, Solar Engineering of Thermal Processes, 4th ed., 2013, §8.3; lumped capacitance, "
         "Incropera et al., 6th ed., 2007, §5.1). ρ and cp of liquid water (WATER_DENSITY, WATER_CP) at 101325 Pa "
         "or the saturation pressure of the hottest state where higher. A tank colder than its surroundings "
         "warms by the same law. The water must stay liquid: T_start 0..200 °C, T_ambient <= 200 °C, and below "
         "0 °C ambient a tank that would reach 0 °C within time_s is refused (freezing is not modelled). Valid "
         "for UA >= 0, V > 0, t >= 0.",
         {{"T_start", ArgKind::Number, "°C", "Water temperature at time 0, 0..200"},
          {"T_ambient", ArgKind::Number, "°C", "Temperature of the surroundings, <= 200"},
          {"UA", ArgKind::Number, "W/K", "Heat loss coefficient of the tank, >= 0 (e.g. STORE_TANK_UA)"},
          {"volume", ArgKind::Number, "m³", "Volume of the water at T_start, > 0"},
          {"time_s", ArgKind::Number, "s", "Time since the start, >= 0"}},
         "60; 20; 2; 0.3; 86400",
         [](const Args& a) -> Result {
             return store::cooldown_temperature(a.number(0), a.number(1), a.number(2), a.number(3), a.number(4));
         }},
    };
}

}  // namespace solarith::catalog
