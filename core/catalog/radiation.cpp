// Catalogue entries of the radiation family (RAD_*).
#include "solarith/catalog.hpp"
#include "solarith/radiation.hpp"

namespace solarith::catalog {

std::vector<FunctionSpec> radiation_functions()
{
    namespace rad = solarith::radiation;
    return {
        {"RAD_EMISSIVE", "Radiation",
         "Radiant power emitted per unit area by a grey surface at temperature T.",
         "W/m²", ResultKind::Number,
         "E = emissivity·sigma·(T + 273.15)⁴, Stefan–Boltzmann law for a grey body "
         "(Stefan 1879; Boltzmann 1884); sigma = 5.670374419e-8 W/(m²·K⁴), CODATA 2018. "
         "Valid for T >= -273.15 °C and emissivity 0..1.",
         {{"T", ArgKind::Number, "°C", "Surface temperature"},
          {"emissivity", ArgKind::OptionalNumber, "–", "Hemispherical total emissivity, 0..1", 1.0}},
         "60; 0.9",
         [](const Args& a) -> Result { return rad::emissive_power(a.number(0), a.number(1)); }},
    };
}

}  // namespace solarith::catalog
