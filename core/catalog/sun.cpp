// Catalogue entries of the sun family.
#include "solarith/catalog.hpp"

namespace solarith::catalog {

std::vector<FunctionSpec> sun_functions()
{
    return {};
}

}  // namespace solarith::catalog
