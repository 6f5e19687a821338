// Radiation family (RAD_*): reference values from outside the project,
// the source named beside each check.
#include "support.hpp"

#include "solarith/constants.hpp"

#include <algorithm>
#include <cmath>
#include <sstream>
#include <tuple>

namespace {

// Arguments in Calc syntax, every number with all its digits.
template <typename... Numbers>
std::string args(Numbers... numbers)
{
    std::ostringstream out;
    out.precision(17);
    const char* separator = "";
    ((out << separator << numbers, separator = "; "), ...);
    return out.str();
}

double relative_error(double value, double reference)
{
    return std::abs(value - reference) / std::abs(reference);
}

// The second radiation constant in µm·K, as the code uses it (CODATA 2018, 10 digits).
constexpr double c2_um = solarith::constants::second_radiation * 1e6;
// Relative difference between that printed c2 and h·c/k from the exact SI
// constants that scipy and astropy use: 3.50e-10, bounded here by 4e-10. A
// result that varies like exp(-c2/(lambda·T)) differs from theirs by about
// zeta times this.
constexpr double c2_rounding = 4e-10;
// h·c/k from the exact SI values of h, c, k, in µm·K, as the reference scripts use it.
constexpr double c2_exact_um =
    solarith::constants::planck * solarith::constants::speed_of_light / solarith::constants::boltzmann * 1e6;

using Triple = std::tuple<double, double, double>;
using Quadruple = std::tuple<double, double, double, double>;

}  // namespace

TEST_CASE("RAD_EMISSIVE: Stefan–Boltzmann law")
{
    // sigma·T⁴ with sigma from CODATA 2018 (scipy.constants.Stefan_Boltzmann,
    // python3-scipy 1.10): 300 K -> 459.30033 W/m²; 1000 K -> 56703.74 W/m².
    CHECK(test::call("RAD_EMISSIVE", "26.85") == test::rel(459.30033, 1e-7));
    CHECK(test::call("RAD_EMISSIVE", "726.85; 1") == test::rel(56703.74419, 1e-9));
    // Grey body: proportional to emissivity (definition of a grey surface).
    CHECK(test::call("RAD_EMISSIVE", "726.85; 0.25") == test::rel(56703.74419 / 4, 1e-9));
    CHECK(test::call("RAD_EMISSIVE", "-273.15") == 0.0);

    CHECK_REFUSED("RAD_EMISSIVE", "-274", "T = -274 is outside -273.15 °C (absolute zero) and above");
    CHECK_REFUSED("RAD_EMISSIVE", "20; 1.2", "emissivity = 1.2 is outside 0..1");
    CHECK_REFUSED("RAD_EMISSIVE", "20; -0.1", "emissivity = -0.1 is outside 0..1");
    CHECK_REFUSED("RAD_EMISSIVE", "1e300", "not a finite number");
}

TEST_CASE("RAD_SPECTRAL: Planck's law against astropy")
{
    // radiation_planck.txt: pi·B_lambda from astropy.modeling.models.BlackBody
    // (astropy 5.2, CODATA 2018), written by tests/reference/gen_radiation.py.
    // Tolerance 1e-10 + c2_rounding·(1 + zeta): our c1, c2 are CODATA's printed digits.
    CHECK(std::abs(c2_um / c2_exact_um - 1) < c2_rounding);
    double worst = 0, worst_over_tolerance = 0;
    for (const auto& row : test::read_table("radiation_planck.txt")) {
        REQUIRE(row.size() == 3);
        const double lambda = row[0], t = row[1], reference = row[2];
        const double zeta = c2_um / (lambda * solarith::constants::kelvin(t));
        const double tolerance = 1e-10 + c2_rounding * (1 + zeta);
        CAPTURE(lambda);
        CAPTURE(t);
        const double value = test::call("RAD_SPECTRAL", args(lambda, t));
        CHECK(value == test::rel(reference, tolerance));
        worst = std::max(worst, relative_error(value, reference));
        worst_over_tolerance = std::max(worst_over_tolerance, relative_error(value, reference) / tolerance);
    }
    MESSAGE("RAD_SPECTRAL vs astropy BlackBody: worst relative error " << worst << " ("
                                                                       << worst_over_tolerance << " of the tolerance)");

    // The evaluation itself, without the rounding of c1 and c2: the wavelength is
    // rescaled by k = c2/c2_exact so that c2/(lambda·T) equals astropy's, and the
    // result by k⁵·c1_exact/c1. Same table; tolerance 1e-13 + 4e-15·zeta relative
    // (exp(-zeta) turns each rounding of zeta into a relative error zeta·2.2e-16).
    const double k = c2_um / c2_exact_um;
    const double c1_exact = 2 * solarith::constants::pi * solarith::constants::planck
                            * solarith::constants::speed_of_light * solarith::constants::speed_of_light;
    const double rescale = std::pow(k, 5) * c1_exact / solarith::constants::first_radiation;
    double worst_evaluation = 0;
    for (const auto& row : test::read_table("radiation_planck.txt")) {
        const double lambda = row[0], t = row[1], reference = row[2];
        CAPTURE(lambda);
        CAPTURE(t);
        const double zeta = c2_um / (lambda * solarith::constants::kelvin(t));
        const double value = test::call("RAD_SPECTRAL", args(lambda * k, t)) * rescale;
        CHECK(value == test::rel(reference, 1e-13 + 4e-15 * zeta));
        worst_evaluation = std::max(worst_evaluation, relative_error(value, reference));
    }
    MESSAGE("RAD_SPECTRAL vs astropy at equal constants: worst relative error " << worst_evaluation);

    // Grey body: proportional to emissivity (definition).
    CHECK(test::call("RAD_SPECTRAL", "10; 25; 0.4") == test::rel(0.4 * test::call("RAD_SPECTRAL", "10; 25"), 1e-15));
    // Far tails stay finite and non-negative: exp(-c2/(lambda·T)) underflows to 0
    // (analytic limit), and Rayleigh–Jeans c1·T/(c2·lambda⁴) holds for lambda·T >> c2.
    CHECK(test::call("RAD_SPECTRAL", "0.01; -200") == 0.0);
    const double rj = solarith::constants::first_radiation * 1e24 * 1e7 / (c2_um * std::pow(1e5, 4));
    CHECK(test::call("RAD_SPECTRAL", args(1e5, 1e7 - 273.15)) == test::rel(rj, 1e-8));

    CHECK_REFUSED("RAD_SPECTRAL", "0; 25", "wavelength_um = 0 is outside the positive numbers");
    CHECK_REFUSED("RAD_SPECTRAL", "-1; 25", "wavelength_um = -1 is outside the positive numbers");
    CHECK_REFUSED("RAD_SPECTRAL", "10; -273.15", "T = -273.15 is outside temperatures above -273.15 °C");
    CHECK_REFUSED("RAD_SPECTRAL", "10; -300", "T = -300 is outside");
    CHECK_REFUSED("RAD_SPECTRAL", "10; 25; 1.5", "emissivity = 1.5 is outside 0..1");
    CHECK_REFUSED("RAD_SPECTRAL", "1e-300; 1e308", "not a finite number");
}

TEST_CASE("RAD_PEAK_WAVELENGTH: Wien's displacement law")
{
    // b = 2.897771955e-3 m·K, CODATA 2018 (scipy.constants.physical_constants
    // ["Wien wavelength displacement law constant"]): b/5778 K = 0.50151816 µm,
    // b/300 K = 9.65923985 µm.
    CHECK(test::call("RAD_PEAK_WAVELENGTH", "5504.85") == test::rel(0.5015181645898235, 1e-14));
    CHECK(test::call("RAD_PEAK_WAVELENGTH", "26.85") == test::rel(9.65923985, 1e-14));
    // Identity: RAD_SPECTRAL is largest at that wavelength (Planck's law has one maximum).
    for (double t : {-50.0, 25.0, 1000.0, 5504.85}) {
        const double peak = test::call("RAD_PEAK_WAVELENGTH", args(t));
        const double top = test::call("RAD_SPECTRAL", args(peak, t));
        CHECK(test::call("RAD_SPECTRAL", args(peak * (1 + 1e-4), t)) < top);
        CHECK(test::call("RAD_SPECTRAL", args(peak * (1 - 1e-4), t)) < top);
    }

    CHECK_REFUSED("RAD_PEAK_WAVELENGTH", "-273.15", "T = -273.15 is outside temperatures above -273.15 °C");
    CHECK_REFUSED("RAD_PEAK_WAVELENGTH", "-280", "T = -280 is outside");
}

TEST_CASE("RAD_BAND_FRACTION: against quadrature of Planck's law")
{
    // radiation_band_fraction.txt: scipy.integrate.quad of Planck's law below and
    // above each wavelength (tests/reference/gen_radiation.py). lambda·T from 150
    // to 1e6 µm·K, fractions down to 3e-37. Tolerance on each tail, relative:
    // 1e-12 + c2_rounding·(3 + zeta) (the tails vary like zeta³ and exp(-zeta)).
    const double far = 1e12;  // µm; the blackbody fraction beyond it is below 1e-30 here
    double worst = 0, worst_absolute = 0;
    for (const auto& row : test::read_table("radiation_band_fraction.txt")) {
        REQUIRE(row.size() == 4);
        const double lambda = row[0], t = row[1], below = row[2], above = row[3];
        const double zeta = c2_um / (lambda * solarith::constants::kelvin(t));
        const double tolerance = 1e-12 + c2_rounding * (3 + zeta);
        CAPTURE(lambda);
        CAPTURE(t);
        const double f_below = test::call("RAD_BAND_FRACTION", args(0, lambda, t));
        const double f_above = test::call("RAD_BAND_FRACTION", args(lambda, far, t));
        CHECK(f_below == test::rel(below, tolerance));
        CHECK(f_above == test::rel(above, tolerance));
        worst = std::max({worst, relative_error(f_below, below), relative_error(f_above, above)});
        worst_absolute = std::max({worst_absolute, std::abs(f_below - below), std::abs(f_above - above)});
    }
    MESSAGE("RAD_BAND_FRACTION vs scipy quad: worst relative error of a tail " << worst
                                                                                << ", worst absolute error " << worst_absolute);

    // The series themselves, without the rounding of c2: the wavelength is rescaled
    // so that c2/(lambda·T) equals the reference's, which leaves only the error of
    // the two series and of the quadrature. Same table; tolerance 1e-12 relative.
    double worst_series = 0;
    for (const auto& row : test::read_table("radiation_band_fraction.txt")) {
        const double lambda = row[0] * c2_um / c2_exact_um, t = row[1], below = row[2], above = row[3];
        CAPTURE(lambda);
        CAPTURE(t);
        const double f_below = test::call("RAD_BAND_FRACTION", args(0, lambda, t));
        const double f_above = test::call("RAD_BAND_FRACTION", args(lambda, far, t));
        CHECK(f_below == test::rel(below, 1e-12));
        CHECK(f_above == test::rel(above, 1e-12));
        worst_series = std::max({worst_series, relative_error(f_below, below), relative_error(f_above, above)});
    }
    MESSAGE("RAD_BAND_FRACTION series vs scipy quad at equal zeta: worst relative error of a tail " << worst_series);

    // Blackbody radiation function table, Incropera et al., Fundamentals of Heat and
    // Mass Transfer, 6th ed., Table 12.1 — values FROM MEMORY, 6 decimals. They lie
    // up to 2.1e-5 from the quadrature above (older constants or the table's own
    // series): tolerance 3e-5 absolute.
    const double t = 1000 - 273.15;  // 1000 K, so lambda in µm = lambda·T / 1000
    CHECK(std::abs(test::call("RAD_BAND_FRACTION", args(0, 1.0, t)) - 0.000321) <= 3e-5);
    CHECK(std::abs(test::call("RAD_BAND_FRACTION", args(0, 2.0, t)) - 0.066728) <= 3e-5);
    CHECK(std::abs(test::call("RAD_BAND_FRACTION", args(0, 2.898, t)) - 0.250108) <= 3e-5);
    CHECK(std::abs(test::call("RAD_BAND_FRACTION", args(0, 3.0, t)) - 0.273232) <= 3e-5);
    CHECK(std::abs(test::call("RAD_BAND_FRACTION", args(0, 4.0, t)) - 0.480877) <= 3e-5);
    CHECK(std::abs(test::call("RAD_BAND_FRACTION", args(0, 5.0, t)) - 0.633747) <= 3e-5);

    // Identities: the bands of a partition add up to 1 and bands are additive;
    // a band of zero width is 0 (definition of the integral).
    const double sun = 5504.85;
    const double parts = test::call("RAD_BAND_FRACTION", args(0, 0.38, sun))
                         + test::call("RAD_BAND_FRACTION", args(0.38, 0.78, sun))
                         + test::call("RAD_BAND_FRACTION", args(0.78, 1e9, sun));
    CHECK(parts == test::rel(1.0, 1e-15));
    CHECK(test::call("RAD_BAND_FRACTION", args(0.5, 0.5, sun)) == 0.0);
    // Across the switch between the two series (zeta = 0.3): continuous to 1e-15.
    const double switch_um = c2_um / (0.3 * 1000);
    CHECK(std::abs(test::call("RAD_BAND_FRACTION", args(0, switch_um * (1 - 1e-14), t))
                   - test::call("RAD_BAND_FRACTION", args(0, switch_um * (1 + 1e-14), t)))
          <= 1e-15);

    CHECK_REFUSED("RAD_BAND_FRACTION", "2; 1; 25", "wavelength2_um = 1 is outside wavelength1_um = 2 and above");
    CHECK_REFUSED("RAD_BAND_FRACTION", "-1; 1; 25", "wavelength1_um = -1 is outside the non-negative numbers");
    CHECK_REFUSED("RAD_BAND_FRACTION", "1; 2; -273.15", "T = -273.15 is outside temperatures above -273.15 °C");
    CHECK_REFUSED("RAD_BAND_FRACTION", "1; 2; -500", "T = -500 is outside");
}

TEST_CASE("RAD_EXCHANGE_PLATES and RAD_COEFF: grey parallel plates")
{
    // scipy.constants prints sigma to 10 digits (5.670374419e-8); the core
    // computes it from the exact h, c and k, 3.3e-11 higher. Hence 1e-10 below.
    // sigma·(T1⁴ - T2⁴)/(1/0.95 + 1/0.88 - 1) at 353.15 K and 303.15 K with
    // sigma from scipy.constants (CODATA 2018): 338.99418970 W/m²;
    // h_r = sigma·(T1² + T2²)(T1 + T2)/(...) = 6.7798837941 W/(m²·K).
    CHECK(test::call("RAD_EXCHANGE_PLATES", "80; 30; 0.95; 0.88") == test::rel(338.9941897026288, 1e-10));
    CHECK(test::call("RAD_COEFF", "80; 30; 0.95; 0.88") == test::rel(6.779883794052575, 1e-10));
    // Identity: h_r·(T1 - T2) = q (definition of the linearised coefficient).
    for (auto [t1, t2, e1, e2] :
         std::initializer_list<Quadruple>{{80.0, 30.0, 0.95, 0.88}, {-50.0, 600.0, 0.1, 0.7}, {20.0, 20.001, 1.0, 0.5}}) {
        const std::string a = args(t1, t2, e1, e2);
        CHECK(test::call("RAD_COEFF", a) * (t1 - t2) == test::rel(test::call("RAD_EXCHANGE_PLATES", a), 1e-14));
    }
    // Black plates: the difference of the two emissive powers (Stefan–Boltzmann).
    CHECK(test::call("RAD_EXCHANGE_PLATES", "300; 50; 1; 1")
          == test::rel(test::call("RAD_EMISSIVE", "300") - test::call("RAD_EMISSIVE", "50"), 1e-14));
    // Antisymmetric in the two plates (sign = direction).
    CHECK(test::call("RAD_EXCHANGE_PLATES", "30; 80; 0.88; 0.95") == test::rel(-338.9941897026288, 1e-10));
    // Close temperatures keep their digits: (T1⁴ - T2⁴) ≈ 4·T³·dT, with
    // 4·sigma·(323.15 K)³ = 7.653925113 W/(m²·K) (scipy sigma); the second-order term is 1.5·dT/T.
    CHECK(test::call("RAD_EXCHANGE_PLATES", "50.000001; 50; 1; 1") == test::rel(7.653925113225982e-6, 1e-8));
    CHECK(test::call("RAD_COEFF", "50; 50; 1; 1") == test::rel(7.653925113225982, 1e-10));
    // Perfect reflectors exchange nothing (limit of e1·e2/(e1 + e2 - e1·e2) from every direction).
    CHECK(test::call("RAD_EXCHANGE_PLATES", "80; 30; 0; 0.9") == 0.0);
    CHECK(test::call("RAD_EXCHANGE_PLATES", "80; 30; 0; 0") == 0.0);
    CHECK(test::call("RAD_COEFF", "80; 30; 0; 0") == 0.0);
    CHECK(test::call("RAD_COEFF", "-273.15; -273.15; 1; 1") == 0.0);

    for (const char* fn : {"RAD_EXCHANGE_PLATES", "RAD_COEFF"}) {
        CAPTURE(fn);
        CHECK_REFUSED(fn, "-274; 30; 0.9; 0.9", "T1 = -274 is outside -273.15 °C (absolute zero) and above");
        CHECK_REFUSED(fn, "80; -300; 0.9; 0.9", "T2 = -300 is outside -273.15 °C");
        CHECK_REFUSED(fn, "80; 30; 1.1; 0.9", "emissivity1 = 1.1 is outside 0..1");
        CHECK_REFUSED(fn, "80; 30; 0.9; -0.2", "emissivity2 = -0.2 is outside 0..1");
        CHECK_REFUSED(fn, "1e300; 30; 0.9; 0.9", "not a finite number");
    }
}

TEST_CASE("RAD_EXCHANGE_ENCLOSED: grey body inside a grey enclosure")
{
    // Incropera et al., Fundamentals of Heat and Mass Transfer, chapter 13 worked
    // example of a cryogenic tube (example number not recalled; data FROM MEMORY):
    // D1 = 20 mm at 77 K, e = 0.02, inside D2 = 50 mm at 300 K, e = 0.05, vacuum;
    // answer q' = -0.50 W/m (2 digits). Per m² of the inner tube times pi·D1:
    CHECK(std::abs(test::call("RAD_EXCHANGE_ENCLOSED", args(77 - 273.15, 300 - 273.15, 0.02, 0.05, 0.4))
                       * solarith::constants::pi * 0.02
                   + 0.50)
          <= 0.005);
    // Same case from the formula of Table 13.3 with scipy's sigma: -0.49884457 W/m.
    CHECK(test::call("RAD_EXCHANGE_ENCLOSED", args(77 - 273.15, 300 - 273.15, 0.02, 0.05, 0.4))
              * solarith::constants::pi * 0.02
          == test::rel(-0.4988445732619567, 1e-10));
    // Table 13.3 formula, scipy sigma: 80 °C / 20 °C, e 0.9 / 0.1, ratio 0.8 -> 55.731832318 W/m².
    CHECK(test::call("RAD_EXCHANGE_ENCLOSED", "80; 20; 0.9; 0.1; 0.8") == test::rel(55.73183231785651, 1e-10));
    // Limits: ratio 1 is the parallel-plate case; ratio 0 a small body in a large
    // room, e_inner·(E_b1 - E_b2) whatever the room's emissivity (Incropera Table 13.3).
    CHECK(test::call("RAD_EXCHANGE_ENCLOSED", "80; 20; 0.9; 0.1; 1")
          == test::rel(test::call("RAD_EXCHANGE_PLATES", "80; 20; 0.9; 0.1"), 1e-14));
    const double small_body = test::call("RAD_EMISSIVE", "80; 0.9") - test::call("RAD_EMISSIVE", "20; 0.9");
    CHECK(test::call("RAD_EXCHANGE_ENCLOSED", "80; 20; 0.9; 0.1; 0") == test::rel(small_body, 1e-13));
    CHECK(test::call("RAD_EXCHANGE_ENCLOSED", "80; 20; 0.9; 0; 0") == test::rel(small_body, 1e-13));
    // Continuity towards ratio 0 for an enclosure that is not a perfect reflector.
    CHECK(test::call("RAD_EXCHANGE_ENCLOSED", "80; 20; 0.9; 0.1; 1e-12") == test::rel(small_body, 1e-10));
    // Perfect reflectors exchange nothing once the enclosure is finite.
    CHECK(test::call("RAD_EXCHANGE_ENCLOSED", "80; 20; 0; 0; 0.5") == 0.0);
    CHECK(test::call("RAD_EXCHANGE_ENCLOSED", "80; 20; 0.9; 0; 0.5") == 0.0);

    CHECK_REFUSED("RAD_EXCHANGE_ENCLOSED", "-274; 20; 0.9; 0.1; 0.5", "T_inner = -274 is outside -273.15 °C");
    CHECK_REFUSED("RAD_EXCHANGE_ENCLOSED", "80; -274; 0.9; 0.1; 0.5", "T_outer = -274 is outside -273.15 °C");
    CHECK_REFUSED("RAD_EXCHANGE_ENCLOSED", "80; 20; 1.2; 0.1; 0.5", "emissivity_inner = 1.2 is outside 0..1");
    CHECK_REFUSED("RAD_EXCHANGE_ENCLOSED", "80; 20; 0.9; -1; 0.5", "emissivity_outer = -1 is outside 0..1");
    CHECK_REFUSED("RAD_EXCHANGE_ENCLOSED", "80; 20; 0.9; 0.1; 1.5", "area_ratio_inner_to_outer = 1.5 is outside 0..1");
    CHECK_REFUSED("RAD_EXCHANGE_ENCLOSED", "80; 20; 0.9; 0.1; -0.5", "area_ratio_inner_to_outer = -0.5 is outside 0..1");
}

TEST_CASE("RAD_SKY_TEMP: Swinbank and Berdahl–Martin")
{
    // Swinbank (1963) as in Duffie & Beckman (2013) §3.9: 0.0552·T_air^1.5 (K),
    // evaluated with Python: 20 °C -> 3.9100610 °C, -10 °C -> -37.5126450 °C.
    CHECK(test::call("RAD_SKY_TEMP", "20") == test::rel(3.9100610048827775, 1e-13));
    CHECK(test::call("RAD_SKY_TEMP", "-10") == test::rel(-37.51264496236311, 1e-13));
    // Berdahl & Martin (1984) as in Duffie & Beckman (2013) §3.9, hourly term
    // omitted, evaluated with Python: eps_sky = 0.711 + 0.56·0.1 + 0.73·0.01 =
    // 0.7743 at T_dp = 10 °C -> 1.8401978 °C at T_air = 20 °C; 30/20 -> 18.1181216;
    // 0/-20 -> -29.9712130 (both ends of the dew-point range).
    CHECK(test::call("RAD_SKY_TEMP", "20; 10") == test::rel(1.84019775743144, 1e-12));
    CHECK(test::call("RAD_SKY_TEMP", "30; 20") == test::rel(18.118121602475867, 1e-13));
    CHECK(test::call("RAD_SKY_TEMP", "0; -20") == test::rel(-29.971212977828316, 1e-13));
    CHECK(test::call("RAD_SKY_TEMP", "25; 25") == test::rel(16.97658404058683, 1e-13));
    // At T_dp = 0 the clear-sky emissivity is the constant 0.711 (the correlation itself).
    CHECK(test::call("RAD_SKY_TEMP", "15; 0") == test::rel((15 + 273.15) * std::pow(0.711, 0.25) - 273.15, 1e-14));
    // An omitted dew point selects Swinbank (the design contract).
    CHECK(test::call("RAD_SKY_TEMP", "20;") == test::call("RAD_SKY_TEMP", "20"));

    CHECK_REFUSED("RAD_SKY_TEMP", "-41", "T_air = -41 is outside -40..50");
    CHECK_REFUSED("RAD_SKY_TEMP", "55; 10", "T_air = 55 is outside -40..50");
    CHECK_REFUSED("RAD_SKY_TEMP", "20; -25", "T_dewpoint = -25 is outside -20..30");
    CHECK_REFUSED("RAD_SKY_TEMP", "40; 31", "T_dewpoint = 31 is outside -20..30");
    CHECK_REFUSED("RAD_SKY_TEMP", "15; 16", "T_dewpoint = 16 is outside values up to T_air = 15");
    CHECK_REFUSED("RAD_SKY_TEMP", "-300", "T_air = -300 is outside -40..50");
}

TEST_CASE("RAD_VF_PARALLEL_RECT: aligned parallel rectangles")
{
    // radiation_vf_parallel.txt: scipy dblquad of the point-to-rectangle factor over
    // surface 1 (tests/reference/gen_radiation.py). Tolerance 1e-11 relative.
    double worst = 0;
    for (const auto& row : test::read_table("radiation_vf_parallel.txt")) {
        REQUIRE(row.size() == 4);
        CAPTURE(row[0]);
        CAPTURE(row[1]);
        CAPTURE(row[2]);
        const double value = test::call("RAD_VF_PARALLEL_RECT", args(row[0], row[1], row[2]));
        CHECK(value == test::rel(row[3], 1e-11));
        worst = std::max(worst, relative_error(value, row[3]));
    }
    MESSAGE("RAD_VF_PARALLEL_RECT vs scipy dblquad: worst relative error " << worst);

    // Unit squares one unit apart: the well-known 0.1998 (from memory); Incropera's
    // Table 13.2 closed form evaluated in Python gives 0.19982489569838746.
    CHECK(test::call("RAD_VF_PARALLEL_RECT", "1; 1; 1") == test::rel(0.19982489569838746, 1e-14));
    // Symmetric in width and length, and scale-free (geometry).
    CHECK(test::call("RAD_VF_PARALLEL_RECT", "3; 0.2; 1") == test::rel(test::call("RAD_VF_PARALLEL_RECT", "0.2; 3; 1"), 1e-15));
    CHECK(test::call("RAD_VF_PARALLEL_RECT", "3e-3; 2e-4; 1e-3") == test::rel(test::call("RAD_VF_PARALLEL_RECT", "3; 0.2; 1"), 1e-14));
    // Limits. Far apart: point to area, A/(pi·gap²)·(1 - O((size/gap)²)).
    CHECK(test::call("RAD_VF_PARALLEL_RECT", "1e-4; 2e-4; 1") == test::rel(2e-8 / solarith::constants::pi, 1e-7));
    // Gap -> 0: F -> 1 (all of surface 1's view is surface 2), approached from below.
    const double touching = test::call("RAD_VF_PARALLEL_RECT", "1; 1; 1e-9");
    CHECK(touching < 1.0);
    CHECK(touching == test::rel(1.0, 1e-8));
    // Two-dimensional limit (Hottel's crossed strings): for an infinitely long
    // pair of strips of width w at gap L, F = sqrt(1 + (L/w)²) - L/w.
    CHECK(test::call("RAD_VF_PARALLEL_RECT", "1; 1e9; 1") == test::rel(std::sqrt(2.0) - 1, 1e-8));
    // The series (min ratio < 0.015) and the closed form agree across the switch.
    CHECK(test::call("RAD_VF_PARALLEL_RECT", args(0.015 * (1 - 1e-12), 2, 1))
          == test::rel(test::call("RAD_VF_PARALLEL_RECT", args(0.015 * (1 + 1e-12), 2, 1)), 1e-11));
    // Never outside 0..1 at the ends of the accepted ratios.
    for (const char* a : {"1e-12; 1e-12; 1", "1e-12; 1e12; 1", "1e12; 1e12; 1", "1; 1e-12; 1"}) {
        const double f = test::call("RAD_VF_PARALLEL_RECT", a);
        CHECK(f >= 0.0);
        CHECK(f <= 1.0);
    }

    CHECK_REFUSED("RAD_VF_PARALLEL_RECT", "-1; 1; 1", "width = -1 is outside the positive numbers");
    CHECK_REFUSED("RAD_VF_PARALLEL_RECT", "1; 0; 1", "length = 0 is outside the positive numbers");
    CHECK_REFUSED("RAD_VF_PARALLEL_RECT", "1; 1; 0", "gap = 0 is outside the positive numbers");
    CHECK_REFUSED("RAD_VF_PARALLEL_RECT", "1; 1; 1e-13", "width/gap = 1e+13 is outside 1e-12..1e+12");
    CHECK_REFUSED("RAD_VF_PARALLEL_RECT", "1; 1e-13; 1", "length/gap = 1e-13 is outside 1e-12..1e+12");
}

TEST_CASE("RAD_VF_PERPENDICULAR_RECT: perpendicular rectangles with a common edge")
{
    // radiation_vf_perpendicular.txt: scipy dblquad of the point-to-perpendicular-
    // rectangle factor over surface 1 (tests/reference/gen_radiation.py). 1e-11 relative.
    double worst = 0;
    for (const auto& row : test::read_table("radiation_vf_perpendicular.txt")) {
        REQUIRE(row.size() == 4);
        CAPTURE(row[0]);
        CAPTURE(row[1]);
        CAPTURE(row[2]);
        const double value = test::call("RAD_VF_PERPENDICULAR_RECT", args(row[0], row[1], row[2]));
        CHECK(value == test::rel(row[3], 1e-11));
        worst = std::max(worst, relative_error(value, row[3]));
    }
    MESSAGE("RAD_VF_PERPENDICULAR_RECT vs scipy dblquad: worst relative error " << worst);

    // Adjacent faces of a cube: the well-known 0.2000 (from memory); Incropera's
    // Table 13.2 closed form evaluated in Python gives 0.20004377607540316.
    CHECK(test::call("RAD_VF_PERPENDICULAR_RECT", "1; 1; 1") == test::rel(0.20004377607540316, 1e-14));
    // Summation rule inside a closed box X × Y × Z (view-factor algebra): from the
    // X × Y floor to the ceiling and the four walls, the factors add up to 1.
    for (const Triple& box : std::initializer_list<Triple>{{1.0, 1.0, 1.0}, {2.0, 0.3, 5.0}, {1e-3, 40.0, 0.7}, {3.0, 3.0, 1e-4}}) {
        // Plain variables, not structured bindings: clang 14's lambdas (in INFO) cannot capture those.
        const double x = std::get<0>(box), y = std::get<1>(box), z = std::get<2>(box);
        INFO("box " << x << " x " << y << " x " << z);
        const double sum = test::call("RAD_VF_PARALLEL_RECT", args(x, y, z))
                           + 2 * test::call("RAD_VF_PERPENDICULAR_RECT", args(x, y, z))
                           + 2 * test::call("RAD_VF_PERPENDICULAR_RECT", args(y, x, z));
        CHECK(sum == test::rel(1.0, 1e-12));
    }
    // Reciprocity A1·F12 = A2·F21 (view-factor algebra), out to the accepted ratio limits.
    for (const auto& widths : std::initializer_list<std::pair<double, double>>{{0.3, 2.0}, {1e-9, 1.0}, {1e9, 1e-9}, {1e-12, 1e12}, {1e12, 1e12}}) {
        const double w1 = widths.first, w2 = widths.second;
        INFO("w1 = " << w1 << ", w2 = " << w2);
        CHECK(w1 * test::call("RAD_VF_PERPENDICULAR_RECT", args(1, w1, w2))
              == test::rel(w2 * test::call("RAD_VF_PERPENDICULAR_RECT", args(1, w2, w1)), 1e-12));
    }
    // Limits. Long common edge: Hottel's crossed strings in two dimensions,
    // F12 = (w1 + w2 - sqrt(w1² + w2²))/(2·w1), approached to O(w/edge).
    CHECK(test::call("RAD_VF_PERPENDICULAR_RECT", "1e8; 1; 3") == test::rel((4 - std::sqrt(10.0)) / 2, 1e-6));
    // A narrow strip along the edge facing a very wide plane sees half of it (symmetry).
    CHECK(test::call("RAD_VF_PERPENDICULAR_RECT", "1; 1e-9; 1e9") == test::rel(0.5, 1e-7));
    // Never outside 0..1 at the ends of the accepted ratios.
    for (const char* a : {"1; 1e-12; 1e-12", "1; 1e-12; 1e12", "1; 1e12; 1e-12", "1; 1e12; 1e12"}) {
        const double f = test::call("RAD_VF_PERPENDICULAR_RECT", a);
        CHECK(f >= 0.0);
        CHECK(f <= 1.0);
    }

    CHECK_REFUSED("RAD_VF_PERPENDICULAR_RECT", "0; 1; 1", "common_edge = 0 is outside the positive numbers");
    CHECK_REFUSED("RAD_VF_PERPENDICULAR_RECT", "1; -2; 1", "width1 = -2 is outside the positive numbers");
    CHECK_REFUSED("RAD_VF_PERPENDICULAR_RECT", "1; 1; -1", "width2 = -1 is outside the positive numbers");
    CHECK_REFUSED("RAD_VF_PERPENDICULAR_RECT", "1e-13; 1; 1", "width1/common_edge = 1e+13 is outside 1e-12..1e+12");
    CHECK_REFUSED("RAD_VF_PERPENDICULAR_RECT", "1; 1; 1e-13", "width2/common_edge = 1e-13 is outside 1e-12..1e+12");
}

TEST_CASE("RAD_VF_COAXIAL_DISKS: coaxial parallel disks")
{
    // radiation_vf_disks.txt: scipy quad of the point-to-disk factor over the radius of
    // disk 1 (tests/reference/gen_radiation.py). Tolerance 1e-12 relative.
    double worst = 0;
    for (const auto& row : test::read_table("radiation_vf_disks.txt")) {
        REQUIRE(row.size() == 4);
        CAPTURE(row[0]);
        CAPTURE(row[1]);
        CAPTURE(row[2]);
        const double value = test::call("RAD_VF_COAXIAL_DISKS", args(row[0], row[1], row[2]));
        CHECK(value == test::rel(row[3], 1e-12));
        worst = std::max(worst, relative_error(value, row[3]));
    }
    MESSAGE("RAD_VF_COAXIAL_DISKS vs scipy quad: worst relative error " << worst);

    // Equal disks with radius = gap: (3 - sqrt 5)/2 (Incropera Table 13.2 formula, S = 3).
    CHECK(test::call("RAD_VF_COAXIAL_DISKS", "1; 1; 1") == test::rel((3 - std::sqrt(5.0)) / 2, 1e-15));
    // Incropera's form 0.5·(S - sqrt(S² - 4·(r2/r1)²)) where it does not cancel.
    for (auto [r1, r2, l] : std::initializer_list<Triple>{{0.5, 1.0, 1.0}, {2.0, 0.7, 0.3}, {1.0, 3.0, 2.0}}) {
        const double s = 1 + (1 + (r2 / l) * (r2 / l)) / ((r1 / l) * (r1 / l));
        const double incropera = 0.5 * (s - std::sqrt(s * s - 4 * (r2 / r1) * (r2 / r1)));
        CHECK(test::call("RAD_VF_COAXIAL_DISKS", args(r1, r2, l)) == test::rel(incropera, 1e-13));
    }
    // Reciprocity r1²·F12 = r2²·F21 (view-factor algebra).
    for (auto [r1, r2, l] : std::initializer_list<Triple>{{0.5, 1.0, 1.0}, {1e-6, 1e6, 1.0}, {3.0, 0.01, 1e-5}}) {
        CHECK(r1 * r1 * test::call("RAD_VF_COAXIAL_DISKS", args(r1, r2, l))
              == test::rel(r2 * r2 * test::call("RAD_VF_COAXIAL_DISKS", args(r2, r1, l)), 1e-13));
    }
    // Limits: gap -> 0 gives 1 when disk 2 covers disk 1, (r2/r1)² otherwise;
    // far apart, point to disk: r2²/gap² (the view-factor integral with both cosines 1).
    CHECK(test::call("RAD_VF_COAXIAL_DISKS", "1; 2; 1e-9") == test::rel(1.0, 1e-15));
    CHECK(test::call("RAD_VF_COAXIAL_DISKS", "2; 1; 1e-9") == test::rel(0.25, 1e-15));
    CHECK(test::call("RAD_VF_COAXIAL_DISKS", "1e-3; 2e-3; 1") == test::rel(4e-6, 1e-5));
    // No overflow or loss at extreme sizes (scale-free).
    CHECK(test::call("RAD_VF_COAXIAL_DISKS", "1e200; 1e200; 1e200") == test::rel((3 - std::sqrt(5.0)) / 2, 1e-15));
    CHECK(test::call("RAD_VF_COAXIAL_DISKS", "1e-200; 1e-200; 1e-200") == test::rel((3 - std::sqrt(5.0)) / 2, 1e-15));

    CHECK_REFUSED("RAD_VF_COAXIAL_DISKS", "0; 1; 1", "radius1 = 0 is outside the positive numbers");
    CHECK_REFUSED("RAD_VF_COAXIAL_DISKS", "1; -1; 1", "radius2 = -1 is outside the positive numbers");
    CHECK_REFUSED("RAD_VF_COAXIAL_DISKS", "1; 1; -0.5", "gap = -0.5 is outside the positive numbers");
}
