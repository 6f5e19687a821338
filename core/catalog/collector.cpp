// Catalogue entries of the collector family (COLL_*).
#include "solarith/catalog.hpp"
#include "solarith/collector.hpp"

#include <cmath>

namespace solarith::catalog {

std::vector<FunctionSpec> collector_functions()
{
    namespace coll = solarith::collector;
    return {
        {"COLL_EFFICIENCY", "Collector",
         "Efficiency of a solar collector from its tested efficiency curve, at a mean fluid temperature, ambient "
         "temperature and irradiance.",
         "–", ResultKind::Number,
         "η = η0 − a1·(Tm − Ta)/G − a2·(Tm − Ta)²/G, the quadratic steady-state efficiency curve on the mean "
         "fluid temperature Tm = (T_in + T_out)/2 of EN ISO 9806:2017 (steady-state test). The curve value is "
         "returned as it is: negative where the losses exceed the absorbed irradiance, and the a2 term keeps its "
         "sign when Tm < Ta (no clamping). Valid for η0 0..1, a1 >= 0, a2 >= 0, G > 0; the curve holds within "
         "the temperature range of the test it was fitted to.",
         {{"eta0", ArgKind::Number, "–", "Peak (zero-loss) efficiency η0, 0..1"},
          {"a1", ArgKind::Number, "W/(m²·K)", "First-order heat loss coefficient, >= 0"},
          {"a2", ArgKind::Number, "W/(m²·K²)", "Second-order heat loss coefficient, >= 0"},
          {"T_mean", ArgKind::Number, "°C", "Mean fluid temperature, (T_in + T_out)/2"},
          {"T_ambient", ArgKind::Number, "°C", "Ambient air temperature"},
          {"irradiance", ArgKind::Number, "W/m²", "Global irradiance on the collector plane, > 0"}},
         "0.78; 3.5; 0.015; 50; 20; 800",
         [](const Args& a) -> Result {
             return coll::efficiency(a.number(0), a.number(1), a.number(2), a.number(3), a.number(4), a.number(5));
         }},
        {"COLL_GAIN", "Collector",
         "Heat delivered by a solar collector from its tested efficiency curve, optionally with an incidence "
         "angle modifier.",
         "W", ResultKind::Number,
         "Q = A·(η0·K·G − a1·(Tm − Ta) − a2·(Tm − Ta)²), i.e. A·G·η with the efficiency curve of EN ISO "
         "9806:2017 (quadratic, on the mean fluid temperature) and η0 scaled by one incidence angle modifier K "
         "for the whole irradiance (split beam and diffuse where they need different modifiers). The raw value: "
         "negative when the collector loses heat. Valid for A >= 0, η0 0..1, a1, a2 >= 0, G >= 0 (G = 0 gives "
         "the loss at night), K 0..2 (above 1 occurs for evacuated tubes at transversal angles; 2 is a "
         "plausibility bound).",
         {{"area", ArgKind::Number, "m²", "Collector reference area of the test (gross or aperture), >= 0"},
          {"eta0", ArgKind::Number, "–", "Peak efficiency η0 on the same area, 0..1"},
          {"a1", ArgKind::Number, "W/(m²·K)", "First-order heat loss coefficient, >= 0"},
          {"a2", ArgKind::Number, "W/(m²·K²)", "Second-order heat loss coefficient, >= 0"},
          {"T_mean", ArgKind::Number, "°C", "Mean fluid temperature, (T_in + T_out)/2"},
          {"T_ambient", ArgKind::Number, "°C", "Ambient air temperature"},
          {"irradiance", ArgKind::Number, "W/m²", "Global irradiance on the collector plane, >= 0"},
          {"iam", ArgKind::OptionalNumber, "–", "Incidence angle modifier K applied to η0, 0..2", 1.0}},
         "2.3; 0.78; 3.5; 0.015; 50; 20; 800; 0.95",
         [](const Args& a) -> Result {
             return coll::gain(a.number(0), a.number(1), a.number(2), a.number(3), a.number(4), a.number(5),
                               a.number(6), a.number(7));
         }},
        {"COLL_IAM", "Collector",
         "Incidence angle modifier of a flat-plate collector from the one-parameter (b0) form.",
         "–", ResultKind::Number,
         "K(θ) = 1 − b0·(1/cosθ − 1), the form of ASHRAE Standard 93 (Duffie & Beckman, Solar Engineering of "
         "Thermal Processes, 4th ed., 2013, §6.17, who write it with b0 negative: their b0 = −0.1 is 0.1 here). "
         "0 past the cut-off cosθ = b0/(1 + b0), where the form reaches 0, and for θ >= 90° (sun behind the "
         "plane). Valid for incidence 0..180°, b0 0..1 (1 already cuts off at 60°); the form describes glazed "
         "flat plates, not evacuated tubes.",
         {{"incidence_deg", ArgKind::Number, "°", "Angle of incidence of the beam on the collector, 0..180"},
          {"b0", ArgKind::Number, "–", "Incidence angle modifier coefficient, 0..1 (about 0.1 for one glass cover)"}},
         "45; 0.1",
         [](const Args& a) -> Result { return coll::incidence_modifier(a.number(0), a.number(1)); }},
        {"COLL_IAM_TABLE", "Collector",
         "Incidence angle modifier interpolated in a measured table (angles and modifiers as in a test report).",
         "–", ResultKind::Number,
         "Monotone piecewise cubic Hermite interpolation (PCHIP: Fritsch & Carlson, SIAM J. Numer. Anal. 17, "
         "1980; interior slopes of Fritsch & Butland, SIAM J. Sci. Stat. Comput. 5, 1984; three-point "
         "shape-preserving end slopes of Moler, Numerical Computing with MATLAB, 2004, §3.4), evaluated with "
         "Boost.Math's cubic_hermite. Chosen because monotone data give a monotone curve and the curve never "
         "leaves the range of neighbouring table values (no overshoot above 1 or below 0), with a continuous "
         "slope; two points give the straight line. The table is completed by the values fixed by definition, "
         "K(0°) = 1 if it does not start at 0° and K(90°) = 0 if it does not reach 90°, so nothing is "
         "extrapolated; above 90° the result is 0. Valid for angles strictly increasing within 0..90, one "
         "modifier per angle, modifiers 0..2, K = 1 at 0° and 0 at 90° when those angles are given, incidence "
         "0..180°.",
         {{"incidence_deg", ArgKind::Number, "°", "Angle of incidence of the beam on the collector, 0..180"},
          {"angles", ArgKind::Range, "°", "Angles of the table, strictly increasing, 0..90"},
          {"modifiers", ArgKind::Range, "–", "Measured modifier at each angle, 0..2, same count and order"}},
         "35; {10; 20; 30; 40; 50; 60; 70; 80}; {1; 0.99; 0.98; 0.96; 0.92; 0.85; 0.72; 0.45}",
         [](const Args& a) -> Result {
             return coll::incidence_modifier_table(a.number(0), a.numbers(1), a.numbers(2));
         }},
        {"COLL_TAU_ALPHA", "Collector",
         "Transmittance–absorptance product (τα) of a cover system over an absorber, from the cover's refractive "
         "index and absorption and the absorber's absorptance.",
         "–", ResultKind::Number,
         "Duffie & Beckman, Solar Engineering of Thermal Processes, 4th ed., 2013, ch. 5: Snell refraction "
         "sinθ2 = sinθ1/n; Fresnel reflectances r⊥ = ((cosθ1 − n·cosθ2)/(cosθ1 + n·cosθ2))², r∥ = ((n·cosθ1 − "
         "cosθ2)/(n·cosθ1 + cosθ2))² (exact at normal incidence, ((n − 1)/(n + 1))²); N covers with multiple "
         "reflections τr = ½·Σ(1 − r)/(1 + (2N − 1)·r) over both polarisations; Bouguer absorption τa = "
         "exp(−N·K·L/cosθ2); τ = τa·τr; (τα) = τ·α/(1 − (1 − α)·ρd) with the diffuse reflectance of the cover "
         "system approximated by its specular value at 60°, ρd = τa(60°)·(1 − τr(60°)) (§5.5). The absorptance "
         "is taken independent of angle. Valid for incidence 0..180° (0 at and beyond 90°), n 1..3, K·L >= 0 "
         "per cover, α 0..1, covers a whole number 0..10 (0: bare absorber, (τα) = α).",
         {{"incidence_deg", ArgKind::Number, "°", "Angle of incidence of the beam on the cover, 0..180"},
          {"refractive_index", ArgKind::Number, "–", "Refractive index of the cover material, 1..3 (glass 1.526)"},
          {"extinction_times_thickness", ArgKind::Number, "–",
           "Extinction coefficient times thickness K·L of one cover, >= 0"},
          {"absorptance", ArgKind::Number, "–", "Solar absorptance of the absorber, 0..1"},
          {"covers", ArgKind::OptionalNumber, "–", "Number of identical covers, a whole number 0..10", 1.0}},
         "30; 1.526; 0.0125; 0.95; 1",
         [](const Args& a) -> Result {
             return coll::tau_alpha(a.number(0), a.number(1), a.number(2), a.number(3), a.number(4));
         }},
        {"COLL_TOP_LOSS", "Collector",
         "Top loss coefficient of a flat-plate collector by Klein's empirical equation.",
         "W/(m²·K)", ResultKind::Number,
         "Klein (1979), as given by Duffie & Beckman, Solar Engineering of Thermal Processes, 4th ed., 2013, "
         "eq. 6.4.9: U_t = {N/[(C/Tp)·((Tp − Ta)/(N + f))^e] + 1/h_w}⁻¹ + σ(Tp + Ta)(Tp² + Ta²)/[(εp + "
         "0.00591·N·h_w)⁻¹ + (2N + f − 1 + 0.133·εp)/εc − N], f = (1 + 0.089·h_w − 0.1166·h_w·εp)(1 + "
         "0.07866·N), C = 520·(1 − 0.000051·β²) (β = 70° for tilts above 70°), e = 0.430·(1 − 100/Tp), T in K; "
         "h_w = max(5, 8.6·V^0.6) W/(m²·K) as CONV_WIND_COEFF with length 1 m. The fit takes the sky at "
         "ambient temperature and a plate-to-cover gap of about 25 mm. Valid (the range of the fit as quoted "
         "with the equation; refused outside): plate 320..420 K, ambient 260..310 K, εp 0.1..0.95, tilt 0..90°, "
         "covers 1..3, wind 0..10 m/s; εc > 0 (fitted for glass, 0.88). Measured against the energy balance "
         "(COLL_TOP_LOSS_EXACT's solution with the sky at ambient, gap 25 mm) on a grid over this range: for wind "
         "up to 3 m/s with εp 0.1 or 0.95, rms 0.09 and at most 0.41 W/(m²·K); over the whole range rms "
         "0.36 W/(m²·K), with differences up to 1.9 W/(m²·K) (26 %) at 10 m/s or with εp = 0.5.",
         {{"T_plate", ArgKind::Number, "°C", "Mean absorber plate temperature, 46.85..146.85 (320..420 K)"},
          {"T_ambient", ArgKind::Number, "°C", "Ambient air temperature, -13.15..36.85 (260..310 K)"},
          {"tilt", ArgKind::Number, "°", "Collector tilt from horizontal, 0..90"},
          {"emissivity_plate", ArgKind::Number, "–", "Long-wave emissivity of the absorber, 0.1..0.95"},
          {"emissivity_cover", ArgKind::Number, "–", "Long-wave emissivity of the covers, above 0 up to 1 (glass 0.88)"},
          {"covers", ArgKind::Number, "–", "Number of covers, 1..3"},
          {"wind_speed", ArgKind::Number, "m/s", "Wind speed over the collector, 0..10"}},
         "100; 10; 45; 0.95; 0.88; 1; 3",
         [](const Args& a) -> Result {
             return coll::top_loss_klein(a.number(0), a.number(1), a.number(2), a.number(3), a.number(4),
                                         a.number(5), a.number(6));
         }},
        {"COLL_TOP_LOSS_EXACT", "Collector",
         "Top loss coefficient of a flat-plate collector from the energy balance of its covers, solved for the "
         "cover temperatures.",
         "W/(m²·K)", ResultKind::Number,
         "U_t = q/(Tp − Ta), q the heat flux through every gap and from the outer cover (Duffie & Beckman, Solar "
         "Engineering of Thermal Processes, 4th ed., 2013, §6.4, the procedure of Example 6.4.1): each gap "
         "q = Nu·k/L·ΔT + σ(T1⁴ − T2⁴)/(1/ε1 + 1/ε2 − 1), Nu by Hollands et al. (J. Heat Transfer 98, 1976, "
         "189–193; NU_TILTED_GAP) at Ra = g·ΔT·L³/(T·ν·a) with dry-air properties at the gap mean temperature "
         "and 101325 Pa (Nu = 1 for heat flowing downwards); outer cover q = h_w·(T_N − Ta) + εc·σ·(T_N⁴ − "
         "T_sky⁴) with h_w as CONV_WIND_COEFF (length 1 m) and T_sky by Swinbank (1963) as RAD_SKY_TEMP. "
         "Solved by Gauss–Seidel sweeps over the covers, each cover temperature bracketed between its "
         "neighbours and found by TOMS 748 (Boost.Math), until no cover moves by more than 1e-10·(Tp − Ta); a "
         "solver failure is an error (Err:523). Valid for T_plate > T_ambient, tilt 0..75° and Ra <= 1e5 in "
         "every gap at the solution (Hollands's range, NU_TILTED_GAP), ambient -40..50 °C (Swinbank's range as "
         "RAD_SKY_TEMP), gap air within the air property range, emissivities 0..1, covers a whole number 1..10, "
         "gap > 0. Edge losses and cover absorption of sunlight are not included.",
         {{"T_plate", ArgKind::Number, "°C", "Mean absorber plate temperature, above T_ambient"},
          {"T_ambient", ArgKind::Number, "°C", "Ambient air temperature"},
          {"tilt", ArgKind::Number, "°", "Collector tilt from horizontal, 0..75 (the gap correlation's range)"},
          {"emissivity_plate", ArgKind::Number, "–", "Long-wave emissivity of the absorber, 0..1"},
          {"emissivity_cover", ArgKind::Number, "–", "Long-wave emissivity of the covers, 0..1 (glass 0.88)"},
          {"covers", ArgKind::Number, "–", "Number of covers, a whole number 1..10"},
          {"wind_speed", ArgKind::Number, "m/s", "Wind speed over the collector, >= 0"},
          {"gap", ArgKind::OptionalNumber, "m", "Spacing of each gap (plate to cover, cover to cover), > 0", 0.025}},
         "100; 10; 45; 0.95; 0.88; 1; 3; 0.025",
         [](const Args& a) -> Result {
             return coll::top_loss_exact(a.number(0), a.number(1), a.number(2), a.number(3), a.number(4),
                                         a.number(5), a.number(6), a.number(7));
         }},
        {"COLL_FIN_FACTOR", "Collector",
         "Collector efficiency factor F′ of a fin-and-tube absorber: the ratio of the actual useful gain to the "
         "gain if the whole plate were at the local fluid temperature.",
         "–", ResultKind::Number,
         "F′ = (1/U_L)/(W·[1/(U_L·(D + (W − D)·F)) + 1/C_b + 1/(π·D_i·h_fi)]), fin efficiency F = tanh(m·(W − "
         "D)/2)/(m·(W − D)/2), m = √(U_L/(k·δ)) (Duffie & Beckman, Solar Engineering of Thermal Processes, 4th "
         "ed., 2013, eqs. 6.5.12, 6.5.13, 6.5.18). Evaluated as 1/(W/(D + (W − D)·F) + W·U_L/C_b + "
         "W·U_L/(π·D_i·h_fi)), so U_L = 0 gives the limit 1. One-dimensional fin, tubes under the plate, "
         "uniform U_L. Omitting bond_conductance means a perfect bond. Valid for W >= D > 0, 0 < D_i <= D, "
         "δ > 0, k > 0, U_L >= 0, h_fi > 0, C_b > 0.",
         {{"tube_spacing", ArgKind::Number, "m", "Distance W between tube centres, >= tube_outer_diameter"},
          {"tube_outer_diameter", ArgKind::Number, "m", "Outer tube diameter D, > 0"},
          {"tube_inner_diameter", ArgKind::Number, "m", "Inner tube diameter D_i, > 0 and <= D"},
          {"plate_thickness", ArgKind::Number, "m", "Absorber plate thickness δ, > 0"},
          {"plate_conductivity", ArgKind::Number, "W/(m·K)", "Thermal conductivity k of the plate, > 0"},
          {"u_loss", ArgKind::Number, "W/(m²·K)", "Overall loss coefficient U_L of the collector, >= 0"},
          {"h_fluid", ArgKind::Number, "W/(m²·K)", "Heat transfer coefficient h_fi inside the tubes, > 0"},
          {"bond_conductance", ArgKind::OptionalNumber, "W/(m·K)",
           "Bond conductance C_b per metre of tube, > 0; omit for a perfect bond", NAN}},
         "0.15; 0.01; 0.008; 0.0005; 385; 8; 300",
         [](const Args& a) -> Result {
             return coll::fin_efficiency_factor(a.number(0), a.number(1), a.number(2), a.number(3), a.number(4),
                                                a.number(5), a.number(6), a.optional_number(7).value_or(HUGE_VAL));
         }},
        {"COLL_HEAT_REMOVAL", "Collector",
         "Heat removal factor F_R of a collector: useful gain relative to the gain if the whole absorber were at "
         "the fluid inlet temperature.",
         "–", ResultKind::Number,
         "F_R = (ṁ·cp/(A·U_L))·(1 − exp(−A·U_L·F′/(ṁ·cp))) (Duffie & Beckman, Solar Engineering of Thermal "
         "Processes, 4th ed., 2013, §6.7), evaluated as F′·(1 − e^(−x))/x with x = A·U_L·F′/(ṁ·cp) through "
         "expm1, so that U_L = 0 or a very large flow gives the limit F′. Valid for ṁ > 0, cp > 0, A > 0, "
         "U_L >= 0, F′ 0..1.",
         {{"mass_flow", ArgKind::Number, "kg/s", "Mass flow through the collector, > 0"},
          {"cp", ArgKind::Number, "J/(kg·K)", "Specific heat of the fluid, > 0"},
          {"area", ArgKind::Number, "m²", "Collector area A, > 0"},
          {"u_loss", ArgKind::Number, "W/(m²·K)", "Overall loss coefficient U_L, >= 0"},
          {"f_prime", ArgKind::Number, "–", "Collector efficiency factor F′, 0..1"}},
         "0.04; 4180; 2; 8; 0.84",
         [](const Args& a) -> Result {
             return coll::heat_removal_factor(a.number(0), a.number(1), a.number(2), a.number(3), a.number(4));
         }},
        {"COLL_USEFUL_GAIN", "Collector",
         "Useful heat gain of a collector from the fluid inlet temperature (Hottel–Whillier–Bliss).",
         "W", ResultKind::Number,
         "Q = A·F_R·(S − U_L·(T_in − Ta)), the Hottel–Whillier–Bliss equation (Duffie & Beckman, Solar "
         "Engineering of Thermal Processes, 4th ed., 2013, §6.7), S the absorbed irradiance (τα)·G. The raw "
         "value is returned, negative when the collector loses heat; the book's '+' (positive part only) "
         "describes a controller that stops the pump, which a spreadsheet applies with MAX(0; …). Valid for "
         "A >= 0, F_R 0..1, S >= 0, U_L >= 0.",
         {{"area", ArgKind::Number, "m²", "Collector area A, >= 0"},
          {"f_r", ArgKind::Number, "–", "Heat removal factor F_R, 0..1"},
          {"absorbed_irradiance", ArgKind::Number, "W/m²", "Absorbed irradiance S per unit area, >= 0"},
          {"u_loss", ArgKind::Number, "W/(m²·K)", "Overall loss coefficient U_L, >= 0"},
          {"T_in", ArgKind::Number, "°C", "Fluid inlet temperature"},
          {"T_ambient", ArgKind::Number, "°C", "Ambient air temperature"}},
         "2; 0.8; 700; 6; 40; 20",
         [](const Args& a) -> Result {
             return coll::useful_gain(a.number(0), a.number(1), a.number(2), a.number(3), a.number(4), a.number(5));
         }},
        {"COLL_OUTLET_TEMP", "Collector",
         "Fluid outlet temperature of a collector from its gain, mass flow and specific heat.",
         "°C", ResultKind::Number,
         "T_out = T_in + Q/(ṁ·cp), steady energy balance of the fluid at constant specific heat (Duffie & "
         "Beckman, Solar Engineering of Thermal Processes, 4th ed., 2013, §6.7). Negative Q cools the fluid. "
         "Valid for ṁ > 0, cp > 0 and a result above absolute zero.",
         {{"T_in", ArgKind::Number, "°C", "Fluid inlet temperature"},
          {"gain", ArgKind::Number, "W", "Useful gain Q of the collector (negative when it loses heat)"},
          {"mass_flow", ArgKind::Number, "kg/s", "Mass flow, > 0"},
          {"cp", ArgKind::Number, "J/(kg·K)", "Specific heat of the fluid, > 0"}},
         "40; 1000; 0.04; 4180",
         [](const Args& a) -> Result {
             return coll::outlet_temperature(a.number(0), a.number(1), a.number(2), a.number(3));
         }},
        {"COLL_STAGNATION_TEMP", "Collector",
         "Stagnation temperature of a collector: the mean fluid temperature at which its efficiency curve "
         "reaches zero (no flow, no heat extracted).",
         "°C", ResultKind::Number,
         "Tm = Ta + x with x the positive root of η0·G − a1·x − a2·x² = 0 (the EN ISO 9806:2017 quadratic "
         "efficiency curve set to zero), evaluated without cancellation as x = 2·η0·G/(a1 + √(a1² + "
         "4·a2·η0·G)), which is η0·G/a1 when a2 = 0. a1 = a2 = 0 is refused (the curve never reaches 0). The "
         "curve is extrapolated well beyond its test range: an estimate from the curve, not a measured "
         "stagnation temperature. Valid for η0 0..1, a1, a2 >= 0 (not both 0), G >= 0.",
         {{"eta0", ArgKind::Number, "–", "Peak efficiency η0, 0..1"},
          {"a1", ArgKind::Number, "W/(m²·K)", "First-order heat loss coefficient, >= 0"},
          {"a2", ArgKind::Number, "W/(m²·K²)", "Second-order heat loss coefficient, >= 0"},
          {"T_ambient", ArgKind::Number, "°C", "Ambient air temperature"},
          {"irradiance", ArgKind::Number, "W/m²", "Global irradiance on the collector plane, >= 0"}},
         "0.78; 3.5; 0.015; 30; 1000",
         [](const Args& a) -> Result {
             return coll::stagnation_temperature(a.number(0), a.number(1), a.number(2), a.number(3), a.number(4));
         }},
    };
}

}  // namespace solarith::catalog
