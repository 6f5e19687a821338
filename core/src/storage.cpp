#include "solarith/storage.hpp"

#include "solarith/errors.hpp"

#include <algorithm>

namespace solarith::storage {

double sensible_heat(double mass, double cp, double t1_celsius, double t2_celsius)
{
    constexpr const char* fn = "STORE_SENSIBLE";
    check::non_negative(fn, "mass", mass);
    check::positive(fn, "cp", cp);
    check::celsius(fn, "T1", t1_celsius);
    check::celsius(fn, "T2", t2_celsius);
    return mass * cp * (t2_celsius - t1_celsius);
}

double latent_heat(double mass, double latent_heat_per_kg)
{
    constexpr const char* fn = "STORE_LATENT";
    check::non_negative(fn, "mass", mass);
    check::non_negative(fn, "latent_heat", latent_heat_per_kg);
    return mass * latent_heat_per_kg;
}

double pcm_heat(double mass, double cp_solid, double cp_liquid, double t_melt_celsius,
                double latent_heat_per_kg, double t1_celsius, double t2_celsius)
{
    constexpr const char* fn = "STORE_PCM";
    check::non_negative(fn, "mass", mass);
    check::positive(fn, "cp_solid", cp_solid);
    check::positive(fn, "cp_liquid", cp_liquid);
    check::celsius(fn, "T_melt", t_melt_celsius);
    check::non_negative(fn, "latent_heat", latent_heat_per_kg);
    check::celsius(fn, "T1", t1_celsius);
    check::celsius(fn, "T2", t2_celsius);

    // Heat to warm from the lower to the higher temperature, J/kg; the sign
    // of the path is applied at the end, which makes the result antisymmetric.
    const double low = std::min(t1_celsius, t2_celsius);
    const double high = std::max(t1_celsius, t2_celsius);
    const double solid = cp_solid * std::max(0.0, std::min(high, t_melt_celsius) - low);
    const bool melts = low <= t_melt_celsius && t_melt_celsius < high;  // T_melt itself counts as solid
    const double latent = melts ? latent_heat_per_kg : 0.0;
    const double liquid = cp_liquid * std::max(0.0, high - std::max(low, t_melt_celsius));
    const double warming = mass * (solid + latent + liquid);
    return t2_celsius >= t1_celsius ? warming : -warming;
}

}  // namespace solarith::storage
