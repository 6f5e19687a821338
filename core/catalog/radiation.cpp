// Catalogue entries of the radiation family (RAD_*).
#include "solarith/catalog.hpp"
#include "solarith/radiation.hpp"

#include <cmath>

namespace solarith::catalog {

std::vector<FunctionSpec> radiation_functions()
{
    namespace rad = solarith::radiation;
    return {
        {"RAD_EMISSIVE", "Radiation",
         "Radiant power emitted per unit area by a grey surface at temperature T.",
         "W/m²", ResultKind::Number,
         "E = emissivity·sigma·(T + 273.15)⁴, Stefan–Boltzmann law for a grey body "
         "(Stefan 1879; Boltzmann 1884); sigma = 5.670374419e-8 W/(m²·K⁴), CODATA 2018. "
         "Valid for T >= -273.15 °C and emissivity 0..1.",
         {{"T", ArgKind::Number, "°C", "Surface temperature"},
          {"emissivity", ArgKind::OptionalNumber, "–", "Hemispherical total emissivity, 0..1", 1.0}},
         "60; 0.9",
         [](const Args& a) -> Result { return rad::emissive_power(a.number(0), a.number(1)); }},

        {"RAD_SPECTRAL", "Radiation",
         "Spectral emissive power of a grey surface at one wavelength (Planck's law).",
         "W/(m²·µm)", ResultKind::Number,
         "E_lambda = emissivity·c1/(lambda⁵·(exp(c2/(lambda·T)) - 1)), Planck's law (Planck 1901), "
         "lambda in µm, T in K; c1 = 3.741771852e8 W·µm⁴/m², c2 = 14387.76877 µm·K, CODATA 2018. "
         "Valid for wavelength > 0, T above -273.15 °C, emissivity 0..1 (grey: the same at every wavelength).",
         {{"wavelength_um", ArgKind::Number, "µm", "Wavelength, > 0"},
          {"T", ArgKind::Number, "°C", "Surface temperature, above absolute zero"},
          {"emissivity", ArgKind::OptionalNumber, "–", "Spectral emissivity, 0..1", 1.0}},
         "10; 25",
         [](const Args& a) -> Result {
             return rad::spectral_emissive_power(a.number(0), a.number(1), a.number(2));
         }},

        {"RAD_PEAK_WAVELENGTH", "Radiation",
         "Wavelength at which a black body at temperature T emits most strongly (Wien's displacement law).",
         "µm", ResultKind::Number,
         "lambda_max = b/(T + 273.15), Wien's displacement law (Wien 1893); b = 2897.771955 µm·K, "
         "CODATA 2018. Valid for T above -273.15 °C.",
         {{"T", ArgKind::Number, "°C", "Temperature of the black body, above absolute zero"}},
         "5504.85",
         [](const Args& a) -> Result { return rad::peak_wavelength(a.number(0)); }},

        {"RAD_BAND_FRACTION", "Radiation",
         "Fraction of the total emission of a black body at temperature T that lies between two wavelengths.",
         "–", ResultKind::Number,
         "F = F(0→lambda2·T) - F(0→lambda1·T), the integral of Planck's law divided by sigma·T⁴. "
         "With zeta = c2/(lambda·T), c2 = 14387.76877 µm·K (CODATA 2018): for zeta >= 0.3 the series "
         "F(0→lambda·T) = (15/pi⁴)·sum over n of (e^(-n·zeta)/n)·(zeta³ + 3·zeta²/n + 6·zeta/n² + 6/n³), "
         "for zeta < 0.3 the power series 1 - F = (15/pi⁴)·zeta³·(1/3 - zeta/8 + zeta²/60 - zeta⁴/5040 "
         "+ zeta⁶/272160 - zeta⁸/13305600); Chang & Rhee (1984), Int. Commun. Heat Mass Transfer 11, "
         "451–455; Siegel & Howell, Thermal Radiation Heat Transfer. Accurate to about 1e-15 absolute. "
         "Valid for 0 <= wavelength1 <= wavelength2 (shorter wavelength first) and T above -273.15 °C; "
         "use 0 for wavelength1 to get the fraction below wavelength2.",
         {{"wavelength1_um", ArgKind::Number, "µm", "Shorter wavelength of the band, >= 0"},
          {"wavelength2_um", ArgKind::Number, "µm", "Longer wavelength of the band, >= wavelength1_um"},
          {"T", ArgKind::Number, "°C", "Temperature of the black body, above absolute zero"}},
         "0.38; 0.78; 5504.85",
         [](const Args& a) -> Result { return rad::band_fraction(a.number(0), a.number(1), a.number(2)); }},

        {"RAD_EXCHANGE_PLATES", "Radiation",
         "Net radiative heat flux between two large parallel grey plates, positive from plate 1 to plate 2.",
         "W/m²", ResultKind::Number,
         "q = sigma·((T1 + 273.15)⁴ - (T2 + 273.15)⁴)/(1/emissivity1 + 1/emissivity2 - 1), two infinite "
         "diffuse grey parallel plates; Incropera, DeWitt, Bergman & Lavine, Fundamentals of Heat and Mass "
         "Transfer, 6th ed. (2007), Table 13.3 (large parallel planes). sigma = 5.670374419e-8 W/(m²·K⁴), CODATA 2018. "
         "An emissivity of 0 (perfect reflector) gives 0. Valid for T1, T2 >= -273.15 °C and emissivities 0..1.",
         {{"T1", ArgKind::Number, "°C", "Temperature of plate 1"},
          {"T2", ArgKind::Number, "°C", "Temperature of plate 2"},
          {"emissivity1", ArgKind::Number, "–", "Hemispherical emissivity of plate 1, 0..1"},
          {"emissivity2", ArgKind::Number, "–", "Hemispherical emissivity of plate 2, 0..1"}},
         "80; 30; 0.95; 0.88",
         [](const Args& a) -> Result {
             return rad::exchange_parallel_plates(a.number(0), a.number(1), a.number(2), a.number(3));
         }},

        {"RAD_EXCHANGE_ENCLOSED", "Radiation",
         "Net radiative heat flux from a grey body to a grey enclosure around it (concentric tubes or spheres, "
         "or a small body in a large room), per m² of the inner surface.",
         "W/m²", ResultKind::Number,
         "q = sigma·((T_inner + 273.15)⁴ - (T_outer + 273.15)⁴)/(1/emissivity_inner + "
         "(A_inner/A_outer)·(1/emissivity_outer - 1)), diffuse grey two-surface enclosure; Incropera, "
         "DeWitt, Bergman & Lavine, Fundamentals of Heat and Mass Transfer, 6th ed. (2007), Table 13.3: "
         "long concentric cylinders (ratio r_inner/r_outer), concentric spheres (ratio (r_inner/r_outer)²), "
         "small convex body in a large cavity (ratio 0: q = emissivity_inner·sigma·(T_inner⁴ - T_outer⁴)). "
         "sigma = 5.670374419e-8 W/(m²·K⁴), "
         "CODATA 2018. For ratio > 0 an emissivity of 0 gives 0. Valid for temperatures >= -273.15 °C, "
         "emissivities 0..1, area ratio 0..1.",
         {{"T_inner", ArgKind::Number, "°C", "Temperature of the inner body"},
          {"T_outer", ArgKind::Number, "°C", "Temperature of the enclosing surface"},
          {"emissivity_inner", ArgKind::Number, "–", "Hemispherical emissivity of the inner body, 0..1"},
          {"emissivity_outer", ArgKind::Number, "–", "Hemispherical emissivity of the enclosure, 0..1"},
          {"area_ratio_inner_to_outer", ArgKind::Number, "–",
           "Inner surface area divided by enclosing surface area, 0..1 (0 = small body in a large room)"}},
         "80; 20; 0.9; 0.1; 0.8",
         [](const Args& a) -> Result {
             return rad::exchange_enclosed(a.number(0), a.number(1), a.number(2), a.number(3), a.number(4));
         }},

        {"RAD_COEFF", "Radiation",
         "Linearised radiative heat-transfer coefficient between two large parallel grey plates.",
         "W/(m²·K)", ResultKind::Number,
         "h_r = sigma·(T1² + T2²)·(T1 + T2)/(1/emissivity1 + 1/emissivity2 - 1), T in K, so that "
         "h_r·(T1 - T2) equals RAD_EXCHANGE_PLATES; Duffie & Beckman, Solar Engineering of Thermal Processes, "
         "4th ed. (2013), §3.10. sigma = 5.670374419e-8 W/(m²·K⁴), CODATA 2018. An emissivity of 0 gives 0. "
         "Valid for T1, T2 >= -273.15 °C and emissivities 0..1.",
         {{"T1", ArgKind::Number, "°C", "Temperature of plate 1"},
          {"T2", ArgKind::Number, "°C", "Temperature of plate 2"},
          {"emissivity1", ArgKind::Number, "–", "Hemispherical emissivity of plate 1, 0..1"},
          {"emissivity2", ArgKind::Number, "–", "Hemispherical emissivity of plate 2, 0..1"}},
         "80; 30; 0.95; 0.88",
         [](const Args& a) -> Result {
             return rad::radiative_coefficient(a.number(0), a.number(1), a.number(2), a.number(3));
         }},

        {"RAD_SKY_TEMP", "Radiation",
         "Effective clear-sky temperature for long-wave exchange with the sky: Berdahl–Martin when the dew point "
         "is given, Swinbank otherwise.",
         "°C", ResultKind::Number,
         "Without dew point: T_sky = 0.0552·T_air^1.5 (T in K), Swinbank (1963), Q. J. R. Meteorol. Soc. 89, "
         "339–348. With dew point: T_sky = T_air·(0.711 + 0.56·(T_dp/100) + 0.73·(T_dp/100)²)^(1/4) "
         "(T_air in K, T_dp in °C), Berdahl & Martin (1984), Solar Energy 32, 663–664, without the hourly term "
         "0.013·cos(15°·hour) (daily mean zero) and the pressure correction (sea level). Both as given by "
         "Duffie & Beckman, Solar Engineering of Thermal Processes, 4th ed. (2013), §3.9. Clear skies only. "
         "Valid for T_dp -20..30 °C (the range of Berdahl and Martin's data) and T_dp <= T_air; "
         "T_air -40..50 °C is a range of common practice, not stated by the sources.",
         {{"T_air", ArgKind::Number, "°C", "Air temperature near the ground, -40..50"},
          {"T_dewpoint", ArgKind::OptionalNumber, "°C",
           "Dew-point temperature, -20..30 and not above T_air; omit for Swinbank's correlation", NAN}},
         "20; 10",
         [](const Args& a) -> Result {
             const auto dew_point = a.optional_number(1);
             if (dew_point)
                 return rad::sky_temperature_berdahl_martin(a.number(0), *dew_point);
             return rad::sky_temperature_swinbank(a.number(0));
         }},

        {"RAD_VF_PARALLEL_RECT", "Radiation",
         "View factor between two identical, directly opposed parallel rectangles.",
         "–", ResultKind::Number,
         "F = 2/(pi·X·Y)·{ln[((1+X²)(1+Y²)/(1+X²+Y²))^½] + X·(1+Y²)^½·atan(X/(1+Y²)^½) "
         "+ Y·(1+X²)^½·atan(Y/(1+X²)^½) - X·atan(X) - Y·atan(Y)}, X = width/gap, Y = length/gap; "
         "Incropera, DeWitt, Bergman & Lavine, Fundamentals of Heat and Mass Transfer, 6th ed. (2007), "
         "Table 13.2 (aligned parallel rectangles); Howell, A Catalog of Radiation Heat Transfer "
         "Configuration Factors. "
         "Exact for diffuse surfaces; below X or Y = 0.015 a series in the smaller ratio replaces the "
         "cancelling closed form. Valid for positive lengths with width/gap and length/gap 1e-12..1e12.",
         {{"width", ArgKind::Number, "m", "Width of each rectangle, > 0"},
          {"length", ArgKind::Number, "m", "Length of each rectangle, > 0"},
          {"gap", ArgKind::Number, "m", "Distance between the two planes, > 0"}},
         "1; 2; 0.5",
         [](const Args& a) -> Result {
             return rad::view_factor_parallel_rectangles(a.number(0), a.number(1), a.number(2));
         }},

        {"RAD_VF_PERPENDICULAR_RECT", "Radiation",
         "View factor from rectangle 1 to rectangle 2, perpendicular to each other and sharing a common edge.",
         "–", ResultKind::Number,
         "F12 = 1/(pi·W)·{W·atan(1/W) + H·atan(1/H) - R·atan(1/R) + ¼·ln[(1+W²)(1+H²)/(1+R²) "
         "· (W²(1+R²)/((1+W²)R²))^(W²) · (H²(1+R²)/((1+H²)R²))^(H²)]}, W = width1/common_edge, "
         "H = width2/common_edge, R² = W² + H²; Incropera, DeWitt, Bergman & Lavine, Fundamentals of Heat and "
         "Mass Transfer, 6th ed. (2007), Table 13.2 (perpendicular rectangles with a common edge); Howell, "
         "A Catalog of Radiation Heat Transfer Configuration Factors. Exact for diffuse surfaces; evaluated in a "
         "rearranged form without cancellation. Valid for positive lengths with width1/common_edge and "
         "width2/common_edge 1e-12..1e12.",
         {{"common_edge", ArgKind::Number, "m", "Length of the edge the two rectangles share, > 0"},
          {"width1", ArgKind::Number, "m", "Width of rectangle 1 (the one seen from), > 0"},
          {"width2", ArgKind::Number, "m", "Width of rectangle 2, > 0"}},
         "2; 1; 1.5",
         [](const Args& a) -> Result {
             return rad::view_factor_perpendicular_rectangles(a.number(0), a.number(1), a.number(2));
         }},

        {"RAD_VF_COAXIAL_DISKS", "Radiation",
         "View factor from disk 1 to a parallel disk 2 on the same axis.",
         "–", ResultKind::Number,
         "F12 = ½·{S - (S² - 4·(r2/r1)²)^½}, S = 1 + (1 + R2²)/R1², Ri = ri/gap; Incropera, DeWitt, "
         "Bergman & Lavine, Fundamentals of Heat and Mass Transfer, 6th ed. (2007), Table 13.2 (coaxial "
         "parallel disks); Howell, A Catalog of Radiation Heat Transfer Configuration Factors. Exact for "
         "diffuse surfaces; "
         "evaluated as 2·r2²/(r1² + r2² + L² + (((r1-r2)² + L²)·((r1+r2)² + L²))^½), the same value without "
         "cancellation. Valid for positive radii and gap.",
         {{"radius1", ArgKind::Number, "m", "Radius of disk 1 (the one seen from), > 0"},
          {"radius2", ArgKind::Number, "m", "Radius of disk 2, > 0"},
          {"gap", ArgKind::Number, "m", "Distance between the disks, > 0"}},
         "0.5; 1; 1",
         [](const Args& a) -> Result {
             return rad::view_factor_coaxial_disks(a.number(0), a.number(1), a.number(2));
         }},
    };
}

}  // namespace solarith::catalog
