#include "solarith/radiation.hpp"

#include "solarith/constants.hpp"
#include "solarith/errors.hpp"

#include <algorithm>
#include <cmath>
#include <string>

namespace solarith::radiation {

using constants::kelvin;
using constants::pi;

namespace {

// Radiation constants in the units of the spreadsheet: c1 in W·µm⁴/m², c2 in µm·K.
constexpr double c1_um = constants::first_radiation * 1e24;
constexpr double c2_um = constants::second_radiation * 1e6;

// T1⁴ − T2⁴ in K⁴, factored so that close temperatures keep their digits:
// (T1² + T2²)(T1 + T2)(T1 − T2), with T1 − T2 taken in °C.
double fourth_power_difference(double t1_celsius, double t2_celsius)
{
    const double t1 = kelvin(t1_celsius), t2 = kelvin(t2_celsius);
    return (t1 * t1 + t2 * t2) * (t1 + t2) * (t1_celsius - t2_celsius);
}

// 1/(1/e1 + 1/e2 − 1) for two parallel grey plates, as e1·e2/(e1 + e2 − e1·e2);
// the denominator vanishes only when both plates are perfect reflectors, which
// exchange nothing.
double parallel_plates_emissivity(double e1, double e2)
{
    const double denominator = e1 + e2 - e1 * e2;
    return denominator > 0 ? e1 * e2 / denominator : 0.0;
}

void check_plates(const char* fn, double t1, double t2, double e1, double e2)
{
    check::celsius(fn, "T1", t1);
    check::celsius(fn, "T2", t2);
    check::fraction(fn, "emissivity1", e1);
    check::fraction(fn, "emissivity2", e2);
}

// The blackbody fraction below a wavelength and the fraction above it, as
// functions of zeta = c2/(lambda·T); each is accurate where it is the small one.
struct Tails {
    double below, above;
};

Tails blackbody_tails(double zeta)
{
    const double norm = 15 / (pi * pi * pi * pi);
    if (zeta < 0.3) {  // long wavelengths: power series (Bernoulli numbers) for the part above
        const double z2 = zeta * zeta;
        const double above = norm * zeta * z2
                             * (1.0 / 3 - zeta / 8 + z2 / 60 - z2 * z2 / 5040 + z2 * z2 * z2 / 272160
                                - z2 * z2 * z2 * z2 / 13305600);
        return {1 - above, above};
    }
    if (zeta > 1000)  // the part below is under 1e-420: zero in double precision
        return {0.0, 1.0};
    double sum = 0;
    for (int n = 1; n < 1000; ++n) {  // converges in under 100 terms for zeta >= 0.3
        const double inv = 1.0 / n;
        const double term = std::exp(-n * zeta) * inv
                            * (zeta * zeta * zeta + 3 * zeta * zeta * inv + 6 * zeta * inv * inv + 6 * inv * inv * inv);
        sum += term;
        if (term <= 1e-17 * sum)
            break;
    }
    const double below = norm * sum;
    return {below, 1 - below};
}

void check_ratio(const char* fn, const char* name, double ratio)
{
    check::between(fn, name, ratio, 1e-12, 1e12);
}

// Parallel rectangles, a = min ratio, b = max ratio, both to the gap.
double parallel_rectangles(double a, double b)
{
    const double atan_b = std::atan(b);
    if (a < 0.015) {  // series in the smaller ratio; b/(1+b²) written to avoid overflow
        const double q = 1 / (b + 1 / b);
        const double c2 = q / 12 + atan_b / 4;
        const double c4 = atan_b / 8 + q * (7 + 2 / (1 + b * b)) / 120;
        return a / pi * (atan_b - a * a * c2 + a * a * a * a * c4);
    }
    const double s = std::hypot(1.0, a), t = std::hypot(1.0, b);
    const double log_term = 0.5 * std::log1p(a * a * b * b / (1 + a * a + b * b));
    // The closed form divided through by a·b term by term.
    return 2 / pi
           * (log_term / (a * b) + t / b * std::atan(a / t) + s / a * std::atan(b / s) - std::atan(a) / b
              - atan_b / a);
}

// ln[w²(1+R²)/((1+w²)R²)] = ln(1 − x), x = h²/((1+w²)R²): log1p where x is small,
// the ratio itself where it is not.
double log_edge_ratio(double w, double h, double r)
{
    const double x = (h / r) * (h / r) / (1 + w * w);
    return x < 0.5 ? std::log1p(-x) : std::log((w / r) * (w / r) * (1 + r * r) / (1 + w * w));
}

}  // namespace

double emissive_power(double t_celsius, double emissivity)
{
    constexpr const char* fn = "RAD_EMISSIVE";
    check::celsius(fn, "T", t_celsius);
    check::fraction(fn, "emissivity", emissivity);
    const double t = kelvin(t_celsius);
    return emissivity * constants::stefan_boltzmann * (t * t) * (t * t);
}

double spectral_emissive_power(double wavelength_um, double t_celsius, double emissivity)
{
    constexpr const char* fn = "RAD_SPECTRAL";
    check::positive(fn, "wavelength_um", wavelength_um);
    check::celsius_above_absolute_zero(fn, "T", t_celsius);
    check::fraction(fn, "emissivity", emissivity);
    const double log_lambda = std::log(wavelength_um);
    const double log_x = std::log(c2_um) - log_lambda - std::log(kelvin(t_celsius));
    const double x = std::exp(log_x);  // c2/(lambda·T)
    // ln(e^x − 1): x + ln(1 − e^−x) for large x; ln x + ln((e^x − 1)/x) for small x.
    const double log_expm1 = x > 1 ? x + std::log1p(-std::exp(-x)) : log_x + std::log(x > 0 ? std::expm1(x) / x : 1.0);
    return emissivity * std::exp(std::log(c1_um) - 5 * log_lambda - log_expm1);
}

double peak_wavelength(double t_celsius)
{
    check::celsius_above_absolute_zero("RAD_PEAK_WAVELENGTH", "T", t_celsius);
    return constants::wien_displacement * 1e6 / kelvin(t_celsius);
}

double band_fraction(double wavelength1_um, double wavelength2_um, double t_celsius)
{
    constexpr const char* fn = "RAD_BAND_FRACTION";
    check::non_negative(fn, "wavelength1_um", wavelength1_um);
    check::non_negative(fn, "wavelength2_um", wavelength2_um);
    if (wavelength2_um < wavelength1_um)
        fail_domain(fn, "wavelength2_um", wavelength2_um,
                    "wavelength1_um = " + format_number(wavelength1_um)
                        + " and above (give the shorter wavelength first)");
    check::celsius_above_absolute_zero(fn, "T", t_celsius);
    const double t = kelvin(t_celsius);
    const Tails short_end = blackbody_tails(c2_um / (wavelength1_um * t));
    const Tails long_end = blackbody_tails(c2_um / (wavelength2_um * t));
    const double band = long_end.below <= 0.5 ? long_end.below - short_end.below : short_end.above - long_end.above;
    return std::max(0.0, band);
}

double exchange_parallel_plates(double t1_celsius, double t2_celsius, double emissivity1, double emissivity2)
{
    check_plates("RAD_EXCHANGE_PLATES", t1_celsius, t2_celsius, emissivity1, emissivity2);
    return constants::stefan_boltzmann * parallel_plates_emissivity(emissivity1, emissivity2)
           * fourth_power_difference(t1_celsius, t2_celsius);
}

double exchange_enclosed(double t_inner_celsius, double t_outer_celsius, double emissivity_inner,
                         double emissivity_outer, double area_ratio_inner_to_outer)
{
    constexpr const char* fn = "RAD_EXCHANGE_ENCLOSED";
    check::celsius(fn, "T_inner", t_inner_celsius);
    check::celsius(fn, "T_outer", t_outer_celsius);
    check::fraction(fn, "emissivity_inner", emissivity_inner);
    check::fraction(fn, "emissivity_outer", emissivity_outer);
    check::fraction(fn, "area_ratio_inner_to_outer", area_ratio_inner_to_outer);
    const double ratio = area_ratio_inner_to_outer;
    double effective;
    if (ratio == 0)  // small body in a large cavity: the cavity acts as a black body
        effective = emissivity_inner;
    else if (emissivity_inner == 0 || emissivity_outer == 0)  // a perfect reflector: no exchange
        effective = 0;
    else
        effective = 1 / (1 / emissivity_inner + ratio * (1 / emissivity_outer - 1));
    return constants::stefan_boltzmann * effective * fourth_power_difference(t_inner_celsius, t_outer_celsius);
}

double radiative_coefficient(double t1_celsius, double t2_celsius, double emissivity1, double emissivity2)
{
    check_plates("RAD_COEFF", t1_celsius, t2_celsius, emissivity1, emissivity2);
    const double t1 = kelvin(t1_celsius), t2 = kelvin(t2_celsius);
    return constants::stefan_boltzmann * parallel_plates_emissivity(emissivity1, emissivity2) * (t1 * t1 + t2 * t2)
           * (t1 + t2);
}

double sky_temperature_swinbank(double t_air_celsius)
{
    check::between("RAD_SKY_TEMP", "T_air", t_air_celsius, -40, 50);
    return 0.0552 * std::pow(kelvin(t_air_celsius), 1.5) - constants::zero_celsius_in_kelvin;
}

double sky_temperature_berdahl_martin(double t_air_celsius, double t_dewpoint_celsius)
{
    constexpr const char* fn = "RAD_SKY_TEMP";
    check::between(fn, "T_air", t_air_celsius, -40, 50);
    check::between(fn, "T_dewpoint", t_dewpoint_celsius, -20, 30);
    if (t_dewpoint_celsius > t_air_celsius)
        fail_domain(fn, "T_dewpoint", t_dewpoint_celsius,
                    "values up to T_air = " + format_number(t_air_celsius)
                        + " (the dew point cannot exceed the air temperature)");
    const double d = t_dewpoint_celsius / 100;
    const double sky_emissivity = 0.711 + 0.56 * d + 0.73 * d * d;
    return kelvin(t_air_celsius) * std::pow(sky_emissivity, 0.25) - constants::zero_celsius_in_kelvin;
}

double view_factor_parallel_rectangles(double width, double length, double gap)
{
    constexpr const char* fn = "RAD_VF_PARALLEL_RECT";
    check::positive(fn, "width", width);
    check::positive(fn, "length", length);
    check::positive(fn, "gap", gap);
    const double a = width / gap, b = length / gap;
    check_ratio(fn, "width/gap", a);
    check_ratio(fn, "length/gap", b);
    return parallel_rectangles(std::min(a, b), std::max(a, b));
}

double view_factor_perpendicular_rectangles(double common_edge, double width1, double width2)
{
    constexpr const char* fn = "RAD_VF_PERPENDICULAR_RECT";
    check::positive(fn, "common_edge", common_edge);
    check::positive(fn, "width1", width1);
    check::positive(fn, "width2", width2);
    const double w = width1 / common_edge, h = width2 / common_edge;
    check_ratio(fn, "width1/common_edge", w);
    check_ratio(fn, "width2/common_edge", h);
    const double r = std::hypot(w, h), m = std::max(w, h), n = std::min(w, h);
    // R·atan(1/R) − m·atan(1/m) without cancellation, using R − m = n²/(R + m).
    const double r_minus_m = n * (n / (r + m));
    const double corner_difference = r_minus_m * std::atan(1 / r) - m * std::atan(r_minus_m / (1 + r * m));
    const double logs = std::log1p(w * w * h * h / (1 + r * r)) + w * w * log_edge_ratio(w, h, r)
                        + h * h * log_edge_ratio(h, w, r);
    return (n * std::atan(1 / n) - corner_difference + logs / 4) / (pi * w);
}

double view_factor_coaxial_disks(double radius1, double radius2, double gap)
{
    constexpr const char* fn = "RAD_VF_COAXIAL_DISKS";
    check::positive(fn, "radius1", radius1);
    check::positive(fn, "radius2", radius2);
    check::positive(fn, "gap", gap);
    const double scale = std::max({radius1, radius2, gap});
    const double r1 = radius1 / scale, r2 = radius2 / scale, l = gap / scale;
    const double sum_of_squares = r1 * r1 + r2 * r2 + l * l;
    const double root = std::sqrt(((r1 - r2) * (r1 - r2) + l * l) * ((r1 + r2) * (r1 + r2) + l * l));
    return std::min(1.0, 2 * r2 * r2 / (sum_of_squares + root));  // rounding may pass 1 by an ulp as gap -> 0
}

}  // namespace solarith::radiation
