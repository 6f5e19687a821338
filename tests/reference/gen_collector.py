#!/usr/bin/python3
"""Writes the reference tables the collector unit tests read.

    /usr/bin/python3 tests/reference/gen_collector.py      (from the repository root)

collector_iam_pchip.txt
    SciPy's PchipInterpolator (scipy.interpolate, the monotone piecewise cubic
    Hermite interpolant of Fritsch & Carlson, SIAM J. Numer. Anal. 17, 1980,
    with the interior slopes of Fritsch & Butland, 1984, and the three-point
    shape-preserving end slopes of Moler, Numerical Computing with MATLAB,
    2004) on incidence angle modifier tables. The tables are completed as
    COLL_IAM_TABLE documents: K(0) = 1 prepended when a table starts above 0
    degrees, K(90) = 0 appended when it ends below 90 degrees. The C++ code
    uses Boost.Math's cubic_hermite with its own slopes; this is an
    independent implementation of the same published method.

collector_tau_alpha.txt
    The transmittance-absorptance product of Duffie & Beckman, Solar
    Engineering of Thermal Processes, 4th ed., 2013, ch. 5, written out here
    independently of the C++ code and in a different algebraic form: the
    Fresnel reflectances in the sine/tangent form of D&B eqs. 5.1.1-5.1.2
    (the C++ code uses the equivalent cosine form), evaluated in double
    precision with Python's math module.
CI does not run this script; it reads the committed tables.
"""

import math
import os

import numpy
import scipy
from scipy.interpolate import PchipInterpolator

HERE = os.path.dirname(os.path.abspath(__file__))

from reference_table import write_table  # noqa: E402  (the script's own folder)


def write(name, head, rows):
    write_table("gen_collector.py", name, head, rows, f"SciPy {scipy.__version__}, NumPy {numpy.__version__}")


# --- incidence angle modifier tables ------------------------------------------
#
# Invented tables of the shapes met in test reports (values made up for the
# test, not taken from any report): a glazed flat plate at 10..80 degrees, an
# evacuated-tube transversal modifier rising above 1 and falling to 0 at 90,
# a single measured angle, an irregular spacing, and the bare definition.
IAM_TABLES = [
    ([10, 20, 30, 40, 50, 60, 70, 80], [1.0, 0.99, 0.98, 0.96, 0.92, 0.85, 0.72, 0.45]),
    ([0, 10, 20, 30, 40, 50, 60, 70, 80, 90], [1.0, 1.01, 1.03, 1.06, 1.10, 1.14, 1.12, 1.02, 0.7, 0.0]),
    ([50], [0.9]),
    ([0, 15, 45, 60, 75, 85], [1.0, 0.995, 0.95, 0.88, 0.7, 0.35]),
    ([0], [1.0]),
]


def completed(angles, modifiers):
    x, y = list(angles), list(modifiers)
    if x[0] > 0:
        x, y = [0.0] + x, [1.0] + y
    if x[-1] < 90:
        x, y = x + [90.0], y + [0.0]
    return numpy.array(x, dtype=float), numpy.array(y, dtype=float)


def iam_rows():
    rows = []
    evaluation = sorted(set([0.0, 0.5, 3.0, 7.5, 12.0, 25.0, 33.3, 41.0, 47.5, 52.0, 58.0, 63.0, 66.6, 72.5,
                             77.0, 81.0, 84.0, 86.5, 88.0, 89.0, 89.9]))
    for number, (angles, modifiers) in enumerate(IAM_TABLES, start=1):
        for a, k in zip(angles, modifiers):
            rows.append([number, 0, a, k])
        x, y = completed(angles, modifiers)
        curve = PchipInterpolator(x, y)
        for theta in sorted(set(evaluation) | set(float(a) for a in angles if a < 90)):
            rows.append([number, 1, theta, float(curve(theta))])
    return rows


# --- transmittance-absorptance product ----------------------------------------

def fresnel_sin_tan(theta1, n):
    """Perpendicular and parallel reflectance, D&B eqs. 5.1.1-5.1.2 (normal incidence: eq. 5.1.4)."""
    if theta1 == 0:
        r = ((n - 1) / (n + 1)) ** 2
        return r, r
    theta2 = math.asin(math.sin(theta1) / n)
    r_perp = math.sin(theta2 - theta1) ** 2 / math.sin(theta2 + theta1) ** 2
    r_par = math.tan(theta2 - theta1) ** 2 / math.tan(theta2 + theta1) ** 2
    return r_perp, r_par


def cover_system(theta_deg, n, kl, covers):
    theta1 = math.radians(theta_deg)
    r_perp, r_par = fresnel_sin_tan(theta1, n)
    tau_r = 0.5 * sum((1 - r) / (1 + (2 * covers - 1) * r) for r in (r_perp, r_par))   # eq. 5.1.8
    theta2 = math.asin(math.sin(theta1) / n)
    tau_a = math.exp(-covers * kl / math.cos(theta2))                                   # eq. 5.2.2
    return tau_r, tau_a


def tau_alpha(theta_deg, n, kl, alpha, covers):
    tau_r, tau_a = cover_system(theta_deg, n, kl, covers)
    tau_r60, tau_a60 = cover_system(60.0, n, kl, covers)
    rho_d = tau_a60 * (1 - tau_r60)                                                     # D&B section 5.5
    return tau_a * tau_r * alpha / (1 - (1 - alpha) * rho_d)                            # eq. 5.5.1


def tau_alpha_rows():
    rows = []
    for theta in [0.0, 5.0, 20.0, 35.0, 50.0, 60.0, 70.0, 80.0, 85.0, 89.0]:
        for n in [1.34, 1.526, 1.6]:
            for kl in [0.0, 0.0125, 0.037, 0.1]:
                for alpha in [0.8, 0.95, 1.0]:
                    for covers in [1, 2, 3]:
                        rows.append([theta, n, kl, alpha, covers, tau_alpha(theta, n, kl, alpha, covers)])
    return rows


if __name__ == "__main__":
    write("collector_iam_pchip.txt",
          ["Incidence angle modifier tables and SciPy PchipInterpolator values on the completed tables",
           "(K(0) = 1 prepended when a table starts above 0 deg, K(90) = 0 appended when it ends below 90 deg).",
           "Tables invented for the test (shapes as in test reports, values made up).",
           "columns: table  kind (0 = table cell: angle, modifier as given to COLL_IAM_TABLE;",
           "                      1 = reference: incidence [deg], K from scipy.interpolate.PchipInterpolator)  x  y"],
          iam_rows())
    write("collector_tau_alpha.txt",
          ["Transmittance-absorptance product (tau alpha) of N identical covers over an absorber,",
           "Duffie & Beckman, 4th ed., 2013, ch. 5, written out in the sine/tangent form of the Fresnel",
           "equations (eqs. 5.1.1-5.1.2, eq. 5.1.4 at normal incidence), eq. 5.1.8 for N covers, Bouguer",
           "absorption eq. 5.2.2, rho_d = tau_a(1 - tau_r) at 60 deg (section 5.5), eq. 5.5.1.",
           "columns: incidence [deg]  n [-]  K*L per cover [-]  absorptance [-]  covers  tau_alpha [-]"],
          tau_alpha_rows())
