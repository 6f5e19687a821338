// Hourly simulation of a year of a solar domestic hot-water system (SIM_YEAR):
// flat-plate collector loop, stratified storage tank, hot-water draw with an
// in-line auxiliary heater.
//
// Units: temperatures in °C, irradiance in W/m², incidence angles in degrees,
// flows in kg/s (collector loop, per m² of collector: kg/(s·m²)) and kg/h
// (hot-water draw), heat flows in W, energies in J inside the model (the
// catalogue reports kWh, as the trade does).
//
// The system (a direct system: the tank water itself flows through the
// collector; no heat exchanger, no antifreeze):
//
//   collector --(return, T_co)--> tank node nearest in temperature
//   tank bottom --(pump, ṁ_c)--> collector
//   cold water (T_cold) --> tank bottom;  tank top --> tempering valve --> in-line heater --> taps at T_set
//
// Sources (section numbers from memory of the printed books; the lead should
// check them against the copy at hand):
//   [D&B]  J.A. Duffie, W.A. Beckman, Solar Engineering of Thermal Processes,
//          4th ed., Wiley, 2013: §6.17 (incidence angle modifier), §8.4
//          (stratified storage: the multi-node tank with fully mixed nodes,
//          collector return entering the highest node that is not warmer
//          than itself, flows between nodes, losses per node, and mixing of
//          temperature inversions), ch. 10 (controls: on/off hysteresis of
//          the collector pump on the collector-minus-tank temperature
//          difference).
//   [KBK]  S.A. Kleinbach, W.A. Beckman, S.A. Klein, Performance study of
//          one-dimensional models for stratified thermal storage tanks,
//          Solar Energy 50 (1993) 155–166 — the multi-node model and its
//          comparison with measured tanks (from memory).
//   [9806] EN ISO 9806:2017, collector efficiency on the mean fluid
//          temperature, η = η0·K − a1·(Tm − Ta)/G − a2·(Tm − Ta)²/G.
//   [IF97] IAPWS R7-97(2012), density and specific heat of liquid water.
#pragma once

#include <array>
#include <cstddef>
#include <optional>
#include <vector>

namespace solarith::simulation {

inline constexpr std::size_t hours_per_year = 8760;
// The non-leap year, starting 1 January 00:00.
inline constexpr std::array<int, 12> days_in_month = {31, 28, 31, 30, 31, 30, 31, 31, 30, 31, 30, 31};

// Hourly inputs, hours_per_year values each (hour 0 = 1 January 00:00–01:00);
// each value holds for the whole hour.
struct Hourly {
    std::vector<double> t_ambient;      // °C, air around the collector, -90..60
    std::vector<double> irradiance;     // W/m², total on the collector plane, 0..1500
    std::vector<double> incidence_deg;  // °, beam incidence on the collector, 0..180; empty: modifier 1
    std::vector<double> draw;           // kg/h, hot water drawn, >= 0
    std::vector<double> t_cold;         // °C, cold (mains) water, 0..t_set
};

// Collector and its loop, tested on the mean fluid temperature [9806].
struct Collector {
    double area;           // m², >= 0 (0: no collector)
    double eta0;           // –, 0..1
    double a1;             // W/(m²·K), >= 0
    double a2;             // W/(m²·K²), >= 0
    double b0;             // –, incidence angle modifier K = 1 − b0·(1/cosθ − 1) [D&B §6.17], 0..1
    double flow_per_area;  // kg/(s·m²), collector-loop flow when the pump runs, > 0 .. 0.1
};

struct Tank {
    double volume;          // m³, 0 < V <= 1e5
    double height;          // m, 0.05..100 (a vertical cylinder)
    double ua;              // W/K, >= 0, whole tank
    double nodes;           // integer 1..50 (a double so that 2.5 can be refused with its value)
    double t_set;           // °C, delivery set-point, 10..95
    double t_surroundings;  // °C, around the tank, -90..60
};

struct Controls {
    double dt_on = 7;    // K, pump starts when T_stagnation − T_bottom >= dt_on
    double dt_off = 2;   // K, a running pump stops when T_out − T_bottom < dt_off; 0 <= dt_off <= dt_on <= 50
    double t_max = 95;   // °C, the pump stops while the tank top is at or above t_max; t_set..100
};

struct Month {
    double collector = 0;  // J, heat the collector loop brought into the tank
    double demand = 0;     // J, draw heated from T_cold to T_set
    double auxiliary = 0;  // J, in-line heater
    double loss = 0;       // J, tank to its surroundings (negative when the surroundings are warmer)
    double drawn = 0;      // J, heat drawn from the tank: draw × cp × (T_top − T_cold), tempered
    double pump_seconds = 0;
    double t_top_max = 0;  // °C, highest tank-top temperature at the end of any sub-step
    double stored_end = 0; // J, heat in the tank at the month's end, relative to 0 °C
};

struct Hour {
    double t_top;        // °C, at the end of the hour
    double t_bottom;     // °C, at the end of the hour
    double collector_w;  // W, mean over the hour
    double auxiliary_w;  // W, mean over the hour
    double drawn_w;      // W, mean over the hour, heat drawn from the tank
};

struct Year {
    std::array<Month, 12> months;
    std::vector<Hour> hours;  // hours_per_year
    double stored_start;      // J, relative to 0 °C
    double density;           // kg/m³ used for the tank mass
    double cp;                // J/(kg·K) used throughout
};

// Outlet temperature of the collector with the pump running, °C, from
//   A·(η0·K·G − a1·x − a2·x²) = ṁ·cp·(T_out − T_in),  x = (T_in + T_out)/2 − Ta,
// i.e. with T_out = 2·(x + Ta) − T_in the quadratic
//   A·a2·x² + (A·a1 + 2·ṁ·cp)·x − (A·η0·K·G + 2·ṁ·cp·(T_in − Ta)) = 0,
// solved in closed form by its root x = 2c/(b + √(b² + 4·a·c)) (the one that
// becomes the linear solution as a2 → 0, written without cancellation).
// Nothing when the quadratic has no real root (a collector so much colder
// than the air that the curve has no steady state; such a collector cannot
// deliver heat and the pump stays off). `capacity_rate` = ṁ·cp > 0 W/K,
// `absorbed` = K·G W/m². No checks: simulate_year checks its inputs.
std::optional<double> collector_outlet(const Collector& collector, double t_in, double t_ambient, double absorbed,
                                       double capacity_rate);

// Density and specific heat of the water, constant over the year: liquid
// water at 101325 Pa [IF97] at the mean of the set-point and the annual mean
// cold-water temperature, the middle of the tank's working range.
double property_temperature(const Hourly& hourly, const Tank& tank);

// The year, hour by hour (see the catalogue's method text of SIM_YEAR for the
// model in words). Every input is checked; messages name SIM_YEAR and the
// catalogue's arguments (weather, load, collector, tank, controls).
//
// Model:
// - Tank: N fully mixed nodes of equal mass ρ·V/N stacked from top (1) to
//   bottom (N) [D&B §8.4, KBK]. The loss coefficient UA is shared by
//   surface: the cylinder of diameter D = √(4V/(πH)) has the side π·D·H,
//   split equally, and the ends π·D²/4, one on the top node and one on the
//   bottom node (one node takes all).
// - The collector return enters the highest node not warmer than itself
//   [D&B §8.4] and the same mass leaves the bottom to the collector; cold
//   water enters the bottom and the same mass leaves the top. Between nodes
//   the net flow carries the temperature of the node it leaves (upwind).
// - Draw: a tempering valve mixes tank water down to T_set when the top is
//   hotter (the tank then gives draw·(T_set − T_cold)/(T_top − T_cold)); when
//   the top is colder than T_set the in-line heater lifts the whole draw to
//   T_set (auxiliary = draw·cp·(T_set − T_top)). So demand = drawn + auxiliary
//   at every instant (common practice: a thermostatic mixing valve after a
//   solar tank).
// - Pump (a differential controller with hysteresis, its sensor at the
//   collector outlet): with the pump off the collector stands at its
//   stagnation temperature (where its efficiency curve reaches 0; the
//   collector has no thermal mass here) and the pump starts when that is at
//   least dt_on above T_bottom; with the pump running the sensor reads the
//   outlet, T_out (inlet at T_bottom), and the pump runs while
//   T_out − T_bottom >= dt_off. A start whose flowing outlet would already be
//   below the off-difference does not happen (the controller would stop at
//   once), so the collector loop never brings heat out of the tank. Off
//   while the tank top is at or above t_max.
// - Time: each hour is split into sub-steps. The pump decision is taken at
//   the start of each sub-step. A sub-step lasts at most the time in which
//   the flows entering a node (collector + draw) equal the node's mass, and
//   the hour when nothing flows: with this limit the explicit (Euler)
//   update of the flows is a weighted mean of temperatures present in the
//   step, so it cannot overshoot. The losses are then applied exactly for
//   the sub-step, T ← T_s + (T − T_s)·exp(−UA_i·Δt/(m_i·cp)), and remaining
//   temperature inversions are mixed to their mean (pool-adjacent-violators,
//   energy-conserving). More than 1000 sub-steps per hour (flows turning a
//   node over more than 1000 times an hour) is refused as outside the
//   scheme's range.
// - Energy accounting: every term is the change of the node temperatures it
//   causes, so collector − loss − drawn = change of stored heat holds to
//   rounding.
// - Initial state: the whole tank at the cold-water temperature of the first
//   hour (no free heat credited to the solar system).
// - A node below 0 °C (possible only with surroundings below 0 °C) is
//   refused: freezing is not modelled. Above 100 °C the water is taken as
//   liquid (a pressurised tank).
Year simulate_year(const Hourly& hourly, const Collector& collector, const Tank& tank, const Controls& controls);

}  // namespace solarith::simulation
