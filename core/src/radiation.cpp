#include "solarith/radiation.hpp"

#include "solarith/constants.hpp"
#include "solarith/errors.hpp"

namespace solarith::radiation {

using constants::kelvin;

double emissive_power(double t_celsius, double emissivity)
{
    constexpr const char* fn = "RAD_EMISSIVE";
    check::celsius(fn, "T", t_celsius);
    check::fraction(fn, "emissivity", emissivity);
    const double t = kelvin(t_celsius);
    return emissivity * constants::stefan_boltzmann * (t * t) * (t * t);
}

}  // namespace solarith::radiation
