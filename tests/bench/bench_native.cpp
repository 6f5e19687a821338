// Native cost of every catalogue function: nanoseconds per call through
// catalog::evaluate with the function's example arguments (the path the
// add-in takes, minus UNO). Prints figures; asserts nothing.
#include "solarith/catalog.hpp"

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

}  // namespace

int main()
{
    std::printf("%-28s %12s\n", "function", "ns per call");
    for (const auto& f : solarith::catalog::functions()) {
        const auto args = solarith::catalog::parse_arguments(f.example);
        std::printf("%-28s %12.0f\n", std::string(f.name).c_str(), nanoseconds_per_call(f, args));
    }
    return 0;
}
