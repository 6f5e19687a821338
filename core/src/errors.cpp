#include "solarith/errors.hpp"

#include "solarith/constants.hpp"

#include <cmath>
#include <cstdio>

namespace solarith {

std::string format_number(double value)
{
    if (std::isnan(value))
        return "NaN";
    if (std::isinf(value))
        return value > 0 ? "+infinity" : "-infinity";
    char buffer[32];
    std::snprintf(buffer, sizeof buffer, "%.6g", value);
    return buffer;
}

void fail_domain(const char* function, const char* argument, double value,
                 const std::string& allowed)
{
    throw DomainError(std::string(function) + ": " + argument + " = " + format_number(value)
                      + " is outside " + allowed);
}

void fail_domain(const char* function, const std::string& reason)
{
    throw DomainError(std::string(function) + ": " + reason);
}

void fail_evaluation(const char* function, const std::string& reason)
{
    throw EvaluationError(std::string(function) + ": " + reason);
}

namespace check {

void finite(const char* function, const char* argument, double value)
{
    if (!std::isfinite(value))
        fail_domain(function, argument, value, "the finite numbers");
}

void celsius(const char* function, const char* argument, double t_celsius)
{
    if (!(t_celsius >= -constants::zero_celsius_in_kelvin) || !std::isfinite(t_celsius))
        fail_domain(function, argument, t_celsius, "-273.15 °C (absolute zero) and above");
}

void celsius_above_absolute_zero(const char* function, const char* argument, double t_celsius)
{
    if (!(t_celsius > -constants::zero_celsius_in_kelvin) || !std::isfinite(t_celsius))
        fail_domain(function, argument, t_celsius, "temperatures above -273.15 °C (absolute zero)");
}

void positive(const char* function, const char* argument, double value)
{
    if (!(value > 0) || !std::isfinite(value))
        fail_domain(function, argument, value, "the positive numbers (> 0)");
}

void non_negative(const char* function, const char* argument, double value)
{
    if (!(value >= 0) || !std::isfinite(value))
        fail_domain(function, argument, value, "the non-negative numbers (>= 0)");
}

void fraction(const char* function, const char* argument, double value)
{
    if (!(value >= 0 && value <= 1))
        fail_domain(function, argument, value, "0..1");
}

void between(const char* function, const char* argument, double value, double low, double high)
{
    if (!(value >= low && value <= high))
        fail_domain(function, argument, value, format_number(low) + ".." + format_number(high));
}

}  // namespace check
}  // namespace solarith
