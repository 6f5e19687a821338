#include "solarith/losses.hpp"

#include "solarith/constants.hpp"
#include "solarith/convection.hpp"
#include "solarith/errors.hpp"
#include "solarith/properties.hpp"

#include <boost/math/tools/roots.hpp>

#include <algorithm>
#include <cmath>

namespace solarith::losses {

using constants::pi;

namespace {

constexpr const char* fn = "LOSS_PIPE";
constexpr double air_min_celsius = -50.0;
constexpr double air_max_celsius = 500.0;

// The outside of the pipe: air at T_ambient, surroundings at T_ambient. The
// surface is described by its distance `rise` = |T_s − T_ambient| >= 0 from
// ambient on the side of the fluid (`direction` +1 when the fluid is warmer),
// so that small differences keep their relative precision.
class PipeOutside {
public:
    PipeOutside(double t_ambient, double direction, double diameter, double emissivity, double wind_speed)
        : t_ambient_(t_ambient), direction_(direction), diameter_(diameter), emissivity_(emissivity),
          wind_speed_(wind_speed)
    {
    }

    double surface(double rise) const { return t_ambient_ + direction_ * rise; }

    // Outer convection coefficient, W/(m²·K), air at the film temperature.
    double h(double rise) const
    {
        const fluids::Properties air = fluids::at(fn, "air", t_ambient_ + 0.5 * direction_ * rise, 0.0);
        return nusselt(rise, air) * air.conductivity / diameter_;
    }

    // Convection and radiation away from the surface, W/m, both >= 0 when
    // measured in the direction of the heat flow.
    double convection(double rise) const { return h(rise) * pi * diameter_ * rise; }
    double radiation(double rise) const
    {
        // T_s⁴ − T_a⁴ = (T_s − T_a)(T_s + T_a)(T_s² + T_a²), in kelvin.
        const double ts = constants::kelvin(surface(rise));
        const double ta = constants::kelvin(t_ambient_);
        return emissivity_ * constants::stefan_boltzmann * pi * diameter_ * rise * (ts + ta) * (ts * ts + ta * ta);
    }
    double outward(double rise) const { return convection(rise) + radiation(rise); }

    // Refuses what the correlations do not cover at the film temperatures the
    // solve can meet (T_s between T_ambient and T_fluid).
    void check_ranges(double largest_rise) const
    {
        const double widest_film = t_ambient_ + 0.5 * direction_ * largest_rise;
        const double ra = rayleigh(largest_rise, fluids::at(fn, "air", widest_film, 0.0));
        if (!(ra <= 1e12))
            fail_domain(fn, "the outside Rayleigh number " + format_number(ra)
                                + " (insulated diameter and temperature difference) exceeds 1e12, the range of "
                                  "Churchill–Chu's horizontal-cylinder equation");
        if (wind_speed_ == 0)
            return;
        for (double film : {t_ambient_, widest_film}) {
            const fluids::Properties air = fluids::at(fn, "air", film, 0.0);
            const double re = reynolds(air);
            const double peclet = re * air.prandtl();
            if (!(peclet >= 0.2))
                fail_domain(fn, "wind_speed", wind_speed_,
                            "the speeds giving Re·Pr >= 0.2 (Churchill–Bernstein's range); here Re·Pr = "
                                + format_number(peclet) + " at the film temperature " + format_number(film)
                                + " °C. Give 0 for still air");
            if (!(re <= 1e7))
                fail_domain(fn, "wind_speed", wind_speed_,
                            "the speeds giving Re <= 1e7 (Churchill–Bernstein's range); here Re = "
                                + format_number(re));
        }
    }

private:
    double rayleigh(double rise, const fluids::Properties& air) const
    {
        return constants::standard_gravity * air.expansion * rise * diameter_ * diameter_ * diameter_
               / (air.kinematic_viscosity() * air.diffusivity());
    }

    double reynolds(const fluids::Properties& air) const
    {
        return wind_speed_ * diameter_ / air.kinematic_viscosity();
    }

    double nusselt(double rise, const fluids::Properties& air) const
    {
        const double free = convection::formula::churchill_chu_cylinder(rayleigh(rise, air), air.prandtl());
        if (wind_speed_ == 0)
            return free;
        const double forced = convection::formula::churchill_bernstein(reynolds(air), air.prandtl());
        return std::cbrt(forced * forced * forced + free * free * free);
    }

    double t_ambient_;
    double direction_;
    double diameter_;
    double emissivity_;
    double wind_speed_;
};

// Root of f on [0, upper] where f(0) > 0 > f(upper), by TOMS 748 to full
// precision relative to the root.
template <class F>
double bracketed_root(F f, double upper, double f_upper)
{
    if (f_upper == 0)
        return upper;
    const double f_zero = f(0.0);
    if (!(f_zero > 0 && f_upper < 0))  // cannot happen for valid input (see losses.hpp); never return a guess
        fail_evaluation(fn, "the surface temperature is not bracketed by T_fluid and T_ambient");
    constexpr boost::uintmax_t max_iterations = 200;
    boost::uintmax_t iterations = max_iterations;
    std::pair<double, double> root;
    try {
        root = boost::math::tools::toms748_solve(f, 0.0, upper, f_zero, f_upper,
                                                 boost::math::tools::eps_tolerance<double>(52), iterations);
    } catch (const DomainError&) {
        throw;
    } catch (const std::exception& e) {
        fail_evaluation(fn, std::string("the surface temperature solve failed (") + e.what() + ")");
    }
    if (iterations >= max_iterations)
        fail_evaluation(fn, "the surface temperature did not converge in 200 iterations");
    return 0.5 * (root.first + root.second);
}

}  // namespace

PipeBalance pipe_balance(double t_fluid_celsius, double t_ambient_celsius, double pipe_outer_diameter,
                         double insulation_thickness, double insulation_conductivity, double emissivity,
                         double wind_speed)
{
    check::between(fn, "T_fluid", t_fluid_celsius, air_min_celsius, air_max_celsius);
    check::between(fn, "T_ambient", t_ambient_celsius, air_min_celsius, air_max_celsius);
    check::positive(fn, "pipe_outer_diameter", pipe_outer_diameter);
    check::non_negative(fn, "insulation_thickness", insulation_thickness);
    check::positive(fn, "insulation_conductivity", insulation_conductivity);
    check::fraction(fn, "emissivity", emissivity);
    check::non_negative(fn, "wind_speed", wind_speed);

    const double difference = t_fluid_celsius - t_ambient_celsius;
    const double direction = difference >= 0 ? 1.0 : -1.0;
    const double span = std::fabs(difference);  // the surface lies between 0 and span above ambient
    const double outer_diameter = pipe_outer_diameter + 2.0 * insulation_thickness;
    const PipeOutside outside(t_ambient_celsius, direction, outer_diameter, emissivity, wind_speed);
    outside.check_ranges(span);

    // The balance with the surface `rise` above ambient (at t_surface); `conducted`
    // is the heat through the insulation.
    const auto balance_at = [&](double t_surface, double rise, double conducted) {
        return PipeBalance{t_surface, direction * conducted, direction * outside.convection(rise),
                           direction * outside.radiation(rise), outside.h(rise)};
    };
    if (insulation_thickness == 0 || span == 0)  // bare pipe: the surface at the fluid temperature
        return balance_at(t_fluid_celsius, span, outside.outward(span));

    // Conductance of the insulation per metre, W/(m·K).
    const double conductance =
        2.0 * pi * insulation_conductivity / std::log1p(2.0 * insulation_thickness / pipe_outer_diameter);

    // Solve for the smaller of rise and drop, so that both the conducted and
    // the outward heat keep full relative precision.
    const double half = 0.5 * span;
    if (conductance * half - outside.outward(half) <= 0) {
        const auto excess = [&](double rise) { return conductance * (span - rise) - outside.outward(rise); };
        const double rise = bracketed_root(excess, half, excess(half));
        return balance_at(outside.surface(rise), rise, conductance * (span - rise));
    }
    const auto excess = [&](double drop) { return outside.outward(span - drop) - conductance * drop; };
    const double drop = bracketed_root(excess, half, excess(half));
    return balance_at(t_fluid_celsius - direction * drop, span - drop, conductance * drop);
}

double pipe_heat_loss(double t_fluid_celsius, double t_ambient_celsius, double pipe_outer_diameter,
                      double insulation_thickness, double insulation_conductivity, double emissivity,
                      double wind_speed)
{
    return pipe_balance(t_fluid_celsius, t_ambient_celsius, pipe_outer_diameter, insulation_thickness,
                        insulation_conductivity, emissivity, wind_speed)
        .conduction;
}

}  // namespace solarith::losses
