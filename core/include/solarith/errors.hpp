// The two ways a Solarith function refuses to produce a number, and the
// input checks that raise the first of them.
//
// DomainError: the input is impossible (below absolute zero, emissivity
// above 1, negative thickness) or outside the method's published validity
// range. The add-in shows it as Err:502.
// EvaluationError: the input is valid but a numerical method failed (a
// solver did not converge). The add-in shows it as Err:523.
//
// Every message names the function, the argument, its value and what is
// allowed, e.g. "RAD_EMISSIVE: emissivity = 1.2 is outside 0..1".
#pragma once

#include <stdexcept>
#include <string>

namespace solarith {

class DomainError : public std::domain_error {
public:
    using std::domain_error::domain_error;
};

class EvaluationError : public std::runtime_error {
public:
    using std::runtime_error::runtime_error;
};

// A number as messages print it: up to 6 significant digits.
std::string format_number(double value);

[[noreturn]] void fail_domain(const char* function, const char* argument,
                              double value, const std::string& allowed);
[[noreturn]] void fail_domain(const char* function, const std::string& reason);
[[noreturn]] void fail_evaluation(const char* function, const std::string& reason);

// Each check accepts only finite values; NaN and ±infinity always fail.
namespace check {

// Absolute zero is -273.15 °C; T must not lie below it.
void celsius(const char* function, const char* argument, double t_celsius);
// Strictly above absolute zero (for formulas that divide by T in kelvin).
void celsius_above_absolute_zero(const char* function, const char* argument, double t_celsius);
void positive(const char* function, const char* argument, double value);
void non_negative(const char* function, const char* argument, double value);
void fraction(const char* function, const char* argument, double value);  // 0..1
void between(const char* function, const char* argument, double value,
             double low, double high);                                      // low..high inclusive
void finite(const char* function, const char* argument, double value);

}  // namespace check
}  // namespace solarith
