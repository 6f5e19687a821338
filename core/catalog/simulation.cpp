// Catalogue entry of the system simulation (SIM_YEAR), family "System sizing".
#include "solarith/catalog.hpp"
#include "solarith/errors.hpp"
#include "solarith/simulation.hpp"

#include <algorithm>
#include <cctype>
#include <string>

namespace solarith::catalog {

namespace {

namespace sim = solarith::simulation;
constexpr const char* fn = "SIM_YEAR";
constexpr double joules_per_kwh = 3.6e6;

enum Argument : std::size_t { weather, load, collector, tank, controls, output };

// A block of hours_per_year rows and the given columns.
Args::Matrix hourly_block(const Args& a, std::size_t index, const char* name, std::size_t min_columns,
                          std::size_t max_columns, const char* layout)
{
    Args::Matrix m = a.matrix(index);
    if (m.rows != sim::hours_per_year)
        fail_domain(fn, std::string(name) + " has " + std::to_string(m.rows) + " rows; 8760 are expected, one per "
                            "hour of the year from 1 January 00:00");
    if (m.columns < min_columns || m.columns > max_columns)
        fail_domain(fn, std::string(name) + " has " + std::to_string(m.columns) + " columns; expected: " + layout);
    return m;
}

// A parameter list: exactly `count` cells in one row or one column.
std::vector<double> parameter_list(const Args& a, std::size_t index, const char* name, std::size_t count,
                                   const char* layout)
{
    const Args::Matrix m = a.matrix(index);
    if (m.cells.size() != count || (m.rows != 1 && m.columns != 1))
        fail_domain(fn, std::string(name) + " is a range of " + std::to_string(m.rows) + "x" + std::to_string(m.columns)
                            + " cells; " + std::to_string(count) + " cells in one row or column are expected: "
                            + layout);
    return m.cells;
}

std::vector<double> column(const Args::Matrix& m, std::size_t c)
{
    std::vector<double> out(m.rows);
    for (std::size_t r = 0; r < m.rows; ++r)
        out[r] = m.at(r, c);
    return out;
}

bool same_text(std::string a, const char* b)
{
    for (auto& ch : a)
        ch = static_cast<char>(std::tolower(static_cast<unsigned char>(ch)));
    return a == b;
}

Value kwh(double joules)
{
    return Value::of(joules / joules_per_kwh);
}

std::vector<Value> month_row(Value label, const sim::Month& m)
{
    const double demand_kwh = m.demand / joules_per_kwh;
    // demand = drawn + auxiliary (see simulation.hpp); no demand leaves the fraction undefined.
    Value fraction = demand_kwh > 0 ? Value::of(1 - m.auxiliary / m.demand) : Value::of(std::string("no demand"));
    return {std::move(label), kwh(m.collector), kwh(m.demand),      kwh(m.auxiliary),
            kwh(m.loss),      std::move(fraction), Value::of(m.pump_seconds / 3600), Value::of(m.t_top_max)};
}

Table monthly_table(const sim::Year& y)
{
    Table table;
    sim::Month year_total;
    year_total.t_top_max = y.months.front().t_top_max;
    for (std::size_t i = 0; i < y.months.size(); ++i) {
        const sim::Month& m = y.months[i];
        table.push_back(month_row(Value::of(static_cast<double>(i + 1)), m));
        year_total.collector += m.collector;
        year_total.demand += m.demand;
        year_total.auxiliary += m.auxiliary;
        year_total.loss += m.loss;
        year_total.pump_seconds += m.pump_seconds;
        year_total.t_top_max = std::max(year_total.t_top_max, m.t_top_max);
    }
    table.push_back(month_row(Value::of(std::string("year")), year_total));
    return table;
}

Table hourly_table(const sim::Year& y)
{
    Table table;
    table.reserve(y.hours.size());
    for (const sim::Hour& h : y.hours)
        table.push_back({Value::of(h.t_top), Value::of(h.t_bottom), Value::of(h.collector_w),
                         Value::of(h.auxiliary_w), Value::of(h.drawn_w)});
    return table;
}

Result sim_year(const Args& a)
{
    const std::string shape = a.text(output);
    const bool hourly_output = same_text(shape, "hourly");
    if (!hourly_output && !same_text(shape, "monthly"))
        fail_domain(fn, "output is \"" + shape + "\"; \"monthly\" or \"hourly\" is expected");

    const Args::Matrix w = hourly_block(a, weather, "weather", 2, 3,
                                        "2 or 3 (ambient temperature, irradiance, [incidence angle])");
    const Args::Matrix l = hourly_block(a, load, "load", 2, 2, "2 (hot-water draw, cold-water temperature)");
    const auto c = parameter_list(a, collector, "collector", 6, "area, eta0, a1, a2, IAM b0, flow per m²");
    const auto t = parameter_list(a, tank, "tank", 6,
                                  "volume, height, UA, nodes, set-point, temperature around the tank");
    sim::Controls k;
    if (!a.omitted(controls)) {
        const auto v = parameter_list(a, controls, "controls", 3,
                                      "on-difference, off-difference, maximum tank temperature");
        k = {v[0], v[1], v[2]};
    }

    sim::Hourly h;
    h.t_ambient = column(w, 0);
    h.irradiance = column(w, 1);
    if (w.columns == 3)
        h.incidence_deg = column(w, 2);
    h.draw = column(l, 0);
    h.t_cold = column(l, 1);

    const sim::Year y = sim::simulate_year(h, {c[0], c[1], c[2], c[3], c[4], c[5]},
                                           {t[0], t[1], t[2], t[3], t[4], t[5]}, k);
    return hourly_output ? hourly_table(y) : monthly_table(y);
}

}  // namespace

std::vector<FunctionSpec> simulation_functions()
{
    return {
        {"SIM_YEAR", "System sizing",
         "An hourly year of a solar hot-water system (flat-plate collector, pumped loop, stratified tank, "
         "in-line auxiliary heater) in one array formula: 13 rows (12 months and the year) x 8 columns of "
         "energies in kWh, or 8760 hourly rows x 5 columns.",
         "table: month; collector kWh; demand kWh; auxiliary kWh; tank loss kWh; solar fraction –; pump h; "
         "max tank top °C (hourly: tank top °C; tank bottom °C; collector W; auxiliary W; draw-off W)",
         ResultKind::Table,
         "Hourly simulation of a direct solar domestic hot-water system over a non-leap year of 8760 hours from "
         "1 January 00:00. Collector: EN ISO 9806:2017 efficiency curve on the mean fluid temperature, "
         "η0·K·G − a1·(Tm − Ta) − a2·(Tm − Ta)², K = 1 − b0·(1/cosθ − 1) (0 past its cut-off and for θ >= 90°; "
         "Duffie & Beckman, Solar Engineering of Thermal Processes, 4th ed., 2013, §6.17), no thermal mass; the "
         "outlet from the energy balance ṁ·cp·(T_out − T_in) = gain, solved in closed form (quadratic in Tm). "
         "Tank: the multi-node model of fully mixed nodes (Duffie & Beckman §8.4; Kleinbach, Beckman & Klein, "
         "Solar Energy 50, 1993, 155–166): N equal nodes of a vertical cylinder, the collector return entering "
         "the highest node not warmer than itself, the collector drawing from the bottom, cold water entering "
         "the bottom and hot water leaving the top, upwind flows between nodes, UA shared by node surface (side "
         "equally, one end each on the top and bottom node), temperature inversions mixed to their mean. Draw: "
         "a tempering valve limits the water taken from the tank to what reaches the set-point; an in-line "
         "heater lifts water below the set-point to it (auxiliary). Pump: a differential controller with "
         "hysteresis, sensor at the collector outlet: it starts when the standing collector (at its stagnation "
         "temperature, where the curve reaches 0) is at least the on-difference above the tank bottom, runs while "
         "the outlet with flow (inlet at the tank bottom) is at least the off-difference above it, and stops "
         "while the tank top is at or above the maximum. Time: sub-steps of at most one node mass of inflow (explicit Euler, no overshoot), losses "
         "integrated exactly per sub-step; collector − loss − drawn equals the change of stored heat. Water: "
         "constant ρ and cp of IAPWS-IF97 at 101325 Pa at the mean of the set-point and the mean cold-water "
         "temperature. Start: the whole tank at the cold-water temperature of hour 1. Energies in kWh as the "
         "trade reports them; solar fraction 1 − auxiliary/demand, the share of the demand the tank met (it includes heat "
         "the tank gains from surroundings warmer than the cold water; the text \"no demand\" for a month "
         "without demand). Not modelled: collector and pipe heat capacity and pipe losses, heat exchangers, freezing "
         "(refused when the tank would fall below 0 °C), boiling. Valid for: ambient -90..60 °C, irradiance "
         "0..1500 W/m², incidence 0..180°, draw >= 0, cold water 0..set-point, area >= 0, η0 and b0 0..1, a1, a2 "
         ">= 0, flow 0 < ṁ <= 0.1 kg/(s·m²), volume 0 < V <= 1e5 m³, height 0.05..100 m, UA >= 0, 1..50 whole nodes, set-point "
         "10..95 °C, surroundings -90..60 °C, 0 <= off-difference <= on-difference <= 50 K, maximum "
         "set-point..100 °C, at most 1000 node masses of flow per hour.",
         {{"weather", ArgKind::Range, "°C; W/m²; °",
           "8760 hourly rows: ambient temperature, irradiance on the collector plane, and optionally the "
           "incidence angle (absent: modifier 1)"},
          {"load", ArgKind::Range, "kg/h; °C", "8760 hourly rows: hot water drawn, cold-water temperature"},
          {"collector", ArgKind::Range, "m²; –; W/(m²·K); W/(m²·K²); –; kg/(s·m²)",
           "6 cells: area, eta0, a1, a2, incidence angle modifier b0, collector-loop flow per m²"},
          {"tank", ArgKind::Range, "m³; m; W/K; –; °C; °C",
           "6 cells: volume, height, UA, number of fully mixed nodes 1..50, delivery set-point, temperature "
           "around the tank"},
          {"controls", ArgKind::OptionalRange, "K; K; °C",
           "3 cells: pump on-difference (standing collector minus tank bottom), off-difference (collector "
           "outlet minus tank bottom), maximum tank temperature; omitted: 7 K, 2 K, 95 °C"},
          {"output", ArgKind::OptionalText, "",
           "\"monthly\" (13 x 8: month, collector, demand, auxiliary and tank loss kWh, solar fraction, pump "
           "hours, maximum tank top °C) or \"hourly\" (8760 x 5: tank top and bottom °C, collector, auxiliary "
           "and draw-off W)",
           0.0, "monthly"}},
         "",
         sim_year},
    };
}

}  // namespace solarith::catalog
