// The property set of a named fluid, for the convection correlations and the
// loss models (fluids::at in properties.hpp).
#include "solarith/properties.hpp"

#include "properties_internal.hpp"
#include "solarith/errors.hpp"

#include <cctype>
#include <cmath>
#include <string>

namespace solarith::fluids {
namespace {

std::string lower_case(const std::string& text)
{
    std::string out;
    for (char c : text)
        out += static_cast<char>(std::tolower(static_cast<unsigned char>(c)));
    return out;
}

// Water and air take no glycol: the fraction must be omitted (NaN) or 0.
void check_no_glycol(const char* function, const std::string& fluid, double glycol_fraction)
{
    if (!std::isnan(glycol_fraction) && glycol_fraction != 0)
        fail_domain(function, "glycol_fraction", glycol_fraction,
                    "0 or omitted: " + fluid + " takes no glycol (use \"propylene\" or \"ethylene\" for mixtures)");
}

}  // namespace

Properties at(const char* function, const std::string& fluid, double t_celsius, double glycol_fraction)
{
    const std::string name = lower_case(fluid);
    if (name == "water") {
        check_no_glycol(function, "water", glycol_fraction);
        return water::liquid_properties(function, t_celsius);
    }
    if (name == "air") {
        check_no_glycol(function, "air", glycol_fraction);
        return air::properties(function, t_celsius);
    }
    if (name == "propylene" || name == "ethylene") {
        if (std::isnan(glycol_fraction))
            fail_domain(function, "glycol_fraction is missing; \"" + fluid
                                      + "\" needs the mass fraction of glycol in water, 0..0.6");
        const auto kind = name == "propylene" ? glycol::Kind::Propylene : glycol::Kind::Ethylene;
        return glycol::properties(function, t_celsius, glycol_fraction, kind);
    }
    fail_domain(function, "fluid = \"" + fluid + "\" is not one of \"water\", \"air\", \"propylene\", \"ethylene\"");
}

}  // namespace solarith::fluids
