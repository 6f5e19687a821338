// Native cost of every catalogue function: nanoseconds per call through
// catalog::evaluate with the function's example arguments (the path the
// add-in takes, minus UNO). Prints figures; asserts nothing.
#include "solarith/catalog.hpp"

#include "../unit/invented_year.hpp"

#include <chrono>
#include <cstdio>
#include <string>
#include <vector>

using Clock = std::chrono::steady_clock;

namespace {

volatile double sink;  // keeps the optimiser from dropping the calls

double nanoseconds_per_call(const solarith::catalog::FunctionSpec& f,
                            const std::vector<solarith::catalog::Value>& args)
{
    // Double the batch until one batch takes 20 ms, then take the best of 5 batches.
    long batch = 1;
    for (;;) {
        const auto start = Clock::now();
        for (long i = 0; i < batch; ++i) {
            const auto r = solarith::catalog::evaluate(f, args);
            if (const double* x = std::get_if<double>(&r))
                sink = *x;
        }
        if (Clock::now() - start > std::chrono::milliseconds(20))
            break;
        batch *= 2;
    }
    double best = 1e300;
    for (int round = 0; round < 5; ++round) {
        const auto start = Clock::now();
        for (long i = 0; i < batch; ++i) {
            const auto r = solarith::catalog::evaluate(f, args);
            if (const double* x = std::get_if<double>(&r))
                sink = *x;
        }
        const std::chrono::duration<double, std::nano> took = Clock::now() - start;
        best = std::min(best, took.count() / static_cast<double>(batch));
    }
    return best;
}

// SIM_YEAR on an invented year (tests/unit/invented_year.hpp), 10 nodes: ms
// per call through catalog::evaluate, reading the 8760-row ranges included.
void sim_year_timing()
{
    using solarith::catalog::Value;
    auto range = [](const std::vector<std::vector<double>>& rows) {
        std::vector<std::vector<Value>> cells;
        for (const auto& row : rows) {
            cells.emplace_back();
            for (double x : row)
                cells.back().push_back(Value::of(x));
        }
        return Value::of_table(std::move(cells));
    };
    const auto year = invented::year();
    const auto& f = *solarith::catalog::find("SIM_YEAR");
    std::printf("\n%-28s %12s\n", "SIM_YEAR (8760 h, 10 nodes)", "ms per call");
    for (const char* output : {"monthly", "hourly"}) {
        const std::vector<Value> args = {range(year.weather), range(year.load),
                                         range({{4, 0.78, 3.5, 0.015, 0.1, 0.015}}),
                                         range({{0.3, 1.5, 1.6, 10, 50, 18}}), Value::omitted(),
                                         Value::of(std::string(output))};
        std::printf("  output \"%s\"%*s %12.3f\n", output, static_cast<int>(16 - std::string(output).size()), "",
                    nanoseconds_per_call(f, args) / 1e6);
    }
}

}  // namespace

int main()
{
    std::printf("%-28s %12s\n", "function", "ns per call");
    for (const auto& f : solarith::catalog::functions()) {
        if (f.example.empty())
            continue;  // hourly-range functions: timed below on invented data
        const auto args = solarith::catalog::parse_arguments(f.example);
        std::printf("%-28s %12.0f\n", std::string(f.name).c_str(), nanoseconds_per_call(f, args));
    }
    sim_year_timing();
    return 0;
}
