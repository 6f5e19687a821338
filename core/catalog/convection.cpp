// Catalogue entries of the convection family.
#include "solarith/catalog.hpp"

namespace solarith::catalog {

std::vector<FunctionSpec> convection_functions()
{
    return {};
}

}  // namespace solarith::catalog
