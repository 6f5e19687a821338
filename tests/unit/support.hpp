// Helpers shared by the unit tests: calls go through the catalogue, the same
// path the add-in takes, so argument handling is tested with the physics.
#pragma once

#include "solarith/catalog.hpp"
#include "solarith/errors.hpp"

#include <doctest/doctest.h>

#include <fstream>
#include <sstream>
#include <string>
#include <vector>

namespace test {

using solarith::catalog::Value;

inline const solarith::catalog::FunctionSpec& spec(const std::string& name)
{
    const auto* f = solarith::catalog::find(name);
    REQUIRE_MESSAGE(f != nullptr, "no catalogue entry " << name);
    return *f;
}

// Evaluates NAME(arguments) where arguments are written as in a Calc
// formula, e.g. call("RAD_EMISSIVE", "60; 0.9").
inline double call(const std::string& name, const std::string& arguments)
{
    const auto result = solarith::catalog::evaluate(spec(name), solarith::catalog::parse_arguments(arguments));
    REQUIRE(std::holds_alternative<double>(result));
    return std::get<double>(result);
}

inline std::string call_text(const std::string& name, const std::string& arguments)
{
    const auto result = solarith::catalog::evaluate(spec(name), solarith::catalog::parse_arguments(arguments));
    REQUIRE(std::holds_alternative<std::string>(result));
    return std::get<std::string>(result);
}

// Evaluates NAME with arguments built in code (e.g. hourly ranges too long
// to write as text); returns the array of an array function.
inline solarith::catalog::Table call_table(const std::string& name, const std::vector<Value>& arguments)
{
    const auto result = solarith::catalog::evaluate(spec(name), arguments);
    REQUIRE(std::holds_alternative<solarith::catalog::Table>(result));
    return std::get<solarith::catalog::Table>(result);
}

// A range argument of numbers, as Calc passes a block of cells.
inline Value range_of(const std::vector<std::vector<double>>& rows)
{
    std::vector<std::vector<Value>> cells;
    for (const auto& row : rows) {
        cells.emplace_back();
        for (double x : row)
            cells.back().push_back(Value::of(x));
    }
    return Value::of_table(std::move(cells));
}

// The message FN_DIAGNOSE would show ("ok" when the call is accepted).
inline std::string diagnose(const std::string& name, const std::string& arguments)
{
    return solarith::catalog::diagnose(spec(name), solarith::catalog::parse_arguments(arguments));
}

// Relative closeness, |a - b| <= tol·|b| (absolute tol when b == 0).
inline doctest::Approx rel(double expected, double tolerance)
{
    return doctest::Approx(expected).epsilon(tolerance).scale(0);
}

// Rows of a whitespace-separated reference table; '#' starts a comment.
inline std::vector<std::vector<double>> read_table(const std::string& file_name)
{
    std::ifstream in(std::string(SOLARITH_REFERENCE_DIR) + "/" + file_name);
    REQUIRE_MESSAGE(in.good(), "cannot open reference file " << file_name);
    std::vector<std::vector<double>> rows;
    std::string line;
    while (std::getline(in, line)) {
        const auto hash = line.find('#');
        if (hash != std::string::npos)
            line.erase(hash);
        std::istringstream fields(line);
        std::vector<double> row;
        for (double x; fields >> x;)
            row.push_back(x);
        if (!row.empty())
            rows.push_back(row);
    }
    REQUIRE_MESSAGE(!rows.empty(), "reference file " << file_name << " holds no rows");
    return rows;
}

}  // namespace test

// The call NAME(ARGS) is refused as bad input and the message contains TEXT.
#define CHECK_REFUSED(name, args, text)                                                         \
    do {                                                                                        \
        const std::string diagnosis_ = test::diagnose(name, args);                              \
        CHECK_MESSAGE(diagnosis_.find(text) != std::string::npos,                               \
                      name << "(" << args << ") gave: " << diagnosis_);                         \
        CHECK_THROWS_AS(test::call(name, args), solarith::DomainError);                         \
    } while (false)
