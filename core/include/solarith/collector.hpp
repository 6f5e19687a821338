// Flat-plate solar collectors: performance from test data (the efficiency
// curve of EN ISO 9806, incidence angle modifiers, stagnation temperature)
// and from construction (transmittance–absorptance product, top loss, fin
// and heat removal factors, Hottel–Whillier–Bliss useful gain).
//
// Units: temperatures in °C (points) and K (differences), angles in degrees,
// irradiance in W/m², areas in m², loss coefficients in W/(m²·K), a2 in
// W/(m²·K²), mass flow in kg/s, cp in J/(kg·K), heat flows in W.
//
// Sources cited below (section and equation numbers from memory of the
// printed books and standards; the lead should check them against the copy
// at hand):
//   [D&B]   J.A. Duffie, W.A. Beckman, Solar Engineering of Thermal Processes,
//           4th ed., Wiley, 2013.
//   [9806]  EN ISO 9806:2017, Solar energy — Solar thermal collectors — Test
//           methods, steady-state efficiency test (quadratic form in the
//           reduced temperature difference (ϑm − ϑa)/G).
//   [Klein] S.A. Klein (1979), empirical top-loss equation, as given in
//           [D&B] eq. 6.4.9.
//   [Hollands] K.G.T. Hollands, T.E. Unny, G.D. Raithby, L. Konicek, Free
//           convective heat transfer across inclined air layers, J. Heat
//           Transfer 98 (1976) 189–193.
//   [F&C]   F.N. Fritsch, R.E. Carlson, Monotone piecewise cubic
//           interpolation, SIAM J. Numer. Anal. 17 (1980) 238–246;
//           F.N. Fritsch, J. Butland, SIAM J. Sci. Stat. Comput. 5 (1984)
//           300–304 (interior slopes); C. Moler, Numerical Computing with
//           MATLAB, SIAM 2004, §3.4 (end slopes).
#pragma once

#include <vector>

namespace solarith::collector {

// ---- From test data -------------------------------------------------------

// Collector efficiency on the mean fluid temperature, –:
//   η = η0 − a1·(Tm − Ta)/G − a2·(Tm − Ta)²/G      [9806, steady state]
// η0 0..1, a1 >= 0, a2 >= 0, G > 0. The curve value is returned as it is,
// also when negative (the collector loses more than it absorbs) and when
// Tm < Ta: no clamping at 0, no sign change of the a2 term.
double efficiency(double eta0, double a1, double a2, double t_mean_celsius, double t_ambient_celsius,
                  double irradiance);

// Power of a collector from its efficiency curve, W:
//   Q = A·(η0·K·G − a1·(Tm − Ta) − a2·(Tm − Ta)²)   [9806]
// i.e. A·G·η with η0 scaled by the incidence angle modifier K (one modifier
// for the whole irradiance; split beam and diffuse in the spreadsheet when
// they need different modifiers). A >= 0, G >= 0 (G = 0 gives the heat loss
// at night), K 0..2 (values above 1 occur for evacuated tubes at transversal
// angles; 2 is a plausibility bound chosen here). Negative when the
// collector loses heat.
double gain(double area, double eta0, double a1, double a2, double t_mean_celsius,
            double t_ambient_celsius, double irradiance, double incidence_modifier);

// Incidence angle modifier in the form of ASHRAE Standard 93 as given in
// [D&B] §6.17, –:
//   K(θ) = 1 − b0·(1/cosθ − 1), and 0 where this falls below 0 (past the
//   cut-off cosθ = b0/(1 + b0)) and for θ >= 90° (sun behind the plane).
// Here b0 >= 0 (D&B write K = 1 + b0·(1/cosθ − 1) with b0 ≈ −0.1 for one
// glass cover, from memory; their −0.1 is 0.1 here); b0 0..1 (1 already
// cuts off at 60°: a plausibility bound chosen here), incidence 0..180°.
double incidence_modifier(double incidence_deg, double b0);

// Incidence angle modifier interpolated in a measured table, –.
// The table is completed by the two values fixed by definition: K(0°) = 1
// when the table does not start at 0°, K(90°) = 0 when it does not reach
// 90°; so every angle 0..90° lies inside the table and nothing is
// extrapolated. Above 90° (sun behind the plane) the result is 0.
// Interpolation: piecewise cubic Hermite (Boost.Math cubic_hermite) with the
// shape-preserving PCHIP slopes [F&C]: monotone data give a monotone curve
// and the curve never leaves the range of the neighbouring table values, so
// a measured modifier cannot overshoot above 1 or below 0 between points.
// Two points give the straight line. Angles strictly increasing within
// 0..90, one modifier per angle, modifiers 0..2, K = 1 at 0° and K = 0 at
// 90° when those angles are in the table. Incidence 0..180°.
double incidence_modifier_table(double incidence_deg, const std::vector<double>& angles_deg,
                                const std::vector<double>& modifiers);

// Stagnation temperature, °C: the mean fluid temperature where the
// efficiency curve reaches 0, i.e. the positive root x = Tm − Ta of
// η0·G − a1·x − a2·x² = 0, evaluated without cancellation as
//   x = 2·η0·G / (a1 + √(a1² + 4·a2·η0·G)),
// which is also the linear case x = η0·G/a1 when a2 = 0. a1 = a2 = 0 is a
// DomainError (a loss-free curve never reaches 0). The curve is extrapolated
// far beyond its test range; treat the result as the curve's estimate.
// η0 0..1, a1, a2 >= 0, G >= 0 (G = 0 gives Ta).
double stagnation_temperature(double eta0, double a1, double a2, double t_ambient_celsius,
                              double irradiance);

// ---- From construction ----------------------------------------------------

// Transmittance–absorptance product (τα) of N identical covers over an
// absorber, –  [D&B ch. 5]:
//   Snell:    sinθ2 = sinθ1/n
//   Fresnel:  r⊥ = ((cosθ1 − n·cosθ2)/(cosθ1 + n·cosθ2))²,
//             r∥ = ((n·cosθ1 − cosθ2)/(n·cosθ1 + cosθ2))²
//             (the cosine form of D&B eqs. 5.1.1–5.1.2: exact at θ1 = 0,
//             where both give ((n − 1)/(n + 1))², eq. 5.1.4, no 0/0)
//   N covers, multiple reflections, each polarisation:
//             τr = ½·[(1 − r⊥)/(1 + (2N − 1)·r⊥) + (1 − r∥)/(1 + (2N − 1)·r∥)]   (eq. 5.1.8)
//   Bouguer:  τa = exp(−N·K·L/cosθ2)                                           (eq. 5.2.2)
//   τ ≈ τa·τr, and (τα) = τ·α/(1 − (1 − α)·ρd)                                (eq. 5.5.1)
// with ρd, the reflectance of the cover system for diffuse radiation coming
// back from the absorber, approximated as [D&B §5.5] by the specular value at
// 60°: ρd = τa(60°)·(1 − τr(60°)). K·L is per cover; α is the absorber's
// (hemispherical) absorptance for the beam, applied at every angle.
// θ1 0..180° (0 at and beyond 90°), n 1..3 (glazings lie at 1.3..1.6; the
// bound is a plausibility range chosen here), K·L >= 0, α 0..1, N integer
// 0..10 (N = 0: bare absorber, (τα) = α; 10 is a plausibility bound).
double tau_alpha(double incidence_deg, double refractive_index, double extinction_times_thickness,
                 double absorptance, double covers);

// Top loss coefficient by Klein's (1979) empirical equation, W/(m²·K)
// [D&B eq. 6.4.9]; T in K, β tilt in degrees:
//   U_t = { N / [ (C/Tp)·((Tp − Ta)/(N + f))^e ] + 1/h_w }⁻¹
//       + σ(Tp + Ta)(Tp² + Ta²) / [ (εp + 0.00591·N·h_w)⁻¹ + (2N + f − 1 + 0.133·εp)/εc − N ]
//   f = (1 + 0.089·h_w − 0.1166·h_w·εp)(1 + 0.07866·N)
//   C = 520·(1 − 0.000051·β²) for β <= 70°, β = 70° above
//   e = 0.430·(1 − 100/Tp)
// h_w from the wind speed as CONV_WIND_COEFF with its default length 1 m.
// Validity (the ranges of the fit as quoted for [D&B] eq. 6.4.9, from
// memory): plate 320..420 K, ambient 260..310 K, εp 0.1..0.95, tilt 0..90°,
// N 1..3, wind 0..10 m/s; all refused outside. εc 0 < εc <= 1 (the fit was
// made for glass, εc ≈ 0.88). The sky is taken at ambient temperature.
// Measured against solve_top_loss with T_sky = Ta, gap 25 mm, over a grid
// of this range (tests/unit/test_collector.cpp): rms 0.09 W/(m²·K), at most
// 0.41, for wind <= 3 m/s with εp 0.1 or 0.95; rms 0.36 and up to 1.9 W/(m²·K)
// (26 %) over the whole range, the large ones at 10 m/s or εp = 0.5.
double top_loss_klein(double t_plate_celsius, double t_ambient_celsius, double tilt_deg,
                      double emissivity_plate, double emissivity_cover, double covers, double wind_speed);

// The energy balance behind top_loss_exact, with the wind coefficient and
// the sky temperature given directly (for comparisons with Klein's equation,
// which assumes the sky at ambient temperature).
struct TopLossProblem {
    double t_plate_celsius;
    double t_ambient_celsius;
    double t_sky_celsius;  // <= t_ambient_celsius
    double tilt_deg;
    double emissivity_plate;
    double emissivity_cover;
    int covers;
    double h_wind;  // W/(m²·K)
    double gap;     // m, each gap
};

struct TopLossSolution {
    double u_top;                            // W/(m²·K), q/(Tp − Ta)
    double heat_flux;                        // W/m², plate to ambient and sky
    std::vector<double> cover_temperatures;  // °C, inner cover first
    std::vector<double> rayleigh;            // per gap, plate–cover first
    int sweeps;                              // Gauss–Seidel sweeps used
};

// Solves the steady energy balance of the cover chain (see top_loss_exact).
// Messages name COLL_TOP_LOSS_EXACT.
TopLossSolution solve_top_loss(const TopLossProblem& problem);

// Top loss coefficient from the energy balance of the covers, W/(m²·K),
// referred to the plate-to-ambient difference: U_t = q/(Tp − Ta), where q,
// the same through every gap and from the outer cover, satisfies
//   gap i (surfaces i−1 and i, surface 0 the plate):
//     q = Nu·k/L·(T_{i−1} − T_i) + σ(T_{i−1}⁴ − T_i⁴)/(1/ε_{i−1} + 1/ε_i − 1)
//     Nu from [Hollands] (NU_TILTED_GAP) at Ra = g·β·ΔT·L³/(ν·a), air
//     properties at the gap mean temperature and 101325 Pa, β = 1/T_mean;
//   outer cover:  q = h_w·(T_N − Ta) + εc·σ·(T_N⁴ − T_sky⁴)
//     h_w as CONV_WIND_COEFF (length 1 m), T_sky by Swinbank (RAD_SKY_TEMP).
// [D&B §6.4, the procedure of Example 6.4.1.] Solved by Gauss–Seidel sweeps
// over the covers, each cover temperature found by Boost.Math's TOMS 748
// root finder between its neighbours (the balance of one cover is monotone
// there, so every step is bracketed and the temperatures stay ordered);
// sweeps until no cover moves by more than 1e-10·(Tp − Ta) (U_t to about
// 1e-9 relative), at most 2000, else EvaluationError; at the end the fluxes
// of all gaps and of the outer cover must agree to 1e-6. During the sweeps Ra is capped at the correlation's upper
// limit; at the solution every gap must lie inside the correlation's range
// (else DomainError), so the cap never changes a returned value.
// Tp > Ta; ranges of the parts apply and are reported with their names:
// NU_TILTED_GAP (tilt 0..75°, Ra <= 1e5 at the solution), RAD_SKY_TEMP
// (Swinbank, ambient -40..50 °C), the air properties, CONV_WIND_COEFF;
// emissivities 0..1, N integer 1..10, gap > 0.
double top_loss_exact(double t_plate_celsius, double t_ambient_celsius, double tilt_deg,
                      double emissivity_plate, double emissivity_cover, double covers, double wind_speed,
                      double gap);

// Collector efficiency factor F′ of a fin-and-tube absorber, 0..1
// [D&B eq. 6.5.18, fin efficiency eqs. 6.5.12–6.5.13]:
//   F′ = (1/U_L) / ( W·[ 1/(U_L·(D + (W − D)·F)) + 1/C_b + 1/(π·D_i·h_fi) ] )
//   F  = tanh(m·(W − D)/2) / (m·(W − D)/2),   m = √(U_L/(k·δ))
// evaluated as 1/( W/(D + (W − D)·F) + W·U_L/C_b + W·U_L/(π·D_i·h_fi) ), so
// U_L = 0 gives the limit 1 without 0/0. bond_conductance C_b in W/(m·K)
// per metre of tube; omitted = perfect bond (term 0).
// W >= D > 0, 0 < D_i <= D, δ > 0, k > 0, U_L >= 0, h_fi > 0, C_b > 0.
double fin_efficiency_factor(double tube_spacing, double tube_outer_diameter, double tube_inner_diameter,
                             double plate_thickness, double plate_conductivity, double u_loss, double h_fluid,
                             double bond_conductance /* +inf = perfect bond */);

// Heat removal factor F_R, 0..1 [D&B §6.7]:
//   F_R = (ṁ·cp/(A·U_L))·(1 − exp(−A·U_L·F′/(ṁ·cp)))
// evaluated as F′·(−expm1(−x))/x, x = A·U_L·F′/(ṁ·cp), which is F′ at x = 0
// (ṁ → ∞ or U_L = 0). ṁ > 0, cp > 0, A > 0, U_L >= 0, F′ 0..1.
double heat_removal_factor(double mass_flow, double cp, double area, double u_loss, double f_prime);

// Useful gain, Hottel–Whillier–Bliss, W [D&B §6.7]:
//   Q = A·F_R·(S − U_L·(T_in − Ta))
// The raw value: negative when the collector loses heat to the fluid (D&B's
// "+" superscript, only positive values, describes a controller that stops
// the pump; apply it in the spreadsheet with MAX(0; …) where wanted).
// A >= 0, F_R 0..1, S >= 0 (absorbed irradiance, W/m²), U_L >= 0.
double useful_gain(double area, double f_r, double absorbed_irradiance, double u_loss, double t_in_celsius,
                   double t_ambient_celsius);

// Outlet temperature from the energy balance of the fluid, °C:
//   T_out = T_in + Q/(ṁ·cp).
// ṁ > 0, cp > 0; a result below absolute zero is a DomainError.
double outlet_temperature(double t_in_celsius, double gain, double mass_flow, double cp);

}  // namespace solarith::collector
