// Catalogue entries of the system-sizing family (HX_*, FCHART_*).
#include "solarith/catalog.hpp"
#include "solarith/sizing.hpp"

namespace solarith::catalog {

namespace {

constexpr std::string_view family = "System sizing";

const ArgSpec month_days{"days", ArgKind::Number, "d", "Number of days of the month, 1..31"};
const ArgSpec month_load{"load", ArgKind::Number, "J",
                         "Heating load of the month (space heating and/or hot water), > 0"};

}  // namespace

std::vector<FunctionSpec> sizing_functions()
{
    namespace sz = solarith::sizing;
    return {
        {"HX_EFFECTIVENESS", family,
         "Effectiveness of a heat exchanger from its number of transfer units and capacity-rate ratio, for "
         "counterflow, parallel flow, crossflow with both fluids unmixed, or one shell pass with 2, 4… tube passes.",
         "–", ResultKind::Number,
         "ε = q/(C_min·(T_h,in − T_c,in)), NTU = UA/C_min, Cr = C_min/C_max. \"counterflow\": ε = (1 − e^(−NTU(1−Cr)))"
         "/(1 − Cr·e^(−NTU(1−Cr))), at Cr = 1 ε = NTU/(1 + NTU); \"parallel\": ε = (1 − e^(−NTU(1+Cr)))/(1 + Cr); "
         "\"shell-and-tube\" (one shell pass, 2, 4… tube passes): ε = 2/[1 + Cr + √(1+Cr²)·(1 + e^(−NTU√(1+Cr²)))"
         "/(1 − e^(−NTU√(1+Cr²)))], exact for two tube passes with the shell fluid mixed over each cross-section "
         "(Nagle 1933) and applied to 4, 6… passes as the handbooks do, where it lies above the exact four-pass "
         "value by up to 0.0005 for NTU <= 1, 0.004 for NTU <= 2 and 0.011 for NTU <= 3 (Incropera et al., "
         "Fundamentals of Heat and Mass Transfer, 6th ed., 2007, Table 11.3, eqs. 11.28a, 11.29a, 11.29b, 11.30a); "
         "\"crossflow\", both fluids "
         "unmixed: the exact series ε = 1/(Cr·NTU)·Σ_{n≥0} P(n+1, NTU)·P(n+1, Cr·NTU), P(n+1, z) = 1 − e^(−z)·"
         "Σ_{m=0..n} z^m/m! (Mason 1954; Baclic 1990), summed until the remainder is proved below 1e-18 of the sum, "
         "not the approximation 1 − exp[(NTU^0.22/Cr)(exp(−Cr·NTU^0.78) − 1)] of Incropera eq. 11.32. Cr = 0 gives "
         "1 − e^(−NTU) for every arrangement. Valid for NTU >= 0 (\"crossflow\": NTU <= 10000, where the series "
         "needs about 11000 terms), Cr 0..1.",
         {{"ntu", ArgKind::Number, "–", "Number of transfer units UA/C_min, >= 0"},
          {"capacity_ratio", ArgKind::Number, "–", "Capacity-rate ratio C_min/C_max, 0..1"},
          {"arrangement", ArgKind::OptionalText, "",
           "Flow arrangement: \"counterflow\", \"parallel\", \"crossflow\" (both fluids unmixed) or "
           "\"shell-and-tube\" (one shell pass, 2, 4… tube passes)",
           0, "counterflow"}},
         "2; 0.5; \"crossflow\"",
         [](const Args& a) -> Result {
             return sz::effectiveness(a.number(0), a.number(1), sz::arrangement_named("HX_EFFECTIVENESS", a.text(2)));
         }},
        {"HX_COLLECTOR_PENALTY", family,
         "Collector–heat-exchanger factor F_R′/F_R: how much a heat exchanger between the collector loop and the "
         "tank reduces the collector's heat removal factor.",
         "–", ResultKind::Number,
         "F_R′/F_R = [1 + (A·F_R·U_L/(ṁcp)_c)·((ṁcp)_c/(ε·(ṁcp)_min) − 1)]^(−1), with (ṁcp)_c the capacity rate of "
         "the collector loop, ε the exchanger's effectiveness and (ṁcp)_min the smaller capacity rate of the two "
         "loops (de Winter, Solar Energy 17, 1975; Duffie & Beckman, Solar Engineering of Thermal "
         "Processes, 4th ed., 2013, §10.2). The collector then gains A·F_R′·[S − U_L·(T_tank − T_a)] with the "
         "tank-side inlet temperature. Valid for 0 <= A·F_R·U_L < (ṁcp)_c (the Hottel–Whillier–Bliss F_R implies "
         "A·F_R·U_L/(ṁcp)_c = 1 − exp(−A·F′·U_L/(ṁcp)_c) < 1), (ṁcp)_c > 0, ε in (0, 1], 0 < (ṁcp)_min <= "
         "(ṁcp)_c.",
         {{"f_r_ul_area", ArgKind::Number, "W/K",
           "A·F_R·U_L: collector area times heat removal factor times loss coefficient, >= 0, below "
           "collector_capacity_rate"},
          {"collector_capacity_rate", ArgKind::Number, "W/K", "(ṁcp)_c: mass flow times cp of the collector loop, > 0"},
          {"effectiveness", ArgKind::Number, "–", "Effectiveness ε of the heat exchanger, in (0, 1]"},
          {"min_capacity_rate", ArgKind::Number, "W/K",
           "(ṁcp)_min: the smaller of the two loops' capacity rates, > 0, <= collector_capacity_rate"}},
         "150; 560; 0.7; 560",
         [](const Args& a) -> Result {
             return sz::collector_hx_factor(a.number(0), a.number(1), a.number(2), a.number(3));
         }},
        {"FCHART_X", family,
         "f-chart dimensionless group X: the collector's heat loss at a reference temperature difference over the "
         "month, relative to the month's heating load.",
         "–", ResultKind::Number,
         "X = A·F_R′U_L·(T_ref − T̄a)·Δt/L, Δt = days·86400 s (Klein, Beckman & Duffie, Solar Energy 18, 1976, "
         "113–127; Duffie & Beckman, Solar Engineering of Thermal Processes, 4th ed., 2013, §20.2). T_ref = 100 °C is "
         "the value the f-chart correlations (FCHART_F) were fitted with; another T_ref gives an X they do not "
         "cover. F_R′ includes the collector–heat-exchanger factor (HX_COLLECTOR_PENALTY). Multiply by "
         "FCHART_STORAGE_CORR or FCHART_DHW_CORR where they apply. Valid for A >= 0, F_R′U_L >= 0, days 1..31, "
         "L > 0, T_ref >= T̄a.",
         {{"area", ArgKind::Number, "m²", "Collector area, >= 0"},
          {"f_r_ul", ArgKind::Number, "W/(m²·K)", "F_R′·U_L: heat removal factor (with heat exchanger) times loss "
                                                  "coefficient, >= 0"},
          {"T_ambient_mean", ArgKind::Number, "°C", "Monthly mean ambient temperature, <= T_ref"},
          month_days,
          month_load,
          {"T_ref", ArgKind::OptionalNumber, "°C", "Reference temperature of the correlations", 100.0}},
         "50; 4.0; -2; 31; 30e9",
         [](const Args& a) -> Result {
             return sz::fchart_x(a.number(0), a.number(1), a.number(2), a.number(3), a.number(4), a.number(5));
         }},
        {"FCHART_Y", family,
         "f-chart dimensionless group Y: the solar energy the collector absorbs over the month, relative to the "
         "month's heating load.",
         "–", ResultKind::Number,
         "Y = A·F_R′(τα)_n·((τα)‾/(τα)_n)·H̄_T·N/L (Klein, Beckman & Duffie, Solar Energy 18, 1976, 113–127; "
         "Duffie & Beckman, Solar Engineering of Thermal Processes, 4th ed., 2013, §20.2), H̄_T the monthly-mean "
         "daily irradiation on the collector plane, N the days of the month. Valid for A >= 0, F_R′(τα)_n 0..1, "
         "(τα)‾/(τα)_n 0..1 (flat-plate collectors, whose τα is largest at normal incidence), H̄_T >= 0, N 1..31, "
         "L > 0.",
         {{"area", ArgKind::Number, "m²", "Collector area, >= 0"},
          {"f_r_tau_alpha_n", ArgKind::Number, "–",
           "F_R′(τα)_n: heat removal factor (with heat exchanger) times transmittance–absorptance at normal "
           "incidence, 0..1"},
          {"tau_alpha_ratio", ArgKind::Number, "–", "(τα)‾/(τα)_n: monthly mean over normal-incidence τα, 0..1"},
          {"h_tilted_mean_daily", ArgKind::Number, "J/m²",
           "Monthly-mean daily irradiation on the collector plane, per day, >= 0 (e.g. SUN_MONTHLY_TILTED)"},
          month_days,
          month_load},
         "50; 0.7; 0.94; 12e6; 31; 30e9",
         [](const Args& a) -> Result {
             return sz::fchart_y(a.number(0), a.number(1), a.number(2), a.number(3), a.number(4), a.number(5));
         }},
        {"FCHART_F", family,
         "Monthly solar fraction of a liquid or air solar heating system from the f-chart correlations, given the "
         "dimensionless groups X and Y.",
         "–", ResultKind::Number,
         "Liquid systems: f = 1.029Y − 0.065X − 0.245Y² + 0.0018X² + 0.0215Y³ (Klein, Beckman & Duffie, Solar "
         "Energy 18, 1976, 113–127); air systems: f = 1.040Y − 0.065X − 0.159Y² + 0.00187X² − 0.0095Y³ (Klein, "
         "Beckman & Duffie, Solar Energy 19, 1977, 509–512); Duffie & Beckman, Solar Engineering of Thermal "
         "Processes, 4th ed., 2013, §20.3, §20.4. The result is limited to 0..1 (above 1 the month is fully solar, "
         "below 0 solar contributes nothing). Valid for 0 <= X <= 18 and 0 <= Y <= 3, the range of the published "
         "charts; the correlations were fitted to simulations of standard systems (liquid: 75 l of water per m² of "
         "collector, else correct X with FCHART_STORAGE_CORR) and X, Y of one month each.",
         {{"X", ArgKind::Number, "–", "Dimensionless loss group X (FCHART_X, corrected), 0..18"},
          {"Y", ArgKind::Number, "–", "Dimensionless absorbed-energy group Y (FCHART_Y), 0..3"},
          {"system", ArgKind::OptionalText, "", "Working fluid of the collector loop: \"liquid\" or \"air\"", 0,
           "liquid"}},
         "3.5; 1.2",
         [](const Args& a) -> Result {
             return sz::fchart_fraction(a.number(0), a.number(1), sz::fchart_system_named("FCHART_F", a.text(2)));
         }},
        {"FCHART_STORAGE_CORR", family,
         "Multiplier of the f-chart group X for a liquid system whose store holds more or less than the standard 75 "
         "litres of water per m² of collector.",
         "–", ResultKind::Number,
         "X_c/X = (M/75)^(−0.25), M the storage in litres of water per m² of collector, 75 l/m² (350 kJ/(m²·K)) "
         "being the standard storage of the liquid f-chart (Klein, Beckman & Duffie, Solar Energy 18, 1976, "
         "113–127; Duffie & Beckman, Solar Engineering of Thermal Processes, 4th ed., 2013, §20.3). Valid for "
         "37.5 <= M <= 300 l/m².",
         {{"storage_litres_per_m2", ArgKind::Number, "l/m²",
           "Storage volume of water per m² of collector area, 37.5..300"}},
         "150",
         [](const Args& a) -> Result { return sz::fchart_storage_correction(a.number(0)); }},
        {"FCHART_DHW_CORR", family,
         "Multiplier of the f-chart group X for a system that heats service hot water only, from the mains, set "
         "and ambient temperatures.",
         "–", ResultKind::Number,
         "X_c/X = (11.6 + 1.18·T_w + 3.86·T_m − 2.32·T̄a)/(100 − T̄a), T_w the lowest acceptable hot-water (set) "
         "temperature, T_m the mains temperature, T̄a the monthly mean ambient temperature, °C (Klein, Beckman & "
         "Duffie, Solar Energy 18, 1976, 113–127; Duffie & Beckman, Solar Engineering of Thermal Processes, 4th ed., "
         "2013, §20.5). Valid for 5 <= T_m <= 20 °C and 50 <= T_w <= 70 °C (the range of the correlation as recalled "
         "from the sources) and T̄a below the value that makes the numerator zero (38.75 °C at the coldest T_w "
         "and T_m). The preheat tank is taken as well insulated; its losses are not part of the load.",
         {{"T_mains", ArgKind::Number, "°C", "Mains (cold) water temperature, 5..20"},
          {"T_set", ArgKind::Number, "°C", "Lowest acceptable hot-water temperature, 50..70"},
          {"T_ambient_mean", ArgKind::Number, "°C", "Monthly mean ambient temperature"}},
         "11; 60; 5",
         [](const Args& a) -> Result { return sz::fchart_dhw_correction(a.number(0), a.number(1), a.number(2)); }},
    };
}

}  // namespace solarith::catalog
