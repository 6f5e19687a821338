// Dry air: ideal-gas density, Lemmon et al. (2000) ideal-gas cp, Lemmon &
// Jacobsen (2004) viscosity and thermal conductivity. Sources and ranges are
// in properties.hpp.
#include "solarith/properties.hpp"

#include "properties_internal.hpp"
#include "solarith/constants.hpp"
#include "solarith/errors.hpp"

#include <cmath>

namespace solarith::air {
namespace {

// Molar mass of dry air, kg/mol (Lemmon et al. 2000, §2: 0.7812 N₂, 0.0092 Ar, 0.2096 O₂).
constexpr double molar_mass = 28.9586e-3;
// Reducing temperature (maxcondentherm) and density of the air models, K and mol/m³
// (Lemmon et al. 2000 Table 1; Lemmon & Jacobsen 2004 Table I).
constexpr double t_reducing = 132.6312;
constexpr double rho_reducing = 10447.7;
// Pressure at which viscosity and conductivity are given, Pa.
constexpr double p_standard = 101325.0;

constexpr double t_min = -50.0, t_max = 500.0;       // °C
constexpr double p_max = 200e3;  // Pa, AIR_DENSITY

void check_temperature(const char* function, const char* argument, double t_celsius)
{
    if (!(t_celsius >= t_min && t_celsius <= t_max))
        fail_domain(function, argument, t_celsius, "-50..500 °C (dry air)");
}

double molar_density(double t_kelvin, double pressure_pa)
{
    return pressure_pa / (constants::molar_gas_constant * t_kelvin);
}

// cp⁰/R of Lemmon et al. (2000), from their eq. 24 with the Table 13 coefficients:
// α⁰ = ln δ + Σ_{i=1..5} Nᵢ τ^(i−4) + N₆ τ^1.5 + N₇ ln τ + N₈ ln(1 − e^(−N₁₁τ))
//      + N₉ ln(1 − e^(−N₁₂τ)) + N₁₀ ln(2/3 + e^(N₁₃τ)),
// cv⁰/R = −τ² ∂²α⁰/∂τ², cp⁰/R = 1 + cv⁰/R.
double ideal_cp_over_r(double t_kelvin)
{
    constexpr double n[] = {0.605719400e-7, -0.210274769e-4, -0.158860716e-3, -13.841928076, 17.275266575,
                            -0.195363420e-3, 2.490888032, 0.791309509, 0.212236768, -0.197938904,
                            25.36365, 16.90741, 87.31279};
    const double tau = t_reducing / t_kelvin;
    // τ²·∂²/∂τ² of the power terms Nᵢ τ^(i−4) (i = 1..3; i = 4, 5 give 0) and N₆ τ^1.5.
    const double powers = 12 * n[0] / (tau * tau * tau) + 6 * n[1] / (tau * tau) + 2 * n[2] / tau
                          + 0.75 * n[5] * tau * std::sqrt(tau);
    // −τ²·∂²/∂τ² of N ln(1 − e^(−aτ)) is N (aτ)² e^(aτ)/(e^(aτ) − 1)² (Planck–Einstein term).
    auto einstein = [tau](double a) {
        const double x = a * tau, e = std::exp(x);
        return x * x * e / ((e - 1) * (e - 1));
    };
    // −τ²·∂²/∂τ² of N ln(2/3 + e^(cτ)) is −N (cτ)² (2/3) e^(cτ)/(2/3 + e^(cτ))².
    const double x = n[12] * tau;
    // e^(cτ) reaches 1e253 at −50 °C; written with e^(−cτ) it cannot overflow.
    const double em = std::exp(-x);
    const double third_term = x * x * (2.0 / 3.0) * em / ((2.0 / 3.0 * em + 1) * (2.0 / 3.0 * em + 1));
    const double cv_over_r = -powers + n[6] + n[7] * einstein(n[10]) + n[8] * einstein(n[11]) - n[9] * third_term;
    return 1 + cv_over_r;
}

// Reduced dilute-gas viscosity of Lemmon & Jacobsen (2004), eqs. 2 and 3, µPa·s.
double dilute_viscosity_micro(double t_kelvin)
{
    constexpr double b[] = {0.431, -0.4623, 0.08406, 0.005341, -0.00331};
    constexpr double sigma_nm = 0.360, epsilon_over_k = 103.3;
    const double ln_t = std::log(t_kelvin / epsilon_over_k);
    const double omega = std::exp(b[0] + ln_t * (b[1] + ln_t * (b[2] + ln_t * (b[3] + ln_t * b[4]))));
    return 0.0266958 * std::sqrt(molar_mass * 1e3 * t_kelvin) / (sigma_nm * sigma_nm * omega);
}

struct ResidualTerm {
    double n, t;
    int d, l;  // γ = 1 where l > 0, else 0
};

double residual(const ResidualTerm* terms, int count, double tau, double delta)
{
    double sum = 0;
    for (int i = 0; i < count; ++i) {
        const auto& term = terms[i];
        const double decay = term.l > 0 ? std::exp(-std::pow(delta, term.l)) : 1.0;
        sum += term.n * std::pow(tau, term.t) * std::pow(delta, term.d) * decay;
    }
    return sum;
}

// Viscosity at 101325 Pa, Pa·s: η = η⁰(T) + ηʳ(τ, δ) (Lemmon & Jacobsen 2004, eqs. 1–4, Table III for air).
double viscosity_at_standard_pressure(double t_kelvin)
{
    static constexpr ResidualTerm terms[] = {
        {10.72, 0.2, 1, 0}, {1.122, 0.05, 4, 0}, {0.002019, 2.4, 9, 0}, {-8.876, 0.6, 1, 1}, {-0.02916, 3.6, 8, 1},
    };
    const double tau = t_reducing / t_kelvin, delta = molar_density(t_kelvin, p_standard) / rho_reducing;
    return (dilute_viscosity_micro(t_kelvin) + residual(terms, 5, tau, delta)) * 1e-6;
}

// Thermal conductivity at 101325 Pa, W/(m·K): λ = λ⁰(T) + λʳ(τ, δ), no critical
// enhancement (Lemmon & Jacobsen 2004, eqs. 4–6, Table IV for air).
double conductivity_at_standard_pressure(double t_kelvin)
{
    static constexpr ResidualTerm terms[] = {
        {8.743, 0.1, 1, 0},  {14.76, 0.0, 2, 0},  {-16.62, 0.5, 3, 2},
        {3.793, 2.7, 7, 2},  {-6.142, 0.3, 7, 2}, {-0.3778, 1.3, 11, 2},
    };
    const double tau = t_reducing / t_kelvin, delta = molar_density(t_kelvin, p_standard) / rho_reducing;
    const double dilute = 1.308 * dilute_viscosity_micro(t_kelvin) + 1.405 * std::pow(tau, -1.1)
                          - 1.036 * std::pow(tau, -0.3);
    return (dilute + residual(terms, 6, tau, delta)) * 1e-3;
}

double specific_cp(double t_kelvin)
{
    return ideal_cp_over_r(t_kelvin) * constants::molar_gas_constant / molar_mass;
}

}  // namespace

double density(double t_celsius, double pressure_pa)
{
    constexpr const char* fn = "AIR_DENSITY";
    check_temperature(fn, "T", t_celsius);
    if (!(pressure_pa > 0 && pressure_pa <= p_max))
        fail_domain(fn, "pressure", pressure_pa,
                    "0 < pressure <= 200000 Pa (where dry air is an ideal gas to 0.32 %)");
    return molar_density(constants::kelvin(t_celsius), pressure_pa) * molar_mass;
}

double cp(double t_celsius)
{
    check_temperature("AIR_CP", "T", t_celsius);
    return specific_cp(constants::kelvin(t_celsius));
}

double viscosity(double t_celsius)
{
    check_temperature("AIR_VISCOSITY", "T", t_celsius);
    return viscosity_at_standard_pressure(constants::kelvin(t_celsius));
}

double conductivity(double t_celsius)
{
    check_temperature("AIR_CONDUCTIVITY", "T", t_celsius);
    return conductivity_at_standard_pressure(constants::kelvin(t_celsius));
}

double prandtl(double t_celsius)
{
    check_temperature("AIR_PRANDTL", "T", t_celsius);
    const double t = constants::kelvin(t_celsius);
    return viscosity_at_standard_pressure(t) * specific_cp(t) / conductivity_at_standard_pressure(t);
}

fluids::Properties properties(const char* function, double t_celsius)
{
    check_temperature(function, "fluid temperature", t_celsius);
    const double t = constants::kelvin(t_celsius);
    return {molar_density(t, p_standard) * molar_mass, specific_cp(t), viscosity_at_standard_pressure(t),
            conductivity_at_standard_pressure(t), 1 / t};
}

}  // namespace solarith::air
