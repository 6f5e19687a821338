#include "solarith/collector.hpp"

#include "solarith/constants.hpp"
#include "solarith/convection.hpp"
#include "solarith/errors.hpp"
#include "solarith/properties.hpp"
#include "solarith/radiation.hpp"

#include <boost/math/interpolators/cubic_hermite.hpp>
#include <boost/math/tools/roots.hpp>

#include <algorithm>
#include <cmath>
#include <cstdint>
#include <string>
#include <utility>

namespace solarith::collector {

using constants::kelvin;
using constants::pi;
using constants::stefan_boltzmann;

namespace {

constexpr double degree = pi / 180.0;
constexpr double atmospheric_pressure = 101325.0;  // Pa, the gap air of the energy balance

// A whole number low..high (a count of covers).
int whole_number(const char* fn, const char* argument, double value, int low, int high)
{
    const std::string allowed = "the whole numbers " + std::to_string(low) + ".." + std::to_string(high);
    if (!(value >= low && value <= high) || value != std::floor(value))
        fail_domain(fn, argument, value, allowed);
    return static_cast<int>(value);
}

void check_curve(const char* fn, double eta0, double a1, double a2)
{
    check::fraction(fn, "eta0", eta0);
    check::non_negative(fn, "a1", a1);
    check::non_negative(fn, "a2", a2);
}

void check_incidence(const char* fn, double incidence_deg)
{
    check::between(fn, "incidence_deg", incidence_deg, 0.0, 180.0);
}

// Calls another family's function; its DomainError is reported under the
// calling function's name, with the part that refused the input named too.
template <class Call>
auto as_part_of(const char* fn, Call call) -> decltype(call())
{
    try {
        return call();
    } catch (const DomainError& e) {
        fail_domain(fn, e.what());
    }
}

// ---- Incidence angle modifier table ------------------------------------

int sign(double x) { return (x > 0) - (x < 0); }

// End slope of PCHIP: the three-point formula, kept shape-preserving
// (Moler 2004, §3.4; the rule SciPy's PchipInterpolator uses).
double pchip_end_slope(double h0, double h1, double delta0, double delta1)
{
    const double d = ((2 * h0 + h1) * delta0 - h0 * delta1) / (h0 + h1);
    if (sign(d) != sign(delta0))
        return 0.0;
    if (sign(delta0) != sign(delta1) && std::fabs(d) > 3 * std::fabs(delta0))
        return 3 * delta0;
    return d;
}

// Node slopes of the monotone piecewise cubic Hermite interpolant: weighted
// harmonic mean of the neighbouring secants, 0 at a local extremum
// (Fritsch & Butland 1984); two points give the straight line.
std::vector<double> pchip_slopes(const std::vector<double>& x, const std::vector<double>& y)
{
    const std::size_t n = x.size();
    std::vector<double> h(n - 1), delta(n - 1);
    for (std::size_t k = 0; k + 1 < n; ++k) {
        h[k] = x[k + 1] - x[k];
        delta[k] = (y[k + 1] - y[k]) / h[k];
    }
    if (n == 2)
        return {delta[0], delta[0]};
    std::vector<double> d(n);
    for (std::size_t k = 1; k + 1 < n; ++k) {
        if (sign(delta[k - 1]) * sign(delta[k]) <= 0) {
            d[k] = 0.0;
            continue;
        }
        const double w1 = 2 * h[k] + h[k - 1], w2 = h[k] + 2 * h[k - 1];
        d[k] = (w1 + w2) / (w1 / delta[k - 1] + w2 / delta[k]);
    }
    d[0] = pchip_end_slope(h[0], h[1], delta[0], delta[1]);
    d[n - 1] = pchip_end_slope(h[n - 2], h[n - 3], delta[n - 2], delta[n - 3]);
    return d;
}

std::string cell(const char* range, std::size_t index)
{
    return std::string(range) + ", cell " + std::to_string(index + 1);
}

void check_modifier_table(const char* fn, const std::vector<double>& angles, const std::vector<double>& modifiers)
{
    if (angles.size() != modifiers.size())
        fail_domain(fn, "angles has " + std::to_string(angles.size()) + " cells and modifiers "
                            + std::to_string(modifiers.size()) + "; each angle needs one modifier");
    for (std::size_t i = 0; i < angles.size(); ++i) {
        const std::string angle = cell("angles", i), modifier = cell("modifiers", i);
        if (!(angles[i] >= 0 && angles[i] <= 90))
            fail_domain(fn, angle.c_str(), angles[i], "0..90");
        if (i > 0 && !(angles[i] > angles[i - 1]))
            fail_domain(fn, angle.c_str(), angles[i],
                        "the angles above the previous cell's " + format_number(angles[i - 1])
                            + " (angles must increase strictly)");
        if (!(modifiers[i] >= 0 && modifiers[i] <= 2))
            fail_domain(fn, modifier.c_str(), modifiers[i], "0..2");
        if (angles[i] == 0 && modifiers[i] != 1)
            fail_domain(fn, modifier.c_str(), modifiers[i],
                        "the value 1 at 0° (the modifier is 1 at normal incidence by definition)");
        if (angles[i] == 90 && modifiers[i] != 0)
            fail_domain(fn, modifier.c_str(), modifiers[i],
                        "the value 0 at 90° (no beam reaches the absorber at grazing incidence)");
    }
}

// ---- Covers: Fresnel, Snell, Bouguer -------------------------------------

struct CoverOptics {
    double tau_r;  // transmittance for reflection losses alone
    double tau_a;  // transmittance for absorption losses alone
};

// N identical covers at incidence θ1 < 90° (radians).
CoverOptics cover_optics(double theta1, double n, double kl, int covers)
{
    const double cos1 = std::cos(theta1);
    const double sin2 = std::sin(theta1) / n;
    const double cos2 = std::sqrt(1.0 - sin2 * sin2);
    const double rs = std::pow((cos1 - n * cos2) / (cos1 + n * cos2), 2);
    const double rp = std::pow((n * cos1 - cos2) / (n * cos1 + cos2), 2);
    const double m = 2.0 * covers - 1.0;
    const double tau_r = 0.5 * ((1 - rs) / (1 + m * rs) + (1 - rp) / (1 + m * rp));
    return {tau_r, std::exp(-covers * kl / cos2)};
}

// ---- Top loss: the cover chain --------------------------------------------

// Upper Rayleigh number of Hollands et al. (1976); above it the gap
// correlation does not apply. Used only to cap Ra between iterates.
constexpr double hollands_max_rayleigh = 1e5;

class CoverChain {
public:
    CoverChain(const char* fn, const TopLossProblem& p, double t_sky_kelvin)
        : fn_(fn), p_(p), t_ambient_(kelvin(p.t_ambient_celsius)), t_sky_(t_sky_kelvin)
    {
    }

    // Emissivity of surface i: 0 the plate, 1..N the covers.
    double emissivity(int i) const { return i == 0 ? p_.emissivity_plate : p_.emissivity_cover; }

    double rayleigh(double t_hot, double t_cold) const
    {
        const double t_mean = 0.5 * (t_hot + t_cold) - constants::zero_celsius_in_kelvin;
        return as_part_of(fn_, [&] {
            const double density = air::density(t_mean, atmospheric_pressure);
            const double nu = air::viscosity(t_mean) / density;
            const double diffusivity = air::conductivity(t_mean) / (density * air::cp(t_mean));
            const double beta = 1.0 / kelvin(t_mean);  // ideal gas
            return constants::standard_gravity * beta * (t_hot - t_cold) * std::pow(p_.gap, 3) / (nu * diffusivity);
        });
    }

    // Heat flux across gap i (between surfaces i−1 and i), W/m², T in K,
    // t_hot >= t_cold (the solver keeps the chain ordered); equal
    // temperatures give 0 without a Rayleigh number.
    double gap_flux(int i, double t_hot, double t_cold, bool capped) const
    {
        const double dt = t_hot - t_cold;
        const double t_mean = 0.5 * (t_hot + t_cold) - constants::zero_celsius_in_kelvin;
        double nusselt = 1.0;
        if (dt > 0) {
            double ra = rayleigh(t_hot, t_cold);
            if (capped)
                ra = std::min(ra, hollands_max_rayleigh);
            nusselt = as_part_of(fn_, [&] { return convection::nusselt_tilted_gap(ra, p_.tilt_deg); });
        }
        const double k = as_part_of(fn_, [&] { return air::conductivity(t_mean); });
        const double radiation = radiation::exchange_parallel_plates(
            t_hot - constants::zero_celsius_in_kelvin, t_cold - constants::zero_celsius_in_kelvin,
            emissivity(i - 1), emissivity(i));
        return nusselt * k / p_.gap * dt + radiation;
    }

    // Outer cover to wind and sky, W/m², T in K.
    double outer_flux(double t) const
    {
        return p_.h_wind * (t - t_ambient_)
               + p_.emissivity_cover * stefan_boltzmann * (std::pow(t, 4) - std::pow(t_sky_, 4));
    }

    // Root of f between lo and hi (K) where f(lo) >= 0 >= f(hi).
    template <class F>
    double bracketed_root(F f, double lo, double hi) const
    {
        if (!(hi > lo))
            return lo;
        const double f_lo = f(lo), f_hi = f(hi);
        if (f_lo == 0)
            return lo;
        if (f_hi == 0)
            return hi;
        if (!(f_lo > 0 && f_hi < 0))
            fail_evaluation(fn_, "a cover's energy balance is not bracketed between its neighbours");
        std::uintmax_t iterations = 200;
        const auto r = boost::math::tools::toms748_solve(f, lo, hi, f_lo, f_hi,
                                                         boost::math::tools::eps_tolerance<double>(), iterations);
        if (iterations >= 200)
            fail_evaluation(fn_, "the cover temperature did not converge in 200 iterations");
        return 0.5 * (r.first + r.second);
    }

    // Cover temperature where the outer flux is zero, between sky and air.
    double outer_equilibrium() const
    {
        return bracketed_root([&](double t) { return -outer_flux(t); }, t_sky_, t_ambient_);
    }

    // New temperature of cover i with its neighbours held: flux in = flux out.
    double balance_cover(const std::vector<double>& t, int i, double t_floor) const
    {
        const int n = p_.covers;
        const double hot = t[i - 1];
        const double cold = i < n ? t[i + 1] : t_floor;
        return bracketed_root(
            [&](double x) {
                const double out = i < n ? gap_flux(i + 1, x, t[i + 1], true) : outer_flux(x);
                return gap_flux(i, hot, x, true) - out;
            },
            cold, hot);
    }

private:
    const char* fn_;
    const TopLossProblem& p_;
    double t_ambient_;
    double t_sky_;
};

}  // namespace

// ---- From test data ---------------------------------------------------------

double efficiency(double eta0, double a1, double a2, double t_mean_celsius, double t_ambient_celsius,
                  double irradiance)
{
    constexpr const char* fn = "COLL_EFFICIENCY";
    check_curve(fn, eta0, a1, a2);
    check::celsius(fn, "T_mean", t_mean_celsius);
    check::celsius(fn, "T_ambient", t_ambient_celsius);
    check::positive(fn, "irradiance", irradiance);
    const double dt = t_mean_celsius - t_ambient_celsius;
    return eta0 - a1 * dt / irradiance - a2 * dt * dt / irradiance;
}

double gain(double area, double eta0, double a1, double a2, double t_mean_celsius, double t_ambient_celsius,
            double irradiance, double incidence_modifier)
{
    constexpr const char* fn = "COLL_GAIN";
    check::non_negative(fn, "area", area);
    check_curve(fn, eta0, a1, a2);
    check::celsius(fn, "T_mean", t_mean_celsius);
    check::celsius(fn, "T_ambient", t_ambient_celsius);
    check::non_negative(fn, "irradiance", irradiance);
    check::between(fn, "iam", incidence_modifier, 0.0, 2.0);
    const double dt = t_mean_celsius - t_ambient_celsius;
    return area * (eta0 * incidence_modifier * irradiance - a1 * dt - a2 * dt * dt);
}

double incidence_modifier(double incidence_deg, double b0)
{
    constexpr const char* fn = "COLL_IAM";
    check_incidence(fn, incidence_deg);
    check::between(fn, "b0", b0, 0.0, 1.0);
    if (incidence_deg >= 90)
        return 0.0;
    return std::max(0.0, 1.0 - b0 * (1.0 / std::cos(incidence_deg * degree) - 1.0));
}

double incidence_modifier_table(double incidence_deg, const std::vector<double>& angles_deg,
                                const std::vector<double>& modifiers)
{
    constexpr const char* fn = "COLL_IAM_TABLE";
    check_incidence(fn, incidence_deg);
    check_modifier_table(fn, angles_deg, modifiers);
    if (incidence_deg >= 90)
        return 0.0;
    std::vector<double> x, y;
    if (angles_deg.front() > 0) {
        x.push_back(0.0);
        y.push_back(1.0);
    }
    x.insert(x.end(), angles_deg.begin(), angles_deg.end());
    y.insert(y.end(), modifiers.begin(), modifiers.end());
    if (angles_deg.back() < 90) {
        x.push_back(90.0);
        y.push_back(0.0);
    }
    auto slopes = pchip_slopes(x, y);
    const boost::math::interpolators::cubic_hermite<std::vector<double>> curve(std::move(x), std::move(y),
                                                                               std::move(slopes));
    return std::max(0.0, curve(incidence_deg));  // max: rounding just below a table value of 0
}

double stagnation_temperature(double eta0, double a1, double a2, double t_ambient_celsius, double irradiance)
{
    constexpr const char* fn = "COLL_STAGNATION_TEMP";
    check_curve(fn, eta0, a1, a2);
    check::celsius(fn, "T_ambient", t_ambient_celsius);
    check::non_negative(fn, "irradiance", irradiance);
    if (a1 == 0 && a2 == 0)
        fail_domain(fn, "a1 = 0 and a2 = 0: a loss-free efficiency curve never reaches 0, so it has no "
                        "stagnation temperature");
    const double absorbed = eta0 * irradiance;
    if (absorbed == 0)
        return t_ambient_celsius;
    return t_ambient_celsius + 2.0 * absorbed / (a1 + std::sqrt(a1 * a1 + 4.0 * a2 * absorbed));
}

// ---- From construction --------------------------------------------------------

double tau_alpha(double incidence_deg, double refractive_index, double extinction_times_thickness,
                 double absorptance, double covers)
{
    constexpr const char* fn = "COLL_TAU_ALPHA";
    check_incidence(fn, incidence_deg);
    check::between(fn, "refractive_index", refractive_index, 1.0, 3.0);
    check::non_negative(fn, "extinction_times_thickness", extinction_times_thickness);
    check::fraction(fn, "absorptance", absorptance);
    const int n = whole_number(fn, "covers", covers, 0, 10);
    if (incidence_deg >= 90)
        return 0.0;
    const CoverOptics beam = cover_optics(incidence_deg * degree, refractive_index, extinction_times_thickness, n);
    const CoverOptics at60 = cover_optics(60.0 * degree, refractive_index, extinction_times_thickness, n);
    const double rho_diffuse = at60.tau_a * (1.0 - at60.tau_r);
    return beam.tau_a * beam.tau_r * absorptance / (1.0 - (1.0 - absorptance) * rho_diffuse);
}

double top_loss_klein(double t_plate_celsius, double t_ambient_celsius, double tilt_deg, double emissivity_plate,
                      double emissivity_cover, double covers, double wind_speed)
{
    constexpr const char* fn = "COLL_TOP_LOSS";
    check::celsius(fn, "T_plate", t_plate_celsius);
    if (!(kelvin(t_plate_celsius) >= 320 && kelvin(t_plate_celsius) <= 420))
        fail_domain(fn, "T_plate", t_plate_celsius, "46.85..146.85 °C (320..420 K, the range of Klein's fit)");
    check::celsius(fn, "T_ambient", t_ambient_celsius);
    if (!(kelvin(t_ambient_celsius) >= 260 && kelvin(t_ambient_celsius) <= 310))
        fail_domain(fn, "T_ambient", t_ambient_celsius, "-13.15..36.85 °C (260..310 K, the range of Klein's fit)");
    check::between(fn, "tilt", tilt_deg, 0.0, 90.0);
    check::between(fn, "emissivity_plate", emissivity_plate, 0.1, 0.95);
    if (!(emissivity_cover > 0 && emissivity_cover <= 1))
        fail_domain(fn, "emissivity_cover", emissivity_cover, "0 < emissivity_cover <= 1");
    const int n = whole_number(fn, "covers", covers, 1, 3);
    check::between(fn, "wind_speed", wind_speed, 0.0, 10.0);
    const double h_w = as_part_of(fn, [&] { return convection::wind_coefficient(wind_speed, 1.0); });

    const double tp = kelvin(t_plate_celsius), ta = kelvin(t_ambient_celsius), ep = emissivity_plate;
    const double f = (1 + 0.089 * h_w - 0.1166 * h_w * ep) * (1 + 0.07866 * n);
    const double beta = std::min(tilt_deg, 70.0);
    const double c = 520 * (1 - 0.000051 * beta * beta);
    const double e = 0.430 * (1 - 100 / tp);
    const double convective = 1 / (n / (c / tp * std::pow((tp - ta) / (n + f), e)) + 1 / h_w);
    const double radiative = stefan_boltzmann * (tp + ta) * (tp * tp + ta * ta)
                             / (1 / (ep + 0.00591 * n * h_w) + (2 * n + f - 1 + 0.133 * ep) / emissivity_cover - n);
    return convective + radiative;
}

TopLossSolution solve_top_loss(const TopLossProblem& p)
{
    constexpr const char* fn = "COLL_TOP_LOSS_EXACT";
    check::celsius(fn, "T_plate", p.t_plate_celsius);
    check::celsius(fn, "T_ambient", p.t_ambient_celsius);
    check::celsius(fn, "T_sky", p.t_sky_celsius);
    if (!(p.t_plate_celsius > p.t_ambient_celsius))
        fail_domain(fn, "T_plate", p.t_plate_celsius,
                    "the temperatures above T_ambient = " + format_number(p.t_ambient_celsius) + " °C");
    if (!(p.t_sky_celsius <= p.t_ambient_celsius))
        fail_domain(fn, "T_sky", p.t_sky_celsius, "the temperatures up to T_ambient");
    check::between(fn, "tilt", p.tilt_deg, 0.0, 90.0);
    check::fraction(fn, "emissivity_plate", p.emissivity_plate);
    check::fraction(fn, "emissivity_cover", p.emissivity_cover);
    const int n = whole_number(fn, "covers", p.covers, 1, 10);
    check::positive(fn, "h_wind", p.h_wind);
    check::positive(fn, "gap", p.gap);
    // The gap correlation's own tilt range, before any iteration.
    as_part_of(fn, [&] { return convection::nusselt_tilted_gap(0.0, p.tilt_deg); });

    const CoverChain chain(fn, p, kelvin(p.t_sky_celsius));
    const double tp = kelvin(p.t_plate_celsius), ta = kelvin(p.t_ambient_celsius);
    const double t_floor = chain.outer_equilibrium();
    std::vector<double> t(n + 1);
    for (int i = 0; i <= n; ++i)
        t[i] = tp - (tp - ta) * i / (n + 1.0);

    // Converged when no cover moves by more than 1e-10 of the plate-to-air
    // difference (U_t to about 1e-9), or by a few hundred ulps of T when
    // that difference is tiny.
    const double settled = std::max(1e-10 * (tp - ta), 1e-13 * tp);
    constexpr int max_sweeps = 2000;
    int sweeps = 0;
    for (double change = HUGE_VAL; change > settled; ++sweeps) {
        if (sweeps == max_sweeps)
            fail_evaluation(fn, "the cover temperatures did not settle in " + std::to_string(max_sweeps) + " sweeps");
        change = 0;
        for (int i = 1; i <= n; ++i) {
            const double updated = chain.balance_cover(t, i, t_floor);
            change = std::max(change, std::fabs(updated - t[i]));
            t[i] = updated;
        }
    }

    TopLossSolution s{};
    s.sweeps = sweeps;
    s.heat_flux = chain.outer_flux(t[n]);
    for (int i = 1; i <= n; ++i) {
        s.rayleigh.push_back(chain.rayleigh(t[i - 1], t[i]));
        const double q = chain.gap_flux(i, t[i - 1], t[i], false);  // the correlation's full range check
        if (!(std::fabs(q - s.heat_flux) <= 1e-6 * std::fabs(s.heat_flux)))
            fail_evaluation(fn, "the heat fluxes through the covers disagree after the solution");
        s.cover_temperatures.push_back(t[i] - constants::zero_celsius_in_kelvin);
    }
    s.u_top = s.heat_flux / (tp - ta);
    return s;
}

double top_loss_exact(double t_plate_celsius, double t_ambient_celsius, double tilt_deg, double emissivity_plate,
                      double emissivity_cover, double covers, double wind_speed, double gap)
{
    constexpr const char* fn = "COLL_TOP_LOSS_EXACT";
    check::celsius(fn, "T_plate", t_plate_celsius);
    check::celsius(fn, "T_ambient", t_ambient_celsius);
    check::between(fn, "tilt", tilt_deg, 0.0, 90.0);
    check::fraction(fn, "emissivity_plate", emissivity_plate);
    check::fraction(fn, "emissivity_cover", emissivity_cover);
    const int n = whole_number(fn, "covers", covers, 1, 10);
    check::non_negative(fn, "wind_speed", wind_speed);
    check::positive(fn, "gap", gap);
    const double h_w = as_part_of(fn, [&] { return convection::wind_coefficient(wind_speed, 1.0); });
    const double t_sky = as_part_of(fn, [&] { return radiation::sky_temperature_swinbank(t_ambient_celsius); });
    return solve_top_loss({t_plate_celsius, t_ambient_celsius, t_sky, tilt_deg, emissivity_plate, emissivity_cover, n,
                           h_w, gap})
        .u_top;
}

double fin_efficiency_factor(double tube_spacing, double tube_outer_diameter, double tube_inner_diameter,
                             double plate_thickness, double plate_conductivity, double u_loss, double h_fluid,
                             double bond_conductance)
{
    constexpr const char* fn = "COLL_FIN_FACTOR";
    check::positive(fn, "tube_spacing", tube_spacing);
    check::positive(fn, "tube_outer_diameter", tube_outer_diameter);
    if (!(tube_outer_diameter <= tube_spacing))
        fail_domain(fn, "tube_outer_diameter", tube_outer_diameter,
                    "0 < D <= tube_spacing = " + format_number(tube_spacing));
    check::positive(fn, "tube_inner_diameter", tube_inner_diameter);
    if (!(tube_inner_diameter <= tube_outer_diameter))
        fail_domain(fn, "tube_inner_diameter", tube_inner_diameter,
                    "0 < D_i <= tube_outer_diameter = " + format_number(tube_outer_diameter));
    check::positive(fn, "plate_thickness", plate_thickness);
    check::positive(fn, "plate_conductivity", plate_conductivity);
    check::non_negative(fn, "u_loss", u_loss);
    check::positive(fn, "h_fluid", h_fluid);
    if (!(bond_conductance > 0))  // +infinity: perfect bond
        fail_domain(fn, "bond_conductance", bond_conductance, "the positive numbers (> 0)");

    const double w = tube_spacing, d = tube_outer_diameter;
    const double x = std::sqrt(u_loss / (plate_conductivity * plate_thickness)) * (w - d) / 2;
    const double fin = x < 1e-4 ? 1 - x * x / 3 : std::tanh(x) / x;  // series avoids 0/0
    return 1 / (w / (d + (w - d) * fin) + w * u_loss / bond_conductance
                + w * u_loss / (pi * tube_inner_diameter * h_fluid));
}

double heat_removal_factor(double mass_flow, double cp, double area, double u_loss, double f_prime)
{
    constexpr const char* fn = "COLL_HEAT_REMOVAL";
    check::positive(fn, "mass_flow", mass_flow);
    check::positive(fn, "cp", cp);
    check::positive(fn, "area", area);
    check::non_negative(fn, "u_loss", u_loss);
    check::fraction(fn, "f_prime", f_prime);
    const double x = area * u_loss * f_prime / (mass_flow * cp);
    if (x == 0)
        return f_prime;
    return f_prime * -std::expm1(-x) / x;
}

double useful_gain(double area, double f_r, double absorbed_irradiance, double u_loss, double t_in_celsius,
                   double t_ambient_celsius)
{
    constexpr const char* fn = "COLL_USEFUL_GAIN";
    check::non_negative(fn, "area", area);
    check::fraction(fn, "f_r", f_r);
    check::non_negative(fn, "absorbed_irradiance", absorbed_irradiance);
    check::non_negative(fn, "u_loss", u_loss);
    check::celsius(fn, "T_in", t_in_celsius);
    check::celsius(fn, "T_ambient", t_ambient_celsius);
    return area * f_r * (absorbed_irradiance - u_loss * (t_in_celsius - t_ambient_celsius));
}

double outlet_temperature(double t_in_celsius, double gain, double mass_flow, double cp)
{
    constexpr const char* fn = "COLL_OUTLET_TEMP";
    check::celsius(fn, "T_in", t_in_celsius);
    check::finite(fn, "gain", gain);
    check::positive(fn, "mass_flow", mass_flow);
    check::positive(fn, "cp", cp);
    const double t_out = t_in_celsius + gain / (mass_flow * cp);
    if (!(t_out >= -constants::zero_celsius_in_kelvin))
        fail_domain(fn, "gain", gain,
                    "the values that leave the fluid above absolute zero (T_out would be " + format_number(t_out)
                        + " °C)");
    return t_out;
}

}  // namespace solarith::collector
