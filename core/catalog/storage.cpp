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
    };
}

}  // namespace solarith::catalog
