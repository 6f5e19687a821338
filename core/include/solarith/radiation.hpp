// Thermal radiation: black and grey bodies, exchange between surfaces,
// sky temperature and view factors. Temperatures in °C (converted to K
// inside), wavelengths in µm, fluxes in W/m².
#pragma once

namespace solarith::radiation {

// Emissive power of a grey body, E = emissivity·sigma·T⁴, W/m².
// Stefan–Boltzmann law (Stefan 1879, Boltzmann 1884); sigma from CODATA 2018.
// Valid for T >= -273.15 °C, emissivity 0..1.
double emissive_power(double t_celsius, double emissivity);

// Spectral emissive power of a grey body, W/(m²·µm):
//   E_lambda = emissivity·c1 / (lambda⁵·(exp(c2/(lambda·T)) − 1))
// Planck (1901); c1 = 2·pi·h·c², c2 = h·c/k from CODATA 2018. lambda in µm
// (> 0), T in °C above absolute zero, emissivity 0..1. Evaluated through
// logarithms so that lambda⁻⁵ and the exponential cannot over- or underflow
// on their own; a result too large to represent is left to the caller's
// finiteness check.
double spectral_emissive_power(double wavelength_um, double t_celsius, double emissivity);

// Wavelength of maximum spectral emissive power, lambda_max = b/T, µm.
// Wien's displacement law (Wien 1893); b from CODATA 2018. T above absolute zero.
double peak_wavelength(double t_celsius);

// Fraction of blackbody emission between wavelength1 and wavelength2 (µm),
// F(0→lambda2·T) − F(0→lambda1·T), 0..1. With zeta = c2/(lambda·T):
//   zeta >= 0.3: F(0→lambda·T) = (15/pi⁴)·sum_n (e^(−n·zeta)/n)·(zeta³ + 3·zeta²/n + 6·zeta/n² + 6/n³)
//   zeta <  0.3: 1 − F(0→lambda·T) = (15/pi⁴)·zeta³·(1/3 − zeta/8 + zeta²/60 − zeta⁴/5040
//                                     + zeta⁶/272160 − zeta⁸/13305600)
// Chang & Rhee (1984), Int. Commun. Heat Mass Transfer 11, 451–455; Siegel &
// Howell, Thermal Radiation Heat Transfer (from memory: both series are given
// there). The second is the Bernoulli-number expansion of the integrand; at
// the switch its first omitted term, (15/pi⁴)·zeta¹³/622702080, is 4e-17.
// Measured against scipy quadrature: each tail within 4e-13 relative, 1e-15
// absolute. The difference of the two fractions is taken from the tail that
// is small (below or above), so narrow bands far out keep their precision.
// Requires 0 <= wavelength1 <= wavelength2 (the band is given shorter
// wavelength first; reversed order is an error, not a negative fraction),
// T above absolute zero.
double band_fraction(double wavelength1_um, double wavelength2_um, double t_celsius);

// Net radiative flux between two infinite grey parallel plates, W/m², from
// plate 1 to plate 2 (negative when plate 2 is hotter):
//   q = sigma·(T1⁴ − T2⁴) / (1/e1 + 1/e2 − 1)
// Incropera et al., Fundamentals of Heat and Mass Transfer, Table 13.3
// "large (infinite) parallel planes" (table number from memory). Evaluated
// as sigma·(T1⁴ − T2⁴)·e1·e2/(e1 + e2 − e1·e2): an emissivity of 0 (perfect
// reflector) gives no exchange, and 0 with 0 gives 0, the limit from every
// direction. T >= −273.15 °C, emissivities 0..1.
double exchange_parallel_plates(double t1_celsius, double t2_celsius,
                                double emissivity1, double emissivity2);

// Net radiative flux from a grey body to a grey enclosure around it, W per
// m² of the inner surface:
//   q = sigma·(T_inner⁴ − T_outer⁴) / (1/e_inner + (A_inner/A_outer)·(1/e_outer − 1))
// Incropera et al., Table 13.3: long concentric cylinders (ratio r1/r2),
// concentric spheres (ratio (r1/r2)²), small convex body in a large cavity
// (ratio 0: q = e_inner·sigma·(T_inner⁴ − T_outer⁴), the enclosure's
// emissivity does not enter). Ratio 1 gives the parallel-plate result.
// A perfect reflector (e = 0) on either side gives no exchange for ratio > 0.
// T >= −273.15 °C, emissivities 0..1, area ratio 0..1.
double exchange_enclosed(double t_inner_celsius, double t_outer_celsius, double emissivity_inner,
                         double emissivity_outer, double area_ratio_inner_to_outer);

// Linearised radiative heat-transfer coefficient between parallel grey
// plates, W/(m²·K):
//   h_r = sigma·(T1² + T2²)·(T1 + T2) / (1/e1 + 1/e2 − 1)   (T in K)
// Duffie & Beckman, Solar Engineering of Thermal Processes, 4th ed. (2013),
// §3.10 (section from memory). Exact identity: h_r·(T1 − T2) equals
// exchange_parallel_plates. Same ranges and zero-emissivity rule as there.
double radiative_coefficient(double t1_celsius, double t2_celsius,
                             double emissivity1, double emissivity2);

// Effective clear-sky temperature, °C, from the air temperature alone:
//   T_sky = 0.0552·T_air^1.5   (K)
// Swinbank (1963), Q. J. R. Meteorol. Soc. 89, 339–348, in the form of
// Duffie & Beckman (2013) eq. 3.9.1 (equation number from memory).
// T_air −40..50 °C (a range of common practice, not taken from the paper).
double sky_temperature_swinbank(double t_air_celsius);

// Effective clear-sky temperature, °C, from air and dew-point temperature:
//   eps_sky = 0.711 + 0.56·(T_dp/100) + 0.73·(T_dp/100)²   (T_dp in °C)
//   T_sky = T_air·eps_sky^(1/4)                           (T in K)
// Berdahl & Martin (1984), Solar Energy 32, 663–664; Duffie & Beckman (2013)
// eq. 3.9.2 (from memory). The hourly term 0.013·cos(15°·hour) is omitted
// (its daily mean is zero), as is the pressure correction (sea level).
// T_dp −20..30 °C, the range of the data as quoted by Duffie & Beckman (from
// memory), and T_dp <= T_air; T_air −40..50 °C (common practice).
double sky_temperature_berdahl_martin(double t_air_celsius, double t_dewpoint_celsius);

// View factor between two identical, directly opposed (aligned) parallel
// rectangles width × length at the given gap, 0..1. With a = width/gap,
// b = length/gap:
//   F = 2/(pi·a·b)·{ ln[((1+a²)(1+b²)/(1+a²+b²))^½] + a·√(1+b²)·atan(a/√(1+b²))
//                    + b·√(1+a²)·atan(b/√(1+a²)) − a·atan(a) − b·atan(b) }
// Incropera et al. Table 13.2; Howell, A Catalog of Radiation Heat Transfer
// Configuration Factors, C-11 (catalogue number from memory). For
// min(a,b) < 0.015 the terms cancel; there the series in the smaller ratio
// (a <= b), derived here from the closed form,
//   F = (a/pi)·[atan b − a²·(b/(12(1+b²)) + atan(b)/4) + a⁴·(atan(b)/8 + b(9+7b²)/(120(1+b²)²))]
// is used (truncation and cancellation both below about 4e-12 relative).
// Lengths > 0; each ratio to the gap 1e-12..1e12.
double view_factor_parallel_rectangles(double width, double length, double gap);

// View factor from rectangle 1 (common_edge × width1) to rectangle 2
// (common_edge × width2), perpendicular and sharing the common edge, 0..1.
// With W = width1/common_edge, H = width2/common_edge, R² = W² + H²:
//   F = 1/(pi·W)·{ W·atan(1/W) + H·atan(1/H) − R·atan(1/R)
//                  + ¼·ln[ (1+W²)(1+H²)/(1+R²) · (W²(1+R²)/((1+W²)R²))^(W²)
//                          · (H²(1+R²)/((1+H²)R²))^(H²) ] }
// Incropera et al. Table 13.2; Howell's catalogue C-14 (number from memory).
// The difference R·atan(1/R) − m·atan(1/m), m = max(W,H), and the logarithms
// are rearranged so that no two large terms cancel. Lengths > 0; each width
// to common_edge ratio 1e-12..1e12.
double view_factor_perpendicular_rectangles(double common_edge, double width1, double width2);

// View factor from disk 1 (radius1) to a coaxial parallel disk 2 (radius2)
// at the given gap, 0..1:
//   F = ½·{S − √(S² − 4(r2/r1)²)},  S = 1 + (1 + R2²)/R1²,  Ri = ri/gap
// Incropera et al. Table 13.2; Howell's catalogue C-41 (number from memory).
// Evaluated in the equivalent form without cancellation
//   F = 2·r2² / (r1² + r2² + L² + √(((r1−r2)² + L²)·((r1+r2)² + L²)))
// with the lengths scaled by the largest. Radii and gap > 0.
double view_factor_coaxial_disks(double radius1, double radius2, double gap);

}  // namespace solarith::radiation
