#!/usr/bin/python3
"""Writes the reference tables the heat-exchanger unit tests read.

    /usr/bin/python3 tests/reference/gen_sizing.py      (from the repository root)

hx_crossflow_series.txt
    Effectiveness of a crossflow exchanger with both fluids unmixed from the
    exact series of Mason (1954) and Baclic (1990),
        eps = 1/(Cr NTU) sum_{n>=0} P(n+1, NTU) P(n+1, Cr NTU),
        P(n+1, z) = 1 - exp(-z) sum_{m=0..n} z^m/m!,
    evaluated twice, independently of the C++ code (which sums Poisson tails
    with Boost.Math's incomplete gamma functions):
      - eps_decimal: in Python's decimal arithmetic with 60 digits more than
        the cancellation in 1 - exp(-z) sum(...) costs, the terms summed
        until they fall below 1e-45 of the sum past n = NTU;
      - eps_scipy: with scipy.special.gammainc (Cephes) in double precision.

hx_crossflow_pde.txt
    The same exchanger from its differential equations instead of the
    series: hot fluid (C_min) along xi, cold fluid along eta, neither mixed,
        du/dxi = -NTU (u - v),   dv/deta = NTU Cr (u - v),
        u(0, eta) = 1,  v(xi, 0) = 0,  eps = 1 - integral_0^1 u(1, eta) deta,
    on M x M cells, each cell balanced on the mean of its inlet and outlet
    temperatures (second order), M = 256, 512, 1024, 2048, extrapolated
    twice (Richardson, h^2 then h^4). This checks the series formula itself.

hx_closed_forms.txt
    Counterflow, parallel flow and one shell pass with two and with four tube
    passes from their differential equations (tube passes in series, shell
    fluid mixed over each cross-section, heat transfer area shared equally
    between the passes), solved exactly as linear boundary-value problems
    with scipy.linalg.expm. The two-pass exchanger is solved for both ends
    of shell inlet and for C_min in the shell and in the tubes; the closed
    forms of Incropera et al., Fundamentals of Heat and Mass Transfer, 6th
    ed., 2007, Table 11.3 are not used here.
CI does not run this script; it reads the committed tables.
"""

import math
import os
from decimal import Decimal, localcontext

import numpy
import scipy
from scipy.linalg import expm
from scipy.special import gammainc

HERE = os.path.dirname(os.path.abspath(__file__))

from reference_table import write_table  # noqa: E402  (the script's own folder)


def write(name, head, rows):
    write_table("gen_sizing.py", name, head, rows, f"SciPy {scipy.__version__}, NumPy {numpy.__version__}")


# --- crossflow, both fluids unmixed: the series ---------------------------------

def crossflow_decimal(ntu, cr):
    """The series in decimal arithmetic; ntu and cr are taken as the exact
    values of the doubles, y = cr*ntu rounded to a double as the C++ code has it."""
    y_double = cr * ntu
    with localcontext() as ctx:
        # exp(-z) sum z^m/m! cancels about z/ln(10) digits against 1
        ctx.prec = 60 + int(ntu / math.log(10))
        x = Decimal(ntu)
        y = Decimal(y_double)
        ex, ey = (-x).exp(), (-y).exp()
        term_x, term_y = Decimal(1), Decimal(1)  # z^n/n!
        sum_x, sum_y = Decimal(0), Decimal(0)    # sum_{m<=n} z^m/m!
        total = Decimal(0)
        n = 0
        while True:
            sum_x += term_x
            sum_y += term_y
            term = (1 - ex * sum_x) * (1 - ey * sum_y)
            total += term
            if n > ntu and term < total * Decimal(10) ** -45:
                break
            n += 1
            term_x = term_x * x / n
            term_y = term_y * y / n
        return float(total / y)


def crossflow_scipy(ntu, cr):
    y = cr * ntu
    total = 0.0
    n = 0
    while True:
        term = gammainc(n + 1, ntu) * gammainc(n + 1, y)
        total += term
        if n > ntu and term < 1e-20 * total:
            return total / y
        n += 1


def crossflow_series_table():
    ntus = [0.001, 0.01, 0.1, 0.25, 0.5, 0.75, 1.0, 1.5, 2.0, 3.0, 4.0, 5.0, 7.5, 10.0, 20.0, 50.0, 100.0, 300.0,
            1000.0]
    crs = [1e-6, 0.01, 0.1, 0.25, 0.5, 0.75, 0.9, 1.0]
    cases = [(n, c) for n in ntus for c in crs] + [(3000.0, 0.9), (3000.0, 1.0), (10000.0, 0.97), (10000.0, 1.0)]
    rows = []
    worst = 0.0
    for ntu, cr in cases:
        eps = crossflow_decimal(ntu, cr)
        eps_scipy = crossflow_scipy(ntu, cr) if ntu <= 1000 else eps
        worst = max(worst, abs(eps_scipy - eps))
        rows.append((ntu, cr, eps, eps_scipy))
    print(f"crossflow series: SciPy and decimal evaluations differ by at most {worst:.1e}")
    write("hx_crossflow_series.txt",
          ["Crossflow heat exchanger, both fluids unmixed: exact series of Mason (1954) / Baclic (1990),",
           "  eps = 1/(Cr NTU) sum_{n>=0} P(n+1, NTU) P(n+1, Cr NTU),  P(n+1, z) = 1 - exp(-z) sum_{m<=n} z^m/m!.",
           "eps_decimal: Python decimal arithmetic, 60 digits beyond the cancellation, terms to 1e-45 of the sum.",
           "eps_scipy: scipy.special.gammainc in double precision (for NTU > 1000 a copy of eps_decimal);",
           f"  the two agree to {worst:.1e} (absolute).",
           "columns: NTU [-]  Cr [-]  eps_decimal [-]  eps_scipy [-]"],
          rows)


# --- crossflow, both fluids unmixed: the differential equations -----------------

def crossflow_cells(ntu, cr, m):
    """Second-order cell balance on an m x m grid, swept by anti-diagonals."""
    alpha, beta = ntu / m, ntu * cr / m
    shrink = 1.0 / (1.0 + (alpha + beta) / 2)
    u = numpy.ones(m)    # hot temperature entering the next cell of each hot stream j
    v = numpy.zeros(m)   # cold temperature entering the next cell of each cold stream i
    for d in range(2 * m - 1):
        i = numpy.arange(max(0, d - m + 1), min(d, m - 1) + 1)
        j = d - i
        difference = (u[j] - v[i]) * shrink  # mean hot minus mean cold over the cell
        u[j] = u[j] - alpha * difference
        v[i] = v[i] + beta * difference
    return 1.0 - u.mean()


def crossflow_pde_table():
    grids = [256, 512, 1024, 2048]
    rows = []
    worst_order = (0.0, 10.0)
    worst_estimate = 0.0
    for ntu in [0.1, 0.5, 1.0, 2.0, 3.0, 5.0, 10.0]:
        for cr in [0.1, 0.25, 0.5, 0.75, 1.0]:
            e = [crossflow_cells(ntu, cr, m) for m in grids]
            # observed order of the raw scheme from the last three grids
            order = math.log2(abs(e[1] - e[2]) / abs(e[2] - e[3]))
            worst_order = (max(worst_order[0], order), min(worst_order[1], order))
            r1 = [(4 * e[k + 1] - e[k]) / 3 for k in range(3)]      # h^2 removed
            r2 = [(16 * r1[k + 1] - r1[k]) / 15 for k in range(2)]  # h^4 removed
            estimate = abs(r2[1] - r2[0])
            worst_estimate = max(worst_estimate, estimate)
            rows.append((ntu, cr, r2[1], estimate))
    print(f"crossflow cells: observed order {worst_order[1]:.3f}..{worst_order[0]:.3f}, "
          f"extrapolation change at most {worst_estimate:.1e}")
    write("hx_crossflow_pde.txt",
          ["Crossflow heat exchanger, both fluids unmixed, from its differential equations (not the series):",
           "  du/dxi = -NTU (u - v), dv/deta = NTU Cr (u - v), u(0, eta) = 1, v(xi, 0) = 0,",
           "  eps = 1 - mean over eta of u(1, eta); hot fluid = C_min.",
           "M x M cells, each balanced on the mean of its inlet and outlet temperatures; M = 256, 512, 1024, 2048;",
           f"observed order of the raw scheme {worst_order[1]:.3f}..{worst_order[0]:.3f}; Richardson extrapolation",
           "(h^2, then h^4) of the last three grids. change: |difference| between the extrapolations from the",
           "grids 256-1024 and 512-2048, an estimate of the error of eps_cells.",
           "columns: NTU [-]  Cr [-]  eps_cells [-]  change [-]"],
          rows)


# --- counterflow, parallel flow, shell and tube: linear boundary-value problems -

def solve_linear_bvp(matrix, known, unknown, conditions):
    """y' = matrix y on [0, 1]. y(0) has the values `known` (index -> value)
    and free components `unknown`; `conditions` are rows (c, d, rhs) with
    c.y(0) + d.y(1) = rhs, as many as unknowns. Returns y(0), y(1)."""
    size = matrix.shape[0]
    e = expm(matrix)
    base = numpy.zeros(size)
    for index, value in known.items():
        base[index] = value
    a = numpy.zeros((len(unknown), len(unknown)))
    b = numpy.zeros(len(unknown))
    for row, (c, d, rhs) in enumerate(conditions):
        c, d = numpy.asarray(c, float), numpy.asarray(d, float)
        b[row] = rhs - c @ base - d @ (e @ base)
        for col, index in enumerate(unknown):
            unit = numpy.zeros(size)
            unit[index] = 1.0
            a[row, col] = c @ unit + d @ (e @ unit)
    y0 = base.copy()
    if unknown:
        y0[list(unknown)] = numpy.linalg.solve(a, b)
    return y0, e @ y0


def two_stream(ntu, cr, counter):
    """Hot fluid = C_min enters at z = 0 with 1; cold enters with 0 at z = 1
    (counterflow) or z = 0 (parallel). UA = NTU, C_hot = 1, C_cold = 1/Cr."""
    ua, c_cold = ntu, (1.0 / cr if cr > 0 else math.inf)
    k_cold = ua / c_cold
    if counter:  # cold moves toward -z: -C_c dTc/dz = UA (Th - Tc)
        m = numpy.array([[-ua, ua], [-k_cold, k_cold]])
        _, y1 = solve_linear_bvp(m, {0: 1.0}, [1], [([0, 0], [0, 1], 0.0)])
    else:
        m = numpy.array([[-ua, ua], [k_cold, -k_cold]])
        _, y1 = solve_linear_bvp(m, {0: 1.0, 1: 0.0}, [], [])
    return 1.0 - y1[0]


def shell_and_tube(ntu, cr, passes, c_min_in_shell, shell_inlet_at_tube_inlet):
    """One shell pass, `passes` tube passes in series, pass 1 entering at z = 0
    and the passes alternating in direction; shell fluid mixed over each
    cross-section, entering at z = 0 or z = 1. State: shell, pass 1..passes.
    The shell fluid enters at 1, the tube fluid at 0; C_min = 1, C_max = 1/Cr."""
    c_max = 1.0 / cr if cr > 0 else math.inf
    c_shell, c_tube = (1.0, c_max) if c_min_in_shell else (c_max, 1.0)
    ua_pass = ntu / passes  # UA = NTU C_min, shared equally
    size = passes + 1
    m = numpy.zeros((size, size))
    shell_direction = 1.0 if shell_inlet_at_tube_inlet else -1.0
    for k in range(1, size):
        direction = 1.0 if k % 2 == 1 else -1.0  # pass 1 toward +z, pass 2 toward -z, ...
        # direction * C_tube dt_k/dz = UA_pass (T_shell - t_k)
        m[k, 0] += direction * ua_pass / c_tube
        m[k, k] -= direction * ua_pass / c_tube
        # shell_direction * C_shell dT/dz = -sum_k UA_pass (T_shell - t_k)
        m[0, 0] -= shell_direction * ua_pass / c_shell
        m[0, k] += shell_direction * ua_pass / c_shell
    known = {1: 0.0}
    unknown = list(range(2, size))
    conditions = []
    unit = numpy.eye(size)
    for k in range(1, passes):  # turnarounds: pass k and k+1 meet at z = 1 (k odd) or z = 0 (k even)
        if k % 2 == 1:
            conditions.append((numpy.zeros(size), unit[k] - unit[k + 1], 0.0))
        else:
            conditions.append((unit[k] - unit[k + 1], numpy.zeros(size), 0.0))
    if shell_inlet_at_tube_inlet:
        known[0] = 1.0
    else:
        unknown = [0] + unknown
        conditions.append((numpy.zeros(size), unit[0], 1.0))
    y0, y1 = solve_linear_bvp(m, known, unknown, conditions)
    tube_out = y0[passes] if passes % 2 == 0 else y1[passes]
    shell_out = y1[0] if shell_inlet_at_tube_inlet else y0[0]
    if cr > 0:  # energy balance (with Cr = 0 the C_max fluid's temperature does not change)
        assert abs(c_tube * tube_out - c_shell * (1.0 - shell_out)) <= 1e-9 * c_tube * tube_out
    return 1.0 - shell_out if c_min_in_shell else tube_out  # q/(C_min (1 - 0)), C_min = 1


def closed_form_table():
    rows = []
    worst_orientation = 0.0
    worst_side = 0.0
    for ntu in [0.01, 0.1, 0.5, 1.0, 1.5, 2.0, 2.5, 3.0, 5.0, 8.0]:
        for cr in [0.0, 0.1, 0.25, 0.5, 0.75, 0.9, 1.0]:
            counter = two_stream(ntu, cr, True)
            parallel = two_stream(ntu, cr, False)
            variants = [shell_and_tube(ntu, cr, 2, side, orient) for side in (True, False)
                        for orient in (True, False)]
            worst_orientation = max(worst_orientation, abs(variants[0] - variants[1]), abs(variants[2] - variants[3]))
            worst_side = max(worst_side, abs(variants[0] - variants[2]))
            four = [shell_and_tube(ntu, cr, 4, side, orient) for side in (True, False) for orient in (True, False)]
            rows.append((ntu, cr, counter, parallel, variants[0], min(four), max(four)))
    print(f"shell and tube, two passes: orientation changes eps by at most {worst_orientation:.1e}, "
          f"the side of C_min by {worst_side:.1e}")
    # How far the two-pass value lies from the four-pass one, on a fine grid.
    four_pass_gap = []
    for limit in (1.0, 2.0, 3.0):
        gap = 0.0
        for i in range(1, 101):
            for cr in [0.0, 0.1, 0.25, 0.5, 0.75, 0.9, 1.0]:
                ntu = limit * i / 100
                two = shell_and_tube(ntu, cr, 2, True, True)
                for side in (True, False):
                    for orient in (True, False):
                        gap = max(gap, two - shell_and_tube(ntu, cr, 4, side, orient))
        four_pass_gap.append((limit, gap))
    gaps = ", ".join(f"{gap:.3g} up to NTU = {limit:g}" for limit, gap in four_pass_gap)
    print(f"four tube passes: the two-pass value exceeds it by at most {gaps}")
    write("hx_closed_forms.txt",
          ["Effectiveness from the differential equations, solved as linear boundary-value problems with",
           "scipy.linalg.expm (not from the closed forms). UA = NTU C_min; Cr = C_min/C_max (Cr = 0: C_max infinite).",
           "counter, parallel: two streams. shell_2, shell_4: one shell pass (shell fluid mixed over each",
           "cross-section), 2 or 4 tube passes in series alternating in direction, area shared equally.",
           "shell_2 is listed for C_min in the shell with the shell inlet at the tube-inlet end; the other end",
           f"and C_min in the tubes give the same value to {max(worst_orientation, worst_side):.1e}.",
           "shell_4_low, shell_4_high: least and greatest of the four variants (C_min in shell or tubes, shell inlet",
           "at either end). On a grid of 100 NTU steps x 7 Cr the two-pass value exceeds every four-pass variant",
           f"by at most {gaps}.",
           "columns: NTU [-]  Cr [-]  eps_counter  eps_parallel  eps_shell_2  eps_shell_4_low  eps_shell_4_high"],
          rows)


if __name__ == "__main__":
    closed_form_table()
    crossflow_series_table()
    crossflow_pde_table()
