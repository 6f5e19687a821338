// Liquid water: IAPWS-IF97 regions 1, 2 and 4, IAPWS 2008 viscosity, IAPWS
// 2011 thermal conductivity. Sources and ranges are in properties.hpp.
#include "solarith/properties.hpp"

#include "properties_internal.hpp"

#include "solarith/constants.hpp"
#include "solarith/errors.hpp"

#include <cmath>
#include <string>

namespace solarith::water {
namespace {

// --- IAPWS-IF97 (IAPWS R7-97(2012)) ------------------------------------------

// Specific gas constant of the formulation, J/(kg·K) (IF97 eq. 1).
constexpr double r_if97 = 461.526;

struct Term {
    int i;
    int j;
    double n;
};

// Region 1, IF97 Table 2; p* = 16.53 MPa, T* = 1386 K (eq. 7).
constexpr Term region1_terms[] = {
    {0, -2, 0.14632971213167},     {0, -1, -0.84548187169114},    {0, 0, -0.37563603672040e1},
    {0, 1, 0.33855169168385e1},    {0, 2, -0.95791963387872},     {0, 3, 0.15772038513228},
    {0, 4, -0.16616417199501e-1},  {0, 5, 0.81214629983568e-3},   {1, -9, 0.28319080123804e-3},
    {1, -7, -0.60706301565874e-3}, {1, -1, -0.18990068218419e-1}, {1, 0, -0.32529748770505e-1},
    {1, 1, -0.21841717175414e-1},  {1, 3, -0.52838357969930e-4},  {2, -3, -0.47184321073267e-3},
    {2, 0, -0.30001780793026e-3},  {2, 1, 0.47661393906987e-4},   {2, 3, -0.44141845330846e-5},
    {2, 17, -0.72694996297594e-15}, {3, -4, -0.31679644845054e-4}, {3, 0, -0.28270797985312e-5},
    {3, 6, -0.85205128120103e-9},  {4, -5, -0.22425281908000e-5}, {4, -2, -0.65171222895601e-6},
    {4, 10, -0.14341729937924e-12}, {5, -8, -0.40516996860117e-6}, {8, -11, -0.12734301741641e-8},
    {8, -6, -0.17424871230634e-9}, {21, -29, -0.68762131295531e-18}, {23, -31, 0.14478307828521e-19},
    {29, -38, 0.26335781662795e-22}, {30, -39, -0.11947622640071e-22}, {31, -40, 0.18228094581404e-23},
    {32, -41, -0.93537087292458e-25},
};

// Region 2, ideal-gas part, IF97 Table 10 (J⁰_i, n⁰_i).
struct IdealTerm {
    int j;
    double n;
};
constexpr IdealTerm region2_ideal_terms[] = {
    {0, -0.96927686500217e1},  {1, 0.10086655968018e2},  {-5, -0.56087911283020e-2},
    {-4, 0.71452738081455e-1}, {-3, -0.40710498223928},  {-2, 0.14240819171444e1},
    {-1, -0.43839511319450e1}, {2, -0.28408632460772},   {3, 0.21268463753307e-1},
};

// Region 2, residual part, IF97 Table 11; p* = 1 MPa, T* = 540 K (eq. 15).
constexpr Term region2_residual_terms[] = {
    {1, 0, -0.17731742473213e-2},   {1, 1, -0.17834862292358e-1},   {1, 2, -0.45996013696365e-1},
    {1, 3, -0.57581259083432e-1},   {1, 6, -0.50325278727930e-1},   {2, 1, -0.33032641670203e-4},
    {2, 2, -0.18948987516315e-3},   {2, 4, -0.39392777243355e-2},   {2, 7, -0.43797295650573e-1},
    {2, 36, -0.26674547914087e-4},  {3, 0, 0.20481737692309e-7},    {3, 1, 0.43870667284435e-6},
    {3, 3, -0.32277677238570e-4},   {3, 6, -0.15033924542148e-2},   {3, 35, -0.40668253562649e-1},
    {4, 1, -0.78847309559367e-9},   {4, 2, 0.12790717852285e-7},    {4, 3, 0.48225372718507e-6},
    {5, 7, 0.22922076337661e-5},    {6, 3, -0.16714766451061e-10},  {6, 16, -0.21171472321355e-2},
    {6, 35, -0.23895741934104e2},   {7, 0, -0.59059564324270e-17},  {7, 11, -0.12621808899101e-5},
    {7, 25, -0.38946842435739e-1},  {8, 8, 0.11256211360459e-10},   {8, 36, -0.82311340897998e1},
    {9, 13, 0.19809712802088e-7},   {10, 4, 0.10406965210174e-18},  {10, 10, -0.10234747095929e-12},
    {10, 14, -0.10018179379511e-8}, {16, 29, -0.80882908646985e-10}, {16, 50, 0.10693031879409},
    {18, 57, -0.33662250574171},    {20, 20, 0.89185845355421e-24}, {20, 35, 0.30629316876232e-12},
    {20, 48, -0.42002467698208e-5}, {21, 21, -0.59056029685639e-25}, {22, 53, 0.37826947613457e-5},
    {23, 39, -0.12768608934681e-14}, {24, 26, 0.73087610595061e-28}, {24, 40, 0.55414715350778e-16},
    {24, 58, -0.94369707241210e-6},
};

// Region 4 (saturation line), IF97 Table 34.
constexpr double n4[] = {0.11670521452767e4,  -0.72421316703206e6, -0.17073846940092e2, 0.12020824702470e5,
                         -0.32325550322333e7, 0.14915108613530e2,  -0.48232657361591e4, 0.40511340542057e6,
                         -0.23855557567849,   0.65017534844798e3};

// The dimensionless Gibbs free energy and the derivatives the properties need.
struct Gibbs {
    double g = 0, g_p = 0, g_pp = 0, g_t = 0, g_tt = 0, g_pt = 0;
};

// x^k for a small integer exponent, negative ones included, by binary
// powering: a handful of multiplications instead of a std::pow call (the IF97
// sums need a few hundred powers per property), within a few ulp of x^k.
double power(double x, int k)
{
    unsigned n = static_cast<unsigned>(k < 0 ? -k : k);
    double result = 1, base = x;
    for (; n != 0; n >>= 1) {
        if (n & 1u)
            result *= base;
        base *= base;
    }
    return k < 0 ? 1 / result : result;
}

Gibbs region1_gibbs(double pi, double tau)
{
    const double a = 7.1 - pi;
    const double b = tau - 1.222;
    Gibbs g;
    for (const Term& t : region1_terms) {
        const double ai = power(a, t.i), bj = power(b, t.j);
        g.g += t.n * ai * bj;
        g.g_p -= t.n * t.i * power(a, t.i - 1) * bj;
        g.g_pp += t.n * t.i * (t.i - 1) * power(a, t.i - 2) * bj;
        g.g_t += t.n * ai * t.j * power(b, t.j - 1);
        g.g_tt += t.n * ai * t.j * (t.j - 1) * power(b, t.j - 2);
        g.g_pt -= t.n * t.i * power(a, t.i - 1) * t.j * power(b, t.j - 1);
    }
    return g;
}

// Region 2: ideal-gas part plus residual part, kept apart because the speed
// of sound formula (IF97 Table 12) uses the residual part alone.
struct Gibbs2 {
    Gibbs ideal, residual;
};

Gibbs2 region2_gibbs(double pi, double tau)
{
    Gibbs2 g;
    g.ideal.g = std::log(pi);
    g.ideal.g_p = 1 / pi;
    g.ideal.g_pp = -1 / (pi * pi);
    for (const IdealTerm& t : region2_ideal_terms) {
        g.ideal.g += t.n * power(tau, t.j);
        g.ideal.g_t += t.n * t.j * power(tau, t.j - 1);
        g.ideal.g_tt += t.n * t.j * (t.j - 1) * power(tau, t.j - 2);
    }
    const double b = tau - 0.5;
    for (const Term& t : region2_residual_terms) {
        const double pii = power(pi, t.i), bj = power(b, t.j);
        g.residual.g += t.n * pii * bj;
        g.residual.g_p += t.n * t.i * power(pi, t.i - 1) * bj;
        g.residual.g_pp += t.n * t.i * (t.i - 1) * power(pi, t.i - 2) * bj;
        g.residual.g_t += t.n * pii * t.j * power(b, t.j - 1);
        g.residual.g_tt += t.n * pii * t.j * (t.j - 1) * power(b, t.j - 2);
        g.residual.g_pt += t.n * t.i * power(pi, t.i - 1) * t.j * power(b, t.j - 1);
    }
    return g;
}

// --- Range checks -----------------------------------------------------------

constexpr double t_min = 0.0, t_max = 200.0;  // °C, the liquid range Solarith offers
constexpr double p_max = 100e6;               // Pa, upper bound of IF97 region 1

struct Names {
    const char* function;
    const char* temperature;
    const char* pressure;
};

void check_temperature(const Names& names, double t_celsius)
{
    if (!(t_celsius >= t_min && t_celsius <= t_max))
        fail_domain(names.function, names.temperature, t_celsius, "0..200 °C (liquid water, IAPWS-IF97 region 1)");
}

// The pressure must keep the water liquid: at or above the saturation
// pressure, and within region 1 (at most 100 MPa). A saturation pressure
// computed elsewhere (another program, a rounded cell) may lie a few units
// in the last digit below this one: 1e-9 below p_s still counts as liquid
// (it changes no property by more than 1e-12).
void check_pressure(const Names& names, double t_celsius, double pressure_pa)
{
    if (!std::isfinite(pressure_pa))
        fail_domain(names.function, names.pressure, pressure_pa, "the finite numbers");
    const double p_sat = formulation::saturation_pressure(constants::kelvin(t_celsius));
    if (!(pressure_pa >= p_sat * (1 - 1e-9) && pressure_pa <= p_max))
        fail_domain(names.function, names.pressure, pressure_pa,
                    format_number(p_sat) + "..1e+08 Pa: the saturation pressure at " + format_number(t_celsius)
                        + " °C (below it the water is steam) up to 100 MPa (IAPWS-IF97 region 1)");
}

formulation::State liquid_state(const Names& names, double t_celsius, double pressure_pa)
{
    check_temperature(names, t_celsius);
    check_pressure(names, t_celsius, pressure_pa);
    return formulation::region1(constants::kelvin(t_celsius), pressure_pa);
}

double liquid_viscosity(const Names& names, double t_celsius, double pressure_pa)
{
    const auto state = liquid_state(names, t_celsius, pressure_pa);
    return formulation::viscosity(constants::kelvin(t_celsius), 1 / state.v);
}

double liquid_conductivity(const Names& names, double t_celsius, double pressure_pa)
{
    const auto state = liquid_state(names, t_celsius, pressure_pa);
    return formulation::conductivity(constants::kelvin(t_celsius), 1 / state.v);
}

// Saturation pressure at 0 and 200 °C, the ends of WATER_SAT_TEMP's range.
double p_sat_low()
{
    static const double p = formulation::saturation_pressure(constants::kelvin(t_min));
    return p;
}
double p_sat_high()
{
    static const double p = formulation::saturation_pressure(constants::kelvin(t_max));
    return p;
}

}  // namespace

// --- The formulations, without range checks -----------------------------------

namespace formulation {

State region1(double t_kelvin, double p_pa)
{
    const double pi = p_pa / 16.53e6, tau = 1386.0 / t_kelvin;
    const Gibbs g = region1_gibbs(pi, tau);
    const double rt = r_if97 * t_kelvin;
    State s;
    s.v = pi * g.g_p * rt / p_pa;
    s.h = tau * g.g_t * rt;
    s.u = rt * (tau * g.g_t - pi * g.g_p);
    s.s = r_if97 * (tau * g.g_t - g.g);
    s.cp = -r_if97 * tau * tau * g.g_tt;
    const double x = g.g_p - tau * g.g_pt;
    s.w = std::sqrt(rt * g.g_p * g.g_p / (x * x / (tau * tau * g.g_tt) - g.g_pp));
    s.expansion = (1 - tau * g.g_pt / g.g_p) / t_kelvin;
    return s;
}

State region2(double t_kelvin, double p_pa)
{
    const double pi = p_pa / 1e6, tau = 540.0 / t_kelvin;
    const Gibbs2 g = region2_gibbs(pi, tau);
    const Gibbs& r = g.residual;
    const double g_p = g.ideal.g_p + r.g_p, g_t = g.ideal.g_t + r.g_t, g_tt = g.ideal.g_tt + r.g_tt;
    const double rt = r_if97 * t_kelvin;
    State s;
    s.v = pi * g_p * rt / p_pa;
    s.h = tau * g_t * rt;
    s.u = rt * (tau * g_t - pi * g_p);
    s.s = r_if97 * (tau * g_t - (g.ideal.g + r.g));
    s.cp = -r_if97 * tau * tau * g_tt;
    const double y = 1 + pi * r.g_p - tau * pi * r.g_pt;
    s.w = std::sqrt(rt * (1 + 2 * pi * r.g_p + pi * pi * r.g_p * r.g_p)
                    / (1 - pi * pi * r.g_pp + y * y / (tau * tau * g_tt)));
    s.expansion = (1 + pi * r.g_p - tau * pi * r.g_pt) / (1 + pi * r.g_p) / t_kelvin;
    return s;
}

double saturation_pressure(double t_kelvin)
{
    const double theta = t_kelvin + n4[8] / (t_kelvin - n4[9]);
    const double a = theta * theta + n4[0] * theta + n4[1];
    const double b = n4[2] * theta * theta + n4[3] * theta + n4[4];
    const double c = n4[5] * theta * theta + n4[6] * theta + n4[7];
    const double root = 2 * c / (-b + std::sqrt(b * b - 4 * a * c));
    return root * root * root * root * 1e6;
}

double saturation_temperature(double p_pa)
{
    const double beta = std::pow(p_pa / 1e6, 0.25);
    const double e = beta * beta + n4[2] * beta + n4[5];
    const double f = n4[0] * beta * beta + n4[3] * beta + n4[6];
    const double g = n4[1] * beta * beta + n4[4] * beta + n4[7];
    const double d = 2 * g / (-f - std::sqrt(f * f - 4 * e * g));
    const double sum = n4[9] + d;
    return (sum - std::sqrt(sum * sum - 4 * (n4[8] + n4[9] * d))) / 2;
}

// IAPWS R12-08, eqs. 11 and 12, Tables 1 and 2; T* = 647.096 K, ρ* = 322 kg/m³, μ* = 1 µPa·s.
double viscosity(double t_kelvin, double density)
{
    static constexpr double h0[] = {1.67752, 2.20462, 0.6366564, -0.241605};
    // h1[i][j]: (1/T̄ − 1)^i (ρ̄ − 1)^j
    static constexpr double h1[6][7] = {
        {5.20094e-1, 2.22531e-1, -2.81378e-1, 1.61913e-1, -3.25372e-2, 0, 0},
        {8.50895e-2, 9.99115e-1, -9.06851e-1, 2.57399e-1, 0, 0, 0},
        {-1.08374, 1.88797, -7.72479e-1, 0, 0, 0, 0},
        {-2.89555e-1, 1.26613, -4.89837e-1, 0, 6.98452e-2, 0, -4.35673e-3},
        {0, 0, -2.57040e-1, 0, 0, 8.72102e-3, 0},
        {0, 1.20573e-1, 0, 0, 0, 0, -5.93264e-4},
    };
    const double t = t_kelvin / 647.096, rho = density / 322.0;
    double sum0 = 0;
    for (int i = 0; i < 4; ++i)
        sum0 += h0[i] / power(t, i);
    const double mu0 = 100 * std::sqrt(t) / sum0;
    double sum1 = 0;
    for (int i = 0; i < 6; ++i) {
        double inner = 0;
        for (int j = 0; j < 7; ++j)
            inner += h1[i][j] * power(rho - 1, j);
        sum1 += power(1 / t - 1, i) * inner;
    }
    const double mu1 = std::exp(rho * sum1);
    return mu0 * mu1 * 1e-6;
}

// IAPWS R15-11, eqs. 16 and 17, Tables 1 and 2; T* = 647.096 K, ρ* = 322 kg/m³, λ* = 1 mW/(m·K).
double conductivity(double t_kelvin, double density)
{
    static constexpr double l0[] = {2.443221e-3, 1.323095e-2, 6.770357e-3, -3.454586e-3, 4.096266e-4};
    static constexpr double l1[5][6] = {
        {1.60397357, -0.646013523, 0.111443906, 0.102997357, -0.0504123634, 0.00609859258},
        {2.33771842, -2.78843778, 1.53616167, -0.463045512, 0.0832827019, -0.00719201245},
        {2.19650529, -4.54580785, 3.55777244, -1.40944978, 0.275418278, -0.0205938816},
        {-1.21051378, 1.60812989, -0.621178141, 0.0716373224, 0, 0},
        {-2.7203370, 4.57586331, -3.18369245, 1.1168348, -0.19268305, 0.012913842},
    };
    const double t = t_kelvin / 647.096, rho = density / 322.0;
    double sum0 = 0;
    for (int k = 0; k < 5; ++k)
        sum0 += l0[k] / power(t, k);
    const double lambda0 = std::sqrt(t) / sum0;
    double sum1 = 0;
    for (int i = 0; i < 5; ++i) {
        double inner = 0;
        for (int j = 0; j < 6; ++j)
            inner += l1[i][j] * power(rho - 1, j);
        sum1 += power(1 / t - 1, i) * inner;
    }
    const double lambda1 = std::exp(rho * sum1);
    return lambda0 * lambda1 * 1e-3;
}

}  // namespace formulation

// --- Liquid water as the spreadsheet functions see it --------------------------

double default_pressure(double t_celsius)
{
    return default_pressure("WATER_DENSITY", t_celsius);
}

double default_pressure(const char* function, double t_celsius)
{
    check_temperature({function, "T", "pressure"}, t_celsius);
    return std::fmax(101325.0, formulation::saturation_pressure(constants::kelvin(t_celsius)));
}

double density(double t_celsius, double pressure_pa)
{
    return 1 / liquid_state({"WATER_DENSITY", "T", "pressure"}, t_celsius, pressure_pa).v;
}

double cp(double t_celsius, double pressure_pa)
{
    return liquid_state({"WATER_CP", "T", "pressure"}, t_celsius, pressure_pa).cp;
}

double viscosity(double t_celsius, double pressure_pa)
{
    return liquid_viscosity({"WATER_VISCOSITY", "T", "pressure"}, t_celsius, pressure_pa);
}

double conductivity(double t_celsius, double pressure_pa)
{
    return liquid_conductivity({"WATER_CONDUCTIVITY", "T", "pressure"}, t_celsius, pressure_pa);
}

double prandtl(double t_celsius, double pressure_pa)
{
    const Names names{"WATER_PRANDTL", "T", "pressure"};
    const double cp = liquid_state(names, t_celsius, pressure_pa).cp;
    return liquid_viscosity(names, t_celsius, pressure_pa) * cp
           / liquid_conductivity(names, t_celsius, pressure_pa);
}

double expansion(double t_celsius, double pressure_pa)
{
    return liquid_state({"water expansion coefficient", "T", "pressure"}, t_celsius, pressure_pa).expansion;
}

double saturation_pressure(double t_celsius)
{
    check_temperature({"WATER_SAT_PRESSURE", "T", ""}, t_celsius);
    return formulation::saturation_pressure(constants::kelvin(t_celsius));
}

double saturation_temperature(double pressure_pa)
{
    if (!(pressure_pa >= p_sat_low() && pressure_pa <= p_sat_high()))
        fail_domain("WATER_SAT_TEMP", "pressure", pressure_pa,
                    format_number(p_sat_low()) + ".." + format_number(p_sat_high())
                        + " Pa (the saturation pressures of 0 and 200 °C, IAPWS-IF97 region 4)");
    // Rounding in the backward equation may put the ends a hair outside 0..200 °C.
    const double t = formulation::saturation_temperature(pressure_pa) - constants::zero_celsius_in_kelvin;
    return std::fmin(std::fmax(t, t_min), t_max);
}

double latent_heat(double t_celsius)
{
    check_temperature({"WATER_LATENT_HEAT", "T", ""}, t_celsius);
    const double t = constants::kelvin(t_celsius);
    const double p_sat = formulation::saturation_pressure(t);
    return formulation::region2(t, p_sat).h - formulation::region1(t, p_sat).h;
}

fluids::Properties liquid_properties(const char* function, double t_celsius)
{
    const Names names{function, "fluid temperature", "pressure"};
    check_temperature(names, t_celsius);
    const double p = std::fmax(101325.0, formulation::saturation_pressure(constants::kelvin(t_celsius)));
    const auto state = liquid_state(names, t_celsius, p);
    const double t = constants::kelvin(t_celsius), rho = 1 / state.v;
    return {rho, state.cp, formulation::viscosity(t, rho), formulation::conductivity(t, rho), state.expansion};
}

}  // namespace solarith::water
