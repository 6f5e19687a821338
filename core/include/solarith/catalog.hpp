// The function catalogue: one table that describes every spreadsheet
// function once. The add-in's XAddIn answers, the UNO glue, the IDL, the
// audit functions (FN_METHOD, FN_DIAGNOSE), the generated function reference
// and the tests all read it.
//
// No UNO here: arguments arrive as Value (a number, a text, a range of cells
// or nothing) so that the unit tests, the fuzzer and the benchmarks drive the
// same path the add-in does.
#pragma once

#include <cstddef>
#include <optional>
#include <string>
#include <string_view>
#include <variant>
#include <vector>

namespace solarith::catalog {

// How an argument travels from the cell. The kind fixes its IDL type:
//   Number          double      (required)
//   OptionalNumber  any         (may be omitted; default_number applies,
//                                or "absent" when the default is NaN)
//   Text            string      (required)
//   OptionalText    any         (may be omitted; default_text applies)
//   Range           sequence< sequence< any > >  (blank and text cells are errors)
//   Rest            sequence< any >  (the trailing variable argument list)
//   OptionalRange   any         (a range that may be omitted: Calc passes a
//                                range into an any as sequence< sequence< any > >,
//                                blank cells as empty texts, an omitted one as
//                                void; the invoker tests omitted() and supplies
//                                its own defaults)
// New kinds go at the end: the kind letters of solarith-codegen index this order.
enum class ArgKind { Number, OptionalNumber, Text, OptionalText, Range, Rest, OptionalRange };

struct ArgSpec {
    std::string_view name;         // as the function wizard shows it, e.g. "T"
    ArgKind kind;
    std::string_view unit;         // "°C", "W/(m²·K)", "–" for dimensionless
    std::string_view description;  // what it is, without the unit
    double default_number = 0;     // OptionalNumber only; NaN means "absent"
    std::string_view default_text = {};  // OptionalText only
};

// What a function returns. Number -> double, Text -> string, Table -> a
// 2-D array of numbers and texts (sequence< sequence< any > >, entered in
// Calc as an array formula).
enum class ResultKind { Number, Text, Table };

// One argument as it arrived: omitted, a number, a text, or a range of cells.
struct Value {
    enum class Kind { Omitted, Number, Text, Table };
    Kind kind = Kind::Omitted;
    double number = 0;
    std::string text;
    std::vector<std::vector<Value>> table;  // rows of cells, for Kind::Table

    static Value omitted() { return {}; }
    static Value of(double number);
    static Value of(std::string text);
    static Value of_table(std::vector<std::vector<Value>> rows);
};

using Table = std::vector<std::vector<Value>>;
using Result = std::variant<double, std::string, Table>;

struct FunctionSpec;

// The arguments of one call, read through the function's ArgSpecs so that a
// wrong kind of input becomes a DomainError naming the function and argument.
class Args {
public:
    Args(const FunctionSpec& spec, const std::vector<Value>& values);

    // A single number; an omitted OptionalNumber gives its default.
    double number(std::size_t index) const;
    // An OptionalNumber whose default is NaN: nothing when omitted.
    std::optional<double> optional_number(std::size_t index) const;
    // A text; an omitted OptionalText gives its default.
    std::string text(std::size_t index) const;
    // All cells of a range, row by row; every cell must hold a number.
    std::vector<double> numbers(std::size_t index) const;
    // The cells of a range with its shape, row by row; every cell must hold a
    // number and every row have the same length (a single number is a 1x1
    // range). For arguments whose layout matters (hourly tables).
    struct Matrix {
        std::size_t rows = 0;
        std::size_t columns = 0;
        std::vector<double> cells;  // rows·columns values, row by row
        double at(std::size_t row, std::size_t column) const { return cells[row * columns + column]; }
    };
    Matrix matrix(std::size_t index) const;
    // The values of the trailing Rest argument (a copy, made only when asked for).
    std::vector<Value> rest() const;
    bool omitted(std::size_t index) const;

    const FunctionSpec& spec() const { return spec_; }

private:
    const Value& at(std::size_t index) const;
    [[noreturn]] void fail(std::size_t index, const std::string& reason) const;
    double cell_number(std::size_t index, const Value& cell, std::size_t row, std::size_t column) const;

    const FunctionSpec& spec_;
    const std::vector<Value>& values_;
    std::size_t fixed_ = 0;  // arguments before the Rest argument
};

using Invoker = Result (*)(const Args&);

struct FunctionSpec {
    std::string_view name;         // display name, e.g. "RAD_EMISSIVE"; also fixes the
                                   // programmatic (IDL) name, see programmatic_name()
    std::string_view family;       // "Radiation", "Conduction", ... (docs and grouping)
    std::string_view summary;      // one or two sentences for the function wizard
    std::string_view result_unit;  // "W/m²", "–", "text"
    ResultKind result = ResultKind::Number;
    std::string_view method;       // formula, validity range and published source (FN_METHOD)
    std::vector<ArgSpec> args;
    std::string_view example;      // arguments of a typical valid call in Calc syntax,
                                   // e.g. "60; 0.9" or "{0.1; 0.05}; {0.04; 1.2}; 2";
                                   // empty only where a range argument is too long to
                                   // write inline (hourly data) — such a function
                                   // needs tests of its own through Calc.
    Invoker invoke = nullptr;
};

// Every function, in the order of the function reference. Stable: the index
// of a function never changes within one build.
const std::vector<FunctionSpec>& functions();

// Case-insensitive lookup by display name; nullptr when unknown.
const FunctionSpec* find(std::string_view display_name);

// The IDL method name derived from the display name, e.g. "RAD_VF_COAXIAL_DISKS"
// -> "radVfCoaxialDisks". Saved documents store it: never change the rule.
std::string programmatic_name(std::string_view display_name);

// Calls the function with the arguments as they arrived. Throws DomainError
// for unusable input (including a result that is not a finite number) and
// EvaluationError when a solver fails; nothing else.
Result evaluate(const FunctionSpec& spec, const std::vector<Value>& values);

// "ok", or the message evaluate() would raise for these arguments.
std::string diagnose(const FunctionSpec& spec, const std::vector<Value>& values);

// The text FN_METHOD returns: method, validity and source.
std::string method_text(const FunctionSpec& spec);

// Argument description as the function wizard shows it, unit included,
// e.g. "Surface temperature [°C]. Optional, default 1."
std::string argument_help(const ArgSpec& arg);
// Function description as the wizard shows it, result unit included.
std::string function_help(const FunctionSpec& spec);

// Parses arguments written as in a Calc formula: numbers, "quoted text",
// inline arrays {1; 2 | 3; 4} (';' between columns, '|' between rows) and
// empty positions (omitted), separated by ';'. Throws std::invalid_argument.
std::vector<Value> parse_arguments(std::string_view text);

// The number of leading arguments a call must give.
std::size_t required_count(const FunctionSpec& spec);

// Per-family tables, concatenated by functions() in this order.
std::vector<FunctionSpec> radiation_functions();
std::vector<FunctionSpec> conduction_functions();
std::vector<FunctionSpec> convection_functions();
std::vector<FunctionSpec> properties_functions();
std::vector<FunctionSpec> storage_functions();
std::vector<FunctionSpec> losses_functions();
std::vector<FunctionSpec> sun_functions();
std::vector<FunctionSpec> collector_functions();
std::vector<FunctionSpec> sizing_functions();
std::vector<FunctionSpec> simulation_functions();
std::vector<FunctionSpec> audit_functions();

}  // namespace solarith::catalog
