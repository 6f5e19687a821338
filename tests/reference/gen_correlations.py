#!/usr/bin/python3
"""Writes the reference tables the correlation, storage and loss unit tests read.

    /usr/bin/python3 tests/reference/gen_correlations.py      (from the repository root)

The fluid properties come from python3-iapws (Debian package), not from
Solarith's own property code:
  - liquid water: IAPWS-IF97 region 1 (iapws.iapws97._Region1: v, h, cp,
    alfav), saturation pressure IF97 eq. 30 (_PSat_T), viscosity IAPWS 2008
    (_Viscosity) and thermal conductivity IAPWS 2011 (_ThCond) at the IF97
    density;
  - dry air: the real-gas equation of state of Lemmon et al. (J. Phys. Chem.
    Ref. Data 29, 2000, 331-385) with the transport equations of Lemmon &
    Jacobsen (Int. J. Thermophys. 25, 2004, 21-69), iapws.humidAir.Air at
    101325 Pa.
Numerics from SciPy: the ODE of the mixed tank by solve_ivp (DOP853), the pipe
surface temperature by brentq. The correlations are written out here from the
published equations, independently of the C++ code:
  - Hausen (1943), Gnielinski (1976) with Petukhov's (1970) friction factor,
    the linear transition blend as the catalogue states it (2300..4000);
  - Churchill & Chu (1975) horizontal cylinder, Churchill & Bernstein (1977),
    combined as Nu^3 = Nu_forced^3 + Nu_free^3 (Churchill 1977).
CI does not run this script; it reads the committed tables.
"""

import math
import os
import sys

import numpy
import scipy
from scipy.integrate import solve_ivp
from scipy.optimize import brentq

import iapws
from iapws._iapws import _ThCond, _Viscosity
from iapws.humidAir import Air
from iapws.iapws97 import _PSat_T, _Region1

HERE = os.path.dirname(os.path.abspath(__file__))

from reference_table import write_table  # noqa: E402  (the script's own folder)
G = 9.80665                 # standard gravity, m/s2 (exact)
SIGMA = 5.670374419e-8      # Stefan-Boltzmann constant, CODATA 2018
P_ATM = 101325.0


def write(name, head, rows):
    write_table("gen_correlations.py", name, head, rows, f"python3-iapws {iapws.__version__}, SciPy {scipy.__version__}, NumPy {numpy.__version__}")


# --- properties -----------------------------------------------------------------

def default_pressure(t_c):
    """Pa: 101325, or the saturation pressure at t_c where higher."""
    return max(P_ATM, _PSat_T(t_c + 273.15) * 1e6)


def water(t_c, p_pa):
    """dict of rho, h [J/kg], cp [J/kgK], mu, k, beta of liquid water (IF97 region 1)."""
    t = t_c + 273.15
    r = _Region1(t, p_pa / 1e6)
    rho = 1.0 / r["v"]
    return {"rho": rho, "h": r["h"] * 1e3, "cp": r["cp"] * 1e3, "beta": r["alfav"],
            "mu": _Viscosity(rho, t), "k": _ThCond(rho, t)}


def air(t_c):
    """dict of rho, cp, mu, k, beta of dry air at 101325 Pa (Lemmon et al.)."""
    a = Air(T=t_c + 273.15, P=P_ATM / 1e6)
    return {"rho": a.rho, "cp": a.cp * 1e3, "mu": a.mu, "k": a.k, "beta": a.alfav}


def fluid(code, t_c):
    return water(t_c, default_pressure(t_c)) if code == 0 else air(t_c)


# --- STORE_WATER ------------------------------------------------------------------

def store_water():
    rows = []
    temperatures = [0, 5, 15, 40, 60, 85, 99, 120, 150, 199.5]
    for t1 in temperatures:
        for t2 in temperatures:
            p = default_pressure(max(t1, t2))
            w1, w2 = water(t1, p), water(t2, p)
            volume = 0.3
            rows.append([volume, t1, t2, volume * w1["rho"] * (w2["h"] - w1["h"])])
    write("store_water.txt",
          ["Heat to bring a volume V of liquid water from T1 to T2 at constant pressure",
           "p = max(101325 Pa, p_sat(max(T1, T2))), mass fixed at T1:",
           "  Q = V * rho(T1, p) * (h(T2, p) - h(T1, p)),  IAPWS-IF97 region 1 (iapws.iapws97._Region1),",
           "  p_sat by IF97 eq. 30 (_PSat_T).",
           "columns: V [m3]  T1 [C]  T2 [C]  Q [J]"], rows)


# --- STORE_COOLDOWN -----------------------------------------------------------------

def store_cooldown():
    cases = [  # T_start, T_ambient, UA, V, t
        (60, 20, 2, 0.3, 86400),
        (90, 15, 5, 0.2, 3 * 86400),
        (60, 20, 2, 0.3, 3600),
        (20, 35, 3, 0.1, 36000),      # a cold tank warming
        (180, 20, 3, 0.5, 86400),     # pressurised, p = p_sat(180 C)
        (50, -10, 2, 0.3, 2 * 86400),  # frost outside, the tank stays liquid
        (70, 10, 10, 0.15, 20 * 86400),  # ends close to ambient
        (95, 5, 1.5, 1.0, 7 * 86400),
    ]
    rows = []
    for t_start, t_amb, ua, volume, time_s in cases:
        p = default_pressure(max(t_start, min(t_amb, 200)))
        mass = volume * water(t_start, p)["rho"]

        def rate(_, y):
            return [-ua * (y[0] - t_amb) / (mass * water(y[0], p)["cp"])]

        sol = solve_ivp(rate, (0, time_s), [t_start], method="DOP853", rtol=1e-13, atol=1e-12)
        assert sol.success
        rows.append([t_start, t_amb, ua, volume, time_s, sol.y[0][-1]])
    write("store_cooldown.txt",
          ["Fully mixed water tank: m*cp(T)*dT/dt = -UA*(T - T_ambient), m = V*rho(T_start, p),",
           "p = max(101325 Pa, p_sat(max(T_start, T_ambient))), cp and rho from IAPWS-IF97 region 1",
           "(iapws.iapws97._Region1), integrated by scipy.integrate.solve_ivp, DOP853, rtol 1e-13, atol 1e-12.",
           "columns: T_start [C]  T_ambient [C]  UA [W/K]  V [m3]  time [s]  T_end [C]"], rows)


# --- DIM_RAYLEIGH -----------------------------------------------------------------------

def dim_rayleigh():
    cases = [  # fluid (0 water, 1 air), T_hot, T_cold, L
        (1, 70, 50, 0.025), (1, 232, 23, 0.71), (1, 165, 23, 0.1), (1, 40, -20, 1.0), (1, 400, 300, 0.05),
        (0, 60, 20, 0.1), (0, 90, 70, 0.5), (0, 30, 20, 0.01), (0, 150, 110, 0.2), (0, 20, 60, 0.1),
    ]
    rows = []
    for code, t_hot, t_cold, length in cases:
        f = fluid(code, 0.5 * (t_hot + t_cold))
        nu = f["mu"] / f["rho"]
        alpha = f["k"] / (f["rho"] * f["cp"])
        rows.append([code, t_hot, t_cold, length,
                     G * f["beta"] * abs(t_hot - t_cold) * length ** 3 / (nu * alpha)])
    write("dim_rayleigh.txt",
          ["Ra = g*beta*|T_hot - T_cold|*L^3/(nu*alpha), properties at (T_hot + T_cold)/2, g = 9.80665:",
           "  fluid 0 = water at max(101325 Pa, p_sat): IF97 region 1 (rho, cp, alfav), IAPWS 2008 viscosity,",
           "            IAPWS 2011 conductivity (iapws._iapws);",
           "  fluid 1 = dry air at 101325 Pa, real gas: iapws.humidAir.Air (Lemmon et al. 2000; Lemmon &",
           "            Jacobsen 2004), beta = its alfav.",
           "columns: fluid  T_hot [C]  T_cold [C]  L [m]  Ra"], rows)


# --- CONV_PIPE_COEFF ---------------------------------------------------------------------

def nusselt_pipe(re, pr, l_over_d):
    """Mean Nu inside a tube, uniform wall temperature, as the catalogue states it."""
    def laminar(re_):
        if l_over_d is None:
            return 3.66
        gz = re_ * pr / l_over_d                         # Graetz number (D/L) Re Pr
        return 3.66 + 0.0668 * gz / (1 + 0.04 * gz ** (2 / 3))  # Hausen 1943

    def turbulent(re_):
        f = (0.790 * math.log(re_) - 1.64) ** -2         # Petukhov 1970
        nu = (f / 8) * (re_ - 1000) * pr / (1 + 12.7 * math.sqrt(f / 8) * (pr ** (2 / 3) - 1))  # Gnielinski 1976
        return nu if l_over_d is None else nu * (1 + l_over_d ** (-2 / 3))

    if re <= 2300:
        return laminar(re)
    if re >= 4000:
        return turbulent(re)
    w = (re - 2300) / (4000 - 2300)
    return (1 - w) * laminar(2300) + w * turbulent(4000)


def conv_pipe_coeff():
    cases = [  # fluid, T_mean, mass_flow, D, L (0 = fully developed)
        (0, 40, 0.02, 0.01, 0), (0, 40, 0.005, 0.01, 0), (0, 40, 0.005, 0.01, 2.0), (0, 20, 0.001, 0.02, 1.0),
        (0, 60, 0.03, 0.016, 0), (0, 60, 0.03, 0.016, 0.5), (0, 80, 0.3, 0.025, 0), (0, 10, 0.02, 0.02, 0),
        (0, 25, 0.5, 0.02, 3.0), (1, 50, 0.01, 0.05, 0), (1, 20, 0.0005, 0.05, 0), (1, 100, 0.002, 0.05, 5.0),
    ]
    rows = []
    for code, t, m_dot, d, length in cases:
        f = fluid(code, t)
        re = 4 * m_dot / (math.pi * d * f["mu"])
        pr = f["mu"] * f["cp"] / f["k"]
        nu = nusselt_pipe(re, pr, None if length == 0 else length / d)
        rows.append([code, t, m_dot, d, length, re, pr, nu * f["k"] / d])
    write("conv_pipe_coeff.txt",
          ["h = Nu*k/D inside a tube, Re = 4*m_dot/(pi*D*mu), properties at T_mean (fluid 0 = water at",
           "max(101325 Pa, p_sat), IF97 + IAPWS 2008/2011 via iapws; fluid 1 = air at 101325 Pa, Lemmon et al.",
           "via iapws.humidAir.Air). Nu: 3.66 or Hausen (L given) for Re <= 2300, Gnielinski with Petukhov",
           "friction (x (1 + (D/L)^(2/3)) when L given) for Re >= 4000, linear in Re in between.",
           "columns: fluid  T_mean [C]  mass_flow [kg/s]  D [m]  L [m] (0 = omitted)  Re  Pr  h [W/m2K]"], rows)


# --- LOSS_PIPE -------------------------------------------------------------------------

def churchill_chu_cylinder(ra, pr):
    return (0.60 + 0.387 * ra ** (1 / 6) / (1 + (0.559 / pr) ** (9 / 16)) ** (8 / 27)) ** 2


def churchill_bernstein(re, pr):
    return 0.3 + 0.62 * re ** 0.5 * pr ** (1 / 3) / (1 + (0.4 / pr) ** (2 / 3)) ** 0.25 \
        * (1 + (re / 282000) ** (5 / 8)) ** (4 / 5)


def pipe_loss(t_f, t_a, d_pipe, thickness, k_ins, emissivity, wind):
    d_out = d_pipe + 2 * thickness

    def outside(t_s):
        a = air(0.5 * (t_s + t_a))
        nu_k = a["mu"] / a["rho"]
        alpha = a["k"] / (a["rho"] * a["cp"])
        pr = nu_k / alpha
        ra = G * a["beta"] * abs(t_s - t_a) * d_out ** 3 / (nu_k * alpha)
        nu = churchill_chu_cylinder(ra, pr)
        if wind > 0:
            nu = (nu ** 3 + churchill_bernstein(wind * d_out / nu_k, pr) ** 3) ** (1 / 3)
        h = nu * a["k"] / d_out
        ts, ta = t_s + 273.15, t_a + 273.15
        return math.pi * d_out * (h * (t_s - t_a) + emissivity * SIGMA * (ts ** 4 - ta ** 4))

    if thickness == 0:
        return outside(t_f), t_f
    conductance = 2 * math.pi * k_ins / math.log(d_out / d_pipe)
    t_s = brentq(lambda t: conductance * (t_f - t) - outside(t), min(t_f, t_a), max(t_f, t_a),
                 xtol=1e-13, rtol=4 * sys.float_info.epsilon, maxiter=200)
    return conductance * (t_f - t_s), t_s


def loss_pipe():
    cases = [  # T_fluid, T_ambient, D_pipe, thickness, k, emissivity, wind
        (60, 20, 0.022, 0.02, 0.04, 0.9, 0), (60, 20, 0.022, 0.02, 0.04, 0.9, 3),
        (90, 10, 0.054, 0.03, 0.035, 0.9, 0), (90, -10, 0.054, 0.03, 0.035, 0.2, 8),
        (165, 23, 0.1, 0, 0.05, 0.85, 0), (165, 23, 0.1, 0.05, 0.05, 0.85, 0),
        (5, 30, 0.028, 0.013, 0.036, 0.9, 0), (200, 15, 0.1, 0.005, 0.1, 0.5, 1),
        (45, 25, 0.015, 0, 0.04, 0.05, 0.5), (400, 20, 0.3, 0.1, 0.07, 0.9, 10),
        (60, 20, 0.022, 0.02, 0.04, 0.0, 0),
    ]
    rows = []
    for case in cases:
        q, t_s = pipe_loss(*case)
        rows.append(list(case) + [t_s, q])
    write("loss_pipe.txt",
          ["Heat loss of a horizontal insulated pipe per metre, surface temperature T_s from",
           "  2 pi k (T_f - T_s)/ln(r_o/r_i) = pi D_o [h (T_s - T_a) + eps sigma (T_s^4 - T_a^4)]",
           "(scipy.optimize.brentq), h = Nu k/D_o, air at (T_s + T_a)/2 and 101325 Pa from iapws.humidAir.Air",
           "(Lemmon et al. 2000 real gas, Lemmon & Jacobsen 2004 transport), Nu Churchill-Chu horizontal",
           "cylinder, with wind (Nu_CB^3 + Nu_CC^3)^(1/3), Churchill-Bernstein. Bare pipe: T_s = T_f.",
           "columns: T_fluid [C]  T_ambient [C]  D_pipe [m]  thickness [m]  k [W/mK]  emissivity  wind [m/s]"
           "  T_s [C]  q [W/m]"], rows)


if __name__ == "__main__":
    store_water()
    store_cooldown()
    dim_rayleigh()
    conv_pipe_coeff()
    loss_pipe()
