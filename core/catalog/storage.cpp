// Catalogue entries of the storage family.
#include "solarith/catalog.hpp"

namespace solarith::catalog {

std::vector<FunctionSpec> storage_functions()
{
    return {};
}

}  // namespace solarith::catalog
