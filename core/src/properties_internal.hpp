// Property sets for fluids::at, with messages that name the calling
// spreadsheet function (not WATER_DENSITY etc.). Internal to core/src.
#pragma once

#include "solarith/properties.hpp"

namespace solarith::water {
// Liquid water at its default pressure; T checked as "fluid temperature".
fluids::Properties liquid_properties(const char* function, double t_celsius);
}  // namespace solarith::water

namespace solarith::air {
// Dry air at 101325 Pa; T checked as "fluid temperature".
fluids::Properties properties(const char* function, double t_celsius);
}  // namespace solarith::air

namespace solarith::glycol {
// A glycol–water mixture; T checked as "fluid temperature", the fraction as "glycol_fraction".
fluids::Properties properties(const char* function, double t_celsius, double fraction, Kind kind);
}  // namespace solarith::glycol
