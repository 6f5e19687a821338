// Catalogue entries of the collector family.
#include "solarith/catalog.hpp"

namespace solarith::catalog {

std::vector<FunctionSpec> collector_functions()
{
    return {};
}

}  // namespace solarith::catalog
