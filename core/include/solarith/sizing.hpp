// Heat exchangers and system sizing: the ε–NTU effectiveness of the common
// exchanger arrangements, the collector–heat-exchanger factor F_R′/F_R, and
// the f-chart method for the monthly solar fraction of liquid and air
// heating systems.
//
// Units: capacity rates ṁ·cp in W/K, areas in m², loss coefficients in
// W/(m²·K), temperatures in °C, energies in J (the monthly load, the daily
// irradiation in J/m²), the month's length in days. ε, NTU, Cr, X, Y and f
// are dimensionless.
//
// Sources (section, equation and table numbers from memory of the printed
// texts; the lead should check them against the copy at hand):
//   [Incropera] F.P. Incropera, D.P. DeWitt, T.L. Bergman, A.S. Lavine,
//             Fundamentals of Heat and Mass Transfer, 6th ed., Wiley, 2007,
//             §11.4, Table 11.3 (ε–NTU relations, eqs. 11.28a–11.33).
//   [Mason]   J.L. Mason, Heat transfer in cross flow, Proc. 2nd U.S.
//             National Congress of Applied Mechanics, 1954.
//   [Baclic]  B.S. Baclic, ε–Ntu analysis of complicated flow arrangements,
//             in: Compact Heat Exchangers (Shah, Kraus, Metzger, eds.),
//             Hemisphere, 1990 (the crossflow series below).
//   [Nagle]   W.M. Nagle, Mean temperature differences in multipass heat
//             exchangers, Ind. Eng. Chem. 25 (1933) (one shell pass, two
//             tube passes).
//   [deWinter] F. de Winter, Heat exchanger penalties in double-loop solar
//             water heating systems, Solar Energy 17 (1975).
//   Bibliographic details (titles, volumes, pages) are from memory.
//   [D&B]     J.A. Duffie, W.A. Beckman, Solar Engineering of Thermal
//             Processes, 4th ed., Wiley, 2013: §10.2 (collector–heat-
//             exchanger factor), chapter 20 (f-chart).
//   [KBD]     S.A. Klein, W.A. Beckman, J.A. Duffie, A design procedure for
//             solar heating systems, Solar Energy 18 (1976) 113–127;
//             S.A. Klein, W.A. Beckman, J.A. Duffie, A design procedure for
//             solar air heating systems, Solar Energy 19 (1977) 509–512.
#pragma once

#include <string>

namespace solarith::sizing {

// ---- Heat exchangers ------------------------------------------------------

enum class Arrangement { counterflow, parallel, crossflow_unmixed, shell_and_tube };

// The arrangement named "counterflow", "parallel", "crossflow" (both fluids
// unmixed) or "shell-and-tube" (one shell pass, 2, 4… tube passes), any
// letter case; any other name is a DomainError naming `function`.
Arrangement arrangement_named(const char* function, const std::string& name);

// HX_EFFECTIVENESS. Effectiveness ε = q/q_max, q_max = C_min·(T_h,in − T_c,in),
// of an exchanger with NTU = UA/C_min and Cr = C_min/C_max [Incropera
// Table 11.3]:
//   counterflow     ε = (1 − e^(−NTU(1−Cr)))/(1 − Cr·e^(−NTU(1−Cr))),
//                   Cr = 1: ε = NTU/(1 + NTU)                  [eqs. 11.29a, b]
//                   (evaluated as g/(1 + Cr·g), g = (1 − e^(−a))/(1 − Cr),
//                   a = NTU(1 − Cr), which has no 0/0 at Cr = 1)
//   parallel        ε = (1 − e^(−NTU(1+Cr)))/(1 + Cr)                   [eq. 11.28a]
//   shell-and-tube  ε = 2/{1 + Cr + s·(1 + e^(−NTU·s))/(1 − e^(−NTU·s))},
//                   s = (1 + Cr²)^½, one shell pass [eq. 11.30a; Nagle 1933]
//                   (evaluated with the coth written as 1/tanh(NTU·s/2));
//                   exact for two tube passes, the shell fluid mixed over
//                   each cross-section; for four passes it lies above the
//                   exact value by up to 0.0005 (NTU <= 1), 0.004 (NTU <= 2),
//                   0.011 (NTU <= 3) (tests/reference/gen_sizing.py)
//   crossflow, both fluids unmixed, the exact series [Mason 1954; Baclic 1990]
//                   ε = 1/(Cr·NTU) · Σ_{n≥0} P(n+1, NTU)·P(n+1, Cr·NTU),
//                   P(n+1, z) = 1 − e^(−z)·Σ_{m=0..n} z^m/m! (the regularised
//                   lower incomplete gamma function), summed until the
//                   remainder is proved below 1e-18 of the sum.
// Cr = 0 gives 1 − e^(−NTU) for every arrangement; NTU = 0 gives 0.
// NTU >= 0 (the crossflow series up to NTU = 10 000, where it needs about
// 11 000 terms), Cr 0..1.
double effectiveness(double ntu, double capacity_ratio, Arrangement arrangement);

// The crossflow series alone (both fluids unmixed), as above; NTU > 0,
// 0 < Cr <= 1, NTU <= 10 000. Exposed for the tests.
double crossflow_unmixed_effectiveness(double ntu, double capacity_ratio);

// HX_COLLECTOR_PENALTY. Collector–heat-exchanger factor F_R′/F_R: a collector
// loop delivering through a heat exchanger into a tank gains as much as the
// same collector without the exchanger would with F_R reduced to F_R′
// [deWinter 1975; D&B §10.2]:
//   F_R′/F_R = [1 + (A·F_R·U_L/(ṁcp)_c)·((ṁcp)_c/(ε·(ṁcp)_min) − 1)]^(−1)
// A·F_R·U_L in W/K (>= 0 and below (ṁcp)_c, which the Hottel–Whillier–Bliss
// F_R implies: A·F_R·U_L/(ṁcp)_c = 1 − e^(−A·F′·U_L/(ṁcp)_c) < 1), (ṁcp)_c
// the collector loop's capacity rate > 0, ε the exchanger's effectiveness in
// (0, 1], (ṁcp)_min the smaller of the two loops' capacity rates, > 0 and not
// above (ṁcp)_c. Result in (0, 1].
double collector_hx_factor(double f_r_ul_area, double collector_capacity_rate, double effectiveness,
                           double min_capacity_rate);

// ---- f-chart ----------------------------------------------------------------

// FCHART_X. Ratio of the collector's reference loss to the month's heating
// load [KBD 1976; D&B §20.2]:
//   X = A·F_R′U_L·(T_ref − T̄a)·Δt/L,   Δt = days·86400 s.
// A >= 0 m², F_R′U_L >= 0 W/(m²·K), days 1..31, L > 0 J per month,
// T_ref >= T̄a (T_ref = 100 °C is the value the f-chart correlations were
// fitted with).
double fchart_x(double area, double f_r_ul, double t_ambient_mean, double days, double load, double t_ref);

// FCHART_Y. Ratio of the energy the collector absorbs in the month to the
// month's heating load [KBD 1976; D&B §20.2]:
//   Y = A·F_R′(τα)_n·((τα)‾/(τα)_n)·H̄_T·N/L.
// A >= 0 m², F_R′(τα)_n 0..1, (τα)‾/(τα)_n 0..1, H̄_T >= 0 J/m² (monthly-mean
// daily irradiation on the collector plane), N = days 1..31, L > 0 J.
double fchart_y(double area, double f_r_tau_alpha_n, double tau_alpha_ratio, double h_tilted_mean_daily,
                double days, double load);

enum class FchartSystem { liquid, air };

// "liquid" or "air", any letter case; other names are a DomainError.
FchartSystem fchart_system_named(const char* function, const std::string& name);

// FCHART_F. Monthly solar fraction f of the f-chart correlations [KBD 1976,
// 1977; D&B §20.3, §20.4]:
//   liquid  f = 1.029Y − 0.065X − 0.245Y² + 0.0018X² + 0.0215Y³
//   air     f = 1.040Y − 0.065X − 0.159Y² + 0.00187X² − 0.0095Y³
// clamped to 0..1 (a value above 1 means the month is fully solar, below 0
// that solar contributes nothing). Valid for 0 <= X <= 18, 0 <= Y <= 3, the
// range of the published charts; outside it a DomainError.
double fchart_fraction(double x, double y, FchartSystem system);

// FCHART_STORAGE_CORR. Multiplier of X for a liquid system whose store holds
// M litres of water per m² of collector instead of the standard 75 l/m²
// (350 kJ/(m²·K)) [KBD 1976; D&B §20.3]:
//   X_c/X = (M/75)^(−0.25),   37.5 <= M <= 300 l/m².
double fchart_storage_correction(double storage_litres_per_m2);

// FCHART_DHW_CORR. Multiplier of X for a system that heats only service hot
// water [KBD 1976; D&B §20.5]:
//   X_c/X = (11.6 + 1.18·T_w + 3.86·T_m − 2.32·T̄a)/(100 − T̄a)
// with T_w the lowest acceptable hot-water (set) temperature, T_m the mains
// temperature and T̄a the monthly mean ambient temperature, all °C. Range
// applied (from memory, see the catalogue text): 5 <= T_m <= 20 °C,
// 50 <= T_w <= 70 °C; T̄a where the multiplier stays positive.
double fchart_dhw_correction(double t_mains, double t_set, double t_ambient_mean);

}  // namespace solarith::sizing
