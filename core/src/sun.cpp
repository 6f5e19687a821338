#include "solarith/sun.hpp"

#include "solarith/constants.hpp"
#include "solarith/errors.hpp"

#include <algorithm>
#include <cctype>
#include <cmath>

namespace solarith::sun {

namespace {

using constants::pi;
constexpr double degree = pi / 180;

// Calc serials of 1900-01-01 00:00 and 2101-01-01 00:00, the span accepted for date-times.
constexpr double first_datetime = 2;
constexpr double end_datetime = 73416;
// Calc serial of 2000-01-01 12:00 (J2000.0, JD 2451545).
constexpr double j2000_serial = 36526.5;

// cos 85°: the smallest cos(zenith) the sky models divide by (Perez et al. 1990).
const double cos_85 = std::cos(85 * degree);

// Spencer's (1971) day angle B = 2·pi·(n − 1)/365, radians.
double day_angle(double day_of_year)
{
    return 2 * pi * (day_of_year - 1) / 365;
}

void check_day(const char* fn, double day_of_year)
{
    check::between(fn, "day_of_year", day_of_year, 1, 366);
}

double spencer_declination(double day_of_year)
{
    const double b = day_angle(day_of_year);
    const double radians = 0.006918 - 0.399912 * std::cos(b) + 0.070257 * std::sin(b) - 0.006758 * std::cos(2 * b)
                           + 0.000907 * std::sin(2 * b) - 0.002697 * std::cos(3 * b) + 0.00148 * std::sin(3 * b);
    return radians / degree;
}

double spencer_orbit_factor(double day_of_year)
{
    const double b = day_angle(day_of_year);
    return 1.000110 + 0.034221 * std::cos(b) + 0.001280 * std::sin(b) + 0.000719 * std::cos(2 * b)
           + 0.000077 * std::sin(2 * b);
}

void check_plane(const char* fn, double tilt, double surface_azimuth)
{
    check::between(fn, "tilt", tilt, 0, 180);
    check::between(fn, "surface_azimuth", surface_azimuth, 0, 360);
}

// Unit vector towards the sun (east, north, up) or along a plane's normal,
// from a zenith (or tilt) angle and an azimuth from north, degrees.
struct Direction {
    double east, north, up;
};

Direction direction(double zenith_deg, double azimuth_deg)
{
    const double z = zenith_deg * degree, a = azimuth_deg * degree;
    return {std::sin(z) * std::sin(a), std::sin(z) * std::cos(a), std::cos(z)};
}

double angle_between(const Direction& p, const Direction& q)
{
    const double c = p.east * q.east + p.north * q.north + p.up * q.up;
    return std::acos(std::clamp(c, -1.0, 1.0)) / degree;
}

// ------------------------------------------------------------------ Perez 1990

// Upper bounds of the sky-clearness bins 1..7 (bin 8 is open), Perez et al.
// (1990) Table 1, and the irradiance coefficients f11, f12, f13, f21, f22, f23
// of each bin, Table 6. Written from memory, then checked digit by digit
// against both tables as reproduced in Sandia's PV Performance Modeling
// Collaborative guide ("Perez Sky Diffuse Model", pvpmc.sandia.gov).
constexpr double perez_bin_upper[7] = {1.065, 1.230, 1.500, 1.950, 2.800, 4.500, 6.200};
constexpr double perez_coefficients[8][6] = {
    {-0.008, 0.588, -0.062, -0.060, 0.072, -0.022},
    {0.130, 0.683, -0.151, -0.019, 0.066, -0.029},
    {0.330, 0.487, -0.221, 0.055, -0.064, -0.026},
    {0.568, 0.187, -0.295, 0.109, -0.152, -0.014},
    {0.873, -0.392, -0.362, 0.226, -0.462, 0.001},
    {1.132, -1.237, -0.412, 0.288, -0.823, 0.056},
    {1.060, -1.600, -0.359, 0.264, -1.127, 0.131},
    {0.678, -0.327, -0.250, 0.156, -1.377, 0.251},
};

int perez_bin(double clearness)
{
    int bin = 0;
    while (bin < 7 && clearness >= perez_bin_upper[bin])
        ++bin;
    return bin;
}

// Sky diffuse on the plane per unit dhi, Perez et al. (1990); the sun is above the horizon.
double perez_sky_factor(const PlaneInput& in, double beam_normal, double a, double b)
{
    const double z = in.zenith * degree;
    const double kappa_z3 = 1.041 * z * z * z;
    const double clearness = ((in.dhi + beam_normal) / in.dhi + kappa_z3) / (1 + kappa_z3);
    const double brightness = in.dhi * air_mass(in.zenith) / in.g_on;
    const double* f = perez_coefficients[perez_bin(clearness)];
    const double f1 = std::max(0.0, f[0] + f[1] * brightness + f[2] * z);
    const double f2 = f[3] + f[4] * brightness + f[5] * z;
    const double tilt = in.tilt * degree;
    return (1 - f1) * (1 + std::cos(tilt)) / 2 + f1 * a / b + f2 * std::sin(tilt);
}

// Sky diffuse on the plane per unit dhi, Reindl et al. (1990) HDKR; the sun is above the horizon.
double hdkr_sky_factor(const PlaneInput& in, double beam_normal, double a, double b)
{
    const double anisotropy = std::min(1.0, beam_normal / in.g_on);
    const double modulation = in.ghi > 0 ? std::sqrt((in.ghi - in.dhi) / in.ghi) : 0.0;
    const double half_tilt = in.tilt * degree / 2;
    const double s = std::sin(half_tilt);
    return anisotropy * a / b
           + (1 - anisotropy) * (1 + std::cos(in.tilt * degree)) / 2 * (1 + modulation * s * s * s);
}

// ------------------------------------------------------------ monthly R̄b

// ∫ (A + B cos w + C sin w) dw from w1 to w2.
double integral_of_cosine(double a, double b, double c, double w1, double w2)
{
    return a * (w2 - w1) + b * (std::sin(w2) - std::sin(w1)) - c * (std::cos(w2) - std::cos(w1));
}

// ∫ max(0, A + B cos w + C sin w) dw over −ws..ws (radians).
double integral_of_positive_part(double a, double b, double c, double ws)
{
    const double r = std::hypot(b, c);
    if (a >= r)  // positive all day
        return integral_of_cosine(a, b, c, -ws, ws);
    if (a <= -r)  // never positive
        return 0;
    // A + r·cos(w − w0) > 0 on the arc |w − w0| < half (mod 2·pi).
    const double w0 = std::atan2(c, b);
    const double half = std::acos(-a / r);
    double sum = 0;
    for (int k = -1; k <= 1; ++k) {
        const double lo = std::max(-ws, w0 - half + 2 * pi * k);
        const double hi = std::min(ws, w0 + half + 2 * pi * k);
        if (hi > lo)
            sum += integral_of_cosine(a, b, c, lo, hi);
    }
    return std::max(0.0, sum);
}

// cos I = A + B cos w + C sin w for a plane (Duffie & Beckman eq. 1.6.2 regrouped).
struct IncidenceCoefficients {
    double a, b, c;
};

IncidenceCoefficients incidence_coefficients(double declination_deg, double latitude, double tilt,
                                             double surface_azimuth)
{
    const double delta = declination_deg * degree, phi = latitude * degree, beta = tilt * degree;
    const double gamma = (surface_azimuth - 180) * degree;  // from south, west positive
    return {std::sin(delta) * (std::sin(phi) * std::cos(beta) - std::cos(phi) * std::sin(beta) * std::cos(gamma)),
            std::cos(delta) * (std::cos(phi) * std::cos(beta) + std::sin(phi) * std::sin(beta) * std::cos(gamma)),
            std::cos(delta) * std::sin(beta) * std::sin(gamma)};
}

}  // namespace

// -------------------------------------------------------------- day of year

double declination(double day_of_year)
{
    check_day("SUN_DECLINATION", day_of_year);
    return spencer_declination(day_of_year);
}

double equation_of_time(double day_of_year)
{
    check_day("SUN_EQ_OF_TIME", day_of_year);
    const double b = day_angle(day_of_year);
    const double radians = 0.000075 + 0.001868 * std::cos(b) - 0.032077 * std::sin(b) - 0.014615 * std::cos(2 * b)
                           - 0.04089 * std::sin(2 * b);
    return radians * 1440 / (2 * pi);
}

double extraterrestrial_normal(double day_of_year)
{
    check_day("SUN_EXTRATERRESTRIAL", day_of_year);
    return constants::solar_constant * spencer_orbit_factor(day_of_year);
}

double sunset_hour_angle(double latitude, double declination_deg)
{
    const double phi = latitude * degree, delta = declination_deg * degree;
    const double x = -std::sin(phi) * std::sin(delta);
    const double y = std::cos(phi) * std::cos(delta);
    if (x >= y)
        return 0;  // polar night
    if (x <= -y)
        return 180;  // polar day
    return std::acos(x / y) / degree;
}

double daily_horizontal_irradiation(double g_on, double latitude, double declination_deg)
{
    const double phi = latitude * degree, delta = declination_deg * degree;
    const double ws = sunset_hour_angle(latitude, declination_deg) * degree;
    const double value = 24 * 3600 / pi * g_on
                         * (std::cos(phi) * std::cos(delta) * std::sin(ws) + ws * std::sin(phi) * std::sin(delta));
    return std::max(0.0, value);
}

double daily_extraterrestrial(double latitude, double day_of_year)
{
    const char* fn = "SUN_DAILY_EXTRATERRESTRIAL";
    check::between(fn, "latitude", latitude, -90, 90);
    check_day(fn, day_of_year);
    return daily_horizontal_irradiation(constants::solar_constant * spencer_orbit_factor(day_of_year), latitude,
                            spencer_declination(day_of_year));
}

double diffuse_fraction(double kt)
{
    check::fraction("SUN_DIFFUSE_FRACTION", "clearness_index", kt);
    if (kt <= 0.22)
        return 1 - 0.09 * kt;
    if (kt <= 0.80)
        return 0.9511 + kt * (-0.1604 + kt * (4.388 + kt * (-16.638 + kt * 12.336)));
    return 0.165;
}

double monthly_diffuse_fraction(double kt, double ws_deg)
{
    if (ws_deg <= 81.4)
        return 1.391 + kt * (-3.560 + kt * (4.189 - 2.137 * kt));
    return 1.311 + kt * (-3.022 + kt * (3.427 - 1.821 * kt));
}

// ---------------------------------------------------------- solar position

SolarPosition solar_position(const char* fn, double latitude, double longitude, double utc_offset_h,
                             double datetime)
{
    check::between(fn, "latitude", latitude, -90, 90);
    check::between(fn, "longitude", longitude, -180, 180);
    check::between(fn, "utc_offset_h", utc_offset_h, -12, 14);
    if (!(datetime >= first_datetime && datetime <= end_datetime))
        fail_domain(fn, "datetime", datetime,
                    "2..73416 (1900-01-01 to 2100-12-31, the span of the time-scale model)");
    const double days_ut = datetime - utc_offset_h / 24 - j2000_serial;
    const double year = 2000 + (days_ut + 0.5) / 365.2425;
    const SpaResult r = spa(days_ut, delta_t_seconds(year), latitude, longitude, 0);
    return {r.zenith, r.azimuth, r.R};
}

double zenith(double latitude, double longitude, double utc_offset_h, double datetime)
{
    return solar_position("SUN_ZENITH", latitude, longitude, utc_offset_h, datetime).zenith;
}

double azimuth(double latitude, double longitude, double utc_offset_h, double datetime)
{
    return solar_position("SUN_AZIMUTH", latitude, longitude, utc_offset_h, datetime).azimuth;
}

double incidence(double latitude, double longitude, double utc_offset_h, double datetime, double tilt,
                 double surface_azimuth)
{
    const char* fn = "SUN_INCIDENCE";
    const SolarPosition sun = solar_position(fn, latitude, longitude, utc_offset_h, datetime);
    check_plane(fn, tilt, surface_azimuth);
    return angle_between(direction(sun.zenith, sun.azimuth), direction(tilt, surface_azimuth));
}

double incidence_cosine(double declination_deg, double latitude, double hour_angle, double tilt,
                        double surface_azimuth)
{
    const auto k = incidence_coefficients(declination_deg, latitude, tilt, surface_azimuth);
    const double w = hour_angle * degree;
    return k.a + k.b * std::cos(w) + k.c * std::sin(w);
}

// ------------------------------------------------ irradiance on a tilted plane

double air_mass(double zenith_deg)
{
    return 1 / (std::cos(zenith_deg * degree) + 0.50572 * std::pow(96.07995 - zenith_deg, -1.6364));
}

SkyModel sky_model(const char* fn, const std::string& name)
{
    std::string lower;
    for (unsigned char ch : name)
        lower += static_cast<char>(std::tolower(ch));
    if (lower == "isotropic")
        return SkyModel::isotropic;
    if (lower == "hdkr")
        return SkyModel::hdkr;
    if (lower == "perez")
        return SkyModel::perez;
    fail_domain(fn, "model = \"" + name + "\" is not one of \"isotropic\", \"hdkr\", \"perez\"");
}

double plane_irradiance(SkyModel model, const PlaneInput& in)
{
    const double tilt = in.tilt * degree;
    const double isotropic = (1 + std::cos(tilt)) / 2;
    const double ground = in.ghi * in.albedo * (1 - std::cos(tilt)) / 2;
    const double cos_z = std::cos(in.zenith * degree);
    if (!(cos_z > 0))  // sun at or below the horizon: no beam, isotropic sky
        return in.dhi * isotropic + ground;

    const double a = std::max(0.0, std::cos(in.incidence * degree));
    const double b = std::max(cos_85, cos_z);
    const double beam_normal = (in.ghi - in.dhi) / b;
    double sky = isotropic;
    if (model == SkyModel::hdkr)
        sky = hdkr_sky_factor(in, beam_normal, a, b);
    else if (model == SkyModel::perez && in.dhi > 0)
        sky = std::max(0.0, perez_sky_factor(in, beam_normal, a, b));
    return beam_normal * a + in.dhi * sky + ground;
}

double tilted_irradiance(double ghi, double dhi, double latitude, double longitude, double utc_offset_h,
                         double datetime, double tilt, double surface_azimuth, double albedo,
                         const std::string& model_name)
{
    const char* fn = "SUN_TILTED";
    check::non_negative(fn, "ghi", ghi);
    check::non_negative(fn, "dhi", dhi);
    if (dhi > ghi)
        fail_domain(fn, "dhi = " + format_number(dhi) + " is more than ghi = " + format_number(ghi)
                            + " (the diffuse part cannot exceed the global irradiance)");
    const SolarPosition sun = solar_position(fn, latitude, longitude, utc_offset_h, datetime);
    check_plane(fn, tilt, surface_azimuth);
    check::fraction(fn, "albedo", albedo);
    const SkyModel model = sky_model(fn, model_name);

    const double g_on = constants::solar_constant / (sun.distance_au * sun.distance_au);
    const double ghi_limit = 1.5 * g_on + 100;
    if (ghi > ghi_limit)
        fail_domain(fn, "ghi", ghi,
                    "0.." + format_number(ghi_limit) + " W/m² (1.5·G_on + 100, the BSRN physically possible limit)");
    const double cos_z = std::cos(sun.zenith * degree);
    if (cos_z > 0) {
        const double beam_limit = g_on * std::max(cos_z, cos_85);
        if (ghi - dhi > beam_limit)
            fail_domain(fn, "ghi - dhi = " + format_number(ghi - dhi) + " W/m² is more beam than the sun can give at zenith "
                                + format_number(sun.zenith) + "°: at most G_on·max(cos z, cos 85°) = "
                                + format_number(beam_limit) + " W/m²");
    }
    const double incidence_deg = angle_between(direction(sun.zenith, sun.azimuth), direction(tilt, surface_azimuth));
    return plane_irradiance(model, {ghi, dhi, sun.zenith, incidence_deg, tilt, albedo, g_on});
}

// -------------------------------------------- monthly irradiation on a plane

int mean_day_of_month(int month)
{
    static constexpr int days[12] = {17, 47, 75, 105, 135, 162, 198, 228, 258, 288, 318, 344};
    return days[month - 1];
}

double monthly_beam_ratio(double latitude, double declination_deg, double tilt, double surface_azimuth)
{
    const double ws = sunset_hour_angle(latitude, declination_deg) * degree;
    const auto plane = incidence_coefficients(declination_deg, latitude, tilt, surface_azimuth);
    const auto horizontal = incidence_coefficients(declination_deg, latitude, 0, 180);
    return integral_of_positive_part(plane.a, plane.b, plane.c, ws)
           / integral_of_cosine(horizontal.a, horizontal.b, horizontal.c, -ws, ws);
}

double monthly_tilted(double h_mean_daily, double latitude, double month, double tilt, double surface_azimuth,
                      double albedo)
{
    const char* fn = "SUN_MONTHLY_TILTED";
    check::non_negative(fn, "h_mean_daily", h_mean_daily);
    check::between(fn, "latitude", latitude, -90, 90);
    check::between(fn, "month", month, 1, 12);
    if (month != std::floor(month))
        fail_domain(fn, "month", month, "the whole numbers 1..12");
    check_plane(fn, tilt, surface_azimuth);
    check::fraction(fn, "albedo", albedo);
    if (h_mean_daily == 0)
        return 0;

    const int n = mean_day_of_month(static_cast<int>(month));
    const double delta = spencer_declination(n);
    const double h0 = daily_horizontal_irradiation(constants::solar_constant * spencer_orbit_factor(n), latitude, delta);
    if (!(h0 > 0))
        fail_domain(fn, "h_mean_daily = " + format_number(h_mean_daily)
                            + " J/m² but the sun does not rise on the month's mean day (polar night)");
    const double clearness = h_mean_daily / h0;
    if (!(clearness >= 0.3 && clearness <= 0.8))
        fail_domain(fn, "monthly clearness index h_mean_daily/H0 = " + format_number(h_mean_daily) + "/"
                            + format_number(h0) + " = " + format_number(clearness)
                            + " is outside 0.3..0.8, the range of the Erbs et al. (1982) monthly correlation");

    const double diffuse = monthly_diffuse_fraction(clearness, sunset_hour_angle(latitude, delta));
    const double beta = tilt * degree;
    const double ratio = (1 - diffuse) * monthly_beam_ratio(latitude, delta, tilt, surface_azimuth)
                         + diffuse * (1 + std::cos(beta)) / 2 + albedo * (1 - std::cos(beta)) / 2;
    return h_mean_daily * ratio;
}

}  // namespace solarith::sun
