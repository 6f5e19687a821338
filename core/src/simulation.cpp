// SIM_YEAR: the hourly year of a solar hot-water system. The model is
// described in core/include/solarith/simulation.hpp.
#include "solarith/simulation.hpp"

#include "solarith/collector.hpp"
#include "solarith/constants.hpp"
#include "solarith/errors.hpp"
#include "solarith/properties.hpp"

#include <algorithm>
#include <cmath>
#include <limits>
#include <string>

namespace solarith::simulation {

namespace {

constexpr const char* fn = "SIM_YEAR";
constexpr double seconds_per_hour = 3600;
constexpr double standard_pressure = 101325;  // Pa
constexpr int max_nodes = 50;
constexpr double max_substeps_per_hour = 1000;

// Validity bounds of the hourly data (plausibility bounds chosen here):
// the air temperatures recorded on Earth lie within -90..60 °C; hourly
// irradiance on a plane at the ground does not reach 1500 W/m² (the solar
// constant is 1361 W/m²).
constexpr double t_air_low = -90, t_air_high = 60;
constexpr double irradiance_high = 1500;

// ---- Input checks ---------------------------------------------------------

void check_cell(const char* argument, const char* quantity, std::size_t hour, std::size_t column, double value,
                double low, double high, const char* unit)
{
    if (value >= low && value <= high)
        return;
    const std::string where = std::string(argument) + " row " + std::to_string(hour + 1) + ", column "
                              + std::to_string(column) + " (" + quantity + ")";
    fail_domain(fn, where.c_str(), value, format_number(low) + ".." + format_number(high) + " " + unit);
}

void check_length(const char* argument, const char* quantity, const std::vector<double>& values)
{
    if (values.size() != hours_per_year)
        fail_domain(fn, std::string(argument) + " has " + std::to_string(values.size()) + " values of " + quantity
                            + "; 8760 are expected, one per hour of the year from 1 January 00:00");
}

void check_hourly(const Hourly& h, const Tank& tank)
{
    check_length("weather", "ambient temperature", h.t_ambient);
    check_length("weather", "irradiance", h.irradiance);
    if (!h.incidence_deg.empty())
        check_length("weather", "incidence angle", h.incidence_deg);
    check_length("load", "hot-water draw", h.draw);
    check_length("load", "cold-water temperature", h.t_cold);
    const double inf = std::numeric_limits<double>::max();
    for (std::size_t i = 0; i < hours_per_year; ++i) {
        check_cell("weather", "ambient temperature", i, 1, h.t_ambient[i], t_air_low, t_air_high, "°C");
        check_cell("weather", "irradiance", i, 2, h.irradiance[i], 0, irradiance_high, "W/m²");
        if (!h.incidence_deg.empty())
            check_cell("weather", "incidence angle", i, 3, h.incidence_deg[i], 0, 180, "°");
        check_cell("load", "hot-water draw", i, 1, h.draw[i], 0, inf, "kg/h");
        check_cell("load", "cold-water temperature, at most the set-point", i, 2, h.t_cold[i], 0, tank.t_set, "°C");
    }
}

void check_collector(const Collector& c)
{
    check::non_negative(fn, "collector area", c.area);
    check::fraction(fn, "collector eta0", c.eta0);
    check::non_negative(fn, "collector a1", c.a1);
    check::non_negative(fn, "collector a2", c.a2);
    check::fraction(fn, "collector IAM b0", c.b0);
    check::positive(fn, "collector flow per m²", c.flow_per_area);
    check::between(fn, "collector flow per m²", c.flow_per_area, 0, 0.1);
}

void check_tank(const Tank& t)
{
    // Plausibility bounds chosen here (a large seasonal store is some 1e5 m³);
    // they keep the tank's diameter and areas finite.
    check::positive(fn, "tank volume", t.volume);
    check::between(fn, "tank volume", t.volume, 0, 1e5);
    check::between(fn, "tank height", t.height, 0.05, 100);
    check::non_negative(fn, "tank UA", t.ua);
    check::between(fn, "tank nodes", t.nodes, 1, max_nodes);
    if (std::floor(t.nodes) != t.nodes)
        fail_domain(fn, "tank nodes", t.nodes, "the whole numbers 1..50");
    check::between(fn, "tank set-point", t.t_set, 10, 95);
    check::between(fn, "tank surroundings temperature", t.t_surroundings, t_air_low, t_air_high);
}

void check_controls(const Controls& c, const Tank& tank)
{
    check::between(fn, "controls on-difference", c.dt_on, 0, 50);
    check::between(fn, "controls off-difference (at most the on-difference)", c.dt_off, 0, c.dt_on);
    check::between(fn, "controls maximum tank temperature (at least the set-point)", c.t_max, tank.t_set, 100);
}

// ---- The tank --------------------------------------------------------------

// What flows during one sub-step; rates in kg/s.
struct Flows {
    double collector = 0;  // through the collector loop (0: pump off)
    double t_return = 0;   // °C, collector outlet
    double drawn = 0;      // out of the top (tempered), the same in as cold water at the bottom
    double t_cold = 0;
};

class StratifiedTank {
public:
    StratifiedTank(const Tank& tank, double density, double cp, double t_start)
        : t_(static_cast<std::size_t>(tank.nodes), t_start),
          before_(t_.size()),
          node_mass_(density * tank.volume / tank.nodes),
          node_capacity_(node_mass_ * cp),
          t_surroundings_(tank.t_surroundings)
    {
        // UA shared by surface: side split equally, one end on the top and one on the bottom node.
        const double diameter = std::sqrt(4 * tank.volume / (constants::pi * tank.height));
        const double side = constants::pi * diameter * tank.height;
        const double end = constants::pi * diameter * diameter / 4;
        const double total = side + 2 * end;
        const double n = tank.nodes;
        ua_end_node_ = tank.ua * (side / n + end) / total;
        ua_middle_node_ = tank.ua * (side / n) / total;
        if (t_.size() == 1)
            ua_end_node_ = tank.ua;
    }

    double top() const { return t_.front(); }
    double bottom() const { return t_.back(); }
    double node_mass() const { return node_mass_; }
    double stored() const  // J, relative to 0 °C
    {
        double sum = 0;
        for (double t : t_)
            sum += t;
        return node_capacity_ * sum;
    }

    // Explicit upwind step of the flows; dt keeps every node's inflow within its mass.
    void move_water(const Flows& f, double dt)
    {
        before_ = t_;
        const std::size_t n = t_.size();
        const std::size_t entry = f.collector > 0 ? return_node(f.t_return) : n;
        const double per_mass = dt / node_mass_;
        auto down = [&](std::size_t interface) {  // net flow from node i to node i+1
            return (interface >= entry ? f.collector : 0.0) - f.drawn;
        };
        for (std::size_t i = 0; i < n; ++i) {
            double gain = 0;  // Σ inflow·(T_in − T_i), kg/s·K
            if (i > 0) {
                const double from_above = down(i - 1);
                if (from_above > 0)
                    gain += from_above * (before_[i - 1] - before_[i]);
            }
            if (i + 1 < n) {
                const double from_below = -down(i);
                if (from_below > 0)
                    gain += from_below * (before_[i + 1] - before_[i]);
            }
            if (i == entry)
                gain += f.collector * (f.t_return - before_[i]);
            if (i + 1 == n)
                gain += f.drawn * (f.t_cold - before_[i]);
            t_[i] = before_[i] + per_mass * gain;
        }
    }

    // Exact exponential relaxation towards the surroundings over dt; returns the heat lost, J.
    double lose_heat(double dt)
    {
        if (dt != loss_dt_) {
            loss_dt_ = dt;
            keep_end_ = std::exp(-ua_end_node_ * dt / node_capacity_);
            keep_middle_ = std::exp(-ua_middle_node_ * dt / node_capacity_);
        }
        double sum_change = 0;
        const std::size_t n = t_.size();
        for (std::size_t i = 0; i < n; ++i) {
            const double keep = (i == 0 || i + 1 == n) ? keep_end_ : keep_middle_;
            const double t_new = t_surroundings_ + (t_[i] - t_surroundings_) * keep;
            sum_change += t_[i] - t_new;
            t_[i] = t_new;
        }
        return node_capacity_ * sum_change;
    }

    // Mixes every group of nodes that stands warmer below colder to its mean
    // (pool adjacent violators over equal masses): stored heat is unchanged.
    void mix_inversions()
    {
        const std::size_t n = t_.size();
        bool inverted = false;
        for (std::size_t i = 0; i + 1 < n; ++i)
            inverted = inverted || t_[i] < t_[i + 1];
        if (!inverted)
            return;
        std::vector<Block>& blocks = blocks_;
        blocks.clear();
        for (double t : t_) {
            blocks.push_back({t, 1});
            while (blocks.size() > 1 && blocks[blocks.size() - 2].mean() < blocks.back().mean()) {
                const Block last = blocks.back();
                blocks.pop_back();
                blocks.back().sum += last.sum;
                blocks.back().count += last.count;
            }
        }
        std::size_t i = 0;
        for (const Block& b : blocks)
            for (std::size_t k = 0; k < b.count; ++k)
                t_[i++] = b.mean();
    }

private:
    struct Block {  // neighbouring nodes mixed together
        double sum;
        std::size_t count;
        double mean() const { return sum / static_cast<double>(count); }
    };

    // The highest node not warmer than the collector return [D&B §8.4].
    std::size_t return_node(double t_return) const
    {
        for (std::size_t i = 0; i < t_.size(); ++i)
            if (before_[i] <= t_return)
                return i;
        return t_.size() - 1;
    }

    std::vector<double> t_;       // °C, top first
    std::vector<double> before_;  // at the start of the step
    double node_mass_;
    double node_capacity_;        // J/K
    double t_surroundings_;
    double ua_end_node_ = 0, ua_middle_node_ = 0;
    double loss_dt_ = -1, keep_end_ = 1, keep_middle_ = 1;
    std::vector<Block> blocks_;  // work space of mix_inversions
};

void refuse_frozen_tank(double t_bottom, std::size_t hour)
{
    if (t_bottom >= 0)
        return;
    fail_domain(fn, "the tank water falls below 0 °C in hour " + std::to_string(hour + 1)
                        + " of the year; freezing is not modelled (raise the temperature around the tank or "
                          "lower the tank's UA)");
}

bool stagnant_above(const Collector& collector, double t_ambient, double absorbed, double t_threshold)
{
    // Stagnation: the positive root x of η0·K·G − a1·x − a2·x² = 0, x = T − Ta,
    // x = 2·η0·K·G/(a1 + √(a1² + 4·a2·η0·K·G)) (as COLL_STAGNATION_TEMP).
    const double gain = collector.eta0 * absorbed;
    if (gain == 0)
        return t_ambient >= t_threshold;  // stagnant at the air temperature
    const double denominator = collector.a1 + std::sqrt(collector.a1 * collector.a1 + 4 * collector.a2 * gain);
    if (denominator == 0)
        return true;  // a loss-free curve: no finite stagnation temperature
    return t_ambient + 2 * gain / denominator >= t_threshold;
}

// The heat flows of one hour, J (pumped in s).
struct HourTotals {
    double collected = 0, auxiliary = 0, drawn = 0, lost = 0, demand = 0, pumped = 0;
    double t_top_max = -std::numeric_limits<double>::infinity();
};

// What stays the same through one hour.
struct HourConditions {
    double t_air;     // °C
    double absorbed;  // W/m², K·G
    double draw;      // kg/s
    double t_cold;    // °C
};

// Collector loop, controller, tank and draw, stepped through the hours.
class SolarSystem {
public:
    SolarSystem(const Collector& collector, const Tank& tank, const Controls& controls, double density,
                double cp, double t_start)
        : collector_(collector),
          controls_(controls),
          t_set_(tank.t_set),
          cp_(cp),
          loop_flow_(collector.area * collector.flow_per_area),
          store_(tank, density, cp, t_start)
    {
    }

    const StratifiedTank& store() const { return store_; }
    double loop_flow() const { return loop_flow_; }

    HourTotals run_hour(const HourConditions& hour, std::size_t hour_of_year)
    {
        HourTotals sum;
        for (double left = seconds_per_hour; left > 0;) {
            Flows flows = collector_flow(hour);
            const double inflow = flows.collector + hour.draw;
            const double dt = inflow > 0 ? std::min(left, store_.node_mass() / inflow) : left;
            draw_off(hour, flows, dt, sum);
            if (flows.collector > 0) {
                sum.collected += flows.collector * cp_ * (flows.t_return - store_.bottom()) * dt;
                sum.pumped += dt;
            }
            store_.move_water(flows, dt);
            sum.lost += store_.lose_heat(dt);
            store_.mix_inversions();
            refuse_frozen_tank(store_.bottom(), hour_of_year);
            sum.t_top_max = std::max(sum.t_top_max, store_.top());
            left = left - dt > 1e-9 ? left - dt : 0;
        }
        return sum;
    }

private:
    // The controller's decision for the next sub-step, and the loop flow it gives.
    Flows collector_flow(const HourConditions& hour)
    {
        Flows flows;
        flows.t_cold = hour.t_cold;
        if (loop_flow_ <= 0)
            return flows;
        const double t_bottom = store_.bottom();
        const auto outlet = collector_outlet(collector_, t_bottom, hour.t_air, hour.absorbed, loop_flow_ * cp_);
        const bool starts = pump_on_ || stagnant_above(collector_, hour.t_air, hour.absorbed,
                                                       t_bottom + controls_.dt_on);
        pump_on_ = starts && outlet && *outlet - t_bottom >= controls_.dt_off && store_.top() < controls_.t_max;
        if (pump_on_) {
            flows.collector = loop_flow_;
            flows.t_return = *outlet;
        }
        return flows;
    }

    // Tempering valve and in-line heater: sets the flow taken from the tank
    // and adds the demand, the heat drawn from the tank and the auxiliary heat.
    void draw_off(const HourConditions& hour, Flows& flows, double dt, HourTotals& sum) const
    {
        const double t_top = store_.top();
        flows.drawn = t_top > t_set_ ? hour.draw * (t_set_ - hour.t_cold) / (t_top - hour.t_cold) : hour.draw;
        sum.drawn += flows.drawn * cp_ * (t_top - hour.t_cold) * dt;
        sum.auxiliary += hour.draw * cp_ * std::max(0.0, t_set_ - t_top) * dt;
        sum.demand += hour.draw * cp_ * (t_set_ - hour.t_cold) * dt;
    }

    Collector collector_;
    Controls controls_;
    double t_set_;
    double cp_;
    double loop_flow_;  // kg/s when the pump runs
    StratifiedTank store_;
    bool pump_on_ = false;
};

void refuse_too_many_substeps(const SolarSystem& system, const Hourly& hourly)
{
    const double largest_draw = *std::max_element(hourly.draw.begin(), hourly.draw.end()) / seconds_per_hour;
    const double node_mass = system.store().node_mass();
    if ((system.loop_flow() + largest_draw) * seconds_per_hour / node_mass <= max_substeps_per_hour)
        return;
    fail_domain(fn, "the collector-loop flow (" + format_number(system.loop_flow()) + " kg/s) and the largest hourly "
                        "draw (" + format_number(largest_draw * seconds_per_hour) + " kg/h) pass more than 1000 times "
                        "the mass of a tank node (" + format_number(node_mass) + " kg) through it in an hour, beyond "
                        "the time-stepping's range: use fewer nodes, a larger tank, or check the units");
}

HourConditions conditions(const Hourly& hourly, const Collector& collector, std::size_t hour)
{
    const double modifier = hourly.incidence_deg.empty()
                                ? 1.0
                                : collector::incidence_modifier(hourly.incidence_deg[hour], collector.b0);
    return {hourly.t_ambient[hour], modifier * hourly.irradiance[hour], hourly.draw[hour] / seconds_per_hour,
            hourly.t_cold[hour]};
}

void add(Month& month, const HourTotals& hour)
{
    month.collector += hour.collected;
    month.auxiliary += hour.auxiliary;
    month.drawn += hour.drawn;
    month.loss += hour.lost;
    month.demand += hour.demand;
    month.pump_seconds += hour.pumped;
    month.t_top_max = std::max(month.t_top_max, hour.t_top_max);
}

}  // namespace

std::optional<double> collector_outlet(const Collector& collector, double t_in, double t_ambient, double absorbed,
                                       double capacity_rate)
{
    const double a = collector.area * collector.a2;
    const double b = collector.area * collector.a1 + 2 * capacity_rate;
    const double c = collector.area * collector.eta0 * absorbed + 2 * capacity_rate * (t_in - t_ambient);
    const double discriminant = b * b + 4 * a * c;
    if (discriminant < 0)
        return std::nullopt;
    const double x = 2 * c / (b + std::sqrt(discriminant));  // mean fluid minus ambient, K
    return 2 * (x + t_ambient) - t_in;
}

double property_temperature(const Hourly& hourly, const Tank& tank)
{
    double sum = 0;
    for (double t : hourly.t_cold)
        sum += t;
    const double mean_cold = hourly.t_cold.empty() ? tank.t_set : sum / static_cast<double>(hourly.t_cold.size());
    return (tank.t_set + mean_cold) / 2;
}

Year simulate_year(const Hourly& hourly, const Collector& collector, const Tank& tank, const Controls& controls)
{
    check_collector(collector);
    check_tank(tank);
    check_controls(controls, tank);
    check_hourly(hourly, tank);

    const double t_props = property_temperature(hourly, tank);
    Year year;
    year.density = water::density(t_props, standard_pressure);
    year.cp = water::cp(t_props, standard_pressure);
    SolarSystem system(collector, tank, controls, year.density, year.cp, hourly.t_cold.front());
    refuse_too_many_substeps(system, hourly);

    year.stored_start = system.store().stored();
    year.hours.reserve(hours_per_year);
    std::size_t hour = 0;
    for (std::size_t m = 0; m < 12; ++m) {
        Month& month = year.months[m];
        month.t_top_max = system.store().top();
        for (int h = 0; h < 24 * days_in_month[m]; ++h, ++hour) {
            const HourTotals sum = system.run_hour(conditions(hourly, collector, hour), hour);
            add(month, sum);
            year.hours.push_back({system.store().top(), system.store().bottom(), sum.collected / seconds_per_hour,
                                  sum.auxiliary / seconds_per_hour, sum.drawn / seconds_per_hour});
        }
        month.stored_end = system.store().stored();
    }
    return year;
}

}  // namespace solarith::simulation
