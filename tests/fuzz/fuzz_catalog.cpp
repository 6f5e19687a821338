// libFuzzer target: every catalogue function with arbitrary arguments.
//
// Contract checked for each call: it returns a finite number or a text, or it
// raises DomainError or EvaluationError; nothing else escapes, nothing
// crashes, AddressSanitizer and UndefinedBehaviorSanitizer stay silent, and
// no call takes longer than 100 ms (300 ms in this instrumented build).
//
// Input layout (bytes, read front to back; missing bytes read as 0):
//   u16 function selector (index modulo the number of functions)
//   u8  argument count (modulo the function's argument count + 3, so extra
//       arguments are tried too)
//   per argument: u8 tag, then the tag's payload:
//     0 omitted            1 any double (8 raw bytes: NaN, ±inf, subnormal…)
//     2 a special number   3 a small integer (i8)
//     4 a text from a dictionary (function names, fluid and model names, junk)
//     5 a small range of mixed cells   6 a large range (up to 20 000 cells)
//     7 the function's own example value at this position
//     8 that example value scaled by 1 + i8/64
#include "solarith/catalog.hpp"
#include "solarith/errors.hpp"

#include <chrono>
#include <cmath>
#include <cstdint>
#include <cstdio>
#include <cstdlib>
#include <cstring>
#include <ctime>

using solarith::catalog::FunctionSpec;
using solarith::catalog::Value;

namespace {

class Reader {
public:
    Reader(const std::uint8_t* data, std::size_t size) : data_(data), size_(size) {}
    std::uint8_t byte() { return pos_ < size_ ? data_[pos_++] : 0; }
    std::uint16_t u16() { return static_cast<std::uint16_t>(byte() | (byte() << 8)); }
    double raw_double()
    {
        std::uint8_t bytes[8];
        for (auto& b : bytes)
            b = byte();
        double x;
        std::memcpy(&x, bytes, sizeof x);
        return x;
    }

private:
    const std::uint8_t* data_;
    std::size_t size_;
    std::size_t pos_ = 0;
};

const double special_numbers[] = {0.0, -0.0, 1.0, -1.0, 1e-320, -1e-320, 1e308, -1e308, HUGE_VAL, -HUGE_VAL,
                                  NAN, 1e-300, 273.15, -273.15, -273.16, 100.0, 1e6, 0.5, 90.0, 366.0};
const char* const dictionary[] = {"", "abc", "water", "air", "propylene", "ethylene", "WATER", "hdkr",
                                  "perez", "isotropic", "counterflow", "RAD_EMISSIVE", "FN_DIAGNOSE",
                                  "FN_METHOD", "rad_emissive", "NO_SUCH_FUNCTION", "1e300", "\xff\xfe"};

Value cell(Reader& in)
{
    switch (in.byte() % 4) {
    case 0: return Value::of(in.raw_double());
    case 1: return Value::of(special_numbers[in.byte() % std::size(special_numbers)]);
    case 2: return Value::of(std::string());  // a blank cell, as Calc passes it
    default: return Value::of(std::string(dictionary[in.byte() % std::size(dictionary)]));
    }
}

Value range(Reader& in, std::size_t rows, std::size_t columns)
{
    std::vector<std::vector<Value>> table(rows);
    for (auto& row : table)
        for (std::size_t c = 0; c < columns; ++c)
            row.push_back(cell(in));
    return Value::of_table(std::move(table));
}

Value example_value(const std::vector<Value>& example, std::size_t position)
{
    return position < example.size() ? example[position] : Value::of(1.0);
}

Value argument(Reader& in, const std::vector<Value>& example, std::size_t position)
{
    switch (in.byte() % 9) {
    case 0: return Value::omitted();
    case 1: return Value::of(in.raw_double());
    case 2: return Value::of(special_numbers[in.byte() % std::size(special_numbers)]);
    case 3: return Value::of(static_cast<double>(static_cast<std::int8_t>(in.byte())));
    case 4: return Value::of(std::string(dictionary[in.byte() % std::size(dictionary)]));
    case 5: return range(in, 1 + in.byte() % 4, 1 + in.byte() % 3);
    case 6: {
        const std::size_t rows = 1 + in.u16() % 10000;
        return range(in, rows, 1 + in.byte() % 2);
    }
    case 7: return example_value(example, position);
    default: {
        Value v = example_value(example, position);
        if (v.kind == Value::Kind::Number)
            v.number *= 1 + static_cast<std::int8_t>(in.byte()) / 64.0;
        return v;
    }
    }
}

// CPU time of this thread: a busy machine does not make a call look slow.
std::chrono::nanoseconds thread_cpu_time()
{
    timespec now{};
    clock_gettime(CLOCK_THREAD_CPUTIME_ID, &now);
    return std::chrono::seconds(now.tv_sec) + std::chrono::nanoseconds(now.tv_nsec);
}

// The contract is 100 ms per call in the released library. AddressSanitizer and
// UndefinedBehaviorSanitizer make code two to three times slower, so this
// instrumented build allows three times that.
constexpr auto longest_call = std::chrono::milliseconds(300);

[[noreturn]] void broken(const FunctionSpec& f, const char* what)
{
    std::fprintf(stderr, "contract broken by %.*s: %s\n", static_cast<int>(f.name.size()), f.name.data(), what);
    std::abort();
}

}  // namespace

extern "C" int LLVMFuzzerTestOneInput(const std::uint8_t* data, std::size_t size)
{
    const auto& all = solarith::catalog::functions();
    Reader in(data, size);
    const FunctionSpec& f = all[in.u16() % all.size()];
    static std::vector<std::vector<Value>> examples = [&] {
        std::vector<std::vector<Value>> parsed;
        for (const auto& g : all)
            parsed.push_back(solarith::catalog::parse_arguments(g.example));
        return parsed;
    }();
    const auto& example = examples[static_cast<std::size_t>(&f - all.data())];

    std::vector<Value> values;
    const std::size_t count = in.byte() % (f.args.size() + 3);
    for (std::size_t i = 0; i < count; ++i)
        values.push_back(argument(in, example, i));

    const auto start = thread_cpu_time();
    try {
        const auto result = solarith::catalog::evaluate(f, values);
        if (const double* x = std::get_if<double>(&result); x && !std::isfinite(*x))
            broken(f, "non-finite result");
    } catch (const solarith::DomainError&) {
    } catch (const solarith::EvaluationError&) {
    } catch (const std::exception& e) {
        broken(f, e.what());
    } catch (...) {
        broken(f, "unknown exception");
    }
    if (thread_cpu_time() - start > longest_call)
        broken(f, "call took too long");
    return 0;
}
