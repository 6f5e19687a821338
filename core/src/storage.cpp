#include "solarith/storage.hpp"

#include "solarith/constants.hpp"
#include "solarith/errors.hpp"
#include "solarith/properties.hpp"

#include <boost/math/quadrature/gauss_kronrod.hpp>
#include <boost/math/tools/roots.hpp>

#include <algorithm>
#include <cmath>

namespace solarith::storage {

using constants::pi;

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

// ---- liquid water ------------------------------------------------------------

namespace {

constexpr double water_min_celsius = 0.0;
constexpr double water_max_celsius = 200.0;

void check_liquid_water(const char* fn, const char* argument, double t_celsius)
{
    check::between(fn, argument, t_celsius, water_min_celsius, water_max_celsius);
}

// ∫ f over [a, b] (a <= b) by adaptive Gauss–Kronrod; the integrands here are
// smooth property curves. The interval is mapped onto [0, 1] first: Boost
// 1.74 compares the error estimate of the unit interval with a tolerance
// scaled by the interval's length, so a short interval would otherwise be
// split down to the maximum depth.
template <class F>
double integral(F f, double a, double b)
{
    if (!(b > a))
        return 0.0;
    const double width = b - a;
    const auto unit = [&](double x) { return f(a + width * x); };
    return width * boost::math::quadrature::gauss_kronrod<double, 15>::integrate(unit, 0.0, 1.0, 10, 1e-13);
}

// Enthalpy difference h(T2) − h(T1) of liquid water at constant pressure,
// J/kg, from IAPWS-IF97 region 1 (the formulation WATER_CP and WATER_DENSITY
// use; h is the integral of their cp = (∂h/∂T)_p).
double enthalpy_rise(double t1_celsius, double t2_celsius, double pressure_pa)
{
    const auto h = [pressure_pa](double t) {
        return water::formulation::region1(constants::kelvin(t), pressure_pa).h;
    };
    return h(t2_celsius) - h(t1_celsius);
}

}  // namespace

double water_heat(double volume, double t1_celsius, double t2_celsius)
{
    constexpr const char* fn = "STORE_WATER";
    check::non_negative(fn, "volume", volume);
    check_liquid_water(fn, "T1", t1_celsius);
    check_liquid_water(fn, "T2", t2_celsius);
    const double pressure = water::default_pressure(std::max(t1_celsius, t2_celsius));
    const double mass = volume * water::density(t1_celsius, pressure);
    return mass * enthalpy_rise(t1_celsius, t2_celsius, pressure);
}

double tank_volume(double energy, double t_hot_celsius, double t_cold_celsius)
{
    constexpr const char* fn = "STORE_TANK_VOLUME";
    check::non_negative(fn, "energy", energy);
    check_liquid_water(fn, "T_hot", t_hot_celsius);
    check_liquid_water(fn, "T_cold", t_cold_celsius);
    if (!(t_hot_celsius > t_cold_celsius))
        fail_domain(fn, "T_hot", t_hot_celsius,
                    "the temperatures above T_cold = " + format_number(t_cold_celsius) + " °C");
    const double pressure = water::default_pressure(t_hot_celsius);
    const double heat_per_m3 = water::density(t_hot_celsius, pressure)
                               * enthalpy_rise(t_cold_celsius, t_hot_celsius, pressure);
    return energy / heat_per_m3;
}

double tank_ua(double diameter, double height, double insulation_thickness, double insulation_conductivity,
               double h_outside)
{
    constexpr const char* fn = "STORE_TANK_UA";
    check::positive(fn, "diameter", diameter);
    check::positive(fn, "height", height);
    check::non_negative(fn, "insulation_thickness", insulation_thickness);
    check::positive(fn, "insulation_conductivity", insulation_conductivity);
    check::positive(fn, "h_outside", h_outside);
    const double r_inner = 0.5 * diameter;
    const double r_outer = r_inner + insulation_thickness;
    const double k = insulation_conductivity;
    const double side = std::log1p(insulation_thickness / r_inner) / (2.0 * pi * k * height)
                        + 1.0 / (h_outside * 2.0 * pi * r_outer * height);
    const double end_area = pi * r_inner * r_inner;
    const double end = insulation_thickness / (k * end_area) + 1.0 / (h_outside * end_area);
    return 1.0 / side + 2.0 / end;
}

namespace {

// The separated cooling law of STORE_COOLDOWN in s = ln|T − T_ambient|.
class MixedTank {
public:
    MixedTank(double t_ambient, double direction, double pressure)
        : t_ambient_(t_ambient), direction_(direction), pressure_(pressure),
          cp_near_ambient_(water::cp(std::clamp(t_ambient + direction * near_ambient, water_min_celsius,
                                                water_max_celsius),
                                     pressure))
    {
    }

    // ∫_a^b cp(T(s)) ds, a <= b, J/(kg·K); constant cp within 1 µK of ambient.
    double cp_integral(double a, double b) const
    {
        const double below = std::max(0.0, std::min(b, s_near) - a);
        // The clamp only absorbs rounding of exp(ln u) at the ends of the path.
        const auto cp = [this](double s) {
            return water::cp(std::clamp(temperature(s), water_min_celsius, water_max_celsius), pressure_);
        };
        return cp_near_ambient_ * below + integral(cp, std::max(a, s_near), b);
    }

    double temperature(double s) const { return t_ambient_ + direction_ * std::exp(s); }

    // s below which the tank is within 1 µK of ambient.
    static constexpr double near_ambient = 1e-6;
    const double s_near = std::log(near_ambient);
    double cp_near_ambient() const { return cp_near_ambient_; }

private:
    double t_ambient_;
    double direction_;  // +1 cooling towards ambient from above, −1 warming from below
    double pressure_;
    double cp_near_ambient_;
};

}  // namespace

double cooldown_temperature(double t_start_celsius, double t_ambient_celsius, double ua, double volume,
                            double time_s)
{
    constexpr const char* fn = "STORE_COOLDOWN";
    check_liquid_water(fn, "T_start", t_start_celsius);
    check::celsius(fn, "T_ambient", t_ambient_celsius);
    if (!(t_ambient_celsius <= water_max_celsius))
        fail_domain(fn, "T_ambient", t_ambient_celsius,
                    "-273.15..200 °C (the tank water approaches T_ambient and must stay liquid water, 0..200 °C)");
    check::non_negative(fn, "UA", ua);
    check::positive(fn, "volume", volume);
    check::non_negative(fn, "time_s", time_s);

    const double difference = t_start_celsius - t_ambient_celsius;
    if (ua == 0 || time_s == 0 || difference == 0)
        return t_start_celsius;

    const double hottest = std::max(t_start_celsius, std::min(t_ambient_celsius, water_max_celsius));
    const double pressure = water::default_pressure(hottest);
    const double mass = volume * water::density(t_start_celsius, pressure);
    const double target = ua * time_s / mass;  // ∫ cp ds to be used up, J/(kg·K)

    const MixedTank tank(t_ambient_celsius, difference > 0 ? 1.0 : -1.0, pressure);
    const double s_start = std::log(std::fabs(difference));

    // The lowest s the water reaches: 0 °C when the surroundings freeze,
    // otherwise within 1 µK of ambient, below which cp is constant.
    const bool freezing_outside = t_ambient_celsius < water_min_celsius;
    const double s_floor = freezing_outside ? std::log(water_min_celsius - t_ambient_celsius)
                                            : std::min(tank.s_near, s_start);
    const double to_floor = tank.cp_integral(s_floor, s_start);
    if (freezing_outside) {
        if (!(target < to_floor))
            fail_domain(fn, "the tank reaches 0 °C (freezing) after " + format_number(to_floor * mass / ua)
                                + " s, before time_s = " + format_number(time_s)
                                + " s; only liquid water is modelled");
    } else if (target >= to_floor) {  // ends within 1 µK of ambient: constant cp there
        return tank.temperature(s_floor - (target - to_floor) / tank.cp_near_ambient());
    }

    // F(s_floor) = to_floor − target > 0 and F(s_start) = −target < 0: bracketed.
    const auto remaining = [&](double s) { return tank.cp_integral(s, s_start) - target; };
    boost::uintmax_t iterations = 100;
    const auto [lo, hi] = boost::math::tools::toms748_solve(remaining, s_floor, s_start, to_floor - target, -target,
                                                             boost::math::tools::eps_tolerance<double>(50),
                                                             iterations);
    if (iterations >= 100)
        fail_evaluation(fn, "the end temperature did not converge in 100 iterations");
    return tank.temperature(0.5 * (lo + hi));
}

}  // namespace solarith::storage
