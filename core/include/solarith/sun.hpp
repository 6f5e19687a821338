// The sun: declination and equation of time, solar position, angle of
// incidence, extraterrestrial irradiance, diffuse fraction and irradiance on
// tilted planes, hourly and monthly.
//
// Conventions (../shared/design/functions.md): angles in degrees; azimuths
// clockwise from north (0 N, 90 E, 180 S, 270 W), accepted as 0..360; tilt
// from horizontal 0..180; day of year 1..366 (fractional days allowed);
// date-time as a Calc serial (days since 1899-12-30, fraction = time of day)
// in local civil time, with utc_offset_h hours east of UTC (−12..14).
// Irradiance in W/m², daily irradiation in J/m² per day.
#pragma once

#include <string>

namespace solarith::sun {

// ---------------------------------------------------------------- day of year
// Spencer (1971), Search 2(5), 172: Fourier series in the day angle
// B = 2·pi·(n − 1)/365 (Duffie & Beckman, Solar Engineering of Thermal
// Processes, 4th ed. 2013, eqs. 1.4.1b, 1.5.3, 1.6.1b).

// Solar declination, degrees:
//   delta = (180/pi)·(0.006918 − 0.399912 cos B + 0.070257 sin B − 0.006758 cos 2B
//           + 0.000907 sin 2B − 0.002697 cos 3B + 0.00148 sin 3B)
// Against the true sun (astropy, 12:00 UT of each day 2018–2021) it is up to
// 0.52° off near the equinoxes: the series' calendar phase dates from the
// mid-20th century and runs about 0.8 day late today (read at n + 1 it agrees
// within 0.13°). n in 1..366.
double declination(double day_of_year);

// Equation of time (apparent solar time minus mean solar time), minutes:
//   E = (1440/(2·pi))·(0.000075 + 0.001868 cos B − 0.032077 sin B − 0.014615 cos 2B
//       − 0.04089 sin 2B)
// (Duffie & Beckman round 1440/(2·pi) = 229.18 to 229.2.) Against astropy
// 2018–2021: within 0.87 min. n in 1..366.
double equation_of_time(double day_of_year);

// Extraterrestrial irradiance at normal incidence, W/m²:
//   G_on = G_sc·(1.000110 + 0.034221 cos B + 0.001280 sin B + 0.000719 cos 2B
//          + 0.000077 sin 2B)
// Spencer's (1971) series for (r0/r)²; G_sc = constants::solar_constant
// (1361 W/m², Kopp & Lean 2011). Against (1 AU/r)² from astropy 2018–2021:
// within 0.1 %. n in 1..366.
double extraterrestrial_normal(double day_of_year);

// Extraterrestrial irradiation on a horizontal surface over one day, J/m²:
//   H0 = (24·3600/pi)·G_on·(cos phi·cos delta·sin ws + ws·sin phi·sin delta)
// with ws the sunset hour angle in radians, cos ws = −tan phi·tan delta,
// clamped to 0 (polar night, H0 = 0) and pi (polar day); Duffie & Beckman
// eq. 1.10.3, declination and G_on (as above, Spencer) held for the day.
// With the true declination the formula matches astropy's integral over the
// day within 0.07 %; Spencer's declination moves H0 by up to 0.75 MJ/m² at
// 75° latitude near the equinoxes. Latitude −90..90, n in 1..366.
double daily_extraterrestrial(double latitude, double day_of_year);

// The same integral for a given G_on (W/m²) and declination (degrees); no checks.
double daily_horizontal_irradiation(double g_on, double latitude, double declination_deg);

// Sunset hour angle ws in degrees (0 polar night .. 180 polar day),
// cos ws = −tan phi·tan delta written as −sin phi·sin delta/(cos phi·cos delta)
// so that the poles need no special case (Duffie & Beckman eq. 1.6.10).
double sunset_hour_angle(double latitude, double declination_deg);

// Hourly diffuse fraction Id/I from the clearness index kT = I/I0, Erbs,
// Klein & Duffie (1982), Solar Energy 28, 293 (Duffie & Beckman eq. 2.10.1):
//   kT <= 0.22:        1 − 0.09·kT
//   0.22 < kT <= 0.80: 0.9511 − 0.1604·kT + 4.388·kT² − 16.638·kT³ + 12.336·kT⁴
//   kT > 0.80:         0.165
// kT in 0..1 (the constant branch is the correlation's own for clear skies).
double diffuse_fraction(double clearness_index);

// Monthly-average diffuse fraction H̄d/H̄ from the monthly clearness index
// K̄T = H̄/H̄0, Erbs, Klein & Duffie (1982) (Duffie & Beckman eq. 2.12.1):
//   ws <= 81.4°: 1.391 − 3.560·K̄T + 4.189·K̄T² − 2.137·K̄T³
//   ws >  81.4°: 1.311 − 3.022·K̄T + 3.427·K̄T² − 1.821·K̄T³
// ws = sunset hour angle of the month's mean day, degrees. Published range
// 0.3 <= K̄T <= 0.8; the caller checks it.
double monthly_diffuse_fraction(double clearness_index, double sunset_hour_angle_deg);

// ---------------------------------------------------------- solar position
// NREL's Solar Position Algorithm, Reda & Andreas (2004), Solar Energy 76,
// 577–589, and NREL/TP-560-34302 (revised 2008): heliocentric Earth
// coordinates from the truncated VSOP87 series of its Tables A4.2, nutation
// from its Table A4.3 (IAU 1980), aberration, apparent sidereal time, and the
// topocentric parallax of an observer at sea level (elevation 0). Geometric:
// no atmospheric refraction. Published uncertainty ±0.0003° for the years
// −2000..6000.
//
// Time scales: the spreadsheet date-time is civil time; minus utc_offset_h it
// is UTC, taken as UT1 (since 1972 leap seconds keep |UT1 − UTC| < 0.9 s,
// i.e. up to 0.004° of hour angle). TT = UT1 + ΔT with ΔT from the
// polynomials of Espenak & Meeus (2006) (delta_t_seconds below). Date-times
// are accepted from 1900-01-01 to 2100-12-31 (Calc serials 2..73416): the
// ΔT polynomials used here cover that span, and beyond it UTC is not assured
// to stay near UT1 (leap seconds may be discontinued after 2035).

// TT − UT1 in seconds for a decimal year 1900..2150, Espenak & Meeus (2006)
// polynomial expressions for ΔT (NASA Five Millennium Canon of Solar Eclipses).
double delta_t_seconds(double decimal_year);

// Intermediate and final quantities of the SPA for one instant, degrees
// unless stated; the names are the paper's.
struct SpaResult {
    double jd;                 // Julian day (UT)
    double L, B, R;            // heliocentric longitude, latitude (deg), radius vector (AU)
    double delta_psi;          // nutation in longitude
    double delta_epsilon;      // nutation in obliquity
    double epsilon;            // true obliquity of the ecliptic
    double lambda;             // apparent sun longitude
    double nu;                 // apparent sidereal time at Greenwich
    double alpha, delta;       // geocentric right ascension, declination
    double H;                  // observer local hour angle
    double delta_prime;        // topocentric declination
    double H_prime;            // topocentric local hour angle
    double zenith;             // topocentric zenith angle, no refraction
    double azimuth;            // topocentric azimuth, clockwise from north
};

// The SPA for an instant given as days since 2000-01-01 12:00 UT (JD − 2451545),
// ΔT in seconds, observer latitude and longitude (east positive) in degrees
// and elevation in m. No input checks: the spreadsheet functions below check.
SpaResult spa(double days_since_j2000_ut, double delta_t_s, double latitude, double longitude,
              double elevation_m);

struct SolarPosition {
    double zenith;       // degrees, 0..180 (above 90: sun below the horizon)
    double azimuth;      // degrees clockwise from north, 0..360
    double distance_au;  // Earth–sun distance, AU
};

// Topocentric position of the sun for a site and a civil date-time, checked
// for the spreadsheet function named fn (latitude −90..90, longitude
// −180..180 east positive, utc_offset_h −12..14, datetime 1900..2100).
SolarPosition solar_position(const char* fn, double latitude, double longitude, double utc_offset_h,
                             double datetime);

// SUN_ZENITH, SUN_AZIMUTH: the two angles of solar_position, degrees.
double zenith(double latitude, double longitude, double utc_offset_h, double datetime);
double azimuth(double latitude, double longitude, double utc_offset_h, double datetime);

// Angle between the sun and the normal of a plane with tilt 0..180 from
// horizontal and surface azimuth 0..360, degrees 0..180 (above 90: the sun is
// behind the plane):
//   cos I = cos(zenith)·cos(tilt) + sin(zenith)·sin(tilt)·cos(sun azimuth − surface azimuth)
// (Reda & Andreas 2004, incidence angle of a surface, in the azimuths of this add-in).
double incidence(double latitude, double longitude, double utc_offset_h, double datetime, double tilt,
                 double surface_azimuth);

// cos of the angle of incidence from declination, latitude, hour angle
// (solar time, negative before noon), tilt and surface azimuth (from north),
// all in degrees; Duffie & Beckman eq. 1.6.2 with gamma = surface azimuth − 180.
double incidence_cosine(double declination_deg, double latitude, double hour_angle, double tilt,
                        double surface_azimuth);

// ------------------------------------------------ irradiance on a tilted plane

// Relative optical air mass, Kasten & Young (1989), Applied Optics 28, 4735:
//   m = 1/(cos z + 0.50572·(96.07995 − z)^−1.6364), z = zenith in degrees 0..90.
double air_mass(double zenith_deg);

enum class SkyModel { isotropic, hdkr, perez };

// The sky model named in the spreadsheet ("isotropic", "hdkr", "perez",
// letter case ignored); anything else is a DomainError for fn.
SkyModel sky_model(const char* fn, const std::string& name);

// Everything a sky model needs at one instant.
struct PlaneInput {
    double ghi;          // global horizontal irradiance, W/m²
    double dhi;          // diffuse horizontal irradiance, W/m² (<= ghi)
    double zenith;       // sun zenith angle, degrees
    double incidence;    // angle of incidence on the plane, degrees
    double tilt;         // degrees from horizontal
    double albedo;       // ground reflectance 0..1
    double g_on;         // extraterrestrial normal irradiance, W/m²
};

// Irradiance on the plane, W/m², beam + sky diffuse + ground-reflected:
//   beam   = Bn·max(0, cos I), Bn = (ghi − dhi)/max(cos z, cos 85°); 0 when z >= 90°
//   ground = ghi·albedo·(1 − cos tilt)/2
//   sky, isotropic (Liu & Jordan 1963):  dhi·(1 + cos tilt)/2
//   sky, hdkr (Reindl, Beckman & Duffie 1990; Duffie & Beckman §2.16):
//        dhi·[Ai·a/b + (1 − Ai)·(1 + cos tilt)/2·(1 + f·sin³(tilt/2))],
//        Ai = min(1, Bn/G_on), f = sqrt((ghi − dhi)/ghi)
//   sky, perez (Perez, Ineichen, Seals, Michalsky & Stewart 1990, Solar Energy 44, 271):
//        dhi·[(1 − F1)·(1 + cos tilt)/2 + F1·a/b + F2·sin tilt], at least 0,
//        F1 = max(0, f11 + f12·Delta + f13·z), F2 = f21 + f22·Delta + f23·z (z in rad),
//        Delta = dhi·m/G_on (m: air_mass), coefficients by sky clearness
//        eps = ((dhi + Bn)/dhi + 1.041·z³)/(1 + 1.041·z³), Table 6 and bins of Table 1
// with a = max(0, cos I) and b = max(cos 85°, cos z) (the limit is Perez's; it
// is used for the beam and the circumsolar terms of all three models so that
// hours with the sun near the horizon do not multiply small beam values).
// With the sun at or below the horizon the beam and circumsolar parts are 0
// and the sky is isotropic in every model. No input checks.
double plane_irradiance(SkyModel model, const PlaneInput& in);

// SUN_TILTED: plane_irradiance at a site and civil date-time, the angles from
// the SPA and G_on = G_sc/R² with R from the SPA. Checks: 0 <= dhi <= ghi,
// ghi <= 1.5·G_on + 100 W/m² (the largest global irradiance that BSRN quality
// control accepts as physically possible, Long & Dutton 2002, at zenith sun),
// with the sun above the horizon beam normal Bn <= G_on (ghi − dhi <=
// G_on·max(cos z, cos 85°): more is not sunlight), tilt 0..180, surface
// azimuth 0..360, albedo 0..1, site and time as solar_position.
double tilted_irradiance(double ghi, double dhi, double latitude, double longitude, double utc_offset_h,
                         double datetime, double tilt, double surface_azimuth, double albedo,
                         const std::string& model);

// -------------------------------------------- monthly irradiation on a plane

// Klein's (1977) recommended mean day of each month (day of year, non-leap
// year): 17, 47, 75, 105, 135, 162, 198, 228, 258, 288, 318, 344 (the 17th,
// 16th, 16th, 15th, 15th, 11th, 17th, 16th, 15th, 15th, 14th, 10th).
int mean_day_of_month(int month);

// Klein's (1977) R̄b: extraterrestrial irradiation on the plane divided by
// that on the horizontal over the mean day, with the sun counted while it is
// above both the horizon and the plane:
//   R̄b = ∫ max(0, cos I) dw / ∫ cos z dw over |w| <= ws
// evaluated in closed form: cos I = A + B·cos w + C·sin w (Duffie & Beckman
// eq. 1.6.2), integrated over the part of the day where it is positive. For an
// equator-facing plane this is Klein's closed form (Duffie & Beckman §2.19) with
// w's = min(ws, arccos(−tan(phi − tilt)·tan delta)); for other azimuths it is
// the same integral with the plane's own sunrise and sunset hour angles
// (Klein 1977 general case). Requires sunshine on the day (ws > 0).
double monthly_beam_ratio(double latitude, double declination_deg, double tilt, double surface_azimuth);

// SUN_MONTHLY_TILTED, J/m² per day on the plane (Liu & Jordan 1962 isotropic
// form with Klein's R̄b):
//   H̄T = H̄·[(1 − H̄d/H̄)·R̄b + (H̄d/H̄)·(1 + cos tilt)/2 + albedo·(1 − cos tilt)/2]
// on the month's mean day (Spencer declination, H̄0 from
// daily_extraterrestrial), H̄d/H̄ from monthly_diffuse_fraction. The monthly
// clearness H̄/H̄0 must lie in 0.3..0.8 (the correlation's range); H̄ = 0 gives 0.
double monthly_tilted(double h_mean_daily, double latitude, double month, double tilt,
                      double surface_azimuth, double albedo);

}  // namespace solarith::sun
