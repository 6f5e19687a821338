#!/usr/bin/python3
"""Writes the reference tables the conduction unit tests read.

    /usr/bin/python3 tests/reference/gen_conduction.py      (from the repository root)

The values come from implementations independent of Boost.Math, which the
add-in uses:
  - SciPy's modified Bessel functions iv, kv and their exponentially scaled
    forms ive, kve (AMOS library, D.E. Amos, ACM TOMS 12, 1986, 265-273);
  - SciPy's erf and erfc (Cephes library, S.L. Moshier);
  - for the annular fin also this script's own modified Bessel functions in
    120-digit decimal arithmetic (below), because where the fin is short the
    formula itself loses digits in any double-precision evaluation.
The formulas are those of the textbooks, written out here independently of
the C++ code:
  - annular fin of rectangular profile, adiabatic tip (Gardner, Trans. ASME 67,
    1945, 621-631; Incropera et al., Fundamentals of Heat and Mass Transfer,
    6th ed., 2007, Table 3.5);
  - semi-infinite solid with a step change of surface temperature
    (Incropera et al., 6th ed., eq. 5.57).
CI does not run this script; it reads the committed tables.
"""

import math
import os
from decimal import Decimal, localcontext

import numpy
import scipy
from scipy.special import erf, erfc, iv, ive, kv, kve

HERE = os.path.dirname(os.path.abspath(__file__))

from reference_table import write_table  # noqa: E402  (the script's own folder)


def write(name, head, rows):
    write_table("gen_conduction.py", name, head, rows, f"SciPy {scipy.__version__}, NumPy {numpy.__version__}")


# --- modified Bessel functions to about 35 digits ------------------------------
#
# A second reference, independent of both SciPy and Boost.Math, for the rows
# where double precision itself is the limit: when m*(r2 - r1) is small the
# numerator K1(a) I1(b) - I1(a) K1(b) is a small difference of nearly equal
# products and every double-precision evaluation (SciPy's too) loses about
# 1e-16/(m*(r2 - r1)) of it, with plain (unscaled) I and K even
# 1e-16 m*r2/(m*(r2 - r1)), since rounding m*r2 changes I(m*r2) that much.
#   x <= 60: ascending series (Abramowitz & Stegun 9.6.10 for I, 9.6.11 for K,
#            with psi(k+1) = -gamma + H_k), in 120-digit arithmetic to absorb
#            the cancellation of the K series (about 2x/ln 10 = 52 digits at 60);
#   x > 60:  Hankel's expansions for large argument (A&S 9.7.1, 9.7.2), summed
#            to the smallest term, which is below exp(-2x) < 1e-52 relative.
# They are checked against SciPy in check_bessel_against_scipy().

PI = Decimal("3.14159265358979323846264338327950288419716939937510582097494459")


def euler_gamma():
    """Euler's constant to about 100 digits from the Euler-Maclaurin expansion
    H_n = ln n + gamma + 1/(2n) - sum B_2k/(2k n^2k), n = 10^4, ten terms
    (good to about 87 digits); checked below against its first 84 published digits."""
    with localcontext() as ctx:
        ctx.prec = 130
        n = 10 ** 4
        harmonic = sum(Decimal(1) / j for j in range(1, n + 1))
        n = Decimal(n)
        # B_2k/(2k), k = 1..10, from B_2 = 1/6, B_4 = -1/30, ..., B_18 = 43867/798, B_20 = -174611/330
        coefficients = [(1, 12), (-1, 120), (1, 252), (-1, 240), (1, 132), (-691, 32760), (1, 12), (-3617, 8160),
                        (43867, 14364), (-174611, 6600)]
        tail = sum(Decimal(p) / q / n ** (2 * k) for k, (p, q) in enumerate(coefficients, start=1))
        return harmonic - n.ln() - 1 / (2 * n) + tail


EULER_GAMMA = euler_gamma()
assert str(EULER_GAMMA).startswith(
    "0.577215664901532860606512090082402431042159335939923598805767234884867726777664670936")
SERIES_UP_TO = Decimal(60)


def bessel_ik_series(order, x):
    """I_order(x) and K_order(x), order 0 or 1, by the ascending series."""
    q = x * x / 4
    term = (x / 2) ** order  # (x/2)^order (q^k / (k! (k+order)!)) at k = 0
    i_sum = Decimal(0)
    psi_sum = Decimal(0)
    harmonic = Decimal(0)  # H_k
    k = 0
    while True:
        i_sum += term
        if order == 0:
            psi_sum += harmonic * term                              # sum H_k q^k/(k!)^2
        else:
            psi_sum += (2 * harmonic + Decimal(1) / (k + 1)) * term  # (H_k + H_(k+1)) ...
        if k > 10 and term < i_sum * Decimal(10) ** -110:
            break
        k += 1
        harmonic += Decimal(1) / k
        term = term * q / (k * (k + order))
    log_half_x = (x / 2).ln()
    if order == 0:
        k_value = -(log_half_x + EULER_GAMMA) * i_sum + psi_sum
    else:
        # 1/x + ln(x/2) I1 - (x/4) sum (psi(k+1) + psi(k+2)) q^k/(k!(k+1)!),
        # psi(k+1) + psi(k+2) = -2 gamma + H_k + H_(k+1); psi_sum above holds the
        # harmonic part times (x/2) q^k/(k!(k+1)!), i_sum the same without it.
        k_value = 1 / x + log_half_x * i_sum - (psi_sum - 2 * EULER_GAMMA * i_sum) / 2
    return i_sum, k_value


def hankel_sum(order, x, alternating):
    mu = Decimal(4 * order * order)
    term = Decimal(1)
    total = Decimal(1)
    k = 1
    while True:
        odd = Decimal(2 * k - 1)
        next_term = term * (mu - odd * odd) / (8 * k * x)
        if abs(next_term) >= abs(term) or abs(next_term) < Decimal(10) ** -60:
            return total
        term = next_term
        total += -term if alternating and k % 2 == 1 else term
        k += 1


def bessel_ik(order, x):
    """I_order(x) and K_order(x) for order 0 or 1, x > 0, in 120-digit arithmetic."""
    with localcontext() as ctx:
        ctx.prec = 120
        x = Decimal(x)
        if x <= SERIES_UP_TO:
            return bessel_ik_series(order, x)
        i_value = x.exp() / (2 * PI * x).sqrt() * hankel_sum(order, x, True)
        k_value = (PI / (2 * x)).sqrt() * (-x).exp() * hankel_sum(order, x, False)
        return i_value, k_value


def annular_precise(h, k, t, r1, r2):
    """Gardner's efficiency exactly as printed, in 120-digit arithmetic, for
    the double inputs taken exactly."""
    with localcontext() as ctx:
        ctx.prec = 120
        h, k, t, r1, r2 = (Decimal(v) for v in (h, k, t, r1, r2))
        m = (2 * h / (k * t)).sqrt()
        i0a, k0a = bessel_ik(0, m * r1)
        i1a, k1a = bessel_ik(1, m * r1)
        i1b, k1b = bessel_ik(1, m * r2)
        bracket = (k1a * i1b - i1a * k1b) / (i0a * k1b + k0a * i1b)
        return float(2 * r1 / (m * (r2 * r2 - r1 * r1)) * bracket)


# --- annular fin with SciPy -----------------------------------------------------
# r2^2 - r1^2 is written (r2 - r1)(r2 + r1): for a thin fin on a large tube
# the plain difference of squares loses digits.

def annular_direct(m, r1, r2):
    """Gardner's efficiency with plain I and K; usable while I(m*r2) fits a double."""
    a, b = m * r1, m * r2
    bracket = (kv(1, a) * iv(1, b) - iv(1, a) * kv(1, b)) / (iv(0, a) * kv(1, b) + kv(0, a) * iv(1, b))
    return 2.0 * r1 / (m * (r2 - r1) * (r2 + r1)) * bracket


def annular_scaled(m, r1, r2):
    """The same with ive = exp(-x)*I and kve = exp(x)*K; numerator and
    denominator both multiplied by exp(a - b)."""
    a, b = m * r1, m * r2
    e = math.exp(-2.0 * m * (r2 - r1))
    bracket = (kve(1, a) * ive(1, b) - e * ive(1, a) * kve(1, b)) / (e * ive(0, a) * kve(1, b) + kve(0, a) * ive(1, b))
    return 2.0 * r1 / (m * (r2 - r1) * (r2 + r1)) * bracket


def annular_scipy(m, r1, r2):
    return annular_direct(m, r1, r2) if m * r2 < 600.0 else annular_scaled(m, r1, r2)


def check_bessel_against_scipy():
    worst = 0.0
    for x in [1e-4, 0.01, 0.3, 1.0, 2.5, 7.0, 20.0, 59.9, 60.1, 150.0, 499.0, 501.0, 3000.0, 1e5]:
        for order in (0, 1):
            with localcontext() as ctx:
                ctx.prec = 120
                i_value, k_value = bessel_ik(order, x)
                scale = Decimal(x).exp()
                errors = (abs(float(i_value / scale) - ive(order, x)) / ive(order, x),
                          abs(float(k_value * scale) - kve(order, x)) / kve(order, x))
            if max(errors) > 1e-14:
                print(f"  order {order}, x = {x}: I, K differ from SciPy by {errors[0]:.2e}, {errors[1]:.2e}")
            worst = max(worst, *errors)
    print(f"high-precision Bessel functions agree with SciPy to {worst:.2e}")
    assert worst < 1e-14
    return worst


def annular_table():
    bessel_agreement = check_bessel_against_scipy()
    # (h, k, t): three fins, m = sqrt(2h/(k t)) about 20, 18 and 204 1/m.
    fins = [(40.0, 200.0, 0.001), (5.0, 15.0, 0.002), (500.0, 80.0, 0.0003)]
    # m*r1 spans small tubes to the asymptotic range (the C++ code switches to
    # the Hankel expansion at 500); m*(r2 - r1) from nearly isothermal fins to
    # fins far longer than useful, with extra small values on the first fin
    # around the C++ switch to the straight-fin form at m*(r2 - r1) = 1e-6.
    m_r1 = [1e-3, 0.01, 0.1, 0.5, 1.0, 2.0, 5.0, 10.0, 30.0, 100.0, 300.0, 499.0, 501.0, 700.0, 1000.0,
            5000.0, 1e5]
    m_length = [1e-3, 0.01, 0.1, 0.3, 1.0, 2.0, 5.0, 10.0, 30.0]
    m_length_small = [1e-9, 1e-7, 0.99e-6, 1.01e-6, 1e-5, 1e-4]
    rows = []
    worst_plain_scaled = 0.0
    worst_scipy = 0.0
    for n, (h, k, t) in enumerate(fins):
        m = math.sqrt(2.0 * h / (k * t))
        for ar in m_r1:
            for d in m_length + (m_length_small if n == 0 else []):
                r1 = ar / m
                r2 = r1 + d / m
                eta = annular_precise(h, k, t, r1, r2)
                eta_scipy = annular_scipy(m, r1, r2)
                if m * r2 < 600.0:
                    worst_plain_scaled = max(worst_plain_scaled,
                                             abs(eta_scipy - annular_scaled(m, r1, r2)) / eta_scipy)
                if d >= 0.1:
                    worst_scipy = max(worst_scipy, abs(eta_scipy - eta) / eta)
                assert 0.0 < eta <= 1.0
                rows.append((h, k, t, r1, r2, eta, eta_scipy))
    print(f"annular fin: SciPy plain and scaled forms agree to {worst_plain_scaled:.2e} where both apply;")
    print(f"             SciPy and the high-precision reference agree to {worst_scipy:.2e} for m*(r2 - r1) >= 0.1")
    write("annular_fin_efficiency.txt",
          ["Efficiency of an annular fin of rectangular profile, adiabatic tip:",
           "  eta = 2 r1/(m (r2^2 - r1^2)) [K1(m r1) I1(m r2) - I1(m r1) K1(m r2)]",
           "                               / [I0(m r1) K1(m r2) + K0(m r1) I1(m r2)],  m = sqrt(2h/(k t))",
           "(Gardner, Trans. ASME 67, 1945; Incropera et al., 6th ed., 2007, Table 3.5).",
           "eta_precise: the formula as printed in 120-digit decimal arithmetic with the script's own Bessel",
           "  functions (ascending series / Hankel expansion, A&S 9.6.10, 9.6.11, 9.7.1, 9.7.2), which agree",
           f"  with SciPy's ive/kve to {bessel_agreement:.1e}; good to about 30 significant digits.",
           "eta_scipy: scipy.special.iv/kv where m*r2 < 600, else the exponentially scaled ive/kve, in double",
           "  precision; it loses about 1e-16 (1 + m*r2)/(m*(r2 - r1)) to cancellation (plain and scaled forms differ by",
           f"  up to {worst_plain_scaled:.1e}); it agrees with eta_precise to {worst_scipy:.1e} where m*(r2 - r1) >= 0.1.",
           "columns: h [W/(m2 K)]  k [W/(m K)]  t [m]  r_inner [m]  r_outer [m]  eta_precise [-]  eta_scipy [-]"],
          rows)


# --- semi-infinite solid ------------------------------------------------------

def semi_infinite_table():
    rows = []
    # Tail of erfc: T_initial = 0, T_surface = 100, so T = 100*erfc(eta)
    # exactly and a relative error in T is a relative error in erfc.
    alpha, t = 1e-6, 3600.0
    for eta in [0.0005, 0.01, 0.1, 0.3, 0.5, 0.75, 1.0, 1.5, 2.0, 3.0, 4.0, 5.0, 6.0, 8.0, 10.0, 15.0, 20.0,
                25.0, 26.5]:
        x = eta * 2.0 * math.sqrt(alpha * t)
        rows.append((0.0, 100.0, alpha, x, t, 100.0 * erfc(x / (2.0 * math.sqrt(alpha * t)))))
    # Ground, walls and metals in ordinary conditions, in the erf form of
    # Incropera eq. 5.57: (T - T_s)/(T_i - T_s) = erf(x/(2 sqrt(alpha t))).
    cases = [(20.0, -15.0, 1.38e-7), (10.0, 80.0, 5e-7), (25.0, 200.0, 2.3e-5), (-5.0, 35.0, 1e-6)]
    for (ti, ts, alpha) in cases:
        for x in [0.001, 0.01, 0.05, 0.2, 0.68, 1.5]:
            for t in [1.0, 60.0, 3600.0, 86400.0, 5184000.0, 3.15e7]:
                rows.append((ti, ts, alpha, x, t, ts + (ti - ts) * erf(x / (2.0 * math.sqrt(alpha * t)))))
    write("semi_infinite_temperature.txt",
          ["Semi-infinite solid, uniform T_initial, surface stepped to T_surface at t = 0:",
           "  (T - T_s)/(T_i - T_s) = erf(x/(2 sqrt(alpha t)))  (Incropera et al., 6th ed., 2007, eq. 5.57).",
           "First block: T_i = 0, T_s = 100, T = 100 erfc(eta) with scipy.special.erfc (tail accuracy);",
           "other rows: T = T_s + (T_i - T_s) erf(eta) with scipy.special.erf.",
           "columns: T_initial [C]  T_surface [C]  alpha [m2/s]  depth [m]  time [s]  T [C]"],
          rows)


if __name__ == "__main__":
    annular_table()
    semi_infinite_table()
