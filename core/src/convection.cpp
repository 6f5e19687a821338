#include "solarith/convection.hpp"

#include "solarith/constants.hpp"
#include "solarith/errors.hpp"
#include "solarith/properties.hpp"

#include <algorithm>
#include <cmath>

namespace solarith::convection {

using constants::pi;

namespace {

// ---- internal flow ---------------------------------------------------------

constexpr double laminar_limit = 2300.0;     // end of laminar flow, NU_PIPE
constexpr double turbulent_from = 4000.0;    // start of the Gnielinski correlation, NU_PIPE
constexpr double pipe_re_max = 5e6;          // upper end of Gnielinski's range
constexpr double gnielinski_pr_min = 0.5;
constexpr double gnielinski_pr_max = 2000.0;

// Laminar mean Nu at uniform wall temperature: 3.66 fully developed, Hausen's
// thermal-entry form for a tube of the given L/D.
double laminar_pipe(double re, double pr, std::optional<double> length_to_diameter)
{
    constexpr double fully_developed = 3.66;
    if (!length_to_diameter)
        return fully_developed;
    const double graetz = re * pr / *length_to_diameter;
    return fully_developed + 0.0668 * graetz / (1.0 + 0.04 * std::pow(graetz, 2.0 / 3.0));
}

// Gnielinski's correlation with Petukhov's smooth-tube friction factor and,
// for a tube of given L/D, the short-tube factor 1 + (D/L)^(2/3).
double gnielinski(double re, double pr, std::optional<double> length_to_diameter)
{
    const double f = std::pow(0.790 * std::log(re) - 1.64, -2.0);
    const double f8 = f / 8.0;
    const double developed = f8 * (re - 1000.0) * pr / (1.0 + 12.7 * std::sqrt(f8) * (std::pow(pr, 2.0 / 3.0) - 1.0));
    if (!length_to_diameter)
        return developed;
    return developed * (1.0 + std::pow(1.0 / *length_to_diameter, 2.0 / 3.0));
}

// NU_PIPE's checks and regimes. `fn` names the spreadsheet function; `re_name`
// and `pr_name` the arguments (or how they were obtained) for the messages.
double pipe_nusselt(const char* fn, const char* re_name, const char* pr_name, double re, double pr,
                    std::optional<double> length_to_diameter, const char* ld_name)
{
    if (!(re > 0 && re <= pipe_re_max))
        fail_domain(fn, re_name, re, "0 < Re <= 5e6 (laminar, transition and the Gnielinski range)");
    check::positive(fn, pr_name, pr);
    if (re > laminar_limit && !(pr >= gnielinski_pr_min && pr <= gnielinski_pr_max))
        fail_domain(fn, pr_name, pr,
                    "0.5..2000, Gnielinski's range, which applies above Re = 2300 (here Re = " + format_number(re)
                        + ")");
    if (length_to_diameter && !(*length_to_diameter >= 1.0 && std::isfinite(*length_to_diameter)))
        fail_domain(fn, ld_name, *length_to_diameter,
                    "1 and above (the range of the entry-length forms); omit it for fully developed flow");

    if (re <= laminar_limit)
        return laminar_pipe(re, pr, length_to_diameter);
    if (re >= turbulent_from)
        return gnielinski(re, pr, length_to_diameter);
    const double laminar = laminar_pipe(laminar_limit, pr, length_to_diameter);
    const double turbulent = gnielinski(turbulent_from, pr, length_to_diameter);
    const double weight = (re - laminar_limit) / (turbulent_from - laminar_limit);
    return laminar + weight * (turbulent - laminar);
}

// ---- free convection on plates ---------------------------------------------

// Churchill–Chu, vertical plate, all Ra.
double churchill_chu_plate(double ra, double pr)
{
    const double prandtl_factor = std::pow(1.0 + std::pow(0.492 / pr, 9.0 / 16.0), 8.0 / 27.0);
    const double root = 0.825 + 0.387 * std::pow(ra, 1.0 / 6.0) / prandtl_factor;
    return root * root;
}

double heated_face_up(double ra, double pr)
{
    constexpr const char* fn = "NU_FREE_PLATE";
    if (!(ra >= 1e4 && ra <= 1e11))
        fail_domain(fn, "Ra", ra, "1e4..1e11 for a horizontal plate with the heated face up (tilt 0)");
    if (ra <= 1e7) {
        if (!(pr >= 0.7))
            fail_domain(fn, "Pr", pr, "0.7 and above for a heated face up at Ra <= 1e7 (Nu = 0.54·Ra^(1/4))");
        return 0.54 * std::pow(ra, 0.25);
    }
    return 0.15 * std::cbrt(ra);
}

double heated_face_down(double ra, double pr)
{
    constexpr const char* fn = "NU_FREE_PLATE";
    if (!(ra >= 1e4 && ra <= 1e9))
        fail_domain(fn, "Ra", ra, "1e4..1e9 for a horizontal plate with the heated face down (tilt 180)");
    if (!(pr >= 0.7))
        fail_domain(fn, "Pr", pr, "0.7 and above for a heated face down (Nu = 0.52·Ra^(1/5))");
    return 0.52 * std::pow(ra, 0.2);
}

double vertical_or_inclined(double ra, double pr, double tilt_deg)
{
    constexpr const char* fn = "NU_FREE_PLATE";
    // θ from the vertical; the tilt lies in 90..150, so cos θ >= 1/2.
    const double from_vertical = (tilt_deg - 90.0) * pi / 180.0;
    const double effective_ra = ra * std::cos(from_vertical);
    if (!(effective_ra >= 0.1 && effective_ra <= 1e12))
        fail_domain(fn, "Ra·cos(tilt − 90°) = " + format_number(effective_ra) + " (Ra = " + format_number(ra)
                            + ", tilt = " + format_number(tilt_deg)
                            + ") is outside 0.1..1e12, the range of Churchill–Chu's vertical-plate equation");
    return churchill_chu_plate(effective_ra, pr);
}

}  // namespace

namespace formula {

double churchill_bernstein(double re, double pr)
{
    const double laminar_part = 0.62 * std::sqrt(re) * std::cbrt(pr)
                                / std::pow(1.0 + std::pow(0.4 / pr, 2.0 / 3.0), 0.25);
    return 0.3 + laminar_part * std::pow(1.0 + std::pow(re / 282000.0, 5.0 / 8.0), 4.0 / 5.0);
}

double churchill_chu_cylinder(double ra, double pr)
{
    const double prandtl_factor = std::pow(1.0 + std::pow(0.559 / pr, 9.0 / 16.0), 8.0 / 27.0);
    const double root = 0.60 + 0.387 * std::pow(ra, 1.0 / 6.0) / prandtl_factor;
    return root * root;
}

}  // namespace formula

double newton_heat_flow(double h, double area, double t_surface_celsius, double t_fluid_celsius)
{
    constexpr const char* fn = "CONV_HEAT";
    check::non_negative(fn, "h", h);
    check::non_negative(fn, "area", area);
    check::celsius(fn, "T_surface", t_surface_celsius);
    check::celsius(fn, "T_fluid", t_fluid_celsius);
    return h * area * (t_surface_celsius - t_fluid_celsius);
}

double reynolds(double velocity, double length, double kinematic_viscosity)
{
    constexpr const char* fn = "DIM_REYNOLDS";
    check::non_negative(fn, "velocity", velocity);
    check::positive(fn, "length", length);
    check::positive(fn, "kinematic_viscosity", kinematic_viscosity);
    return velocity * length / kinematic_viscosity;
}

double rayleigh(double t_hot_celsius, double t_cold_celsius, double length, const std::string& fluid,
                double glycol_fraction)
{
    constexpr const char* fn = "DIM_RAYLEIGH";
    check::celsius(fn, "T_hot", t_hot_celsius);
    check::celsius(fn, "T_cold", t_cold_celsius);
    check::positive(fn, "length", length);
    const double t_mean = 0.5 * (t_hot_celsius + t_cold_celsius);
    const fluids::Properties p = fluids::at(fn, fluid, t_mean, glycol_fraction);
    if (!(p.expansion > 0))
        fail_domain(fn, "the expansion coefficient of " + fluid + " at the mean temperature "
                            + format_number(t_mean) + " °C is " + format_number(p.expansion)
                            + " 1/K; the Boussinesq form g·β·ΔT needs β > 0 (water near its density "
                              "maximum at 4 °C is outside it)");
    const double delta_t = std::fabs(t_hot_celsius - t_cold_celsius);
    return constants::standard_gravity * p.expansion * delta_t * length * length * length
           / (p.kinematic_viscosity() * p.diffusivity());
}

double nusselt_pipe(double re, double pr, double length_to_diameter)
{
    std::optional<double> ld;
    if (length_to_diameter > 0)
        ld = length_to_diameter;
    return nusselt_pipe(re, pr, ld);
}

double nusselt_pipe(double re, double pr, std::optional<double> length_to_diameter)
{
    return pipe_nusselt("NU_PIPE", "Re", "Pr", re, pr, length_to_diameter, "length_to_diameter");
}

double nusselt_flat_plate(double re, double pr)
{
    constexpr const char* fn = "NU_FLAT_PLATE";
    constexpr double transition = 5e5;
    if (!(re > 0 && re <= 1e8))
        fail_domain(fn, "Re", re, "0 < Re <= 1e8");
    if (re <= transition) {
        if (!(pr >= 0.6 && std::isfinite(pr)))
            fail_domain(fn, "Pr", pr, "0.6 and above (laminar boundary layer, Re <= 5e5)");
        return 0.664 * std::sqrt(re) * std::cbrt(pr);
    }
    if (!(pr >= 0.6 && pr <= 60))
        fail_domain(fn, "Pr", pr, "0.6..60 (mixed boundary layer, Re > 5e5)");
    return (0.037 * std::pow(re, 0.8) - 871.0) * std::cbrt(pr);
}

double nusselt_cylinder_cross(double re, double pr)
{
    constexpr const char* fn = "NU_CYLINDER_CROSS";
    if (!(re > 0 && re <= 1e7))
        fail_domain(fn, "Re", re, "0 < Re <= 1e7");
    check::positive(fn, "Pr", pr);
    if (!(re * pr >= 0.2))
        fail_domain(fn, "Re·Pr = " + format_number(re * pr)
                            + " is below 0.2, the lower limit of Churchill–Bernstein's equation");
    return formula::churchill_bernstein(re, pr);
}

double nusselt_free_plate(double ra, double pr, double tilt_deg)
{
    constexpr const char* fn = "NU_FREE_PLATE";
    check::non_negative(fn, "Ra", ra);
    check::positive(fn, "Pr", pr);
    check::between(fn, "tilt", tilt_deg, 0, 180);
    if (tilt_deg == 0)
        return heated_face_up(ra, pr);
    if (tilt_deg == 180)
        return heated_face_down(ra, pr);
    if (tilt_deg >= 90 && tilt_deg <= 150)
        return vertical_or_inclined(ra, pr, tilt_deg);
    fail_domain(fn, "tilt", tilt_deg,
                "the covered cases 0 (heated face up), 90..150 (vertical, or heated face looking down up to "
                "60° from vertical) and 180 (heated face down); a heated face inclined upward (0 < tilt < 90) "
                "or nearly horizontal facing down (150 < tilt < 180) has no general correlation");
}

double nusselt_free_cylinder(double ra, double pr)
{
    constexpr const char* fn = "NU_FREE_CYLINDER";
    check::between(fn, "Ra", ra, 0, 1e12);
    check::positive(fn, "Pr", pr);
    return formula::churchill_chu_cylinder(ra, pr);
}

double nusselt_tilted_gap(double ra, double tilt_deg)
{
    constexpr const char* fn = "NU_TILTED_GAP";
    check::between(fn, "Ra", ra, 0, 1e5);
    check::between(fn, "tilt", tilt_deg, 0, 75);
    constexpr double critical = 1708.0;  // onset of cellular convection, rigid plates
    const double beta = tilt_deg * pi / 180.0;
    const double ra_cos = ra * std::cos(beta);
    if (ra_cos <= critical)
        return 1.0;  // both bracketed terms vanish: conduction across the layer
    const double tilt_term = 1.0 - critical * std::pow(std::sin(1.8 * beta), 1.6) / ra_cos;
    const double onset = 1.0 - critical / ra_cos;
    const double cells = std::max(0.0, std::cbrt(ra_cos / 5830.0) - 1.0);
    return 1.0 + 1.44 * tilt_term * onset + cells;
}

double wind_coefficient(double wind_speed, double length)
{
    constexpr const char* fn = "CONV_WIND_COEFF";
    check::non_negative(fn, "wind_speed", wind_speed);
    check::positive(fn, "length", length);
    constexpr double floor = 5.0;  // W/(m²·K), the minimum Duffie & Beckman recommend
    return std::max(floor, 8.6 * std::pow(wind_speed, 0.6) / std::pow(length, 0.4));
}

double pipe_coefficient(const std::string& fluid, double t_mean_celsius, double mass_flow, double inner_diameter,
                        double length, double glycol_fraction)
{
    std::optional<double> given;
    if (length > 0)
        given = length;
    return pipe_coefficient(fluid, t_mean_celsius, mass_flow, inner_diameter, given, glycol_fraction);
}

double pipe_coefficient(const std::string& fluid, double t_mean_celsius, double mass_flow, double inner_diameter,
                        std::optional<double> length, double glycol_fraction)
{
    constexpr const char* fn = "CONV_PIPE_COEFF";
    check::positive(fn, "mass_flow", mass_flow);
    check::positive(fn, "inner_diameter", inner_diameter);
    std::optional<double> length_to_diameter;
    if (length) {
        check::positive(fn, "length", *length);
        length_to_diameter = *length / inner_diameter;
    }
    const fluids::Properties p = fluids::at(fn, fluid, t_mean_celsius, glycol_fraction);
    const double re = 4.0 * mass_flow / (pi * inner_diameter * p.viscosity);
    const double nu = pipe_nusselt(fn, "Re (from mass_flow, inner_diameter and viscosity)", "Pr (of the fluid)", re,
                                   p.prandtl(), length_to_diameter, "length/inner_diameter");
    return nu * p.conductivity / inner_diameter;
}

}  // namespace solarith::convection
