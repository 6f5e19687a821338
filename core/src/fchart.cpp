// The f-chart method: dimensionless groups X and Y, the monthly solar
// fraction and the corrections of X; formulas and sources in sizing.hpp.
#include "solarith/sizing.hpp"

#include "solarith/errors.hpp"

#include <algorithm>
#include <cctype>
#include <cmath>

namespace solarith::sizing {

namespace {

constexpr double seconds_per_day = 86400.0;  // the month's length in seconds is days·86400

// The published charts span 0 <= X <= 18 and 0 <= Y <= 3 [D&B §20.3, §20.4].
constexpr double x_max = 18;
constexpr double y_max = 3;

// Standard storage of the liquid f-chart, litres of water per m² of
// collector (350 kJ/(m²·K)), and the range of its correction [D&B §20.3].
constexpr double standard_storage = 75;
constexpr double storage_low = 37.5;
constexpr double storage_high = 300;

void check_month_days(const char* function, double days)
{
    check::between(function, "days", days, 1, 31);
}

void check_load(const char* function, double load)
{
    check::positive(function, "load", load);
}

double clamp_fraction(double f)
{
    return std::min(1.0, std::max(0.0, f));
}

}  // namespace

double fchart_x(double area, double f_r_ul, double t_ambient_mean, double days, double load, double t_ref)
{
    constexpr const char* fn = "FCHART_X";
    check::non_negative(fn, "area", area);
    check::non_negative(fn, "f_r_ul", f_r_ul);
    check::celsius(fn, "T_ambient_mean", t_ambient_mean);
    check_month_days(fn, days);
    check_load(fn, load);
    check::celsius(fn, "T_ref", t_ref);
    if (!(t_ref >= t_ambient_mean))
        fail_domain(fn, "T_ref", t_ref,
                    "temperatures at or above T_ambient_mean = " + format_number(t_ambient_mean) + " °C");
    return area * f_r_ul * (t_ref - t_ambient_mean) * (days * seconds_per_day) / load;
}

double fchart_y(double area, double f_r_tau_alpha_n, double tau_alpha_ratio, double h_tilted_mean_daily,
                double days, double load)
{
    constexpr const char* fn = "FCHART_Y";
    check::non_negative(fn, "area", area);
    check::fraction(fn, "f_r_tau_alpha_n", f_r_tau_alpha_n);
    check::fraction(fn, "tau_alpha_ratio", tau_alpha_ratio);
    check::non_negative(fn, "h_tilted_mean_daily", h_tilted_mean_daily);
    check_month_days(fn, days);
    check_load(fn, load);
    return area * f_r_tau_alpha_n * tau_alpha_ratio * h_tilted_mean_daily * days / load;
}

FchartSystem fchart_system_named(const char* function, const std::string& name)
{
    std::string key;
    for (unsigned char c : name)
        key += static_cast<char>(std::tolower(c));
    if (key == "liquid")
        return FchartSystem::liquid;
    if (key == "air")
        return FchartSystem::air;
    fail_domain(function, "system = \"" + name + "\" is not one of \"liquid\", \"air\"");
}

double fchart_fraction(double x, double y, FchartSystem system)
{
    constexpr const char* fn = "FCHART_F";
    check::between(fn, "X", x, 0, x_max);
    check::between(fn, "Y", y, 0, y_max);
    const double f = system == FchartSystem::liquid
                         ? 1.029 * y - 0.065 * x - 0.245 * y * y + 0.0018 * x * x + 0.0215 * y * y * y
                         : 1.040 * y - 0.065 * x - 0.159 * y * y + 0.00187 * x * x - 0.0095 * y * y * y;
    return clamp_fraction(f);
}

double fchart_storage_correction(double storage_litres_per_m2)
{
    check::between("FCHART_STORAGE_CORR", "storage_litres_per_m2", storage_litres_per_m2, storage_low,
                   storage_high);
    return std::pow(storage_litres_per_m2 / standard_storage, -0.25);
}

double fchart_dhw_correction(double t_mains, double t_set, double t_ambient_mean)
{
    constexpr const char* fn = "FCHART_DHW_CORR";
    check::between(fn, "T_mains", t_mains, 5, 20);
    check::between(fn, "T_set", t_set, 50, 70);
    check::celsius(fn, "T_ambient_mean", t_ambient_mean);
    const double numerator = 11.6 + 1.18 * t_set + 3.86 * t_mains;  // without the ambient term
    // The multiplier is positive only while 2.32·T̄a stays below the other
    // terms (T̄a < 38.75 °C at the coldest set and mains temperatures).
    const double ambient_limit = numerator / 2.32;
    if (!(t_ambient_mean < ambient_limit))
        fail_domain(fn, "T_ambient_mean", t_ambient_mean,
                    "temperatures below " + format_number(ambient_limit)
                        + " °C, where the correction (11.6 + 1.18·T_set + 3.86·T_mains − 2.32·T_ambient_mean)"
                          "/(100 − T_ambient_mean) stays positive");
    return (numerator - 2.32 * t_ambient_mean) / (100 - t_ambient_mean);
}

}  // namespace solarith::sizing
