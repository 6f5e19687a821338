// ε–NTU effectiveness of heat exchangers and the collector–heat-exchanger
// factor; formulas and sources in sizing.hpp.
#include "solarith/sizing.hpp"

#include "solarith/errors.hpp"

#include <boost/math/special_functions/gamma.hpp>

#include <algorithm>
#include <cctype>
#include <cmath>
#include <cstddef>
#include <vector>

namespace solarith::sizing {

namespace {

constexpr const char* hx_effectiveness_name = "HX_EFFECTIVENESS";
constexpr const char* hx_penalty_name = "HX_COLLECTOR_PENALTY";

// Largest NTU the crossflow series is summed for: it needs about
// NTU + 12·√NTU terms.
constexpr double crossflow_ntu_limit = 1e4;

// The series is cut where the remainder is proved below this share of the sum.
constexpr double crossflow_tolerance = 1e-18;

std::string lower_case(const std::string& text)
{
    std::string out;
    for (unsigned char c : text)
        out += static_cast<char>(std::tolower(c));
    return out;
}

// (1 − e^(−a))/a, 1 at a = 0.
double one_minus_exp_over(double a)
{
    return a > 0 ? -std::expm1(-a) / a : 1.0;
}

double counterflow(double ntu, double cr)
{
    const double g = ntu * one_minus_exp_over(ntu * (1 - cr));  // (1 − e^(−a))/(1 − Cr), a = NTU(1 − Cr)
    return g / (1 + cr * g);
}

double parallel_flow(double ntu, double cr)
{
    return -std::expm1(-ntu * (1 + cr)) / (1 + cr);
}

double shell_and_tube(double ntu, double cr)
{
    const double s = std::sqrt(1 + cr * cr);
    const double t = std::tanh(ntu * s / 2);  // 1/coth(NTU·s/2) = (1 − e^(−NTU·s))/(1 + e^(−NTU·s))
    return 2 * t / ((1 + cr) * t + s);
}

// The Poisson probability p(m) = e^(−z)·z^m/m!, computed through logarithms.
double poisson_probability(std::size_t m, double z)
{
    const double md = static_cast<double>(m);
    return std::exp(-z + md * std::log(z) - boost::math::lgamma(md + 1));
}

// The index n from which the terms P(m+1, z), m > n, of one factor of the
// series add up to less than crossflow_tolerance·P(1, z). For n + 3 > z,
//   Σ_{m>n} P(m+1, z) <= P(n+2, z)/(1 − r) <= p(n+2)/(1 − r)²,  r = z/(n+3),
// because P(k+1, z) <= P(k, z)·z/(k+1) and p(k+1) = p(k)·z/(k+1).
std::size_t last_significant_index(double z)
{
    const double log_limit = std::log(crossflow_tolerance) + std::log(-std::expm1(-z));
    auto n = static_cast<std::size_t>(std::max(0.0, std::floor(z) - 2));  // n + 3 > z from here on
    for (;; ++n) {
        const double nd = static_cast<double>(n);
        const double log_bound = -z + (nd + 2) * std::log(z) - boost::math::lgamma(nd + 3)
                                 - 2 * std::log1p(-z / (nd + 3));
        if (log_bound <= log_limit)
            return n;
    }
}

// The tails of the Poisson distribution of mean z, for n = 0..top:
//   lower[n] = P(n+1, z) = Σ_{m>n} p(m)   (regularised lower incomplete gamma)
//   upper[n] = Q(n+1, z) = Σ_{m<=n} p(m)  (regularised upper incomplete gamma).
// Each is summed in the direction in which its partial sums grow, P downward
// from P(top+1) and Q upward from Q(n_low+1), both of those by Boost.Math,
// so that only positive terms are added; where one of them exceeds the
// other it is replaced by 1 minus the other, which is then the accurate one.
struct PoissonTails {
    std::vector<double> lower;
    std::vector<double> upper;
};

PoissonTails poisson_tails(double z, std::size_t top)
{
    PoissonTails t{std::vector<double>(top + 1), std::vector<double>(top + 1, 0.0)};
    t.lower[top] = boost::math::gamma_p(static_cast<double>(top + 1), z);
    double p = poisson_probability(top, z);
    for (std::size_t n = top; n-- > 0;) {
        t.lower[n] = t.lower[n + 1] + p;             // P(n+1) = P(n+2) + p(n+1)
        p *= static_cast<double>(n + 1) / z;         // p(n) = p(n+1)·(n+1)/z
    }
    // Below z − 20·√z (for z >= 500) Q(n+1, z) < e^(−200): left at 0.
    const double low = z < 500 ? 0.0 : std::floor(z - 20 * std::sqrt(z));
    const std::size_t n_low = std::min(top, static_cast<std::size_t>(low));
    t.upper[n_low] = boost::math::gamma_q(static_cast<double>(n_low + 1), z);
    p = poisson_probability(n_low + 1, z);
    for (std::size_t n = n_low + 1; n <= top; ++n) {
        t.upper[n] = t.upper[n - 1] + p;             // Q(n+1) = Q(n) + p(n)
        p *= z / static_cast<double>(n + 1);         // p(n+1) = p(n)·z/(n+1)
    }
    for (std::size_t n = 0; n <= top; ++n) {
        if (t.upper[n] < t.lower[n])
            t.lower[n] = 1 - t.upper[n];
        else
            t.upper[n] = 1 - t.lower[n];
    }
    return t;
}

// Neumaier's compensated sum: the series adds thousands of terms near 1.
class CompensatedSum {
public:
    void add(double term)
    {
        const double next = sum_ + term;
        correction_ += std::abs(sum_) >= std::abs(term) ? (sum_ - next) + term : (term - next) + sum_;
        sum_ = next;
    }
    double value() const { return sum_ + correction_; }

private:
    double sum_ = 0;
    double correction_ = 0;
};

}  // namespace

Arrangement arrangement_named(const char* function, const std::string& name)
{
    const std::string key = lower_case(name);
    if (key == "counterflow")
        return Arrangement::counterflow;
    if (key == "parallel")
        return Arrangement::parallel;
    if (key == "crossflow")
        return Arrangement::crossflow_unmixed;
    if (key == "shell-and-tube")
        return Arrangement::shell_and_tube;
    fail_domain(function, "arrangement = \"" + name
                              + "\" is not one of \"counterflow\", \"parallel\", \"crossflow\", \"shell-and-tube\"");
}

double crossflow_unmixed_effectiveness(double ntu, double capacity_ratio)
{
    check::non_negative(hx_effectiveness_name, "ntu", ntu);
    if (ntu > crossflow_ntu_limit)
        fail_domain(hx_effectiveness_name, "ntu", ntu,
                    "0..10000 for \"crossflow\" (the series is summed up to NTU = 10000)");
    check::fraction(hx_effectiveness_name, "capacity_ratio", capacity_ratio);
    const double x = ntu;
    const double y = capacity_ratio * ntu;
    // Cr·NTU this small leaves 1 − e^(−NTU) exact to double precision: the
    // first correction is −(Cr·NTU/2)·NTU·e^(−NTU), below 1e-17 relative.
    if (!(y > 1e-17))
        return -std::expm1(-x);
    // ε = Σ P(n+1, x)·P(n+1, y)/y, and since Σ_{n>=0} P(n+1, y) = y (the mean
    // of the Poisson distribution), also 1 − ε = Σ Q(n+1, x)·P(n+1, y)/y: two
    // sums of positive terms. The first is accurate where ε is small, the
    // second where ε is near 1. Both stop at the index past which the P(n+1, y)
    // add up to less than 1e-18·P(1, y); the other factor being at most P(1, x)
    // in the first and 1 in the second, the remainders are below 1e-18·ε and
    // 1e-18 respectively.
    const std::size_t top = last_significant_index(y);
    const PoissonTails tx = poisson_tails(x, top);
    const PoissonTails ty = poisson_tails(y, top);
    CompensatedSum transferred;
    CompensatedSum missed;
    for (std::size_t n = top + 1; n-- > 0;) {  // smallest terms first
        transferred.add(tx.lower[n] * ty.lower[n]);
        missed.add(tx.upper[n] * ty.lower[n]);
    }
    const double eps = transferred.value() / y;
    return eps <= 0.5 ? eps : 1 - missed.value() / y;
}

double effectiveness(double ntu, double capacity_ratio, Arrangement arrangement)
{
    check::non_negative(hx_effectiveness_name, "ntu", ntu);
    check::fraction(hx_effectiveness_name, "capacity_ratio", capacity_ratio);
    switch (arrangement) {
    case Arrangement::counterflow: return counterflow(ntu, capacity_ratio);
    case Arrangement::parallel: return parallel_flow(ntu, capacity_ratio);
    case Arrangement::shell_and_tube: return shell_and_tube(ntu, capacity_ratio);
    case Arrangement::crossflow_unmixed: return crossflow_unmixed_effectiveness(ntu, capacity_ratio);
    }
    fail_domain(hx_effectiveness_name, "unknown arrangement");
}

double collector_hx_factor(double f_r_ul_area, double collector_capacity_rate, double effectiveness,
                           double min_capacity_rate)
{
    check::positive(hx_penalty_name, "collector_capacity_rate", collector_capacity_rate);
    check::non_negative(hx_penalty_name, "f_r_ul_area", f_r_ul_area);
    if (!(f_r_ul_area < collector_capacity_rate))
        fail_domain(hx_penalty_name, "f_r_ul_area", f_r_ul_area,
                    "0 up to (not including) collector_capacity_rate = " + format_number(collector_capacity_rate)
                        + " W/K (A·F_R·U_L/(ṁcp)_c = 1 − exp(−A·F′·U_L/(ṁcp)_c) is below 1)");
    if (!(effectiveness > 0 && effectiveness <= 1))
        fail_domain(hx_penalty_name, "effectiveness", effectiveness, "0..1, excluding 0");
    check::positive(hx_penalty_name, "min_capacity_rate", min_capacity_rate);
    if (!(min_capacity_rate <= collector_capacity_rate))
        fail_domain(hx_penalty_name, "min_capacity_rate", min_capacity_rate,
                    "0..collector_capacity_rate = " + format_number(collector_capacity_rate)
                        + " W/K (the smaller of the two loops' capacity rates)");
    if (f_r_ul_area == 0)
        return 1;  // a collector without losses loses nothing by a warmer inlet
    // The bracket multiplied through by ε·(ṁcp)_min, which stays finite when
    // ε·(ṁcp)_min is tiny:  F_R′/F_R = εC / (εC + (A·F_R·U_L/(ṁcp)_c)·((ṁcp)_c − εC)).
    const double delivered = effectiveness * min_capacity_rate;
    return delivered / (delivered + f_r_ul_area / collector_capacity_rate * (collector_capacity_rate - delivered));
}

}  // namespace solarith::sizing
