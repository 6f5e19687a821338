// Catalogue entries of the convection family (CONV_*).
#include "solarith/catalog.hpp"
#include "solarith/convection.hpp"

namespace solarith::catalog {

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
    };
}

}  // namespace solarith::catalog
