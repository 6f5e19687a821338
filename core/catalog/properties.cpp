// Catalogue entries of the properties family.
#include "solarith/catalog.hpp"

namespace solarith::catalog {

std::vector<FunctionSpec> properties_functions()
{
    return {};
}

}  // namespace solarith::catalog
