// Physical constants, all in one place.
//
// Source: CODATA 2018 recommended values (Tiesinga, Mohr, Newell & Taylor,
// Rev. Mod. Phys. 93, 025010, 2021; NIST SP 961, 2019). Since the 2019 SI
// redefinition h, c and k are exact; sigma, b, c1 and c2 are derived from
// them and are quoted here to the digits CODATA prints.
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

// Stefan–Boltzmann constant sigma, W/(m²·K⁴).
inline constexpr double stefan_boltzmann = 5.670374419e-8;
// Wien wavelength displacement law constant b, m·K.
inline constexpr double wien_displacement = 2.897771955e-3;
// First radiation constant for spectral radiant exitance c1 = 2·pi·h·c², W·m².
inline constexpr double first_radiation = 3.741771852e-16;
// Second radiation constant c2 = h·c/k, m·K.
inline constexpr double second_radiation = 1.438776877e-2;

// Standard acceleration of gravity g_n, m/s² (exact, 3rd CGPM 1901).
inline constexpr double standard_gravity = 9.80665;

inline constexpr double pi = 3.14159265358979323846;

// Absolute temperature in K of a temperature in °C.
constexpr double kelvin(double t_celsius) { return t_celsius + zero_celsius_in_kelvin; }

}  // namespace solarith::constants
