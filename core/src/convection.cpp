#include "solarith/convection.hpp"

#include "solarith/errors.hpp"

namespace solarith::convection {

double newton_heat_flow(double h, double area, double t_surface_celsius, double t_fluid_celsius)
{
    constexpr const char* fn = "CONV_HEAT";
    check::non_negative(fn, "h", h);
    check::non_negative(fn, "area", area);
    check::celsius(fn, "T_surface", t_surface_celsius);
    check::celsius(fn, "T_fluid", t_fluid_celsius);
    return h * area * (t_surface_celsius - t_fluid_celsius);
}

}  // namespace solarith::convection
