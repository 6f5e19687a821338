// Catalogue entries of the sun family (SUN_*).
#include "solarith/catalog.hpp"
#include "solarith/sun.hpp"

namespace solarith::catalog {

namespace {

constexpr std::string_view spencer_day =
    "Day angle B = 2·pi·(n - 1)/365 from the day of year n (1..366, fractional days allowed).";

constexpr std::string_view spa_method =
    "NREL Solar Position Algorithm, Reda & Andreas (2004), Solar Energy 76, 577-589, and NREL/TP-560-34302 "
    "(2008): truncated VSOP87 Earth series, IAU 1980 nutation, aberration, apparent sidereal time, topocentric "
    "parallax for an observer at sea level; geometric, without atmospheric refraction (published uncertainty "
    "±0.0003° for the years -2000..6000). Local civil date-time minus utc_offset_h is taken as UT1 (within 0.9 s "
    "since 1972), TT - UT1 from the Espenak & Meeus (2006) polynomials. Accepted: latitude -90..90, longitude "
    "-180..180 (east positive), utc_offset_h -12..14 (east of UTC positive), date-time 1900-01-01 to 2100-12-31.";

}  // namespace

std::vector<FunctionSpec> sun_functions()
{
    namespace sun = solarith::sun;
    const ArgSpec day{"day_of_year", ArgKind::Number, "–", "Day of the year, 1 = 1 January, 1..366"};
    const ArgSpec latitude{"latitude", ArgKind::Number, "°", "Latitude, north positive, -90..90"};
    const ArgSpec longitude{"longitude", ArgKind::Number, "°", "Longitude, east positive, -180..180"};
    const ArgSpec utc_offset{"utc_offset_h", ArgKind::Number, "h",
                             "Offset of the local clock from UTC, east positive (e.g. 1 for CET), -12..14"};
    const ArgSpec datetime{"datetime", ArgKind::Number, "–",
                           "Local date and time as a Calc date-time serial (days since 1899-12-30), "
                           "1900-01-01 to 2100-12-31"};
    const ArgSpec tilt{"tilt", ArgKind::Number, "°", "Tilt of the plane from horizontal, 0..180"};
    const ArgSpec surface_azimuth{"surface_azimuth", ArgKind::Number, "°",
                                  "Azimuth the plane faces, clockwise from north (0 N, 90 E, 180 S, 270 W), 0..360"};
    return {
        {"SUN_DECLINATION", "Sun",
         "Declination of the sun on a day of the year (angle between the sun's rays and the equatorial plane).",
         "°", ResultKind::Number,
         "delta = (180/pi)·(0.006918 - 0.399912·cos B + 0.070257·sin B - 0.006758·cos 2B + 0.000907·sin 2B "
         "- 0.002697·cos 3B + 0.00148·sin 3B), Spencer (1971), Search 2(5), 172; Duffie & Beckman, Solar "
         "Engineering of Thermal Processes, 4th ed. (2013), eq. 1.6.1b. Compared with the true sun in 2018-2021 "
         "(astropy) it is up to 0.52° off near the equinoxes, its calendar phase dating from the mid-20th century; "
         "SUN_ZENITH and SUN_AZIMUTH use an exact ephemeris.",
         {day},
         "172",
         [](const Args& a) -> Result { return sun::declination(a.number(0)); }},

        {"SUN_EQ_OF_TIME", "Sun",
         "Equation of time: apparent solar time minus mean solar time on a day of the year.",
         "min", ResultKind::Number,
         "E = (1440/(2·pi))·(0.000075 + 0.001868·cos B - 0.032077·sin B - 0.014615·cos 2B - 0.04089·sin 2B) "
         "minutes, Spencer (1971), Search 2(5), 172; Duffie & Beckman, Solar Engineering of Thermal Processes, "
         "4th ed. (2013), eq. 1.5.3 (which rounds 1440/(2·pi) to 229.2). Within 0.9 min of the true sun in "
         "2018-2021 (astropy). Solar time = standard time + 4 min/°·(longitude - standard meridian) + E.",
         {day},
         "34",
         [](const Args& a) -> Result { return sun::equation_of_time(a.number(0)); }},

        {"SUN_ZENITH", "Sun",
         "Zenith angle of the sun seen from a site at a local date and time (above 90°: below the horizon).",
         "°", ResultKind::Number, spa_method,
         {latitude, longitude, utc_offset, datetime},
         "47.5; 8.5; 1; 45458.5",
         [](const Args& a) -> Result { return sun::zenith(a.number(0), a.number(1), a.number(2), a.number(3)); }},

        {"SUN_AZIMUTH", "Sun",
         "Azimuth of the sun seen from a site at a local date and time, clockwise from north "
         "(0 N, 90 E, 180 S, 270 W).",
         "°", ResultKind::Number, spa_method,
         {latitude, longitude, utc_offset, datetime},
         "47.5; 8.5; 1; 45458.5",
         [](const Args& a) -> Result { return sun::azimuth(a.number(0), a.number(1), a.number(2), a.number(3)); }},

        {"SUN_INCIDENCE", "Sun",
         "Angle between the sun and the normal of a tilted plane at a site, local date and time "
         "(above 90°: the sun is behind the plane).",
         "°", ResultKind::Number,
         "cos I = cos(zenith)·cos(tilt) + sin(zenith)·sin(tilt)·cos(sun azimuth - surface azimuth), sun zenith and "
         "azimuth as SUN_ZENITH and SUN_AZIMUTH (NREL SPA, Reda & Andreas 2004, geometric, no refraction, valid "
         "1900-01-01 to 2100-12-31). Tilt 0..180 from horizontal, surface azimuth 0..360 clockwise from north.",
         {latitude, longitude, utc_offset, datetime, tilt, surface_azimuth},
         "47.5; 8.5; 1; 45458.5; 35; 180",
         [](const Args& a) -> Result {
             return sun::incidence(a.number(0), a.number(1), a.number(2), a.number(3), a.number(4), a.number(5));
         }},

        {"SUN_EXTRATERRESTRIAL", "Sun",
         "Solar irradiance outside the atmosphere on a plane normal to the sun's rays on a day of the year.",
         "W/m²", ResultKind::Number,
         "G_on = G_sc·(1.000110 + 0.034221·cos B + 0.001280·sin B + 0.000719·cos 2B + 0.000077·sin 2B), the Earth "
         "orbit correction (r0/r)² of Spencer (1971); Duffie & Beckman, Solar Engineering of Thermal Processes, "
         "4th ed. (2013), eq. 1.4.1b. Solar constant G_sc = 1361 W/m² (Kopp & Lean 2011, Geophys. Res. Lett. 38, "
         "L01706; IAU 2015 Resolution B3). Within 0.1 % of G_sc·(1 AU/r)² of the true orbit in 2018-2021 (astropy).",
         {day},
         "1",
         [](const Args& a) -> Result { return sun::extraterrestrial_normal(a.number(0)); }},

        {"SUN_DAILY_EXTRATERRESTRIAL", "Sun",
         "Solar irradiation outside the atmosphere on a horizontal surface over one day, at a latitude and a day of "
         "the year.",
         "J/m²", ResultKind::Number,
         "H0 = (24·3600/pi)·G_on·(cos phi·cos delta·sin ws + ws·sin phi·sin delta), ws the sunset hour angle in rad, "
         "cos ws = -tan phi·tan delta clamped to ws = 0 (polar night, H0 = 0) and ws = pi (polar day); Duffie & "
         "Beckman, Solar Engineering of Thermal Processes, 4th ed. (2013), eq. 1.10.3. G_on and delta of the day "
         "from Spencer (1971), G_sc = 1361 W/m² (Kopp & Lean 2011); Spencer's declination (up to 0.52° off the true "
         "sun today) moves H0 by up to 0.75 MJ/m² at 75° latitude near the equinoxes. Latitude -90..90, day 1..366.",
         {latitude, day},
         "43; 105",
         [](const Args& a) -> Result { return sun::daily_extraterrestrial(a.number(0), a.number(1)); }},

        {"SUN_DIFFUSE_FRACTION", "Sun",
         "Diffuse fraction of the global horizontal irradiation in one hour from the hourly clearness index.",
         "–", ResultKind::Number,
         "Erbs, Klein & Duffie (1982), Solar Energy 28, 293-302, hourly correlation: Id/I = 1 - 0.09·kT for "
         "kT <= 0.22; 0.9511 - 0.1604·kT + 4.388·kT² - 16.638·kT³ + 12.336·kT⁴ for 0.22 < kT <= 0.80; 0.165 for "
         "kT > 0.80 (Duffie & Beckman, 4th ed. 2013, eq. 2.10.1). kT = I/I0, hourly global over extraterrestrial "
         "horizontal irradiation, accepted 0..1.",
         {{"clearness_index", ArgKind::Number, "–", "Hourly clearness index kT = I/I0, 0..1"}},
         "0.5",
         [](const Args& a) -> Result { return sun::diffuse_fraction(a.number(0)); }},

        {"SUN_TILTED", "Sun",
         "Irradiance on a tilted plane from global and diffuse horizontal irradiance at a site, local date and time, "
         "by the isotropic, HDKR or Perez sky model.",
         "W/m²", ResultKind::Number,
         "G_T = beam + sky diffuse + ground-reflected. Beam = Bn·max(0, cos I), Bn = (ghi - dhi)/max(cos z, cos 85°), "
         "0 with the sun at or below the horizon; ground = ghi·albedo·(1 - cos tilt)/2. Sky diffuse: \"isotropic\" "
         "dhi·(1 + cos tilt)/2 (Liu & Jordan 1963); \"hdkr\" dhi·[Ai·a/b + (1 - Ai)·(1 + cos tilt)/2·(1 + f·sin³(tilt/2))], "
         "Ai = Bn/G_on, f = sqrt((ghi - dhi)/ghi) (Reindl, Beckman & Duffie 1990; Duffie & Beckman, 4th ed. 2013, "
         "§2.16); \"perez\" dhi·[(1 - F1)·(1 + cos tilt)/2 + F1·a/b + F2·sin tilt] with the 8 sky-clearness bins and "
         "coefficients of Perez, Ineichen, Seals, Michalsky & Stewart (1990), Solar Energy 44, 271-289, Tables 1 and 6, "
         "relative air mass of Kasten & Young (1989), not below 0. a = max(0, cos I), b = max(cos 85°, cos z). Sun "
         "angles from the NREL SPA (as SUN_ZENITH, geometric), G_on = 1361 W/m²/R² with R from the SPA. With the sun "
         "below the horizon every model is isotropic. Requires 0 <= dhi <= ghi <= 1.5·G_on + 100 W/m² (BSRN "
         "physically possible limit, Long & Dutton 2002), Bn <= G_on with the sun up, tilt 0..180, surface "
         "azimuth 0..360, albedo 0..1.",
         {{"ghi", ArgKind::Number, "W/m²", "Global horizontal irradiance, >= 0"},
          {"dhi", ArgKind::Number, "W/m²", "Diffuse horizontal irradiance, 0..ghi"},
          latitude, longitude, utc_offset, datetime, tilt, surface_azimuth,
          {"albedo", ArgKind::OptionalNumber, "–", "Reflectance of the ground, 0..1", 0.2},
          {"model", ArgKind::OptionalText, "", "Sky model: \"isotropic\", \"hdkr\" or \"perez\"", 0, "hdkr"}},
         "650; 180; 47.5; 8.5; 1; 45458.5; 35; 180",
         [](const Args& a) -> Result {
             return sun::tilted_irradiance(a.number(0), a.number(1), a.number(2), a.number(3), a.number(4),
                                           a.number(5), a.number(6), a.number(7), a.number(8), a.text(9));
         }},

        {"SUN_MONTHLY_TILTED", "Sun",
         "Monthly-average daily irradiation on a tilted plane from the monthly-average daily global horizontal "
         "irradiation.",
         "J/m²", ResultKind::Number,
         "H_T = H·[(1 - Hd/H)·Rb + (Hd/H)·(1 + cos tilt)/2 + albedo·(1 - cos tilt)/2], isotropic diffuse (Liu & "
         "Jordan 1962) with Klein's (1977) Rb, Solar Energy 19, 325-329: the ratio of the day's extraterrestrial "
         "irradiation on the plane to that on the horizontal on the month's mean day (17, 16, 16, 15, 15, 11, 17, "
         "16, 15, 15, 14, 10 Jan..Dec), counting the hours the sun is above both horizon and plane, in closed form "
         "for any azimuth. Hd/H from the monthly clearness K = H/H0 by Erbs, Klein & Duffie (1982): ws <= 81.4°: "
         "1.391 - 3.560·K + 4.189·K² - 2.137·K³, ws > 81.4°: 1.311 - 3.022·K + 3.427·K² - 1.821·K³, valid for "
         "K 0.3..0.8 (outside: error). Declination Spencer (1971), H0 as SUN_DAILY_EXTRATERRESTRIAL. Duffie & "
         "Beckman, 4th ed. (2013), §1.10, §2.12, §2.19. H = 0 gives 0.",
         {{"h_mean_daily", ArgKind::Number, "J/m²",
           "Monthly-average daily global irradiation on the horizontal, per day, >= 0"},
          latitude,
          {"month", ArgKind::Number, "–", "Month, 1 = January .. 12 = December"},
          tilt, surface_azimuth,
          {"albedo", ArgKind::OptionalNumber, "–", "Reflectance of the ground, 0..1", 0.2}},
         "1.5e7; 47.5; 3; 45; 180",
         [](const Args& a) -> Result {
             return sun::monthly_tilted(a.number(0), a.number(1), a.number(2), a.number(3), a.number(4),
                                        a.number(5));
         }},
    };
}

}  // namespace solarith::catalog
