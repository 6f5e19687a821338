// Catalogue entries of the conduction family.
#include "solarith/catalog.hpp"

namespace solarith::catalog {

std::vector<FunctionSpec> conduction_functions()
{
    return {};
}

}  // namespace solarith::catalog
