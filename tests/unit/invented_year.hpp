// An INVENTED year of hourly weather and hot-water load for tests and
// benchmarks of SIM_YEAR. Not measured data and not taken from any climate
// file: smooth formulas chosen to look like a mid-latitude site.
//   Ambient air: a yearly sine (coldest mid-January, 2..20 °C mean) plus a
//     daily sine (±4.5 K, warmest 15:00).
//   Irradiance on the collector plane: a sine-shaped daily bell between
//     sunrise and sunset (day length 8..16 h), peak 660..900 W/m² over the
//     year, times a daily cloudiness factor 0.2..1 from a fixed
//     pseudo-random sequence (cloudier in winter).
//   Incidence angle: from a noon value (15..45° over the year) to 90° at
//     sunrise and sunset; 90° at night.
//   Load: 180 kg a day in a fixed daily profile (morning, noon, evening);
//     cold water 8..16 °C over the year (warmest early August).
// Hour 0 is 1 January 00:00–01:00; values are for the middle of the hour.
#pragma once

#include <algorithm>
#include <cmath>
#include <cstdint>
#include <vector>

namespace invented {

constexpr double pi = 3.14159265358979323846;

struct Year {
    std::vector<std::vector<double>> weather;  // 8760 rows: T_ambient °C, G W/m², incidence °
    std::vector<std::vector<double>> load;     // 8760 rows: draw kg/h, T_cold °C
};

inline double daily_cloudiness(int day)
{
    std::uint32_t state = 2463534242u + static_cast<std::uint32_t>(day) * 2654435761u;  // fixed, invented
    state ^= state << 13;
    state ^= state >> 17;
    state ^= state << 5;
    const double uniform = (state % 10000) / 10000.0;
    const double winter = 0.5 + 0.5 * std::cos(2 * pi * (day + 10) / 365.0);  // 1 at the winter solstice
    return std::max(0.2, std::min(1.0, 0.35 + 0.65 * uniform - 0.25 * winter * uniform));
}

inline Year year(double daily_draw_kg = 180)
{
    static const double profile[24] = {0, 0, 0, 0, 0, 0, 0.05, 0.20, 0.10, 0, 0, 0,
                                       0.10, 0.05, 0, 0, 0, 0, 0.10, 0.15, 0.15, 0.10, 0, 0};
    Year y;
    for (int hour = 0; hour < 8760; ++hour) {
        const int day = hour / 24;
        const double solar_time = hour % 24 + 0.5;
        const double season = std::cos(2 * pi * (day + 10) / 365.0);  // 1 at the winter solstice
        const double t_air = 11 - 9 * std::cos(2 * pi * (day - 15) / 365.0)
                             + 4.5 * std::sin(2 * pi * (solar_time - 9) / 24);
        const double day_length = 12 - 4 * season;
        const double sunrise = 12 - day_length / 2;
        const double phase = (solar_time - sunrise) / day_length;  // 0..1 between sunrise and sunset
        double irradiance = 0, incidence = 90;
        if (phase > 0 && phase < 1) {
            const double bell = std::sin(pi * phase);
            irradiance = (780 - 120 * season) * daily_cloudiness(day) * std::pow(bell, 1.3);
            const double noon_incidence = (30 + 15 * season) * pi / 180;
            incidence = std::acos(std::cos(noon_incidence) * bell) * 180 / pi;
        }
        y.weather.push_back({t_air, irradiance, incidence});
        const double t_cold = 12 - 4 * std::cos(2 * pi * (day - 30) / 365.0);
        y.load.push_back({daily_draw_kg * profile[hour % 24], t_cold});
    }
    return y;
}

}  // namespace invented
