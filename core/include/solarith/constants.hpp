// Physical constants, all in one place.
//
// Source: CODATA 2018 recommended values (Tiesinga, Mohr, Newell & Taylor,
// Rev. Mod. Phys. 93, 025010, 2021; NIST SP 961, 2019). Since the 2019 SI
// redefinition h, c and k are exact; sigma, c1 and c2 are computed from them.
#pragma once

namespace solarith::constants {

// Kelvin at 0 °C (exact, by definition of the Celsius scale).
inline constexpr double zero_celsius_in_kelvin = 273.15;

// Planck constant h, J·s (exact).
inline constexpr double planck = 6.62607015e-34;
// Speed of light in vacuum c, m/s (exact).
inline constexpr double speed_of_light = 299792458.0;
// Boltzmann constant k, J/K (exact).
inline constexpr double boltzmann = 1.380649e-23;

inline constexpr double pi = 3.14159265358979323846;

// Avogadro constant N_A, 1/mol (exact).
inline constexpr double avogadro = 6.02214076e23;
// Molar gas constant R = N_A·k, J/(mol·K) (exact; CODATA 2018 prints 8.314462618...).
inline constexpr double molar_gas_constant = avogadro * boltzmann;

// The radiation constants follow exactly from h, c and k; computing them here
// keeps every digit a double holds. They agree with the values CODATA 2018
// prints (sigma 5.670374419e-8, c1 3.741771852e-16, c2 1.438776877e-2) in
// every printed digit.
// Stefan–Boltzmann constant sigma = 2·pi⁵·k⁴/(15·h³·c²), W/(m²·K⁴).
inline constexpr double stefan_boltzmann = 2 * pi * pi * pi * pi * pi * boltzmann * boltzmann * boltzmann
                                           * boltzmann
                                           / (15 * planck * planck * planck * speed_of_light * speed_of_light);
// First radiation constant for spectral radiant exitance c1 = 2·pi·h·c², W·m².
inline constexpr double first_radiation = 2 * pi * planck * speed_of_light * speed_of_light;
// Second radiation constant c2 = h·c/k, m·K.
inline constexpr double second_radiation = planck * speed_of_light / boltzmann;
// Wien wavelength displacement law constant b, m·K (CODATA 2018 value; the
// exact one needs the root of x = 5·(1 − e^(−x))).
inline constexpr double wien_displacement = 2.897771955e-3;

// Standard acceleration of gravity g_n, m/s² (exact, 3rd CGPM 1901).
inline constexpr double standard_gravity = 9.80665;

// Solar constant G_sc, the total solar irradiance at the mean Earth–sun
// distance, W/m²: 1360.8 ± 0.5 W/m² measured by SORCE/TIM, Kopp & Lean (2011),
// Geophys. Res. Lett. 38, L01706, rounded to 1361 as the IAU 2015 nominal
// value (Resolution B3). Older texts use 1367 W/m² (World Radiation Center).
inline constexpr double solar_constant = 1361.0;

// Absolute temperature in K of a temperature in °C.
constexpr double kelvin(double t_celsius) { return t_celsius + zero_celsius_in_kelvin; }

}  // namespace solarith::constants
